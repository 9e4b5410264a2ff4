// The parts a form is made of, in the piece's own frame (mm): x along its width (−w/2 … w/2),
// y along its depth with the front at +y (−d/2 … d/2), z up from the box's underside (0 … h).
// Every part is upright and square to the piece, so its plan footprint is a rectangle (a circle
// for round parts) and the checks on it stay simple.
import type { PieceSettings } from '../../schemas/piece-kind';

/**
 * Which finish a part wears: the piece's main one (upholstery, carcass, top), its accent (legs,
 * frame, handles), or its own fixed colour (`colour`: bedding, glass, leaves), which no finish changes.
 */
export type MaterialSlot = 'main' | 'accent' | 'own';

/**
 * What a part is to the form, for tests and the plan: the front (seat, doors, drawer fronts) faces
 * +y, the back (backrest, headboard) sits towards −y.
 */
export type PartRole = 'front' | 'back' | 'body' | 'leg' | 'top' | 'hanging';

/**
 * box: a plain box. rounded: a box whose plan corners are rounded by `radius` (a disc when the
 * radius is half of both sides). leg: an upright round post of diameter w (= d), narrowing to
 * `taper` × w at its foot (1 straight). panel: a thin box (shelves, doors, boards, rugs).
 */
export type PartShape = 'box' | 'rounded' | 'leg' | 'panel';

export interface Part {
  shape: PartShape;
  /** Centre of the footprint, piece frame mm. */
  x: number;
  y: number;
  /** Underside above the box's underside, mm. */
  z: number;
  w: number;
  d: number;
  h: number;
  slot: MaterialSlot;
  role: PartRole;
  radius?: number;
  /** The colour of an `own` part, e.g. '#f4f1ea'. */
  colour?: string;
  /** leg: foot diameter over top diameter (1 straight, below 1 tapered towards the floor, above 1 wider at the foot). */
  taper?: number;
}

/** The box a form fills, mm. */
export interface FormBox {
  width: number;
  depth: number;
  height: number;
}

export type FormBuilder = (box: FormBox, settings: PieceSettings) => Part[];

type PartOptions = { slot?: MaterialSlot; role?: PartRole; colour?: string };

/**
 * Every part is made here, all its fields set in one order (those it has no use for undefined), so
 * that every part has the same shape to the engine: code reading parts then meets one shape rather
 * than one per kind of part, which is what a room's first build, before anything is compiled,
 * spends much of its time learning.
 */
function makePart(
  shape: PartShape,
  x: number,
  y: number,
  z: number,
  w: number,
  d: number,
  h: number,
  slot: MaterialSlot,
  role: PartRole,
  radius: number | undefined,
  colour: string | undefined,
  taper: number | undefined,
): Part {
  return { shape, x, y, z, w, d, h, slot, role, radius, colour, taper };
}

/** A part of `shape` from its x, y, z extents; a colour makes it an own-coloured part. */
function extentsPart(
  shape: PartShape,
  x0: number,
  x1: number,
  y0: number,
  y1: number,
  z0: number,
  z1: number,
  o: PartOptions,
  radius: number | undefined,
): Part {
  const colour = o.colour ? o.colour : undefined;
  return makePart(
    shape,
    (x0 + x1) / 2,
    (y0 + y1) / 2,
    z0,
    x1 - x0,
    y1 - y0,
    z1 - z0,
    colour ? 'own' : (o.slot ?? 'main'),
    o.role ?? 'body',
    radius,
    colour,
    undefined,
  );
}

/** A box from its x, y, z extents (piece frame mm). */
export function boxPart(x0: number, x1: number, y0: number, y1: number, z0: number, z1: number, o: PartOptions = {}): Part {
  return extentsPart('box', x0, x1, y0, y1, z0, z1, o, undefined);
}

/** A thin board from its extents (its thinnest side is the panel's thickness). */
export function panelPart(x0: number, x1: number, y0: number, y1: number, z0: number, z1: number, o: PartOptions = {}): Part {
  return extentsPart('panel', x0, x1, y0, y1, z0, z1, o, undefined);
}

