// Tests for the piece commands: add, move, turn, resize, update, duplicate and remove a piece, place
// it from the holding area and send it back, and the refusals of each.
import { describe, expect, it } from 'vitest';
import {
  addPiece,
  duplicatePiece,
  holdPiece,
  movePiece,
  placePiece,
  removePiece,
  resizePiece,
  rotatePiece,
  updatePiece,
} from './piece-commands';
import { applied, refusal, sampleDoc } from '../../tests/fixtures/commands';

const stool = { id: 'stool', name: 'Stool', x: 1000, y: 1000, width: 400, depth: 400, height: 450, status: 'new' as const };

function pieceOf(doc: ReturnType<typeof sampleDoc>, optionId: string, id: string) {
  return doc.options[optionId].pieces.find((p) => p.id === id);
}

describe('addPiece', () => {
  it('adds a piece with schema defaults to one option only', () => {
    const doc = sampleDoc();
    const next = applied(doc, addPiece('opt-b', { ...stool, rotation: -90 }));
    expect(pieceOf(next, 'opt-b', 'stool')).toEqual({ ...stool, rotation: 270, elevation: 0, placed: true });
    expect(next.options['opt-a']).toBe(doc.options['opt-a']);
    expect(next.shell).toBe(doc.shell);
    expect(addPiece('opt-b', stool).label(doc)).toBe('Add Stool');
  });

  it('refuses an unknown option, a taken id and a bad size', () => {
    const doc = sampleDoc();
    expect(refusal(doc, addPiece('opt-z', stool))).toBe("Can't add Stool: there is no option opt-z.");
    expect(refusal(doc, addPiece('opt-a', { ...stool, id: 'sofa' }))).toBe(
      "Can't add Stool: option opt-a already has a piece sofa.",
    );
    expect(refusal(doc, addPiece('opt-a', { ...stool, depth: -1 }))).toBe("Can't add Stool: depth must be more than 0 mm.");
  });
});

describe('movePiece', () => {
  it('moves the centre and keeps every other piece shared', () => {
    const doc = sampleDoc();
    const next = applied(doc, movePiece('opt-a', 'sofa', 2000, 3150));
    expect(pieceOf(next, 'opt-a', 'sofa')).toMatchObject({ x: 2000, y: 3150, rotation: 180 });
    expect(pieceOf(next, 'opt-a', 'chair')).toBe(pieceOf(doc, 'opt-a', 'chair'));
    expect(movePiece('opt-a', 'sofa', 0, 0).label(doc)).toBe('Move Sofa');
  });

  it('refuses a missing piece and a position that is not a number', () => {
    const doc = sampleDoc();
    expect(refusal(doc, movePiece('opt-a', 'bed', 0, 0))).toBe("Can't move piece: there is no piece bed in option opt-a.");
    expect(refusal(doc, movePiece('opt-a', 'sofa', Number.POSITIVE_INFINITY, 0))).toBe(
      "Can't move Sofa: x must be a number of millimetres.",
    );
  });
});

describe('rotatePiece', () => {
  it('stores the turn in [0, 360)', () => {
    const doc = sampleDoc();
    expect(pieceOf(applied(doc, rotatePiece('opt-a', 'sofa', -45)), 'opt-a', 'sofa')?.rotation).toBe(315);
    expect(pieceOf(applied(doc, rotatePiece('opt-a', 'sofa', 720)), 'opt-a', 'sofa')?.rotation).toBe(0);
    expect(pieceOf(applied(doc, rotatePiece('opt-a', 'sofa', 450.5)), 'opt-a', 'sofa')?.rotation).toBe(90.5);
    expect(pieceOf(applied(doc, rotatePiece('opt-a', 'sofa', -1e-12)), 'opt-a', 'sofa')?.rotation).toBe(0);
    expect(rotatePiece('opt-a', 'chair', 0).label(doc)).toBe('Turn Armchair');
    expect(refusal(doc, rotatePiece('opt-a', 'sofa', Number.NaN))).toBe("Can't turn Sofa: the turn must be a number.");
  });
});

describe('resizePiece', () => {
  it('changes the sizes given about the centre', () => {
    const next = applied(sampleDoc(), resizePiece('opt-a', 'sofa', { width: 1800, height: undefined }));
    expect(pieceOf(next, 'opt-a', 'sofa')).toMatchObject({ x: 2100, y: 3100, width: 1800, depth: 900, height: 850 });
  });

  it('refuses no size and a non-positive one', () => {
    const doc = sampleDoc();
    expect(refusal(doc, resizePiece('opt-a', 'sofa', {}))).toBe("Can't resize Sofa: give a width, depth or height.");
    expect(refusal(doc, resizePiece('opt-a', 'sofa', { depth: 0 }))).toBe("Can't resize Sofa: the depth must be more than 0 mm.");
  });
});

