// The room editor's session rules, apart from React: what the server last confirmed (the
// baseline), the local draft and whether it may be carried on, what is unsaved, what a save
// conflict is and how either answer to it folds back in, and what a decided project freezes.
import { z } from 'zod';
import { optionDocSchema, type OptionDoc } from '../../../../shared/schemas/option';
import { roomShellSchema, type RoomShell } from '../../../../shared/schemas/room';
import type { OptionRecord, RoomRecord } from '../../../../shared/schemas/room-api';
import { createHistory, mergeOptionDoc, mergeShell, type EditorDoc, type History } from '../../../../shared/commands';

/** Quiet time after the last change before saving (a drag saves once, at its end). */
export const AUTOSAVE_DELAY_MS = 800;
/** Waits between retries of a failed save (network or server trouble), the last one repeating. */
export const RETRY_DELAYS_MS = [2000, 5000, 15000] as const;

/** How long to wait before the retry that follows `attempt` earlier failures (0 for the first retry). */
export function retryDelayMs(attempt: number): number {
  return RETRY_DELAYS_MS[Math.min(Math.max(0, attempt), RETRY_DELAYS_MS.length - 1)];
}

/**
 * The timer of the next save retry: one waiting at a time, and none once disposed (the editor
 * unmounted; its local draft stays behind as the safety net).
 */
export interface RetryTimer {
  /** Waits for the retry after `attempt` earlier failures, then saves (a waiting retry is replaced). */
  schedule(attempt: number): void;
  /** Clears a waiting retry and refuses new ones. */
  dispose(): void;
  /** Whether a retry is waiting. */
  readonly waiting: boolean;
}

export function retryTimer(save: () => void): RetryTimer {
  let timer: ReturnType<typeof setTimeout> | undefined;
  let disposed = false;
  return {
    schedule(attempt) {
      if (disposed) return;
      clearTimeout(timer);
      timer = setTimeout(() => {
        timer = undefined;
        save();
      }, retryDelayMs(attempt));
    },
    dispose() {
      disposed = true;
      clearTimeout(timer);
      timer = undefined;
    },
    get waiting() {
      return timer !== undefined;
    },
  };
}

export type SaveState = 'saved' | 'unsaved' | 'saving' | 'retrying' | 'conflict';

/** Someone else saved first: their room (walls and openings) or their option, as the server has it now. */
export type Conflict = { part: 'room'; theirs: RoomRecord } | { part: 'option'; optionId: string; theirs: OptionRecord };

/** What the server last confirmed: the documents and the versions they were saved at. */
export interface Baseline {
  shell: RoomShell;
  roomVersion: number;
  options: Record<string, OptionDoc>;
  optionVersions: Record<string, number>;
}

const versionSchema = z.number().int().nonnegative();

/** The unsaved document kept in the browser, with the versions it was written against. */
export const draftSchema = z.object({
  doc: z.object({ shell: roomShellSchema, options: z.record(z.string(), optionDocSchema) }),
  roomVersion: versionSchema,
  optionVersions: z.record(z.string(), versionSchema),
});
export type Draft = z.infer<typeof draftSchema>;

export const draftKey = (roomId: string) => `parlour:room-draft:${roomId}`;

/** The draft stored as text, or null when there is none or it is not a draft this editor can read (corrupt, or an older shape). */
export function parseDraft(text: string | null): Draft | null {
  if (!text) return null;
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch {
    return null;
  }
  const parsed = draftSchema.safeParse(raw);
  return parsed.success ? parsed.data : null;
}

/** The draft to store for a document over a baseline. */
export function draftOf(doc: EditorDoc, base: Baseline): Draft {
  return { doc, roomVersion: base.roomVersion, optionVersions: base.optionVersions };
}

export function baselineOf(room: RoomRecord, options: OptionRecord[]): Baseline {
  return {
    shell: room.shell,
    roomVersion: room.version,
    options: Object.fromEntries(options.map((o) => [o.id, o.doc])),
    optionVersions: Object.fromEntries(options.map((o) => [o.id, o.version])),
  };
}

export const docOf = (b: Baseline): EditorDoc => ({ shell: b.shell, options: b.options });

/** The draft's document over the server's, keeping only options that still exist. */
export function withDraft(base: Baseline, draft: Draft): EditorDoc {
  const options = {
    ...base.options,
    ...Object.fromEntries(Object.entries(draft.doc.options).filter(([id]) => id in base.options)),
  };
  return { shell: draft.doc.shell, options };
}

export interface StartingPoint {
  history: History;
  /** 'restored': carrying on from the draft; 'stale': the server changed since, so the designer decides. */
  restored: 'restored' | 'stale' | null;
  staleDraft: Draft | null;
}

