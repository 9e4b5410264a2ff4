// One finding in the Check step's list: pick it to highlight its pieces; mark it as seen and intended
// with a short note (Enter or clicking elsewhere commits, Escape puts the field away), or unmark it. A
// seen finding reads muted, with a "Seen" label and its note.
import { useEffect, useRef, useState } from 'react';
import type { KeyedFinding } from '../../../../../shared/analysis/seen-findings';
import { SEEN_LIMITS } from '../../../../../shared/schemas/option';
import { formatLength, type LengthUnit } from '../../../../../shared/units/length';
import { TextField } from '../../../../components/ui/field';
import { asIs, textParser, useCommitText } from '../../../../components/ui/use-commit-text';

const quietButton = 'rounded px-1 text-xs font-semibold text-ink-faint hover:text-ink hover:underline';

/** What marking a finding answers: nothing when done, or why it was refused. */
export type MarkAnswer = string | null;

export function FindingItem({
  row,
  title,
  unit,
  selected,
  onChoose,
  onMark,
  onUnmark,
  readOnly,
}: {
  row: KeyedFinding;
  /** The kind's heading ("Pieces overlap"). */
  title: string;
  unit: LengthUnit;
  selected: boolean;
  onChoose: () => void;
  onMark: (key: string, note: string) => MarkAnswer;
  onUnmark: (key: string) => void;
  readOnly: boolean;
}) {
  const [noting, setNoting] = useState(false);
  const { finding: f, mark } = row;
  const seen = mark !== null;
  return (
    <li data-finding-state={seen ? 'seen' : 'open'}>
      <button
        type="button"
        aria-pressed={selected}
        onClick={onChoose}
        className={`w-full rounded-lg border px-3 py-2 text-left aria-pressed:border-clay aria-pressed:bg-clay-wash ${
          seen ? 'border-line bg-sand/40 hover:border-line-strong' : 'border-clay/30 bg-white hover:border-clay'
        }`}
      >
        <span className={`block text-xs font-bold tracking-wide uppercase ${seen ? 'text-ink-faint' : 'text-clay'}`}>
          {seen && <span className="mr-1.5 rounded bg-line px-1 text-ink-soft normal-case">Seen</span>}
          {title}
        </span>
        <span className={`block text-sm ${seen ? 'text-ink-soft' : 'text-ink'}`}>{f.message}</span>
        {f.measuredMm !== undefined && f.requiredMm !== undefined && (
          <span className="block text-xs text-ink-faint">
            {formatLength(f.measuredMm, unit)} where {formatLength(f.requiredMm, unit)} is usual
          </span>
        )}
        {seen && mark.note !== '' && (
          <span className="mt-1 block text-xs text-ink-soft italic" data-testid="seen-note">
            “{mark.note}”
          </span>
        )}
      </button>
      {!readOnly &&
        (noting ? (
          <SeenNoteField
            note={mark?.note ?? ''}
            isNew={!seen}
            onCommit={(note) => onMark(row.key, note)}
            onClose={() => setNoting(false)}
          />
        ) : (
          <div className="mt-0.5 flex justify-end gap-2">
            {seen ? (
              <>
                <button type="button" className={quietButton} onClick={() => setNoting(true)}>
                  Change note
                </button>
                <button type="button" className={quietButton} onClick={() => onUnmark(row.key)}>
                  Unmark
                </button>
              </>
            ) : (
              <button type="button" className={quietButton} onClick={() => setNoting(true)}>
                Mark as seen
              </button>
            )}
          </div>
        ))}
    </li>
  );
}

/**
 * The short note of a seen mark, typed in place: Enter or leaving the field commits it like every
 * other field; leaving a new mark's field with nothing typed marks nothing, Enter marks it without a
 * note, Escape closes it. A refused note stays in the field with the reason.
 */
function SeenNoteField({
  note,
  isNew,
  onCommit,
  onClose,
}: {
  note: string;
  isNew: boolean;
  onCommit: (note: string) => MarkAnswer;
  onClose: () => void;
}) {
  const host = useRef<HTMLDivElement>(null);
  // Whether the last commit was refused, so the field stays open to show why.
  const refused = useRef(false);
  const field = useCommitText<string>({
    value: note,
    format: asIs,
    parse: textParser(null),
    onCommit: (text) => {
      const answer = onCommit(text);
      refused.current = answer !== null;
      return answer;
    },
  });
  // The field opens from a click on "Mark as seen" or "Change note": typing goes straight into it.
  useEffect(() => host.current?.querySelector('input')?.focus(), []);
  const closeUnlessRefused = () => {
    if (!refused.current) onClose();
  };
  return (
    <div ref={host}>
      <TextField
        {...field.inputProps}
        onKeyDown={(e) => {
          refused.current = false;
          if (e.key === 'Enter' && isNew && field.inputProps.value.trim() === '') {
            e.preventDefault();
            refused.current = onCommit('') !== null;
          } else {
            field.inputProps.onKeyDown(e);
          }
          if (e.key === 'Enter' || e.key === 'Escape') closeUnlessRefused();
        }}
        onBlur={() => {
          refused.current = false;
          field.inputProps.onBlur();
          closeUnlessRefused();
        }}
        label={isNew ? 'Seen and intended: why?' : 'Note on why it stays'}
        placeholder="A few words, e.g. the client wants it here"
        maxLength={SEEN_LIMITS.noteLength}
        error={field.error}
        className="mt-1.5"
      />
    </div>
  );
}
