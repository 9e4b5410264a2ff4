// At 1280 × 800, with the plan and the 3D side by side, the plan fills its panel: the holding area
// moves below the room, so the room takes the panel's width, and both stay in view.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdirSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser } from './lib/browser';
import { newPage, signUpThroughForm } from './lib/session';

const shots = join(resolve(import.meta.dirname, '../..'), '.test-output', 'plan-fill');

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
  mkdirSync(shots, { recursive: true });
});
afterAll(() => browser?.close());

async function union(page: Page, selector: string) {
  return page.$$eval(selector, (els) => {
    const rects = els.map((e) => e.getBoundingClientRect());
    const left = Math.min(...rects.map((r) => r.left));
    const right = Math.max(...rects.map((r) => r.right));
    const top = Math.min(...rects.map((r) => r.top));
    const bottom = Math.max(...rects.map((r) => r.bottom));
    return { left, right, top, bottom, width: right - left, height: bottom - top };
  });
}

describe('the plan at 1280 × 800', () => {
  it('fills its panel beside the 3D view, with the holding area in view below the room', async () => {
    const { context, page } = await newPage(browser);
    await signUpThroughForm(page, 'Wide Plan Studio');
    const url = await page.evaluate(async () => {
      const call = async (path: string, method: string, body: object) =>
        (await fetch(path, { method, headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) })).json();
      const { project } = await call('/api/projects', 'POST', { name: 'Plan flat', newClient: { name: 'P' } });
      const made = await call(`/api/projects/${project.id}/rooms`, 'POST', {
        name: 'Lounge',
        shell: {
          outline: [
            [0, 0],
            [4200, 0],
            [4200, 3600],
            [0, 3600],
          ],
          openings: [],
        },
      });
      return `/projects/${project.id}/rooms/${made.room.id}`;
    });
    await page.goto(url);
    await page.getByRole('button', { name: /Furnish/ }).click();
    await page.getByRole('button', { name: 'Both' }).click();
    const plan = (await page.getByTestId('plan').boundingBox())!;
    await expect
      .poll(async () => (await union(page, '[data-testid^=wall-]')).width / plan.width, { timeout: 5000 })
      .toBeGreaterThan(0.7);
    const holding = (await page.locator('g[aria-label="Holding area"]').boundingBox())!;
    expect(holding.y).toBeGreaterThan((await union(page, '[data-testid^=wall-]')).bottom);
    expect(holding.y + holding.height).toBeLessThanOrEqual(plan.y + plan.height);
    await page.screenshot({ path: join(shots, 'plan-1280.png') });
    await context.close();
  });
});
