// The Outbox as the studio's sent mail: in the studio's top bar, one page of e-mails at a time
// with older ones on request, invitations for owners only, and nothing for a visitor signed out.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdirSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type { Browser } from 'playwright-core';
import { launchBrowser } from './lib/browser';
import { inviteAndAccept, newPage, signUpThroughForm, uniqueEmail } from './lib/session';

const shots = join(resolve(import.meta.dirname, '../..'), '.test-output', 'outbox');
let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
  mkdirSync(shots, { recursive: true });
});
afterAll(() => browser?.close());

describe('the Outbox', () => {
  it('pages through the studio’s sent mail and keeps invitations from a designer', async () => {
    const owner = await newPage(browser);
    await signUpThroughForm(owner.page, 'Sedge Studio');
    const designer = await inviteAndAccept(browser, owner.page, 'designer', 'Dara Designer');
    // Twenty-one more invitations, so the list runs past one page of 20.
    const invited = Array.from({ length: 21 }, () => uniqueEmail('pending'));
    await owner.page.evaluate(async (emails) => {
      for (const email of emails) {
        const res = await fetch('/api/studio/invites', {
          method: 'POST',
          headers: { 'content-type': 'application/json' },
          body: JSON.stringify({ email, role: 'viewer' }),
        });
        if (res.status !== 201) throw new Error(`invite: ${res.status}`);
      }
    }, invited);
    // Invitations' mail goes through the job queue: wait until every one has gone.
    await expect
      .poll(
        () =>
          owner.page.evaluate(async () => {
            const { invites } = (await (await fetch('/api/studio/invites')).json()) as { invites: { mailState?: string }[] };
            return invites.filter((i) => i.mailState !== 'sent').length;
          }),
        { timeout: 30_000 },
      )
      .toBe(0);

    // From the top bar, as from any page of the studio.
    await owner.page.goto('/projects');
    await owner.page.getByRole('navigation', { name: 'Studio' }).getByRole('link', { name: 'Outbox' }).click();
    await owner.page.getByRole('heading', { name: 'Outbox' }).waitFor();
    const list = owner.page.getByRole('list', { name: 'Sent e-mails' });
    await expect.poll(() => list.getByRole('listitem').count(), { timeout: 15_000 }).toBe(20);
    // Newest first: the last invitation heads the list, the designer's own is on the next page.
    expect(await list.getByRole('listitem').first().textContent()).toContain(invited[20]);
    expect(await list.getByText(`To ${designer.email}`).count()).toBe(0);
    await owner.page.screenshot({ path: join(shots, 'owner-first-page.png') });
    await owner.page.getByRole('button', { name: 'Show older e-mails' }).click();
    await expect.poll(() => list.getByRole('listitem').count(), { timeout: 15_000 }).toBe(22);
    await list.getByText(`To ${designer.email}`).waitFor();
    expect(await owner.page.getByRole('button', { name: 'Show older e-mails' }).count()).toBe(0);

    // The designer's Outbox has the studio's mail, but no invitation.
    await designer.page.goto('/outbox');
    await designer.page.getByText('Invitations are shown to owners only.').waitFor();
    await designer.page.getByText('No e-mails yet.').waitFor();
    await designer.page.screenshot({ path: join(shots, 'designer-empty.png') });

    // Signed out, the page sends the visitor to sign in.
    const visitor = await newPage(browser);
    await visitor.page.goto('/outbox');
    await visitor.page.getByRole('heading', { name: 'Sign in' }).waitFor();
    await visitor.context.close();
    await designer.context.close();
    await owner.context.close();
  }, 180_000);
});
