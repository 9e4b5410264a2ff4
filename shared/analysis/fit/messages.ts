// Words for findings: designers read them as plain sentences, so pieces go by their names and
// lengths by whole centimetres.
import type { Piece } from '../../schemas/option';

const MM_PER_CM = 10;

/** A length in mm as a whole number of centimetres. */
export function wholeCm(lengthMm: number): number {
  return Math.round(lengthMm / MM_PER_CM);
}

/** A length in mm as whole centimetres for a sentence ("62 cm"). */
export function cmText(lengthMm: number): string {
  return `${wholeCm(lengthMm)} cm`;
}

/** A length in mm rounded to 10 mm, as findings report measured gaps (a tape on site reads no closer). */
export function roundToCmMm(lengthMm: number): number {
  return Math.round(lengthMm / MM_PER_CM) * MM_PER_CM;
}

/**
 * "the wardrobe" for a piece named "Wardrobe": the first letter is lowered unless the name opens
 * with a run of capitals ("TV unit"), which reads as an abbreviation. A piece with no name goes by its id.
 */
export function theName(piece: Pick<Piece, 'id' | 'name'>): string {
  const name = piece.name.trim();
  if (name === '') return `the piece “${piece.id}”`;
  const opensWithAbbreviation = name.length > 1 && /\p{Lu}/u.test(name.charAt(1));
  return `the ${opensWithAbbreviation ? name : name.charAt(0).toLocaleLowerCase() + name.slice(1)}`;
}

/** A sentence's first letter in capitals ("The wardrobe …"). */
export function capitalise(text: string): string {
  return text === '' ? text : text.charAt(0).toUpperCase() + text.slice(1);
}
