// Browser test of rooms on a project: adding one from typed sizes, importing a plan file, the 3D
// view and take-off, and two tabs saving the same room (the conflict loses neither change).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser } from './lib/browser';
import { newPage, signUpThroughForm } from './lib/session';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(() => browser?.close());

const planText = readFileSync(resolve(import.meta.dirname, '../../assets/plans/living-room.json'), 'utf8');

async function newProject(page: Page, name: string): Promise<string> {
  return page.evaluate(async (n) => {
    const res = await fetch('/api/projects', {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ name: n, newClient: { name: 'Room client' } }),
    });
    return (await res.json()).project.id as string;
  }, name);
}

describe('rooms on a project', () => {
  it('adds a room from typed sizes, imports a plan file, and shows the room in 3D with its take-off', async () => {
    const { context, page } = await newPage(browser);
    await signUpThroughForm(page, 'Room Studio');
    const projectId = await newProject(page, 'Orchard cottage');
    await page.goto(`/projects/${projectId}`);
    await page.getByText('No rooms yet.').waitFor();

    await page.getByRole('button', { name: 'Add room' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByLabel('Room name').fill('Snug');
    await dialog.getByLabel('Width').fill('4.2m');
    await dialog.getByLabel('Length').fill('360');
    await dialog.getByLabel('Ceiling height').fill(`8' 6"`);
    await dialog.getByRole('button', { name: 'Add room' }).click();
    await page.getByRole('heading', { name: 'Snug' }).waitFor();
    // 8 ft 6 in = 2590.8 mm (1 in = 25.4 mm, NIST SP 811).
    expect(await page.getByLabel('Ceiling height').inputValue()).toBe('259.1 cm');
    await page.getByRole('button', { name: /Check/ }).click();
    // 4.2 × 3.6 m = 15.12 m².
    await page.getByRole('row', { name: /Floor area 15\.12 m²/ }).waitFor();
    const view = page.locator('[data-testid=room-view][data-draw-calls]');
    await view.waitFor({ timeout: 30000 });
    expect(Number(await view.getAttribute('data-draw-calls'))).toBeGreaterThan(5);

    await page.goto(`/projects/${projectId}`);
    await page
      .getByLabel('Plan file to import')
      .setInputFiles({ name: 'living-room.json', mimeType: 'application/json', buffer: Buffer.from(planText) });
    await page.getByRole('heading', { name: 'Living room' }).waitFor();
    await page.getByRole('button', { name: /Check/ }).click();
    await page.getByRole('row', { name: /Net wall area 35\.20 m²/ }).waitFor();
    const download = page.waitForEvent('download');
    await page.getByRole('link', { name: 'Plan file' }).click();
    const file = await download;
    expect(file.suggestedFilename()).toBe('living-room.plan.json');

    await page.goto(`/projects/${projectId}`);
    await page.getByLabel('Plan file to import').setInputFiles({
      name: 'notes.json',
      mimeType: 'application/json',
      buffer: Buffer.from(
        '{"format":"parlour-plan","version":1,"room":{"name":"x","outline":[[0,0],[1000,0]]},"option":{"name":"a"}}',
      ),
    });
    await page.getByText(/This plan file cannot be read: room\.outline/).waitFor();
    await context.close();
  });

  it('two tabs changing the same room: the second sees the conflict and loses neither change', async () => {
    const { context, page } = await newPage(browser);
    await signUpThroughForm(page, 'Conflict Studio');
    const projectId = await newProject(page, 'Two tabs');
    const roomId = await page.evaluate(async (pid) => {
      const res = await fetch(`/api/projects/${pid}/rooms`, {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({
          name: 'Hall',
          shell: {
            outline: [
              [0, 0],
              [3000, 0],
              [3000, 2000],
              [0, 2000],
            ],
          },
        }),
      });
      return (await res.json()).room.id as string;
    }, projectId);
    const url = `/projects/${projectId}/rooms/${roomId}`;
    const tabA = page;
    const tabB = await context.newPage();
    await tabA.goto(url);
    await tabB.goto(url);
    await tabA.getByLabel('Ceiling height').fill('270');
    await tabA.getByLabel('Ceiling height').press('Enter');
    await tabA.locator('[data-testid=save-state][data-state=saved]').waitFor();
    await expect.poll(() => tabA.getByTestId('save-state').textContent()).toBe('All changes saved');

    await tabB.getByLabel('Wall 1', { exact: true }).fill('320');
    await tabB.getByLabel('Wall 1', { exact: true }).press('Enter');
    // Two tabs drawing in software WebGL on a loaded machine can take seconds per save: a wait, not a speed target.
    await tabB.getByText(/Someone else saved this room’s walls and openings/).waitFor({ timeout: 30_000 });
    await tabB.getByRole('button', { name: 'Keep mine on top of theirs' }).click();
    await tabB.locator('[data-testid=save-state][data-state=saved]').waitFor({ timeout: 30_000 });
    // Both changes are in the room: B's wall, A's ceiling.
    expect(await tabB.getByLabel('Ceiling height').inputValue()).toBe('270 cm');

    await tabA.reload();
    await tabA.getByLabel('Wall 1', { exact: true }).waitFor();
    expect(await tabA.getByLabel('Wall 1', { exact: true }).inputValue()).toBe('320 cm');
    expect(await tabA.getByLabel('Ceiling height').inputValue()).toBe('270 cm');
    await context.close();
  });
});
