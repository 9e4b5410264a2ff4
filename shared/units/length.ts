// Lengths for people: the units they see and type (mm, cm, m, in, ft and in), parseLength from typed
// text to millimetres, and formatLength from millimetres back to text.
import { z } from 'zod';

/** The unit a person sees and types lengths in; a bare number means this unit ('ftin' takes a bare number as feet). */
export const lengthUnitSchema = z.enum(['mm', 'cm', 'm', 'in', 'ftin']);
export type LengthUnit = z.infer<typeof lengthUnitSchema>;

export const DEFAULT_LENGTH_UNIT: LengthUnit = 'cm';

/** 1 in = 25.4 mm exactly (NIST SP 811 (2008) §B.6). */
export const MM_PER_INCH = 25.4;
/** 1 ft = 12 in = 304.8 mm exactly (NIST SP 811 (2008) §B.6). */
export const MM_PER_FOOT = 12 * MM_PER_INCH;

/** Anything longer than this is almost certainly a unit slip (4200 typed with cm set), so it is refused. */
export const MAX_LENGTH_MM = 1_000_000;

export type ParseLengthResult = { ok: true; mm: number } | { ok: false; message: string };

export interface ParseLengthOptions {
  /** Elevations below the floor or signed offsets may be negative; sizes and wall lengths may not. */
  allowNegative?: boolean;
}

/** The units a typed length can name; feet-and-inches is written as ft then in. */
type TypedUnit = Exclude<LengthUnit, 'ftin'> | 'ft';

const MM_PER_UNIT: Record<TypedUnit, number> = {
  mm: 1,
  cm: 10,
  m: 1000,
  in: MM_PER_INCH,
  ft: MM_PER_FOOT,
};

// Every spelling people type, mapped to one unit key; quotes and primes are the imperial marks.
const UNIT_WORDS: Record<string, TypedUnit> = {
  mm: 'mm',
  millimetre: 'mm',
  millimetres: 'mm',
  millimeter: 'mm',
  millimeters: 'mm',
  cm: 'cm',
  centimetre: 'cm',
  centimetres: 'cm',
  centimeter: 'cm',
  centimeters: 'cm',
  m: 'm',
  metre: 'm',
  metres: 'm',
  meter: 'm',
  meters: 'm',
  in: 'in',
  inch: 'in',
  inches: 'in',
  '"': 'in',
  "''": 'in',
  ft: 'ft',
  foot: 'ft',
  feet: 'ft',
  "'": 'ft',
};

const EXAMPLE_HINT = 'Try 420, 4.2m or 13\' 9".';

type Token = { kind: 'number'; value: number; fraction: boolean } | { kind: 'unit'; unit: TypedUnit };

