// Outside the room editor, a finish's typed details are never lost either: each field saves on
// Enter or on clicking elsewhere (another field too), Escape puts back the saved value, a refused
// entry keeps its text beside the reason, and after a reload every value is there.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdirSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type { Browser, Locator, Page } from 'playwright-core';
import { launchBrowser } from './lib/browser';
import { newPage, signUpThroughForm } from './lib/session';

const shots = join(resolve(import.meta.dirname, '../..'), '.test-output', 'page-field-commits');

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
  mkdirSync(shots, { recursive: true });
});
afterAll(() => browser?.close());

const patched = (page: Page) =>
  page.waitForResponse((r) => r.request().method() === 'PATCH' && r.url().includes('/api/finishes/'));

/** Selects the field's text by pointer and keyboard and types over it. */
async function typeOver(page: Page, field: Locator, text: string) {
  await field.click();
  await page.keyboard.press('Control+A');
  await page.keyboard.type(text);
}

describe('typed fields on the finish page', () => {
  it('save on Enter and on clicking elsewhere, revert on Escape, keep a refused entry, and survive a reload', async () => {
    const { context, page } = await newPage(browser);
    await signUpThroughForm(page, 'Quill Street Interiors');
    const id = await page.evaluate(async () => {
      const res = await fetch('/api/finishes/paints', {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({ name: 'Hall green', colourHex: '#8a9a7b', sheen: 'matt' }),
      });
      return ((await res.json()) as { finish: { id: string } }).finish.id;
    });
    await page.goto(`/finishes/${id}`);
    const details = page.getByRole('heading', { name: 'Details' });
    await details.waitFor();

    // Name: typed, then a click on the card's heading.
    let saved = patched(page);
    await typeOver(page, page.getByLabel('Name'), 'Hallway sage');
    await details.click();
    expect((await saved).status()).toBe(200);
    await page.getByRole('heading', { name: 'Hallway sage' }).waitFor();

    // Price: typed, Enter.
    saved = patched(page);
    await typeOver(page, page.getByLabel('Price'), '14,5');
    await page.keyboard.press('Enter');
    expect((await saved).status()).toBe(200);

    // Supplier: typed, then straight into the next field by clicking it.
    saved = patched(page);
    await typeOver(page, page.getByLabel('Supplier'), 'Millpond Paints');
    await page.getByLabel('Code').click();
    expect((await saved).status()).toBe(200);

    // Code: typed, then Escape puts back the saved (empty) value; nothing is sent.
    await page.keyboard.type('MP-204');
    await page.keyboard.press('Escape');
    expect(await page.getByLabel('Code').inputValue()).toBe('');

    // Hex: a refused entry keeps its text, marked; a good one saves on Enter.
    await typeOver(page, page.getByLabel('Hex'), '#12zz');
    await page.keyboard.press('Enter');
    await page.getByText('A colour is # and six digits or letters a–f.').waitFor();
    expect(await page.getByLabel('Hex').inputValue()).toBe('#12zz');
    expect(await page.getByLabel('Hex').getAttribute('aria-invalid')).toBe('true');
    saved = patched(page);
    await typeOver(page, page.getByLabel('Hex'), '#6f8a5e');
    await page.keyboard.press('Enter');
    expect((await saved).status()).toBe(200);
    await page.getByText('All changes saved').waitFor();
    await page.screenshot({ path: join(shots, 'paint-details.png'), fullPage: true });

    await page.reload();
    await details.waitFor();
    expect(await page.getByLabel('Name').inputValue()).toBe('Hallway sage');
    expect(await page.getByLabel('Price').inputValue()).toBe('14.5');
    expect(await page.getByLabel('Supplier').inputValue()).toBe('Millpond Paints');
    expect(await page.getByLabel('Code').inputValue()).toBe('');
    expect(await page.getByLabel('Hex').inputValue()).toBe('#6f8a5e');
    await context.close();
  });
});

const saving = (page: Page, method: string, path: string) =>
  page.waitForResponse((r) => r.request().method() === method && r.url().includes(path));

