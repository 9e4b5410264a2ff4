// Browser tests of a piece wearing a model in the room editor, by pointer and keyboard as a designer
// works: the form drawn while the model cannot load, then the model in the 3D preview; "Fit into the
// box" keeps the piece's box and "Use the model's size" takes the model's (read from the panel's
// fields); the model's material named "main" wearing the piece's main finish (read from the view's
// data-models); the one-click unit fix on a model authored in centimetres, its sizes grouped by
// thousands; the Check step's word on heavy models; and Delete refused while a live project wears it.
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { mkdirSync } from 'node:fs';
import { resolve } from 'node:path';
import type { Browser, BrowserContext, Locator, Page } from 'playwright-core';
import type { Document } from '@gltf-transform/core';
import { centimetreSofaDocument, chairDocument, toGlb } from '../../server/services/gltf/test-models';
import { formModelDocument } from '../../server/services/gltf/form-model';
import { pieceSchema } from '../../shared/schemas/option';
import { launchBrowser } from './lib/browser';
import { newPage, signUpThroughForm } from './lib/session';

const SHOTS = resolve(import.meta.dirname, '../../.test-output/piece-model-wear');
const MODEL_READY_MS = 60_000;

let browser: Browser;
let context: BrowserContext;
let page: Page;
beforeAll(async () => {
  browser = await launchBrowser();
  mkdirSync(SHOTS, { recursive: true });
  ({ context, page } = await newPage(browser));
  await signUpThroughForm(page, 'Wear Studio');
  await page.evaluate(() => localStorage.setItem('parlour:length-unit', 'mm'));
});
afterAll(async () => {
  await context?.close();
  await browser?.close();
});

async function call<T>(path: string, method: string, body?: object): Promise<T> {
  const res = await page.request.fetch(path, { method, data: body, headers: { origin: inject('baseUrl') } });
  if (!res.ok()) throw new Error(`${method} ${path}: ${res.status()} ${await res.text()}`);
  return (res.status() === 204 ? null : await res.json()) as T;
}

interface ModelAnswer {
  id: string;
  status: string;
  triangles: number | null;
  materials: number | null;
}

/** Uploads a model made in the test and waits until it is ready. */
async function uploadModel(doc: Document, fileName: string, kind?: string): Promise<ModelAnswer> {
  const res = await page.request.post('/api/piece-models', {
    headers: { origin: inject('baseUrl') },
    multipart: {
      model: { name: fileName, mimeType: 'model/gltf-binary', buffer: await toGlb(doc) },
      ...(kind ? { kind } : {}),
    },
  });
  expect(res.status()).toBe(201);
  const id = (await res.json()).model.id as string;
  let model: ModelAnswer | null = null;
  await expect
    .poll(
      async () => {
        model = (await call<{ model: ModelAnswer }>(`/api/piece-models/${id}`, 'GET')).model;
        return model.status;
      },
      { timeout: MODEL_READY_MS },
    )
    .toBe('ready');
  return model!;
}

/** A project with one square room holding `pieces`; answers the editor's address. */
async function roomWith(projectName: string, roomName: string, pieces: object[]): Promise<{ url: string; projectId: string }> {
  const { project } = await call<{ project: { id: string } }>('/api/projects', 'POST', {
    name: projectName,
    newClient: { name: `${projectName} client` },
  });
  const made = await call<{ room: { id: string }; options: { id: string; version: number }[] }>(
    `/api/projects/${project.id}/rooms`,
    'POST',
    {
      name: roomName,
      shell: {
        outline: [
          [0, 0],
          [4200, 0],
          [4200, 3600],
          [0, 3600],
        ],
        openings: [{ id: 'door', type: 'door', wall: 0, offset: 400, width: 820, height: 2040, hinge: 'start', swing: 'in' }],
      },
    },
  );
  const option = made.options[0];
  await call(`/api/options/${option.id}`, 'PUT', { doc: { pieces }, version: option.version });
  return { url: `/projects/${project.id}/rooms/${made.room.id}`, projectId: project.id };
}

const piece = (id: string, name: string, extra: object) => ({ id, name, status: 'new', x: 2100, y: 1800, ...extra });

