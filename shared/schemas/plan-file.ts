// The plan file: one room with one option as a single JSON file (import, export, the analysis
// command), its schema, readPlanFile with errors naming their field, and writePlanFile.
import { z } from 'zod';
import { validateRoomShell, type FieldProblem } from '../geometry/validate';
import { finishAssignmentsSchema, optionNameSchema, optionNoteSchema, piecesSchema } from './option';
import { kindFromWords, pieceKindSchema } from './piece-kind';
import { roomNameText, roomShellSchema } from './room';

export const PLAN_FILE_FORMAT = 'parlour-plan';
export const PLAN_FILE_VERSION = 1;

/** One room with one option as a single JSON file (import, export, the analysis command). Lengths in plan mm. */
export const planFileSchema = z.object({
  format: z.literal(PLAN_FILE_FORMAT),
  version: z.literal(PLAN_FILE_VERSION),
  // The room, option and piece schemas of the API, so a plan file meets the same limits.
  // An empty room name is allowed here: the import names the room "Imported room".
  room: roomShellSchema.safeExtend({ name: roomNameText }),
  option: z.object({
    name: optionNameSchema,
    note: optionNoteSchema.optional(),
    pieces: piecesSchema.default([]),
    finishes: finishAssignmentsSchema.optional(),
  }),
});
export type PlanFile = z.infer<typeof planFileSchema>;
export type PlanFileInput = z.input<typeof planFileSchema>;

export type ReadPlanFileResult = { ok: true; plan: PlanFile } | { ok: false; errors: string[] };

/** Writes a zod issue path as `room.openings[1].width`. */
export function formatFieldPath(path: readonly PropertyKey[]): string {
  let text = '';
  for (const key of path) {
    if (typeof key === 'number') text += `[${key}]`;
    else text += text === '' ? String(key) : `.${String(key)}`;
  }
  return text === '' ? '(file)' : text;
}

/** Zod issues as field problems, so schema and geometry errors reach the caller in one shape. */
export function zodIssuesToProblems(error: z.ZodError): FieldProblem[] {
  return error.issues.map((issue) => ({ path: formatFieldPath(issue.path), message: issue.message }));
}

// Format and version are checked first and alone: a file of another kind would otherwise drown the
// one useful message in a list of missing fields.
const headerSchema = z.object({ format: z.literal(PLAN_FILE_FORMAT), version: z.literal(PLAN_FILE_VERSION) });

/**
 * Version 1 files written before kinds were a fixed list carry any text as a piece's kind
 * (`sofa-3`, `bed-double`): such a value is read by the words it contains, as migration 0010 did
 * for stored options, and anything unrecognised becomes plain-block.
 */
function withKnownKinds(data: unknown): unknown {
  const option = (data as { option?: { pieces?: unknown } }).option;
  if (!option || !Array.isArray(option.pieces)) return data;
  const pieces = option.pieces.map((p: unknown) => {
    if (!p || typeof p !== 'object') return p;
    const piece = p as { kind?: unknown; name?: unknown };
    if (typeof piece.kind !== 'string' || pieceKindSchema.safeParse(piece.kind).success) return p;
    return { ...piece, kind: kindFromWords(piece.kind, typeof piece.name === 'string' ? piece.name : '') };
  });
  return { ...(data as object), option: { ...option, pieces } };
}

/** Reads a plan file from JSON text or parsed JSON; every error names its field (`room.outline: wall 0 crosses wall 2`). */
export function readPlanFile(input: unknown): ReadPlanFileResult {
  let data: unknown = input;
  if (typeof input === 'string') {
    try {
      data = JSON.parse(input);
    } catch (error) {
      return { ok: false, errors: [`(file): not valid JSON (${error instanceof Error ? error.message : String(error)})`] };
    }
  }
  const header = headerSchema.safeParse(data);
  if (!header.success) {
    const problems = zodIssuesToProblems(header.error).map((p) =>
      p.path === 'format'
        ? { ...p, message: `must be "${PLAN_FILE_FORMAT}"` }
        : p.path === 'version'
          ? { ...p, message: `must be ${PLAN_FILE_VERSION} (this version of Parlour reads version ${PLAN_FILE_VERSION})` }
          : p,
    );
    return { ok: false, errors: problems.map((p) => `${p.path}: ${p.message}`) };
  }
  const parsed = planFileSchema.safeParse(withKnownKinds(data));
  if (!parsed.success) {
    return { ok: false, errors: zodIssuesToProblems(parsed.error).map((p) => `${p.path}: ${p.message}`) };
  }
  const problems = validateRoomShell(parsed.data.room, 'room');
  if (problems.length > 0) return { ok: false, errors: problems.map((p) => `${p.path}: ${p.message}`) };
  return { ok: true, plan: parsed.data };
}

/** A plan file as pretty JSON text (lengths in plan mm); throws on a plan that readPlanFile would refuse. */
export function writePlanFile(plan: Omit<PlanFileInput, 'format' | 'version'>): string {
  const full = planFileSchema.parse({ format: PLAN_FILE_FORMAT, version: PLAN_FILE_VERSION, ...plan });
  const problems = validateRoomShell(full.room, 'room');
  if (problems.length > 0)
    throw new Error(`cannot write the plan file: ${problems.map((p) => `${p.path}: ${p.message}`).join('; ')}`);
  return `${JSON.stringify(full, null, 2)}\n`;
}
