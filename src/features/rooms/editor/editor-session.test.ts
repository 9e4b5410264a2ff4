// Tests for the room editor's session: the local draft, what is unsaved, save conflicts, options
// changed elsewhere, a decided project's limits, and the save-retry waits and timer.
import { afterEach, describe, expect, it, vi } from 'vitest';
import { movePiece, setWallHeight } from '../../../../shared/commands';
import type { OptionRecord, RoomRecord } from '../../../../shared/schemas/room-api';
import { applied, sampleDoc } from '../../../../tests/fixtures/commands';
import {
  baselineOf,
  changedParts,
  conflictOf,
  draftOf,
  frozenRefusal,
  FROZEN_OPTION_TEXT,
  FROZEN_SHELL_TEXT,
  hasChanges,
  keepMine,
  loadTheirs,
  parseDraft,
  retryDelayMs,
  retryTimer,
  startingPoint,
  withOptions,
  type Baseline,
} from './editor-session';

const doc = sampleDoc();
const room: RoomRecord = {
  id: 'room-1',
  projectId: 'project-1',
  name: 'Garden room',
  position: 0,
  shell: doc.shell,
  version: 3,
  updatedAt: '2026-01-01T00:00:00.000Z',
};
const option = (id: string, version: number, position: number): OptionRecord => ({
  id,
  roomId: room.id,
  name: '',
  note: '',
  position,
  doc: doc.options[id],
  version,
  updatedAt: '2026-01-01T00:00:00.000Z',
});
const base: Baseline = baselineOf(room, [option('opt-a', 5, 0), option('opt-b', 2, 1)]);

describe('the local draft', () => {
  it('is read back as written, and the editor carries on from it when nothing changed on the server', () => {
    const edited = applied(doc, movePiece('opt-a', 'sofa', 1500, 3000));
    const draft = parseDraft(JSON.stringify(draftOf(edited, base)));
    expect(draft).toStrictEqual({ doc: edited, roomVersion: 3, optionVersions: { 'opt-a': 5, 'opt-b': 2 } });
    const start = startingPoint(base, draft);
    expect(start.restored).toBe('restored');
    expect(start.history.doc.options['opt-a'].pieces[0].x).toBe(1500);
  });

  it('is offered, not used, when the server saved a newer version since', () => {
    const edited = applied(doc, setWallHeight(2700));
    const draft = parseDraft(JSON.stringify({ ...draftOf(edited, base), roomVersion: 2 }));
    const start = startingPoint(base, draft);
    expect([start.restored, start.history.doc.shell.wallHeight, start.staleDraft?.doc.shell.wallHeight]).toEqual([
      'stale',
      doc.shell.wallHeight,
      2700,
    ]);
  });

  it.each([
    ['text that is not JSON', '{"doc": {"shell"'],
    ['JSON that is not an object', '42'],
    ['an older shape without versions', JSON.stringify({ doc })],
    [
      'a shell with two corners',
      JSON.stringify({
        ...draftOf(doc, base),
        doc: {
          ...doc,
          shell: {
            outline: [
              [0, 0],
              [1000, 0],
            ],
          },
        },
      }),
    ],
    ['a version that is not a whole number', JSON.stringify({ ...draftOf(doc, base), roomVersion: 'three' })],
    ['an option version missing its number', JSON.stringify({ ...draftOf(doc, base), optionVersions: { 'opt-a': null } })],
  ])('is dropped without a crash when it is %s, and the editor starts from the server', (_what, text) => {
    const draft = parseDraft(text);
    expect(draft).toBeNull();
    const start = startingPoint(base, draft);
    expect([start.restored, start.history.doc]).toEqual([null, { shell: base.shell, options: base.options }]);
  });

  it('is nothing when there is no stored text', () => {
    expect(parseDraft(null)).toBeNull();
    expect(parseDraft('')).toBeNull();
  });
});

describe('what is unsaved', () => {
  it('is the parts that are not the ones the server confirmed', () => {
    expect(hasChanges(doc, base)).toBe(false);
    const edited = applied(doc, movePiece('opt-b', 'table', 2000, 1800));
    expect(changedParts(edited, base)).toEqual({ shell: false, options: ['opt-b'] });
    expect(changedParts(applied(edited, setWallHeight(2500)), base)).toEqual({ shell: true, options: ['opt-b'] });
  });
});

