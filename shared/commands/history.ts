// Undo and redo for the room editor. The history is an immutable value (React state can hold it);
// every function returns a new one. Each step keeps only the patches of what its command touched.
//
// Gestures: a drag or a typed-and-adjusted value fires many commands; passing the same `gesture`
// key to consecutive applies folds them into one step, so one undo puts back the state from before
// the gesture began. The gesture stays open until another key (or none) is used, undo or redo runs,
// or endGesture closes it — call endGesture on pointer-up so the next drag reusing the key starts a
// new step.
import { apply, type Command, type CommandName } from './command';
import type { EditorDoc } from './editor-doc';
import type { FieldProblem } from '../geometry/validate';
import { applyPatches, diffDocs, type Patch } from './patch';

/** Steps kept for undo; older ones are forgotten (bounded memory on a long session). */
export const DEFAULT_HISTORY_LIMIT = 200;

/** One undoable step: the command that opened it, its undo-menu label and the patches to reverse it. */
export interface HistoryStep {
  readonly name: CommandName;
  readonly label: string;
  readonly gesture: string | null;
  readonly patches: readonly Patch[];
}

/** The editor's document with its undo and redo steps. */
export interface History {
  readonly doc: EditorDoc;
  /** Oldest first; the last one is undone next. */
  readonly undoSteps: readonly HistoryStep[];
  /** The last one is redone next. */
  readonly redoSteps: readonly HistoryStep[];
  /** The gesture the last step belongs to while later applies may still join it. */
  readonly openGesture: string | null;
  readonly limit: number;
}

export interface HistoryOptions {
  /** How many undo steps to keep (at least 1). */
  limit?: number;
}

export interface ApplyOptions {
  /** Consecutive applies with the same key make one undo step (a drag, a nudge run). */
  gesture?: string;
}

/** The history after an apply: changed on success; the same history, and the designer's sentence, on refusal. */
export type HistoryResult =
  { ok: true; history: History } | { ok: false; message: string; problems?: FieldProblem[]; history: History };

/** A history with nothing to undo or redo. */
export function createHistory(doc: EditorDoc, options: HistoryOptions = {}): History {
  const limit = Math.max(1, Math.floor(options.limit ?? DEFAULT_HISTORY_LIMIT));
  return { doc, undoSteps: [], redoSteps: [], openGesture: null, limit };
}

function keepLast(steps: readonly HistoryStep[], limit: number): readonly HistoryStep[] {
  return steps.length > limit ? steps.slice(steps.length - limit) : steps;
}

/** Applies a command and records it: a new undo step, or folded into the open step of the same gesture. Clears redo. */
export function applyToHistory(history: History, command: Command, options: ApplyOptions = {}): HistoryResult {
  const result = apply(history.doc, command);
  if (!result.ok) return { ok: false, message: result.message, problems: result.problems, history };
  const gesture = options.gesture ?? null;
  const last = history.undoSteps[history.undoSteps.length - 1];
  const joins = gesture !== null && history.openGesture === gesture && last !== undefined && last.gesture === gesture;
  if (joins) {
    // One diff from before the gesture to now, so a 60-event drag stores two numbers, not 60 pairs.
    const beforeGesture = applyPatches(history.doc, last.patches, 'before');
    const patches = diffDocs(beforeGesture, result.doc);
    const earlier = history.undoSteps.slice(0, -1);
    // A gesture that ends where it began leaves nothing to undo.
    const undoSteps = patches.length === 0 ? earlier : [...earlier, { ...last, patches }];
    return { ok: true, history: { ...history, doc: result.doc, undoSteps, redoSteps: [], openGesture: gesture } };
  }
  const patches = diffDocs(history.doc, result.doc);
  // A command that changes nothing (a piece moved onto its own spot) is not worth an undo step.
  if (patches.length === 0) return { ok: true, history };
  const step: HistoryStep = { name: command.name, label: command.label(history.doc), gesture, patches };
  const undoSteps = keepLast([...history.undoSteps, step], history.limit);
  return { ok: true, history: { ...history, doc: result.doc, undoSteps, redoSteps: [], openGesture: gesture } };
}

/** Whether there is a step to undo. */
export function canUndo(history: History): boolean {
  return history.undoSteps.length > 0;
}

/** Whether there is a step to redo. */
export function canRedo(history: History): boolean {
  return history.redoSteps.length > 0;
}

/** The undo menu's label for the next undo ("Move Sofa"), or null. */
export function undoLabel(history: History): string | null {
  return history.undoSteps[history.undoSteps.length - 1]?.label ?? null;
}

/** The label for the next redo, or null. */
export function redoLabel(history: History): string | null {
  return history.redoSteps[history.redoSteps.length - 1]?.label ?? null;
}

/** Puts back the document from before the last step; the same history when there is nothing to undo. */
export function undo(history: History): History {
  const step = history.undoSteps[history.undoSteps.length - 1];
  if (!step) return history;
  return {
    ...history,
    doc: applyPatches(history.doc, step.patches, 'before'),
    undoSteps: history.undoSteps.slice(0, -1),
    redoSteps: [...history.redoSteps, step],
    openGesture: null,
  };
}

/** Re-applies the last undone step; the same history when there is nothing to redo. */
export function redo(history: History): History {
  const step = history.redoSteps[history.redoSteps.length - 1];
  if (!step) return history;
  return {
    ...history,
    doc: applyPatches(history.doc, step.patches, 'after'),
    undoSteps: keepLast([...history.undoSteps, step], history.limit),
    redoSteps: history.redoSteps.slice(0, -1),
    openGesture: null,
  };
}

/** Closes the open gesture, so the next apply starts a new undo step even with the same key. */
export function endGesture(history: History): History {
  return history.openGesture === null ? history : { ...history, openGesture: null };
}
