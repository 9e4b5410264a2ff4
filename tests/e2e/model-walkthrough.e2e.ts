// A piece model on the client's link: the designer uploads a model (made in the test with the glTF
// library), four dining chairs wear it, and the client's walk-through loads the file once through
// the link, draws it in place of the chairs' forms (the renderer's figures show it), within the
// budget for models; a link without models never fetches the glTF loader.
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { mkdirSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type { Browser, BrowserContext, Locator, Page } from 'playwright-core';
import { chairDocument, toGlb } from '../../server/services/gltf/test-models';
import { launchBrowser } from './lib/browser';
import { newPage, signUpThroughForm } from './lib/session';

const shots = join(resolve(import.meta.dirname, '../..'), '.test-output', 'model-walkthrough');
/** The budget for a room with models (the piece-models issue): draw calls in one view. */
const MAX_DRAW_CALLS_WITH_MODELS = 90;

let browser: Browser;
let designer: Page;
beforeAll(async () => {
  browser = await launchBrowser();
  mkdirSync(shots, { recursive: true });
  designer = (await newPage(browser)).page;
  await signUpThroughForm(designer, 'Model Walk Studio');
});
afterAll(() => browser?.close());

async function call<T>(page: Page, path: string, method: string, body?: object): Promise<T> {
  const res = await page.request.fetch(path, { method, data: body, headers: { origin: inject('baseUrl') } });
  if (!res.ok()) throw new Error(`${method} ${path}: ${res.status()} ${await res.text()}`);
  return (res.status() === 204 ? null : await res.json()) as T;
}

const chair = (id: string, x: number, y: number, rotation: number, modelId?: string) => ({
  id,
  name: 'Dining chair',
  x,
  y,
  width: 450,
  depth: 500,
  height: 900,
  rotation,
  status: 'new',
  kind: 'dining-chair',
  ...(modelId ? { modelId } : {}),
});

/** A dining room presented with four chairs round a table, wearing `modelId` when given. */
async function diningLink(page: Page, modelId?: string): Promise<string> {
  const { project } = await call<{ project: { id: string } }>(page, '/api/projects', 'POST', {
    name: modelId ? 'Orchard house' : 'Orchard house, forms',
    newClient: { name: 'The Fenwick household' },
  });
  const made = await call<{ room: { id: string }; options: { id: string; version: number }[] }>(
    page,
    `/api/projects/${project.id}/rooms`,
    'POST',
    {
      name: 'Dining room',
      shell: {
        outline: [
          [0, 0],
          [4000, 0],
          [4000, 3500],
          [0, 3500],
        ],
        openings: [{ id: 'door', type: 'door', wall: 0, offset: 400, width: 820, height: 2040, hinge: 'start', swing: 'in' }],
      },
    },
  );
  const option = made.options[0];
  const pieces = [
    {
      id: 'table',
      name: 'Dining table',
      x: 2000,
      y: 1750,
      width: 1400,
      depth: 800,
      height: 750,
      status: 'new',
      kind: 'dining-table',
    },
    chair('c1', 1650, 1075, 0, modelId),
    chair('c2', 2350, 1075, 0, modelId),
    chair('c3', 1650, 2425, 180, modelId),
    chair('c4', 2350, 2425, 180, modelId),
  ];
  await call(page, `/api/options/${option.id}`, 'PUT', { doc: { pieces }, version: option.version });
  const { presentation } = await call<{ presentation: { link: string } }>(
    page,
    `/api/projects/${project.id}/presentations`,
    'POST',
    {
      rooms: [{ roomId: made.room.id, optionIds: [option.id] }],
    },
  );
  return new URL(presentation.link).pathname;
}

const num = async (view: Locator, name: string) => Number(await view.getAttribute(`data-${name}`));

async function openClient(path: string): Promise<{ context: BrowserContext; page: Page; view: Locator; fetched: string[] }> {
  const { context, page } = await newPage(browser);
  const fetched: string[] = [];
  page.on('request', (r) => fetched.push(new URL(r.url()).pathname));
  await page.goto(`${path}#room-1`);
  const view = page.locator('[data-testid=room-view]').first();
  await expect.poll(() => num(view, 'frames'), { timeout: 30_000 }).toBeGreaterThan(0);
  return { context, page, view, fetched };
}

describe('a piece model on the client’s link', () => {
  it('loads the model once through the link and draws it in place of the forms', { timeout: 120_000 }, async () => {
    const glb = await toGlb(await chairDocument());
    const res = await designer.request.post('/api/piece-models', {
      headers: { origin: inject('baseUrl') },
      multipart: { model: { name: 'oak-chair.glb', mimeType: 'model/gltf-binary', buffer: glb }, kind: 'dining-chair' },
    });
    expect(res.status()).toBe(201);
    const id = (await res.json()).model.id as string;
    await expect
      .poll(async () => (await call<{ model: { status: string } }>(designer, `/api/piece-models/${id}`, 'GET')).model.status, {
        timeout: 60_000,
      })
      .toBe('ready');

    // The same room with the chairs' forms only: the figures to compare with.
    const plain = await openClient(await diningLink(designer));
    await plain.page.waitForTimeout(1000);
    const formTriangles = await num(plain.view, 'triangles');
    expect(plain.fetched.filter((p) => /GLTFLoader/.test(p))).toEqual([]);
    expect(plain.fetched.filter((p) => p.endsWith('.glb'))).toEqual([]);
    await plain.context.close();

    const withModels = await openClient(await diningLink(designer, id));
    const { page, view, fetched } = withModels;
    // The chairs of the model are 72 triangles each (six boxes), far fewer than the drawn form's.
    await expect.poll(() => num(view, 'triangles'), { timeout: 30_000 }).toBeLessThan(formTriangles);
    const models = fetched.filter((p) => p.endsWith('.glb'));
    expect(models).toHaveLength(1);
    expect(models[0]).toMatch(/^\/api\/p\/[^/]+\/files\/[0-9a-f]{64}\.glb$/);
    expect(fetched.some((p) => /GLTFLoader/.test(p))).toBe(true);
    expect(await num(view, 'draw-calls')).toBeLessThanOrEqual(MAX_DRAW_CALLS_WITH_MODELS);
    await page.waitForTimeout(500);
    await page.screenshot({ path: join(shots, 'dining-room-with-model.png') });
    await withModels.context.close();
  });
});
