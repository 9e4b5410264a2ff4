// The room editor's command model: command names, the Command and CommandSpec shapes, the small
// helpers commands use to check their arguments, and apply, which runs one and validates the result.
import type { z } from 'zod';
import type { FieldProblem } from '../geometry/validate';
import { validateRoomShell } from '../geometry/validate';
import type { RoomShell } from '../schemas/room';
import type { EditorDoc } from './editor-doc';

/** Every command's stable name: history steps, logs and tests refer to commands by it. */
export type CommandName =
  | 'setOutline'
  | 'moveCorner'
  | 'setWallLength'
  | 'insertCorner'
  | 'removeCorner'
  | 'setWallHeight'
  | 'setWallThickness'
  | 'setChildRoom'
  | 'closeOutlineGap'
  | 'addOpening'
  | 'updateOpening'
  | 'flipHinge'
  | 'flipSwing'
  | 'removeOpening'
  | 'addPiece'
  | 'movePiece'
  | 'rotatePiece'
  | 'resizePiece'
  | 'updatePiece'
  | 'duplicatePiece'
  | 'removePiece'
  | 'placePiece'
  | 'holdPiece'
  | 'assignFinish'
  | 'markSeen'
  | 'unmarkSeen';

/** A command's own verdict: the new document, or why it will not run (a fragment such as "there is no corner 7"). */
export type RunResult = { ok: true; doc: EditorDoc } | { ok: false; reason: string };

/** What applying a command gives: the new document, or a sentence for the designer saying why not. */
export type CommandResult = { ok: true; doc: EditorDoc } | { ok: false; message: string; problems?: FieldProblem[] };

/**
 * A named, pure change to an editor document with its arguments bound. `label` names it for the
 * undo menu ("Move Sofa") from the document it is about to change; `run` never mutates its input.
 */
export interface Command {
  readonly name: CommandName;
  readonly args: Readonly<Record<string, unknown>>;
  label(doc: EditorDoc): string;
  run(doc: EditorDoc): RunResult;
}

/** How one kind of command reads its arguments: the pair every command creator binds. */
export interface CommandSpec<A> {
  label(doc: EditorDoc, args: A): string;
  run(doc: EditorDoc, args: A): RunResult;
}

/** Binds arguments to a command spec. */
export function makeCommand<A extends Readonly<Record<string, unknown>>>(
  name: CommandName,
  args: A,
  spec: CommandSpec<A>,
): Command {
  return { name, args, label: (doc) => spec.label(doc, args), run: (doc) => spec.run(doc, args) };
}

/** A successful run. */
export function done(doc: EditorDoc): RunResult {
  return { ok: true, doc };
}

/** A refused run; the reason reads after "Can't <label>: ". */
export function refuse(reason: string): RunResult {
  return { ok: false, reason };
}

/** A value checked on its way in: the value, or a reason fragment. */
export type Checked<T> = { ok: true; value: T } | { ok: false; reason: string };

/** A patch without its keys set to undefined, so spreading it never blanks a field. */
export function definedFields<T extends object>(patch: T): Partial<T> {
  return Object.fromEntries(Object.entries(patch).filter(([, value]) => value !== undefined)) as Partial<T>;
}

/** The first zod issue as "field: message", for a refusal reason. */
export function firstIssue(error: z.ZodError): string {
  const issue = error.issues[0];
  if (!issue) return 'is not valid';
  const path = issue.path.map(String).join('.');
  return path === '' ? issue.message : `${path} ${issue.message}`;
}

/** Checks a plain number (degrees, a price) is finite. */
export function checkNumber(value: number, what: string): string | null {
  return typeof value === 'number' && Number.isFinite(value) ? null : `${what} must be a number`;
}

/** Checks a plan length or coordinate in mm is a finite number; `minMm` makes it a size. */
export function checkMm(value: number, what: string, minMm?: number): string | null {
  if (typeof value !== 'number' || !Number.isFinite(value)) return `${what} must be a number of millimetres`;
  if (minMm !== undefined && value < minMm)
    return minMm === 0 ? `${what} cannot be negative` : `${what} must be at least ${minMm} mm`;
  return null;
}

/** Checks a positive size in mm. */
export function checkSizeMm(value: number, what: string): string | null {
  const bad = checkMm(value, what);
  if (bad) return bad;
  return value > 0 ? null : `${what} must be more than 0 mm`;
}

/** Checks a wall index against a shell (walls are numbered from 0, like corners). */
export function checkWall(shell: RoomShell, wall: number): string | null {
  const n = shell.outline.length;
  if (!Number.isInteger(wall) || wall < 0 || wall >= n) return `there is no wall ${wall} (the room has walls 0 to ${n - 1})`;
  return null;
}

function describeProblem(shell: RoomShell, problem: FieldProblem): string {
  const match = /^openings\[(\d+)\]/.exec(problem.path);
  if (match) {
    const opening = shell.openings[Number(match[1])];
    if (opening) return `${opening.type} ${opening.id}: ${problem.message}`;
  }
  return problem.message;
}

// A document loaded with a fault (say an old save with overlapping windows) must stay editable, so
// only problems at paths that were sound before the command count against it.
function newShellProblems(before: RoomShell, after: RoomShell): FieldProblem[] {
  const known = new Set(validateRoomShell(before).map((p) => p.path));
  return validateRoomShell(after).filter((p) => !known.has(p.path));
}

function lowerFirst(text: string): string {
  return text.charAt(0).toLowerCase() + text.slice(1);
}

/**
 * Runs a command on an editor document (plan mm). Refuses, with a sentence for the designer, when
 * the command does or when the new shell would break a rule of validateRoomShell.
 */
export function apply(doc: EditorDoc, command: Command): CommandResult {
  const result = command.run(doc);
  const refusal = (reason: string, problems?: FieldProblem[]): CommandResult => ({
    ok: false,
    message: `Can't ${lowerFirst(command.label(doc))}: ${reason}.`,
    problems,
  });
  if (!result.ok) return refusal(result.reason);
  if (result.doc.shell !== doc.shell) {
    const problems = newShellProblems(doc.shell, result.doc.shell);
    if (problems.length > 0) {
      const more = problems.length > 1 ? ` (and ${problems.length - 1} more)` : '';
      return refusal(`${describeProblem(result.doc.shell, problems[0]!)}${more}`, problems);
    }
  }
  return { ok: true, doc: result.doc };
}