describe('a save conflict', () => {
  const theirRoom: RoomRecord = { ...room, version: 4, shell: applied(doc, setWallHeight(2800)).shell };
  const theirOption: OptionRecord = {
    ...option('opt-a', 6, 0),
    doc: applied(doc, movePiece('opt-a', 'chair', 900, 1500)).options['opt-a'],
  };

  it('is a room conflict for a record with a shell, an option conflict for one with a document', () => {
    expect(conflictOf(theirRoom)).toEqual({ part: 'room', theirs: theirRoom });
    expect(conflictOf(theirOption)).toEqual({ part: 'option', optionId: 'opt-a', theirs: theirOption });
  });

  it('answered with theirs takes their part and version and keeps our other unsaved parts', () => {
    const ours = applied(applied(doc, setWallHeight(2500)), movePiece('opt-b', 'table', 2000, 1800));
    const r = loadTheirs(base, ours, conflictOf(theirRoom));
    expect([r.doc.shell.wallHeight, r.baseline.roomVersion, r.baseline.shell]).toEqual([2800, 4, theirRoom.shell]);
    expect(changedParts(r.doc, r.baseline)).toEqual({ shell: false, options: ['opt-b'] });

    const o = loadTheirs(base, ours, conflictOf(theirOption));
    expect([o.doc.options['opt-a'].pieces[1].x, o.baseline.optionVersions['opt-a'], o.doc.shell.wallHeight]).toEqual([
      900, 6, 2500,
    ]);
  });

  it('answered with mine puts our change on top of theirs, to be saved with their version', () => {
    const ours = applied(doc, movePiece('opt-a', 'sofa', 1500, 3000));
    const r = keepMine(base, ours, conflictOf(theirOption));
    const [sofa, chair] = r.doc.options['opt-a'].pieces;
    expect([sofa.x, chair.x, r.baseline.optionVersions['opt-a']]).toEqual([1500, 900, 6]);
    expect(changedParts(r.doc, r.baseline)).toEqual({ shell: false, options: ['opt-a'] });

    const ourPiece = applied(doc, movePiece('opt-a', 'sofa', 1500, 3000));
    const s = keepMine(base, ourPiece, conflictOf(theirRoom));
    expect([s.doc.shell.wallHeight, s.baseline.roomVersion]).toEqual([2800, 4]);
  });
});

describe('options changed through the API', () => {
  it('keep our unsaved changes to options that remain and say when one went away', () => {
    const edited = applied(doc, movePiece('opt-a', 'sofa', 1500, 3000));
    const added: OptionRecord = { ...option('opt-b', 1, 2), id: 'opt-c' };
    const r = withOptions(base, edited, [option('opt-a', 5, 0), added]);
    expect(Object.keys(r.doc.options)).toEqual(['opt-a', 'opt-c']);
    expect([r.removed, r.doc.options['opt-a'].pieces[0].x, r.baseline.optionVersions]).toEqual([
      true,
      1500,
      { 'opt-a': 5, 'opt-c': 1 },
    ]);
    expect(withOptions(base, edited, [option('opt-a', 5, 0), option('opt-b', 2, 1), added]).removed).toBe(false);
  });
});

describe('a decided project', () => {
  it('refuses changes to the chosen option and to the walls, and allows the other options', () => {
    const frozen = { optionIds: new Set(['opt-a']) };
    expect(frozenRefusal(doc, applied(doc, movePiece('opt-a', 'sofa', 1500, 3000)), frozen)).toBe(FROZEN_OPTION_TEXT);
    expect(frozenRefusal(doc, applied(doc, setWallHeight(2500)), frozen)).toBe(FROZEN_SHELL_TEXT);
    expect(frozenRefusal(doc, applied(doc, movePiece('opt-b', 'table', 2000, 1800)), frozen)).toBeNull();
    expect(frozenRefusal(doc, applied(doc, setWallHeight(2500)), { optionIds: new Set() })).toBeNull();
  });
});

describe('retries of a failed save', () => {
  it('wait 2, 5, then 15 seconds, the last one repeating', () => {
    expect([0, 1, 2, 3, 10].map(retryDelayMs)).toEqual([2000, 5000, 15000, 15000, 15000]);
  });
});

describe('the save-retry timer', () => {
  afterEach(() => vi.useRealTimers());

  it('saves once after the wait for its attempt, one retry waiting at a time', () => {
    vi.useFakeTimers();
    let saves = 0;
    const timer = retryTimer(() => (saves += 1));
    timer.schedule(1);
    timer.schedule(1);
    vi.advanceTimersByTime(4999);
    expect([saves, timer.waiting]).toEqual([0, true]);
    vi.advanceTimersByTime(1);
    expect([saves, timer.waiting]).toEqual([1, false]);
  });

  it('is cleared when the editor goes, and starts no retry after', () => {
    vi.useFakeTimers();
    let saves = 0;
    const timer = retryTimer(() => (saves += 1));
    timer.schedule(0);
    timer.dispose();
    timer.schedule(0);
    vi.advanceTimersByTime(60_000);
    expect([saves, timer.waiting]).toEqual([0, false]);
  });
});
