// A presentation from the designer's project page to the client's choice and back: made and sent
// through the form, its link copied from the Outbox by the designer and opened in the client's own
// browser (which cannot read the Outbox), options switched by click and by key, one chosen with a
// comment, the choice and its e-mail seen by the designer, then decided.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdirSync, readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser } from './lib/browser';
import { copyLinkFromOutbox, newPage, signUpThroughForm, uniqueEmail } from './lib/session';

const root = resolve(import.meta.dirname, '../..');
const shots = join(root, '.test-output', 'presentations');

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
  mkdirSync(shots, { recursive: true });
});
afterAll(() => browser?.close());

interface Manifest {
  [key: string]: { file: string; imports?: string[]; dynamicImports?: string[]; isEntry?: boolean };
}

/** Every JS file the presentation entry can load, by the build's own manifest. */
function presentationFiles(): { allowed: Set<string>; appEntry: string } {
  const manifest = JSON.parse(readFileSync(join(root, 'dist/.vite/manifest.json'), 'utf8')) as Manifest;
  const allowed = new Set<string>();
  const walk = (key: string) => {
    const chunk = manifest[key];
    if (!chunk || allowed.has(chunk.file)) return;
    allowed.add(chunk.file);
    for (const k of [...(chunk.imports ?? []), ...(chunk.dynamicImports ?? [])]) walk(k);
  };
  walk('src/features/client-page/presentation.html');
  return { allowed, appEntry: manifest['index.html'].file };
}

const SHELL = (w: number, h: number) => ({
  outline: [
    [0, 0],
    [w, 0],
    [w, h],
    [0, h],
  ],
  openings: [{ id: 'd1', type: 'door', wall: 0, offset: 400, width: 820, height: 2040, hinge: 'start', swing: 'in' }],
});
const box = (id: string, name: string, x: number, y: number, w: number, d: number, h: number, extra: object = {}) => ({
  id,
  name,
  x,
  y,
  width: w,
  depth: d,
  height: h,
  status: 'new',
  ...extra,
});

/** A project with two rooms of two named options each, made through the API as the signed-in designer. */
async function makeProject(page: Page, clientEmail: string): Promise<string> {
  return page.evaluate(
    async ({ email, rooms }) => {
      const call = async (path: string, method: string, body: object) => {
        const res = await fetch(path, { method, headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) });
        if (!res.ok) throw new Error(`${method} ${path}: ${res.status} ${await res.text()}`);
        return res.json();
      };
      const { project } = await call('/api/projects', 'POST', {
        name: 'Fernhill cottage',
        newClient: { name: 'Juno and Amir Castellane', email },
      });
      for (const r of rooms) {
        const made = await call(`/api/projects/${project.id}/rooms`, 'POST', { name: r.name, shell: r.shell });
        const second = await call(`/api/rooms/${made.room.id}/options`, 'POST', { name: r.options[1].name });
        const ids = [made.options[0], second.option];
        for (const [i, o] of ids.entries()) {
          await call(`/api/options/${o.id}`, 'PUT', {
            name: r.options[i].name,
            note: r.options[i].note,
            doc: { pieces: r.options[i].pieces },
            version: o.version,
          });
        }
      }
      return project.id as string;
    },
    {
      email: clientEmail,
      rooms: [
        {
          name: 'Sitting room',
          shell: SHELL(4600, 3800),
          options: [
            {
              name: 'Window seat',
              note: 'The sofa under the window, the reading chair by the stove.',
              pieces: [
                box('sofa', 'Two-seat sofa', 2300, 3300, 1800, 900, 820, {
                  price: 1280,
                  supplierUrl: 'https://supplier.example/sofa',
                  rotation: 180,
                }),
                box('chair', 'Reading chair', 900, 1200, 800, 800, 900, { status: 'existing' }),
              ],
            },
            {
              name: 'Around the hearth',
              note: 'Two sofas facing each other across a low table.',
              pieces: [
                box('sofa-a', 'Three-seat sofa', 1000, 1900, 2100, 900, 820, { price: 1650, rotation: 90 }),
                box('sofa-b', 'Loveseat', 3600, 1900, 1500, 880, 820, { price: 990, rotation: 270 }),
                box('table', 'Low table', 2300, 1900, 1100, 600, 420, { price: 340 }),
              ],
            },
          ],
        },
        {
          name: 'Bedroom',
          shell: SHELL(3600, 3400),
          options: [
            {
              name: 'Bed on the long wall',
              note: '',
              pieces: [box('bed', 'Double bed', 1800, 1100, 1400, 2000, 1000, { price: 900 })],
            },
            {
              name: 'Bed facing the window',
              note: '',
              pieces: [box('bed', 'Double bed', 1100, 1700, 1400, 2000, 1000, { price: 900, rotation: 90 })],
            },
          ],
        },
      ],
    },
  );
}

const pressed = (page: Page, name: RegExp) =>
  page.getByRole('group', { name: 'Options' }).getByRole('button', { name }).getAttribute('aria-pressed');

