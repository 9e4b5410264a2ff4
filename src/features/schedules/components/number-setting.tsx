// A number field for a take-off setting: keeps the text as typed and passes the value on only when valid.
import { useEffect, useState } from 'react';
import type { z } from 'zod';
import { TextField } from '../../../components/ui/field';

/**
 * A number typed into a take-off setting: the text stays as typed, the value is passed on only when
 * `schema` accepts it, and its message shows otherwise.
 */
export function NumberSetting({
  label,
  value,
  schema,
  onChange,
  hint,
  className,
  emptyMeans,
}: {
  label: string;
  value: number | null;
  schema: z.ZodType<number>;
  onChange: (value: number | null) => void;
  hint?: string;
  className?: string;
  /** An empty field is allowed and passes null (e.g. "no box size"). */
  emptyMeans?: 'none';
}) {
  const [text, setText] = useState(value === null ? '' : String(value));
  const [error, setError] = useState<string | undefined>();
  useEffect(() => {
    setText((t) => (Number(t) === value || (t.trim() === '' && value === null) ? t : value === null ? '' : String(value)));
  }, [value]);
  return (
    <TextField
      label={label}
      className={className}
      value={text}
      inputMode="decimal"
      autoComplete="off"
      hint={hint}
      error={error}
      onChange={(e) => {
        const next = e.target.value;
        setText(next);
        if (next.trim() === '' && emptyMeans === 'none') {
          setError(undefined);
          onChange(null);
          return;
        }
        const number = next.trim() === '' ? Number.NaN : Number(next.trim().replace(',', '.'));
        if (!Number.isFinite(number)) {
          setError('Enter a number.');
          return;
        }
        const parsed = schema.safeParse(number);
        setError(parsed.success ? undefined : parsed.error.issues[0]?.message);
        if (parsed.success) onChange(parsed.data);
      }}
    />
  );
}
