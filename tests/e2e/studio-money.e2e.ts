// The studio's currency and locale, set on the Studio page the way fields are left (Enter, a click
// elsewhere), then read on every price: the finish library, the schedule and the client's page.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdirSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type { Browser } from 'playwright-core';
import { launchBrowser } from './lib/browser';
import { newPage, signUpThroughForm } from './lib/session';

const shots = join(resolve(import.meta.dirname, '../..'), '.test-output', 'studio-money');

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
  mkdirSync(shots, { recursive: true });
});
afterAll(() => browser?.close());

/** Intl writes a narrow no-break space before the euro sign in German. */
const plain = (text: string) => text.replace(/[\u00a0\u202f]/g, ' ');

describe('studio currency and locale', () => {
  it('is set on the Studio page and used for every price, the client’s page included', async () => {
    const { context, page } = await newPage(browser);
    await signUpThroughForm(page, 'Kestrel Lane Studio');
    const made = await page.evaluate(async () => {
      const call = async (path: string, method: string, body: object) =>
        (await fetch(path, { method, headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) })).json();
      await call('/api/finishes/paints', 'POST', { name: 'Lichen', colourHex: '#9aa38a', price: 16.5, priceUnit: 'litre' });
      const { project } = await call('/api/projects', 'POST', { name: 'Weir cottage', newClient: { name: 'Ansel Moor' } });
      const created = await call(`/api/projects/${project.id}/rooms`, 'POST', {
        name: 'Snug',
        shell: {
          outline: [
            [0, 0],
            [3600, 0],
            [3600, 3200],
            [0, 3200],
          ],
          openings: [],
        },
      });
      const option = created.options[0];
      await call(`/api/options/${option.id}`, 'PUT', {
        version: option.version,
        doc: {
          pieces: [
            { id: 'sofa', name: 'Sofa', x: 1800, y: 2600, width: 1800, depth: 900, height: 800, status: 'new', price: 1280 },
          ],
        },
      });
      const { presentation } = await call(`/api/projects/${project.id}/presentations`, 'POST', {
        rooms: [{ roomId: created.room.id, optionIds: [option.id] }],
        showPrices: true,
      });
      return {
        projectId: project.id as string,
        roomId: created.room.id as string,
        optionId: option.id as string,
        link: presentation.link as string,
      };
    });

    await page.getByRole('link', { name: 'Studio' }).click();
    await page.getByRole('heading', { name: 'Prices' }).waitFor();
    expect(plain(await page.getByTestId('price-example').innerText())).toBe('A price reads £1,280.00.');
    await page.getByLabel('Currency').click();
    await page.keyboard.press('Control+A');
    await page.keyboard.type('eur');
    await page.keyboard.press('Enter');
    await page.getByLabel('Locale').click();
    await page.keyboard.press('Control+A');
    await page.keyboard.type('de-DE');
    await page.getByRole('heading', { name: 'Prices' }).click();
    await expect.poll(async () => plain(await page.getByTestId('price-example').innerText())).toBe('A price reads 1.280,00 €.');
    expect(await page.getByLabel('Currency').inputValue()).toBe('EUR');
    await page.screenshot({ path: join(shots, 'studio-prices.png') });

    await page.goto('/finishes');
    await expect.poll(async () => plain(await page.getByRole('link', { name: /Lichen/ }).innerText())).toContain('16,50 € / L');

    await page.goto(`/projects/${made.projectId}/rooms/${made.roomId}/options/${made.optionId}/schedule`);
    await page.getByRole('cell', { name: 'Sofa' }).first().waitFor();
    expect(plain(await page.locator('main').innerText())).toContain('1.280,00 €');
    await page.screenshot({ path: join(shots, 'schedule-euro.png'), fullPage: true });

    const client = await newPage(browser);
    await client.page.goto(made.link);
    await client.page.getByRole('button', { name: 'Start looking' }).click();
    await client.page.getByRole('button', { name: 'Sofa' }).click();
    await client.page.getByRole('heading', { name: 'Sofa' }).waitFor();
    await expect.poll(async () => plain(await client.page.locator('body').innerText())).toContain('1.280,00 €');
    await client.context.close();
    await context.close();
  }, 120_000);
});
