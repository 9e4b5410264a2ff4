// Browser test of the first sign-in, from the app's address and from a deep link: it works on the
// first try and lands where it was going.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser } from './lib/browser';
import { newPage, PASSWORD, signUpThroughForm } from './lib/session';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(() => browser?.close());

async function typeSignIn(page: Page, email: string) {
  await page.getByLabel('E-mail').click();
  await page.keyboard.type(email);
  await page.getByLabel('Password').click();
  await page.keyboard.type(PASSWORD);
  await page.keyboard.press('Enter');
}

describe('first sign-in', () => {
  it('from the app’s address and from a deep link signs in on the first try and lands where it was going', async () => {
    const owner = await newPage(browser);
    const email = await signUpThroughForm(owner.page, 'Deep Link Studio');
    const projectId = await owner.page.evaluate(async () => {
      const res = await fetch('/api/projects', {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({ name: 'Mill house', newClient: { name: 'Mill client' } }),
      });
      return (await res.json()).project.id as string;
    });
    await owner.context.close();

    const first = await newPage(browser);
    await first.page.goto('/');
    await first.page.waitForURL(/\/sign-in\?next=/);
    await typeSignIn(first.page, email);
    await first.page.getByRole('heading', { name: 'Projects' }).waitFor();
    expect(new URL(first.page.url()).pathname).toBe('/projects');
    await first.context.close();

    const deep = await newPage(browser);
    await deep.page.goto(`/projects/${projectId}`);
    await deep.page.waitForURL(/\/sign-in\?next=/);
    await typeSignIn(deep.page, email);
    await deep.page.getByRole('heading', { name: 'Mill house' }).waitFor();
    expect(new URL(deep.page.url()).pathname).toBe(`/projects/${projectId}`);
    await deep.context.close();

    // `next` pointing at another site is ignored.
    const away = await newPage(browser);
    await away.page.goto('/sign-in?next=%2F%2Felsewhere.example%2Fsteal');
    await typeSignIn(away.page, email);
    await away.page.getByRole('heading', { name: 'Projects' }).waitFor();
    expect(new URL(away.page.url()).pathname).toBe('/projects');
    await away.context.close();
  });
});
