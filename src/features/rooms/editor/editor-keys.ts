// The room editor's keymap: one list that both answers the keys and writes the keys help, so the
// two cannot disagree. Pure of React; the page builds the context and listens for the presses.
import {
  holdPiece,
  movePiece,
  NUDGE_LARGE_STEP_MM,
  NUDGE_STEP_MM,
  removeOpening,
  removePiece,
  rotatePiece,
  updateOpening,
} from '../../../../shared/commands';
import type { Piece } from '../../../../shared/schemas/option';
import type { Opening } from '../../../../shared/schemas/room';
import type { RoomEditor } from './use-room-editor';

/** What the keymap reads of a key press. */
export type KeyPress = Pick<KeyboardEvent, 'key' | 'ctrlKey' | 'metaKey' | 'shiftKey'>;

/** What a key of the editor acts on: the editor, and the piece or opening selected (if it is still there). */
export interface KeyContext {
  editor: Pick<RoomEditor, 'undo' | 'redo' | 'run'>;
  readOnly: boolean;
  optionId: string;
  piece: Piece | undefined;
  opening: Opening | undefined;
  clearSelection: () => void;
  stopDrawing: () => void;
  showKeys: () => void;
}

/**
 * One key of the editor: how the keys help writes it and what it does. `press` says which key
 * presses it takes, `when` whether it applies now and `run` acts; an entry without them is only
 * described here and handled where it happens (on the plan, during a drag).
 */
export interface EditorKey {
  keys: string;
  label: string;
  press?: (e: KeyPress) => boolean;
  when?: (c: KeyContext, e: KeyPress) => boolean;
  run?: (c: KeyContext, e: KeyPress) => void;
  /** Let the browser act on the press too. */
  keepDefault?: boolean;
}

const withMod = (e: KeyPress, key: string) => (e.ctrlKey || e.metaKey) && e.key.toLowerCase() === key;
const ARROWS: Record<string, [number, number]> = { ArrowLeft: [-1, 0], ArrowRight: [1, 0], ArrowUp: [0, -1], ArrowDown: [0, 1] };
const nudgeStep = (e: KeyPress) => (e.shiftKey ? NUDGE_LARGE_STEP_MM : NUDGE_STEP_MM);
const isDelete = (e: KeyPress) => e.key === 'Delete' || e.key === 'Backspace';
/** A piece key: the designer can edit and the selected piece is there. */
const onPiece = (c: KeyContext) => !c.readOnly && c.piece !== undefined;

/** The editor's keymap, in the order the keys help lists it. */
export const EDITOR_KEYS: readonly EditorKey[] = [
  { keys: 'Ctrl Z  /  ⌘ Z', label: 'Undo', press: (e) => withMod(e, 'z') && !e.shiftKey, run: (c) => c.editor.undo() },
  {
    keys: 'Ctrl Shift Z  /  ⌘ Shift Z',
    label: 'Redo',
    press: (e) => (withMod(e, 'z') && e.shiftKey) || withMod(e, 'y'),
    run: (c) => c.editor.redo(),
  },
  {
    keys: 'Arrow keys',
    label: 'Nudge the selection 1 cm (with Shift, 10 cm)',
    press: (e) => Object.hasOwn(ARROWS, e.key),
    // A piece moves on the plan while it is placed; an opening slides along its wall.
    when: (c, e) =>
      !c.readOnly &&
      ((c.piece?.placed ?? false) || (c.opening !== undefined && (e.key === 'ArrowLeft' || e.key === 'ArrowRight'))),
    run: (c, e) => {
      const [dx, dy] = ARROWS[e.key];
      const step = nudgeStep(e);
      if (c.piece) {
        const p = c.piece;
        c.editor.run(movePiece(c.optionId, p.id, p.x + dx * step, p.y + dy * step), { gesture: `nudge-${p.id}` });
      } else if (c.opening) {
        const o = c.opening;
        c.editor.run(updateOpening(o.id, { offset: Math.max(0, o.offset + dx * step) }), { gesture: `nudge-${o.id}` });
      }
    },
  },
  {
    keys: 'R  /  Shift R',
    label: 'Turn the selected piece 15° clockwise / anticlockwise',
    press: (e) => e.key.toLowerCase() === 'r',
    when: onPiece,
    run: (c, e) => c.piece && c.editor.run(rotatePiece(c.optionId, c.piece.id, c.piece.rotation + (e.shiftKey ? -15 : 15))),
  },
  {
    keys: 'H',
    label: 'Move the selected piece to the holding area',
    press: (e) => e.key.toLowerCase() === 'h',
    when: onPiece,
    run: (c) => c.piece && c.editor.run(holdPiece(c.optionId, c.piece.id)),
  },
  {
    keys: 'Delete',
    label: 'Remove the selection',
    press: isDelete,
    when: (c) => !c.readOnly && (c.piece !== undefined || c.opening !== undefined),
    run: (c) => {
      const removed = c.piece
        ? c.editor.run(removePiece(c.optionId, c.piece.id))
        : c.opening && c.editor.run(removeOpening(c.opening.id));
      if (removed) c.clearSelection();
    },
  },
  {
    keys: 'Esc',
    label: 'Clear the selection, stop drawing',
    press: (e) => e.key === 'Escape',
    keepDefault: true,
    run: (c) => {
      c.clearSelection();
      c.stopDrawing();
    },
  },
  { keys: 'Tab (on the plan)', label: 'Go through the pieces one by one' },
  { keys: 'Alt while dragging', label: 'Do not snap to walls or pieces' },
  { keys: 'Shift while turning', label: 'Turn freely instead of 15° steps' },
  { keys: '?', label: 'Show these keys', press: (e) => e.key === '?', keepDefault: true, run: (c) => c.showKeys() },
];

/** The entry that answers a press now, or undefined when none does (the press is left alone). */
export function keyFor(e: KeyPress, context: KeyContext): EditorKey | undefined {
  return EDITOR_KEYS.find((k) => k.run && k.press?.(e) && (k.when?.(context, e) ?? true));
}
