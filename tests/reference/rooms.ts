import type { RoomShellInput } from '../../shared/schemas/room';

/** The room of the DESIGN.md plan file example (plan mm); its take-off numbers are fixed by the design. */
export const designExampleRoom: RoomShellInput = {
  wallHeight: 2600,
  wallThickness: 100,
  outline: [[0, 0], [4200, 0], [4200, 3600], [0, 3600]],
  openings: [
    { id: 'd1', type: 'door', wall: 0, offset: 300, width: 820, height: 2040, hinge: 'start', swing: 'in' },
    { id: 'w1', type: 'window', wall: 2, offset: 1000, width: 1500, height: 1200, sill: 900 },
    { id: 'p1', type: 'passage', wall: 3, offset: 800, width: 900, height: 2100 },
  ],
};
