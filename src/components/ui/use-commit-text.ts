// One way for every typed field that changes a saved thing: the text is the person's until it is
// committed — on Enter, on leaving the field, and before the field goes away (another piece
// selected, another step) — and Escape puts back the last good value. A refused or unreadable
// entry keeps its text and marks the field with the reason beside it; nothing typed is dropped
// without a word.
import { useCallback, useEffect, useRef, useState, type ChangeEvent, type KeyboardEvent } from 'react';

export type Parsed<T> = { ok: true; value: T } | { ok: false; message: string };

/** What a commit answers: nothing (done), or the reason it was refused. */
export type CommitAnswer = string | null | undefined | void;

export interface CommitTextOptions<T> {
  /** The saved value; the field shows it whenever nothing is being typed. */
  value: T;
  format: (value: T) => string;
  parse: (text: string) => Parsed<T>;
  /** Applies the value; returns the reason when it was refused. */
  onCommit: (value: T) => CommitAnswer | Promise<CommitAnswer>;
  equal?: (a: T, b: T) => boolean;
  /** Shown as the field's error while nothing local is wrong (a server's message, say). */
  error?: string;
}

export interface CommitText {
  inputProps: {
    value: string;
    onChange: (e: ChangeEvent<HTMLInputElement | HTMLTextAreaElement>) => void;
    onKeyDown: (e: KeyboardEvent<HTMLInputElement | HTMLTextAreaElement>) => void;
    onBlur: () => void;
  };
  error: string | undefined;
  /** Commits what is typed now, if anything. */
  commit: () => void;
}

export function useCommitText<T>({
  value,
  format,
  parse,
  onCommit,
  equal = Object.is,
  error: outside,
}: CommitTextOptions<T>): CommitText {
  const [draft, setDraft] = useState<string | null>(null);
  const [error, setError] = useState<string | undefined>();
  const latest = useRef({ draft, value, parse, onCommit, equal });
  latest.current = { draft, value, parse, onCommit, equal };

  const commitText = useCallback((text: string | null, mounted: boolean) => {
    const { value: saved, parse: read, onCommit: apply, equal: same } = latest.current;
    if (text === null) return;
    const parsed = read(text);
    if (!parsed.ok) {
      if (mounted) setError(parsed.message);
      return;
    }
    if (same(parsed.value, saved)) {
      if (mounted) {
        setDraft(null);
        setError(undefined);
      }
      return;
    }
    latest.current.draft = null;
    const settle = (answer: CommitAnswer) => {
      if (!mounted) return;
      if (typeof answer === 'string') {
        setDraft(text);
        setError(answer);
      } else {
        setDraft(null);
        setError(undefined);
      }
    };
    const answer = apply(parsed.value);
    if (answer instanceof Promise) {
      answer.then(settle, (err: unknown) => settle(err instanceof Error ? err.message : 'This could not be saved.'));
    } else settle(answer);
  }, []);

  // Leaving the panel (another piece selected, another step) commits what was typed.
  useEffect(() => () => commitText(latest.current.draft, false), [commitText]);

  const commit = useCallback(() => commitText(latest.current.draft, true), [commitText]);

  return {
    inputProps: {
      value: draft ?? format(value),
      onChange: (e) => {
        latest.current.draft = e.target.value;
        setDraft(e.target.value);
      },
      onKeyDown: (e) => {
        if (e.key === 'Enter') {
          // In several lines, Enter is a new line; Ctrl or ⌘ with it commits.
          if (e.currentTarget instanceof HTMLTextAreaElement && !e.ctrlKey && !e.metaKey) return;
          e.preventDefault();
          commit();
        } else if (e.key === 'Escape' && draft !== null) {
          e.preventDefault();
          e.stopPropagation();
          latest.current.draft = null;
          setDraft(null);
          setError(undefined);
        }
      },
      onBlur: commit,
    },
    error: error ?? outside,
    commit,
  };
}

/** Text kept as typed (trimmed), refused when empty if `required`. */
/** The text as it is: the `format` of a plain text field. */
export const asIs = (v: string): string => v;

export function textParser(required: string | null): (text: string) => Parsed<string> {
  return (text) => {
    const t = text.trim();
    if (required && t === '') return { ok: false, message: required };
    return { ok: true, value: t };
  };
}

/** A number typed by a person: a decimal point or comma; empty means none when `optional`. */
export function numberParser({
  min,
  max,
  optional,
  what,
}: {
  min?: number;
  max?: number;
  optional?: boolean;
  what: string;
}): (text: string) => Parsed<number | null> {
  return (text) => {
    const t = text.trim().replace(',', '.');
    if (t === '') return optional ? { ok: true, value: null } : { ok: false, message: `Enter ${what}.` };
    const n = Number(t);
    if (!Number.isFinite(n)) return { ok: false, message: `“${text.trim()}” is not a number.` };
    if (min !== undefined && n < min)
      return { ok: false, message: `${what.charAt(0).toUpperCase()}${what.slice(1)} cannot be below ${min}.` };
    if (max !== undefined && n > max)
      return { ok: false, message: `${what.charAt(0).toUpperCase()}${what.slice(1)} cannot be above ${max}.` };
    return { ok: true, value: n };
  };
}
