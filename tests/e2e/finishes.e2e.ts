// Browser test of the finish library: uploading a wood and a tile photo, setting their real sizes,
// adding a paint, and a viewer who can only read.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdirSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser } from './lib/browser';
import { inviteAndAccept, newPage, signUpThroughForm } from './lib/session';
import { greyStoneTile, oakBoards, rawToJpeg } from '../../server/services/images/generate';

const SHOTS = resolve(import.meta.dirname, '../../.test-output/screenshots');

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
  mkdirSync(SHOTS, { recursive: true });
});
afterAll(() => browser?.close());

async function setSize(page: Page, rowName: string, category: string, widthCm: string, heightCm: string) {
  await page
    .getByRole('listitem', { name: `Upload of ${rowName}` })
    .getByRole('link', { name: 'Set size and crop' })
    .click();
  await page.getByRole('heading', { name: 'Crop' }).waitFor();
  // Each detail saves on its own: the category when picked, a size on Enter or on leaving the field.
  const patched = () => page.waitForResponse((r) => r.request().method() === 'PATCH' && r.url().includes('/api/finishes/'));
  let saved = patched();
  await page.getByLabel('Category').selectOption({ label: category });
  expect((await saved).status()).toBe(200);
  saved = patched();
  await page.getByLabel('Real width').fill(widthCm);
  await page.getByLabel('Real width').press('Enter');
  expect((await saved).status()).toBe(200);
  saved = patched();
  await page.getByLabel('Real height').fill(heightCm);
  await page.getByRole('heading', { name: 'Details' }).click();
  expect((await saved).status()).toBe(200);
  await page.getByText('All changes saved').waitFor();
}

describe('the finish library', () => {
  it('uploads a wood and a tile photo, sets their real sizes, adds a paint; a viewer only reads', async () => {
    const { context, page } = await newPage(browser);
    await signUpThroughForm(page, 'Fennel Interiors');
    await page.getByRole('link', { name: 'Finish library' }).click();
    await page.getByRole('heading', { name: 'Finish library' }).waitFor();
    await page.getByText('No finishes yet.').waitFor();

    const [wood, tile] = await Promise.all([rawToJpeg(oakBoards(768, 1024)), rawToJpeg(greyStoneTile(900))]);
    await page.getByLabel('Choose photos').setInputFiles([
      { name: 'oak-boards.jpg', mimeType: 'image/jpeg', buffer: wood },
      { name: 'stone-tile.jpg', mimeType: 'image/jpeg', buffer: tile },
      { name: 'notes.jpg', mimeType: 'image/jpeg', buffer: Buffer.from('not a photo at all') },
    ]);
    for (const name of ['oak-boards.jpg', 'stone-tile.jpg']) {
      await page
        .getByRole('listitem', { name: `Upload of ${name}` })
        .getByText('Ready')
        .waitFor({ timeout: 30_000 });
    }
    const refused = page.getByRole('listitem', { name: 'Upload of notes.jpg' });
    await refused.getByText('Failed').waitFor();
    expect(await refused.getByText('is not a JPEG, PNG or WebP photo').isVisible()).toBe(true);
    await page.screenshot({ path: join(SHOTS, 'finishes-uploads.png'), fullPage: true });

    await setSize(page, 'oak-boards.jpg', 'Wood', '72', '96');
    // Type a crop and apply it: the photo is processed again and the preview comes back.
    await page.getByLabel('Height %').fill('50');
    await page.getByLabel('Height %').press('Enter');
    await Promise.all([
      page.waitForResponse((r) => r.request().method() === 'PATCH' && r.url().includes('/api/finishes/')),
      page.getByRole('button', { name: 'Apply crop' }).click(),
    ]);
    await page.getByText('Processing', { exact: true }).waitFor({ state: 'hidden', timeout: 30_000 });
    await page.getByRole('img', { name: 'Oak boards repeated three by three' }).waitFor();
    await expect
      .poll(() =>
        page
          .getByRole('img', { name: 'Oak boards repeated three by three' })
          .evaluate((el) => (el as HTMLImageElement).naturalWidth),
      )
      .toBeGreaterThan(0);
    await page.screenshot({ path: join(SHOTS, 'finish-detail.png'), fullPage: true });
    await page.getByRole('link', { name: 'Finish library' }).first().click();

    await setSize(page, 'stone-tile.jpg', 'Tile', '60', '60');
    await page.getByRole('link', { name: 'Finish library' }).first().click();

    await page.getByRole('button', { name: 'Add paint' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByLabel('Name').fill('Sage hall');
    await dialog.getByLabel('Hex').fill('#A3AD94');
    await dialog.getByLabel('Sheen').selectOption('eggshell');
    await dialog.getByRole('button', { name: 'Add paint' }).click();

    const cards = page.getByRole('list', { name: 'Finishes' });
    await cards.getByRole('link', { name: 'Sage hall' }).getByText('Paint · Eggshell · #a3ad94').waitFor();
    await cards.getByRole('link', { name: 'Oak boards' }).getByText('Wood · 72 × 96 cm').waitFor();
    await cards.getByRole('link', { name: 'Stone tile' }).getByText('Tile · 60 × 60 cm').waitFor();
    // Every photo card shows its processed swatch.
    for (const name of ['Oak boards', 'Stone tile']) {
      const img = cards.getByRole('img', { name: `Swatch of ${name}` });
      await expect.poll(() => img.evaluate((el) => (el as HTMLImageElement).naturalWidth)).toBe(256);
    }
    await page.getByRole('searchbox', { name: 'Search finishes' }).fill('stone');
    await cards.getByRole('link', { name: 'Stone tile' }).waitFor();
    await expect.poll(() => cards.getByRole('listitem').count()).toBe(1);
    await page.getByRole('searchbox', { name: 'Search finishes' }).fill('');
    await page.getByLabel('Category').selectOption({ label: 'Paints' });
    await expect.poll(() => cards.getByRole('listitem').count()).toBe(1);
    await page.getByLabel('Category').selectOption({ label: 'All finishes' });
    await expect.poll(() => cards.getByRole('listitem').count()).toBe(3);
    await page.getByRole('button', { name: 'Clear list' }).click();
    await page.screenshot({ path: join(SHOTS, 'finishes-library.png'), fullPage: true });

    const viewer = await inviteAndAccept(browser, page, 'viewer', 'Vera Viewer');
    await viewer.page.goto('/finishes');
    await viewer.page.getByRole('link', { name: 'Oak boards' }).waitFor();
    expect(await viewer.page.getByRole('button', { name: 'Choose photos' }).count()).toBe(0);
    expect(await viewer.page.getByLabel('Choose photos').count()).toBe(0);
    expect(await viewer.page.getByRole('button', { name: 'Add paint' }).count()).toBe(0);
    await viewer.page.getByRole('link', { name: 'Oak boards' }).click();
    await viewer.page.getByRole('heading', { name: 'Repeat preview' }).waitFor();
    expect(await viewer.page.getByRole('button', { name: 'Delete' }).count()).toBe(0);
    expect(await viewer.page.getByLabel('Name').isDisabled()).toBe(true);
    await viewer.context.close();
    await context.close();
  });
});
