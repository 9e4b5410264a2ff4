// A refused value says why beside its field, in the designer's unit and the panel's wall numbers,
// with no ids; the field stays marked with what was typed until it is put right or Escape reverts it.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser } from './lib/browser';
import { newPage, signUpThroughForm } from './lib/session';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(() => browser?.close());

async function retype(page: Page, label: string, text: string) {
  await page.getByLabel(label, { exact: true }).click();
  await page.keyboard.press('Control+A');
  await page.keyboard.type(text);
  await page.keyboard.press('Enter');
}

describe('refused values', () => {
  it('are explained beside the field in cm and in ft/in, numbered as the panel numbers walls', async () => {
    const { context, page } = await newPage(browser);
    await signUpThroughForm(page, 'Refusal Studio');
    const { projectId, roomId } = await page.evaluate(async () => {
      const post = async (url: string, body: unknown) =>
        (
          await fetch(url, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) })
        ).json();
      const { project } = await post('/api/projects', { name: 'Tall windows', newClient: { name: 'Window client' } });
      const { room } = await post(`/api/projects/${project.id}/rooms`, {
        name: 'Bedroom',
        shell: {
          outline: [
            [0, 0],
            [4000, 0],
            [4000, 3000],
            [0, 3000],
          ],
          wallHeight: 2400,
          openings: [{ id: 'window-962a2f30', type: 'window', wall: 0, offset: 1000, width: 1000, height: 1300, sill: 900 }],
        },
      });
      return { projectId: project.id as string, roomId: room.id as string };
    });
    await page.goto(`/projects/${projectId}/rooms/${roomId}`);
    await page.getByRole('button', { name: /Openings/ }).click();
    await page.getByRole('button', { name: /Window on wall 1/ }).click();

    await retype(page, 'Sill height', '150');
    const sill = page.getByLabel('Sill height', { exact: true });
    await expect.poll(() => sill.getAttribute('aria-invalid')).toBe('true');
    const said = await page.getByRole('alert').filter({ hasText: 'ceiling' }).textContent();
    // 1500 mm sill + 1300 mm height = 2800 mm, above the 2400 mm ceiling.
    expect(said).toBe('The window’s top would be at 280 cm (sill 150 cm + height 130 cm), above the ceiling at 240 cm.');
    expect(said).not.toMatch(/window-|mm/);
    expect(await sill.inputValue()).toBe('150');
    // No banner repeats it.
    expect(await page.getByText(/Can't|Can’t/).count()).toBe(0);
    // Escape puts back the last good value.
    await sill.click();
    await page.keyboard.press('Escape');
    expect(await sill.inputValue()).toBe('90 cm');
    expect(await sill.getAttribute('aria-invalid')).toBeNull();

    // A long offset names the wall as the panel does ("wall 1", not 0), in ft/in when that is the unit.
    await page.getByLabel('Units').selectOption('ftin');
    await retype(page, 'From wall start', '30');
    const offsetSaid = await page.getByRole('alert').filter({ hasText: 'past the end' }).textContent();
    // Wall 1 is 4000 mm; less the 50 mm corner margin and the 1000 mm window: 2950 mm = 9' 8 1/8".
    expect(offsetSaid).toBe('The window would run past the end of wall 1: from the wall start it can be at most 9\' 8 1/8".');
    await context.close();
  }, 180_000);
});
