// The client's walk-through in a real browser with software WebGL: the demo flat (its plans,
// finishes and options, made through the API as the seed makes them) opened from its link, the
// Overview and its buttons, Walk with keys (walls stop, a door lets through), options switched
// with the camera kept, Compare with linked cameras, and the frame budget of a typical room.
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type { Browser, BrowserContext, Locator, Page } from 'playwright-core';
import { typicalFurnishedRoom } from '../../scripts/bench/typical-room';
import { launchBrowser } from './lib/browser';
import { newPage, signUpThroughForm } from './lib/session';
import {
  greyStoneTile,
  linenWeave,
  oakBoards,
  rawToPng,
  sprigWallpaper,
  type RawImage,
} from '../../server/services/images/generate';

const root = resolve(import.meta.dirname, '../..');
const shots = join(root, '.test-output', 'walkthrough');
/** The README's pictures (assets/screenshots), retaken by this test. */
const readmeShots = join(root, 'assets', 'screenshots');
const plan = (file: string) => JSON.parse(readFileSync(join(root, 'assets/plans', file), 'utf8'));

/** Draw calls and texture memory a typical room (8 walls, 6 openings, 40 pieces) must stay under. */
const MAX_DRAW_CALLS = 60;
const MAX_TEXTURE_BYTES = 64 * 1024 * 1024;
/** Triangles of a typical room: 40 forms of at most 2,000, the shell, the frames (the budget). */
const MAX_TRIANGLES = 150_000;
const BODY_RADIUS_M = 0.25;
/** The demo living room's inside corners (assets/plans/l-shaped-living-room.json), scene x and z in metres. */
const DEMO_LIVING_CORNERS_M = [
  [0, 0],
  [6.2, 0],
  [6.2, 3.4],
  [3.8, 3.4],
  [3.8, 5.6],
  [0, 5.6],
] as const;
/** Software WebGL on a busy machine can take seconds per frame: wait for one that long (a wait, not a speed target). */
const FRAME_WAIT = { timeout: 15_000 };
const SWITCHES = 50;

let browser: Browser;
let designer: { context: BrowserContext; page: Page };
const figures: Record<string, number | string> = {};
const demoDoorFigures: Record<string, number[]> = {};

beforeAll(async () => {
  browser = await launchBrowser();
  mkdirSync(shots, { recursive: true });
  designer = await newPage(browser);
  await signUpThroughForm(designer.page, 'Wren Lane Interiors', 'Ida Designer');
});
afterAll(async () => {
  writeFileSync(join(shots, 'figures.json'), JSON.stringify({ ...figures, demoDoorFigures }, null, 2));
  await designer?.context.close();
  await browser?.close();
});

interface DemoPhoto {
  name: string;
  category: string;
  repeatWidthMm: number;
  repeatHeightMm: number;
  draw: () => RawImage | Promise<RawImage>;
}
// The demo library's drawings and real sizes (server/cli/seed-finishes.ts), uploaded as a designer would.
const PHOTOS: DemoPhoto[] = [
  { name: 'Oak boards, natural oil', category: 'wood', repeatWidthMm: 720, repeatHeightMm: 1440, draw: () => oakBoards() },
  { name: 'Grey stone tile', category: 'tile', repeatWidthMm: 600, repeatHeightMm: 600, draw: () => greyStoneTile() },
  { name: 'Washed linen', category: 'fabric', repeatWidthMm: 100, repeatHeightMm: 100, draw: () => linenWeave() },
  { name: 'Sprig wallpaper', category: 'wallpaper', repeatWidthMm: 265, repeatHeightMm: 265, draw: () => sprigWallpaper() },
];
// Two more for the typical room's six photo finishes on pieces: the same drawings at other real sizes.
const EXTRA_PHOTOS: DemoPhoto[] = [
  { name: 'Wide oak veneer', category: 'wood', repeatWidthMm: 400, repeatHeightMm: 800, draw: () => oakBoards() },
  { name: 'Coarse linen', category: 'fabric', repeatWidthMm: 200, repeatHeightMm: 200, draw: () => linenWeave() },
];
const PAINTS = [
  { name: 'Morning oat', colourHex: '#e6dcc8', sheen: 'matt' },
  { name: 'Sage hall', colourHex: '#a3ad94', sheen: 'eggshell' },
  { name: 'Deep harbour', colourHex: '#2f4858', sheen: 'satin' },
];

async function call<T>(page: Page, path: string, method: string, body?: object): Promise<T> {
  return page.evaluate(
    async ({ path, method, body }) => {
      const res = await fetch(path, {
        method,
        headers: body ? { 'content-type': 'application/json' } : {},
        body: body ? JSON.stringify(body) : undefined,
      });
      if (!res.ok) throw new Error(`${method} ${path}: ${res.status} ${await res.text()}`);
      return res.status === 204 ? null : res.json();
    },
    { path, method, body },
  ) as Promise<T>;
}

/** The studio's finishes by name: the demo photos (uploaded and processed) and paints. */
async function demoFinishes(page: Page): Promise<Record<string, string>> {
  const ids: Record<string, string> = {};
  for (const p of PAINTS)
    ids[p.name] = (await call<{ finish: { id: string } }>(page, '/api/finishes/paints', 'POST', p)).finish.id;
  return { ...ids, ...(await uploadPhotos(page, PHOTOS)) };
}

