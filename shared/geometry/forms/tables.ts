// Tables: dining (rectangular or round), a dining set (table with chairs round it), coffee, side
// and bedside tables, and desks.
import type { PieceSettings } from '../../schemas/piece-kind';
import { DINING_TABLE_HEIGHT, fitDefault } from './ergonomics';
import { itemAt } from '../../item-at';
import {
  HANDLE_PROUD_MM,
  boxPart,
  clamp,
  discPart,
  fourLegs,
  handlePart,
  legPart,
  moveParts,
  panelPart,
  roundedPart,
  turnParts,
  type FormBox,
  type Part,
} from './parts';
import { diningChairForm } from './seating';

const TOP_RADIUS_MM = 12;

function tableTop(w: number, d: number, z0: number, z1: number, round: boolean): Part {
  return round
    ? discPart(0, 0, Math.min(w, d), z0, z1, { role: 'top' })
    : roundedPart(-w / 2, w / 2, -d / 2, d / 2, z0, z1, TOP_RADIUS_MM, { role: 'top' });
}

/** A table `top` high: a top on four legs, or on a central pedestal and foot when it is round. */
function table(w: number, d: number, top: number, round: boolean): Part[] {
  const thick = clamp(top * 0.045, 15, 40);
  const under = top - thick;
  const size = Math.min(w, d);
  if (round) {
    const foot = clamp(size * 0.5, 150, 700);
    return [
      discPart(0, 0, foot, 0, clamp(top * 0.04, 10, 30), { slot: 'accent' }),
      legPart(0, 0, clamp(size * 0.12, 40, 140), clamp(top * 0.04, 10, 30), under, 1.2),
      tableTop(w, d, under, top, true),
    ];
  }
  const leg = clamp(size * 0.06, 25, 70);
  return [
    ...fourLegs(-w / 2, w / 2, -d / 2, d / 2, under, leg, clamp(size * 0.04, 10, 60), 0.7),
    tableTop(w, d, under, top, false),
  ];
}

/** A dining table: its top at the box's height. */
export function diningTableForm(box: FormBox, settings: PieceSettings): Part[] {
  return table(box.width, box.depth, box.height, settings.top === 'round');
}

/** A chair's footprint in a dining set, mm (common practice). */
const SET_CHAIR_WIDTH_MM = 450;
const SET_CHAIR_DEPTH_MM = 500;
/** How far a chair's seat slides under the table edge, mm (common practice). */
const CHAIR_TUCK_MM = 120;

/**
 * A table with chairs round it, all inside the box (whose height is the chairs' backs): chairs on
 * both long sides first, any left over at the ends, each facing the table.
 */
export function diningSetForm(box: FormBox, settings: PieceSettings): Part[] {
  const { width: w, depth: d, height: h } = box;
  const chairs = settings.chairs ?? 4;
  const round = settings.top === 'round';
  const chairD = Math.min(SET_CHAIR_DEPTH_MM, d * 0.3);
  const sidesOnly = chairs <= 2 * Math.max(1, Math.floor(w / (SET_CHAIR_WIDTH_MM + 100)));
  const endRoom = sidesOnly ? 0 : Math.min(chairD, w * 0.3) - CHAIR_TUCK_MM;
  const tableD = Math.max(d * 0.3, d - 2 * (chairD - CHAIR_TUCK_MM));
  const tableW = Math.max(w * 0.4, w - 2 * endRoom);
  const tableH = Math.min(fitDefault(DINING_TABLE_HEIGHT, h, 0.85), h);
  const parts = table(round ? Math.min(tableW, tableD) : tableW, round ? Math.min(tableW, tableD) : tableD, tableH, round);
  const perSide = sidesOnly ? Math.ceil(chairs / 2) : Math.max(1, Math.floor(w / (SET_CHAIR_WIDTH_MM + 100)));
  const ends = sidesOnly ? 0 : chairs - 2 * perSide;
  const chairW = Math.min(SET_CHAIR_WIDTH_MM, (tableW - 40) / perSide - 40, w / perSide - 20);
  const chair = diningChairForm({ width: Math.max(chairW, 150), depth: chairD, height: h });
  const step = tableW / perSide;
  const front = Math.ceil(chairs / 2) > perSide ? perSide : Math.ceil(Math.min(chairs, 2 * perSide) / 2);
  const back = Math.min(chairs, 2 * perSide) - front;
  // Chairs on the +y side turn round to face the table; those at −y already do.
  for (let i = 0; i < front; i++)
    parts.push(...moveParts(turnParts(chair, 2), -tableW / 2 + step * (i + 0.5 + (perSide - front) / 2), d / 2 - chairD / 2));
  for (let i = 0; i < back; i++)
    parts.push(...moveParts(chair, -tableW / 2 + step * (i + 0.5 + (perSide - back) / 2), -d / 2 + chairD / 2));
  const endD = Math.min(chairD, w * 0.3);
  const endChair = diningChairForm({ width: Math.min(SET_CHAIR_WIDTH_MM, tableD * 0.8), depth: endD, height: h });
  if (ends > 0) parts.push(...moveParts(turnParts(endChair, 1), w / 2 - endD / 2, 0));
  if (ends > 1) parts.push(...moveParts(turnParts(endChair, 3), -w / 2 + endD / 2, 0));
  return parts;
}

