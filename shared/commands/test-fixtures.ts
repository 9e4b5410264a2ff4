// Invented rooms and options for the command tests (plan mm), frozen so a command that mutates its
// input throws instead of passing.
import { apply, type Command } from './command';
import { createEditorDoc, type EditorDoc } from './editor-doc';
import type { RoomShellInput } from '../schemas/room';
import { designExampleRoom } from '../../tests/reference/rooms';
import type { OptionDocInput } from '../schemas/option';

/** Freezes a plain JSON value all the way down. */
export function deepFreeze<T>(value: T): T {
  if (typeof value === 'object' && value !== null && !Object.isFrozen(value)) {
    Object.freeze(value);
    for (const child of Object.values(value)) deepFreeze(child);
  }
  return value;
}

/** The DESIGN.md example room, 4200 × 3600 mm: door d1 on wall 0 (300–1120), window w1 on wall 2 (1000–2500), passage p1 on wall 3 (800–1700). */
export const rectangleShell: RoomShellInput = designExampleRoom;

/** The L-shaped outline of the flooring reference (plan mm). */
export const lOutline: [number, number][] = [[0, 0], [5000, 0], [5000, 2500], [3000, 2500], [3000, 4000], [0, 4000]];

export const optionA: OptionDocInput = {
  pieces: [
    { id: 'sofa', name: 'Sofa', x: 2100, y: 3100, width: 2100, depth: 900, height: 850, rotation: 180, status: 'new', price: 1450 },
    { id: 'chair', name: 'Armchair', x: 700, y: 1500, width: 850, depth: 850, height: 900, rotation: 90, status: 'existing', colour: '#a0b1c2' },
    { id: 'lamp', name: '', x: -800, y: 500, width: 400, depth: 400, height: 1600, status: 'existing', placed: false },
  ],
  finishes: { floor: 'oak-boards', walls: 'paint-chalk', wallOverrides: { '1': 'paint-sage' } },
};

export const optionB: OptionDocInput = {
  pieces: [{ id: 'table', name: 'Dining table', x: 2100, y: 1800, width: 1200, depth: 800, height: 750, status: 'new' }],
};

/** The rectangle room with options A and B, frozen. */
export function sampleDoc(shell: RoomShellInput = rectangleShell): EditorDoc {
  return deepFreeze(createEditorDoc(shell, { 'opt-a': optionA, 'opt-b': optionB }));
}

/** The document a command gives; fails the test with the refusal when it is refused. */
export function applied(doc: EditorDoc, command: Command): EditorDoc {
  const result = apply(doc, command);
  if (!result.ok) throw new Error(`expected ${command.name} to run, got: ${result.message}`);
  return deepFreeze(result.doc);
}

/** The refusal message a command gives; fails the test when it runs. */
export function refusal(doc: EditorDoc, command: Command): string {
  const result = apply(doc, command);
  if (result.ok) throw new Error(`expected ${command.name} to be refused`);
  return result.message;
}
