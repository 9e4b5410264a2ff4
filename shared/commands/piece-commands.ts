// The piece commands of the room editor: add, move, turn, resize, update, duplicate and remove a
// piece in one option, and place it from or send it to the holding area.
import { pieceSchema, type OptionDoc, type Piece, type PieceInput } from '../schemas/option';
import type { PlanPoint } from '../schemas/room';
import {
  checkMm,
  checkNumber,
  checkSizeMm,
  definedFields,
  done,
  firstIssue,
  makeCommand,
  refuse,
  type Command,
  type RunResult,
} from './command';
import type { EditorDoc } from './editor-doc';
import { normaliseRotationDeg } from '../geometry/piece';

/** How far (plan mm, right and down) a duplicate lands from its original by default, so both stay visible (common practice). */
export const DUPLICATE_OFFSET_MM: PlanPoint = [200, 200];

/** What updatePiece may change; null clears colour, supplier link or finish, and marks the price unknown. */
export interface PiecePatch {
  name?: string;
  colour?: string | null;
  price?: number | null;
  supplierUrl?: string | null;
  status?: Piece['status'];
  elevation?: number;
  finishId?: string | null;
  /** A new kind drops the old kind's settings unless new ones come with it. */
  kind?: Piece['kind'];
  settings?: Piece['settings'] | null;
  accentColour?: string | null;
  accentFinishId?: string | null;
  /** Marked as fixed to the wall against tipping (tall storage). */
  fixedToWall?: boolean;
  /** A model from the studio's library worn in 3D, or null for the drawn form. */
  modelId?: string | null;
  modelFitted?: boolean;
  modelWearsFinishes?: boolean;
}

/** New box sizes in mm; the centre stays where it is. */
export interface PieceSize {
  width?: number;
  depth?: number;
  height?: number;
}

// Fields whose null means "take the field away" because the schema has them optional, not nullable.
const CLEARED_BY_NULL: ReadonlySet<string> = new Set(['colour', 'supplierUrl', 'settings', 'accentColour']);
const PATCHABLE: ReadonlySet<string> = new Set([
  'name',
  'colour',
  'price',
  'supplierUrl',
  'status',
  'elevation',
  'finishId',
  'kind',
  'settings',
  'accentColour',
  'accentFinishId',
  'fixedToWall',
  'modelId',
  'modelFitted',
  'modelWearsFinishes',
]);

function findPiece(doc: EditorDoc, optionId: string, id: string): Piece | undefined {
  return doc.options[optionId]?.pieces.find((p) => p.id === id);
}

/** A piece's name as the undo menu shows it ("Move Sofa"); "piece" when it has none or is missing. */
function pieceWords(doc: EditorDoc, optionId: string, id: string): string {
  return findPiece(doc, optionId, id)?.name.trim() || 'piece';
}

function withOption(doc: EditorDoc, optionId: string, option: OptionDoc): EditorDoc {
  return { ...doc, options: { ...doc.options, [optionId]: option } };
}

/** The option, the piece and its place in the option's list, or why one of them is not there. */
function locate(doc: EditorDoc, optionId: string, id: string): { option: OptionDoc; index: number; piece: Piece } | string {
  const option = doc.options[optionId];
  if (!option) return `there is no option ${optionId}`;
  const index = option.pieces.findIndex((p) => p.id === id);
  const piece = option.pieces[index];
  if (!piece) return `there is no piece ${id} in option ${optionId}`;
  return { option, index, piece };
}

// Replaces one piece of one option; `edit` gives the new piece or a refusal reason.
function editPiece(doc: EditorDoc, optionId: string, id: string, edit: (piece: Piece) => Piece | string): RunResult {
  const found = locate(doc, optionId, id);
  if (typeof found === 'string') return refuse(found);
  const { option, index, piece } = found;
  const next = edit(piece);
  if (typeof next === 'string') return refuse(next);
  const pieces = option.pieces.slice();
  pieces[index] = next;
  return done(withOption(doc, optionId, { ...option, pieces }));
}

