// Seating: sofas, corner sofas, armchairs, dining chairs, stools, benches and ottomans.
import type { PieceSettings } from '../../schemas/piece-kind';
import {
  CHAIR_SEAT_DEPTH,
  CHAIR_SEAT_HEIGHT,
  SEAT_CUSHION_MAX_WIDTH,
  SOFA_SEAT_DEPTH,
  SOFA_SEAT_HEIGHT,
  fitDefault,
} from './ergonomics';
import { boxPart, clamp, discPart, fourLegs, mirrorParts, panelPart, roundedPart, type FormBox, type Part } from './parts';

/** Gap between neighbouring cushions, mm (drawn so each cushion reads). */
const CUSHION_GAP_MM = 12;
/** Upholstered corners are rounded this much, mm (common practice look). */
const SOFT_RADIUS_MM = 40;

/** How many seat cushions a seat `seatWidthMm` wide gets: as few as keep each within the common maximum width. */
export function seatCushionCount(seatWidthMm: number): number {
  return Math.max(1, Math.ceil(seatWidthMm / SEAT_CUSHION_MAX_WIDTH.valueMm - 1e-9));
}

/** Legs or plinth under upholstery, from the floor to `top`. */
function upholsteryBase(x0: number, x1: number, y0: number, y1: number, top: number, settings: PieceSettings): Part[] {
  if (settings.base === 'plinth') return [boxPart(x0 + 30, x1 - 30, y0 + 30, y1 - 30, 0, top, { slot: 'accent' })];
  return fourLegs(x0, x1, y0, y1, top, clamp((x1 - x0) * 0.03, 25, 45), 30, 0.7);
}

/** Cushions side by side across x0..x1, from y0 to y1 and z0 to z1, as many as the width needs. */
function cushionsAcross(x0: number, x1: number, y0: number, y1: number, z0: number, z1: number, role: Part['role']): Part[] {
  const n = seatCushionCount(x1 - x0);
  const step = (x1 - x0) / n;
  return Array.from({ length: n }, (_, i) =>
    roundedPart(
      x0 + i * step + (i > 0 ? CUSHION_GAP_MM / 2 : 0),
      x0 + (i + 1) * step - (i < n - 1 ? CUSHION_GAP_MM / 2 : 0),
      y0,
      y1,
      z0,
      z1,
      SOFT_RADIUS_MM,
      { role },
    ),
  );
}

interface SeatFrame {
  legTop: number;
  seatTop: number;
  cushionBottom: number;
  armTop: number;
  armWidth: number;
  backDepth: number;
  backCushion: number;
}

function seatFrame(box: FormBox, arms: boolean): SeatFrame {
  const { width: w, depth: d, height: h } = box;
  const legTop = clamp(h * 0.14, 20, 140);
  const seatTop = Math.max(legTop + 40, fitDefault(SOFA_SEAT_HEIGHT, h, 0.55));
  const cushionBottom = seatTop - clamp((seatTop - legTop) * 0.45, 20, 150);
  const armWidth = arms ? clamp(w * 0.09, 50, 220) : 0;
  const seatDepth = fitDefault(SOFA_SEAT_DEPTH, d, 0.62);
  const backDepth = clamp(d * 0.16, 40, 200);
  const backCushion = Math.max(0, d - backDepth - seatDepth);
  const armTop = Math.min(h, seatTop + clamp((h - seatTop) * 0.55, 40, 220));
  return { legTop, seatTop, cushionBottom, armTop, armWidth, backDepth, backCushion };
}

/** A sofa or armchair: base, seat frame, seat cushions (more for a longer sofa), back, back cushions, arms. */
export function sofaForm(box: FormBox, settings: PieceSettings): Part[] {
  const { width: w, depth: d, height: h } = box;
  const arms = settings.arms !== 'none';
  const f = seatFrame(box, arms);
  const x0 = -w / 2 + f.armWidth;
  const x1 = w / 2 - f.armWidth;
  const back = -d / 2;
  const parts: Part[] = [
    ...upholsteryBase(-w / 2, w / 2, -d / 2, d / 2, f.legTop, settings),
    boxPart(-w / 2, w / 2, -d / 2, d / 2, f.legTop, f.cushionBottom),
    roundedPart(-w / 2, w / 2, back, back + f.backDepth, f.cushionBottom, h, SOFT_RADIUS_MM / 2, { role: 'back' }),
    ...cushionsAcross(x0, x1, back + f.backDepth + f.backCushion, d / 2, f.cushionBottom, f.seatTop, 'front'),
  ];
  if (f.backCushion > 0)
    parts.push(
      ...cushionsAcross(
        x0,
        x1,
        back + f.backDepth,
        back + f.backDepth + f.backCushion,
        f.cushionBottom,
        h - clamp(h * 0.05, 0, 40),
        'back',
      ),
    );
  if (arms) {
    parts.push(roundedPart(-w / 2, x0, back + f.backDepth, d / 2, f.cushionBottom, f.armTop, SOFT_RADIUS_MM));
    parts.push(roundedPart(x1, w / 2, back + f.backDepth, d / 2, f.cushionBottom, f.armTop, SOFT_RADIUS_MM));
  }
  return parts;
}

