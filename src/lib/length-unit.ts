// The length unit a person chose, remembered in this browser: the room editor sets it, the
// libraries read it to show sizes the same way; and the reader's locale, which groups the thousands
// of sizes in labels.
import { DEFAULT_LENGTH_UNIT, lengthUnitSchema, type LengthUnit } from '../../shared/units/length';

export const UNIT_KEY = 'parlour:length-unit';

/** The unit stored in this browser, or the default when none (or something unknown) is stored. */
export function storedUnit(stored: string | null): LengthUnit {
  const parsed = lengthUnitSchema.safeParse(stored);
  return parsed.success ? parsed.data : DEFAULT_LENGTH_UNIT;
}

/** The length unit this browser last chose. */
export function readUnit(): LengthUnit {
  try {
    return storedUnit(localStorage.getItem(UNIT_KEY));
  } catch {
    return DEFAULT_LENGTH_UNIT;
  }
}

/** The browser's language (BCP 47), for grouping the figures of labels as this reader writes them. */
export function readerLocale(): string | undefined {
  return typeof navigator === 'undefined' ? undefined : navigator.language || undefined;
}
