// The README's plan-file example room and the take-off numbers the README prints for it, shared
// by the tests that check against them.
import type { RoomShellInput } from '../../shared/schemas/room';

/** The room of the README's plan-file example (plan mm); its take-off numbers are printed in the README. */
export const designExampleRoom: RoomShellInput = {
  wallHeight: 2600,
  wallThickness: 100,
  outline: [
    [0, 0],
    [4200, 0],
    [4200, 3600],
    [0, 3600],
  ],
  openings: [
    { id: 'd1', type: 'door', wall: 0, offset: 300, width: 820, height: 2040, hinge: 'start', swing: 'in' },
    { id: 'w1', type: 'window', wall: 2, offset: 1000, width: 1500, height: 1200, sill: 900 },
    { id: 'p1', type: 'passage', wall: 3, offset: 800, width: 900, height: 2100 },
  ],
};

/** The take-off the README prints for that room (default options), field for field. */
export const designExampleTakeoff = {
  floorArea_m2: 15.12,
  perimeter_m: 15.6,
  ceilingArea_m2: 15.12,
  volume_m3: 39.312,
  netWallArea_m2: 35.197,
  paint: { coats: 2, coverage_m2_per_l: 10, litres: 7.039 },
  flooring: { wastePercent: 10, orderArea_m2: 16.632 },
  skirting_m: 13.88,
  findings: [],
};

/** Wall 0 of that take-off as the README prints it. */
export const designExampleWall0 = { index: 0, length_m: 4.2, grossArea_m2: 10.92, openingsArea_m2: 1.673, netArea_m2: 9.247 };
