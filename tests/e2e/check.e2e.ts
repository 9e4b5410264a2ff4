// Browser test of the room editor's Check step: the fit check says in plain words what does not
// fit, and updates live as a piece moves.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchBrowser } from './lib/browser';
import { newPage, signUpThroughForm } from './lib/session';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(() => browser?.close());

describe('the Check step', () => {
  it('says in plain words what does not fit, and updates live as a piece moves', async () => {
    const { context, page } = await newPage(browser);
    await signUpThroughForm(page, 'Check Studio');
    const url = await page.evaluate(async () => {
      const json = (method: string, body: unknown) => ({
        method,
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify(body),
      });
      const project = (
        await (await fetch('/api/projects', json('POST', { name: 'Check flat', newClient: { name: 'C' } }))).json()
      ).project;
      const created = await (
        await fetch(
          `/api/projects/${project.id}/rooms`,
          json('POST', {
            name: 'Bedroom',
            shell: {
              outline: [
                [0, 0],
                [4000, 0],
                [4000, 3500],
                [0, 3500],
              ],
              // Door in the top wall, 300–1120 mm from the left corner, opening into the room.
              openings: [{ id: 'd1', type: 'door', wall: 0, offset: 300, width: 820, height: 2040, hinge: 'start', swing: 'in' }],
            },
          }),
        )
      ).json();
      const option = created.options[0];
      // A wardrobe right inside the door, in the leaf's sweep (x 300–1120, y 0–820).
      await fetch(
        `/api/options/${option.id}`,
        json('PUT', {
          version: option.version,
          doc: {
            pieces: [
              {
                id: 'wardrobe',
                name: 'Wardrobe',
                x: 800,
                y: 700,
                width: 1000,
                depth: 600,
                height: 2000,
                rotation: 0,
                status: 'existing',
              },
            ],
          },
        }),
      );
      return `/projects/${project.id}/rooms/${created.room.id}`;
    });
    await page.goto(url);
    await page.getByRole('button', { name: /Check/ }).click();
    const findings = page.getByRole('list', { name: 'Findings' });
    await findings.getByText('The wardrobe stands in the door’s swing').waitFor();
    expect(await page.getByText(/Fix tall pieces \(Wardrobe\) to the wall/).isVisible()).toBe(true);
    expect(await page.getByText(/Clearances here are guidance/).isVisible()).toBe(true);

    // Move it 2 m to the right with the keyboard (Shift + arrow = 10 cm): the finding goes.
    await page.locator('[data-testid=piece-wardrobe]').click();
    for (let i = 0; i < 22; i += 1) await page.keyboard.press('Shift+ArrowRight');
    await expect.poll(() => page.getByText('The wardrobe stands in the door’s swing').count(), { timeout: 10000 }).toBe(0);
    // One nudge run is one undo step: undo brings the finding back.
    await page.keyboard.press('Control+z');
    await findings.getByText('The wardrobe stands in the door’s swing').waitFor();
    await context.close();
  });
});