/** Where the editor starts: the server's document, or a draft left by an earlier visit. */
export function startingPoint(base: Baseline, draft: Draft | null): StartingPoint {
  if (!draft) return { history: createHistory(docOf(base)), restored: null, staleDraft: null };
  const sameVersions =
    draft.roomVersion === base.roomVersion &&
    Object.keys(draft.optionVersions).every(
      (id) => !(id in base.optionVersions) || base.optionVersions[id] === draft.optionVersions[id],
    );
  // Nothing changed on the server since the draft was written: carry on from it.
  if (sameVersions) return { history: createHistory(withDraft(base, draft)), restored: 'restored', staleDraft: null };
  return { history: createHistory(docOf(base)), restored: 'stale', staleDraft: draft };
}

/** What differs between the document and what the server last confirmed (reference checks: commands share structure). */
export function changedParts(doc: EditorDoc, base: Baseline): { shell: boolean; options: string[] } {
  return {
    shell: doc.shell !== base.shell,
    options: Object.keys(doc.options).filter((id) => doc.options[id] !== base.options[id]),
  };
}

export function hasChanges(doc: EditorDoc, base: Baseline): boolean {
  const c = changedParts(doc, base);
  return c.shell || c.options.length > 0;
}

/** The baseline once the room's shell was saved at a new version. */
export function afterRoomSaved(base: Baseline, shell: RoomShell, roomVersion: number): Baseline {
  return { ...base, shell, roomVersion };
}

/** The baseline once an option's document was saved (or taken from the server) at a version. */
export function afterOptionSaved(base: Baseline, optionId: string, doc: OptionDoc, version: number): Baseline {
  return {
    ...base,
    options: { ...base.options, [optionId]: doc },
    optionVersions: { ...base.optionVersions, [optionId]: version },
  };
}

/** The conflict a 409 answer's current record stands for: a room has a shell, an option a document. */
export function conflictOf(theirs: RoomRecord | OptionRecord): Conflict {
  return 'shell' in theirs ? { part: 'room', theirs } : { part: 'option', optionId: theirs.id, theirs };
}

export interface Resolution {
  baseline: Baseline;
  doc: EditorDoc;
}

/** Their version replaces ours for the conflicting part; our other unsaved parts stay. */
export function loadTheirs(base: Baseline, doc: EditorDoc, conflict: Conflict): Resolution {
  if (conflict.part === 'room') {
    const { theirs } = conflict;
    return { baseline: afterRoomSaved(base, theirs.shell, theirs.version), doc: { ...doc, shell: theirs.shell } };
  }
  const { theirs } = conflict;
  return {
    baseline: afterOptionSaved(base, theirs.id, theirs.doc, theirs.version),
    doc: { ...doc, options: { ...doc.options, [theirs.id]: theirs.doc } },
  };
}

/** Both are kept: our changes go on top of theirs (three-way merge), to be saved with their version. */
export function keepMine(base: Baseline, doc: EditorDoc, conflict: Conflict): Resolution {
  if (conflict.part === 'room') {
    const { theirs } = conflict;
    const shell = mergeShell(base.shell, doc.shell, theirs.shell);
    return { baseline: afterRoomSaved(base, theirs.shell, theirs.version), doc: { ...doc, shell } };
  }
  const { theirs } = conflict;
  const merged = mergeOptionDoc(base.options[theirs.id], doc.options[theirs.id], theirs.doc);
  return {
    baseline: afterOptionSaved(base, theirs.id, theirs.doc, theirs.version),
    doc: { ...doc, options: { ...doc.options, [theirs.id]: merged } },
  };
}

/**
 * Options added, duplicated or deleted through the API folded into the document and the baseline:
 * unsaved changes to options that remain are kept. `removed` says an option went away.
 */
export function withOptions(base: Baseline, doc: EditorDoc, options: OptionRecord[]): Resolution & { removed: boolean } {
  const nextOptions: Record<string, OptionDoc> = {};
  for (const o of options) nextOptions[o.id] = doc.options[o.id] ?? o.doc;
  const removed = Object.keys(doc.options).some((id) => !(id in nextOptions));
  const baseline: Baseline = {
    ...base,
    options: Object.fromEntries(options.map((o) => [o.id, base.options[o.id] ?? o.doc])),
    optionVersions: Object.fromEntries(options.map((o) => [o.id, base.optionVersions[o.id] ?? o.version])),
  };
  return { baseline, doc: { ...doc, options: nextOptions }, removed };
}

/**
 * What a decided project keeps as it is: the options the client chose and, with them, the room's
 * walls and openings (the server refuses both too).
 */
export interface Frozen {
  optionIds: ReadonlySet<string>;
}

export const NOTHING_FROZEN: Frozen = { optionIds: new Set() };

export const FROZEN_OPTION_TEXT = 'The client chose this option and the project is decided: duplicate it to change it.';
export const FROZEN_SHELL_TEXT =
  'An option of this room was chosen and the project is decided, so its walls and openings stay as they are.';

/** The reason a change from `before` to `after` may not be made, if it touches what is frozen. */
export function frozenRefusal(before: EditorDoc, after: EditorDoc, frozen: Frozen): string | null {
  if (frozen.optionIds.size === 0) return null;
  if (before.shell !== after.shell) return FROZEN_SHELL_TEXT;
  for (const id of frozen.optionIds) if (before.options[id] !== after.options[id]) return FROZEN_OPTION_TEXT;
  return null;
}
