// Every typed field commits the way people leave a field: Enter, or clicking somewhere else —
// including clicking another piece — and the value is still there after a reload.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Locator, Page } from 'playwright-core';
import { launchBrowser } from './lib/browser';
import { newPage, signUpThroughForm } from './lib/session';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(() => browser?.close());

const saved = (page: Page) => page.locator('[data-testid=save-state][data-state=saved]').waitFor({ timeout: 15000 });

/** Clears the field by pointer and keyboard, types the text, then leaves it by clicking `elsewhere`. */
async function typeThenClick(page: Page, field: Locator, text: string, elsewhere: Locator) {
  await field.click();
  await page.keyboard.press('Control+A');
  await page.keyboard.type(text);
  await elsewhere.click();
}

async function typeThenEnter(page: Page, field: Locator, text: string) {
  await field.click();
  await page.keyboard.press('Control+A');
  await page.keyboard.type(text);
  await page.keyboard.press('Enter');
}

async function roomWithPieces(page: Page) {
  return page.evaluate(async () => {
    const post = async (url: string, body: unknown) =>
      (await fetch(url, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) })).json();
    const { project } = await post('/api/projects', { name: 'Field walk', newClient: { name: 'Field client' } });
    const { room } = await post(`/api/projects/${project.id}/rooms`, {
      name: 'Study',
      shell: {
        outline: [
          [0, 0],
          [4000, 0],
          [4000, 3000],
          [0, 3000],
        ],
        openings: [{ id: 'window-1', type: 'window', wall: 0, offset: 1000, width: 1200, height: 1200, sill: 900 }],
      },
    });
    const detail = await (await fetch(`/api/rooms/${room.id}`)).json();
    const option = detail.options[0];
    const pieces = [
      {
        id: 'armchair',
        name: 'Armchair',
        x: 1000,
        y: 1500,
        width: 800,
        depth: 800,
        height: 800,
        rotation: 0,
        elevation: 0,
        status: 'new',
        price: null,
        placed: true,
      },
      {
        id: 'tv-unit',
        name: 'TV unit',
        x: 3000,
        y: 1500,
        width: 1200,
        depth: 400,
        height: 500,
        rotation: 0,
        elevation: 0,
        status: 'new',
        price: null,
        placed: true,
      },
    ];
    await fetch(`/api/options/${option.id}`, {
      method: 'PUT',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ version: option.version, doc: { ...option.doc, pieces } }),
    });
    return { projectId: project.id as string, roomId: room.id as string };
  });
}

describe('typed fields in the room editor', () => {
  it('commit on Enter and on clicking elsewhere (another piece too), one undo step each, and survive a reload', async () => {
    const { context, page } = await newPage(browser);
    await signUpThroughForm(page, 'Field Studio');
    const { projectId, roomId } = await roomWithPieces(page);
    await page.goto(`/projects/${projectId}/rooms/${roomId}`);
    await page.getByRole('heading', { name: 'Study' }).waitFor();
    const heading = page.getByRole('heading', { name: 'Outline', exact: true });

    // Outline: ceiling, wall thickness, a wall's length.
    await typeThenClick(page, page.getByLabel('Ceiling height'), '255', heading);
    await typeThenClick(page, page.getByLabel('Wall thickness'), '12', heading);
    await typeThenEnter(page, page.getByLabel('Wall 2', { exact: true }), '320');
    await saved(page);

    // Openings: the window's sill, typed then clicked away.
    await page.getByRole('button', { name: /Openings/ }).click();
    await page.getByRole('button', { name: /Window on wall 1/ }).click();
    await typeThenClick(page, page.getByLabel('Sill height'), '85', page.getByRole('heading', { name: 'Window on wall 1' }));
    await typeThenEnter(page, page.getByLabel('Width'), '110');

    // Furnish: the armchair's price typed, Enter, then the TV unit clicked on the plan.
    await page.getByRole('button', { name: /Furnish/ }).click();
    await page.getByTestId('piece-armchair').click();
    await typeThenEnter(page, page.getByLabel('Price'), '640');
    await page.getByTestId('piece-tv-unit').click();
    // The TV unit's name typed, then another piece clicked without pressing anything.
    await page.getByLabel('Name').click();
    await page.keyboard.press('Control+A');
    await page.keyboard.type('Low media unit');
    await page.getByTestId('piece-armchair').click();
    await page.getByLabel('Supplier link').click();
    await page.keyboard.type('https://maker.example/armchair');
    await page.getByTestId('piece-tv-unit').click();
    await typeThenClick(page, page.getByLabel('Depth'), '45', page.getByRole('heading', { name: 'Furnish', exact: true }));
    await typeThenClick(page, page.getByLabel('Turn', { exact: true }), '90', page.getByTestId('piece-armchair'));
    // The armchair's height above the floor, then a click on the empty plan.
    await page.getByLabel('Above the floor').click();
    await page.keyboard.press('Control+A');
    await page.keyboard.type('10');
    await page.getByTestId('plan').click({ position: { x: 12, y: 12 } });
    await page.getByRole('button', { name: 'Add Armchair' }).waitFor();
    await saved(page);
    await page.getByTestId('piece-armchair').click();

    // Escape puts back the last good value and changes nothing.
    await page.getByLabel('Name').click();
    await page.keyboard.type(' (spare)');
    await page.keyboard.press('Escape');
    expect(await page.getByLabel('Name').inputValue()).toBe('Armchair');

    // Each commit was one undo step: undoing the last one puts the armchair back on the floor.
    await page.getByRole('button', { name: 'Undo' }).click();
    expect(await page.getByLabel('Above the floor').inputValue()).toBe('0 cm');
    await page.getByRole('button', { name: 'Redo' }).click();
    expect(await page.getByLabel('Above the floor').inputValue()).toBe('10 cm');
    await saved(page);

    // The walkway of the Check step.
    await page.getByRole('button', { name: /Check/ }).click();
    await typeThenClick(page, page.getByLabel('Walkway width'), '80', page.getByRole('heading', { name: 'Check', exact: true }));

    await page.reload();
    await page.getByRole('heading', { name: 'Study' }).waitFor();
    // The editor reopens on the step it was on, with the walkway as typed.
    expect(await page.getByLabel('Walkway width').inputValue()).toBe('80 cm');
    await page.getByRole('button', { name: /Outline/ }).click();
    expect(await page.getByLabel('Ceiling height').inputValue()).toBe('255 cm');
    expect(await page.getByLabel('Wall thickness').inputValue()).toBe('12 cm');
    expect(await page.getByLabel('Wall 2', { exact: true }).inputValue()).toBe('320 cm');
    await page.getByRole('button', { name: /Openings/ }).click();
    await page.getByRole('button', { name: /Window on wall 1/ }).click();
    expect(await page.getByLabel('Sill height').inputValue()).toBe('85 cm');
    expect(await page.getByLabel('Width').inputValue()).toBe('110 cm');
    await page.getByRole('button', { name: /Furnish/ }).click();
    await page.getByTestId('piece-armchair').click();
    expect(await page.getByLabel('Price').inputValue()).toBe('640');
    expect(await page.getByLabel('Supplier link').inputValue()).toBe('https://maker.example/armchair');
    expect(await page.getByLabel('Above the floor').inputValue()).toBe('10 cm');
    await page.getByTestId('piece-tv-unit').click();
    expect(await page.getByLabel('Name').inputValue()).toBe('Low media unit');
    expect(await page.getByLabel('Depth').inputValue()).toBe('45 cm');
    expect(await page.getByLabel('Turn', { exact: true }).inputValue()).toBe('90');
    await context.close();
  }, 180_000);
});
