// The client's page at the sizes people use: at 1280 × 800 the first thing to do ("Start looking")
// is on screen without scrolling, even under a designer's long message, and at 1440 × 900 the
// header's edges line up with the room's below it.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdirSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type { Browser } from 'playwright-core';
import { inject } from 'vitest';
import { launchBrowser } from './lib/browser';
import { newPage, signUpThroughForm } from './lib/session';

const shots = join(resolve(import.meta.dirname, '../..'), '.test-output', 'client-page-layout');

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
  mkdirSync(shots, { recursive: true });
});
afterAll(() => browser?.close());

const MESSAGE = [
  'Dear both,',
  'Here are the ideas we talked about on Tuesday, one room at a time.',
  'The sitting room keeps your grandmother’s chest by the window in both options; the bedrooms try the bed on either wall.',
  'Take your time, walk round each one, and choose the one that feels like home. We can change anything you like.',
  'Warm wishes, the studio',
].join('\n\n');

describe('the client’s page layout', () => {
  it('shows Start looking above the fold at 1280 × 800 and lines the header up with the room at 1440 × 900', async () => {
    const designer = await newPage(browser);
    await signUpThroughForm(designer.page, 'Bramble Court Studio');
    const link = await designer.page.evaluate(async (message) => {
      const call = async (path: string, method: string, body: object) =>
        (await fetch(path, { method, headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) })).json();
      const { project } = await call('/api/projects', 'POST', { name: 'Old rectory', newClient: { name: 'Cass Wendell' } });
      const rooms = [];
      for (const name of ['Sitting room', 'Main bedroom', 'Second bedroom']) {
        const made = await call(`/api/projects/${project.id}/rooms`, 'POST', {
          name,
          shell: {
            outline: [
              [0, 0],
              [4000, 0],
              [4000, 3200],
              [0, 3200],
            ],
            openings: [],
          },
        });
        rooms.push({ roomId: made.room.id, optionIds: [made.options[0].id] });
      }
      const { presentation } = await call(`/api/projects/${project.id}/presentations`, 'POST', { rooms, message });
      return presentation.link as string;
    }, MESSAGE);

    const small = await browser.newContext({ baseURL: inject('baseUrl'), viewport: { width: 1280, height: 800 } });
    const page = await small.newPage();
    await page.goto(link);
    const start = page.getByRole('button', { name: 'Start looking' });
    await start.waitFor();
    const box = (await start.boundingBox())!;
    expect(box.y + box.height).toBeLessThanOrEqual(800);
    await page.screenshot({ path: join(shots, 'welcome-1280.png') });
    await small.close();

    const wide = await browser.newContext({ baseURL: inject('baseUrl'), viewport: { width: 1440, height: 900 } });
    const room = await wide.newPage();
    await room.goto(link);
    await room.getByRole('button', { name: 'Start looking' }).click();
    await room.getByRole('heading', { name: 'Sitting room' }).waitFor();
    const header = (await room.getByTestId('page-header-frame').boundingBox())!;
    const body = (await room.getByTestId('room-frame').boundingBox())!;
    expect(Math.abs(header.x - body.x)).toBeLessThanOrEqual(1);
    expect(Math.abs(header.x + header.width - (body.x + body.width))).toBeLessThanOrEqual(1);
    await room.screenshot({ path: join(shots, 'room-1440.png') });
    await wide.close();
    await designer.context.close();
  });
});
