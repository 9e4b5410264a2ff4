// Keyboard only: the designer signs in, opens the project and sends a presentation without the
// mouse; the client opens the link, turns the room and walks in it, looks at every option, reads
// a piece's details and chooses, with Tab, Enter, Space and the number keys alone.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser } from './lib/browser';
import { newPage, PASSWORD, signUpThroughForm, uniqueEmail } from './lib/session';

/** More Tabs than any page here has stops: a control never reached fails the test. */
const MAX_TABS = 80;

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(() => browser?.close());

/** The focused element's accessible name, near enough: aria-label, labelledby, label, or text. */
const focusedName = (page: Page) =>
  page.evaluate(() => {
    const el = document.activeElement as HTMLElement | null;
    if (!el || el === document.body) return '';
    const byIds = (el.getAttribute('aria-labelledby') ?? '')
      .split(/\s+/)
      .map((id) => document.getElementById(id)?.innerText ?? '')
      .join(' ');
    const labels = 'labels' in el ? [...((el as HTMLInputElement).labels ?? [])].map((l) => l.innerText).join(' ') : '';
    return (el.getAttribute('aria-label') || byIds.trim() || labels || el.innerText || '').replace(/\s+/g, ' ').trim();
  });

/** Presses Tab until the focused control's name matches; the control must be visible. */
async function tabTo(page: Page, name: RegExp, key: 'Tab' | 'Shift+Tab' = 'Tab'): Promise<void> {
  for (let i = 0; i < MAX_TABS; i += 1) {
    await page.keyboard.press(key);
    if (name.test(await focusedName(page))) {
      expect(await page.evaluate(() => (document.activeElement as HTMLElement).getBoundingClientRect().width > 0)).toBe(true);
      return;
    }
  }
  throw new Error(`Tab never reached a control named ${name}`);
}

const SHELL = {
  outline: [
    [0, 0],
    [4000, 0],
    [4000, 3400],
    [0, 3400],
  ],
  openings: [{ id: 'd1', type: 'door', wall: 0, offset: 400, width: 820, height: 2040, hinge: 'start', swing: 'in' }],
};

async function makeProject(page: Page, clientEmail: string): Promise<string> {
  return page.evaluate(
    async ({ email, shell }) => {
      const call = async (path: string, method: string, body: object) => {
        const res = await fetch(path, { method, headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) });
        if (!res.ok) throw new Error(`${method} ${path}: ${res.status} ${await res.text()}`);
        return res.json();
      };
      const { project } = await call('/api/projects', 'POST', {
        name: 'Keyside cottage',
        newClient: { name: 'Tove Keyes', email },
      });
      for (const name of ['Snug', 'Study']) {
        const made = await call(`/api/projects/${project.id}/rooms`, 'POST', { name, shell });
        const second = await call(`/api/rooms/${made.room.id}/options`, 'POST', { name: 'Second thoughts' });
        for (const [i, o] of [made.options[0], second.option].entries()) {
          const pieces = [
            {
              id: `sofa${i}`,
              name: i ? 'Corner sofa' : 'Two-seat sofa',
              x: 2000,
              y: 2800,
              width: 1800,
              depth: 900,
              height: 820,
              rotation: 180,
              status: 'new',
            },
          ];
          await call(`/api/options/${o.id}`, 'PUT', {
            name: i ? 'Second thoughts' : 'First idea',
            doc: { pieces },
            version: o.version,
          });
        }
      }
      return project.id as string;
    },
    { email: clientEmail, shell: SHELL },
  );
}