/** A coffee table: a top on four legs with a shelf low between them. */
export function coffeeTableForm(box: FormBox, settings: PieceSettings): Part[] {
  const { width: w, depth: d, height: h } = box;
  const parts = table(w, d, h, settings.top === 'round');
  if (settings.top === 'round') return parts;
  const legs = parts.filter((p) => p.shape === 'leg');
  const legWidth = itemAt(legs, 0, 'leg').w;
  const lx = Math.max(...legs.map((l) => l.x)) + legWidth / 2;
  const ly = Math.max(...legs.map((l) => l.y)) + legWidth / 2;
  const shelfZ = h * 0.22;
  parts.push(panelPart(-lx, lx, -ly, ly, shelfZ, shelfZ + clamp(h * 0.04, 10, 20), { slot: 'main' }));
  return parts;
}

/** A side table: a small round top on a pedestal, or a square one on four legs. */
export function sideTableForm(box: FormBox, settings: PieceSettings): Part[] {
  return table(box.width, box.depth, box.height, settings.top !== 'rectangular');
}

/** A door or drawer front is this thick, mm (common practice). */
export const FRONT_THICKNESS_MM = 18;
/** How far behind `front` a carcass with fronts and handles ends: handles stay inside the box. */
export const FRONTS_DEPTH_MM = HANDLE_PROUD_MM + FRONT_THICKNESS_MM;

/** Drawer fronts stacked from z0 to z1 across x0..x1, handles reaching out to `front` (piece y, mm), each drawer with its handle. */
export function drawerFronts(x0: number, x1: number, front: number, z0: number, z1: number, count: number, gap = 4): Part[] {
  const parts: Part[] = [];
  const step = (z1 - z0) / count;
  const face = front - HANDLE_PROUD_MM;
  for (let i = 0; i < count; i++) {
    const a = z0 + i * step + gap / 2;
    const b = z0 + (i + 1) * step - gap / 2;
    parts.push(panelPart(x0 + gap / 2, x1 - gap / 2, face - FRONT_THICKNESS_MM, face, a, b, { role: 'front' }));
    parts.push(handlePart((x0 + x1) / 2, front, (a + b) / 2, clamp((x1 - x0) * 0.35, 60, 300), false));
  }
  return parts;
}

/** Doors side by side across x0..x1 from z0 to z1, handles at their meeting edges (or their free edge), reaching out to `front`. */
export function doorFronts(
  x0: number,
  x1: number,
  front: number,
  z0: number,
  z1: number,
  count: number,
  handleAt: 'middle' | 'top' | 'bottom' = 'middle',
  gap = 4,
): Part[] {
  const parts: Part[] = [];
  const step = (x1 - x0) / count;
  const face = front - HANDLE_PROUD_MM;
  const length = clamp((z1 - z0) * 0.25, 60, 400);
  const hz = handleAt === 'top' ? z1 - length / 2 - 40 : handleAt === 'bottom' ? z0 + length / 2 + 40 : (z0 + z1) / 2;
  for (let i = 0; i < count; i++) {
    const a = x0 + i * step + gap / 2;
    const b = x0 + (i + 1) * step - gap / 2;
    parts.push(panelPart(a, b, face - FRONT_THICKNESS_MM, face, z0 + gap / 2, z1 - gap / 2, { role: 'front' }));
    // Pairs open from where they meet: the left door of a pair has its handle on its right edge.
    const edge = i % 2 === 0 ? b - 40 : a + 40;
    parts.push(
      handlePart(
        Math.min(Math.max(edge, a + 15), b - 15),
        front,
        Math.min(Math.max(hz, z0 + length / 2), z1 - length / 2),
        length,
        true,
      ),
    );
  }
  return parts;
}

/** A bedside table: a small cabinet on short legs with drawers above an open shelf. */
export function bedsideTableForm(box: FormBox, settings: PieceSettings): Part[] {
  const { width: w, depth: d, height: h } = box;
  const legs = clamp(h * 0.15, 20, 120);
  const drawers = settings.count ?? 1;
  const parts: Part[] = [
    ...fourLegs(-w / 2, w / 2, -d / 2, d / 2 - FRONTS_DEPTH_MM, legs, clamp(w * 0.06, 18, 35), 10, 0.75),
    boxPart(-w / 2, w / 2, -d / 2, d / 2 - FRONTS_DEPTH_MM, legs, h),
  ];
  const drawerBottom = legs + (h - legs) * 0.45;
  parts.push(...drawerFronts(-w / 2 + 15, w / 2 - 15, d / 2, drawerBottom, h - 15, drawers));
  return parts;
}

/** A desk: a top on two side panels and a modesty panel at the back, with a drawer unit under the right. */
export function deskForm(box: FormBox, settings: PieceSettings): Part[] {
  const { width: w, depth: d, height: h } = box;
  const thick = clamp(h * 0.04, 18, 35);
  const under = h - thick;
  const panel = clamp(w * 0.02, 18, 30);
  const drawers = settings.count ?? 1;
  const parts: Part[] = [
    panelPart(-w / 2, -w / 2 + panel, -d / 2, d / 2 - 20, 0, under, { slot: 'accent' }),
    panelPart(w / 2 - panel, w / 2, -d / 2, d / 2 - 20, 0, under, { slot: 'accent' }),
    panelPart(-w / 2 + panel, w / 2 - panel, -d / 2 + 20, -d / 2 + 20 + panel, under * 0.4, under, {
      slot: 'accent',
      role: 'back',
    }),
    roundedPart(-w / 2, w / 2, -d / 2, d / 2, under, h, 8, { role: 'top' }),
  ];
  if (drawers > 0) {
    const unitW = Math.min(420, w * 0.35);
    const x1 = w / 2 - panel;
    const bottom = under - Math.min(under * 0.6, 150 * drawers);
    parts.push(boxPart(x1 - unitW, x1, -d / 2 + 40, d / 2 - 20 - FRONTS_DEPTH_MM, bottom, under));
    parts.push(...drawerFronts(x1 - unitW, x1, d / 2 - 20, bottom, under, drawers));
  }
  return parts;
}
