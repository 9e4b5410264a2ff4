// Tests for the room editor's keys: the keys help, undo and redo, Esc, nudging pieces and
// openings, turning, holding and removing the selection.
import { describe, expect, it } from 'vitest';
import type { Command } from '../../../../shared/commands';
import type { Opening } from '../../../../shared/schemas/room';
import type { Piece } from '../../../../shared/schemas/option';
import { EDITOR_KEYS, keyFor, type KeyContext, type KeyPress } from './editor-keys';

const sofa = {
  id: 'sofa',
  name: 'Sofa',
  x: 2000,
  y: 1500,
  width: 2000,
  depth: 900,
  height: 800,
  rotation: 90,
  placed: true,
} as Piece;
const door = { id: 'd1', type: 'door', wall: 0, offset: 30, width: 820 } as unknown as Opening;

type Done = string | { name: string; args: Readonly<Record<string, unknown>>; gesture?: string };

/** A context that records what the keys did: plain words, or each command run with its gesture. */
function setUp(over: Partial<KeyContext> = {}) {
  const did: Done[] = [];
  const context: KeyContext = {
    editor: {
      undo: () => did.push('undo'),
      redo: () => did.push('redo'),
      run: (command: Command, options?: { gesture?: string }) => {
        did.push({ name: command.name, args: command.args, ...(options?.gesture ? { gesture: options.gesture } : {}) });
        return true;
      },
    },
    readOnly: false,
    optionId: 'opt-a',
    piece: undefined,
    opening: undefined,
    clearSelection: () => did.push('clear selection'),
    stopDrawing: () => did.push('stop drawing'),
    showKeys: () => did.push('show keys'),
    ...over,
  };
  const press = (key: string, mods: Partial<KeyPress> = {}) => {
    const e: KeyPress = { key, ctrlKey: false, metaKey: false, shiftKey: false, ...mods };
    const entry = keyFor(e, context);
    entry?.run?.(context, e);
    return entry?.label ?? null;
  };
  return { did, press };
}

describe('the editor keymap', () => {
  it('writes the keys help in its order, each key once', () => {
    expect(EDITOR_KEYS.map((k) => [k.keys, k.label])).toEqual([
      ['Ctrl Z  /  ⌘ Z', 'Undo'],
      ['Ctrl Shift Z  /  ⌘ Shift Z', 'Redo'],
      ['Arrow keys', 'Nudge the selection 1 cm (with Shift, 10 cm)'],
      ['R  /  Shift R', 'Turn the selected piece 15° clockwise / anticlockwise'],
      ['H', 'Move the selected piece to the holding area'],
      ['Delete', 'Remove the selection'],
      ['Esc', 'Clear the selection, stop drawing'],
      ['Tab (on the plan)', 'Go through the pieces one by one'],
      ['Alt while dragging', 'Do not snap to walls or pieces'],
      ['Shift while turning', 'Turn freely instead of 15° steps'],
      ['?', 'Show these keys'],
    ]);
  });

  it('undoes and redoes with Ctrl or ⌘, Shift Z and Y, even when read only', () => {
    const { did, press } = setUp({ readOnly: true, piece: sofa });
    expect([press('z', { ctrlKey: true }), press('Z', { metaKey: true, shiftKey: true }), press('y', { ctrlKey: true })]).toEqual(
      ['Undo', 'Redo', 'Redo'],
    );
    expect([press('z'), press('r'), press('Delete'), press('ArrowLeft')]).toEqual([null, null, null, null]);
    expect(did).toEqual(['undo', 'redo', 'redo']);
  });

  it('shows the keys and clears the selection and drawing with Esc, leaving the browser its default', () => {
    const { did, press } = setUp({ readOnly: true });
    press('?');
    press('Escape');
    expect(did).toEqual(['show keys', 'clear selection', 'stop drawing']);
    expect(EDITOR_KEYS.filter((k) => k.keepDefault).map((k) => k.keys)).toEqual(['Esc', '?']);
  });

  it('nudges a placed piece 10 mm, or 100 mm with Shift, as one gesture', () => {
    const { did, press } = setUp({ piece: sofa });
    press('ArrowLeft');
    press('ArrowDown', { shiftKey: true });
    expect(did).toEqual([
      { name: 'movePiece', args: { optionId: 'opt-a', id: 'sofa', x: 1990, y: 1500 }, gesture: 'nudge-sofa' },
      { name: 'movePiece', args: { optionId: 'opt-a', id: 'sofa', x: 2000, y: 1600 }, gesture: 'nudge-sofa' },
    ]);
  });

  it('leaves a held piece where it is, and slides an opening along its wall only, never before its start', () => {
    expect(setUp({ piece: { ...sofa, placed: false } }).press('ArrowLeft')).toBeNull();
    const { did, press } = setUp({ opening: door });
    expect([press('ArrowUp'), press('ArrowDown'), press('ArrowRight'), press('ArrowLeft', { shiftKey: true })]).toEqual([
      null,
      null,
      'Nudge the selection 1 cm (with Shift, 10 cm)',
      'Nudge the selection 1 cm (with Shift, 10 cm)',
    ]);
    expect(did.map((d) => typeof d !== 'string' && [d.args.patch, d.gesture])).toEqual([
      [{ offset: 40 }, 'nudge-d1'],
      [{ offset: 0 }, 'nudge-d1'],
    ]);
  });

  it('turns, holds and removes the selected piece, and clears the selection once it is removed', () => {
    const { did, press } = setUp({ piece: sofa });
    press('r');
    press('R', { shiftKey: true });
    press('h');
    press('Backspace');
    expect(did.map((d) => (typeof d === 'string' ? d : [d.name, d.args.rotationDeg ?? null]))).toEqual([
      ['rotatePiece', 105],
      ['rotatePiece', 75],
      ['holdPiece', null],
      ['removePiece', null],
      'clear selection',
    ]);
  });

  it('removes a selected opening with Delete, and does nothing for a selected wall', () => {
    const withDoor = setUp({ opening: door });
    withDoor.press('Delete');
    expect(withDoor.did).toEqual([{ name: 'removeOpening', args: { id: 'd1' } }, 'clear selection']);
    const onWall = setUp();
    expect([onWall.press('Delete'), onWall.press('ArrowLeft'), onWall.press('r')]).toEqual([null, null, null]);
  });
});