/** Uploads photo finishes as a designer would and waits until each is processed; their ids by name. */
async function uploadPhotos(page: Page, photos: readonly DemoPhoto[]): Promise<Record<string, string>> {
  const ids: Record<string, string> = {};
  for (const photo of photos) {
    const b64 = (await rawToPng(await photo.draw())).toString('base64');
    const id = await page.evaluate(
      async ({ b64, photo }) => {
        const form = new FormData();
        form.append(
          'photos',
          new Blob([Uint8Array.from(atob(b64), (c) => c.charCodeAt(0))], { type: 'image/png' }),
          `${photo.name}.png`,
        );
        form.append('category', photo.category);
        form.append('repeatWidthMm', String(photo.repeatWidthMm));
        form.append('repeatHeightMm', String(photo.repeatHeightMm));
        const made = await (await fetch('/api/finishes/photos', { method: 'POST', body: form })).json();
        const finishId = made.finishes[0].id as string;
        await fetch(`/api/finishes/${finishId}`, {
          method: 'PATCH',
          headers: { 'content-type': 'application/json' },
          body: JSON.stringify({ name: photo.name }),
        });
        return finishId;
      },
      {
        b64,
        photo: {
          name: photo.name,
          category: photo.category,
          repeatWidthMm: photo.repeatWidthMm,
          repeatHeightMm: photo.repeatHeightMm,
        },
      },
    );
    ids[photo.name] = id;
  }
  for (const photo of photos) {
    await expect
      .poll(
        async () => (await call<{ finish: { status: string } }>(page, `/api/finishes/${ids[photo.name]}`, 'GET')).finish.status,
        { timeout: 60_000 },
      )
      .toBe('ready');
  }
  return ids;
}

interface Made {
  room: { id: string };
  options: { id: string; version: number }[];
}
type Piece = { id: string; x: number; y: number; rotation?: number; placed?: boolean; finishId?: string };

/** A room from a plan file with a second option, each option wearing its finishes (as the demo seed does). */
async function roomFromPlan(
  page: Page,
  projectId: string,
  file: string,
  a: { name: string; finishes: object; pieceFinishes: Record<string, string> },
  b: { name: string; note: string; finishes: object; pieceFinishes: Record<string, string>; change: (p: Piece) => Piece },
) {
  const planFile = plan(file);
  const made = await call<Made>(page, `/api/projects/${projectId}/rooms/import`, 'POST', planFile);
  const second = await call<{ option: { id: string; version: number } }>(page, `/api/rooms/${made.room.id}/options`, 'POST', {
    name: b.name,
  });
  const dress = (pieces: Piece[], finishes: Record<string, string>) =>
    pieces.map((p) => (finishes[p.id] ? { ...p, finishId: finishes[p.id] } : p));
  const pieces = planFile.option.pieces as Piece[];
  await call(page, `/api/options/${made.options[0].id}`, 'PUT', {
    name: a.name,
    doc: { pieces: dress(pieces, a.pieceFinishes), finishes: a.finishes },
    version: made.options[0].version,
  });
  await call(page, `/api/options/${second.option.id}`, 'PUT', {
    name: b.name,
    note: b.note,
    doc: { pieces: dress(pieces.map(b.change), b.pieceFinishes), finishes: b.finishes },
    version: second.option.version,
  });
  return { roomId: made.room.id, optionIds: [made.options[0].id, second.option.id] };
}

/** The Canal Row flat as the demo seed makes it, presented; returns the client's link. */
async function demoPresentation(page: Page): Promise<string> {
  const f = await demoFinishes(page);
  const { project } = await call<{ project: { id: string } }>(page, '/api/projects', 'POST', {
    name: 'Canal Row flat',
    newClient: { name: 'The Harrow-Okonjo household' },
  });
  const living = await roomFromPlan(
    page,
    project.id,
    'l-shaped-living-room.json',
    {
      name: 'Sofa by the wall',
      finishes: { floor: f['Oak boards, natural oil'], walls: f['Morning oat'] },
      pieceFinishes: { sofa: f['Washed linen'] },
    },
    {
      name: 'Conversation corner',
      note: 'The sofa faces the front window; the client’s armchairs sit opposite.',
      finishes: { floor: f['Oak boards, natural oil'], walls: f['Sage hall'], wallOverrides: { '0': f['Deep harbour'] } },
      pieceFinishes: { sofa: f['Washed linen'] },
      change: (p) => {
        if (p.id === 'sofa') return { ...p, x: 2000, y: 650, rotation: 0 };
        if (p.id === 'coffee-table') return { ...p, x: 2000, y: 1650, rotation: 0 };
        if (p.id === 'armchair') return { ...p, x: 1300, y: 2750, rotation: 180 };
        if (p.id === 'old-armchair') return { ...p, placed: true, x: 2700, y: 2750, rotation: 180 };
        return p;
      },
    },
  );
  const bedroom = await roomFromPlan(
    page,
    project.id,
    'bedroom.json',
    {
      name: 'Bed on the long wall',
      finishes: { floor: f['Oak boards, natural oil'], walls: f['Morning oat'] },
      pieceFinishes: { bed: f['Washed linen'] },
    },
    {
      name: 'Bed under the window',
      note: 'The bed moves to the window wall; the wardrobe stays by the door.',
      finishes: { floor: f['Grey stone tile'], walls: f['Morning oat'], wallOverrides: { '2': f['Sprig wallpaper'] } },
      pieceFinishes: { bed: f['Washed linen'] },
      change: (p) => {
        if (p.id === 'bed') return { ...p, x: 1800, y: 1075, rotation: 0 };
        if (p.id === 'bedside-left') return { ...p, x: 775, y: 250, rotation: 0 };
        if (p.id === 'bedside-right') return { ...p, x: 2825, y: 250, rotation: 0 };
        if (p.id === 'chest') return { ...p, x: 3375, y: 1500, rotation: 90 };
        return p;
      },
    },
  );
  return present(page, project.id, [living, bedroom]);
}

async function present(page: Page, projectId: string, rooms: { roomId: string; optionIds: string[] }[]): Promise<string> {
  const made = await call<{ presentation: { link: string } }>(page, `/api/projects/${projectId}/presentations`, 'POST', {
    rooms,
    message: 'Two ideas for each room.',
  });
  return new URL(made.presentation.link).pathname;
}

const box = (id: string, x: number, y: number, w: number, d: number, h: number, extra: object = {}) => ({
  id,
  name: id,
  x,
  y,
  width: w,
  depth: d,
  height: h,
  status: 'new',
  ...extra,
});

/**
 * A plain 4 × 3 m room with a door in the middle of its top wall (x 1590–2410 mm) and a window
 * opposite; option A a table to the right, option B the table and a sideboard. Walking starts a
 * step inside the door, facing the middle of the room (+z).
 */
