// Rooms shared by this folder's tests: the design's example room and an L-shaped one, in plan mm.
import { roomShellSchema, type RoomShell } from '../../shared/schemas/room';
import { pieceSchema, type Piece } from '../../shared/schemas/option';
import { designExampleRoom } from '../../tests/reference/rooms';

/** The design's example room: 4200 × 3600 mm, door on wall 0, window on wall 2, passage on wall 3. */
export const exampleShell: RoomShell = roomShellSchema.parse(designExampleRoom);

/** An L: the bottom-right quarter is cut away, so walls 2 and 3 are the cut's inner corner. */
export const lShapedShell: RoomShell = roomShellSchema.parse({
  wallHeight: 2700,
  outline: [
    [0, 0],
    [6200, 0],
    [6200, 3400],
    [3800, 3400],
    [3800, 5600],
    [0, 5600],
  ],
  openings: [
    { id: 'front-window', type: 'window', wall: 0, offset: 1200, width: 1800, height: 1400, sill: 800 },
    { id: 'side-window', type: 'window', wall: 1, offset: 900, width: 1500, height: 1400, sill: 800 },
  ],
});

export const examplePieces: Piece[] = [
  { id: 'sofa', name: 'Three-seat sofa', x: 2100, y: 3100, width: 2100, depth: 900, height: 850, rotation: 180, status: 'new' },
  { id: 'table', name: 'Dining table', x: 2000, y: 1500, width: 1400, depth: 800, height: 750, status: 'new', colour: '#8a6a4f' },
  { id: 'wardrobe', name: 'Wardrobe', x: 3550, y: 330, width: 1100, depth: 600, height: 2000, status: 'existing' },
  { id: 'spare', name: 'Spare chair', x: 0, y: 0, width: 500, depth: 500, height: 800, status: 'existing', placed: false },
].map((p) => pieceSchema.parse(p));