describe('keyboard only', () => {
  it('goes from sign-in to a sent presentation, and the client looks round and chooses', async () => {
    const clientEmail = uniqueEmail('client');
    const setup = await newPage(browser);
    const email = await signUpThroughForm(setup.page, 'Tab & Key Studio');
    await makeProject(setup.page, clientEmail);
    await setup.context.close();

    // The designer, from a fresh sign-in page, never touching the mouse.
    const { context, page } = await newPage(browser);
    await page.goto('/sign-in');
    await tabTo(page, /^E-mail/);
    await page.keyboard.type(email);
    await tabTo(page, /^Password/);
    await page.keyboard.type(PASSWORD);
    await page.keyboard.press('Enter');
    await page.getByRole('heading', { name: 'Projects' }).waitFor();
    await tabTo(page, /Keyside cottage/);
    await page.keyboard.press('Enter');
    await page.getByRole('heading', { name: 'Keyside cottage' }).waitFor();
    await tabTo(page, /^New presentation$/);
    await page.keyboard.press('Enter');
    const dialog = page.getByRole('dialog');
    await dialog.getByText('Snug').waitFor();
    await tabTo(page, /^Message to the client/);
    await page.keyboard.type('Two rooms, two ideas each.');
    await tabTo(page, /^Show prices to the client/);
    await page.keyboard.press('Space');
    expect(await dialog.getByLabel('Show prices to the client').isChecked()).toBe(true);
    await tabTo(page, /^Create and send$/);
    await page.keyboard.press('Enter');
    await page.getByText(`Sent to ${clientEmail}.`).waitFor();
    const link = await page.evaluate(async () => {
      const projectId = window.location.pathname.split('/')[2];
      const res = await fetch(`/api/projects/${projectId}/presentations`);
      return ((await res.json()) as { presentations: { link: string }[] }).presentations[0].link;
    });
    await context.close();

    // The client, keyboard only.
    const client = await newPage(browser);
    const p = client.page;
    await p.goto(link);
    await p.getByRole('heading', { name: 'Your options for Keyside cottage' }).waitFor();
    await tabTo(p, /^Start looking$/);
    await p.keyboard.press('Enter');
    await p.getByRole('heading', { name: 'Snug' }).waitFor();
    // Look round the 3D view: the on-screen moves, then walking, each from the keyboard.
    const view = p.locator('[data-testid=room-view][data-camera]');
    await view.waitFor({ timeout: 30_000 });
    const camera = () => view.getAttribute('data-camera');
    const overviewStart = await camera();
    await tabTo(p, /^Turn the room right$/);
    await p.keyboard.press('Enter');
    await expect.poll(camera, { timeout: 10_000 }).not.toBe(overviewStart);
    await tabTo(p, /^Walk$/);
    await p.keyboard.press('Enter');
    await expect.poll(() => view.getAttribute('data-mode'), { timeout: 10_000 }).toBe('walk');
    const walkStart = await camera();
    await tabTo(p, /^Walk forward$/);
    await p.keyboard.press('Enter');
    await expect.poll(camera, { timeout: 10_000 }).not.toBe(walkStart);
    await tabTo(p, /^Overview$/, 'Shift+Tab');
    await p.keyboard.press('Enter');
    await expect.poll(() => view.getAttribute('data-mode'), { timeout: 10_000 }).toBe('overview');
    const options = p.getByRole('group', { name: 'Options' });
    // The number keys switch options; Tab and Space reach them too.
    await p.keyboard.press('2');
    expect(await options.getByRole('button', { name: /Option B/ }).getAttribute('aria-pressed')).toBe('true');
    await tabTo(p, /Option A/);
    await p.keyboard.press('Space');
    expect(await options.getByRole('button', { name: /Option A/ }).getAttribute('aria-pressed')).toBe('true');
    // A piece's details open from the list and close again.
    await tabTo(p, /Two-seat sofa/);
    await p.keyboard.press('Enter');
    await p.getByRole('button', { name: 'Close the piece details' }).waitFor();
    await tabTo(p, /^Close the piece details$/);
    await p.keyboard.press('Enter');
    await p.getByRole('button', { name: 'Close the piece details' }).waitFor({ state: 'detached' });
    // Escape closes them too.
    await tabTo(p, /Two-seat sofa/);
    await p.keyboard.press('Enter');
    await p.getByRole('button', { name: 'Close the piece details' }).waitFor();
    await p.keyboard.press('Escape');
    await p.getByRole('button', { name: 'Close the piece details' }).waitFor({ state: 'detached' });
    // Choose with a comment.
    await p.keyboard.press('2');
    await tabTo(p, /^Choose this option$/);
    await p.keyboard.press('Enter');
    const choose = p.getByRole('dialog');
    await choose.getByLabel(/A comment for/).waitFor();
    await p.keyboard.type('The corner sofa, please.');
    await tabTo(p, /^Choose this option$/);
    await p.keyboard.press('Enter');
    await tabTo(p, /^Go on to Study$/);
    await p.keyboard.press('Enter');
    await p.getByRole('heading', { name: 'Study' }).waitFor();
    // The rooms' own tabs are reachable too.
    await tabTo(p, /^Snug/, 'Shift+Tab');
    await p.keyboard.press('Enter');
    await p.getByRole('heading', { name: 'Snug' }).waitFor();
    await p.getByText('The corner sofa, please.').waitFor();
    await client.context.close();
  }, 120_000);
});
