// Tests for the skirting runs: stopped at doors and passages, on under windows, the same total the
// take-off counted before it read the runs (perimeter less door and passage widths) on every room
// the tests and benches use, and the drawn boards at their height, thickness and mitred corners.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { largeRoom, typicalRoom } from '../../scripts/bench/typical-room';
import { designExampleRoom } from '../../tests/reference/rooms';
import { shell as takeoffRoom } from '../analysis/test-rooms';
import { roomShellSchema, type RoomShell } from '../schemas/room';
import { perimeterMm } from './polygon';
import { SKIRTING_HEIGHT_MM, SKIRTING_THICKNESS_MM, skirtingLengthMm, skirtingMesh, skirtingRuns } from './skirting';

const example = roomShellSchema.parse(designExampleRoom);
const planShell = (file: string) =>
  roomShellSchema.parse(JSON.parse(readFileSync(join(import.meta.dirname, '../../assets/plans', file), 'utf8')).room);

// The take-off's rule before the runs: the perimeter less every door and passage width.
function perimeterLessGapsMm(shell: RoomShell): number {
  const gaps = shell.openings.filter((o) => o.type !== 'window' && o.wall < shell.outline.length);
  return perimeterMm(shell.outline) - gaps.reduce((sum, o) => sum + o.width, 0);
}

const rooms: [string, RoomShell][] = [
  ['the design example', example],
  ['the take-off fixture', takeoffRoom],
  ['the typical bench room', typicalRoom().shell],
  ['the large bench room', largeRoom().shell],
  ['the living room plan', planShell('living-room.json')],
  ['the L-shaped living room plan', planShell('l-shaped-living-room.json')],
  ['the bedroom plan', planShell('bedroom.json')],
  ['the example without windows', { ...example, openings: example.openings.filter((o) => o.type !== 'window') }],
  ['the example without openings', { ...example, openings: [] }],
];

describe('skirtingRuns', () => {
  it.each(rooms)('adds up to the perimeter less door and passage widths for %s', (_, shell) => {
    expect(skirtingLengthMm(skirtingRuns(shell))).toBeCloseTo(perimeterLessGapsMm(shell), 6);
  });

  it('stops at a door and a passage and runs on under a window', () => {
    const runs = skirtingRuns(example);
    const door = example.openings.find((o) => o.type === 'door')!;
    const window = example.openings.find((o) => o.type === 'window')!;
    const passage = example.openings.find((o) => o.type === 'passage')!;
    const onWall = (wall: number) => runs.filter((r) => r.wall === wall).map((r) => [r.fromMm, r.toMm]);
    expect(onWall(door.wall)).toEqual([
      [0, door.offset],
      [door.offset + door.width, 4200],
    ]);
    expect(onWall(window.wall)).toEqual([[0, 4200]]);
    expect(onWall(passage.wall)).toEqual([
      [0, passage.offset],
      [passage.offset + passage.width, 3600],
    ]);
    for (const run of runs) expect(run.lengthMm).toBeCloseTo(run.toMm - run.fromMm, 9);
  });

  it('leaves no run where a door reaches the corner, and merges touching openings', () => {
    const shell = roomShellSchema.parse({
      outline: [
        [0, 0],
        [3000, 0],
        [3000, 3000],
        [0, 3000],
      ],
      openings: [
        { id: 'd', type: 'door', wall: 0, offset: 0, width: 800, height: 2000, hinge: 'start', swing: 'in' },
        { id: 'p', type: 'passage', wall: 0, offset: 800, width: 1000, height: 2000 },
      ],
    });
    const wall0 = skirtingRuns(shell).filter((r) => r.wall === 0);
    expect(wall0).toEqual([{ wall: 0, fromMm: 1800, toMm: 3000, lengthMm: 1200, fromCorner: false, toCorner: true }]);
  });
});

describe('skirtingMesh', () => {
  it('draws each board at its height and thickness in from the wall, mitred at the corners', () => {
    const shell = roomShellSchema.parse({ ...example, openings: [] });
    const mesh = skirtingMesh(shell, skirtingRuns(shell));
    const xs: number[] = [];
    const ys: number[] = [];
    const zs: number[] = [];
    for (let i = 0; i < mesh.positions.length; i += 3) {
      xs.push(mesh.positions[i]);
      ys.push(mesh.positions[i + 1]);
      zs.push(mesh.positions[i + 2]);
    }
    // The example's outline spans x 0–4200, y 0–3600 mm; boards stand inside it and no higher.
    expect(Math.max(...ys)).toBeCloseTo(SKIRTING_HEIGHT_MM / 1000, 6);
    expect(Math.min(...ys)).toBe(0);
    expect(Math.min(...xs)).toBeCloseTo(0, 6);
    expect(Math.max(...xs)).toBeCloseTo(4.2, 6);
    // Front faces run SKIRTING_THICKNESS_MM in: the front corner of wall 0 and wall 3 meet at (18, 18) mm.
    const t = SKIRTING_THICKNESS_MM / 1000;
    let mitre = 0;
    for (let i = 0; i < xs.length; i++) if (Math.abs(xs[i] - t) < 1e-6 && Math.abs(zs[i] - t) < 1e-6) mitre++;
    expect(mitre).toBeGreaterThan(0);
    // Four walls without openings: a front face and a top per wall, no ends.
    expect(mesh.indices.length / 3).toBe(4 * 2 * 2);
  });

  it('closes a board with a square end where a door stops it', () => {
    const shell = roomShellSchema.parse({ ...example, openings: example.openings.filter((o) => o.type === 'door') });
    const runs = skirtingRuns(shell);
    const mesh = skirtingMesh(shell, runs);
    const ends = runs.filter((r) => !r.fromCorner).length + runs.filter((r) => !r.toCorner).length;
    expect(ends).toBe(2);
    expect(mesh.indices.length / 3).toBe(runs.length * 4 + ends * 2);
  });
});
