// Deleting a room from the project page: a confirmation naming its options, and the server's own
// words when it refuses.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchBrowser } from './lib/browser';
import { newPage, signUpThroughForm } from './lib/session';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(() => browser?.close());

describe('deleting a room', () => {
  it('names the options that go with it, deletes on confirmation, and shows a refusal as the server words it', async () => {
    const { context, page } = await newPage(browser);
    await signUpThroughForm(page, 'Delete Studio');
    const projectId = await page.evaluate(async () => {
      const post = async (url: string, body: unknown) =>
        (
          await fetch(url, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) })
        ).json();
      const { project } = await post('/api/projects', { name: 'Two rooms', newClient: { name: 'Delete client' } });
      const outline = [
        [0, 0],
        [3000, 0],
        [3000, 3000],
        [0, 3000],
      ];
      const { room } = await post(`/api/projects/${project.id}/rooms`, { name: 'Box room', shell: { outline } });
      await post(`/api/rooms/${room.id}/options`, {});
      await post(`/api/projects/${project.id}/rooms`, { name: 'Landing', shell: { outline } });
      return project.id as string;
    });
    await page.goto(`/projects/${projectId}`);

    // A refusal from the server is shown in its own words, and the room stays.
    const refusal = 'A presentation still shows this room. Withdraw it first.';
    await page.route('**/api/rooms/*', (route) =>
      route.request().method() === 'DELETE'
        ? route.fulfill({
            status: 409,
            contentType: 'application/json',
            body: JSON.stringify({ error: { code: 'presented', message: refusal } }),
          })
        : route.continue(),
    );
    await page.getByRole('button', { name: 'Delete Landing' }).click();
    await page.getByRole('dialog').getByText('its one option').waitFor();
    await page.getByRole('dialog').getByRole('button', { name: 'Delete room' }).click();
    await page.getByRole('dialog').getByText(refusal).waitFor();
    await page.getByRole('dialog').getByRole('button', { name: 'Keep it' }).click();
    await page.unroute('**/api/rooms/*');

    await page.getByRole('button', { name: 'Delete Box room' }).click();
    const dialog = page.getByRole('dialog', { name: 'Delete Box room?' });
    await dialog.getByText('Option A, Option B').waitFor();
    expect(await dialog.textContent()).toContain('all 2 options');
    await dialog.getByRole('button', { name: 'Delete room' }).click();
    await dialog.waitFor({ state: 'detached' });
    await expect.poll(() => page.getByRole('link', { name: /Box room/ }).count()).toBe(0);
    expect(await page.getByRole('link', { name: /Landing/ }).count()).toBe(1);
    await context.close();
  }, 120_000);
});