/** Adds a piece (plan mm, degrees) to an option; its id comes from the caller and must be new in that option. */
export function addPiece(optionId: string, piece: PieceInput): Command {
  return makeCommand(
    'addPiece',
    { optionId, piece },
    {
      label: (_doc, args) =>
        `Add ${typeof args.piece?.name === 'string' && args.piece.name.trim() !== '' ? args.piece.name.trim() : 'piece'}`,
      run: (doc, args) => {
        const option = doc.options[args.optionId];
        if (!option) return refuse(`there is no option ${args.optionId}`);
        const parsed = pieceSchema.safeParse(args.piece);
        if (!parsed.success) return refuse(firstIssue(parsed.error));
        if (option.pieces.some((p) => p.id === parsed.data.id))
          return refuse(`option ${args.optionId} already has a piece ${parsed.data.id}`);
        const added = { ...parsed.data, rotation: normaliseRotationDeg(parsed.data.rotation) };
        return done(withOption(doc, args.optionId, { ...option, pieces: [...option.pieces, added] }));
      },
    },
  );
}

/** Moves a piece's centre to (x, y) plan mm. */
export function movePiece(optionId: string, id: string, x: number, y: number): Command {
  return makeCommand(
    'movePiece',
    { optionId, id, x, y },
    {
      label: (doc, args) => `Move ${pieceWords(doc, args.optionId, args.id)}`,
      run: (doc, args) =>
        editPiece(
          doc,
          args.optionId,
          args.id,
          (piece) => checkMm(args.x, 'x') ?? checkMm(args.y, 'y') ?? { ...piece, x: args.x, y: args.y },
        ),
    },
  );
}

/** Turns a piece to rotationDeg clockwise seen from above, stored in [0, 360). */
export function rotatePiece(optionId: string, id: string, rotationDeg: number): Command {
  return makeCommand(
    'rotatePiece',
    { optionId, id, rotationDeg },
    {
      label: (doc, args) => `Turn ${pieceWords(doc, args.optionId, args.id)}`,
      run: (doc, args) =>
        editPiece(
          doc,
          args.optionId,
          args.id,
          (piece) => checkNumber(args.rotationDeg, 'the turn') ?? { ...piece, rotation: normaliseRotationDeg(args.rotationDeg) },
        ),
    },
  );
}

/** Changes a piece's width, depth or height (mm) about its centre. */
export function resizePiece(optionId: string, id: string, size: PieceSize): Command {
  return makeCommand(
    'resizePiece',
    { optionId, id, size },
    {
      label: (doc, args) => `Resize ${pieceWords(doc, args.optionId, args.id)}`,
      run: (doc, args) =>
        editPiece(doc, args.optionId, args.id, (piece) => {
          const size = definedFields(args.size);
          const keys = Object.keys(size) as (keyof PieceSize)[];
          if (keys.length === 0) return 'give a width, depth or height';
          for (const key of keys) {
            if (key !== 'width' && key !== 'depth' && key !== 'height') return `${String(key)} is not a size`;
            const bad = checkSizeMm(size[key] as number, `the ${key}`);
            if (bad) return bad;
          }
          return { ...piece, ...size };
        }),
    },
  );
}

