// Take-off and comparison, an option's schedule, its CSV and its print view, in the browser.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type { Browser } from 'playwright-core';
import { launchBrowser } from './lib/browser';
import { newPage, signUpThroughForm } from './lib/session';
import { oakBoards, rawToJpeg } from '../../server/services/images/generate';

const SHOTS = resolve(import.meta.dirname, '../../.test-output/screenshots');

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
  mkdirSync(SHOTS, { recursive: true });
});
afterAll(() => browser?.close());

interface Made {
  projectId: string;
  livingId: string;
  optionA: string;
  optionB: string;
  oakId: string;
}

describe('take-off, schedules and comparison', () => {
  it('shows the totals, downloads the CSV, prints the schedule and compares the options', async () => {
    const { context, page } = await newPage(browser);
    // A refused style or script (the content security policy) shows up as a console error.
    const consoleErrors: string[] = [];
    page.on('console', (m) => {
      if (m.type() === 'error') consoleErrors.push(m.text());
    });
    await signUpThroughForm(page, 'Schedule Studio');
    const photo = (await rawToJpeg(oakBoards(192, 384))).toString('base64');

    // Invented demo-like data: a living room with two options and a bedroom, finishes with prices.
    const made = await page.evaluate(async (photoBase64): Promise<Made> => {
      const send = async (method: string, url: string, body?: unknown) => {
        const res = await fetch(
          url,
          body === undefined
            ? { method }
            : { method, headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) },
        );
        if (!res.ok) throw new Error(`${method} ${url}: ${res.status} ${await res.text()}`);
        return res.json();
      };
      const oat = (
        await send('POST', '/api/finishes/paints', {
          name: 'Morning oat',
          colourHex: '#e6dcc8',
          sheen: 'matt',
          supplier: 'Sample paint mill',
          code: 'MO-01',
          price: 14.5,
          priceUnit: 'litre',
        })
      ).finish;
      const harbour = (
        await send('POST', '/api/finishes/paints', {
          name: 'Deep harbour',
          colourHex: '#2f4858',
          sheen: 'satin',
          price: 16,
          priceUnit: 'litre',
        })
      ).finish;
      const form = new FormData();
      form.append(
        'photos',
        new Blob([Uint8Array.from(atob(photoBase64), (c) => c.charCodeAt(0))], { type: 'image/jpeg' }),
        'oak.jpg',
      );
      form.append('category', 'wood');
      form.append('repeatWidthMm', '720');
      form.append('repeatHeightMm', '1440');
      const upload = await fetch('/api/finishes/photos', { method: 'POST', body: form });
      const oak = (await upload.json()).finishes[0];
      await send('PATCH', `/api/finishes/${oak.id}`, {
        name: 'Oak boards, natural oil',
        supplier: 'Sample timber merchant',
        code: 'OAK-180',
        price: 58,
        priceUnit: 'm2',
      });

      const project = (
        await send('POST', '/api/projects', {
          name: 'Canal Row flat',
          newClient: { name: 'A household', email: 'household@example.com' },
        })
      ).project;
      const living = await send('POST', `/api/projects/${project.id}/rooms`, {
        name: 'Living room',
        shell: {
          wallHeight: 2600,
          outline: [
            [0, 0],
            [5000, 0],
            [5000, 4000],
            [0, 4000],
          ],
          openings: [
            { id: 'd1', type: 'door', wall: 0, offset: 300, width: 820, height: 2040, hinge: 'start', swing: 'in' },
            { id: 'w1', type: 'window', wall: 2, offset: 1500, width: 1600, height: 1300, sill: 850 },
          ],
        },
      });
      const at = { depth: 850, height: 850, rotation: 0 };
      const a = living.options[0];
      await send('PUT', `/api/options/${a.id}`, {
        version: a.version,
        name: 'Calm',
        doc: {
          pieces: [
            {
              id: 'sofa',
              name: 'Three-seat sofa',
              x: 2500,
              y: 3500,
              width: 2100,
              ...at,
              rotation: 180,
              status: 'new',
              price: 1450,
              supplierUrl: 'https://example.com/sofas/three-seat',
            },
            {
              id: 'chair-1',
              name: 'Side chair',
              x: 4400,
              y: 1800,
              width: 500,
              depth: 520,
              height: 800,
              status: 'new',
              price: 189.99,
            },
            {
              id: 'chair-2',
              name: 'Side chair',
              x: 4400,
              y: 2500,
              width: 500,
              depth: 520,
              height: 800,
              status: 'new',
              price: 189.99,
            },
            {
              id: 'armchair',
              name: 'Reading armchair',
              x: 700,
              y: 2500,
              width: 800,
              depth: 800,
              height: 950,
              rotation: 90,
              status: 'existing',
            },
            { id: 'rug', name: 'Wool rug', x: 2500, y: 2300, width: 2000, depth: 1400, height: 10, status: 'new', price: 320 },
          ],
          finishes: { floor: oak.id, walls: oat.id, ceiling: oat.id, wallOverrides: { '3': harbour.id } },
        },
      });
      const b = (await send('POST', `/api/rooms/${living.room.id}/options`, { name: 'Open', fromOptionId: a.id })).option;
      await send('PUT', `/api/options/${b.id}`, {
        version: b.version,
        doc: {
          pieces: [
            { id: 'sofa', name: 'Two-seat sofa', x: 2500, y: 3500, width: 1600, ...at, rotation: 180, status: 'new', price: 980 },
            {
              id: 'armchair',
              name: 'Reading armchair',
              x: 700,
              y: 2500,
              width: 800,
              depth: 800,
              height: 950,
              rotation: 90,
              status: 'existing',
            },
          ],
          finishes: { floor: oak.id, walls: oat.id },
        },
      });
      const bedroom = await send('POST', `/api/projects/${project.id}/rooms`, {
        name: 'Bedroom',
        shell: {
          outline: [
            [0, 0],
            [3600, 0],
            [3600, 3200],
            [0, 3200],
          ],
        },
      });
      const bed = bedroom.options[0];
      await send('PUT', `/api/options/${bed.id}`, {
        version: bed.version,
        doc: { pieces: [], finishes: { walls: oat.id, floor: oak.id } },
      });

      // The client chooses Option B for the living room through the presentation link.
      const p = (
        await send('POST', `/api/projects/${project.id}/presentations`, {
          rooms: [{ roomId: living.room.id, optionIds: [a.id, b.id] }],
        })
      ).presentation;
      const token = new URL(p.link).pathname.split('/').pop();
      await send('PUT', `/api/p/${token}/rooms/${living.room.id}/choice`, { optionId: b.id });
      return { projectId: project.id, livingId: living.room.id, optionA: a.id, optionB: b.id, oakId: oak.id };
    }, photo);

    // From the project page to the take-off.
    await page.goto(`/projects/${made.projectId}`);
    await page.getByText('Living room').first().waitFor();
    await page.screenshot({ path: join(SHOTS, 'schedules-project.png'), fullPage: true });
    await page.getByRole('link', { name: /Take-off and comparison/ }).click();
    await page.getByRole('heading', { name: 'Take-off and comparison' }).waitFor();

    // The living room is counted with the client's choice (Option B); switch it to Option A.
    const living = page.locator('section', { has: page.getByRole('heading', { name: 'Living room', exact: true }) });
    const counted = living.getByLabel('Counted option');
    expect(await counted.inputValue()).toBe(made.optionB);
    await counted.selectOption(made.optionA);
    const livingPaint = page.getByRole('table', { name: 'Paint in Living room' });
    await livingPaint.getByText('Deep harbour').waitFor();
    // Wall 4 alone: 4 m × 2.6 m = 10.4 m² × 2 coats ÷ 10 m²/L = 2.08 L; one 2.5 L tin leaves 0.42 L, less than
    // the smallest tin (3 × 0.75 L would leave less paint but take three tins).
    expect(await livingPaint.getByRole('row', { name: /Deep harbour/ }).textContent()).toBe(
      'Deep harbourWall 410.4 m²2.08 L2.5 L',
    );

    // Box size typed for the boards: 2.2 m² a box; living 20 m² + 10 % = 22 m² → 10 boxes.
    await page.getByLabel('m² per box or roll of Oak boards, natural oil').first().fill('2.2');
    const floorRow = page
      .getByRole('table', { name: 'Flooring and other finishes in Living room' })
      .getByRole('row', { name: /Oak boards/ });
    await expect.poll(() => floorRow.textContent()).toMatch(/22 m².*10$/);
    // The project totals add the bedroom: 20 + 11.52 = 31.52 m² → +10 % = 34.672 m² → 16 boxes.
    const projectFloor = page
      .getByRole('table', { name: 'Flooring and other finishes for the project' })
      .getByRole('row', { name: /Oak boards/ });
    await expect.poll(() => projectFloor.textContent()).toContain('Living room, Bedroom');
    expect(await projectFloor.textContent()).toMatch(/34\.67 m²16$/);

    // Compare: Option B is marked as the client's choice.
    const compare = page.getByRole('table', { name: 'Options for Living room' });
    await compare.getByText('Chosen').waitFor();
    expect(await compare.getByRole('row', { name: /New pieces/ }).textContent()).toBe('New pieces41');
    await page.screenshot({ path: join(SHOTS, 'schedules-takeoff.png'), fullPage: true });

    // The settings stay for this project after a reload.
    await page.reload();
    await page.getByRole('heading', { name: 'Take-off and comparison' }).waitFor();
    expect(await page.getByLabel('m² per box or roll of Oak boards, natural oil').first().inputValue()).toBe('2.2');

    // Option A's schedule from the compare table.
    await compare.getByRole('link', { name: 'Schedule' }).first().click();
    await page.getByRole('heading', { name: 'Schedule · Option A · Calm' }).waitFor();
    const pieces = page.getByRole('table', { name: 'Pieces' });
    expect(await pieces.getByRole('row', { name: /Side chair/ }).textContent()).toContain('379.98');
    expect(await pieces.getByRole('row', { name: /Reading armchair/ }).textContent()).toContain('no cost');
    // 10 boxes of 2.2 m² = 22 m² × 58 = 1,276.00
    expect(
      await page
        .getByRole('table', { name: 'Finishes' })
        .getByRole('row', { name: /Oak boards/ })
        .textContent(),
    ).toContain('1,276.00');
    const budget = await page.getByTestId('budget').textContent();
    await page.screenshot({ path: join(SHOTS, 'schedules-schedule.png'), fullPage: true });

    // The CSV downloads with the same settings and the same budget.
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('link', { name: 'Download CSV' }).click(),
    ]);
    expect(download.suggestedFilename()).toBe('canal-row-flat-living-room-option-a-schedule.csv');
    const csvPath = join(SHOTS, 'schedules.csv');
    await download.saveAs(csvPath);
    const csv = readFileSync(csvPath, 'utf8');
    expect(csv).toContain('10 × 2.2 m² for 22 m² with 10 % waste');
    expect(csv.trimEnd().split('\r\n').at(-1)).toBe(`Total,Budget,,,,,,,,${budget!.replace(/[^\d.]/g, '')},,,`);

    // The print view: no top bar, no buttons, the whole table on paper.
    await page.emulateMedia({ media: 'print' });
    expect(await page.locator('header.no-print').first().isVisible()).toBe(false);
    expect(await page.getByRole('button', { name: 'Print' }).isVisible()).toBe(false);
    expect(await page.getByRole('link', { name: 'Download CSV' }).isVisible()).toBe(false);
    expect(await page.getByTestId('budget').isVisible()).toBe(true);
    await page.setViewportSize({ width: 794, height: 1123 });
    await page.screenshot({ path: join(SHOTS, 'schedules-print.png'), fullPage: true });
    const pdf = await page.pdf({ format: 'A4', printBackground: true });
    writeFileSync(join(SHOTS, 'schedules-print.pdf'), pdf);
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
    await page.emulateMedia({ media: 'screen' });
    await page.setViewportSize({ width: 1280, height: 800 });

    expect(consoleErrors).toEqual([]);

    // Another studio's schedule link is not found.
    const other = await newPage(browser);
    await signUpThroughForm(other.page, 'Other Studio');
    await other.page.goto(`/projects/${made.projectId}/rooms/${made.livingId}/options/${made.optionA}/schedule`);
    await other.page.getByText('That option was not found.').waitFor();
    await other.context.close();
    await context.close();
  });
});
