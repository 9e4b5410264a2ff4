// The room editor's state: the undo history over one room's shell and its options' documents,
// autosave with the version check, conflict handling, and a local draft that survives a reload.
import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import type { OptionDoc } from '../../../../shared/schemas/option';
import type { RoomShell } from '../../../../shared/schemas/room';
import type { OptionRecord, RoomRecord } from '../../../../shared/schemas/room-api';
import {
  applyToHistory,
  canRedo,
  canUndo,
  createEditorDoc,
  createHistory,
  endGesture,
  mergeOptionDoc,
  mergeShell,
  redo,
  redoLabel,
  undo,
  undoLabel,
  type ApplyOptions,
  type Command,
  type EditorDoc,
  type History,
} from '../../../../shared/commands';
import type { FieldProblem } from '../../../../shared/geometry/validate';

/** Why a field's change was refused: the sentence, and the rules it would break. */
export interface HistoryFailure {
  message: string;
  problems: FieldProblem[];
}
import { api, ApiError } from '../../../lib/api';
import { roomKeys, type RoomDetail } from '../api/rooms';

/** Quiet time after the last change before saving (a drag saves once, at its end). */
const AUTOSAVE_DELAY_MS = 800;
/** Waits between retries of a failed save (network or server trouble), the last one repeating. */
const RETRY_DELAYS_MS = [2000, 5000, 15000];

export type SaveState = 'saved' | 'unsaved' | 'saving' | 'retrying' | 'conflict';

export interface Conflict {
  part: 'room' | 'option';
  optionId?: string;
  theirs: RoomRecord | OptionRecord;
}

interface Baseline {
  shell: RoomShell;
  roomVersion: number;
  options: Record<string, OptionDoc>;
  optionVersions: Record<string, number>;
}

interface Draft {
  doc: EditorDoc;
  roomVersion: number;
  optionVersions: Record<string, number>;
}

const draftKey = (roomId: string) => `parlour:room-draft:${roomId}`;

function readDraft(roomId: string): Draft | null {
  try {
    const text = localStorage.getItem(draftKey(roomId));
    if (!text) return null;
    const raw = JSON.parse(text) as Draft;
    return { ...raw, doc: createEditorDoc(raw.doc.shell, raw.doc.options) };
  } catch {
    return null;
  }
}

function baselineOf(room: RoomRecord, options: OptionRecord[]): Baseline {
  return {
    shell: room.shell,
    roomVersion: room.version,
    options: Object.fromEntries(options.map((o) => [o.id, o.doc])),
    optionVersions: Object.fromEntries(options.map((o) => [o.id, o.version])),
  };
}

const docOf = (b: Baseline): EditorDoc => ({ shell: b.shell, options: b.options });

/** The draft's document over the server's, keeping only options that still exist. */
function withDraft(base: Baseline, draft: Draft): EditorDoc {
  const options = {
    ...base.options,
    ...Object.fromEntries(Object.entries(draft.doc.options).filter(([id]) => id in base.options)),
  };
  return { shell: draft.doc.shell, options };
}

/** Where the editor starts: the server's document, or a draft left by an earlier visit. */
function startingPoint(base: Baseline, draft: Draft | null) {
  if (!draft) return { history: createHistory(docOf(base)), restored: null, staleDraft: null };
  const sameVersions =
    draft.roomVersion === base.roomVersion &&
    Object.keys(draft.optionVersions).every(
      (id) => !(id in base.optionVersions) || base.optionVersions[id] === draft.optionVersions[id],
    );
  // Nothing changed on the server since the draft was written: carry on from it.
  if (sameVersions) return { history: createHistory(withDraft(base, draft)), restored: 'restored' as const, staleDraft: null };
  return { history: createHistory(docOf(base)), restored: 'stale' as const, staleDraft: draft };
}

/** What differs between the document and what the server last confirmed (reference checks: commands share structure). */
function changedParts(doc: EditorDoc, base: Baseline) {
  return {
    shell: doc.shell !== base.shell,
    options: Object.keys(doc.options).filter((id) => doc.options[id] !== base.options[id]),
  };
}

