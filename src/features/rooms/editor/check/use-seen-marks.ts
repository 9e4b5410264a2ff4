// The active option's seen marks for the Check step: its findings split into open and seen, and the
// commands that mark one as seen (with a note, at the time of the click) or unmark it.
import { useCallback, useMemo } from 'react';
import { sortBySeen } from '../../../../../shared/analysis/seen-findings';
import type { Finding } from '../../../../../shared/analysis/fit/finding';
import { markSeen, unmarkSeen } from '../../../../../shared/commands';
import type { SeenMark } from '../../../../../shared/schemas/option';
import type { RoomEditor } from '../use-room-editor';
import type { MarkAnswer } from './finding-item';

/** One empty list for an option without marks, so memos keyed on the marks do not re-run each render. */
const NO_MARKS: SeenMark[] = [];

export function useSeenMarks(editor: RoomEditor, optionId: string, findings: readonly Finding[]) {
  const marks = editor.doc.options[optionId]?.seen ?? NO_MARKS;
  const sorted = useMemo(() => sortBySeen(findings, marks), [findings, marks]);
  const listedKeys = useMemo(() => [...sorted.open, ...sorted.seen].map((f) => f.key), [sorted]);
  const { attempt, run } = editor;
  const onMark = useCallback(
    (key: string, note: string): MarkAnswer =>
      attempt(markSeen(optionId, key, note, new Date().toISOString(), listedKeys))?.message ?? null,
    [attempt, optionId, listedKeys],
  );
  const onUnmark = useCallback((key: string) => void run(unmarkSeen(optionId, key)), [run, optionId]);
  return useMemo(() => ({ marks, open: sorted.open, seen: sorted.seen, onMark, onUnmark }), [marks, sorted, onMark, onUnmark]);
}
