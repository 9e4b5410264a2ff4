// Rugs under the pieces standing on them: on the plan the coffee table over a rug (the rug added
// after it) is drawn on top and takes the click, the rug round it takes its own; in the client's
// 3D view the rug lies cleanly on the floor (a screenshot to look at).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdirSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type { Browser } from 'playwright-core';
import { launchBrowser } from './lib/browser';
import { newPage, signUpThroughForm } from './lib/session';

const shots = join(resolve(import.meta.dirname, '../..'), '.test-output', 'rugs');

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
  mkdirSync(shots, { recursive: true });
});
afterAll(() => browser?.close());

describe('rugs', () => {
  it('on the plan, a click on the coffee table over the rug selects the table; in 3D the rug lies on the floor', async () => {
    const { context, page } = await newPage(browser);
    await signUpThroughForm(page, 'Loom Street Studio');
    const { editor, link } = await page.evaluate(async () => {
      const call = async (url: string, method: string, body: unknown) =>
        (await fetch(url, { method, headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) })).json();
      const { project } = await call('/api/projects', 'POST', { name: 'Loom flat', newClient: { name: 'Loom client' } });
      const made = await call(`/api/projects/${project.id}/rooms`, 'POST', {
        name: 'Sitting room',
        shell: {
          outline: [
            [0, 0],
            [4500, 0],
            [4500, 3600],
            [0, 3600],
          ],
          openings: [{ id: 'door', type: 'door', wall: 0, offset: 400, width: 820, height: 2040, hinge: 'start', swing: 'in' }],
        },
      });
      const piece = (id: string, name: string, kind: string, w: number, d: number, h: number, x: number, y: number) => ({
        id,
        name,
        kind,
        x,
        y,
        width: w,
        depth: d,
        height: h,
        status: 'new',
      });
      // The rug comes last, as when it is added after the table: it used to be drawn over it.
      await call(`/api/options/${made.options[0].id}`, 'PUT', {
        doc: {
          pieces: [
            piece('sofa', 'Sofa', 'sofa', 2100, 900, 850, 2250, 3100),
            piece('coffee-table', 'Coffee table', 'coffee-table', 1100, 600, 420, 2250, 1900),
            piece('rug', 'Rug', 'rug', 2400, 1700, 10, 2250, 1900),
          ],
        },
        version: made.options[0].version,
      });
      const { presentation } = await call(`/api/projects/${project.id}/presentations`, 'POST', {
        rooms: [{ roomId: made.room.id, optionIds: [made.options[0].id] }],
        message: 'The rug under the table.',
      });
      return { editor: `/projects/${project.id}/rooms/${made.room.id}`, link: new URL(presentation.link).pathname };
    });

    await page.goto(editor);
    await page.getByRole('button', { name: /Furnish/ }).click();
    const table = page.getByTestId('piece-coffee-table');
    const rug = page.getByTestId('piece-rug');
    await table.waitFor();
    // The rug is drawn first, below the table.
    const order = await page
      .getByTestId('plan')
      .evaluate((svg) =>
        [...svg.querySelectorAll('[data-testid=piece-rug], [data-testid=piece-coffee-table]')].map(
          (g) => g.id || g.getAttribute('data-testid'),
        ),
      );
    expect(order).toEqual(['piece-rug', 'piece-coffee-table']);
    const t = (await table.boundingBox())!;
    await page.mouse.click(t.x + t.width / 2, t.y + t.height / 2);
    await expect.poll(() => page.getByLabel('Name', { exact: true }).inputValue()).toBe('Coffee table');
    // The rug round the table still takes a click of its own.
    const r = (await rug.boundingBox())!;
    await page.mouse.click(r.x + r.width / 2, r.y + r.height * 0.1);
    await expect.poll(() => page.getByLabel('Name', { exact: true }).inputValue()).toBe('Rug');
    await page.screenshot({ path: join(shots, 'plan.png') });

    // The client's view: the rug lies on the floor, the table on it; a tap on the table opens its details.
    const client = await newPage(browser);
    await client.page.setViewportSize({ width: 1280, height: 800 });
    await client.page.goto(`${link}#room-1`);
    const view = client.page.locator('[data-testid=room-view]').first();
    await expect.poll(async () => Number(await view.getAttribute('data-frames')), { timeout: 30_000 }).toBeGreaterThan(0);
    await client.page.getByRole('button', { name: 'Come closer' }).click();
    await client.page.waitForTimeout(1500);
    await client.page.screenshot({ path: join(shots, 'overview.png') });
    await client.context.close();
    await context.close();
  }, 120_000);
});