function normaliseMarks(text: string): string {
  return text
    .trim()
    .toLowerCase()
    .replace(/[\u2032\u2019\u2018\u00b4`]/g, "'")
    .replace(/[\u2033\u201c\u201d]/g, '"')
    .replace(/\u2212/g, '-');
}

// A comma followed by one or two digits is a decimal comma (4,2 m); anything else with a comma is
// ambiguous with a thousands separator, so it is refused rather than guessed.
function normaliseDecimalComma(text: string): string | null {
  if (!text.includes(',')) return text;
  const replaced = text.replace(/(\d),(\d{1,2})(?!\d)/g, '$1.$2');
  return replaced.includes(',') ? null : replaced;
}

function tokenise(text: string): Token[] | null {
  const tokens: Token[] = [];
  const pattern = /\s*(?:(\d+)\s*\/\s*(\d+)|(\d+(?:\.\d*)?|\.\d+)|(''|'|"|[a-z]+))/y;
  let index = 0;
  while (index < text.length) {
    pattern.lastIndex = index;
    const match = pattern.exec(text);
    if (!match) {
      if (text.slice(index).trim() === '') break;
      return null;
    }
    index = pattern.lastIndex;
    if (match[1] !== undefined) {
      const denominator = Number(match[2]);
      if (denominator === 0) return null;
      tokens.push({ kind: 'number', value: Number(match[1]) / denominator, fraction: true });
    } else if (match[3] !== undefined) {
      tokens.push({ kind: 'number', value: Number(match[3]), fraction: false });
    } else {
      const unit = UNIT_WORDS[match[4] ?? ''];
      if (!unit) return null;
      tokens.push({ kind: 'unit', unit });
    }
  }
  return tokens;
}

interface Term {
  value: number;
  unit: TypedUnit | null;
}

// Folds "9 1/2" into 9.5 and pairs each quantity with the unit after it (if any).
function toTerms(tokens: Token[]): Term[] | null {
  const terms: Term[] = [];
  let pending: { value: number; hasFraction: boolean; parts: number } | null = null;
  for (const token of tokens) {
    if (token.kind === 'number') {
      if (pending && token.fraction && !pending.hasFraction && pending.parts === 1) {
        pending = { value: pending.value + token.value, hasFraction: true, parts: 2 };
      } else {
        if (pending) terms.push({ value: pending.value, unit: null });
        pending = { value: token.value, hasFraction: token.fraction, parts: 1 };
      }
    } else {
      if (!pending) return null;
      terms.push({ value: pending.value, unit: token.unit });
      pending = null;
    }
  }
  if (pending) terms.push({ value: pending.value, unit: null });
  return terms;
}

function termsToMm(terms: Term[], bareUnit: LengthUnit): number | null {
  if (terms.length === 1) {
    const term = terms[0]!;
    const unit = term.unit ?? (bareUnit === 'ftin' ? 'ft' : bareUnit);
    return term.value * MM_PER_UNIT[unit];
  }
  // Two quantities are only read as feet then inches: 13' 9", 13ft 9in, or 13' 9 with the inch mark left off.
  const [feet, inches] = terms;
  if (terms.length === 2 && feet?.unit === 'ft' && (inches?.unit === 'in' || inches?.unit === null)) {
    return feet.value * MM_PER_FOOT + inches.value * MM_PER_INCH;
  }
  return null;
}

/** Reads a typed length into millimetres; a bare number is in `unit` (feet for 'ftin'). */
export function parseLength(
  text: string,
  unit: LengthUnit = DEFAULT_LENGTH_UNIT,
  options: ParseLengthOptions = {},
): ParseLengthResult {
  const marked = normaliseMarks(text);
  if (marked === '') return { ok: false, message: `Enter a length. ${EXAMPLE_HINT}` };
  const negative = marked.startsWith('-');
  const body = normaliseDecimalComma(negative ? marked.slice(1) : marked);
  if (body === null) return { ok: false, message: `“${text.trim()}”: use a point for decimals, e.g. 4.2m.` };
  const tokens = tokenise(body);
  const terms = tokens ? toTerms(tokens) : null;
  const magnitudeMm = terms && terms.length > 0 ? termsToMm(terms, unit) : null;
  if (magnitudeMm === null || !Number.isFinite(magnitudeMm)) {
    return { ok: false, message: `“${text.trim()}” is not a length. ${EXAMPLE_HINT}` };
  }
  if (negative && magnitudeMm > 0 && !options.allowNegative) {
    return { ok: false, message: 'A length here cannot be negative.' };
  }
  if (magnitudeMm > MAX_LENGTH_MM) {
    return { ok: false, message: `“${text.trim()}” is more than 1 km. Check the unit.` };
  }
  return { ok: true, mm: negative ? -magnitudeMm : magnitudeMm };
}

export interface FormatLengthOptions {
  /** Inch fractions for 'in' and 'ftin': 8 rounds to the nearest 1/8 in, 2 to the nearest 1/2 in. */
  inchDenominator?: 2 | 4 | 8 | 16;
  /**
   * For labels (never fields, which must read back): the reader's BCP 47 locale, so large figures
   * group their thousands as the reader writes them ("210,000 mm", "210.000 mm" in German).
   */
  locale?: string;
}

/** Writes a number with at most `digits` decimals (exactly `digits` when `fixed`), grouped in a locale when it has one. */
type NumberWriter = (value: number, digits: 0 | 1 | 2, fixed?: boolean) => string;

const plainNumber: NumberWriter = (value, digits, fixed) =>
  fixed ? value.toFixed(digits) : String(Number(value.toFixed(digits)));
const groupedNumbers = new Map<string, NumberWriter>();
function numberWriter(locale: string | undefined): NumberWriter {
  if (!locale) return plainNumber;
  let writer = groupedNumbers.get(locale);
  if (!writer) {
    const format = (digits: number, fixed: boolean) =>
      new Intl.NumberFormat(locale, { maximumFractionDigits: digits, minimumFractionDigits: fixed ? digits : 0 });
    const formats = [0, 1, 2].map((digits) => [format(digits, false), format(digits, true)] as const);
    writer = (value, digits, fixed) => formats[digits]![fixed ? 1 : 0].format(Number(value.toFixed(digits)));
    groupedNumbers.set(locale, writer);
  }
  return writer;
}

function formatFractionalInches(steps: number, denominator: number, write: NumberWriter = plainNumber): string {
  const whole = Math.floor(steps / denominator);
  let numerator = steps - whole * denominator;
  let reduced = denominator;
  while (numerator > 0 && numerator % 2 === 0) {
    numerator /= 2;
    reduced /= 2;
  }
  if (numerator === 0) return `${write(whole, 0)}"`;
  return whole === 0 ? `${numerator}/${reduced}"` : `${write(whole, 0)} ${numerator}/${reduced}"`;
}

/** Writes millimetres for a person in `unit`: "420 cm", "4.20 m", "4200 mm", 13' 9 1/2", 165 1/2". */
export function formatLength(mm: number, unit: LengthUnit = DEFAULT_LENGTH_UNIT, options: FormatLengthOptions = {}): string {
  const text = formatMagnitude(Math.abs(mm), unit, options.inchDenominator ?? 8, numberWriter(options.locale));
  // A tiny negative value that rounds to nothing is printed without a minus sign.
  return mm < 0 && /[1-9]/.test(text) ? `-${text}` : text;
}

function formatMagnitude(magnitude: number, unit: LengthUnit, denominator: number, write: NumberWriter): string {
  switch (unit) {
    case 'mm':
      return `${write(magnitude, 0)} mm`;
    case 'cm':
      return `${write(magnitude / 10, 1)} cm`;
    case 'm':
      return `${write(magnitude / 1000, 2, true)} m`;
    case 'in': {
      const steps = Math.round((magnitude / MM_PER_INCH) * denominator);
      return formatFractionalInches(steps, denominator, write);
    }
    case 'ftin': {
      const steps = Math.round((magnitude / MM_PER_INCH) * denominator);
      const stepsPerFoot = 12 * denominator;
      const feet = Math.floor(steps / stepsPerFoot);
      const inches = formatFractionalInches(steps - feet * stepsPerFoot, denominator);
      return feet === 0 ? inches : `${write(feet, 0)}' ${inches}`;
    }
  }
}
