// "Changed since you last saw it": each browser remembers the version of every option it showed;
// before its first look it compares with the version the link was made with. What this page load
// found stays for the whole visit, so the mark does not vanish the moment the option is shown.
import type { ClientOption } from '../../../../shared/schemas/presentation';

type Versions = Pick<ClientOption, 'id' | 'version' | 'sentVersion'>;

const storageKey = (optionId: string) => `parlour:seen-version:${optionId}`;
const foundThisVisit = new Map<string, boolean>();

function storedVersion(optionId: string): number | null {
  try {
    const n = Number(localStorage.getItem(storageKey(optionId)));
    return Number.isInteger(n) && n > 0 ? n : null;
  } catch {
    return null;
  }
}

/** Whether the option was saved since this browser last showed it (or since the link was made). */
export function changedSinceSeen(option: Versions): boolean {
  let changed = foundThisVisit.get(option.id);
  if (changed === undefined) {
    const seen = storedVersion(option.id) ?? option.sentVersion;
    changed = seen !== null && seen !== option.version;
    foundThisVisit.set(option.id, changed);
  }
  return changed;
}

/** Notes the version shown now, for the next visit. */
export function rememberSeen(option: Versions): void {
  changedSinceSeen(option);
  try {
    localStorage.setItem(storageKey(option.id), String(option.version));
  } catch {
    // Blocked storage only means the mark compares with the link's versions next time too.
  }
}
