// Helpers for the browser tests: unique e-mails, a fresh page, sign-up and sign-in through the
// forms, copying a link from the Outbox, and inviting a member who accepts.
import { inject } from 'vitest';
import type { Browser, BrowserContext, Page } from 'playwright-core';

let n = 0;
export function uniqueEmail(tag: string): string {
  n += 1;
  return `${tag}-${Date.now().toString(36)}-${n}@e2e.parlour`;
}

export const PASSWORD = 'a-long-enough-password';

export async function newPage(browser: Browser): Promise<{ context: BrowserContext; page: Page }> {
  const context = await browser.newContext({ baseURL: inject('baseUrl'), viewport: { width: 1280, height: 800 } });
  const page = await context.newPage();
  return { context, page };
}

/** Signs up a new studio through the form; leaves the page on Projects. */
export async function signUpThroughForm(page: Page, studioName: string, name = 'Nell Owner') {
  const email = uniqueEmail('owner');
  await page.goto('/sign-up');
  await page.getByLabel('Studio name').fill(studioName);
  await page.getByLabel('Your name').fill(name);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(PASSWORD);
  await page.getByRole('button', { name: 'Create studio' }).click();
  await page.getByRole('heading', { name: 'Projects' }).waitFor();
  return email;
}

export async function signInThroughForm(page: Page, email: string, password = PASSWORD) {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

/**
 * The owner opens the e-mail sent to `to` in the Outbox, copies its link with Copy link and
 * returns it (read back from the clipboard), as one would before forwarding it.
 */
export async function copyLinkFromOutbox(ownerPage: Page, to: string, linkPath: RegExp): Promise<string> {
  await ownerPage.context().grantPermissions(['clipboard-read', 'clipboard-write'], { origin: inject('baseUrl') });
  await ownerPage.goto('/outbox');
  await ownerPage
    .getByRole('link', { name: new RegExp(`To ${to.replace(/[.+]/g, '\\$&')}`) })
    .first()
    .click();
  const shown = (await ownerPage.getByRole('link', { name: linkPath }).first().getAttribute('href'))!;
  await ownerPage
    .getByRole('button', { name: `Copy link for ${to}` })
    .first()
    .click();
  await ownerPage.getByText(`Copied. Send it to ${to}.`).waitFor();
  const copied = await ownerPage.evaluate(() => navigator.clipboard.readText());
  if (copied !== shown) throw new Error(`copied ${copied}, the e-mail shows ${shown}`);
  return copied;
}

/**
 * Invites `email` with `role` from the Studio page; the owner copies the link from the Outbox and
 * the invitee, in a browser of their own that was never signed in, opens it and joins.
 */
export async function inviteAndAccept(browser: Browser, ownerPage: Page, role: 'designer' | 'viewer', name: string) {
  const email = uniqueEmail(role);
  await ownerPage.goto('/studio');
  await ownerPage.getByRole('button', { name: 'Invite a member' }).click();
  await ownerPage.getByRole('dialog').getByLabel('E-mail').fill(email);
  await ownerPage.getByRole('dialog').getByLabel('Role').selectOption(role);
  await ownerPage.getByRole('button', { name: 'Send invitation' }).click();
  await ownerPage.getByText(email).waitFor();
  const link = await copyLinkFromOutbox(ownerPage, email, /\/invite\//);

  const { context, page } = await newPage(browser);
  await page.goto(link);
  await page.getByRole('heading', { name: /Join/ }).waitFor();
  await page.getByLabel('Your name').fill(name);
  await page.getByLabel('Choose a password').fill(PASSWORD);
  await page.getByRole('button', { name: 'Accept and join' }).click();
  await page.getByRole('heading', { name: 'Projects' }).waitFor();
  return { context, page, email };
}
