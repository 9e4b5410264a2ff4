// Clear-cut plans for the fit check's tests, worked out by hand (plan mm, x right, y down). Shared
// by the unit tests beside the checks and by the analyze command's tests, which write them to files.
import type { PieceInput } from '../../schemas/option';
import { planFileSchema, type PlanFile, type PlanFileInput } from '../../schemas/plan-file';
import type { RoomShellInput } from '../../schemas/room';

/** A piece with the fields a fit check reads; status and the rest take their defaults. */
export function pieceInput(fields: Omit<PieceInput, 'status' | 'name'> & { name?: string }): PieceInput {
  return { status: 'new', name: fields.id, ...fields };
}

/** A plan file of one room and one option, parsed so defaults are filled in. */
export function plan(room: RoomShellInput, pieces: readonly PieceInput[]): PlanFile {
  const input: PlanFileInput = {
    format: 'parlour-plan',
    version: 1,
    room: { name: 'Test room', ...room },
    option: { name: 'Option A', pieces: [...pieces] },
  };
  return planFileSchema.parse(input);
}

/**
 * A 4 × 3 m room with nothing to report. Door on the top wall from x 300 to 1220 (a 920 mm leaf,
 * swinging in: its quarter disc reaches y 920). Window on the bottom wall from x 3000 to 1500, sill
 * 900. A sideboard against the left wall (y 1000–2600) with a wall cabinet above it at 1400 mm; a
 * sofa 800 high against the bottom wall under the window; a bookcase against the right wall facing
 * into the room; a rug in the middle, under the sofa's edge.
 */
export function cleanLayout(): { room: RoomShellInput; pieces: PieceInput[] } {
  return {
    room: {
      outline: [
        [0, 0],
        [4000, 0],
        [4000, 3000],
        [0, 3000],
      ],
      openings: [
        { id: 'd1', type: 'door', wall: 0, offset: 300, width: 920, height: 2040, hinge: 'start', swing: 'in' },
        { id: 'w1', type: 'window', wall: 2, offset: 1000, width: 1500, height: 1200, sill: 900 },
      ],
    },
    pieces: [
      // Turned 270°: its width runs down the wall and its front faces +x, into the room.
      pieceInput({ id: 'sideboard', name: 'Sideboard', x: 225, y: 1800, width: 1600, depth: 450, height: 850, rotation: 270 }),
      pieceInput({
        id: 'wall-cabinet',
        name: 'Wall cabinet',
        x: 175,
        y: 1800,
        width: 1600,
        depth: 350,
        height: 700,
        rotation: 270,
        elevation: 1400,
      }),
      // Turned 180°: front faces −y, back flush on the bottom wall (y 2100–3000).
      pieceInput({ id: 'sofa', name: 'Sofa', x: 2200, y: 2550, width: 2000, depth: 900, height: 800, rotation: 180 }),
      // Turned 90°: front faces −x; x 3650–4000, y 600–1800.
      pieceInput({ id: 'bookcase', name: 'Bookcase', x: 3825, y: 1200, width: 1200, depth: 350, height: 2000, rotation: 90 }),
      pieceInput({ id: 'rug', name: 'Rug', x: 2000, y: 1400, width: 2000, depth: 1400, height: 10 }),
    ],
  };
}

/**
 * A 4 × 4 m room cut in two by a bed and a chest 620 mm apart. The bed (turned 270°, foot facing +x)
 * fills x 0–2000, y 1500–2900; the chest (front facing +y) fills x 2620–4000, y 1750–2250. Every route
 * from the top half to the bottom half passes the gap x 2000–2620. The door is in the top wall
 * (x 2800–3620, swinging out) and the chest's front faces the bottom half, so the chest's route is
 * 620 mm at its narrowest; the bed's foot also faces the open top half (y 1500–1750), so it is fine.
 */
export function gapLayout(gapMm = 620): { room: RoomShellInput; pieces: PieceInput[] } {
  const chestWidthMm = 2000 - gapMm;
  return {
    room: {
      outline: [
        [0, 0],
        [4000, 0],
        [4000, 4000],
        [0, 4000],
      ],
      openings: [{ id: 'd1', type: 'door', wall: 0, offset: 2800, width: 820, height: 2040, hinge: 'start', swing: 'out' }],
    },
    pieces: [
      pieceInput({ id: 'bed', name: 'Bed', x: 1000, y: 2200, width: 1400, depth: 2000, height: 500, rotation: 270 }),
      pieceInput({
        id: 'chest',
        name: 'Chest',
        x: 4000 - chestWidthMm / 2,
        y: 2000,
        width: chestWidthMm,
        depth: 500,
        height: 800,
      }),
    ],
  };
}

/**
 * A cabinet shut in the top-right corner of a 4 × 4 m room: a bookcase (x 2800–4000, y 1000–1300)
 * and a wardrobe (x 2500–2800, y 0–1300) close the pocket x 2800–4000, y 0–1000 where the cabinet
 * (x 3000–3800, y 0–500) faces down into it. Both walls of the pocket face out. Door on the left wall.
 */
export function walledInLayout(): { room: RoomShellInput; pieces: PieceInput[] } {
  return {
    room: {
      outline: [
        [0, 0],
        [4000, 0],
        [4000, 4000],
        [0, 4000],
      ],
      openings: [{ id: 'd1', type: 'door', wall: 3, offset: 1000, width: 820, height: 2040, hinge: 'start', swing: 'out' }],
    },
    pieces: [
      pieceInput({ id: 'cabinet', name: 'Cabinet', x: 3400, y: 250, width: 800, depth: 500, height: 900 }),
      pieceInput({ id: 'bookcase', name: 'Bookcase', x: 3400, y: 1150, width: 1200, depth: 300, height: 1800 }),
      // Turned 90°: front faces −x, away from the pocket.
      pieceInput({ id: 'wardrobe', name: 'Wardrobe', x: 2650, y: 650, width: 1300, depth: 300, height: 2000, rotation: 90 }),
    ],
  };
}