/** Changes a piece's details: name, colour, price, supplier link, existing or new, elevation (mm) or finish. */
export function updatePiece(optionId: string, id: string, patch: PiecePatch): Command {
  return makeCommand(
    'updatePiece',
    { optionId, id, patch },
    {
      label: (doc, args) => {
        const keys = Object.keys(definedFields(args.patch));
        return `${keys.length === 1 && keys[0] === 'name' ? 'Rename' : 'Change'} ${pieceWords(doc, args.optionId, args.id)}`;
      },
      run: (doc, args) =>
        editPiece(doc, args.optionId, args.id, (piece) => {
          const next: Record<string, unknown> = { ...piece };
          if (args.patch.kind !== undefined && args.patch.kind !== piece.kind && args.patch.settings === undefined)
            delete next.settings;
          for (const [key, value] of Object.entries(definedFields(args.patch))) {
            if (!PATCHABLE.has(key)) return `${key} cannot be changed here`;
            if (value === null && CLEARED_BY_NULL.has(key)) {
              delete next[key];
              continue;
            }
            const field = pieceSchema.shape[key as keyof typeof pieceSchema.shape].safeParse(value);
            if (!field.success) return `${key} ${field.error.issues[0]?.message ?? 'is not valid'}`;
            next[key] = field.data;
          }
          return next as Piece;
        }),
    },
  );
}

/** Copies a piece under a new id (from the caller), offset by [dx, dy] plan mm, right after the original in the list. */
export function duplicatePiece(optionId: string, id: string, newId: string, offsetMm: PlanPoint = DUPLICATE_OFFSET_MM): Command {
  return makeCommand(
    'duplicatePiece',
    { optionId, id, newId, offsetMm },
    {
      label: (doc, args) => `Duplicate ${pieceWords(doc, args.optionId, args.id)}`,
      run: (doc, args) => {
        const found = locate(doc, args.optionId, args.id);
        if (typeof found === 'string') return refuse(found);
        const bad =
          (typeof args.newId !== 'string' || args.newId === '' ? 'the copy needs an id' : null) ??
          (findPiece(doc, args.optionId, args.newId) ? `option ${args.optionId} already has a piece ${args.newId}` : null) ??
          checkMm(args.offsetMm[0], 'the offset x') ??
          checkMm(args.offsetMm[1], 'the offset y');
        if (bad) return refuse(bad);
        const { option, index, piece: original } = found;
        const copy: Piece = { ...original, id: args.newId, x: original.x + args.offsetMm[0], y: original.y + args.offsetMm[1] };
        const pieces = [...option.pieces.slice(0, index + 1), copy, ...option.pieces.slice(index + 1)];
        return done(withOption(doc, args.optionId, { ...option, pieces }));
      },
    },
  );
}

/** Takes a piece out of an option altogether. */
export function removePiece(optionId: string, id: string): Command {
  return makeCommand(
    'removePiece',
    { optionId, id },
    {
      label: (doc, args) => `Remove ${pieceWords(doc, args.optionId, args.id)}`,
      run: (doc, args) => {
        const found = locate(doc, args.optionId, args.id);
        if (typeof found === 'string') return refuse(found);
        const { option } = found;
        return done(withOption(doc, args.optionId, { ...option, pieces: option.pieces.filter((p) => p.id !== args.id) }));
      },
    },
  );
}

/** Brings a piece out of the holding area (or moves a placed one) to centre (x, y) plan mm. */
export function placePiece(optionId: string, id: string, x: number, y: number): Command {
  return makeCommand(
    'placePiece',
    { optionId, id, x, y },
    {
      label: (doc, args) => `Place ${pieceWords(doc, args.optionId, args.id)}`,
      run: (doc, args) =>
        editPiece(
          doc,
          args.optionId,
          args.id,
          (piece) => checkMm(args.x, 'x') ?? checkMm(args.y, 'y') ?? { ...piece, x: args.x, y: args.y, placed: true },
        ),
    },
  );
}

/** Sends a piece to the holding area, outside the room; it keeps its last position for when it comes back. */
export function holdPiece(optionId: string, id: string): Command {
  return makeCommand(
    'holdPiece',
    { optionId, id },
    {
      label: (doc, args) => `Move ${pieceWords(doc, args.optionId, args.id)} to the holding area`,
      run: (doc, args) => editPiece(doc, args.optionId, args.id, (piece) => ({ ...piece, placed: false })),
    },
  );
}