/**
 * What a decided project keeps as it is: the options the client chose and, with them, the room's
 * walls and openings (the server refuses both too).
 */
export interface Frozen {
  optionIds: ReadonlySet<string>;
}

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

const NOTHING_FROZEN: Frozen = { optionIds: new Set() };

export function useRoomEditor(detail: RoomDetail, readOnly: boolean, frozen: Frozen = NOTHING_FROZEN) {
  const roomId = detail.room.id;
  const frozenRef = useRef(frozen);
  frozenRef.current = frozen;
  const qc = useQueryClient();
  const baseline = useRef<Baseline>(baselineOf(detail.room, detail.options));
  const [initial] = useState(() => startingPoint(baseline.current, readOnly ? null : readDraft(roomId)));
  const [restored, setRestored] = useState<'restored' | 'stale' | null>(initial.restored);
  const staleDraft = useRef<Draft | null>(initial.staleDraft);
  const [history, setHistory] = useState<History>(initial.history);
  const [optionList, setOptionList] = useState<OptionRecord[]>(detail.options);
  const [roomName, setRoomName] = useState(detail.room.name);
  const [saveState, setSaveState] = useState<SaveState>('saved');
  const [conflict, setConflict] = useState<Conflict | null>(null);
  const [message, setMessage] = useState<string | null>(null);
  const [refusal, setRefusal] = useState<HistoryFailure | null>(null);
  const attempt = useRef(0);
  const saving = useRef(false);
  const historyRef = useRef(history);
  historyRef.current = history;

  const doc = history.doc;
  const dirty = useMemo(() => {
    const c = changedParts(doc, baseline.current);
    return c.shell || c.options.length > 0;
    // baseline changes only together with a history update or a save, both of which re-render.
  }, [doc, saveState]); // eslint-disable-line react-hooks/exhaustive-deps

  // The local draft: written whenever there is something unsaved, removed once all is saved.
  useEffect(() => {
    if (readOnly) return;
    if (dirty) {
      const b = baseline.current;
      const draft: Draft = { doc, roomVersion: b.roomVersion, optionVersions: b.optionVersions };
      try {
        localStorage.setItem(draftKey(roomId), JSON.stringify(draft));
      } catch {
        // A full or blocked storage only costs the reload safety net.
      }
    } else if (!staleDraft.current) {
      localStorage.removeItem(draftKey(roomId));
    }
  }, [doc, dirty, readOnly, roomId]);

  const save = useCallback(async () => {
    if (readOnly || saving.current || conflict) return;
    const current = historyRef.current.doc;
    const base = baseline.current;
    const parts = changedParts(current, base);
    if (!parts.shell && parts.options.length === 0) {
      setSaveState('saved');
      return;
    }
    saving.current = true;
    setSaveState('saving');
    try {
      if (parts.shell) {
        const { room } = await api<{ room: RoomRecord }>(`/api/rooms/${roomId}`, {
          method: 'PUT',
          body: { version: base.roomVersion, shell: current.shell },
        });
        baseline.current = { ...baseline.current, shell: current.shell, roomVersion: room.version };
        qc.setQueryData<RoomDetail>(roomKeys.detail(roomId), (d) => (d ? { ...d, room } : d));
      }
      for (const optionId of parts.options) {
        const version = baseline.current.optionVersions[optionId];
        const optionDoc = current.options[optionId];
        const { option } = await api<{ option: OptionRecord }>(`/api/options/${optionId}`, {
          method: 'PUT',
          body: { version, doc: optionDoc },
        });
        baseline.current = {
          ...baseline.current,
          options: { ...baseline.current.options, [optionId]: optionDoc },
          optionVersions: { ...baseline.current.optionVersions, [optionId]: option.version },
        };
        qc.setQueryData<RoomDetail>(roomKeys.detail(roomId), (d) =>
          d ? { ...d, options: d.options.map((o) => (o.id === optionId ? option : o)) } : d,
        );
      }
      attempt.current = 0;
      setMessage(null);
      const after = changedParts(historyRef.current.doc, baseline.current);
      setSaveState(after.shell || after.options.length > 0 ? 'unsaved' : 'saved');
    } catch (err) {
      if (err instanceof ApiError && err.status === 409 && err.code === 'decided') {
        // Changes made before the project was decided (a draft, another tab) cannot be saved onto a chosen option.
        setMessage(err.message);
        setSaveState('unsaved');
      } else if (err instanceof ApiError && err.status === 409) {
        const theirs = (err.body as { current: RoomRecord | OptionRecord }).current;
        setConflict('shell' in theirs ? { part: 'room', theirs } : { part: 'option', optionId: theirs.id, theirs });
        setSaveState('conflict');
      } else if (err instanceof ApiError && err.status >= 400 && err.status < 500) {
        // The server refused the document itself; retrying would not help. Keep it unsaved and say why.
        setMessage(err.message);
        setSaveState('unsaved');
      } else {
        setMessage(err instanceof Error ? err.message : 'The save failed.');
        setSaveState('retrying');
        const delay = RETRY_DELAYS_MS[Math.min(attempt.current, RETRY_DELAYS_MS.length - 1)];
        attempt.current += 1;
        setTimeout(() => void saveRef.current(), delay);
      }
    } finally {
      saving.current = false;
    }
  }, [readOnly, conflict, roomId, qc]);
  const saveRef = useRef(save);
  saveRef.current = save;

  // Autosave shortly after the last change.
  useEffect(() => {
    if (readOnly || !dirty || conflict || saveState === 'retrying') return;
    setSaveState((s) => (s === 'saving' ? s : 'unsaved'));
    const timer = setTimeout(() => void saveRef.current(), AUTOSAVE_DELAY_MS);
    return () => clearTimeout(timer);
  }, [doc, dirty, readOnly, conflict]); // eslint-disable-line react-hooks/exhaustive-deps

  // Leaving the editor inside the autosave's quiet time (back to the project, say) saves what is pending.
  useEffect(() => () => void saveRef.current(), []);

  // Warn before leaving with unsaved changes.
  useEffect(() => {
    if (!dirty) return;
    const onBeforeUnload = (e: BeforeUnloadEvent) => {
      e.preventDefault();
    };
    window.addEventListener('beforeunload', onBeforeUnload);
    return () => window.removeEventListener('beforeunload', onBeforeUnload);
  }, [dirty]);

  const run = useCallback(
    (command: Command, options?: ApplyOptions): boolean => {
      if (readOnly) return false;
      const result = applyToHistory(historyRef.current, command, options);
      if (!result.ok) {
        setRefusal({ message: result.message, problems: result.problems ?? [] });
        return false;
      }
      const frozenText = frozenRefusal(historyRef.current.doc, result.history.doc, frozenRef.current);
      if (frozenText) {
        setRefusal({ message: frozenText, problems: [] });
        return false;
      }
      setRefusal(null);
      historyRef.current = result.history;
      setHistory(result.history);
      return true;
    },
    [readOnly],
  );

  /** Like run, for a field: a refusal comes back to be shown beside the field instead of in the banner. */
  const attemptField = useCallback(
    (command: Command, options?: ApplyOptions): HistoryFailure | null => {
      if (readOnly) return null;
      const result = applyToHistory(historyRef.current, command, options);
      if (!result.ok) return { message: result.message, problems: result.problems ?? [] };
      const frozenText = frozenRefusal(historyRef.current.doc, result.history.doc, frozenRef.current);
      if (frozenText) return { message: frozenText, problems: [] };
      setRefusal(null);
      historyRef.current = result.history;
      setHistory(result.history);
      return null;
    },
    [readOnly],
  );

  const finishGesture = useCallback(() => setHistory((h) => endGesture(h)), []);
  // An undo or redo that would change what the decided project stands on is refused like any edit.
  const step = useCallback(
    (move: (h: History) => History) => {
      if (readOnly) return;
      const next = move(historyRef.current);
      const frozenText = frozenRefusal(historyRef.current.doc, next.doc, frozenRef.current);
      if (frozenText) {
        setRefusal({ message: frozenText, problems: [] });
        return;
      }
      historyRef.current = next;
      setHistory(next);
    },
    [readOnly],
  );
  const doUndo = useCallback(() => step(undo), [step]);
  const doRedo = useCallback(() => step(redo), [step]);

  /** Their version replaces ours for the conflicting part; our other unsaved parts stay. */
  const loadTheirs = useCallback(() => {
    if (!conflict) return;
    const h = historyRef.current;
    let next: EditorDoc;
    if (conflict.part === 'room') {
      const theirs = conflict.theirs as RoomRecord;
      baseline.current = { ...baseline.current, shell: theirs.shell, roomVersion: theirs.version };
      next = { ...h.doc, shell: theirs.shell };
      qc.setQueryData<RoomDetail>(roomKeys.detail(roomId), (d) => (d ? { ...d, room: theirs } : d));
    } else {
      const theirs = conflict.theirs as OptionRecord;
      baseline.current = {
        ...baseline.current,
        options: { ...baseline.current.options, [theirs.id]: theirs.doc },
        optionVersions: { ...baseline.current.optionVersions, [theirs.id]: theirs.version },
      };
      next = { ...h.doc, options: { ...h.doc.options, [theirs.id]: theirs.doc } };
    }
    // Undo steps were recorded against our version of that part; start a fresh history from theirs.
    setHistory(createHistory(next));
    setConflict(null);
    setSaveState('unsaved');
  }, [conflict, qc, roomId]);

  /** Both are kept: this tab's changes go on top of theirs (three-way merge), then saved with their version. */
  const keepMine = useCallback(() => {
    if (!conflict) return;
    const h = historyRef.current;
    let next: EditorDoc;
    if (conflict.part === 'room') {
      const theirs = conflict.theirs as RoomRecord;
      const shell = mergeShell(baseline.current.shell, h.doc.shell, theirs.shell);
      baseline.current = { ...baseline.current, roomVersion: theirs.version, shell: theirs.shell };
      next = { ...h.doc, shell };
    } else {
      const theirs = conflict.theirs as OptionRecord;
      const merged = mergeOptionDoc(baseline.current.options[theirs.id], h.doc.options[theirs.id], theirs.doc);
      baseline.current = {
        ...baseline.current,
        options: { ...baseline.current.options, [theirs.id]: theirs.doc },
        optionVersions: { ...baseline.current.optionVersions, [theirs.id]: theirs.version },
      };
      next = { ...h.doc, options: { ...h.doc.options, [theirs.id]: merged } };
    }
    setHistory(createHistory(next));
    setConflict(null);
    setSaveState('unsaved');
  }, [conflict]);

  /** The draft from an earlier visit was written against older versions: use it anyway, or drop it. */
  const resolveStaleDraft = useCallback(
    (use: boolean) => {
      const draft = staleDraft.current;
      staleDraft.current = null;
      setRestored(null);
      if (!draft) return;
      if (use) setHistory(createHistory(withDraft(baseline.current, draft)));
      else {
        localStorage.removeItem(draftKey(roomId));
      }
    },
    [roomId],
  );

  /** Options added, duplicated or deleted through the API: fold them into the document without an undo step. */
  const syncOptions = useCallback((options: OptionRecord[]) => {
    const h = historyRef.current;
    const nextOptions: Record<string, OptionDoc> = {};
    for (const o of options) nextOptions[o.id] = h.doc.options[o.id] ?? o.doc;
    const removed = Object.keys(h.doc.options).some((id) => !(id in nextOptions));
    baseline.current = {
      ...baseline.current,
      options: Object.fromEntries(options.map((o) => [o.id, baseline.current.options[o.id] ?? o.doc])),
      optionVersions: Object.fromEntries(options.map((o) => [o.id, baseline.current.optionVersions[o.id] ?? o.version])),
    };
    const next = { ...h.doc, options: nextOptions };
    // Undo steps may refer to a deleted option; a fresh history is the honest answer then.
    setHistory(removed ? createHistory(next) : { ...h, doc: next });
  }, []);

  // ——— things saved straight away, outside the undo history ———
  const afterOptionsChange = useCallback(
    (options: OptionRecord[]) => {
      setOptionList(options);
      syncOptions(options);
      qc.invalidateQueries({ queryKey: roomKeys.lists() });
    },
    [qc, syncOptions],
  );

  const refetchOptions = useCallback(async () => {
    const fresh = await api<RoomDetail>(`/api/rooms/${roomId}`);
    // The room's query follows, so what the decided project stands on stays current.
    qc.setQueryData<RoomDetail>(roomKeys.detail(roomId), (d) => (d ? { ...d, options: fresh.options } : d));
    afterOptionsChange(fresh.options);
    return fresh.options;
  }, [afterOptionsChange, qc, roomId]);

  const renameRoom = useCallback(
    async (name: string) => {
      const { room } = await api<{ room: RoomRecord }>(`/api/rooms/${roomId}`, {
        method: 'PUT',
        body: { version: baseline.current.roomVersion, name },
      });
      baseline.current = { ...baseline.current, roomVersion: room.version };
      setRoomName(room.name);
      qc.setQueryData<RoomDetail>(roomKeys.detail(roomId), (d) => (d ? { ...d, room: { ...room, shell: d.room.shell } } : d));
      qc.invalidateQueries({ queryKey: roomKeys.lists() });
    },
    [qc, roomId],
  );

  const saveOptionMeta = useCallback(async (optionId: string, meta: { name?: string; note?: string }) => {
    const { option } = await api<{ option: OptionRecord }>(`/api/options/${optionId}`, {
      method: 'PUT',
      body: { version: baseline.current.optionVersions[optionId], ...meta },
    });
    baseline.current = {
      ...baseline.current,
      optionVersions: { ...baseline.current.optionVersions, [optionId]: option.version },
    };
    setOptionList((list) =>
      list.map((o) => (o.id === optionId ? { ...o, name: option.name, note: option.note, version: option.version } : o)),
    );
  }, []);

  const addOption = useCallback(
    async (fromOptionId?: string) => {
      // A duplicate copies what the server has, so save first.
      if (fromOptionId) await saveRef.current();
      const { option } = await api<{ option: OptionRecord }>(`/api/rooms/${roomId}/options`, {
        method: 'POST',
        body: fromOptionId ? { fromOptionId } : {},
      });
      await refetchOptions();
      return option.id;
    },
    [refetchOptions, roomId],
  );

  const deleteOption = useCallback(
    async (optionId: string) => {
      await api(`/api/options/${optionId}`, { method: 'DELETE' });
      await refetchOptions();
    },
    [refetchOptions],
  );

  const moveOption = useCallback(
    async (optionId: string, by: -1 | 1) => {
      const ids = optionList.map((o) => o.id);
      const i = ids.indexOf(optionId);
      const j = i + by;
      if (i < 0 || j < 0 || j >= ids.length) return;
      [ids[i], ids[j]] = [ids[j], ids[i]];
      const { options } = await api<{ options: OptionRecord[] }>(`/api/rooms/${roomId}/option-order`, {
        method: 'PUT',
        body: { optionIds: ids },
      });
      setOptionList((list) => options.map((o) => ({ ...o, version: list.find((l) => l.id === o.id)?.version ?? o.version })));
    },
    [optionList, roomId],
  );

  return {
    roomName,
    options: optionList,
    renameRoom,
    saveOptionMeta,
    addOption,
    deleteOption,
    moveOption,
    doc,
    history,
    run,
    attempt: attemptField,
    finishGesture,
    undo: doUndo,
    redo: doRedo,
    canUndo: canUndo(history),
    canRedo: canRedo(history),
    undoLabel: undoLabel(history),
    redoLabel: redoLabel(history),
    saveState,
    dirty,
    saveNow: save,
    conflict,
    loadTheirs,
    keepMine,
    restored,
    dismissRestored: () => setRestored(null),
    resolveStaleDraft,
    message,
    refusal,
    clearMessage: () => {
      setMessage(null);
      setRefusal(null);
    },
    syncOptions,
  };
}

export type RoomEditor = ReturnType<typeof useRoomEditor>;
