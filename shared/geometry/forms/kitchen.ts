// Kitchen units: base units with a worktop, wall units, the tall oven housing and the dishwasher.
// They stay pieces (one option may have a kitchen the other has not) and their fronts face +y.
import type { PieceSettings } from '../../schemas/piece-kind';
import { WORKTOP_HEIGHT, fitDefault } from './ergonomics';
import { boxPart, clamp, handlePart, panelPart, type FormBox, type Part } from './parts';
import { FRONTS_DEPTH_MM, FRONT_THICKNESS_MM, doorFronts, drawerFronts } from './tables';

/** Kitchen plinth (kick board) height, mm (common practice, 100–150). */
const PLINTH_MM = 120;
/** Worktop thickness, mm (common practice, 38–40 laminate or timber). */
const WORKTOP_MM = 38;
/** The dark glass of an oven door and a dishwasher's control strip. */
const DARK_GLASS = '#2d2f31';
/** A freestanding dishwasher's brushed steel front, so it reads as an appliance beside the units. */
const STEEL = '#b4b8ba';

interface BaseFrame {
  kick: number;
  worktopTop: number;
  frontTop: number;
  back: number;
}

function baseFrame(box: FormBox): BaseFrame {
  const kick = Math.min(PLINTH_MM, box.height * 0.13);
  const worktopTop = Math.min(box.height, fitDefault(WORKTOP_HEIGHT, box.height, 1));
  return { kick, worktopTop, frontTop: worktopTop - WORKTOP_MM - 3, back: box.depth / 2 - FRONTS_DEPTH_MM };
}

function worktopAndPlinth(box: FormBox, f: BaseFrame): Part[] {
  const { width: w, depth: d } = box;
  return [
    boxPart(-w / 2, w / 2, -d / 2, f.back - 50, 0, f.kick, { slot: 'accent' }),
    boxPart(-w / 2, w / 2, -d / 2, d / 2, f.worktopTop - WORKTOP_MM, f.worktopTop, { slot: 'accent', role: 'top' }),
  ];
}

/** A base unit: kick plinth, carcass, doors or drawers, worktop (accent) over it. */
export function kitchenBaseUnitForm(box: FormBox, settings: PieceSettings): Part[] {
  const { width: w, depth: d } = box;
  const f = baseFrame(box);
  const count = settings.count ?? Math.max(1, Math.round(w / 600));
  const parts = [...worktopAndPlinth(box, f), boxPart(-w / 2, w / 2, -d / 2, f.back, f.kick, f.worktopTop - WORKTOP_MM)];
  if (settings.fronts === 'drawers') {
    const step = w / count;
    for (let i = 0; i < count; i++)
      parts.push(...drawerFronts(-w / 2 + i * step, -w / 2 + (i + 1) * step, d / 2 - 25, f.kick, f.frontTop, 3));
  } else {
    // A drawer over the doors, as most base units have.
    const drawerBottom = f.frontTop - Math.min(150, (f.frontTop - f.kick) * 0.2);
    const step = w / count;
    for (let i = 0; i < count; i++)
      parts.push(...drawerFronts(-w / 2 + i * step, -w / 2 + (i + 1) * step, d / 2 - 25, drawerBottom, f.frontTop, 1));
    parts.push(...doorFronts(-w / 2, w / 2, d / 2 - 25, f.kick, drawerBottom, count, 'top'));
  }
  return parts;
}

/** A wall unit: carcass and doors with handles along their lower edge. */
export function kitchenWallUnitForm(box: FormBox, settings: PieceSettings): Part[] {
  const { width: w, depth: d, height: h } = box;
  const doors = settings.count ?? Math.max(1, Math.round(w / 500));
  return [
    boxPart(-w / 2, w / 2, -d / 2, d / 2 - FRONTS_DEPTH_MM, 0, h),
    ...doorFronts(-w / 2, w / 2, d / 2, 0, h, doors, 'bottom'),
  ];
}

/** A tall housing: plinth, a drawer, the oven's dark glass door with a bar handle at eye level, a cupboard above. */
export function ovenHousingForm(box: FormBox): Part[] {
  const { width: w, depth: d, height: h } = box;
  const kick = Math.min(PLINTH_MM, h * 0.06);
  const back = d / 2 - FRONTS_DEPTH_MM;
  const ovenBottom = clamp(h * 0.38, kick + 50, h - 200);
  const ovenTop = Math.min(h - 40, ovenBottom + clamp(h * 0.28, 100, 600));
  const face = d / 2 - 20;
  return [
    boxPart(-w / 2, w / 2, -d / 2, back - 50, 0, kick, { slot: 'accent' }),
    boxPart(-w / 2, w / 2, -d / 2, back, kick, h),
    ...drawerFronts(-w / 2, w / 2, d / 2, kick, ovenBottom, 2),
    panelPart(-w / 2 + 4, w / 2 - 4, face - FRONT_THICKNESS_MM, face, ovenBottom + 2, ovenTop - 2, {
      colour: DARK_GLASS,
      role: 'front',
    }),
    handlePart(0, d / 2, ovenTop - 50, w * 0.7, false),
    ...doorFronts(-w / 2, w / 2, d / 2, ovenTop, h, 1, 'bottom'),
  ];
}

/** A dishwasher: one tall steel front under the worktop with a dark control strip and a bar handle along its top. */
export function dishwasherForm(box: FormBox): Part[] {
  const { width: w, depth: d } = box;
  const f = baseFrame(box);
  const face = d / 2 - 25 - 20;
  const strip = Math.min(70, (f.frontTop - f.kick) * 0.12);
  return [
    ...worktopAndPlinth(box, f),
    boxPart(-w / 2, w / 2, -d / 2, f.back - 25, f.kick, f.worktopTop - WORKTOP_MM, { colour: '#c9cbcc' }),
    panelPart(-w / 2 + 2, w / 2 - 2, face - FRONT_THICKNESS_MM, face, f.kick + 2, f.frontTop - strip, {
      colour: STEEL,
      role: 'front',
    }),
    panelPart(-w / 2 + 2, w / 2 - 2, face - FRONT_THICKNESS_MM, face, f.frontTop - strip, f.frontTop, {
      colour: DARK_GLASS,
      role: 'front',
    }),
    handlePart(0, d / 2 - 25, f.frontTop - strip - 40, w * 0.8, false),
  ];
}
