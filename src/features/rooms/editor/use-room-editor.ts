// The room editor's state: the undo history over one room's shell and its options' documents,
// autosave with the version check, conflict handling, and a local draft that survives a reload.
// The rules themselves (baseline, draft, conflicts, what is frozen) are in editor-session.ts.
import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import type { OptionRecord, RoomRecord } from '../../../../shared/schemas/room-api';
import {
  applyToHistory,
  canRedo,
  canUndo,
  createHistory,
  endGesture,
  redo,
  redoLabel,
  undo,
  undoLabel,
  type ApplyOptions,
  type Command,
  type History,
} from '../../../../shared/commands';
import type { FieldProblem } from '../../../../shared/geometry/validate';
import { api, ApiError } from '../../../lib/api';
import { roomKeys, type RoomDetail } from '../api/rooms';
import {
  afterOptionSaved,
  afterRoomSaved,
  AUTOSAVE_DELAY_MS,
  baselineOf,
  changedParts,
  conflictOf,
  draftKey,
  draftOf,
  frozenRefusal,
  hasChanges,
  keepMine as keepMineOver,
  loadTheirs as loadTheirsOver,
  NOTHING_FROZEN,
  parseDraft,
  retryTimer,
  startingPoint,
  withDraft,
  withOptions,
  type Baseline,
  type Conflict,
  type Draft,
  type Frozen,
  type RetryTimer,
  type SaveState,
} from './editor-session';

export type { Conflict, Frozen, SaveState } from './editor-session';

/** Why a field's change was refused: the sentence, and the rules it would break. */
export interface HistoryFailure {
  message: string;
  problems: FieldProblem[];
}

function readDraft(roomId: string): Draft | null {
  try {
    return parseDraft(localStorage.getItem(draftKey(roomId)));
  } catch {
    // Blocked storage: no draft to offer.
    return null;
  }
}

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
  const retry = useRef<RetryTimer | null>(null);
  const historyRef = useRef(history);
  historyRef.current = history;

  const doc = history.doc;
  const dirty = useMemo(() => {
    return hasChanges(doc, baseline.current);
    // baseline changes only together with a history update or a save, both of which re-render.
  }, [doc, saveState]); // eslint-disable-line react-hooks/exhaustive-deps

  // The local draft: written whenever there is something unsaved, removed once all is saved.
  useEffect(() => {
    if (readOnly) return;
    if (dirty) {
      try {
        localStorage.setItem(draftKey(roomId), JSON.stringify(draftOf(doc, baseline.current)));
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
        baseline.current = afterRoomSaved(baseline.current, current.shell, room.version);
        qc.setQueryData<RoomDetail>(roomKeys.detail(roomId), (d) => (d ? { ...d, room } : d));
      }
      for (const optionId of parts.options) {
        const version = baseline.current.optionVersions[optionId];
        const optionDoc = current.options[optionId];
        const { option } = await api<{ option: OptionRecord }>(`/api/options/${optionId}`, {
          method: 'PUT',
          body: { version, doc: optionDoc },
        });
        baseline.current = afterOptionSaved(baseline.current, optionId, optionDoc, option.version);
        qc.setQueryData<RoomDetail>(roomKeys.detail(roomId), (d) =>
          d ? { ...d, options: d.options.map((o) => (o.id === optionId ? option : o)) } : d,
        );
      }
      attempt.current = 0;
      setMessage(null);
      setSaveState(hasChanges(historyRef.current.doc, baseline.current) ? 'unsaved' : 'saved');
    } catch (err) {
      if (err instanceof ApiError && err.status === 409 && err.code === 'decided') {
        // Changes made before the project was decided (a draft, another tab) cannot be saved onto a chosen option.
        setMessage(err.message);
        setSaveState('unsaved');
      } else if (err instanceof ApiError && err.status === 409) {
        const theirs = (err.body as { current: RoomRecord | OptionRecord }).current;
        setConflict(conflictOf(theirs));
        setSaveState('conflict');
      } else if (err instanceof ApiError && err.status >= 400 && err.status < 500) {
        // The server refused the document itself; retrying would not help. Keep it unsaved and say why.
        setMessage(err.message);
        setSaveState('unsaved');
      } else {
        setMessage(err instanceof Error ? err.message : 'The save failed.');
        setSaveState('retrying');
        // Once the editor is gone its retries stop (the draft stays behind as the safety net).
        retry.current?.schedule(attempt.current);
        attempt.current += 1;
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

  // Leaving the editor inside the autosave's quiet time (back to the project, say) saves what is
  // pending, once: a waiting retry is cleared and no new one starts.
  useEffect(() => {
    const timer = retryTimer(() => void saveRef.current());
    retry.current = timer;
    return () => {
      timer.dispose();
      void saveRef.current();
    };
  }, []);

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
    const { baseline: next, doc: nextDoc } = loadTheirsOver(baseline.current, historyRef.current.doc, conflict);
    baseline.current = next;
    if (conflict.part === 'room') {
      const { theirs } = conflict;
      qc.setQueryData<RoomDetail>(roomKeys.detail(roomId), (d) => (d ? { ...d, room: theirs } : d));
    }
    // Undo steps were recorded against our version of that part; start a fresh history from theirs.
    setHistory(createHistory(nextDoc));
    setConflict(null);
    setSaveState('unsaved');
  }, [conflict, qc, roomId]);

  /** Both are kept: this tab's changes go on top of theirs (three-way merge), then saved with their version. */
  const keepMine = useCallback(() => {
    if (!conflict) return;
    const { baseline: next, doc: nextDoc } = keepMineOver(baseline.current, historyRef.current.doc, conflict);
    baseline.current = next;
    setHistory(createHistory(nextDoc));
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
    const { baseline: next, doc: nextDoc, removed } = withOptions(baseline.current, h.doc, options);
    baseline.current = next;
    // Undo steps may refer to a deleted option; a fresh history is the honest answer then.
    setHistory(removed ? createHistory(nextDoc) : { ...h, doc: nextDoc });
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
