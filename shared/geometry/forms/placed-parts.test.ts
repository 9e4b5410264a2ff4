// The direct part writer against the staged one it stands in for: every number of every buffer the
// same, bit for bit, over ordinary parts, the awkward ones (rounded ends, discs, tapers, no size,
// tiny and huge numbers, minus zero) and every turn.
import { describe, expect, it } from 'vitest';
import { directionDeg } from '../vec';
import { seededRandom } from './form-test-cases';
import type { Part, PartShape } from './parts';
import { writePart } from './placed-parts';
import { legSides, roundedPoints, SlotWriter } from './slot-writer';
import { writePartStaged } from './staged-parts';

interface Placed {
  x: number;
  y: number;
  rotation: number;
  elevation: number;
}

/** The part's mesh written by `write` at `at`, as bytes: positions, normals, uvs, then indices. */
function written(write: (w: SlotWriter, part: Part) => void, part: Part, at: Placed): Uint8Array {
  const n = part.shape === 'rounded' ? roundedPoints(part) : part.shape === 'leg' ? legSides(part) : 0;
  const vertices = n === 0 ? 24 : 6 * n;
  const indices = n === 0 ? 36 : 12 * n - 12;
  const buffer = new ArrayBuffer(4 * (8 * vertices + indices));
  const mesh = {
    positions: new Float32Array(buffer, 0, 3 * vertices),
    normals: new Float32Array(buffer, 12 * vertices, 3 * vertices),
    uvs: new Float32Array(buffer, 24 * vertices, 2 * vertices),
    indices: new Uint32Array(buffer, 32 * vertices, indices),
  };
  const w = new SlotWriter();
  w.begin(mesh, at.x, at.y, at.elevation, directionDeg(at.rotation));
  write(w, part);
  expect([w.count, w.indexCount]).toEqual([vertices, indices]);
  return new Uint8Array(buffer);
}

function expectSame(part: Part, at: Placed): void {
  const direct = written(writePart, part, at);
  const staged = written(writePartStaged, part, at);
  const first = direct.findIndex((b, i) => b !== staged[i]);
  expect(first, `first differing byte for ${JSON.stringify(part)} at ${JSON.stringify(at)}`).toBe(-1);
}

const part = (shape: PartShape, fields: Partial<Part>): Part => ({
  shape,
  x: 0,
  y: 0,
  z: 0,
  w: 400,
  d: 300,
  h: 450,
  slot: 'main',
  role: 'body',
  ...fields,
});

const TURNS = [0, 37, 90, 180, 270, 359.5, -45, 1e-9];
const PLACES: Placed[] = TURNS.flatMap((rotation, i) => [
  { x: 0, y: 0, rotation, elevation: 0 },
  { x: -0, y: -0, rotation, elevation: -0 },
  { x: 1234.5 + i, y: -678.25, rotation, elevation: 1200 },
  { x: 5e6, y: 3e-7, rotation, elevation: 0.1 },
]);

describe('the direct part writer', () => {
  it('writes what the staged writer writes, for parts the forms make and awkward ones', () => {
    const awkward: Part[] = [
      part('box', {}),
      part('panel', { x: -0, y: -0, z: -0, w: 18, d: 300, h: 2000 }),
      part('box', { w: 0, d: 300, h: 10 }),
      part('box', { w: -20, d: 300, h: 10 }),
      part('box', { w: 400, d: 300, h: 0 }),
      part('box', { w: 1e-120, d: 300, h: 10 }),
      part('box', { x: 1e120, w: 5, d: 5, h: 5 }),
      part('box', { x: 3000, y: 1e-13, w: 1e-12, d: 1e-12, h: 1e-12 }),
      part('box', { w: NaN }),
      part('rounded', { radius: 40 }),
      part('rounded', { radius: 0 }),
      part('rounded', { w: 80, d: 300, radius: 40 }),
      part('rounded', { w: 300, d: 66, radius: 33, x: 300, y: 300 }),
      part('rounded', { w: 300, d: 66, radius: 33, x: -0, y: -0 }),
      part('rounded', { w: 66, d: 66, radius: 33 }),
      part('rounded', { w: 66, d: 66.0000005, radius: 33 }),
      part('rounded', { w: 300, d: 66, radius: 32.9999999 }),
      part('rounded', { w: 300, d: 66, radius: 1e-9, x: 1000 }),
      part('rounded', { radius: 40, h: 0 }),
      part('rounded', { radius: 40, h: -5 }),
      part('leg', { w: 30, d: 30, taper: 0.7, x: 170, y: -120 }),
      part('leg', { w: 200, d: 200, taper: 1.4 }),
      part('leg', { w: 30, d: 30, taper: 0 }),
      part('leg', { w: 30, d: 30, taper: 1e-5 }),
      part('leg', { w: 30, d: 30, taper: 5e4 }),
      part('leg', { w: 0, d: 0 }),
      part('leg', { w: 30, d: 30, x: Infinity }),
    ];
    for (const p of awkward) for (const at of PLACES) expectSame(p, at);
  });

  it('writes what the staged writer writes, over random parts and places', () => {
    const next = seededRandom(4242);
    const shapes: PartShape[] = ['box', 'panel', 'rounded', 'leg'];
    for (let k = 0; k < 1500; k++) {
      const shape = shapes[k % 4]!;
      const w = 1 + next() * 2000,
        d = k % 8 < 4 ? 1 + next() * 1200 : w;
      const r = Math.min(next() < 0.3 ? 1000 : next() * 300, w / 2, d / 2);
      const p = part(shape, {
        x: (next() - 0.5) * 4000,
        y: (next() - 0.5) * 4000,
        z: next() * 2000,
        w: shape === 'leg' ? w / 10 : w,
        d: shape === 'leg' ? w / 10 : d,
        h: next() * 2400,
        radius: r,
        taper: 0.2 + next() * 2,
      });
      expectSame(p, {
        x: (next() - 0.5) * 20000,
        y: (next() - 0.5) * 20000,
        rotation: next() * 720 - 360,
        elevation: next() * 2400,
      });
    }
  });

  it('writes what the staged writer writes for rounded ends, discs and tapered legs, wherever they stand', () => {
    const next = seededRandom(9090);
    const place = () => (next() < 0.1 ? 0 : (next() - 0.5) * 10 ** (1 + Math.floor(next() * 6)));
    for (let k = 0; k < 1200; k++) {
      const long = 20 + next() * 3000,
        short = 5 + next() * 600;
      const kind = k % 4;
      const p =
        kind === 3
          ? part('leg', { x: place(), y: place(), w: short, d: short, h: 1 + next() * 900, taper: 0.05 + next() * 3 })
          : part('rounded', {
              x: place(),
              y: place(),
              z: next() * 1500,
              // A rounded end across x, across y, or a disc: the radius is half the shorter side.
              w: kind === 0 ? short : kind === 1 ? long : short,
              d: kind === 0 ? long : short,
              h: 1 + next() * 900,
              radius: short / 2,
            });
      expectSame(p, { x: place(), y: place(), rotation: next() * 720 - 360, elevation: next() * 2400 });
    }
  });
});
