// Tests the analyze command run as a child process: take-off numbers against the README's design
// example and hand-worked rooms, its flags, its refusals and exit codes, and its fit check findings.
import { execFile } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { cleanLayout, gapLayout, pieceInput, walledInLayout } from '../../shared/analysis/fit/test-plans';
import { designExampleTakeoff, designExampleWall0 } from '../../tests/reference/rooms';

const root = resolve(import.meta.dirname, '../..');
const tsx = join(root, 'node_modules/.bin/tsx');
const script = join(root, 'server/cli/analyze.ts');
const dir = mkdtempSync(join(tmpdir(), 'parlour-analyze-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

interface Run {
  code: number;
  stdout: string;
  stderr: string;
}

function analyze(args: string[]): Promise<Run> {
  return new Promise((done) => {
    execFile(tsx, [script, ...args], { cwd: root }, (error, stdout, stderr) => {
      const code = error ? (typeof error.code === 'number' ? error.code : 1) : 0;
      done({ code, stdout, stderr });
    });
  });
}

let fileCount = 0;
function planFile(content: unknown): string {
  const path = join(dir, `plan-${fileCount++}.json`);
  writeFileSync(path, typeof content === 'string' ? content : JSON.stringify(content));
  return path;
}

const example = JSON.parse(readFileSync(join(root, 'assets/plans/living-room.json'), 'utf8'));
type Plan = typeof example;
function variant(change: (plan: Plan) => void): Plan {
  const plan = structuredClone(example);
  change(plan);
  return plan;
}

async function takeoffOf(plan: unknown, flags: string[] = []) {
  const run = await analyze([planFile(plan), ...flags]);
  expect(run.stderr).toBe('');
  expect(run.code).toBe(0);
  return JSON.parse(run.stdout);
}

function within(actual: number, expected: number, share = 0.005): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(Math.abs(expected) * share);
}

describe('analyze command: measurements', () => {
  it('prints the design example numbers as one JSON object', async () => {
    const run = await analyze([join(root, 'assets/plans/living-room.json')]);
    expect(run.code).toBe(0);
    expect(run.stdout.trim().split('\n')).toHaveLength(1);
    const t = JSON.parse(run.stdout);
    expect(t).toMatchObject(designExampleTakeoff);
    expect(t.walls[0]).toEqual(designExampleWall0);
  });

  // Hand-computed: L of 5 × 2.5 + 3 × 1.5 = 17 m², walls 18 m × 2.5 m = 45 m²; openings door 0.8 × 2.0,
  // window 1.2 × 1.0, passage 0.9 × 2.0 = 4.6 m²; net 40.4 m²; 2 coats at 10 m²/L = 8.08 L;
  // skirting 18 − 0.8 − 0.9 = 16.3 m; flooring 17 × 1.1 = 18.7 m²; volume 17 × 2.5 = 42.5 m³.
  const lPlan = variant((plan) => {
    plan.room.wallHeight = 2500;
    plan.room.outline = [
      [0, 0],
      [5000, 0],
      [5000, 2500],
      [3000, 2500],
      [3000, 4000],
      [0, 4000],
    ];
    plan.room.openings = [
      { id: 'w', type: 'window', wall: 0, offset: 1000, width: 1200, height: 1000, sill: 900 },
      { id: 'p', type: 'passage', wall: 3, offset: 300, width: 900, height: 2000 },
      { id: 'd', type: 'door', wall: 5, offset: 500, width: 800, height: 2000, hinge: 'start', swing: 'in' },
    ];
    plan.option.pieces = [];
  });

  it('measures an L-shaped room with openings as computed by hand', async () => {
    const t = await takeoffOf(lPlan);
    within(t.floorArea_m2, 17);
    within(t.perimeter_m, 18);
    within(t.volume_m3, 42.5);
    within(t.netWallArea_m2, 40.4);
    within(t.paint.litres, 8.08);
    within(t.skirting_m, 16.3);
    within(t.flooring.orderArea_m2, 18.7);
    expect(t.walls.map((w: { length_m: number }) => w.length_m)).toEqual([5, 2.5, 2, 1.5, 3, 4]);
  });

  it('gives the same numbers when the L is drawn the other way round', async () => {
    // Reversing the corners turns wall i into wall n − 2 − i (mod n), running the other way.
    const n = lPlan.room.outline.length;
    const reversed = variant((plan) => {
      plan.room.wallHeight = 2500;
      plan.room.outline = [...lPlan.room.outline].reverse();
      plan.option.pieces = [];
      plan.room.openings = lPlan.room.openings.map((o: { wall: number; offset: number; width: number }) => {
        const [a, b] = [lPlan.room.outline[o.wall], lPlan.room.outline[(o.wall + 1) % n]];
        const lengthMm = Math.hypot(b[0] - a[0], b[1] - a[1]);
        return { ...o, wall: (2 * n - 2 - o.wall) % n, offset: lengthMm - o.offset - o.width };
      });
    });
    const [asDrawn, other] = await Promise.all([takeoffOf(lPlan), takeoffOf(reversed)]);
    for (const key of ['floorArea_m2', 'perimeter_m', 'netWallArea_m2', 'skirting_m', 'volume_m3'] as const)
      expect(other[key]).toBe(asDrawn[key]);
  });

  it('measures a splayed corner', async () => {
    // 4 × 3 m less a 0.7 m × 0.7 m triangle = 11.755 m²; perimeter 3.3 + 0.7√2 + 2.3 + 4 + 3 m
    const t = await takeoffOf(
      variant((plan) => {
        plan.room.outline = [
          [0, 0],
          [3300, 0],
          [4000, 700],
          [4000, 3000],
          [0, 3000],
        ];
        plan.room.openings = [];
        plan.option.pieces = [];
      }),
    );
    within(t.floorArea_m2, 12 - 0.49 / 2);
    within(t.perimeter_m, 3.3 + 0.7 * Math.SQRT2 + 2.3 + 4 + 3);
    within(t.walls[1].grossArea_m2, 0.7 * Math.SQRT2 * 2.6);
  });

  it('subtracts several openings on one wall', async () => {
    // wall 0 is 4.2 m × 2.6 m = 10.92 m²; three windows of 0.9 × 1.2 m = 3.24 m² → 7.68 m²
    const t = await takeoffOf(
      variant((plan) => {
        plan.room.openings = [0, 1, 2].map((k) => ({
          id: `w${k}`,
          type: 'window',
          wall: 0,
          offset: 200 + k * 1300,
          width: 900,
          height: 1200,
          sill: 900,
        }));
      }),
    );
    within(t.walls[0].openingsArea_m2, 3.24);
    within(t.walls[0].netArea_m2, 7.68);
    within(t.skirting_m, 15.6);
  });

  it('follows the coats, coverage and waste flags', async () => {
    const t = await takeoffOf(example, ['--coats', '3', '--coverage=12', '--waste', '15', '--walkway', '1000']);
    expect(t.paint).toEqual({ coats: 3, coverage_m2_per_l: 12, litres: 8.799 });
    expect(t.flooring).toEqual({ wastePercent: 15, orderArea_m2: 17.388 });
  });
});

describe('analyze command: example plans', () => {
  it.each(['living-room.json', 'l-shaped-living-room.json', 'bedroom.json'])('reads assets/plans/%s', async (name) => {
    const t = await takeoffOf(readFileSync(join(root, 'assets/plans', name), 'utf8'));
    expect(t.floorArea_m2).toBeGreaterThan(5);
  });

  it('measures the L-shaped example: 6.2 × 3.4 + 3.8 × 2.2 = 29.44 m²', async () => {
    const t = await takeoffOf(readFileSync(join(root, 'assets/plans/l-shaped-living-room.json'), 'utf8'));
    expect(t.floorArea_m2).toBe(29.44);
    expect(t.perimeter_m).toBe(23.6);
  });
});

describe('analyze command: refusals', () => {
  const cases: [string, () => string, RegExp][] = [
    ['a file that is not JSON', () => planFile('{"format": "parlour-plan",'), /not valid JSON/],
    ['a missing file', () => join(dir, 'no-such-plan.json'), /cannot read the file \(ENOENT\)/],
    [
      'fewer than 3 corners',
      () =>
        planFile(
          variant((p) => {
            p.room.outline = [
              [0, 0],
              [4200, 0],
            ];
          }),
        ),
      /room\.outline: needs at least 3 corners/,
    ],
    [
      'crossing walls',
      () =>
        planFile(
          variant((p) => {
            p.room.outline = [
              [0, 0],
              [4200, 0],
              [0, 3600],
              [4200, 3600],
            ];
          }),
        ),
      /room\.outline: wall 1 crosses wall 3/,
    ],
    [
      'an opening longer than its wall',
      () =>
        planFile(
          variant((p) => {
            p.room.openings[0].width = 4300;
          }),
        ),
      /room\.openings\[0\]\.width: longer than wall 0 \(4200 mm\)/,
    ],
    [
      'overlapping openings',
      () =>
        planFile(
          variant((p) => {
            p.room.openings.push({ id: 'w2', type: 'window', wall: 0, offset: 900, width: 1000, height: 1000, sill: 900 });
          }),
        ),
      /room\.openings\[3\]\.offset: overlaps d1/,
    ],
    [
      'a piece with a non-positive size',
      () =>
        planFile(
          variant((p) => {
            p.option.pieces[0].width = 0;
          }),
        ),
      /option\.pieces\[0\]\.width: must be more than 0 mm/,
    ],
    [
      'a negative piece height',
      () =>
        planFile(
          variant((p) => {
            p.option.pieces[0].height = -850;
          }),
        ),
      /option\.pieces\[0\]\.height: must be more than 0 mm/,
    ],
    [
      'the wrong format',
      () =>
        planFile(
          variant((p) => {
            p.format = 'room-sketch';
          }),
        ),
      /format: must be "parlour-plan"/,
    ],
    [
      'the wrong version',
      () =>
        planFile(
          variant((p) => {
            p.version = 2;
          }),
        ),
      /version: must be 1/,
    ],
    [
      'a missing field',
      () =>
        planFile(
          variant((p) => {
            delete p.room.openings[1].sill;
          }),
        ),
      /room\.openings\[1\]\.sill/,
    ],
    [
      'a window above the wall',
      () =>
        planFile(
          variant((p) => {
            p.room.openings[1].sill = 1800;
          }),
        ),
      /room\.openings\[1\]\.height: window head/,
    ],
  ];

  for (const [name, file, message] of cases) {
    it(`exits 1 on ${name}, naming the field`, async () => {
      const run = await analyze([file()]);
      expect(run.code).toBe(1);
      expect(run.stdout).toBe('');
      expect(run.stderr).toMatch(message);
    });
  }

  it.each([
    [['--coats', '0'], /--coats: expected a whole number of coats/],
    [['--coats', '1.5'], /--coats: expected a whole number/],
    [['--coverage', 'lots'], /--coverage: expected square metres per litre/],
    // The take-off page's bounds, from the one settings schema.
    [['--coats', '11'], /--coats: expected a whole number of coats, 1 to 10/],
    [['--coverage', '0.5'], /--coverage: expected square metres per litre, 1 to 40/],
    [['--waste', '101'], /--waste: expected a percentage from 0 to 100/],
    [['--waste'], /--waste: expected a percentage.*got nothing/],
    [['--walkway', '-900'], /--walkway: expected a width in mm/],
    // The editor's walkway range, from the one definition beside the default walkway.
    [['--walkway', '250'], /--walkway: expected a width in mm, 300 to 2000/],
    [['--walkway', '2500'], /--walkway: expected a width in mm, 300 to 2000/],
    [['--colour', 'blue'], /--colour: unknown option/],
  ])('exits 1 on the bad flag %j', async (flags, message) => {
    const run = await analyze([join(root, 'assets/plans/living-room.json'), ...flags]);
    expect(run.code).toBe(1);
    expect(run.stderr).toMatch(message);
  });

  it('exits 1 without a file', async () => {
    const run = await analyze([]);
    expect(run.code).toBe(1);
    expect(run.stderr).toMatch(/no plan file given/);
  });
});

describe('analyze command: fit check findings', () => {
  type Layout = ReturnType<typeof cleanLayout>;
  /** A plan file of a layout from the fit check's worked plans (their comments give the hand computation). */
  const planOf = (layout: Layout) => ({
    format: 'parlour-plan',
    version: 1,
    room: { name: 'Test room', ...layout.room },
    option: { name: 'Option A', pieces: layout.pieces },
  });
  function withPieces(change: (layout: Layout) => void): Layout {
    const layout = cleanLayout();
    change(layout);
    return layout;
  }
  // A chest of drawers turned 90° (front −x) on the right wall, x 3500–4000, y 1850–2650: its
  // drawers need 500 − 50 = 450 mm and the sofa's end (x 3200) stands 300 mm in front.
  const chestFacingSofa = () =>
    withPieces((l) =>
      l.pieces.push(
        pieceInput({
          id: 'chest',
          name: 'Chest',
          kind: 'chest-of-drawers',
          x: 3750,
          y: 2250,
          width: 800,
          depth: 500,
          height: 900,
          rotation: 90,
        }),
      ),
    );
  async function findingsOf(layout: Layout, flags: string[] = []) {
    return (await takeoffOf(planOf(layout), flags)).findings as {
      kind: string;
      pieces: string[];
      message: string;
      measured_mm?: number;
    }[];
  }

  it('reports nothing on a clean layout, nor on the example plan', async () => {
    expect(await findingsOf(cleanLayout())).toEqual([]);
    expect((await takeoffOf(example)).findings).toEqual([]);
  });

  const cases: [string, () => Layout, string[]][] = [
    [
      'overlap',
      () => withPieces((l) => l.pieces.push(pieceInput({ id: 'stool', x: 2200, y: 2500, width: 400, depth: 400, height: 450 }))),
      ['sofa', 'stool'],
    ],
    [
      'outside-room',
      () => withPieces((l) => l.pieces.push(pieceInput({ id: 'chest', x: 2000, y: 250, width: 800, depth: 600, height: 800 }))),
      ['chest'],
    ],
    [
      'door-swing',
      () =>
        withPieces((l) => l.pieces.push(pieceInput({ id: 'wardrobe', x: 700, y: 400, width: 800, depth: 600, height: 2000 }))),
      ['wardrobe'],
    ],
    [
      'window-blocked',
      () =>
        withPieces((l) => {
          l.pieces[2] = { ...l.pieces[2], height: 950 };
        }),
      ['sofa'],
    ],
    ['cannot-open', chestFacingSofa, ['chest', 'sofa']],
    ['narrow-walkway', () => gapLayout(), ['chest', 'bed']],
    ['unreachable', () => walledInLayout(), ['cabinet']],
    [
      'too-big-for-door',
      () =>
        withPieces((l) => l.pieces.push(pieceInput({ id: 'crate', x: 2000, y: 1400, width: 1000, depth: 1000, height: 1000 }))),
      ['crate'],
    ],
  ];
  it.each(cases)('reports %s on a plan made to show it', async (kind, layout, pieces) => {
    const findings = await findingsOf(layout());
    expect(findings.filter((f) => f.kind === kind).map((f) => f.pieces)).toEqual([pieces]);
  });

  it('gives a blocked front its clear and needed depth and the zone it opens into', async () => {
    const [finding] = (await findingsOf(chestFacingSofa())).filter((f) => f.kind === 'cannot-open') as {
      message: string;
      measured_mm?: number;
      required_mm?: number;
      zone?: [number, number][];
    }[];
    expect(finding?.message).toBe('The chest’s drawers cannot pull out fully: 30 cm clear in front, blocked by the sofa');
    expect([finding?.measured_mm, finding?.required_mm]).toEqual([300, 450]);
    // From the chest's front at x 3500, 450 mm out towards the sofa, across its 800 mm width (less the gaps).
    expect(new Set(finding?.zone?.map(([x]) => x))).toEqual(new Set([3500, 3050]));
  });

  it('measures the 620 mm gap and follows the walkway flag', async () => {
    const [gap] = await findingsOf(gapLayout());
    expect(gap.message).toBe('Only 62 cm to pass between the bed and the chest');
    expect(gap.measured_mm).toBe(620);
    expect(await findingsOf(gapLayout(), ['--walkway', '600'])).toEqual([]);
  });
});
