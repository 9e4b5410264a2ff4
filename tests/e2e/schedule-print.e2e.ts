// The printed schedule says whose it is (studio, client, project, room, option) and when it was
// printed, and a long supplier link wraps at its slashes and dots, never in the middle of a word.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdirSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type { Browser } from 'playwright-core';
import { launchBrowser } from './lib/browser';
import { newPage, signUpThroughForm } from './lib/session';

const shots = join(resolve(import.meta.dirname, '../..'), '.test-output', 'schedule-print');

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
  mkdirSync(shots, { recursive: true });
});
afterAll(() => browser?.close());

const LINK = 'https://furniture-maker.example/collections/upholstered-seating/three-seat-sofa-in-woven-linen?colour=sage';

describe('the printed schedule', () => {
  it('carries a header naming studio, client, project, room, option and date, and wraps links at their separators', async () => {
    const { context, page } = await newPage(browser);
    await signUpThroughForm(page, 'Orchard Row Interiors');
    const url = await page.evaluate(async (link) => {
      const call = async (path: string, method: string, body: object) =>
        (await fetch(path, { method, headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) })).json();
      const { project } = await call('/api/projects', 'POST', { name: 'Pear tree house', newClient: { name: 'Imogen Lark' } });
      const created = await call(`/api/projects/${project.id}/rooms`, 'POST', {
        name: 'Garden room',
        shell: {
          outline: [
            [0, 0],
            [4000, 0],
            [4000, 3000],
            [0, 3000],
          ],
          openings: [],
        },
      });
      const option = created.options[0];
      await call(`/api/options/${option.id}`, 'PUT', {
        version: option.version,
        doc: {
          pieces: [
            {
              id: 'sofa',
              name: 'Sofa',
              x: 2000,
              y: 2400,
              width: 2000,
              depth: 900,
              height: 800,
              status: 'new',
              price: 1450,
              supplierUrl: link,
            },
          ],
        },
      });
      return `/projects/${project.id}/rooms/${created.room.id}/options/${option.id}/schedule`;
    }, LINK);
    await page.goto(url);
    await page.getByRole('heading', { name: 'Schedule · Option A' }).waitFor();
    const header = page.getByTestId('print-header');
    expect(await header.isVisible()).toBe(false);

    await page.emulateMedia({ media: 'print' });
    await header.waitFor();
    const text = await header.innerText();
    expect(text).toContain('Orchard Row Interiors');
    expect(text).toContain('For Imogen Lark · Pear tree house · Garden room · Option A');
    expect(text).toMatch(/Printed \d{1,2} [A-Z][a-z]+ \d{4}/);

    const link = page.getByRole('link', { name: /furniture-maker\.example/ });
    const style = await link.evaluate((a) => {
      const s = getComputedStyle(a);
      return { wordBreak: s.wordBreak, overflowWrap: s.overflowWrap, breaks: a.querySelectorAll('wbr').length };
    });
    expect(style.wordBreak).not.toBe('break-all');
    expect(style.overflowWrap).toBe('break-word');
    expect(style.breaks).toBeGreaterThan(5);
    // Every line of the link on paper ends at a separator (or the end), so no word is cut.
    const lines = await link.evaluate((a) => {
      const range = document.createRange();
      const out: string[] = [];
      let current = '';
      let top: number | null = null;
      for (const node of a.childNodes) {
        if (node.nodeType !== Node.TEXT_NODE) continue;
        range.selectNodeContents(node);
        const rect = range.getClientRects()[0];
        if (top !== null && rect && rect.top > top + 2) {
          out.push(current);
          current = '';
        }
        if (rect) top = rect.top;
        current += node.textContent ?? '';
      }
      out.push(current);
      return out;
    });
    for (const line of lines.slice(0, -1)) expect(line).toMatch(/[/.?&=_-]$/);
    await page.screenshot({ path: join(shots, 'schedule-print.png'), fullPage: true });
    await context.close();
  });
});
