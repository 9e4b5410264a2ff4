// Browser test of the room editor: an L-shaped room drawn by typed measurements, openings and
// pieces, options kept apart, undo and save, and a local draft kept across a reload.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser } from './lib/browser';
import { inviteAndAccept, newPage, signUpThroughForm } from './lib/session';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(() => browser?.close());

async function newRoom(page: Page): Promise<string> {
  return page.evaluate(async () => {
    const json = (body: unknown) => ({
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify(body),
    });
    const project = await (await fetch('/api/projects', json({ name: 'Editor flat', newClient: { name: 'E client' } }))).json();
    const room = await (
      await fetch(
        `/api/projects/${project.project.id}/rooms`,
        json({
          name: 'Sitting room',
          shell: {
            outline: [
              [0, 0],
              [3000, 0],
              [3000, 3000],
              [0, 3000],
            ],
          },
        }),
      )
    ).json();
    return `/projects/${project.project.id}/rooms/${room.room.id}`;
  });
}

const saved = (page: Page) => page.locator('[data-testid=save-state][data-state=saved]').waitFor({ timeout: 15000 });
const piece = (page: Page, name: string) => page.locator('[data-testid^=piece-]', { hasText: name });

describe('the room editor', () => {
  it('draws an L-shaped room by typed measurements, adds openings and pieces, keeps options apart, undoes, and saves', async () => {
    const { context, page } = await newPage(browser);
    await signUpThroughForm(page, 'Editor Studio');
    const url = await newRoom(page);
    await page.goto(url);
    await page.getByRole('heading', { name: 'Sitting room' }).waitFor();

    // Outline: walk round an L with a splayed corner (two 135° corners), the last wall 2 cm short.
    await page.getByRole('button', { name: 'Type the walls afresh' }).click();
    const next = page.locator('#next-wall');
    for (const wall of ['300 r 135', '141.42 r 135', '200', '150 l', '200', '250', '498']) {
      await next.fill(wall);
      await next.press('Enter');
    }
    await page.getByText(/The last corner misses the first by/).waitFor();
    await page.getByRole('button', { name: 'Close the outline' }).click();
    await page.getByLabel('Wall 7', { exact: true }).waitFor();
    expect(await page.getByLabel('Wall 7', { exact: true }).inputValue()).toBe('500 cm');
    await page.getByRole('button', { name: /Check/ }).click();
    // 4 × 5 m less the 1 × 1 m splay triangle (0.5 m²) and the 1.5 × 2 m cut-out (3 m²) = 16.5 m² (derived).
    await page.getByRole('row', { name: /Floor area 16\.50 m²/ }).waitFor();

    // Openings: a door on wall 1 and a window on wall 4.
    await page.getByRole('button', { name: /Openings/ }).click();
    await page.getByLabel('On wall').selectOption({ index: 0 });
    await page.getByRole('button', { name: 'Add door' }).click();
    await page.getByRole('heading', { name: 'Door on wall 1' }).waitFor();
    await page.getByRole('button', { name: 'Swing out of the room' }).click();
    await page.getByLabel('On wall').selectOption({ index: 3 });
    await page.getByRole('button', { name: 'Add window' }).click();
    await expect.poll(() => page.locator('[data-testid^=opening-]').count()).toBe(2);

    // Furnish: a sofa turned by key and by button, an armchair sent to the holding area and back.
    await page.getByRole('button', { name: /Furnish/ }).click();
    await page.getByRole('button', { name: 'Add Three-seat sofa' }).click();
    await piece(page, 'Three-seat sofa').waitFor();
    // The catalogue stays open after Add, saying what went in; the new piece is selected on the plan.
    await page.getByText('Added Three-seat sofa.').waitFor();
    await page.getByRole('button', { name: 'Add Armchair' }).waitFor();
    await page.keyboard.press('r');
    await expect.poll(() => piece(page, 'Three-seat sofa').getAttribute('data-rotation')).toBe('15');
    await page.getByRole('button', { name: 'Edit Three-seat sofa' }).click();
    await page.getByRole('button', { name: 'Turn 15° clockwise' }).click();
    await expect.poll(() => piece(page, 'Three-seat sofa').getAttribute('data-rotation')).toBe('30');

    const sofaBefore = Number(await piece(page, 'Three-seat sofa').getAttribute('data-x'));
    const box = (await piece(page, 'Three-seat sofa').boundingBox())!;
    // Alt keeps the drag free of wall snapping (which would turn the sofa to face the room).
    await page.keyboard.down('Alt');
    await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
    await page.mouse.down();
    for (let i = 1; i <= 10; i += 1) await page.mouse.move(box.x + box.width / 2 - i * 4, box.y + box.height / 2 + i * 3);
    await page.mouse.up();
    await page.keyboard.up('Alt');
    expect(await piece(page, 'Three-seat sofa').getAttribute('data-rotation')).toBe('30');
    const sofaAfter = Number(await piece(page, 'Three-seat sofa').getAttribute('data-x'));
    expect(sofaAfter).toBeLessThan(sofaBefore);

    await page.getByRole('button', { name: '← Catalogue' }).click();
    await page.getByRole('button', { name: 'Add Armchair' }).click();
    // Clicking the new piece on the plan opens its fields, as any other selection does.
    await piece(page, 'Armchair').click();
    await page.getByRole('button', { name: 'Move to the holding area' }).click();
    await expect.poll(() => piece(page, 'Armchair').getAttribute('data-placed')).toBe('false');
    await page.getByRole('button', { name: 'Place in the room' }).click();
    await expect.poll(() => piece(page, 'Armchair').getAttribute('data-placed')).toBe('true');

    // Undo puts it back in the holding area; redo places it again; one drag was one step.
    await page.locator('body').click({ position: { x: 5, y: 5 } });
    await page.keyboard.press('Control+z');
    await expect.poll(() => piece(page, 'Armchair').getAttribute('data-placed')).toBe('false');
    await page.keyboard.press('Control+Shift+z');
    await expect.poll(() => piece(page, 'Armchair').getAttribute('data-placed')).toBe('true');

    // Options: duplicate, then change only the copy.
    await saved(page);
    await page.getByText('This option ▾').click();
    await page.getByRole('button', { name: 'Duplicate option' }).click();
    await page.getByRole('tab', { name: 'Option B', selected: true }).waitFor();
    await piece(page, 'Armchair').click();
    await page.keyboard.press('Delete');
    await expect.poll(() => piece(page, 'Armchair').count()).toBe(0);
    await page.getByRole('tab', { name: 'Option A' }).click();
    await expect.poll(() => piece(page, 'Armchair').count()).toBe(1);
    await saved(page);

    // Everything is there after a reload, which reopens the step and option the designer was on.
    await page.reload();
    await page
      .getByRole('button', { name: /Furnish/ })
      .and(page.locator('[aria-current=step]'))
      .waitFor();
    await page.getByRole('tab', { name: 'Option A', selected: true }).waitFor();
    await page.getByRole('button', { name: /Outline/ }).click();
    await page.getByLabel('Wall 7', { exact: true }).waitFor();
    await page.getByRole('button', { name: /Openings/ }).click();
    await expect.poll(() => page.locator('[data-testid^=opening-]').count()).toBe(2);
    expect(await piece(page, 'Armchair').count()).toBe(1);
    expect(await piece(page, 'Three-seat sofa').getAttribute('data-rotation')).toBe('30');
    await page.getByRole('tab', { name: 'Option B' }).click();
    await expect.poll(() => piece(page, 'Armchair').count()).toBe(0);
    expect(await piece(page, 'Three-seat sofa').count()).toBe(1);

    // A viewer sees it all and can change nothing.
    const viewer = await inviteAndAccept(browser, page, 'viewer', 'Vera Viewer');
    await viewer.page.goto(url);
    await viewer.page.getByText('Read only').waitFor();
    await piece(viewer.page, 'Armchair').waitFor();
    expect(await viewer.page.getByRole('button', { name: 'Add Armchair' }).count()).toBe(0);
    expect(await viewer.page.getByRole('button', { name: 'Undo' }).count()).toBe(0);
    await viewer.page.getByRole('button', { name: /Outline/ }).click();
    expect(await viewer.page.getByLabel('Wall 1', { exact: true }).isDisabled()).toBe(true);
    expect(await viewer.page.getByRole('button', { name: 'Type the walls afresh' }).count()).toBe(0);
    await viewer.context.close();
    await context.close();
  });

  it('keeps a local draft across a reload when the save could not happen', async () => {
    const { context, page } = await newPage(browser);
    await signUpThroughForm(page, 'Draft Studio');
    const url = await newRoom(page);
    await page.goto(url);
    await page.getByRole('button', { name: /Furnish/ }).click();
    // Saves fail while the server is "unreachable"; the change lives in the local draft.
    await page.route('**/api/options/*', (route) => route.abort());
    await page.getByRole('button', { name: 'Add Bookcase' }).click();
    await page.getByText('Cannot reach the server — trying again').waitFor({ timeout: 10000 });
    // Reload while the server is still out of reach, so no retry can save it first.
    await page.reload();
    await page.getByText(/brought back changes from your last visit/).waitFor();
    await piece(page, 'Bookcase').waitFor();
    await page.unroute('**/api/options/*');
    await saved(page);
    await page.reload();
    await page.getByRole('button', { name: /Furnish/ }).click();
    await piece(page, 'Bookcase').waitFor();
    expect(await page.getByText(/brought back changes/).count()).toBe(0);
    await context.close();
  });
});