/**
 * A corner sofa: a run along the back and a return down one side to the front. `hand` names the
 * side of the return as seen from the front of the sofa (right is the piece's +x).
 */
export function cornerSofaForm(box: FormBox, settings: PieceSettings): Part[] {
  const { width: w, depth: d, height: h } = box;
  const arms = settings.arms !== 'none';
  const f = seatFrame({ width: w, depth: Math.min(d, 950), height: h }, arms);
  const run = clamp(Math.min(d * 0.6, w * 0.45), Math.min(d, 500), 1000);
  const back = -d / 2;
  const side = w / 2;
  const seatFront = back + run;
  const parts: Part[] = [
    ...upholsteryBase(-w / 2, w / 2, back, seatFront, f.legTop, settings),
    ...upholsteryBase(side - run, side, seatFront, d / 2, f.legTop, settings),
    boxPart(-w / 2, w / 2, back, seatFront, f.legTop, f.cushionBottom),
    boxPart(side - run, side, seatFront, d / 2, f.legTop, f.cushionBottom),
    roundedPart(-w / 2, side, back, back + f.backDepth, f.cushionBottom, h, SOFT_RADIUS_MM / 2, { role: 'back' }),
    roundedPart(side - f.backDepth, side, back + f.backDepth, d / 2, f.cushionBottom, h, SOFT_RADIUS_MM / 2, { role: 'back' }),
    ...cushionsAcross(
      -w / 2 + f.armWidth,
      side - f.backDepth,
      back + f.backDepth,
      seatFront,
      f.cushionBottom,
      f.seatTop,
      'front',
    ),
    // The return's seat runs front to back: its cushions are laid across it the other way.
    ...turnedCushions(side - run, side - f.backDepth, seatFront, d / 2 - f.armWidth, f.cushionBottom, f.seatTop),
  ];
  if (arms) {
    parts.push(
      roundedPart(-w / 2, -w / 2 + f.armWidth, back + f.backDepth, seatFront, f.cushionBottom, f.armTop, SOFT_RADIUS_MM),
    );
    parts.push(
      roundedPart(side - run, side - f.backDepth, d / 2 - f.armWidth, d / 2, f.cushionBottom, f.armTop, SOFT_RADIUS_MM, {
        role: 'front',
      }),
    );
  }
  return settings.hand === 'left' ? mirrorParts(parts) : parts;
}

function turnedCushions(x0: number, x1: number, y0: number, y1: number, z0: number, z1: number): Part[] {
  if (y1 - y0 < 100) return [];
  const n = seatCushionCount(y1 - y0);
  const step = (y1 - y0) / n;
  return Array.from({ length: n }, (_, i) =>
    roundedPart(
      x0,
      x1,
      y0 + i * step + (i > 0 ? CUSHION_GAP_MM / 2 : 0),
      y0 + (i + 1) * step - (i < n - 1 ? CUSHION_GAP_MM / 2 : 0),
      z0,
      z1,
      SOFT_RADIUS_MM,
      { role: 'front' },
    ),
  );
}

/** An armchair: a sofa with one seat cushion, however wide. */
export function armchairForm(box: FormBox, settings: PieceSettings): Part[] {
  return sofaForm(box, settings);
}

