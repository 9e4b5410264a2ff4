// The invented rooms the benches time: a typical room (8 walls, 6 openings, 40 pieces), a large
// room of 200 pieces, and the typical room furnished with pieces of assorted kinds.
import { optionDocSchema, type OptionDoc, type Piece } from '../../shared/schemas/option';
import { roomShellSchema, type RoomShell } from '../../shared/schemas/room';

/**
 * A typical room for timing (invented): 8 walls with a splayed corner and a step, 6 openings and
 * 40 pieces in a grid with assorted turns, all in plan mm.
 */
export function typicalRoom(): { shell: RoomShell; option: OptionDoc } {
  const shell = roomShellSchema.parse({
    outline: [
      [0, 0],
      [6000, 0],
      [6000, 2500],
      [5000, 3500],
      [5000, 5000],
      [2000, 5000],
      [2000, 4000],
      [0, 4000],
    ],
    openings: [
      { id: 'door-hall', type: 'door', wall: 0, offset: 300, width: 850, height: 2040, hinge: 'start', swing: 'in' },
      { id: 'window-east', type: 'window', wall: 0, offset: 2500, width: 1800, height: 1300, sill: 850 },
      { id: 'window-side', type: 'window', wall: 1, offset: 500, width: 1200, height: 1300, sill: 850 },
      { id: 'passage-dining', type: 'passage', wall: 4, offset: 500, width: 1000, height: 2100 },
      { id: 'window-south', type: 'window', wall: 6, offset: 400, width: 1200, height: 1300, sill: 850 },
      { id: 'door-garden', type: 'door', wall: 7, offset: 1000, width: 800, height: 2040, hinge: 'end', swing: 'out' },
    ],
  });
  const pieces = Array.from({ length: 40 }, (_, i) => ({
    id: `piece-${i}`,
    name: `Piece ${i}`,
    x: 600 + (i % 8) * 550,
    y: 600 + Math.floor(i / 8) * 650,
    width: 400,
    depth: 300,
    height: 450 + (i % 5) * 100,
    rotation: (i * 37) % 360,
    elevation: i % 7 === 0 ? 1200 : 0,
    status: i % 3 === 0 ? 'existing' : 'new',
  }));
  return { shell, option: optionDocSchema.parse({ pieces }) };
}

/** The typical room's shell, 5 times its floor area, with 200 pieces in a grid (invented, plan mm). */
export function largeRoom(): { shell: RoomShell; pieces: Piece[] } {
  const { shell } = typicalRoom();
  const grown: RoomShell = { ...shell, outline: shell.outline.map(([x, y]) => [x * Math.sqrt(5), y * Math.sqrt(5)]) };
  const pieces = Array.from({ length: 200 }, (_, i) => ({
    id: `piece-${i}`,
    name: `Piece ${i}`,
    x: 600 + (i % 20) * 620,
    y: 600 + Math.floor(i / 20) * 1050,
    width: 450,
    depth: 350,
    height: 450 + (i % 5) * 100,
    rotation: (i * 37) % 360,
    elevation: i % 7 === 0 ? 1400 : 0,
    status: 'new',
  }));
  return { shell: grown, pieces: optionDocSchema.parse({ pieces }).pieces };
}

/** Kinds the typical furnished room cycles through: at least twelve, as a furnished flat has. */
export const TYPICAL_KINDS = [
  'sofa',
  'armchair',
  'dining-chair',
  'coffee-table',
  'dining-table',
  'bed',
  'wardrobe',
  'chest-of-drawers',
  'bookcase',
  'sideboard',
  'floor-lamp',
  'plant',
  'rug',
  'desk',
  'kitchen-base-unit',
  'wall-cabinet',
] as const;

/** The typical room with each of its 40 pieces given a kind in turn (wall cabinets at their 1200 mm elevation). */
export function typicalFurnishedRoom(): { shell: RoomShell; option: OptionDoc } {
  const { shell, option } = typicalRoom();
  const pieces = option.pieces.map((p, i) => {
    const kind = TYPICAL_KINDS[i % TYPICAL_KINDS.length];
    return {
      ...p,
      kind,
      elevation: kind === 'wall-cabinet' ? 1200 : 0,
      height: kind === 'rug' ? 10 : p.height,
      accentColour: '#5b4636',
    };
  });
  return { shell, option: optionDocSchema.parse({ pieces }) };
}
