// Browser test of piece models: two uploads by pointer (a sound chair and a text file named .glb,
// refused on its row), the chair measured 450 × 500 × 900 mm with a thumbnail drawn in the browser,
// its page with the turning preview, then worn by a piece of another size in Furnish, "Use the model's size", and Undo.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdirSync } from 'node:fs';
import { resolve } from 'node:path';
import type { Browser } from 'playwright-core';
import { launchBrowser } from './lib/browser';
import { newPage, signUpThroughForm } from './lib/session';
import { chairDocument, toGlb } from '../../server/services/gltf/test-models';

const SHOTS = resolve(import.meta.dirname, '../../.test-output/piece-models');

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
  mkdirSync(SHOTS, { recursive: true });
});
afterAll(() => browser?.close());

describe('piece models', () => {
  it('uploads a chair and refuses a text file, then a piece takes the chair’s size and Undo gives it back', async () => {
    const { context, page } = await newPage(browser);
    await signUpThroughForm(page, 'Model Studio');
    await page.evaluate(() => localStorage.setItem('parlour:length-unit', 'mm'));
    const chair = await toGlb(await chairDocument());
    const { projectId, roomId } = await page.evaluate(async () => {
      const post = async (url: string, body: unknown) =>
        (
          await fetch(url, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) })
        ).json();
      const { project } = await post('/api/projects', { name: 'Chair flat', newClient: { name: 'Chair client' } });
      const outline = [
        [0, 0],
        [4000, 0],
        [4000, 3500],
        [0, 3500],
      ];
      const { room } = await post(`/api/projects/${project.id}/rooms`, { name: 'Dining room', shell: { outline } });
      return { projectId: project.id as string, roomId: room.id as string };
    });

    await page.getByRole('navigation', { name: 'Studio' }).getByRole('link', { name: 'Models' }).click();
    await page.getByRole('heading', { name: 'Models' }).waitFor();
    const chooser = page.waitForEvent('filechooser');
    await page.getByRole('button', { name: 'Choose models' }).click();
    await (
      await chooser
    ).setFiles([
      { name: 'dining-chair.glb', mimeType: 'model/gltf-binary', buffer: chair },
      { name: 'notes.glb', mimeType: 'model/gltf-binary', buffer: Buffer.from('Shopping list: chairs, a table, lamps.\n') },
    ]);

    const refused = page.getByRole('listitem', { name: 'Upload of notes.glb' });
    await refused.getByRole('status').filter({ hasText: 'Refused' }).waitFor({ timeout: 20000 });
    const reason = (await refused.locator('p').innerText()).trim();
    expect(reason.length).toBeGreaterThan(10);
    const sent = page.getByRole('listitem', { name: 'Upload of dining-chair.glb' });
    await sent.getByRole('status').filter({ hasText: 'Ready' }).waitFor({ timeout: 45000 });

    const card = page.getByRole('list', { name: 'Models' }).getByRole('link');
    await expect.poll(() => card.count(), { timeout: 20000 }).toBe(1);
    await card.getByText('450 × 500 × 900 mm').waitFor({ timeout: 20000 });
    // The still is drawn in this browser, sent, and the card shows it.
    await card.locator('img').waitFor({ timeout: 30000 });
    await expect
      .poll(() => card.locator('img').evaluate((img: HTMLImageElement) => img.naturalWidth), { timeout: 15000 })
      .toBeGreaterThan(0);
    await page.screenshot({ path: resolve(SHOTS, 'library.png'), fullPage: true });

    // Its page: the turning preview drawn, the details, the quarter turn in four choices.
    await card.click();
    await page.getByRole('heading', { name: 'Dining chair' }).waitFor();
    await page.getByRole('img', { name: 'Dining chair, turning slowly' }).waitFor();
    await page.getByText('Loading the model…').waitFor({ state: 'detached', timeout: 20000 });
    expect(await page.getByRole('radio').count()).toBe(4);
    expect(await page.getByLabel('Name', { exact: true }).inputValue()).toBe('Dining chair');
    await page.screenshot({ path: resolve(SHOTS, 'model-page.png') });

    await page.goto(`/projects/${projectId}/rooms/${roomId}`);
    await page.getByRole('button', { name: /Furnish/ }).click();
    await page.getByRole('button', { name: 'Add Armchair', exact: true }).first().click();
    await page.getByRole('button', { name: 'Edit Armchair' }).click();
    const width = page.getByLabel('Width', { exact: true });
    const before = await width.inputValue();
    expect(before).not.toBe('450 mm');

    await page.getByRole('button', { name: 'Choose a model' }).click();
    await page
      .getByRole('list', { name: 'Models to wear' })
      .getByRole('button', { name: /Dining chair/ })
      .click();
    await page.getByRole('button', { name: "Use the model's size" }).click();
    await expect.poll(() => width.inputValue()).toBe('450 mm');
    expect(await page.getByLabel('Depth', { exact: true }).inputValue()).toBe('500 mm');
    expect(await page.getByLabel('Height', { exact: true }).inputValue()).toBe('900 mm');
    expect(await page.getByRole('button', { name: "Use the model's size" }).count()).toBe(0);
    await page.screenshot({ path: resolve(SHOTS, 'furnish-model-size.png') });

    await page.getByRole('button', { name: 'Undo' }).click();
    await expect.poll(() => width.inputValue()).toBe(before);
    await page.getByRole('button', { name: "Use the model's size" }).waitFor();
    await page.screenshot({ path: resolve(SHOTS, 'furnish-undo.png') });
    await context.close();
  });
});
