// Browser test of finishes in the room editor: a wood photo finish on the floor and a paint on one
// wall of one option, with the texture loaded in the 3D preview.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdirSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type { Browser } from 'playwright-core';
import { launchBrowser } from './lib/browser';
import { newPage, signUpThroughForm } from './lib/session';
import { oakBoards, rawToJpeg } from '../../server/services/images/generate';

const SHOTS = resolve(import.meta.dirname, '../../.test-output/screenshots');

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
  mkdirSync(SHOTS, { recursive: true });
});
afterAll(() => browser?.close());

describe('finishes in the room editor', () => {
  it('puts a wood photo on the floor and a paint on one wall of one option; 3D loads the texture', async () => {
    const { context, page } = await newPage(browser);
    await signUpThroughForm(page, 'Texture Studio');
    const photo = (await rawToJpeg(oakBoards(512, 512))).toString('base64');
    const ids = await page.evaluate(async (b64) => {
      const json = (method: string, body: unknown) => ({
        method,
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify(body),
      });
      const project = (
        await (await fetch('/api/projects', json('POST', { name: 'Finish flat', newClient: { name: 'F' } }))).json()
      ).project;
      const room = await (
        await fetch(
          `/api/projects/${project.id}/rooms`,
          json('POST', {
            name: 'Study',
            shell: {
              outline: [
                [0, 0],
                [3600, 0],
                [3600, 3000],
                [0, 3000],
              ],
            },
          }),
        )
      ).json();
      const paint = (
        await (
          await fetch('/api/finishes/paints', json('POST', { name: 'Chalk blue', colourHex: '#8fa9c2', sheen: 'matt' }))
        ).json()
      ).finish;
      const form = new FormData();
      const bytes = Uint8Array.from(atob(b64), (c) => c.charCodeAt(0));
      form.append('photos', new Blob([bytes], { type: 'image/jpeg' }), 'oak.jpg');
      form.append('category', 'wood');
      form.append('repeatWidthMm', '720');
      form.append('repeatHeightMm', '720');
      const uploaded = await (await fetch('/api/finishes/photos', { method: 'POST', body: form })).json();
      return {
        url: `/projects/${project.id}/rooms/${room.room.id}`,
        optionId: room.options[0].id as string,
        roomId: room.room.id as string,
        paintId: paint.id as string,
        photo: uploaded,
      };
    }, photo);
    const photoId = ids.photo.finishes?.[0]?.id as string;
    expect(photoId).toBeTruthy();
    // Wait until the photo is processed.
    await expect
      .poll(async () => page.evaluate(async (id) => (await (await fetch(`/api/finishes/${id}`)).json()).finish.status, photoId), {
        timeout: 30000,
      })
      .toBe('ready');

    await page.goto(ids.url);
    await page.getByRole('button', { name: /Finishes/ }).click();
    await page.getByRole('radio', { name: /Floor/ }).click();
    await page.getByRole('list', { name: 'Finishes' }).getByRole('button', { name: /oak/i }).click();
    await page.getByRole('radio', { name: /Floor/ }).getByText(/oak/i).waitFor();
    await page.getByTestId('wall-2').click({ force: true });
    await page.getByRole('radio', { name: /Wall 3/ }).waitFor();
    await page.getByRole('list', { name: 'Finishes' }).getByRole('button', { name: 'Chalk blue' }).click();
    await page
      .getByRole('radio', { name: /Wall 3/ })
      .getByText('Chalk blue')
      .waitFor();

    const view = page.locator('[data-testid=room-view]');
    await expect.poll(async () => Number(await view.getAttribute('data-textures')), { timeout: 15000 }).toBeGreaterThan(0);
    await page.locator('[data-testid=save-state][data-state=saved]').waitFor({ timeout: 15000 });
    await page.waitForTimeout(500);
    await page.screenshot({ path: join(SHOTS, 'editor-finishes.png') });

    const saved = await page.evaluate(
      async (roomId) => (await (await fetch(`/api/rooms/${roomId}`)).json()).options[0].doc.finishes,
      ids.roomId,
    );
    expect(saved).toEqual({ floor: photoId, ceiling: null, walls: null, wallOverrides: { '2': ids.paintId } });

    // After a reload, the feature wall is listed up front, before any wall is clicked; one click picks it.
    await page.reload();
    await page.getByRole('heading', { name: 'Finishes', exact: true }).waitFor();
    const featureWalls = page.getByRole('region', { name: 'Feature walls' });
    await featureWalls.getByRole('button', { name: /Wall 3.*Chalk blue/ }).click();
    await page.getByRole('radio', { name: /Wall 3 \(feature wall\)/, checked: true }).waitFor();
    expect(await featureWalls.getByRole('button').count()).toBe(1);
    await page.screenshot({ path: join(SHOTS, 'editor-feature-walls.png') });
    await context.close();
  });
});
