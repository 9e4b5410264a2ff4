// Browser test of a studio from sign-up to its first project: sign-up and sign-in, form errors,
// a client and a project a viewer cannot change, and a designer invited through the Outbox.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchBrowser } from './lib/browser';
import { inviteAndAccept, newPage, signInThroughForm, signUpThroughForm } from './lib/session';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(() => browser?.close());

describe('a studio from sign-up to its first project', () => {
  it('signs up, signs out and signs back in', async () => {
    const { context, page } = await newPage(browser);
    const email = await signUpThroughForm(page, 'Bramble Studio');
    expect(await page.getByText('Bramble Studio · owner').isVisible()).toBe(true);
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.getByRole('heading', { name: 'Sign in' }).waitFor();
    // Signed out means signed out: the projects page sends us back to sign-in.
    await page.goto('/projects');
    await page.getByRole('heading', { name: 'Sign in' }).waitFor();
    await signInThroughForm(page, email, 'not-my-password');
    await page.getByText('That e-mail and password do not match.').first().waitFor();
    await signInThroughForm(page, email);
    await page.getByRole('heading', { name: 'Projects' }).waitFor();
    await context.close();
  });

  it('shows each form error beside its field', async () => {
    const { context, page } = await newPage(browser);
    await page.goto('/sign-up');
    // The rule is shown under the field before anything is sent; an error takes its place.
    await page.getByText('At least 12 characters, and not a common password.').waitFor();
    await page.getByLabel('E-mail').fill('not-an-address');
    await page.getByLabel('Password').fill('short');
    await page.getByRole('button', { name: 'Create studio' }).click();
    await expect.poll(() => page.getByRole('alert').count()).toBeGreaterThanOrEqual(3);
    expect(await page.getByText('Use at least 12 characters.').isVisible()).toBe(true);
    expect(await page.getByText('Enter the studio name.').isVisible()).toBe(true);
    await context.close();
  });

  it('creates a client and a project, finds it by search, and a viewer cannot change it', async () => {
    const { context, page } = await newPage(browser);
    await signUpThroughForm(page, 'Hazel Rooms');
    await page.goto('/clients');
    await page.getByRole('button', { name: 'Add client' }).click();
    await page.getByRole('dialog').getByLabel('Name').fill('Rowan and Sam Pike');
    await page.getByRole('dialog').getByLabel('E-mail').fill('pikes@example.com');
    await page.getByRole('button', { name: 'Add client', exact: true }).last().click();
    await page.getByRole('cell', { name: 'Rowan and Sam Pike', exact: true }).waitFor();

    await page.goto('/projects');
    await page.getByRole('button', { name: 'New project' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByLabel('Project name').fill('Quay Street house');
    await dialog.getByLabel('Address').fill('9 Quay Street');
    await dialog.getByLabel('Client', { exact: true }).selectOption({ label: 'Rowan and Sam Pike' });
    await page.getByRole('button', { name: 'Create project' }).click();
    await page.getByRole('heading', { name: /Quay Street house/ }).waitFor();
    expect(await page.getByText('pikes@example.com').isVisible()).toBe(true);
    const projectUrl = page.url();

    await page.goto('/projects');
    await page.getByRole('searchbox', { name: 'Search projects' }).fill('pike');
    await page.getByRole('link', { name: 'Quay Street house' }).waitFor();
    await page.getByRole('searchbox', { name: 'Search projects' }).fill('nothing like it');
    await page.getByText('No project matches that search.').waitFor();

    const viewer = await inviteAndAccept(browser, page, 'viewer', 'Vic Viewer');
    await viewer.page.goto('/projects');
    await viewer.page.getByRole('link', { name: 'Quay Street house' }).waitFor();
    expect(await viewer.page.getByRole('button', { name: 'New project' }).count()).toBe(0);
    await viewer.page.goto(projectUrl);
    await viewer.page.getByRole('heading', { name: /Quay Street house/ }).waitFor();
    expect(await viewer.page.getByRole('button', { name: 'Edit details' }).count()).toBe(0);
    expect(await viewer.page.getByRole('button', { name: 'Archive' }).count()).toBe(0);
    // Even a hand-made request is refused.
    const status = await viewer.page.evaluate(async (url) => {
      const id = url.split('/').pop();
      const res = await fetch(`/api/projects/${id}`, {
        method: 'PATCH',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({ name: 'Hijacked' }),
      });
      return res.status;
    }, projectUrl);
    expect(status).toBe(403);
    await viewer.context.close();

    // A second studio sees neither the page nor the data behind it.
    const stranger = await newPage(browser);
    await signUpThroughForm(stranger.page, 'Other Studio');
    await stranger.page.goto(projectUrl);
    await stranger.page.getByText('That project was not found.').waitFor();
    const apiStatus = await stranger.page.evaluate(
      async (url) => (await fetch(`/api/projects/${url.split('/').pop()}`)).status,
      projectUrl,
    );
    expect(apiStatus).toBe(404);
    await stranger.context.close();
    await context.close();
  });

  it('invites a designer who joins by the link the owner copied from the Outbox, and can create projects', async () => {
    const { context, page } = await newPage(browser);
    await signUpThroughForm(page, 'Linden Studio');
    const designer = await inviteAndAccept(browser, page, 'designer', 'Dee Designer');
    expect(await designer.page.getByText('Linden Studio · designer').isVisible()).toBe(true);
    expect(await designer.page.getByRole('button', { name: 'New project' }).isVisible()).toBe(true);
    // The owner copied the link in the Outbox; the new member is on the Studio page.
    await page.goto('/studio');
    await page.getByText('Dee Designer', { exact: true }).waitFor();
    await designer.context.close();
    await context.close();
  });
});
