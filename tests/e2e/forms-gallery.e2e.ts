// A gallery of every piece kind as the client sees it: each alone in a small room, from the
// client's Overview, written to .test-output/forms/<kind>.png, and a labelled collage of all of
// them for the README (assets/screenshots/forms.png).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import sharp from 'sharp';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { CATALOGUE } from '../../shared/catalogue/catalogue';
import { KIND_LABELS, PIECE_KINDS, type PieceKind } from '../../shared/schemas/piece-kind';
import { launchBrowser } from './lib/browser';
import { newPage, signUpThroughForm } from './lib/session';

const root = resolve(import.meta.dirname, '../..');
const shots = join(root, '.test-output', 'forms');
const TILE = { width: 360, height: 270 };
const COLUMNS = 6;

/** Calm demo colours: upholstery and boards in the main finish, darker wood for legs, frames and handles. */
const MAIN_COLOUR: Partial<Record<PieceKind, string>> = {
  sofa: '#8e9d94',
  'corner-sofa': '#a69583',
  armchair: '#b7836a',
  ottoman: '#9c8aa0',
  bed: '#a7b4bd',
  rug: '#b9826a',
  picture: '#6f8aa0',
  plant: '#c98e6a',
  'pendant-light': '#e7dccb',
  'table-lamp': '#8fa09a',
  radiator: '#d3d0c9',
  'kitchen-base-unit': '#dfe3e0',
  'kitchen-wall-unit': '#dfe3e0',
  'oven-housing': '#dfe3e0',
  dishwasher: '#dfe3e0',
};
const WOOD = '#b89a78';
const DARK_WOOD = '#5b4636';

let browser: Browser;
let designer: { context: BrowserContext; page: Page };

beforeAll(async () => {
  browser = await launchBrowser();
  mkdirSync(shots, { recursive: true });
  designer = await newPage(browser);
  await signUpThroughForm(designer.page, 'Gallery Interiors', 'Ada Designer');
});
afterAll(async () => {
  await designer?.context.close();
  await browser?.close();
});

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

interface Made {
  room: { id: string };
  options: { id: string; version: number }[];
}

/** A presentation shows at most this many rooms, so the gallery takes two. */
const ROOMS_PER_LINK = 18;

/** One room per kind, sized round the kind's first catalogue entry, the piece against the top wall facing into the room. */
async function galleryPresentation(page: Page, kinds: readonly PieceKind[]): Promise<string> {
  const { project } = await call<{ project: { id: string } }>(page, '/api/projects', 'POST', {
    name: 'Every kind',
    newClient: { name: 'G' },
  });
  const rooms: { roomId: string; optionIds: string[] }[] = [];
  for (const kind of kinds) {
    const entry = CATALOGUE.find((e) => e.kind === kind)!;
    const margin = Math.max(500, 0.45 * Math.max(entry.width, entry.depth));
    const w = Math.round(entry.width + 2 * margin);
    const d = Math.round(entry.depth + 2 * margin);
    const made = await call<Made>(page, `/api/projects/${project.id}/rooms`, 'POST', {
      name: KIND_LABELS[kind],
      shell: {
        outline: [
          [0, 0],
          [w, 0],
          [w, d],
          [0, d],
        ],
        wallHeight: 2500,
      },
    });
    const against =
      entry.elevation !== undefined ||
      ['wardrobe', 'bookcase', 'radiator', 'kitchen-base-unit', 'oven-housing', 'dishwasher', 'mirror', 'picture'].includes(kind);
    const piece = {
      id: kind,
      name: entry.name,
      kind,
      settings: entry.settings,
      x: w / 2,
      y: against ? entry.depth / 2 + 5 : d / 2,
      width: entry.width,
      depth: entry.depth,
      height: entry.height,
      elevation: entry.elevation ?? 0,
      rotation: 0,
      status: 'new',
      colour: MAIN_COLOUR[kind] ?? WOOD,
      accentColour: DARK_WOOD,
    };
    await call(page, `/api/options/${made.options[0].id}`, 'PUT', {
      name: KIND_LABELS[kind],
      doc: { pieces: [piece] },
      version: made.options[0].version,
    });
    rooms.push({ roomId: made.room.id, optionIds: [made.options[0].id] });
  }
  const presented = await call<{ presentation: { link: string } }>(page, `/api/projects/${project.id}/presentations`, 'POST', {
    rooms,
    message: 'Every kind of piece.',
  });
  return new URL(presented.presentation.link).pathname;
}

