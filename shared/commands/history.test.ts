// Tests for the undo history: undo and redo through every kind of command, menu labels, the step
// limit, and gestures (a drag, or a move and a turn) folded into one step.
import { describe, expect, it } from 'vitest';
import { assignFinish } from './finish-commands';
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
  DEFAULT_HISTORY_LIMIT,
  type History,
} from './history';
import type { Command } from './command';
import { flipSwing, updateOpening } from './opening-commands';
import { insertCorner, moveCorner, setWallLength, setWallThickness } from './outline-commands';
import { addPiece, duplicatePiece, holdPiece, movePiece, removePiece, updatePiece } from './piece-commands';
import { deepFreeze, sampleDoc } from '../../tests/fixtures/commands';

function run(history: History, command: Command, gesture?: string): History {
  const result = applyToHistory(history, command, gesture === undefined ? {} : { gesture });
  if (!result.ok) throw new Error(result.message);
  return deepFreeze(result.history);
}

const stool = { id: 'stool', name: 'Stool', x: 1000, y: 1000, width: 400, depth: 400, height: 450, status: 'new' as const };

describe('undo and redo', () => {
  it('put back exactly each earlier document, through every kind of command, and forward again', () => {
    const commands: Command[] = [
      setWallLength(0, 4500),
      insertCorner(2, 3000),
      setWallThickness(250, 1),
      updateOpening('d1', { offset: 900 }),
      flipSwing('d1'),
      addPiece('opt-b', stool),
      updatePiece('opt-a', 'chair', { colour: null, price: 99 }),
      duplicatePiece('opt-a', 'sofa', 'sofa-2'),
      removePiece('opt-a', 'chair'),
      holdPiece('opt-a', 'sofa'),
      assignFinish('opt-a', { wall: 1 }, null),
    ];
    let history = createHistory(sampleDoc());
    const docs = [history.doc];
    for (const command of commands) {
      history = run(history, command);
      docs.push(history.doc);
    }
    expect(history.undoSteps.length).toBe(commands.length);
    for (let i = commands.length - 1; i >= 0; i--) {
      history = undo(history);
      expect(history.doc).toStrictEqual(docs[i]);
    }
    expect(canUndo(history)).toBe(false);
    for (let i = 1; i <= commands.length; i++) {
      history = redo(history);
      expect(history.doc).toStrictEqual(docs[i]);
    }
    expect(canRedo(history)).toBe(false);
  });

  it('records the touched fields, not document copies', () => {
    const history = run(createHistory(sampleDoc()), movePiece('opt-a', 'sofa', 2000, 3150));
    expect(history.undoSteps[0].patches.map((p) => p.path)).toEqual([
      ['options', 'opt-a', 'pieces', 0, 'x'],
      ['options', 'opt-a', 'pieces', 0, 'y'],
    ]);
    expect(history.undoSteps[0].patches[0]).toEqual({
      path: ['options', 'opt-a', 'pieces', 0, 'x'],
      before: { present: true, value: 2100 },
      after: { present: true, value: 2000 },
    });
  });

  it('labels the next undo and redo for the menu', () => {
    let history = run(createHistory(sampleDoc()), movePiece('opt-a', 'sofa', 2000, 3150));
    history = run(history, moveCorner(2, 4300, 3600));
    expect(undoLabel(history)).toBe('Move corner 2');
    expect(redoLabel(history)).toBeNull();
    history = undo(history);
    expect([undoLabel(history), redoLabel(history)]).toEqual(['Move Sofa', 'Move corner 2']);
  });

  it('clears redo after a new command', () => {
    let history = run(createHistory(sampleDoc()), movePiece('opt-a', 'sofa', 2000, 3150));
    history = undo(history);
    expect(canRedo(history)).toBe(true);
    history = run(history, movePiece('opt-a', 'chair', 800, 1500));
    expect(canRedo(history)).toBe(false);
    expect(redo(history)).toBe(history);
  });

  it('leaves the history as it was when a command is refused, or when it changes nothing', () => {
    const history = run(createHistory(sampleDoc()), movePiece('opt-a', 'sofa', 2000, 3150));
    const refused = applyToHistory(history, moveCorner(1, 800, 0));
    expect(refused.ok).toBe(false);
    expect(refused.history).toBe(history);
    if (!refused.ok) expect(refused.message).toContain('door d1');
    expect(run(history, movePiece('opt-a', 'sofa', 2000, 3150))).toBe(history);
    expect(undo(createHistory(sampleDoc())).undoSteps).toEqual([]);
  });

  it('keeps only the last steps up to its limit', () => {
    expect(createHistory(sampleDoc()).limit).toBe(DEFAULT_HISTORY_LIMIT);
    let history = createHistory(sampleDoc(), { limit: 5 });
    const docs = [history.doc];
    for (let i = 1; i <= 8; i++) {
      history = run(history, movePiece('opt-a', 'sofa', 2000 + i, 3100));
      docs.push(history.doc);
    }
    expect(history.undoSteps.length).toBe(5);
    for (let i = 0; i < 5; i++) history = undo(history);
    expect(canUndo(history)).toBe(false);
    expect(history.doc).toStrictEqual(docs[3]);
  });
});