async function testRoomPresentation(page: Page): Promise<string> {
  const { project } = await call<{ project: { id: string } }>(page, '/api/projects', 'POST', {
    name: 'Test box',
    newClient: { name: 'T' },
  });
  const shell = {
    outline: [
      [0, 0],
      [4000, 0],
      [4000, 3000],
      [0, 3000],
    ],
    openings: [
      { id: 'door', type: 'door', wall: 0, offset: 1590, width: 820, height: 2040, hinge: 'start', swing: 'in' },
      { id: 'window', type: 'window', wall: 2, offset: 1200, width: 1600, height: 1300, sill: 850 },
    ],
  };
  const made = await call<Made>(page, `/api/projects/${project.id}/rooms`, 'POST', { name: 'Box room', shell });
  const second = await call<{ option: { id: string; version: number } }>(page, `/api/rooms/${made.room.id}/options`, 'POST', {
    name: 'With sideboard',
  });
  await call(page, `/api/options/${made.options[0].id}`, 'PUT', {
    name: 'Table only',
    doc: { pieces: [box('table', 3000, 1500, 800, 800, 750)] },
    version: made.options[0].version,
  });
  await call(page, `/api/options/${second.option.id}`, 'PUT', {
    doc: { pieces: [box('table', 3000, 1500, 800, 800, 750), box('sideboard', 3750, 1500, 1600, 450, 850, { rotation: 90 })] },
    version: second.option.version,
  });
  return present(page, project.id, [{ roomId: made.room.id, optionIds: [made.options[0].id, second.option.id] }]);
}

/**
 * The typical room the benches time (scripts/bench/typical-room.ts: 8 walls, 6 openings, 40 pieces of
 * 16 kinds), here with six photo finishes worn as main and accent finishes across its pieces, a photo
 * floor and a papered wall.
 */
async function typicalRoomPresentation(page: Page, f: Record<string, string>): Promise<string> {
  const { project } = await call<{ project: { id: string } }>(page, '/api/projects', 'POST', {
    name: 'Typical room',
    newClient: { name: 'T' },
  });
  const { shell, option } = typicalFurnishedRoom();
  const made = await call<Made>(page, `/api/projects/${project.id}/rooms`, 'POST', { name: 'Big room', shell });
  const photos = [
    'Washed linen',
    'Oak boards, natural oil',
    'Grey stone tile',
    'Sprig wallpaper',
    'Wide oak veneer',
    'Coarse linen',
  ].map((n) => f[n]);
  const pieces = option.pieces.map((p, i) => ({
    ...p,
    finishId: i % 2 === 0 ? photos[i % 6] : undefined,
    accentFinishId: i % 3 === 0 ? photos[(i + 1) % 6] : undefined,
  }));
  const doc = {
    pieces,
    finishes: { floor: f['Oak boards, natural oil'], walls: f['Morning oat'], wallOverrides: { '3': f['Sprig wallpaper'] } },
  };
  await call(page, `/api/options/${made.options[0].id}`, 'PUT', { doc, version: made.options[0].version });
  return present(page, project.id, [{ roomId: made.room.id, optionIds: [made.options[0].id] }]);
}

async function openClient(
  path: string,
  viewport = { width: 1280, height: 800 },
): Promise<{ context: BrowserContext; page: Page; view: Locator }> {
  const { context, page } = await newPage(browser);
  await page.setViewportSize(viewport);
  await page.goto(`${path}#room-1`);
  const view = page.locator('[data-testid=room-view]').first();
  await view.locator('canvas').waitFor({ timeout: 30_000 });
  await expect.poll(async () => Number(await view.getAttribute('data-frames')), { timeout: 30_000 }).toBeGreaterThan(0);
  return { context, page, view };
}

const cameraOf = async (view: Locator) =>
  (await view.getAttribute('data-camera'))!.split(',').map(Number) as [number, number, number];
const num = async (view: Locator, name: string) => Number(await view.getAttribute(`data-${name}`));

/**
 * Waits until the view has finished moving (data-moving is set the moment a move starts and
 * cleared by the frame that ends it) and has drawn since, or a while has passed with nothing to
 * draw; returns its camera.
 */
async function settledCamera(page: Page, view: Locator): Promise<[number, number, number]> {
  const f0 = await num(view, 'frames');
  const start = Date.now();
  for (;;) {
    await page.waitForTimeout(150);
    const idle = (await view.getAttribute('data-moving')) !== 'true';
    if (idle && ((await num(view, 'frames')) > f0 || Date.now() - start > 1500)) return cameraOf(view);
    if (Date.now() - start > 60_000) throw new Error('the view never stopped moving');
  }
}

/** Which way the view's camera looks (a unit vector, scene metres). */
const lookOf = async (view: Locator) =>
  (await view.getAttribute('data-look'))!.split(',').map(Number) as [number, number, number];

/**
 * Where a point of the room (scene metres) is on the page, from the camera figures the view
 * publishes (data-camera, data-look, data-fov) and its size; `inView` when well inside the picture
 * and in front of the camera.
 */
async function screenOf(
  view: Locator,
  point: [number, number, number],
): Promise<{ x: number; y: number; ndc: [number, number]; inView: boolean }> {
  const [eye, look, fov, b] = [await cameraOf(view), await lookOf(view), await num(view, 'fov'), (await view.boundingBox())!];
  const d = point.map((v, k) => v - eye[k]);
  const dot = (a: number[], c: number[]) => a[0] * c[0] + a[1] * c[1] + a[2] * c[2];
  // The camera's right (look × up, up being +y) and its own up (right × look); no roll in either rig.
  const flat = Math.hypot(look[0], look[2]);
  const right = [-look[2] / flat, 0, look[0] / flat];
  const up = [
    right[1] * look[2] - right[2] * look[1],
    right[2] * look[0] - right[0] * look[2],
    right[0] * look[1] - right[1] * look[0],
  ];
  const depth = dot(d, look);
  const tanV = Math.tan((fov * Math.PI) / 360);
  const tanH = tanV * (b.width / b.height);
  const ndcX = dot(d, right) / depth / tanH;
  const ndcY = dot(d, up) / depth / tanV;
  return {
    x: b.x + ((ndcX + 1) / 2) * b.width,
    y: b.y + ((1 - ndcY) / 2) * b.height,
    ndc: [ndcX, ndcY],
    inView: depth > 0.1 && Math.abs(ndcX) < 0.8 && Math.abs(ndcY) < 0.8,
  };
}

