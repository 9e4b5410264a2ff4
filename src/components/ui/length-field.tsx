import { useEffect, useState } from 'react';
import { formatLength, parseLength, type LengthUnit } from '../../../shared/units/length';
import { TextField } from './field';

/**
 * A length typed as people write it (420, 4.2m, 13' 9"); a bare number means `unit`.
 * Calls onChange with millimetres only when the text is a valid length.
 */
export function LengthField({ label, valueMm, onChange, unit = 'cm', error, hint, commit = 'change', ...rest }: {
  label: string;
  valueMm: number | null;
  onChange: (mm: number | null) => void;
  unit?: LengthUnit;
  /** 'change' reports every valid keystroke (forms); 'blur' only on leaving the field or Enter (live documents). */
  commit?: 'change' | 'blur';
  error?: string;
  hint?: string;
  autoFocus?: boolean;
  name?: string;
}) {
  const [text, setText] = useState(valueMm === null ? '' : formatLength(valueMm, unit));
  const [local, setLocal] = useState<string | undefined>();
  useEffect(() => {
    setText((t) => {
      const parsed = parseLength(t, unit);
      return parsed.ok && valueMm !== null && Math.abs(parsed.mm - valueMm) < 0.5 ? t : valueMm === null ? '' : formatLength(valueMm, unit);
    });
  }, [valueMm, unit]);
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
        if (commit === 'blur') return;
        if (e.target.value.trim() === '') {
          setLocal(undefined);
          onChange(null);
          return;
        }
        const parsed = parseLength(e.target.value, unit);
        setLocal(parsed.ok ? undefined : parsed.message);
        onChange(parsed.ok ? parsed.mm : null);
      }}
      onKeyDown={(e) => {
        if (commit === 'blur' && e.key === 'Enter') (e.target as HTMLInputElement).blur();
      }}
      onBlur={() => {
        const parsed = parseLength(text, unit);
        if (commit === 'blur') {
          setLocal(parsed.ok ? undefined : parsed.message);
          if (parsed.ok && (valueMm === null || Math.abs(parsed.mm - valueMm) >= 0.05)) onChange(parsed.mm);
          if (!parsed.ok) return;
        }
        if (parsed.ok) setText(formatLength(parsed.mm, unit));
      }}
    />
  );
}