describe('presentations', () => {
  it('the designer sends one; the client opens the link the designer copied from the Outbox, compares, chooses; the designer sees it and marks the project decided', async () => {
    const clientEmail = uniqueEmail('client');
    const designer = await newPage(browser);
    const designerEmail = await signUpThroughForm(designer.page, 'Alder Lane Studio', 'Maud Designer');
    const projectId = await makeProject(designer.page, clientEmail);

    // Designer: a new presentation through the form, e-mailed to the client.
    await designer.page.goto(`/projects/${projectId}`);
    await designer.page.getByText('No presentations yet.').waitFor();
    await designer.page.getByRole('button', { name: 'New presentation' }).click();
    const form = designer.page.getByRole('dialog');
    await form.getByText('Sitting room').waitFor();
    await form
      .getByLabel('Message to the client')
      .fill('Two ideas for each room. Have a wander round and tell us which feels right.');
    await form.getByLabel('Show prices to the client').check();
    await form.getByRole('button', { name: 'Move Sitting room down' }).click();
    await form.getByRole('button', { name: 'Move Bedroom down' }).waitFor();
    // Back again: the sitting room first.
    await form.getByRole('button', { name: 'Move Sitting room up' }).click();
    await form.getByRole('button', { name: 'Create and send' }).click();
    await designer.page.getByText(`Sent to ${clientEmail}.`).waitFor();
    await designer.page.getByText('presented', { exact: true }).waitFor();
    await designer.page.screenshot({ path: join(shots, 'designer-sent.png'), fullPage: true });

    // The designer (the studio's owner) copies the link from the Outbox, as from a sent-mail folder.
    const href = await copyLinkFromOutbox(designer.page, clientEmail, /\/p\//);
    expect(href).toMatch(/\/p\/[\w-]+\.[\w-]+\.[\w-]+$/);

    // Client: a fresh browser that was never signed in. The Outbox is not theirs to read.
    const client = await newPage(browser);
    await client.page.goto('/outbox');
    await client.page.getByRole('heading', { name: 'Sign in' }).waitFor();
    expect(await client.page.evaluate(async () => (await fetch('/api/outbox')).status)).toBe(401);
    const scripts: string[] = [];
    client.page.on('response', (r) => {
      const url = new URL(r.url());
      if (url.pathname.endsWith('.js')) scripts.push(url.pathname.slice(1));
    });
    // The link as it arrives in the client's mail: typed or clicked into their own browser.
    scripts.length = 0;
    await client.page.goto(href);

    await client.page.getByRole('heading', { name: 'Your options for Fernhill cottage' }).waitFor();
    expect(await client.page.getByText('From Alder Lane Studio').isVisible()).toBe(true);
    expect(await client.page.getByText('Two ideas for each room.').isVisible()).toBe(true);
    expect(await client.page.getByText(/not a construction drawing/).isVisible()).toBe(true);
    await client.page.screenshot({ path: join(shots, 'client-welcome.png'), fullPage: true });

    await client.page.getByRole('button', { name: 'Start looking' }).click();
    await client.page.getByRole('heading', { name: 'Sitting room' }).waitFor();
    const view = client.page.locator('[data-testid=room-view][data-draw-calls]');
    await view.waitFor({ timeout: 30000 });
    expect(Number(await view.getAttribute('data-draw-calls'))).toBeGreaterThan(3);
    expect(await pressed(client.page, /Option A · Window seat/)).toBe('true');
    expect(await client.page.getByText('The sofa under the window').isVisible()).toBe(true);

    // One click, then the keys.
    await client.page
      .getByRole('group', { name: 'Options' })
      .getByRole('button', { name: /Option B · Around the hearth/ })
      .click();
    expect(await pressed(client.page, /Option B/)).toBe('true');
    await client.page.getByText('Two sofas facing each other').waitFor();
    await client.page.keyboard.press('1');
    await expect.poll(() => pressed(client.page, /Option A/)).toBe('true');
    await client.page.keyboard.press('2');
    await expect.poll(() => pressed(client.page, /Option B/)).toBe('true');
    expect(await client.page.getByRole('region', { name: 'Sitting room, Option B · Around the hearth, in 3D' }).count()).toBe(1);

    // A piece: name, size and (shown) price; never the supplier link.
    await client.page.getByRole('button', { name: 'Loveseat' }).click();
    await client.page.getByRole('heading', { name: 'Loveseat' }).waitFor();
    expect(await client.page.getByText('150 × 88 × 82 cm').isVisible()).toBe(true);
    expect(await client.page.getByText('£990.00', { exact: true }).isVisible()).toBe(true);
    await client.page.waitForTimeout(300);
    await client.page.screenshot({ path: join(shots, 'client-room.png') });

    // Choose this option, with a comment.
    await client.page.getByRole('button', { name: 'Choose this option' }).click();
    const choose = client.page.getByRole('dialog');
    await choose.getByText('you are choosing').waitFor();
    await choose
      .getByLabel('A comment for Alder Lane Studio (optional)')
      .fill('The hearth one, please. Could the loveseat be green?');
    await client.page.screenshot({ path: join(shots, 'client-choose.png') });
    await choose.getByRole('button', { name: 'Choose this option' }).click();
    await choose.getByText('Thank you').waitFor();
    await choose.getByRole('button', { name: 'Go on to Bedroom' }).click();
    await client.page.getByRole('heading', { name: 'Bedroom' }).waitFor();
    await client.page.getByText('1 of 2 rooms chosen').waitFor();
    await client.page.getByRole('button', { name: 'Choose this option' }).click();
    await client.page.getByRole('dialog').getByRole('button', { name: 'Choose this option' }).click();
    await client.page.getByRole('dialog').getByRole('button', { name: 'See all your choices' }).click();
    await client.page.getByText('You chose Option A · Bed on the long wall').waitFor();
    await client.page.getByText('2 of 2 rooms chosen').waitFor();

    // The page loaded only the presentation entry's own chunks: never the designer's app.
    const { allowed, appEntry } = presentationFiles();
    expect(scripts.length).toBeGreaterThan(0);
    expect(scripts).not.toContain(appEntry);
    expect(scripts.filter((s) => !allowed.has(s))).toEqual([]);

    // Designer: the choice on the project page and the e-mail in the Outbox.
    await designer.page.goto(`/projects/${projectId}`);
    const item = designer.page.getByRole('listitem', { name: /Presentation of/ });
    await item.getByText('2 of 2 chosen').waitFor();
    expect(await item.getByText('“The hearth one, please. Could the loveseat be green?”').isVisible()).toBe(true);
    expect(await item.getByText(/Opened 1 time/).isVisible()).toBe(true);
    expect(await item.getByText(`Sent to ${clientEmail}`, { exact: false }).isVisible()).toBe(true);
    // The designer's notice went through the job queue; the Mail card says once it has gone.
    const projectMail = designer.page.getByTestId('project-mail');
    await projectMail.getByText(`To ${designerEmail}`, { exact: false }).first().waitFor();
    await expect.poll(() => projectMail.getByText('Sending…', { exact: false }).count(), { timeout: 15_000 }).toBe(0);
    expect(await projectMail.getByText(`To ${designerEmail} · Sent`, { exact: false }).count()).toBe(2);
    await designer.page.screenshot({ path: join(shots, 'designer-choices.png'), fullPage: true });

    await designer.page.goto('/outbox');
    await designer.page
      .getByRole('link', {
        name: new RegExp(
          `To ${designerEmail.replace(/[.+]/g, '\\$&')}.*Juno and Amir Castellane chose Option B · Around the hearth for Sitting room \\(Fernhill cottage\\)`,
        ),
      })
      .click();
    await designer.page
      .getByText('Juno and Amir Castellane chose Option B · Around the hearth for Sitting room in Fernhill cottage.')
      .waitFor();

    // Mark as decided: the project is decided, and the client's page says so.
    await designer.page.goto(`/projects/${projectId}`);
    await designer.page.getByRole('button', { name: 'Mark as decided' }).click();
    await designer.page.getByRole('dialog').getByRole('button', { name: 'Mark as decided' }).click();
    await designer.page.getByText('The project is decided').waitFor();
    expect(await designer.page.getByText('decided', { exact: true }).first().isVisible()).toBe(true);

    await client.page.reload();
    await client.page.getByText('Alder Lane Studio has confirmed your choices.').waitFor();
    await client.page.getByRole('button', { name: 'See your choices' }).click();
    await client.page.getByRole('heading', { name: 'Sitting room' }).waitFor();
    expect(await client.page.getByRole('button', { name: 'Choose this option' }).count()).toBe(0);

    // Withdrawn: the same link now shows a calm refusal and nothing of the presentation.
    await designer.page.getByRole('button', { name: 'Withdraw' }).click();
    await designer.page.getByRole('dialog').getByRole('button', { name: 'Withdraw' }).click();
    await designer.page.getByText('withdrawn', { exact: true }).waitFor();
    await client.page.reload();
    await client.page.getByRole('heading', { name: 'This link is closed' }).waitFor();
    expect(await client.page.getByText('Fernhill').count()).toBe(0);
    await client.page.screenshot({ path: join(shots, 'client-withdrawn.png') });

    await client.context.close();
    await designer.context.close();
  }, 180_000); // the whole journey in two browsers with 3D, on a shared machine

  it('a tampered link shows the friendly refusal', async () => {
    const { context, page } = await newPage(browser);
    await page.goto('/p/eyJhbGciOiJub25lIn0.eyJqdGkiOiJ4In0.');
    await page.getByRole('heading', { name: 'This link does not work' }).waitFor();
    expect(await page.getByText(/ask your designer for a new one/).isVisible()).toBe(true);
    // The title is not repeated as the first sentence.
    expect(await page.getByText('This link does not work').count()).toBe(1);
    await context.close();
  });
});
