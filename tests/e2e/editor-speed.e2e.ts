// Measures (does not judge) how the editor keeps up while a piece is dragged in a room of 60
// pieces: frame intervals in Chromium with software WebGL, and how soon the 3D preview redraws.
// The figures are printed and written to .test-output/editor-speed.json for the README.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdirSync, writeFileSync } from 'node:fs';
import { resolve } from 'node:path';
import type { Browser } from 'playwright-core';
import { launchBrowser } from './lib/browser';
import { newPage, signUpThroughForm } from './lib/session';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(() => browser?.close());

const pct = (values: number[], p: number) =>
  [...values].sort((a, b) => a - b)[Math.min(values.length - 1, Math.floor(values.length * p))];

describe('editor speed (measured, not judged)', () => {
  it('drags a piece across a room of 60 pieces', async () => {
    const { context, page } = await newPage(browser);
    await signUpThroughForm(page, 'Speed Studio');
    const url = await page.evaluate(async () => {
      const json = (method: string, body: unknown) => ({
        method,
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify(body),
      });
      const project = (await (await fetch('/api/projects', json('POST', { name: 'Busy flat', newClient: { name: 'S' } }))).json())
        .project;
      const room = await (
        await fetch(
          `/api/projects/${project.id}/rooms`,
          json('POST', {
            name: 'Big room',
            shell: {
              outline: [
                [0, 0],
                [8000, 0],
                [8000, 6000],
                [0, 6000],
              ],
            },
          }),
        )
      ).json();
      const pieces = Array.from({ length: 60 }, (_, i) => ({
        id: `p${i}`,
        name: `Piece ${i}`,
        x: 600 + (i % 10) * 700,
        y: 600 + Math.floor(i / 10) * 900,
        width: 400,
        depth: 350,
        height: 600,
        rotation: 0,
        status: 'new',
      }));
      await fetch(`/api/options/${room.options[0].id}`, json('PUT', { version: 1, doc: { pieces } }));
      return `/projects/${project.id}/rooms/${room.room.id}`;
    });
    await page.goto(url);
    await page.getByRole('button', { name: /Furnish/ }).click();
    const view = page.locator('[data-testid=room-view][data-frames]');
    await view.waitFor({ timeout: 30000 });
    const target = page.locator('[data-testid=piece-p22]');
    const before = Number(await target.getAttribute('data-x'));
    const box = (await target.boundingBox())!;

    await page.evaluate(() => {
      const w = window as unknown as { __frames: number[] };
      w.__frames = [];
      let last = performance.now();
      const tick = (t: number) => {
        w.__frames.push(t - last);
        last = t;
        if (w.__frames.length < 400) requestAnimationFrame(tick);
      };
      requestAnimationFrame(tick);
    });
    const framesBefore = Number(await view.getAttribute('data-frames'));
    const started = Date.now();
    await page.keyboard.down('Alt');
    await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
    await page.mouse.down();
    const moves = 60;
    for (let i = 1; i <= moves; i += 1) await page.mouse.move(box.x + box.width / 2 + i * 3, box.y + box.height / 2 + i);
    await page.mouse.up();
    await page.keyboard.up('Alt');
    const dragMs = Date.now() - started;
    const frames = (await page.evaluate(() => (window as unknown as { __frames: number[] }).__frames)).slice(1);
    const framesAfter = Number(await view.getAttribute('data-frames'));
    const after = Number(await target.getAttribute('data-x'));
    expect(after).toBeGreaterThan(before);

    const figures = {
      pieces: 60,
      pointerMoves: moves,
      dragMs,
      msPerPointerMove: dragMs / moves,
      frameIntervalMedianMs: pct(frames, 0.5),
      frameIntervalP95Ms: pct(frames, 0.95),
      previewRedraws: framesAfter - framesBefore,
    };
    console.log('editor speed:', JSON.stringify(figures));
    mkdirSync(resolve(import.meta.dirname, '../../.test-output'), { recursive: true });
    writeFileSync(resolve(import.meta.dirname, '../../.test-output/editor-speed.json'), JSON.stringify(figures, null, 2));
    await context.close();
  });
});