/** A dining chair: four legs, a seat board, a back rising from the seat's rear edge. */
export function diningChairForm(box: FormBox): Part[] {
  const { width: w, depth: d, height: h } = box;
  const seatTop = Math.min(fitDefault(CHAIR_SEAT_HEIGHT, h, 0.55), h - 20);
  const seatBoard = clamp(seatTop * 0.09, 10, 45);
  const seatDepth = Math.min(d, fitDefault(CHAIR_SEAT_DEPTH, d, 1));
  const y0 = d / 2 - seatDepth;
  const backT = clamp(d * 0.05, 10, 25);
  const leg = clamp(w * 0.07, 15, 38);
  return [
    ...fourLegs(-w / 2, w / 2, y0, d / 2, seatTop - seatBoard, leg, 5, 0.75),
    roundedPart(-w / 2, w / 2, y0, d / 2, seatTop - seatBoard, seatTop, 20, { role: 'front' }),
    roundedPart(-w / 2 + leg / 2, w / 2 - leg / 2, y0, y0 + backT, seatTop, h, 25, { role: 'back', slot: 'accent' }),
  ];
}

/** A stool: a round or square seat on four slender legs with a footrest rail. */
export function stoolForm(box: FormBox, settings: PieceSettings): Part[] {
  const { width: w, depth: d, height: h } = box;
  const seat = clamp(h * 0.07, 10, 45);
  const size = Math.min(w, d);
  const leg = clamp(size * 0.08, 14, 35);
  const inset = size * 0.12;
  const top =
    settings.top === 'rectangular'
      ? roundedPart(-w / 2, w / 2, -d / 2, d / 2, h - seat, h, 20, { role: 'top' })
      : discPart(0, 0, size, h - seat, h, { role: 'top' });
  const legs = fourLegs(-size / 2 + inset, size / 2 - inset, -size / 2 + inset, size / 2 - inset, h - seat, leg, 0, 0.8);
  // A footrest rail on each side, joining the legs a third of the way up.
  const c = size / 2 - inset - leg / 2;
  const z0 = h * 0.3;
  const z1 = z0 + leg * 0.6;
  const t = leg * 0.3;
  const rails = [
    panelPart(-c, c, -c - t, -c + t, z0, z1, { slot: 'accent' }),
    panelPart(-c, c, c - t, c + t, z0, z1, { slot: 'accent' }),
    panelPart(-c - t, -c + t, -c, c, z0, z1, { slot: 'accent' }),
    panelPart(c - t, c + t, -c, c, z0, z1, { slot: 'accent' }),
  ];
  return [...legs, ...rails, top];
}

/** A bench: a long seat board on two slab ends (plinth) or four legs. */
export function benchForm(box: FormBox, settings: PieceSettings): Part[] {
  const { width: w, depth: d, height: h } = box;
  const board = clamp(h * 0.09, 15, 50);
  const top = roundedPart(-w / 2, w / 2, -d / 2, d / 2, h - board, h, 15, { role: 'top' });
  if (settings.base === 'plinth') {
    const t = clamp(w * 0.04, 18, 50);
    const inset = clamp(w * 0.06, 20, 150);
    return [
      panelPart(-w / 2 + inset, -w / 2 + inset + t, -d / 2 + 20, d / 2 - 20, 0, h - board, { slot: 'accent' }),
      panelPart(w / 2 - inset - t, w / 2 - inset, -d / 2 + 20, d / 2 - 20, 0, h - board, { slot: 'accent' }),
      top,
    ];
  }
  return [...fourLegs(-w / 2, w / 2, -d / 2, d / 2, h - board, clamp(d * 0.1, 20, 45), 25, 0.75), top];
}

/** An ottoman: a deep upholstered drum or block on short feet, with a buttoned top cushion. */
export function ottomanForm(box: FormBox, settings: PieceSettings): Part[] {
  const { width: w, depth: d, height: h } = box;
  const feet = clamp(h * 0.12, 10, 70);
  const cushion = clamp(h * 0.18, 20, 90);
  const round = settings.top === 'round';
  const size = Math.min(w, d);
  const body = round
    ? discPart(0, 0, size, feet, h - cushion)
    : roundedPart(-w / 2, w / 2, -d / 2, d / 2, feet, h - cushion, SOFT_RADIUS_MM);
  const top = round
    ? discPart(0, 0, size, h - cushion, h, { role: 'top' })
    : roundedPart(-w / 2, w / 2, -d / 2, d / 2, h - cushion, h, SOFT_RADIUS_MM * 1.5, { role: 'top' });
  const footInset = round ? size * 0.2 : 40;
  const fx = round ? size / 2 : w / 2;
  const fy = round ? size / 2 : d / 2;
  return [
    ...fourLegs(
      -fx + footInset / 2,
      fx - footInset / 2,
      -fy + footInset / 2,
      fy - footInset / 2,
      feet,
      clamp(size * 0.06, 25, 50),
      0,
      0.8,
    ),
    body,
    top,
  ];
}
