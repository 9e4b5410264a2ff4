// The add-room dialog offers every room shape: a rectangle, the walls typed as measured, or a plan file.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser } from './lib/browser';
import { newPage, signUpThroughForm } from './lib/session';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(() => browser?.close());

async function newProject(page: Page): Promise<string> {
  return page.evaluate(async () => {
    const res = await fetch('/api/projects', {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ name: 'Shapes', newClient: { name: 'Shape client' } }),
    });
    return (await res.json()).project.id as string;
  });
}

describe('the add-room dialog', () => {
  it('keeps a bad entry marked, and makes an L-shaped room from walls typed as measured', async () => {
    const { context, page } = await newPage(browser);
    await signUpThroughForm(page, 'Shape Studio');
    const projectId = await newProject(page);
    await page.goto(`/projects/${projectId}`);
    await page.getByRole('button', { name: 'Add room' }).click();
    const dialog = page.getByRole('dialog');

    // A bad width stays as typed, marked, with its reason once (no banner repeating it).
    await dialog.getByLabel('Width').click();
    await page.keyboard.press('Control+A');
    await page.keyboard.type('abc');
    await dialog.getByRole('button', { name: 'Add room' }).click();
    expect(await dialog.getByLabel('Width').inputValue()).toBe('abc');
    expect(await dialog.getByLabel('Width').getAttribute('aria-invalid')).toBe('true');
    expect(await dialog.getByText(/is not a length/).count()).toBe(1);

    // An L walked clockwise from the top-left corner, each wall typed then Enter (turns right unless "l").
    await dialog.getByLabel('Room name').click();
    await page.keyboard.type('Sitting room');
    await dialog.getByText('Type the walls').click();
    for (const wall of ['500', '300', '200', '150 l', '300', '150']) {
      await dialog.getByLabel(/^Wall \d+$/).click();
      await page.keyboard.type(wall);
      await page.keyboard.press('Enter');
    }
    await dialog.getByText('The walls close. 6 walls, ready to use.').waitFor();
    await dialog.getByRole('button', { name: 'Use these walls' }).click();
    await page.getByRole('heading', { name: 'Sitting room' }).waitFor();
    // 5 × 3 m less the 3 × 1.5 m notch the left turn makes: 15 − 4.5 = 10.5 m².
    await page.getByRole('button', { name: /Check/ }).click();
    await page.getByRole('row', { name: /Floor area 10\.50 m²/ }).waitFor();
    expect(await page.getByLabel('Wall 6', { exact: true }).count()).toBe(0);
    await page.getByRole('button', { name: /Outline/ }).click();
    expect(await page.getByLabel('Wall 6', { exact: true }).inputValue()).toBe('150 cm');

    // The plan-file way opens the file chooser.
    await page.goto(`/projects/${projectId}`);
    await page.getByRole('button', { name: 'Add room' }).click();
    await page.getByRole('dialog').getByText('A plan file').click();
    const chooser = page.waitForEvent('filechooser');
    await page.getByRole('dialog').getByRole('button', { name: 'Choose a plan file…' }).click();
    expect((await chooser).isMultiple()).toBe(false);
    await context.close();
  }, 180_000);
});