describe('typed fields on the client and project pages', () => {
  it('save on Enter and on clicking elsewhere, revert on Escape, and survive a reload', async () => {
    const { context, page } = await newPage(browser);
    await signUpThroughForm(page, 'Linden Yard Studio');
    const projectId = await page.evaluate(async () => {
      const res = await fetch('/api/projects', {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({ name: 'Mill house', newClient: { name: 'Tamsin Ravel' } }),
      });
      return ((await res.json()) as { project: { id: string } }).project.id;
    });

    // The client: the name typed then Enter, the e-mail typed then a click on the phone, the phone then Escape.
    await page.goto('/clients');
    await page.getByRole('button', { name: 'Edit Tamsin Ravel' }).click();
    const dialog = page.getByRole('dialog');
    let saved = saving(page, 'PATCH', '/api/clients/');
    await typeOver(page, dialog.getByLabel('Name'), 'Tamsin and Joel Ravel');
    await page.keyboard.press('Enter');
    expect((await saved).status()).toBe(200);
    saved = saving(page, 'PATCH', '/api/clients/');
    await typeOver(page, dialog.getByLabel('E-mail'), 'ravel@example.com');
    await dialog.getByLabel('Phone').click();
    expect((await saved).status()).toBe(200);
    await page.keyboard.type('0161 496 0000');
    await page.keyboard.press('Escape');
    expect(await dialog.getByLabel('Phone').inputValue()).toBe('');
    // A refused e-mail keeps its text beside the reason.
    await typeOver(page, dialog.getByLabel('E-mail'), 'not-an-address');
    await dialog.getByRole('heading', { name: 'Edit client' }).click();
    await expect.poll(() => dialog.getByLabel('E-mail').getAttribute('aria-invalid')).toBe('true');
    expect(await dialog.getByLabel('E-mail').inputValue()).toBe('not-an-address');
    await page.screenshot({ path: join(shots, 'client-details.png') });
    // Escape in the field puts back the saved address, and leaves the dialog open.
    await dialog.getByLabel('E-mail').click();
    await page.keyboard.press('Escape');
    expect(await dialog.getByLabel('E-mail').inputValue()).toBe('ravel@example.com');
    await dialog.getByRole('button', { name: 'Done' }).click();
    await page.reload();
    await page.getByRole('button', { name: 'Edit Tamsin and Joel Ravel' }).click();
    expect(await page.getByRole('dialog').getByLabel('E-mail').inputValue()).toBe('ravel@example.com');
    expect(await page.getByRole('dialog').getByLabel('Phone').inputValue()).toBe('');
    await page.getByRole('dialog').getByRole('button', { name: 'Done' }).click();

    // The project: the address typed, then Done clicked straight away.
    await page.goto(`/projects/${projectId}`);
    await page.getByRole('button', { name: 'Edit details' }).click();
    saved = saving(page, 'PATCH', `/api/projects/${projectId}`);
    await typeOver(page, page.getByRole('dialog').getByLabel('Address'), '4 Weir Lane');
    await page.getByRole('dialog').getByRole('button', { name: 'Done' }).click();
    expect((await saved).status()).toBe(200);
    saved = saving(page, 'PATCH', `/api/projects/${projectId}`);
    await page.getByRole('button', { name: 'Edit details' }).click();
    await typeOver(page, page.getByRole('dialog').getByLabel('Project name'), 'Mill house and barn');
    await page.keyboard.press('Enter');
    expect((await saved).status()).toBe(200);
    await page.getByRole('dialog').getByRole('button', { name: 'Done' }).click();
    await page.reload();
    await page.getByRole('heading', { name: /Mill house and barn/ }).waitFor();
    expect(await page.getByText('4 Weir Lane').isVisible()).toBe(true);
    await context.close();
  });
});

describe('a paint’s price', () => {
  it('is typed in the Add paint dialog, per litre or per m² of wall, and reads so in the library', async () => {
    const { context, page } = await newPage(browser);
    await signUpThroughForm(page, 'Tinworks Studio');
    await page.goto('/finishes');
    await page.getByRole('button', { name: 'Add paint' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByLabel('Name').fill('Harbour blue');
    await dialog.getByLabel('Hex').fill('#3b5a6f');
    expect(await dialog.getByLabel('Per').locator('option').allInnerTexts()).toEqual(['litre', 'm²']);
    await dialog.getByLabel('Price').click();
    await page.keyboard.type('16,5');
    await page.keyboard.press('Enter');
    await page.getByRole('link', { name: /Harbour blue/ }).waitFor();
    await page.getByText('16.50 / L').waitFor();
    await page.screenshot({ path: join(shots, 'library-paint-price.png') });

    await page.getByRole('link', { name: /Harbour blue/ }).click();
    await page.getByRole('heading', { name: 'Details' }).waitFor();
    expect(await page.getByLabel('Per').inputValue()).toBe('litre');
    const saved = patched(page);
    await page.getByLabel('Per').selectOption({ label: 'm²' });
    expect((await saved).status()).toBe(200);
    await page.goto('/finishes');
    await page.getByText('16.50 / m²').waitFor();
    await context.close();
  });
});