/** A box with rounded plan corners, at most half its shorter side. */
export function roundedPart(
  x0: number,
  x1: number,
  y0: number,
  y1: number,
  z0: number,
  z1: number,
  radius: number,
  o: PartOptions = {},
): Part {
  const r = Math.max(0, Math.min(radius, (x1 - x0) / 2, (y1 - y0) / 2));
  return extentsPart('rounded', x0, x1, y0, y1, z0, z1, o, r);
}

/** A disc or drum of diameter `diameter` centred at (x, y). */
export function discPart(x: number, y: number, diameter: number, z0: number, z1: number, o: PartOptions = {}): Part {
  return roundedPart(x - diameter / 2, x + diameter / 2, y - diameter / 2, y + diameter / 2, z0, z1, diameter / 2, o);
}

/** An upright round post at (x, y), `diameter` at its top, from z0 to z1; `taper` is its foot's share of that. */
export function legPart(x: number, y: number, diameter: number, z0: number, z1: number, taper = 1, o: PartOptions = {}): Part {
  const colour = o.colour ? o.colour : undefined;
  const slot = colour ? 'own' : (o.slot ?? 'accent');
  return makePart('leg', x, y, z0, diameter, diameter, z1 - z0, slot, o.role ?? 'leg', undefined, colour, taper);
}

/** `p` moved to (x, y) with plan sides w × d, everything else as it is. */
const placedAs = (p: Part, x: number, y: number, w: number, d: number): Part =>
  makePart(p.shape, x, y, p.z, w, d, p.h, p.slot, p.role, p.radius, p.colour, p.taper);

/** Four legs inset `inset` from the corners of the rectangle x0..x1, y0..y1, from the floor up to `top`. */
export function fourLegs(
  x0: number,
  x1: number,
  y0: number,
  y1: number,
  top: number,
  diameter: number,
  inset: number,
  taper = 1,
  o: PartOptions = {},
): Part[] {
  const r = diameter / 2 + inset;
  return [
    legPart(x0 + r, y0 + r, diameter, 0, top, taper, o),
    legPart(x1 - r, y0 + r, diameter, 0, top, taper, o),
    legPart(x0 + r, y1 - r, diameter, 0, top, taper, o),
    legPart(x1 - r, y1 - r, diameter, 0, top, taper, o),
  ];
}

/** Parts turned a quarter turn `quarters` times clockwise seen from above (x → y), about the frame's origin. */
export function turnParts(parts: readonly Part[], quarters: number): Part[] {
  const q = ((quarters % 4) + 4) % 4;
  return parts.map((p) => {
    let { x, y, w, d } = p;
    for (let i = 0; i < q; i++) [x, y, w, d] = [-y, x, d, w];
    return placedAs(p, x, y, w, d);
  });
}

/** Parts moved by (dx, dy) on the plan. */
export function moveParts(parts: readonly Part[], dx: number, dy: number): Part[] {
  return parts.map((p) => placedAs(p, p.x + dx, p.y + dy, p.w, p.d));
}

/** Parts mirrored left to right (x → −x). */
export function mirrorParts(parts: readonly Part[]): Part[] {
  return parts.map((p) => placedAs(p, -p.x, p.y, p.w, p.d));
}

/** `value` held between lo and hi. */
export function clamp(value: number, lo: number, hi: number): number {
  return Math.min(hi, Math.max(lo, value));
}

/** Handle bar proportions: this thick off the front and this tall, mm (common practice). */
export const HANDLE_PROUD_MM = 20;
export const HANDLE_SIZE_MM = 16;

/** A small handle bar on a front face at y = front − its proudness, centred at (x, z), `length` long horizontally or upright. */
export function handlePart(x: number, front: number, z: number, length: number, upright: boolean): Part {
  const half = length / 2;
  const s = HANDLE_SIZE_MM / 2;
  return upright
    ? boxPart(x - s, x + s, front - HANDLE_PROUD_MM, front, z - half, z + half, { slot: 'accent', role: 'front' })
    : boxPart(x - half, x + half, front - HANDLE_PROUD_MM, front, z - s, z + s, { slot: 'accent', role: 'front' });
}