describe('the forms gallery', () => {
  it('draws the imported living room plan with each piece’s top view and the piece’s kind in Furnish', async () => {
    const page = designer.page;
    const { project } = await call<{ project: { id: string } }>(page, '/api/projects', 'POST', {
      name: 'Plan look',
      newClient: { name: 'P' },
    });
    const file = JSON.parse(readFileSync(join(root, 'assets/plans/l-shaped-living-room.json'), 'utf8'));
    const made = await call<{ room: { id: string } }>(page, `/api/projects/${project.id}/rooms/import`, 'POST', file);
    await page.goto(`/projects/${project.id}/rooms/${made.room.id}`);
    await page.getByRole('button', { name: /Furnish/ }).click();
    await page.locator('[data-testid=piece-sofa]').waitFor();
    // Every typed piece carries its top view; the box outline under it is what is dragged.
    expect(await page.locator('[data-testid=piece-top-view]').count()).toBeGreaterThanOrEqual(6);
    await page.locator('[data-testid=piece-sofa]').click();
    await page.getByText('Change kind').waitFor();
    await page.waitForTimeout(500);
    await page.screenshot({ path: join(shots, 'editor-plan.png') });
  });

  it('shows every kind alone from the client’s Overview and writes a collage', { timeout: 600_000 }, async () => {
    const links = [
      await galleryPresentation(designer.page, PIECE_KINDS.slice(0, ROOMS_PER_LINK)),
      await galleryPresentation(designer.page, PIECE_KINDS.slice(ROOMS_PER_LINK)),
    ];
    const { context, page } = await newPage(browser);
    await page.setViewportSize({ width: 1280, height: 800 });
    const tiles: { input: Buffer; left: number; top: number }[] = [];
    const figures: Record<string, { triangles: number; drawCalls: number }> = {};
    for (const [i, kind] of PIECE_KINDS.entries()) {
      await page.goto(`${links[Math.floor(i / ROOMS_PER_LINK)]}#room-${(i % ROOMS_PER_LINK) + 1}`);
      const view = page.locator('[data-testid=room-view]').first();
      await view.locator('canvas').waitFor({ timeout: 30_000 });
      await expect.poll(async () => Number(await view.getAttribute('data-frames')), { timeout: 30_000 }).toBeGreaterThan(0);
      await page.waitForTimeout(600);
      const file = join(shots, `${kind}.png`);
      await view.screenshot({ path: file });
      figures[kind] = {
        triangles: Number(await view.getAttribute('data-triangles')),
        drawCalls: Number(await view.getAttribute('data-draw-calls')),
      };
      // The tile keeps the middle of the view, where the room and its piece are.
      const { width = 1, height = 1 } = await sharp(file).metadata();
      const crop = {
        left: Math.round(width * 0.2),
        top: Math.round(height * 0.1),
        width: Math.round(width * 0.6),
        height: Math.round(height * 0.78),
      };
      const tile = await sharp(file)
        .extract(crop)
        .resize(TILE.width, TILE.height - 34, { fit: 'cover' })
        .png()
        .toBuffer();
      const label = Buffer.from(
        `<svg width="${TILE.width}" height="34" xmlns="http://www.w3.org/2000/svg"><rect width="100%" height="100%" fill="#f7f3ec"/><text x="12" y="23" font-family="DejaVu Sans, sans-serif" font-size="16" fill="#2a2521">${KIND_LABELS[kind]}</text></svg>`,
      );
      const left = (i % COLUMNS) * TILE.width;
      const top = Math.floor(i / COLUMNS) * TILE.height;
      tiles.push({ input: tile, left, top }, { input: await sharp(label).png().toBuffer(), left, top: top + TILE.height - 34 });
    }
    writeFileSync(join(shots, 'figures.json'), JSON.stringify(figures, null, 2));
    const rows = Math.ceil(PIECE_KINDS.length / COLUMNS);
    await sharp({ create: { width: COLUMNS * TILE.width, height: rows * TILE.height, channels: 3, background: '#f7f3ec' } })
      .composite(tiles)
      .png({ compressionLevel: 9, palette: true })
      .toFile(join(root, 'assets', 'screenshots', 'forms.png'));
    // Each kind draws more than its room's bare shell and stays within a piece's triangle budget.
    const shell = figures['plain-block'].triangles - 12;
    for (const kind of PIECE_KINDS) expect(figures[kind].triangles - shell, kind).toBeLessThanOrEqual(2000 + 12);
    await context.close();
  });
});