/** Share of sampled canvas pixels that differ from the background colour: a blank canvas is 0. */
async function drawnShare(view: Locator): Promise<number> {
  return view.locator('canvas').evaluate((canvas: HTMLCanvasElement) => {
    const copy = document.createElement('canvas');
    copy.width = 64;
    copy.height = 40;
    const ctx = copy.getContext('2d')!;
    ctx.drawImage(canvas, 0, 0, 64, 40);
    const data = ctx.getImageData(0, 0, 64, 40).data;
    let drawn = 0;
    for (let i = 0; i < data.length; i += 4)
      if (Math.abs(data[i] - 0xf7) + Math.abs(data[i + 1] - 0xf3) + Math.abs(data[i + 2] - 0xec) > 24) drawn++;
    return drawn / (data.length / 4);
  });
}

/** Holds a key in the focused view until the camera stops while frames go on (or a time limit), then lets go. */
async function holdKey(page: Page, view: Locator, key: string, maxMs: number): Promise<[number, number, number]> {
  await view.focus();
  await page.keyboard.down(key);
  let last = await cameraOf(view);
  let frames = await num(view, 'frames');
  const start = Date.now();
  while (Date.now() - start < maxMs) {
    await page.waitForTimeout(400);
    const nextFrames = await num(view, 'frames');
    // Held keys draw a frame after frame; only frames that moved nothing mean the walker is stopped.
    if (nextFrames < frames + 2) continue;
    const next = await cameraOf(view);
    if (next.every((v, k) => Math.abs(v - last[k]) < 1e-4)) break;
    last = next;
    frames = nextFrames;
  }
  await page.keyboard.up(key);
  return settledCamera(page, view);
}

