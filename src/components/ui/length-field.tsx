// The length input: accepts lengths as people write them (cm, m, feet and inches) and reports
// millimetres, either on every valid keystroke (forms) or on commit (live documents).
import { useEffect, useRef, useState } from 'react';
import { formatLength, parseLength, type LengthUnit } from '../../../shared/units/length';
import { TextField } from './field';
import { useCommitText, type CommitAnswer } from './use-commit-text';

/** Two lengths this close (mm) are the same typed value. */
const SAME_LENGTH_MM = 0.05;

interface LengthFieldProps {
  label: string;
  valueMm: number | null;
  /** 'blur' mode: return the reason when the value is refused; it shows under the field. */
  onChange: (mm: number | null) => CommitAnswer | boolean | Promise<CommitAnswer>;
  unit?: LengthUnit;
  /** 'change' reports every valid keystroke (forms); 'blur' commits on Enter, on leaving the field and before it goes away (live documents). */
  commit?: 'change' | 'blur';
  error?: string;
  hint?: string;
  autoFocus?: boolean;
  name?: string;
  disabled?: boolean;
  allowNegative?: boolean;
}

/**
 * A length typed as people write it (420, 4.2m, 13' 9"); a bare number means `unit`.
 * Calls onChange with millimetres only when the text is a valid length.
 */
export function LengthField(props: LengthFieldProps) {
  return props.commit === 'blur' ? <CommittedLengthField {...props} /> : <FormLengthField {...props} />;
}

function CommittedLengthField({
  label,
  valueMm,
  onChange,
  unit = 'cm',
  error,
  hint,
  commit: _commit,
  allowNegative,
  ...rest
}: LengthFieldProps) {
  const field = useCommitText<number | null>({
    value: valueMm,
    format: (mm) => (mm === null ? '' : formatLength(mm, unit)),
    parse: (text) => {
      const parsed = parseLength(text, unit, { allowNegative });
      return parsed.ok ? { ok: true, value: parsed.mm } : parsed;
    },
    equal: (a, b) => a !== null && b !== null && Math.abs(a - b) < SAME_LENGTH_MM,
    onCommit: (mm) => {
      const answer = onChange(mm);
      if (answer instanceof Promise) return answer;
      return typeof answer === 'string' ? answer : null;
    },
    error,
  });
  return (
    <TextField
      {...rest}
      {...field.inputProps}
      label={label}
      inputMode="decimal"
      autoComplete="off"
      error={field.error}
      hint={hint}
    />
  );
}

function FormLengthField({
  label,
  valueMm,
  onChange,
  unit = 'cm',
  error,
  hint,
  commit: _commit,
  allowNegative,
  ...rest
}: LengthFieldProps) {
  const [text, setText] = useState(valueMm === null ? '' : formatLength(valueMm, unit));
  const [local, setLocal] = useState<string | undefined>();
  const shownUnit = useRef(unit);
  useEffect(() => {
    const unitChanged = shownUnit.current !== unit;
    shownUnit.current = unit;
    setText((t) => {
      const parsed = parseLength(t, unit, { allowNegative });
      if (!unitChanged && parsed.ok && valueMm !== null && Math.abs(parsed.mm - valueMm) < 0.5) return t;
      // A text that does not read as a length stays as typed, marked, rather than wiped.
      if (valueMm === null) return unitChanged || (t.trim() !== '' && !parsed.ok) ? t : '';
      return formatLength(valueMm, unit);
    });
  }, [valueMm, unit, allowNegative]);
  return (
    <TextField
      {...rest}
      label={label}
      value={text}
      inputMode="decimal"
      autoComplete="off"
      error={local ?? error}
      hint={hint}
      onChange={(e) => {
        setText(e.target.value);
        if (e.target.value.trim() === '') {
          setLocal(undefined);
          onChange(null);
          return;
        }
        const parsed = parseLength(e.target.value, unit, { allowNegative });
        setLocal(parsed.ok ? undefined : parsed.message);
        onChange(parsed.ok ? parsed.mm : null);
      }}
      onBlur={() => {
        const parsed = parseLength(text, unit, { allowNegative });
        if (parsed.ok) setText(formatLength(parsed.mm, unit));
      }}
    />
  );
}