describe('gestures', () => {
  it('fold a 60-event drag into one undo step that puts the piece back where it started', () => {
    const start = sampleDoc();
    let history = createHistory(start);
    for (let i = 1; i <= 60; i++) history = run(history, movePiece('opt-a', 'sofa', 2100 - i * 10, 3100 - i * 5), 'drag-42');
    expect(history.doc.options['opt-a'].pieces[0]).toMatchObject({ x: 1500, y: 2800 });
    expect(history.undoSteps.length).toBe(1);
    expect(history.undoSteps[0].patches.length).toBe(2);
    expect(undoLabel(history)).toBe('Move Sofa');
    const undone = undo(history);
    expect(undone.doc).toStrictEqual(start);
    expect(redo(undone).doc).toStrictEqual(history.doc);
  });

  it('fold different commands of one gesture (a move and a turn while snapping) into one step', () => {
    let history = createHistory(sampleDoc());
    history = run(history, movePiece('opt-a', 'chair', 425, 1500), 'drag-7');
    history = run(history, updatePiece('opt-a', 'chair', { price: 10 }), 'drag-7');
    expect(history.undoSteps.length).toBe(1);
    expect(undo(history).doc).toStrictEqual(sampleDoc());
  });

  it('start a new step for another key, no key, after endGesture and after an undo', () => {
    let history = createHistory(sampleDoc());
    history = run(history, movePiece('opt-a', 'sofa', 2000, 3100), 'a');
    history = run(history, movePiece('opt-a', 'sofa', 1900, 3100), 'b');
    expect(history.undoSteps.length).toBe(2);
    history = run(history, movePiece('opt-a', 'sofa', 1800, 3100));
    history = run(history, movePiece('opt-a', 'sofa', 1700, 3100));
    expect(history.undoSteps.length).toBe(4);
    history = run(history, movePiece('opt-a', 'sofa', 1600, 3100), 'c');
    history = endGesture(history);
    history = run(history, movePiece('opt-a', 'sofa', 1500, 3100), 'c');
    expect(history.undoSteps.length).toBe(6);
    history = undo(history);
    history = run(history, movePiece('opt-a', 'sofa', 1400, 3100), 'c');
    expect(history.undoSteps.length).toBe(6);
    expect(undo(history).doc.options['opt-a'].pieces[0].x).toBe(1600);
  });

  it('leave no step when a drag ends where it began', () => {
    let history = createHistory(sampleDoc());
    history = run(history, movePiece('opt-a', 'sofa', 2000, 3100), 'drag');
    history = run(history, movePiece('opt-a', 'sofa', 2100, 3100), 'drag');
    expect(canUndo(history)).toBe(false);
    expect(history.doc).toStrictEqual(sampleDoc());
  });
});
