// The opening commands of the room editor: add, update (move along a wall, resize, sill, hinge,
// swing), flip a door's hinge or swing, and remove a door, window or passage.
import { openingSchema, type Door, type Opening, type Window } from '../schemas/room';
import { checkWall, definedFields, done, firstIssue, makeCommand, refuse, type Command, type RunResult } from './command';
import type { EditorDoc } from './editor-doc';

/** What updateOpening may change; `sill` is for windows only, `hinge` and `swing` for doors only. Lengths in mm. */
export interface OpeningPatch {
  wall?: number;
  offset?: number;
  width?: number;
  height?: number;
  sill?: Window['sill'];
  hinge?: Door['hinge'];
  swing?: Door['swing'];
}

/** Patch fields that only slide an opening along (or onto another) wall: the undo menu calls that a move. */
const MOVE_FIELDS: ReadonlySet<string> = new Set(['wall', 'offset']);

function findOpening(doc: EditorDoc, id: string): Opening | undefined {
  return doc.shell.openings.find((o) => o.id === id);
}

function typeWord(doc: EditorDoc, id: string): string {
  return findOpening(doc, id)?.type ?? 'opening';
}

function noOpening(id: string): RunResult {
  return refuse(`there is no opening ${id}`);
}

function replaceOpening(doc: EditorDoc, id: string, next: Opening): EditorDoc {
  return { ...doc, shell: { ...doc.shell, openings: doc.shell.openings.map((o) => (o.id === id ? next : o)) } };
}

/** Adds a door, window or passage (lengths in mm along its wall's inside face); its id comes from the caller. */
export function addOpening(opening: Opening): Command {
  return makeCommand(
    'addOpening',
    { opening },
    {
      label: (_doc, args) => `Add ${typeof args.opening?.type === 'string' ? args.opening.type : 'opening'}`,
      run: (doc, args) => {
        const parsed = openingSchema.safeParse(args.opening);
        if (!parsed.success) return refuse(firstIssue(parsed.error));
        if (findOpening(doc, parsed.data.id)) return refuse(`there is already an opening ${parsed.data.id}`);
        const bad = checkWall(doc.shell, parsed.data.wall);
        if (bad) return refuse(bad);
        return done({ ...doc, shell: { ...doc.shell, openings: [...doc.shell.openings, parsed.data] } });
      },
    },
  );
}

/** Changes an opening's place or size (mm): its offset when dragged along the wall, its wall, width, height, a window's sill, a door's hinge or swing. */
export function updateOpening(id: string, patch: OpeningPatch): Command {
  return makeCommand(
    'updateOpening',
    { id, patch },
    {
      label: (doc, args) => {
        const verb = Object.keys(definedFields(args.patch)).every((key) => MOVE_FIELDS.has(key)) ? 'Move' : 'Change';
        return `${verb} ${typeWord(doc, args.id)}`;
      },
      run: (doc, args) => {
        const opening = findOpening(doc, args.id);
        if (!opening) return noOpening(args.id);
        const patch = definedFields(args.patch);
        if (patch.sill !== undefined && opening.type !== 'window') return refuse(`a ${opening.type} has no sill`);
        if ((patch.hinge !== undefined || patch.swing !== undefined) && opening.type !== 'door')
          return refuse(`a ${opening.type} has no hinge or swing`);
        if (patch.wall !== undefined) {
          const bad = checkWall(doc.shell, patch.wall);
          if (bad) return refuse(bad);
        }
        const parsed = openingSchema.safeParse({ ...opening, ...patch });
        if (!parsed.success) return refuse(firstIssue(parsed.error));
        return done(replaceOpening(doc, args.id, parsed.data));
      },
    },
  );
}

function flipDoor(name: 'flipHinge' | 'flipSwing', id: string, flip: (door: Door) => Door, what: string): Command {
  return makeCommand(
    name,
    { id },
    {
      label: () => `Flip door ${what}`,
      run: (doc, args) => {
        const opening = findOpening(doc, args.id);
        if (!opening) return noOpening(args.id);
        if (opening.type !== 'door') return refuse(`${args.id} is a ${opening.type}, not a door`);
        return done(replaceOpening(doc, args.id, flip(opening)));
      },
    },
  );
}

/** Turns a door on its other jamb: hinge start ↔ end along the wall. */
export function flipHinge(id: string): Command {
  return flipDoor('flipHinge', id, (door) => ({ ...door, hinge: door.hinge === 'start' ? 'end' : 'start' }), 'hinge');
}

/** Swings a door the other way: into the room ↔ out of it. */
export function flipSwing(id: string): Command {
  return flipDoor('flipSwing', id, (door) => ({ ...door, swing: door.swing === 'in' ? 'out' : 'in' }), 'swing');
}

/** Removes an opening from its wall. */
export function removeOpening(id: string): Command {
  return makeCommand(
    'removeOpening',
    { id },
    {
      label: (doc, args) => `Remove ${typeWord(doc, args.id)}`,
      run: (doc, args) => {
        if (!findOpening(doc, args.id)) return noOpening(args.id);
        return done({ ...doc, shell: { ...doc.shell, openings: doc.shell.openings.filter((o) => o.id !== args.id) } });
      },
    },
  );
}