const view = () => page.locator('[data-testid=room-view]');
const num = async (v: Locator, name: string) => Number(await v.getAttribute(`data-${name}`));
const drawnModels = async (): Promise<Record<string, { main?: string; accent?: string }>> =>
  JSON.parse((await view().getAttribute('data-models')) ?? '{}');
const field = (label: string) => page.getByLabel(label, { exact: true });

/** Runs `body` with every model file refused, as when the network drops it. */
async function whileNoModelFiles<T>(body: () => Promise<T>): Promise<T> {
  await page.route('**/*.glb', (route) => route.abort());
  try {
    return await body();
  } finally {
    await page.unroute('**/*.glb');
  }
}

async function openFurnish(url: string, pieceId: string) {
  await page.goto(url);
  await page.getByRole('button', { name: /Furnish/ }).click();
  await page.getByTestId(`piece-${pieceId}`).click();
  await field('Width').waitFor();
  await expect.poll(() => num(view(), 'frames'), { timeout: 30_000 }).toBeGreaterThan(0);
}

describe('a piece wearing a model in the room editor', () => {
  it(
    'draws the form until the model arrives, then fits it into the box or gives the box its size',
    { timeout: 180_000 },
    async () => {
      const chair = await uploadModel(await chairDocument(), 'oak-chair.glb', 'dining-chair');
      const { url } = await roomWith('Fit flat', 'Dining room', [
        piece('seat', 'Armchair', { width: 850, depth: 850, height: 800, kind: 'armchair' }),
      ]);

      // The model's file cannot be had: the piece stays its drawn form.
      const formTriangles = await whileNoModelFiles(async () => {
        await openFurnish(url, 'seat');
        // The figures of the settled view: the form and the selected piece's highlight.
        await page.waitForTimeout(1000);
        const triangles = await num(view(), 'triangles');
        await page.getByRole('button', { name: 'Choose a model' }).click();
        await page
          .getByRole('list', { name: 'Models to wear' })
          .getByRole('button', { name: /Oak chair/ })
          .click();
        await page.getByRole('button', { name: 'Fit into the box' }).waitFor();
        await page.waitForTimeout(1000);
        expect(await drawnModels()).toEqual({});
        expect(await num(view(), 'triangles')).toBe(triangles);
        await page.locator('[data-testid=save-state][data-state=saved]').waitFor({ timeout: 15_000 });
        return triangles;
      });

      // With the file reachable the preview draws the model (72 triangles) in place of the form.
      await openFurnish(url, 'seat');
      await expect.poll(async () => Object.keys(await drawnModels()), { timeout: 30_000 }).toEqual(['seat']);
      await expect.poll(() => num(view(), 'triangles')).toBeLessThan(formTriangles);
      expect(await page.getByRole('status').filter({ hasText: 'The model measures' }).innerText()).toContain(
        'The model measures 450 mm × 500 mm × 900 mm',
      );

      // Fit into the box: the box keeps its size, the question goes away.
      await page.getByRole('button', { name: 'Fit into the box' }).click();
      await expect.poll(() => page.getByRole('button', { name: 'Fit into the box' }).count()).toBe(0);
      expect(await field('Width').inputValue()).toBe('850 mm');
      expect(await field('Depth').inputValue()).toBe('850 mm');
      expect(await field('Height').inputValue()).toBe('800 mm');
      expect(Object.keys(await drawnModels())).toEqual(['seat']);
      await page.screenshot({ path: resolve(SHOTS, 'fitted-into-the-box.png') });

      // Undo asks again; Use the model's size gives the box the model's measured size.
      await page.getByRole('button', { name: 'Undo' }).click();
      await page.getByRole('button', { name: "Use the model's size" }).click();
      await expect.poll(() => field('Width').inputValue()).toBe('450 mm');
      expect(await field('Depth').inputValue()).toBe('500 mm');
      expect(await field('Height').inputValue()).toBe('900 mm');
      expect(await page.getByRole('button', { name: "Use the model's size" }).count()).toBe(0);

      // A width typed then Enter makes the box differ again: the question comes back.
      await field('Width').click();
      await field('Width').fill('600');
      await field('Width').press('Enter');
      await expect.poll(() => field('Width').inputValue()).toBe('600 mm');
      await page.getByRole('button', { name: "Use the model's size" }).waitFor();
      // A height typed, then a click elsewhere, commits it as well; the model stays fitted in the box.
      await field('Height').click();
      await field('Height').fill('950');
      await page.getByRole('heading', { name: 'Furnish', exact: true }).click();
      await expect.poll(() => field('Height').inputValue()).toBe('950 mm');
      expect(Object.keys(await drawnModels())).toEqual(['seat']);
      await page.locator('[data-testid=save-state][data-state=saved]').waitFor({ timeout: 15_000 });
      const saved = await page.evaluate(async (path) => {
        const roomId = path.split('/').pop();
        return (await (await fetch(`/api/rooms/${roomId}`)).json()).options[0].doc.pieces[0];
      }, url);
      expect(saved).toMatchObject({ modelId: chair.id, width: 600, depth: 500, height: 950, modelFitted: false });
    },
  );

  it(
    'dresses the model’s “main” material in the piece’s main finish when it wears the piece’s finishes',
    { timeout: 180_000 },
    async () => {
      const sofaPiece = pieceSchema.parse({
        id: 'm',
        name: 'Test sofa',
        x: 0,
        y: 0,
        width: 2000,
        depth: 880,
        height: 820,
        status: 'new',
        kind: 'sofa',
        settings: { base: 'legs', arms: 'both' },
      });
      await uploadModel(formModelDocument(sofaPiece, { main: '#a89f91', accent: '#5b4636' }), 'sofa.glb', 'sofa');
      const { finish: paint } = await call<{ finish: { id: string } }>('/api/finishes/paints', 'POST', {
        name: 'Moss velvet',
        colourHex: '#6b7f5a',
        sheen: 'matt',
      });
      expect(paint.id).toBeTruthy();
      const { url } = await roomWith('Dress flat', 'Sitting room', [
        piece('sofa', 'Sofa', { width: 2000, depth: 880, height: 820, kind: 'sofa', y: 3000, rotation: 180 }),
      ]);

      await openFurnish(url, 'sofa');
      await page.getByRole('button', { name: 'Choose a model' }).click();
      await page.getByRole('list', { name: 'Models to wear' }).getByRole('button', { name: /Sofa/ }).click();
      await expect.poll(async () => await drawnModels(), { timeout: 30_000 }).toEqual({ sofa: {} });

      // The main finish, chosen in Finishes with the piece selected.
      await page.getByRole('button', { name: /Finishes/ }).click();
      await page.getByTestId('piece-sofa').click();
      await page.getByRole('radio', { name: 'Main' }).click();
      await page.getByRole('list', { name: 'Finishes' }).getByRole('button', { name: 'Moss velvet' }).click();
      await page.getByRole('radio', { name: /Sofa/ }).getByText('Moss velvet').waitFor();
      // The model keeps its own materials until asked to wear the piece's finishes.
      await page.waitForTimeout(500);
      expect(await drawnModels()).toEqual({ sofa: {} });

      await page.getByRole('button', { name: /Furnish/ }).click();
      await page.getByTestId('piece-sofa').click();
      await page.getByLabel("Wear this piece's finishes").check();
      await expect.poll(async () => (await drawnModels()).sofa?.main, { timeout: 15_000 }).toBe('#6b7f5a');
      await page.waitForTimeout(500);
      await page.screenshot({ path: resolve(SHOTS, 'model-wears-main-finish.png') });
    },
  );

  it('offers the unit fix for a sofa authored in centimetres, its sizes grouped by thousands', { timeout: 120_000 }, async () => {
    await uploadModel(await centimetreSofaDocument(), 'cm-sofa.glb', 'sofa');
    await page.goto('/models');
    const card = page.getByRole('list', { name: 'Models' }).getByRole('link', { name: /Cm sofa/i });
    await card.getByText('210,000 × 90,000 × 85,000 mm').waitFor({ timeout: 20_000 });
    await card.click();
    await page.getByText('Read as metres this model is 210.00 × 90.00 × 85.00 m, too large for a piece.').waitFor();
    await page.getByRole('button', { name: 'Read as centimetres: 2,100 × 900 × 850 mm' }).click();
    await page.getByRole('heading', { name: /Cm sofa/i }).waitFor();
    await page.getByText('2,100 × 900 × 850 mm', { exact: true }).waitFor({ timeout: 15_000 });
    expect(await page.getByRole('button', { name: /Read as centimetres/ }).count()).toBe(0);
    await page.screenshot({ path: resolve(SHOTS, 'unit-fixed.png') });
  });

  it(
    'warns in Check when an option’s models are heavy for a client’s laptop, and says so quietly when not',
    { timeout: 180_000 },
    async () => {
      // A chair with a dense cushion: 2 × 120² triangles more than its 72, kept whole (under 30,000).
      const heavy = await uploadModel(await chairDocument({ cushionSegments: 120 }), 'dense-chair.glb');
      expect(heavy.triangles).toBeGreaterThan(20_000);
      const copies = Math.ceil(300_000 / heavy.triangles!) + 1;
      const block = (i: number) =>
        piece(`block-${i}`, `Block ${i + 1}`, {
          width: 400,
          depth: 400,
          height: 400,
          x: 400 + (i % 6) * 600,
          y: 600 + Math.floor(i / 6) * 900,
          modelId: heavy.id,
        });
      const light = await roomWith('Light flat', 'Hall', [block(0), block(1)]);
      await page.goto(light.url);
      await page.getByRole('button', { name: /Check/ }).click();
      const within = page.locator('[data-testid=model-budget][data-state=within]');
      await within.waitFor({ timeout: 15_000 });
      expect(await within.innerText()).toMatch(
        /^The 2 models in this option stay light enough for a client’s laptop: about [\d,]+ triangles for the whole room\.$/,
      );
      const estimate = await num(within, 'triangles');
      expect(estimate).toBeGreaterThan(2 * heavy.triangles!);

      const crowded = await roomWith(
        'Heavy flat',
        'Store room',
        Array.from({ length: copies }, (_, i) => block(i)),
      );
      await page.goto(crowded.url);
      await page.getByRole('button', { name: /Check/ }).click();
      const notice = page.locator('[data-testid=model-budget][data-state=heavy]');
      await notice.waitFor({ timeout: 15_000 });
      const text = await notice.innerText();
      expect(text).toMatch(
        /^The models in this option are heavy for a client’s laptop: about [\d,]+ triangles \(keep under 300,000\)\./,
      );
      expect(await num(notice, 'triangles')).toBeGreaterThan(300_000);
      await page.screenshot({ path: resolve(SHOTS, 'check-heavy-models.png') });
    },
  );

  it(
    'refuses to delete a model a live project wears, naming where, and deletes it once it is taken off',
    { timeout: 120_000 },
    async () => {
      const lamp = await uploadModel(await chairDocument(), 'hall-stool.glb');
      const { url } = await roomWith('Orchard lodge', 'Porch', [
        piece('stool', 'Stool', { width: 450, depth: 500, height: 900, modelId: lamp.id }),
      ]);
      await page.goto(`/models/${lamp.id}`);
      await page.getByRole('heading', { name: 'Hall stool' }).waitFor();
      await page.getByRole('button', { name: 'Delete', exact: true }).click();
      await page.getByRole('button', { name: 'Delete Hall stool' }).click();
      const wearers = page.getByRole('list', { name: 'Options wearing this model' });
      await wearers.waitFor();
      expect((await wearers.getByRole('listitem').allInnerTexts()).map((t) => t.trim())).toEqual([
        'Orchard lodge · Porch · Option A',
      ]);
      await page.getByText('Pieces in these options wear this model. Take it off them first.').waitFor();
      await page.screenshot({ path: resolve(SHOTS, 'delete-refused.png') });
      await page.getByRole('button', { name: 'Cancel' }).click();

      // Taken off the piece in Furnish, the model can go.
      await openFurnish(url, 'stool');
      await page.getByRole('button', { name: 'No model' }).click();
      await page.locator('[data-testid=save-state][data-state=saved]').waitFor({ timeout: 15_000 });
      await page.goto(`/models/${lamp.id}`);
      await page.getByRole('button', { name: 'Delete', exact: true }).click();
      await page.getByRole('button', { name: 'Delete Hall stool' }).click();
      await page.waitForURL(/\/models$/);
      expect(await page.getByRole('link', { name: /Hall stool/ }).count()).toBe(0);
    },
  );
});
