// A piece's size in words, the one way the schedule, its CSV and the client's page write it:
// centimetres to one place, half a millimetre rounding up.
const MM_PER_CM = 10;

/** Millimetres as centimetres to one decimal place, without trailing zeros: 855 → "85.5", 900 → "90". */
export function decimalCmText(mm: number): string {
  return String(Math.round(mm) / MM_PER_CM);
}

/** "200 × 90 × 80 cm": a piece's width × depth × height. */
export function pieceSizeText(size: { width: number; depth: number; height: number }): string {
  return `${decimalCmText(size.width)} × ${decimalCmText(size.depth)} × ${decimalCmText(size.height)} cm`;
}
