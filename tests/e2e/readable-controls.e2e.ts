// Every control of the editor's five steps shows its whole text at 1280 × 800 and 1440 × 900, in cm
// and in ft/in: no input, select, button or label narrower than what it holds.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { inject } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser } from './lib/browser';
import { signUpThroughForm } from './lib/session';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(() => browser?.close());

/** Controls whose text does not fit, described for the failure message. */
async function clipped(page: Page, where: string): Promise<string[]> {
  const found = await page.evaluate(() => {
    const canvas = document.createElement('canvas').getContext('2d')!;
    const out: string[] = [];
    const name = (el: Element) =>
      `${el.tagName.toLowerCase()}${el.id ? `#${el.id}` : ''} "${(el as HTMLInputElement).value ?? el.textContent ?? ''}"`.slice(
        0,
        80,
      );
    const scope = document.querySelectorAll(
      'main input:not([type=checkbox]):not([type=radio]):not([type=color]):not(.sr-only), main select, main button, main label',
    );
    for (const el of scope) {
      const box = el as HTMLElement;
      if (box.offsetParent === null || box.closest('.sr-only') || box.classList.contains('sr-only')) continue;
      if (el instanceof HTMLSelectElement) {
        const style = getComputedStyle(el);
        canvas.font = `${style.fontWeight} ${style.fontSize} ${style.fontFamily}`;
        const text = el.selectedOptions[0]?.textContent ?? '';
        // The arrow takes about 16 px beside the padding.
        const need = canvas.measureText(text).width + parseFloat(style.paddingLeft) + parseFloat(style.paddingRight) + 16;
        if (need > el.clientWidth + 1) out.push(`${name(el)} needs ${Math.ceil(need)} px, has ${el.clientWidth}`);
      } else if (box.scrollWidth > box.clientWidth + 1) {
        out.push(`${name(el)} needs ${box.scrollWidth} px, has ${box.clientWidth}`);
      }
    }
    return out;
  });
  return found.map((f) => `${where}: ${f}`);
}

describe('controls are readable', () => {
  it('in every step, at 1280 × 800 and 1440 × 900, in cm and in ft/in', async () => {
    const context = await browser.newContext({ baseURL: inject('baseUrl'), viewport: { width: 1280, height: 800 } });
    const page = await context.newPage();
    await signUpThroughForm(page, 'Readable Studio');
    const { projectId, roomId } = await page.evaluate(async () => {
      const post = async (url: string, body: unknown) =>
        (
          await fetch(url, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) })
        ).json();
      const { project } = await post('/api/projects', { name: 'Widths', newClient: { name: 'Width client' } });
      const { room } = await post(`/api/projects/${project.id}/rooms`, {
        name: 'Sitting room',
        shell: {
          outline: [
            [0, 0],
            [6198, 0],
            [6198, 2489],
            [3000, 2489],
            [3000, 5000],
            [0, 5000],
          ],
          openings: [{ id: 'door-1', type: 'door', wall: 0, offset: 300, width: 838, height: 2032, hinge: 'start', swing: 'in' }],
        },
      });
      const detail = await (await fetch(`/api/rooms/${room.id}`)).json();
      const option = detail.options[0];
      const pieces = [
        {
          id: 'sofa',
          name: 'Three-seat sofa',
          x: 1500,
          y: 1500,
          width: 2134,
          depth: 914,
          height: 851,
          rotation: 0,
          elevation: 0,
          status: 'new',
          price: 1450,
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
    const problems: string[] = [];
    for (const [width, height] of [
      [1280, 800],
      [1440, 900],
    ]) {
      await page.setViewportSize({ width, height });
      for (const unit of ['cm', 'ftin']) {
        await page.goto(`/projects/${projectId}/rooms/${roomId}`);
        await page.getByLabel('Units').selectOption(unit);
        const at = `${width}×${height} ${unit}`;
        await page.getByRole('button', { name: /Outline/ }).click();
        // Every length in the panel follows the unit: 2600 mm = 8' 6 3/8", 100 mm = 3 7/8".
        expect(await page.getByLabel('Ceiling height').inputValue()).toBe(unit === 'cm' ? '260 cm' : '8\' 6 3/8"');
        expect(await page.getByLabel('Wall thickness').inputValue()).toBe(unit === 'cm' ? '10 cm' : '3 7/8"');
        problems.push(...(await clipped(page, `${at} Outline`)));
        await page.getByRole('button', { name: 'Type the walls afresh' }).click();
        for (const wall of ['20\' 4 1/8"', '248.9cm l 135', '600']) {
          await page.locator('#next-wall').click();
          await page.keyboard.type(wall);
          await page.keyboard.press('Enter');
        }
        problems.push(...(await clipped(page, `${at} Type the walls`)));
        await page.getByRole('button', { name: 'Cancel' }).click();
        await page.getByRole('button', { name: /Openings/ }).click();
        await page.getByRole('button', { name: /Door on wall 1/ }).click();
        problems.push(...(await clipped(page, `${at} Openings`)));
        await page.getByRole('button', { name: /Furnish/ }).click();
        problems.push(...(await clipped(page, `${at} Furnish`)));
        await page.getByTestId('piece-sofa').click();
        problems.push(...(await clipped(page, `${at} Furnish, a piece`)));
        await page.getByRole('button', { name: /Finishes/ }).click();
        problems.push(...(await clipped(page, `${at} Finishes`)));
        await page.getByRole('button', { name: /Check/ }).click();
        problems.push(...(await clipped(page, `${at} Check`)));
      }
    }
    expect(problems).toEqual([]);
    await context.close();
  }, 240_000);
});