describe('the walk-through', () => {
  let demoLink: string;

  it('opens the demo presentation: the Overview draws at once in flat colours, then the photo finishes arrive', async () => {
    demoLink = await demoPresentation(designer.page);
    const { context, page, view } = await openClient(demoLink);
    await page.screenshot({ path: join(shots, 'overview-first-frame.png') });
    expect(await drawnShare(view)).toBeGreaterThan(0.15);
    expect(await view.getAttribute('data-mode')).toBe('overview');
    const firstView = await page.evaluate(() => performance.getEntriesByName('parlour:first-view')[0]?.startTime ?? -1);
    expect(firstView).toBeGreaterThan(0);
    figures.firstViewMs = Math.round(firstView);
    // The textures arrive after: the oak floor and the linen (pieces wear its colour) load through the link.
    await expect.poll(() => num(view, 'texture-bytes'), { timeout: 20_000 }).toBeGreaterThan(0);
    await expect.poll(async () => page.getByRole('progressbar').count(), { timeout: 20_000 }).toBe(0);
    figures.demoTextureBytes = await num(view, 'texture-bytes');
    figures.demoDrawCalls = await num(view, 'draw-calls');
    await page.waitForTimeout(300);
    await page.screenshot({ path: join(shots, 'overview.png') });

    // The on-screen buttons do what dragging does.
    const before = await cameraOf(view);
    await page.getByRole('button', { name: 'Turn the room right' }).click();
    const turned = await settledCamera(page, view);
    expect(Math.hypot(turned[0] - before[0], turned[2] - before[2])).toBeGreaterThan(0.5);
    expect(turned[1]).toBeCloseTo(before[1], 2);
    await page.getByRole('button', { name: 'Look from above' }).click();
    const top = await settledCamera(page, view);
    expect(top[1]).toBeGreaterThan(before[1]);
    await page.screenshot({ path: join(shots, 'overview-above.png') });
    await page.getByRole('button', { name: 'Back to the first view' }).click();
    const back = await settledCamera(page, view);
    back.forEach((v, k) => expect(v).toBeCloseTo(before[k], 2));

    // With less motion asked for, a button jumps: the first frame after the press is already the end.
    const calm = await browser.newContext({
      baseURL: inject('baseUrl'),
      viewport: { width: 1280, height: 800 },
      reducedMotion: 'reduce',
    });
    const calmPage = await calm.newPage();
    await calmPage.goto(`${demoLink}#room-1`);
    const calmView = calmPage.locator('[data-testid=room-view]');
    await expect.poll(() => num(calmView, 'frames'), { timeout: 30_000 }).toBeGreaterThan(0);
    const calmStart = await settledCamera(calmPage, calmView);
    await calmPage.getByRole('button', { name: 'Turn the room left' }).click();
    // The first frame drawn from a moved camera (a frame redrawn for anything else, such as a photo
    // finish arriving, keeps the old camera and does not count) must already be the end.
    await expect.poll(async () => (await cameraOf(calmView)).join(), { timeout: 15_000 }).not.toBe(calmStart.join());
    const firstFrame = await cameraOf(calmView);
    expect(await settledCamera(calmPage, calmView)).toEqual(firstFrame);
    expect(firstFrame).not.toEqual(calmStart);
    await calm.close();

    // A tablet held upright: the view above, the options below, the key help over the view.
    await page.setViewportSize({ width: 820, height: 1180 });
    await page.getByRole('button', { name: 'Keys' }).click();
    await page.getByRole('dialog', { name: 'Keys' }).waitFor();
    await settledCamera(page, view);
    await page.screenshot({ path: join(shots, 'tablet-keys.png') });
    await page.keyboard.press('Escape');
    await expect.poll(() => page.getByRole('dialog', { name: 'Keys' }).count()).toBe(0);
    await context.close();
  });

  it('walks the demo flat to a door and a window for the README, clicking the walk buttons', async () => {
    demoLink ??= await demoPresentation(designer.page);
    const { context, page, view } = await openClient(demoLink);
    await expect.poll(async () => page.getByRole('progressbar').count(), { timeout: 20_000 }).toBe(0);
    const walk = async () => {
      await page.getByRole('group', { name: 'How to look' }).getByRole('button', { name: 'Walk' }).click();
      await expect.poll(() => view.getAttribute('data-mode')).toBe('walk');
      return settledCamera(page, view);
    };
    const press = async (name: string, times: number) => {
      for (let i = 0; i < times; i++) {
        await page.getByRole('button', { name, exact: true }).click();
        await settledCamera(page, view);
      }
    };
    // The living room: from a step inside the hall door (left wall, plan x 0), two steps into the
    // room, then past the dining table to the far corner of the lower arm (holding W slides along the
    // table and the walls as a person does); turned back to the door, the picture shows its leaf,
    // handle, lining and architrave across the table.
    const start = await walk();
    demoDoorFigures.start = start;
    const turnUntil = async (name: string, holds: (look: [number, number, number]) => boolean) => {
      for (let i = 0; i < 12 && !holds(await lookOf(view)); i++) await press(name, 1);
      expect(holds(await lookOf(view))).toBe(true);
    };
    await turnUntil('Turn left', (l) => l[2] < -0.9);
    await press('Walk forward', 2);
    await turnUntil('Turn right', (l) => l[0] > 0.9 && l[2] > 0);
    const across = await holdKey(page, view, 'KeyW', 30_000);
    demoDoorFigures.across = across;
    expect(across[0]).toBeGreaterThan(3.3);
    await turnUntil('Turn right', (l) => l[0] < -0.9 && l[2] < 0);
    const atDoor = await settledCamera(page, view);
    demoDoorFigures.look = await lookOf(view);
    expect(Math.hypot(atDoor[0] - start[0], atDoor[2] - start[2])).toBeGreaterThan(1.5);
    expect((await screenOf(view, [0, 1, 4.39])).inView).toBe(true);
    await page.waitForTimeout(300);
    await page.screenshot({ path: join(readmeShots, 'walk-door.png') });

    // The bedroom: a step inside its door, turned to the window wall (plan y 0) and up to the window.
    await page
      .getByRole('button', { name: 'Bedroom', exact: true })
      .or(page.getByRole('link', { name: 'Bedroom', exact: true }))
      .click();
    await expect.poll(async () => page.getByRole('progressbar').count(), { timeout: 20_000 }).toBe(0);
    const inBedroom = await walk();
    await press('Turn left', 1);
    await press('Walk forward', 2);
    const atWindow = await settledCamera(page, view);
    expect(atWindow[2]).toBeLessThan(inBedroom[2] - 0.5);
    await page.waitForTimeout(300);
    await page.screenshot({ path: join(readmeShots, 'walk-window.png') });
    await context.close();
  }, 150_000);

  it('walks with the keys: walls stop it, the door lets it through, and only while the view has focus', async () => {
    const link = await testRoomPresentation(designer.page);
    const { context, page, view } = await openClient(link);
    await page.getByRole('group', { name: 'How to look' }).getByRole('button', { name: 'Walk' }).click();
    await expect.poll(() => view.getAttribute('data-mode')).toBe('walk');
    const start = await settledCamera(page, view);
    // A step inside the door (x 2 m), at eye height.
    expect(start[0]).toBeCloseTo(2, 2);
    expect(start[1]).toBeCloseTo(1.6, 3);
    expect(start[2]).toBeGreaterThan(0.5);

    // Keys do nothing while the view does not have focus.
    await page.getByRole('heading', { name: 'Box room' }).click();
    await page.keyboard.down('KeyW');
    await page.waitForTimeout(500);
    await page.keyboard.up('KeyW');
    expect(await cameraOf(view)).toEqual(start);

    // Forward into the room until the far wall (z = 3 m) stops it one body radius short.
    const atWall = await holdKey(page, view, 'KeyW', 30_000);
    expect(atWall[2]).toBeLessThanOrEqual(3 - BODY_RADIUS_M + 1e-3);
    expect(atWall[2]).toBeGreaterThan(3 - BODY_RADIUS_M - 0.05);
    expect(atWall[0]).toBeCloseTo(start[0], 2);
    await page.screenshot({ path: join(shots, 'walk-at-window.png') });

    // Back the whole way: out through the door into the threshold past the wall's outer face (z −0.1 m).
    const outside = await holdKey(page, view, 'ArrowDown', 40_000);
    expect(outside[2]).toBeLessThan(-0.1);
    expect(outside[2]).toBeGreaterThan(-0.1 - 0.6);
    await page.screenshot({ path: join(shots, 'walk-doorway.png') });

    // In the doorway, stepping sideways is stopped by the reveals (x 1.59 and 2.41 m) a body radius away.
    const sideways = await holdKey(page, view, 'KeyD', 10_000);
    expect(sideways[0]).toBeCloseTo(1.59 + BODY_RADIUS_M, 2);
    const otherWay = await holdKey(page, view, 'KeyA', 10_000);
    expect(otherWay[0]).toBeCloseTo(2.41 - BODY_RADIUS_M, 2);

    // A click on the floor ahead walks there in a straight line (clear of the open door leaf at x 1.59–1.63 m).
    const b = (await view.boundingBox())!;
    await page.mouse.click(b.x + b.width / 2, b.y + b.height * 0.97);
    const walkedTo = await settledCamera(page, view);
    expect(walkedTo[2]).toBeGreaterThan(otherWay[2] + 1.5);
    expect(walkedTo[0]).toBeCloseTo(otherWay[0], 1);
    await page.screenshot({ path: join(shots, 'walk-clicked.png') });

    // A plain click on an on-screen arrow (pressed and let go at once) takes one step of 0.5 m,
    // sideways here: from the clicked place (z 2.4 m) the floor to the left (+x) is clear of the
    // table (x 2.6–3.4 m, z 1.1–1.9 m) and of the walls.
    await page.getByRole('button', { name: 'Step left' }).click();
    const stepped = await settledCamera(page, view);
    expect(Math.hypot(stepped[0] - walkedTo[0], stepped[2] - walkedTo[2])).toBeCloseTo(0.5, 1);
    expect(stepped[2]).toBeCloseTo(walkedTo[2], 1);

    // Held, they do the same as the keys: "Walk back" held walks back.
    const back = page.getByRole('button', { name: 'Walk back' });
    const bb = (await back.boundingBox())!;
    await page.mouse.move(bb.x + bb.width / 2, bb.y + bb.height / 2);
    await page.mouse.down();
    await page.waitForTimeout(1500);
    await page.mouse.up();
    const backed = await settledCamera(page, view);
    expect(backed[2]).toBeLessThan(stepped[2] - 0.2);

    const fps = await measureFps(page, view);
    figures.walkFps = fps;
    await context.close();
  });

  it('says briefly when a clicked spot of floor cannot be reached (behind the open door leaf), and walks where it can', async () => {
    const link = await testRoomPresentation(designer.page);
    const { context, page, view } = await openClient(link);
    await page.getByRole('group', { name: 'How to look' }).getByRole('button', { name: 'Walk' }).click();
    await expect.poll(() => view.getAttribute('data-mode')).toBe('walk');
    await settledCamera(page, view);
    const notice = view.getByRole('status');
    expect(await notice.textContent()).toBe('');

    // Look down a little (the picture follows the pointer: drag up), so the floor near by is in the picture.
    const b = (await view.boundingBox())!;
    await page.mouse.move(b.x + b.width / 2, b.y + b.height / 2);
    await page.mouse.down();
    await page.mouse.move(b.x + b.width / 2, b.y + b.height / 2 - 130, { steps: 6 });
    await page.mouse.up();
    await settledCamera(page, view);
    expect((await lookOf(view))[1]).toBeLessThan(-0.4);

    // Floor that can be reached: a click walks there, and nothing is said.
    const reachable: [number, number, number] = [1.1, 0, 2.6];
    const spot = await screenOf(view, reachable);
    expect(spot.inView).toBe(true);
    await page.mouse.click(spot.x, spot.y);
    const there = await settledCamera(page, view);
    figures.reachableMissM = Math.round(Math.hypot(there[0] - reachable[0], there[2] - reachable[2]) * 1000) / 1000;
    expect(figures.reachableMissM).toBeLessThan(0.05);
    expect(await notice.textContent()).toBe('');

    // Turn round with the turn button (one notch a click) until the floor behind the open leaf is in
    // the picture: the leaf stands at x 1.59–1.63 m, so 1.45 m has no room for a body (radius 0.25 m).
    const behindLeaf: [number, number, number] = [1.45, 0, 0.3];
    const turnLeft = page.getByRole('button', { name: 'Turn left' });
    for (let i = 0; i < 12 && !(await screenOf(view, behindLeaf)).inView; i++) {
      await turnLeft.click();
      await settledCamera(page, view);
    }
    const target = await screenOf(view, behindLeaf);
    expect(target.inView).toBe(true);
    await page.mouse.click(target.x, target.y);
    await expect.poll(() => notice.textContent(), { timeout: 5_000 }).toBe('You can’t walk there');
    await page.waitForTimeout(400);
    expect(await notice.getByText('You can’t walk there').isVisible()).toBe(true);
    await page.screenshot({ path: join(shots, 'walk-no-way.png') });
    // It walks towards the spot as far as it can, and stops a body's radius short of the leaf (x 1.59–1.63 m, z 0–0.82 m).
    const stopped = await settledCamera(page, view);
    figures.noWayStopM = stopped.map((v) => Math.round(v * 1000) / 1000).join(',');
    const away = (p: number[]) => Math.hypot(p[0] - behindLeaf[0], p[2] - behindLeaf[2]);
    expect(away(stopped)).toBeLessThan(away(there) - 0.5);
    const fromLeaf = Math.hypot(Math.max(1.59 - stopped[0], 0, stopped[0] - 1.63), Math.max(0, stopped[2] - 0.82));
    expect(fromLeaf).toBeGreaterThan(BODY_RADIUS_M - 0.01);
    expect(stopped[0]).toBeLessThan(1.59);
    // …and the message goes again after a moment.
    await expect.poll(() => notice.textContent(), { timeout: 10_000 }).toBe('');
    await context.close();
  });

  it('highlights a tapped piece in 3D while its details are open, in the Overview, Walk and Compare', async () => {
    const link = await testRoomPresentation(designer.page);
    const { context, page, view } = await openClient(link);
    const tableTop: [number, number, number] = [3, 0.75, 1.5];
    const details = page.getByRole('heading', { name: 'table', exact: true });
    const closeDetails = page.getByRole('button', { name: 'Close the piece details' });
    // Taps the table where the camera figures put it on screen; the highlight is its form drawn
    // again, tinted, and its outline: two more draw calls, gone when the details close.
    const tapTable = async (v: Locator) => {
      const before = await num(v, 'draw-calls');
      const at = await screenOf(v, tableTop);
      expect(at.inView).toBe(true);
      await page.mouse.click(at.x, at.y);
      await details.waitFor();
      await expect.poll(() => num(v, 'draw-calls'), FRAME_WAIT).toBe(before + 2);
      return before;
    };
    await settledCamera(page, view);
    const overviewPlain = await tapTable(view);
    figures.highlightDrawCalls = `${overviewPlain}→${overviewPlain + 2}`;
    await page.waitForTimeout(300);
    await page.screenshot({ path: join(shots, 'highlight-overview.png') });
    await closeDetails.click();
    await expect.poll(() => num(view, 'draw-calls'), FRAME_WAIT).toBe(overviewPlain);

    await page.getByRole('group', { name: 'How to look' }).getByRole('button', { name: 'Walk' }).click();
    await settledCamera(page, view);
    // Look down a little (drag up), the table being low and near.
    const vb = (await view.boundingBox())!;
    await page.mouse.move(vb.x + vb.width / 2, vb.y + vb.height / 2);
    await page.mouse.down();
    await page.mouse.move(vb.x + vb.width / 2, vb.y + vb.height / 2 - 110, { steps: 6 });
    await page.mouse.up();
    await settledCamera(page, view);
    const turnRight = page.getByRole('button', { name: 'Turn right' });
    for (let i = 0; i < 12 && !(await screenOf(view, tableTop)).inView; i++) {
      await turnRight.click();
      await settledCamera(page, view);
    }
    await tapTable(view);
    await page.waitForTimeout(300);
    await page.screenshot({ path: join(shots, 'highlight-walk.png') });
    await closeDetails.click();

    // Compare, from above: a tap on the table in the right half selects that half's option and highlights it there.
    await page.getByRole('group', { name: 'How to look' }).getByRole('button', { name: 'Overview' }).click();
    await page.getByRole('button', { name: 'Compare' }).click();
    const right = page.locator('[data-testid=room-view]').nth(1);
    await expect.poll(() => num(right, 'frames'), { timeout: 20_000 }).toBeGreaterThan(0);
    await settledCamera(page, right);
    await tapTable(right);
    await page.getByRole('heading', { name: 'In Option B · With sideboard (right)' }).waitFor();
    await page.waitForTimeout(300);
    await page.screenshot({ path: join(shots, 'highlight-compare.png') });
    await context.close();
  });

  it('switches options keeping the camera exactly where it is, and memory does not grow over 50 switches', async () => {
    const link = await testRoomPresentation(designer.page);
    const { context, page, view } = await openClient(link);
    await page.getByRole('button', { name: 'Come closer' }).click();
    const camera = await settledCamera(page, view);
    const trianglesA = await num(view, 'triangles');
    await page.keyboard.press('2');
    await expect.poll(() => view.getAttribute('data-option'), FRAME_WAIT).not.toBe(null);
    await expect.poll(() => num(view, 'triangles'), FRAME_WAIT).toBeGreaterThan(trianglesA);
    expect(await cameraOf(view)).toEqual(camera);
    await page
      .getByRole('group', { name: 'Options' })
      .getByRole('button', { name: /Option A/ })
      .click();
    await expect.poll(() => num(view, 'triangles'), FRAME_WAIT).toBe(trianglesA);
    expect(await cameraOf(view)).toEqual(camera);

    // A first round loads everything; after it, switching back and forth adds nothing on the GPU.
    const frames = () => num(view, 'frames');
    const switchTo = async (key: string) => {
      const f = await frames();
      await page.keyboard.press(key);
      await expect.poll(frames, FRAME_WAIT).toBeGreaterThan(f);
    };
    await switchTo('2');
    await switchTo('1');
    const before = { geometries: await num(view, 'geometries'), textures: await num(view, 'textures') };
    const t0 = Date.now();
    for (let i = 0; i < SWITCHES; i++) await switchTo(i % 2 === 0 ? '2' : '1');
    figures.switchMs = Math.round((Date.now() - t0) / SWITCHES);
    const after = { geometries: await num(view, 'geometries'), textures: await num(view, 'textures') };
    expect(after.geometries).toBeLessThanOrEqual(before.geometries);
    expect(after.textures).toBeLessThanOrEqual(before.textures);
    expect(await cameraOf(view)).toEqual(camera);
    await context.close();
  });

  it('compares two options side by side with linked cameras, in the Overview and in Walk', async () => {
    const { context, page } = await openClient(demoLink);
    await page.getByRole('button', { name: 'Compare' }).click();
    const views = page.locator('[data-testid=room-view]');
    await expect.poll(() => views.count()).toBe(2);
    const [left, right] = [views.nth(0), views.nth(1)];
    await expect.poll(async () => num(right, 'frames'), { timeout: 20_000 }).toBeGreaterThan(0);
    expect(await page.locator('canvas').count()).toBe(2);
    expect(await left.getAttribute('data-option')).not.toBe(await right.getAttribute('data-option'));
    expect(await settledCamera(page, right)).toEqual(await settledCamera(page, left));
    // Each half is framed to its own size: every corner of the room, floor and wall tops, is in it.
    for (const half of [left, right]) {
      let widest = 0;
      for (const [x, z] of DEMO_LIVING_CORNERS_M)
        for (const y of [0, 2.7]) {
          const { ndc } = await screenOf(half, [x, y, z]);
          widest = Math.max(widest, Math.abs(ndc[0]), Math.abs(ndc[1]));
        }
      figures.compareWidestCorner = Math.round(widest * 1000) / 1000;
      expect(widest).toBeLessThan(1);
      expect(widest).toBeGreaterThan(0.7);
    }

    // Selecting the other option keeps the halves where they are; the words say which one is meant.
    const [leftOption, rightOption] = [await left.getAttribute('data-option'), await right.getAttribute('data-option')];
    const leftFrames = await num(left, 'frames');
    await page
      .getByRole('group', { name: 'Options' })
      .getByRole('button', { name: /Option B · Conversation corner/ })
      .click();
    await page.getByRole('heading', { name: 'In Option B · Conversation corner (right)' }).waitFor();
    await page.getByRole('button', { name: 'Choose Option B · Conversation corner' }).waitFor();
    expect(await left.getAttribute('data-option')).toBe(leftOption);
    expect(await right.getAttribute('data-option')).toBe(rightOption);
    // The same views, not new ones: their frame counts go on.
    expect(await num(left, 'frames')).toBeGreaterThanOrEqual(leftFrames);
    await page.keyboard.press('1');
    await page.getByRole('heading', { name: 'In Option A · Sofa by the wall (left)' }).waitFor();
    await page.getByRole('button', { name: 'Choose Option A · Sofa by the wall' }).waitFor();
    expect(await left.getAttribute('data-option')).toBe(leftOption);
    expect(await right.getAttribute('data-option')).toBe(rightOption);

    // Dragging the left turns both.
    const b = (await left.boundingBox())!;
    await page.mouse.move(b.x + b.width * 0.5, b.y + b.height * 0.5);
    await page.mouse.down();
    await page.mouse.move(b.x + b.width * 0.3, b.y + b.height * 0.45, { steps: 8 });
    await page.mouse.up();
    const dragged = await settledCamera(page, left);
    expect(await settledCamera(page, right)).toEqual(dragged);
    expect(await drawnShare(right)).toBeGreaterThan(0.15);
    await page.waitForTimeout(300);
    await page.screenshot({ path: join(shots, 'compare.png') });

    // In Walk, keys in one view walk both.
    await page.getByRole('group', { name: 'How to look' }).getByRole('button', { name: 'Walk' }).click();
    const walkStart = await settledCamera(page, left);
    expect(await settledCamera(page, right)).toEqual(walkStart);
    const walked = await holdKey(page, right, 'KeyW', 1200);
    expect(walked).not.toEqual(walkStart);
    expect(await settledCamera(page, left)).toEqual(walked);
    await page.waitForTimeout(300);
    await page.screenshot({ path: join(shots, 'compare-walk.png') });
    await context.close();
  });

  it('takes the README pictures at 1280 × 800: Walk at the sofa, and Compare', async () => {
    const { context, page, view } = await openClient(demoLink);
    await expect.poll(async () => page.getByRole('progressbar').count(), { timeout: 20_000 }).toBe(0);
    await page.getByRole('group', { name: 'How to look' }).getByRole('button', { name: 'Walk' }).click();
    await settledCamera(page, view);
    const b = (await view.boundingBox())!;
    const look = async (dy: number) => {
      await page.mouse.move(b.x + b.width / 2, b.y + b.height / 2);
      await page.mouse.down();
      await page.mouse.move(b.x + b.width / 2, b.y + b.height / 2 + dy, { steps: 6 });
      await page.mouse.up();
      await settledCamera(page, view);
    };
    // Look down, click the floor beyond the armchair, then turn to the sofa across the coffee table.
    await look(-130);
    const spot = await screenOf(view, [3.4, 0, 2.9]);
    expect(spot.inView).toBe(true);
    await page.mouse.click(spot.x, spot.y);
    const there = await settledCamera(page, view);
    expect(Math.hypot(there[0] - 3.4, there[2] - 2.9)).toBeLessThan(0.05);
    await look(95);
    const sofa: [number, number, number] = [0.45, 0.45, 2.2];
    const turnLeft = page.getByRole('button', { name: 'Turn left' });
    for (let i = 0; i < 12; i++) {
      const at = await screenOf(view, sofa);
      if (at.inView && Math.abs(at.ndc[0]) < 0.35) break;
      await turnLeft.click();
      await settledCamera(page, view);
    }
    const at = await screenOf(view, sofa);
    expect(at.inView && Math.abs(at.ndc[0]) < 0.35).toBe(true);
    await page.mouse.move(0, 0);
    await page.waitForTimeout(300);
    await page.screenshot({ path: join(readmeShots, 'walk-sofa.png') });

    await page.getByRole('group', { name: 'How to look' }).getByRole('button', { name: 'Overview' }).click();
    await page.getByRole('button', { name: 'Compare' }).click();
    const right = page.locator('[data-testid=room-view]').nth(1);
    await expect.poll(() => num(right, 'frames'), { timeout: 20_000 }).toBeGreaterThan(0);
    await expect.poll(async () => page.getByRole('progressbar').count(), { timeout: 20_000 }).toBe(0);
    await page.getByRole('button', { name: 'Back to the first view' }).click();
    await settledCamera(page, right);
    await page.mouse.move(0, 0);
    await page.waitForTimeout(500);
    await page.screenshot({ path: join(readmeShots, 'compare.png') });
    await context.close();
  });

  it('draws a typical room (8 walls, 6 openings, 40 pieces) within the frame budget', { timeout: 180_000 }, async () => {
    await uploadPhotos(designer.page, EXTRA_PHOTOS);
    const finishes = Object.fromEntries(
      (await call<{ finishes: { id: string; name: string }[] }>(designer.page, '/api/finishes', 'GET')).finishes.map((f) => [
        f.name,
        f.id,
      ]),
    );
    const link = await typicalRoomPresentation(designer.page, finishes);
    const { context, page, view } = await openClient(link);
    await expect.poll(async () => page.getByRole('progressbar').count(), { timeout: 20_000 }).toBe(0);
    await page.getByRole('button', { name: 'Turn the room left' }).click();
    await settledCamera(page, view);
    const overview = {
      drawCalls: await num(view, 'draw-calls'),
      triangles: await num(view, 'triangles'),
      textureBytes: await num(view, 'texture-bytes'),
    };
    await page.getByRole('group', { name: 'How to look' }).getByRole('button', { name: 'Walk' }).click();
    await settledCamera(page, view);
    const walk = { drawCalls: await num(view, 'draw-calls'), triangles: await num(view, 'triangles') };
    Object.assign(figures, {
      typicalOverviewDrawCalls: overview.drawCalls,
      typicalWalkDrawCalls: walk.drawCalls,
      typicalTriangles: overview.triangles,
      typicalWalkTriangles: walk.triangles,
      typicalTextureBytes: overview.textureBytes,
    });
    for (const d of [overview, walk]) {
      expect(d.drawCalls).toBeGreaterThan(5);
      expect(d.drawCalls).toBeLessThan(MAX_DRAW_CALLS);
      expect(d.triangles).toBeLessThan(MAX_TRIANGLES);
    }
    expect(overview.textureBytes).toBeGreaterThan(0);
    expect(overview.textureBytes).toBeLessThan(MAX_TEXTURE_BYTES);
    figures.typicalFps = await measureFps(page, view);
    await page.screenshot({ path: join(shots, 'typical-walk.png') });
    await context.close();
    // The same room with the plain boxes, measured the same way in the same run, for the ratio.
    const boxes = await openClient(`${link}?pieces=boxes`);
    await expect.poll(async () => boxes.page.getByRole('progressbar').count(), { timeout: 20_000 }).toBe(0);
    await boxes.page.getByRole('group', { name: 'How to look' }).getByRole('button', { name: 'Walk' }).click();
    await settledCamera(boxes.page, boxes.view);
    figures.typicalBoxesTriangles = await num(boxes.view, 'triangles');
    figures.typicalBoxesFps = await measureFps(boxes.page, boxes.view);
    await boxes.context.close();
  });
});

/** Frames drawn per second while turning on the spot in Walk (software WebGL: a relative figure only). */
async function measureFps(page: Page, view: Locator): Promise<number> {
  await view.focus();
  const f0 = await num(view, 'frames');
  const t0 = Date.now();
  await page.keyboard.down('ArrowLeft');
  await page.waitForTimeout(3000);
  await page.keyboard.up('ArrowLeft');
  const fps = ((await num(view, 'frames')) - f0) / ((Date.now() - t0) / 1000);
  return Math.round(fps * 10) / 10;
}
