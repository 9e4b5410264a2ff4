// How a piece reads on the plan: its label's size and place (inside when it fits, else beside),
// and a label colour that stands out from the piece's fill.
import { pieceBoundsMm } from '../../../../../shared/geometry/piece';
import type { Piece } from '../../../../../shared/schemas/option';
import { planColour } from './plan-style';

export const LABEL_DARK = planColour.labelDark;
export const LABEL_LIGHT = planColour.labelLight;
/** About 0.55 em per character in Manrope (measured by eye on the plan; common practice for a proportional face). */
const EM_PER_CHARACTER = 0.55;
/** A label smaller than this share of the plan's text size is too small to read: it goes beside the piece instead. */
const SMALLEST_LABEL = 0.55;

/** Relative luminance of an sRGB colour given as '#rrggbb' (WCAG 2.x definition). */
export function relativeLuminance(hex: string): number {
  const channel = (i: number) => {
    const c = parseInt(hex.slice(1 + 2 * i, 3 + 2 * i), 16) / 255;
    return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
  };
  return 0.2126 * channel(0) + 0.7152 * channel(1) + 0.0722 * channel(2);
}

/** WCAG 2.x contrast ratio of two colours, 1 to 21. */
export function contrastRatio(a: string, b: string): number {
  const [hi, lo] = [relativeLuminance(a), relativeLuminance(b)].sort((x, y) => y - x);
  return (hi + 0.05) / (lo + 0.05);
}

/** The label colour, dark or light, that contrasts more with the piece's fill. */
export function labelColourOn(fill: string): string {
  return contrastRatio(fill, LABEL_DARK) >= contrastRatio(fill, LABEL_LIGHT) ? LABEL_DARK : LABEL_LIGHT;
}

export interface LabelLayout {
  /** Font size, plan mm. */
  size: number;
  /** Degrees, kept between −90 and 90 so the text never reads upside down. */
  angle: number;
  /** Inside the piece, or beside it (below its box on the plan) when it would not fit. */
  inside: boolean;
  /** Where the label's middle goes, plan mm. */
  at: [number, number];
}

/** Where and how big a piece's name goes so it stays inside the piece, or beside it when the piece is too small. `text` is the plan's text size (mm). */
export function labelLayout(piece: Pick<Piece, 'x' | 'y' | 'width' | 'depth' | 'rotation' | 'name'>, text: number): LabelLayout {
  const along = piece.width >= piece.depth;
  let angle = piece.rotation + (along ? 0 : 90);
  angle = ((angle % 360) + 360) % 360;
  if (angle > 90 && angle <= 270) angle -= 180;
  if (angle > 180) angle -= 360;
  const long = Math.max(piece.width, piece.depth);
  const short = Math.min(piece.width, piece.depth);
  const fit = (long * 0.9) / Math.max(1, piece.name.length * EM_PER_CHARACTER);
  const size = Math.min(text * 0.95, fit, short * 0.6);
  if (size >= text * SMALLEST_LABEL) return { size, angle, inside: true, at: [piece.x, piece.y] };
  // Beside: unturned, just below the piece's turned box on the plan.
  const halfHeight = pieceBoundsMm(piece).maxY - piece.y;
  const besideSize = text * SMALLEST_LABEL * 1.2;
  return { size: besideSize, angle: 0, inside: false, at: [piece.x, piece.y + halfHeight + besideSize * 0.9] };
}

/** The label's width in plan mm at its size, for tests and for fitting. */
export function labelWidth(name: string, size: number): number {
  return name.length * EM_PER_CHARACTER * size;
}
