// Storage: wardrobes, chests of drawers, sideboards, media units, open shelving, bookcases, wall
// shelves and wall cabinets.
import type { PieceSettings } from '../../schemas/piece-kind';
import { SHELF_SPACING } from './ergonomics';
import { boxPart, clamp, fourLegs, panelPart, type FormBox, type Part } from './parts';
import { FRONTS_DEPTH_MM, doorFronts, drawerFronts } from './tables';

/** Carcass boards are this thick, mm (common practice, 18 mm board). */
const BOARD_MM = 18;
/** A wardrobe door is at most this wide, mm (common practice; REFERENCES: leaves 400–600 mm). */
const WARDROBE_DOOR_MAX_MM = 600;

/** A recessed plinth from the floor to `top`, set back from the front. */
function plinth(w: number, d: number, top: number): Part {
  return boxPart(-w / 2 + 10, w / 2 - 10, -d / 2 + 10, d / 2 - FRONTS_DEPTH_MM - 40, 0, top, { slot: 'accent' });
}

/** A wardrobe: plinth, carcass, tall doors with upright handles, a cornice board on top. */
export function wardrobeForm(box: FormBox, settings: PieceSettings): Part[] {
  const { width: w, depth: d, height: h } = box;
  const base = clamp(h * 0.04, 20, 100);
  const doors = settings.count ?? Math.max(1, Math.ceil(w / WARDROBE_DOOR_MAX_MM - 1e-9));
  const cornice = clamp(h * 0.02, 10, 40);
  return [
    plinth(w, d, base),
    boxPart(-w / 2, w / 2, -d / 2, d / 2 - FRONTS_DEPTH_MM, base, h - cornice),
    boxPart(-w / 2, w / 2, -d / 2, d / 2 - FRONTS_DEPTH_MM + 10, h - cornice, h),
    ...doorFronts(-w / 2, w / 2, d / 2, base, h - cornice, doors),
  ];
}

/** A chest of drawers: plinth or legs, carcass, a stack of drawers with bar handles, a top. */
export function chestOfDrawersForm(box: FormBox, settings: PieceSettings): Part[] {
  const { width: w, depth: d, height: h } = box;
  const base = clamp(h * 0.08, 20, 100);
  const top = clamp(h * 0.03, 10, 30);
  const drawers = settings.count ?? clamp(Math.round((h - base) / 180), 1, 8);
  return [
    plinth(w, d, base),
    boxPart(-w / 2, w / 2, -d / 2, d / 2 - FRONTS_DEPTH_MM, base, h - top),
    boxPart(-w / 2, w / 2, -d / 2, d / 2 - FRONTS_DEPTH_MM + 10, h - top, h, { role: 'top' }),
    ...drawerFronts(-w / 2, w / 2, d / 2, base, h - top, drawers),
  ];
}

/** Low cabinets on legs with doors or drawers: the sideboard and, with an open middle, the media unit. */
function lowCabinet(box: FormBox, settings: PieceSettings, openMiddle: boolean): Part[] {
  const { width: w, depth: d, height: h } = box;
  const legs = clamp(h * 0.18, 20, 180);
  const fronts = settings.fronts ?? 'doors';
  const count = settings.count ?? Math.max(2, Math.round(w / 450));
  const back = d / 2 - FRONTS_DEPTH_MM;
  const parts: Part[] = [
    ...fourLegs(-w / 2, w / 2, -d / 2, back, legs, clamp(h * 0.05, 20, 40), 30, 0.7),
    boxPart(-w / 2, w / 2, -d / 2, back, legs, h - BOARD_MM),
    boxPart(-w / 2, w / 2, -d / 2, back + 10, h - BOARD_MM, h, { role: 'top' }),
  ];
  const z0 = legs + 5;
  const z1 = h - BOARD_MM - 5;
  if (openMiddle && count >= 2) {
    // Doors either side of an open bay for the set-top box and speaker.
    const bay = w / (count + 1);
    const x0 = -bay / 2;
    const x1 = bay / 2;
    const side = Math.floor(count / 2);
    parts.push(...fronted(-w / 2, x0, d / 2, z0, z1, side, fronts));
    parts.push(...fronted(x1, w / 2, d / 2, z0, z1, count - side, fronts));
    parts.push(
      panelPart(x0, x1, back - 40, back, (z0 + z1) / 2 - BOARD_MM / 2, (z0 + z1) / 2 + BOARD_MM / 2, { slot: 'accent' }),
    );
    return parts;
  }
  parts.push(...fronted(-w / 2, w / 2, d / 2, z0, z1, count, fronts));
  return parts;
}

function fronted(
  x0: number,
  x1: number,
  front: number,
  z0: number,
  z1: number,
  count: number,
  fronts: 'doors' | 'drawers',
): Part[] {
  if (count <= 0) return [];
  if (fronts === 'doors') return doorFronts(x0, x1, front, z0, z1, count);
  // Drawers side by side in columns, two high.
  const step = (x1 - x0) / count;
  return Array.from({ length: count }, (_, i) => drawerFronts(x0 + i * step, x0 + (i + 1) * step, front, z0, z1, 2)).flat();
}

export function sideboardForm(box: FormBox, settings: PieceSettings): Part[] {
  return lowCabinet(box, settings, false);
}

