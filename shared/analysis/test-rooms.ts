// Test fixtures for the take-off, schedule and compare tests: a 4 m × 3 m room, a small finish
// library (two paints, boards, a wallpaper) and a chair to place.
import { roomShellSchema } from '../schemas/room';
import type { PieceInput } from '../schemas/option';
import type { FinishInfo, PaintInfo, PhotoInfo } from './finish-takeoff';
import { takeoffSettingsSchema } from './takeoff-settings';

// 4 m × 3 m, 2.5 m high: walls 0 and 2 are 4 m (10 m² each), walls 1 and 3 are 3 m (7.5 m² each).
// A 1 m × 2 m door on wall 0 takes 2 m² off it.
export const shell = roomShellSchema.parse({
  wallHeight: 2500,
  outline: [
    [0, 0],
    [4000, 0],
    [4000, 3000],
    [0, 3000],
  ],
  openings: [{ id: 'd1', type: 'door', wall: 0, offset: 500, width: 1000, height: 2000, hinge: 'start', swing: 'in' }],
});
const base = { supplier: null, code: null, price: null, priceUnit: null };
const oat: PaintInfo = {
  ...base,
  id: 'oat',
  name: 'Oat',
  kind: 'paint',
  colourHex: '#e6dcc8',
  price: 20,
  priceUnit: 'litre',
};
const harbour: PaintInfo = { ...base, id: 'harbour', name: 'Harbour', kind: 'paint', colourHex: '#2f4858' };
const boards: PhotoInfo = {
  ...base,
  id: 'boards',
  name: 'Boards',
  kind: 'photo',
  category: 'wood',
  swatchUrl: null,
  price: 50,
  priceUnit: 'm2',
};
const paper: PhotoInfo = {
  ...base,
  id: 'paper',
  name: 'Paper',
  kind: 'photo',
  category: 'wallpaper',
  swatchUrl: null,
  price: 30,
  priceUnit: 'unit',
};
export const library = new Map<string, FinishInfo>([oat, harbour, boards, paper].map((f) => [f.id, f]));
export const defaults = takeoffSettingsSchema.parse({});
export const piece = (p: Partial<PieceInput> & { id: string }): PieceInput => ({
  name: 'Chair',
  x: 1000,
  y: 1500,
  width: 500,
  depth: 500,
  height: 800,
  status: 'new',
  ...p,
});
