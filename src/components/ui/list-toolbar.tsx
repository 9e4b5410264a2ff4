// The toolbar above a list page: a search box, labelled select choosers, and the shared sort options.
import type { ReactNode } from 'react';
import { inputClass } from './field';

/** A list page's search box and its choosers ("Sort", "Show"), on one wrapping row. */
export function ListToolbar({
  label,
  placeholder,
  query,
  onQuery,
  children,
  className = 'mb-4',
}: {
  label: string;
  placeholder: string;
  query: string;
  onQuery: (q: string) => void;
  children?: ReactNode;
  className?: string;
}) {
  return (
    <div className={`${className} flex flex-wrap items-center gap-3`}>
      <label className="min-w-64 flex-1">
        <span className="sr-only">{label}</span>
        <input
          className={inputClass}
          type="search"
          placeholder={placeholder}
          value={query}
          onChange={(e) => onQuery(e.target.value)}
        />
      </label>
      {children}
    </div>
  );
}

/** A labelled select for a list toolbar. */
export function ToolbarSelect<T extends string>({
  label,
  value,
  onChange,
  options,
  ariaLabel,
}: {
  label: string;
  value: T;
  onChange: (v: T) => void;
  options: readonly { value: T; label: string }[];
  ariaLabel?: string;
}) {
  return (
    <label className="flex items-center gap-2 text-sm text-ink-soft">
      {label}
      <select
        className={`${inputClass} w-auto`}
        value={value}
        onChange={(e) => onChange(e.target.value as T)}
        aria-label={ariaLabel}
      >
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
    </label>
  );
}

export const SORT_OPTIONS = [
  { value: 'updated', label: 'Last change' },
  { value: 'name', label: 'Name' },
] as const;