export function mediaUnitForm(box: FormBox, settings: PieceSettings): Part[] {
  return lowCabinet(box, { fronts: 'drawers', ...settings, count: settings.count ?? 2 }, true);
}

/** Shelf heights between z0 and z1: as many as keep the pitch within the common range, or `count`. */
export function shelfLevels(z0: number, z1: number, count?: number): number[] {
  const n = count ?? Math.max(1, Math.round((z1 - z0) / SHELF_SPACING.valueMm));
  return Array.from({ length: n + 1 }, (_, i) => z0 + ((z1 - z0) * i) / n);
}

/** Book spines standing on a shelf from x0 to x1: a few runs of different heights, in their own colours. */
const BOOK_COLOURS = ['#8c6f5a', '#5e6f73', '#b59b73', '#6f5b4b', '#9aa58f', '#c9b79c'];
function books(x0: number, x1: number, y0: number, y1: number, z: number, room: number, seed: number): Part[] {
  const parts: Part[] = [];
  const runs = 3;
  const step = (x1 - x0) / runs;
  for (let i = 0; i < runs; i++) {
    if ((seed + i) % 4 === 3) continue;
    const tall = room * (0.55 + ((seed * 7 + i * 3) % 5) * 0.08);
    const a = x0 + i * step + step * 0.05;
    const b = a + step * (0.5 + ((seed + i) % 3) * 0.15);
    parts.push(
      boxPart(a, Math.min(b, x1), y0, y1, z, z + Math.min(tall, room - 5), {
        colour: BOOK_COLOURS[(seed + i * 2) % BOOK_COLOURS.length],
      }),
    );
  }
  return parts;
}

/** Open shelving: two uprights and boards, nothing behind, so the wall shows through. */
export function openShelvingForm(box: FormBox, settings: PieceSettings): Part[] {
  const { width: w, depth: d, height: h } = box;
  const t = clamp(w * 0.025, 15, 30);
  const board = Math.min(BOARD_MM, h / 10);
  const levels = shelfLevels(clamp(h * 0.04, 10, 80), h - board, settings.count);
  return [
    panelPart(-w / 2, -w / 2 + t, -d / 2, d / 2, 0, h, { slot: 'accent' }),
    panelPart(w / 2 - t, w / 2, -d / 2, d / 2, 0, h, { slot: 'accent' }),
    ...levels.map((z) => panelPart(-w / 2 + t, w / 2 - t, -d / 2, d / 2, z, z + board, { role: 'top' })),
  ];
}

/** A bookcase: sides, back, plinth, shelves at the common pitch, and books on them. */
export function bookcaseForm(box: FormBox, settings: PieceSettings): Part[] {
  const { width: w, depth: d, height: h } = box;
  const t = Math.min(BOARD_MM, w / 10);
  const back = Math.min(8, d / 10);
  const base = clamp(h * 0.04, 10, 80);
  const board = Math.min(BOARD_MM, h / 10);
  const levels = shelfLevels(base, h - board, settings.count);
  const parts: Part[] = [
    boxPart(-w / 2 + t, w / 2 - t, -d / 2 + back, d / 2 - 20, 0, base),
    panelPart(-w / 2, -w / 2 + t, -d / 2, d / 2, 0, h),
    panelPart(w / 2 - t, w / 2, -d / 2, d / 2, 0, h),
    panelPart(-w / 2 + t, w / 2 - t, -d / 2, -d / 2 + back, 0, h, { role: 'back' }),
  ];
  levels.forEach((z, i) => {
    parts.push(panelPart(-w / 2 + t, w / 2 - t, -d / 2 + back, d / 2, z, z + board, { role: 'top' }));
    const next = levels[i + 1];
    if (next !== undefined && next - z - board > 80)
      parts.push(...books(-w / 2 + t + 10, w / 2 - t - 10, -d / 2 + back, d / 2 - d * 0.15, z + board, next - z - board, i));
  });
  return parts;
}

/** A wall shelf: one board at its elevation with a slim bracket rail behind, and a few books when there is room. */
export function wallShelfForm(box: FormBox): Part[] {
  const { width: w, depth: d, height: h } = box;
  const board = Math.min(30, h);
  const parts: Part[] = [panelPart(-w / 2, w / 2, -d / 2, d / 2, 0, board, { role: 'top' })];
  if (h > board + 60) parts.push(...books(-w / 2 + 20, w / 2 - 20, -d / 2, d / 2 - d * 0.2, board, h - board, 1));
  else if (h > board + 5)
    parts.push(
      panelPart(-w / 2 + 20, w / 2 - 20, -d / 2, -d / 2 + Math.min(15, d / 4), board, h, { slot: 'accent', role: 'back' }),
    );
  return parts;
}

/** A wall cabinet: carcass and doors with handles low on them, hung at its elevation. */
export function wallCabinetForm(box: FormBox, settings: PieceSettings): Part[] {
  const { width: w, depth: d, height: h } = box;
  const doors = settings.count ?? Math.max(1, Math.round(w / 450));
  return [
    boxPart(-w / 2, w / 2, -d / 2, d / 2 - FRONTS_DEPTH_MM, 0, h),
    ...doorFronts(-w / 2, w / 2, d / 2, 0, h, doors, 'bottom'),
  ];
}