describe('updatePiece', () => {
  it('changes details, and null clears colour and supplier link', () => {
    const doc = sampleDoc();
    const next = applied(
      doc,
      updatePiece('opt-a', 'chair', {
        name: 'Reading chair',
        price: 320,
        status: 'new',
        elevation: 0,
        finishId: 'velvet-moss',
        colour: null,
        supplierUrl: 'https://example.com/chair',
      }),
    );
    const chair = pieceOf(next, 'opt-a', 'chair');
    expect(chair).toMatchObject({
      name: 'Reading chair',
      price: 320,
      status: 'new',
      finishId: 'velvet-moss',
      supplierUrl: 'https://example.com/chair',
    });
    expect(chair && 'colour' in chair).toBe(false);
    expect(
      pieceOf(applied(next, updatePiece('opt-a', 'chair', { supplierUrl: null, price: null })), 'opt-a', 'chair'),
    ).not.toHaveProperty('supplierUrl');
    expect(pieceOf(applied(next, updatePiece('opt-a', 'chair', { fixedToWall: true })), 'opt-a', 'chair')?.fixedToWall).toBe(
      true,
    );
    expect(updatePiece('opt-a', 'chair', { name: 'Reading chair' }).label(doc)).toBe('Rename Armchair');
    expect(updatePiece('opt-a', 'chair', { price: 1 }).label(doc)).toBe('Change Armchair');
  });

  it('puts a model on a piece, fits it or lets it wear the finishes, and takes it off', () => {
    const doc = sampleDoc();
    const worn = applied(doc, updatePiece('opt-a', 'chair', { modelId: 'model-1', modelFitted: true, modelWearsFinishes: true }));
    expect(pieceOf(worn, 'opt-a', 'chair')).toMatchObject({ modelId: 'model-1', modelFitted: true, modelWearsFinishes: true });
    expect(pieceOf(applied(worn, updatePiece('opt-a', 'chair', { modelId: null })), 'opt-a', 'chair')?.modelId).toBeNull();
  });

  it('refuses values the schema does not allow and fields that other commands own', () => {
    const doc = sampleDoc();
    expect(refusal(doc, updatePiece('opt-a', 'sofa', { colour: 'red' }))).toBe(
      "Can't change Sofa: colour must be a colour like #a0b1c2.",
    );
    expect(refusal(doc, updatePiece('opt-a', 'sofa', { elevation: -10 }))).toBe(
      "Can't change Sofa: elevation cannot be below the floor.",
    );
    expect(refusal(doc, updatePiece('opt-a', 'sofa', { x: 5 } as never))).toBe("Can't change Sofa: x cannot be changed here.");
  });
});

describe('duplicatePiece', () => {
  it('copies a piece under the new id, offset, right after the original', () => {
    const doc = sampleDoc();
    const next = applied(doc, duplicatePiece('opt-a', 'chair', 'chair-2', [0, 1000]));
    expect(next.options['opt-a'].pieces.map((p) => p.id)).toEqual(['sofa', 'chair', 'chair-2', 'lamp']);
    expect(pieceOf(next, 'opt-a', 'chair-2')).toEqual({ ...pieceOf(doc, 'opt-a', 'chair'), id: 'chair-2', x: 700, y: 2500 });
    expect(pieceOf(applied(doc, duplicatePiece('opt-a', 'chair', 'chair-3')), 'opt-a', 'chair-3')).toMatchObject({
      x: 900,
      y: 1700,
    });
    expect(duplicatePiece('opt-a', 'chair', 'c').label(doc)).toBe('Duplicate Armchair');
  });

  it('refuses a taken or empty id', () => {
    const doc = sampleDoc();
    expect(refusal(doc, duplicatePiece('opt-a', 'chair', 'sofa'))).toBe(
      "Can't duplicate Armchair: option opt-a already has a piece sofa.",
    );
    expect(refusal(doc, duplicatePiece('opt-a', 'chair', ''))).toBe("Can't duplicate Armchair: the copy needs an id.");
  });
});

describe('removePiece', () => {
  it('removes the piece from its option', () => {
    const doc = sampleDoc();
    expect(applied(doc, removePiece('opt-a', 'sofa')).options['opt-a'].pieces.map((p) => p.id)).toEqual(['chair', 'lamp']);
    expect(removePiece('opt-a', 'lamp').label(doc)).toBe('Remove piece');
    expect(refusal(doc, removePiece('opt-b', 'sofa'))).toBe("Can't remove piece: there is no piece sofa in option opt-b.");
  });
});

describe('placePiece and holdPiece', () => {
  it('bring a piece from the holding area to a spot and send it back', () => {
    const doc = sampleDoc();
    const placed = applied(doc, placePiece('opt-a', 'lamp', 300, 300));
    expect(pieceOf(placed, 'opt-a', 'lamp')).toMatchObject({ placed: true, x: 300, y: 300 });
    const held = applied(placed, holdPiece('opt-a', 'lamp'));
    expect(pieceOf(held, 'opt-a', 'lamp')).toMatchObject({ placed: false, x: 300, y: 300 });
    expect(holdPiece('opt-a', 'sofa').label(doc)).toBe('Move Sofa to the holding area');
    expect(placePiece('opt-a', 'sofa', 0, 0).label(doc)).toBe('Place Sofa');
  });

  it('refuse an unknown option or a place that is not a number', () => {
    const doc = sampleDoc();
    expect(refusal(doc, holdPiece('opt-q', 'sofa'))).toBe("Can't move piece to the holding area: there is no option opt-q.");
    expect(refusal(doc, placePiece('opt-a', 'lamp', 0, Number.NaN))).toBe(
      "Can't place piece: y must be a number of millimetres.",
    );
  });
});
