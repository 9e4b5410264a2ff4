// Text and text-area fields that save on commit (Enter, leaving the field) and revert on Escape.
import type { ReactNode } from 'react';
import { TextAreaField, TextField } from './field';
import { useCommitText, type CommitTextOptions } from './use-commit-text';

type Shared<T> = CommitTextOptions<T> & {
  label: string;
  hint?: ReactNode;
  disabled?: boolean;
  placeholder?: string;
  className?: string;
};

/** A text field that changes something saved: commits on Enter, on leaving it and before it goes away; Escape reverts. */
export function CommitTextField<T>({
  label,
  hint,
  disabled,
  placeholder,
  className,
  inputMode,
  type,
  autoComplete,
  ...options
}: Shared<T> & {
  inputMode?: 'decimal' | 'text' | 'url' | 'email';
  type?: string;
  autoComplete?: string;
}) {
  const field = useCommitText(options);
  return (
    <TextField
      {...field.inputProps}
      label={label}
      hint={hint}
      disabled={disabled}
      placeholder={placeholder}
      className={className}
      inputMode={inputMode}
      type={type}
      autoComplete={autoComplete}
      error={field.error}
    />
  );
}

/** The same for several lines: Enter makes a new line, Ctrl/⌘ Enter or leaving the field commits. */
export function CommitTextAreaField<T>({ label, hint, disabled, placeholder, className, ...options }: Shared<T>) {
  const field = useCommitText(options);
  return (
    <TextAreaField
      {...field.inputProps}
      label={label}
      hint={hint}
      disabled={disabled}
      placeholder={placeholder}
      className={className}
      error={field.error}
    />
  );
}
