// Which fit-check findings of an option the designer marked as seen and intended: the open ones first,
// then the seen ones with their marks, each group in the check's own order. The editor lists them so
// and the compare table counts them apart.
import type { SeenMark } from '../schemas/option';
import type { Finding } from './fit/finding';
import { findingKey } from './fit/finding-key';

/** A finding with its place in the check's list, its key and its seen mark (null while open). */
export interface KeyedFinding {
  finding: Finding;
  /** Its place in the list the check gave. */
  index: number;
  key: string;
  mark: SeenMark | null;
}

/** The findings split into open and seen; marks whose finding is not in the list are left out. */
export function sortBySeen(
  findings: readonly Finding[],
  marks: readonly SeenMark[],
): { open: KeyedFinding[]; seen: KeyedFinding[] } {
  const byKey = new Map(marks.map((mark) => [mark.key, mark]));
  const open: KeyedFinding[] = [];
  const seen: KeyedFinding[] = [];
  findings.forEach((finding, index) => {
    const key = findingKey(finding);
    const mark = byKey.get(key) ?? null;
    (mark ? seen : open).push({ finding, index, key, mark });
  });
  return { open, seen };
}
