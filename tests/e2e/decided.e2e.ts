// A decided project as the designer and the client meet it: Mark as decided names what it freezes
// before it does; the chosen option opens read-only in the editor with Duplicate to change; Reopen
// asks first and records who and when; and the client's page marks an option saved since the link
// was made as changed, until the client has seen it.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdirSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type { Browser, Locator, Page } from 'playwright-core';
import { launchBrowser } from './lib/browser';
import { newPage, signUpThroughForm, uniqueEmail } from './lib/session';

const shots = join(resolve(import.meta.dirname, '../..'), '.test-output', 'decided');

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
  mkdirSync(shots, { recursive: true });
});
afterAll(() => browser?.close());

/** Types into the field, presses Enter, and waits until the option holding it is saved. */
async function typeThenEnter(page: Page, field: Locator, text: string, optionId?: string) {
  const put = page.waitForResponse(
    (r) =>
      r.request().method() === 'PUT' &&
      (optionId ? r.url().endsWith(`/api/options/${optionId}`) : r.url().includes('/api/options/')),
  );
  await field.click();
  await page.keyboard.press('Control+A');
  await page.keyboard.type(text);
  await page.keyboard.press('Enter');
  expect((await put).status()).toBe(200);
  await page.locator('[data-testid=save-state][data-state=saved]').waitFor({ timeout: 15000 });
}

/** One room with two options, shown in a presentation: made through the API as the signed-in designer. */
async function presentedRoom(page: Page, email: string) {
  return page.evaluate(async (clientEmail) => {
    const call = async (path: string, method: string, body: object) => {
      const res = await fetch(path, { method, headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) });
      if (!res.ok) throw new Error(`${method} ${path}: ${res.status} ${await res.text()}`);
      return res.json();
    };
    const { project } = await call('/api/projects', 'POST', {
      name: 'Quayside flat',
      newClient: { name: 'Orla Penhallow', email: clientEmail },
    });
    const made = await call(`/api/projects/${project.id}/rooms`, 'POST', {
      name: 'Sitting room',
      shell: {
        outline: [
          [0, 0],
          [4200, 0],
          [4200, 3600],
          [0, 3600],
        ],
        openings: [],
      },
    });
    const second = await call(`/api/rooms/${made.room.id}/options`, 'POST', { name: 'Around the hearth' });
    const options = [made.options[0], second.option];
    const names = ['Window seat', 'Around the hearth'];
    for (const [i, o] of options.entries()) {
      await call(`/api/options/${o.id}`, 'PUT', {
        name: names[i],
        doc: { pieces: [{ id: 'sofa', name: 'Sofa', x: 2100, y: 2800, width: 1900, depth: 900, height: 800, status: 'new' }] },
        version: o.version,
      });
    }
    const { presentation } = await call(`/api/projects/${project.id}/presentations`, 'POST', {
      rooms: [{ roomId: made.room.id, optionIds: options.map((o) => o.id) }],
    });
    return {
      projectId: project.id as string,
      roomId: made.room.id as string,
      optionIds: options.map((o) => o.id as string),
      link: presentation.link as string,
    };
  }, email);
}

describe('a decided project', () => {
  it('asks before deciding, opens the chosen option read-only, reopens with a record, and tells the client what changed', async () => {
    const designer = await newPage(browser);
    await signUpThroughForm(designer.page, 'Harbour Row Studio', 'Wren Designer');
    const { page } = designer;
    const p = await presentedRoom(page, uniqueEmail('client'));
    const token = p.link.split('/p/')[1];

    // The client chooses Option B from their own browser.
    const client = await newPage(browser);
    const chose = await client.context.request.put(`/api/p/${token}/rooms/${p.roomId}/choice`, {
      data: { optionId: p.optionIds[1], comment: '' },
    });
    expect(chose.status()).toBe(200);

    // Mark as decided: a confirmation naming the room and the option it freezes; "Not yet" changes nothing.
    await page.goto(`/projects/${p.projectId}`);
    await page.getByText('1 of 1 chosen').waitFor();
    await page.getByRole('button', { name: 'Mark as decided' }).click();
    const confirm = page.getByRole('dialog');
    await confirm.getByRole('heading', { name: 'Mark the project as decided?' }).waitFor();
    expect(await confirm.getByRole('list', { name: 'Options to be frozen' }).innerText()).toBe(
      'Sitting room: Option B · Around the hearth',
    );
    await page.screenshot({ path: join(shots, 'decide-confirm.png') });
    await confirm.getByRole('button', { name: 'Not yet' }).click();
    expect(await page.getByText('presented', { exact: true }).isVisible()).toBe(true);
    await page.getByRole('button', { name: 'Mark as decided' }).click();
    await page.getByRole('dialog').getByRole('button', { name: 'Mark as decided' }).click();
    await page.getByText('The project is decided').waitFor();
    expect(await page.getByRole('button', { name: 'New presentation' }).count()).toBe(0);
    expect(await page.getByRole('button', { name: 'Reopen' }).isVisible()).toBe(true);

    // The editor: the chosen option is read-only with Duplicate to change; the other keeps its pieces editable.
    await page.getByRole('link', { name: /Sitting room/ }).click();
    await page.getByRole('heading', { name: 'Sitting room' }).waitFor();
    const banner = page.getByTestId('decided-banner');
    await banner.getByText('This option can still change').waitFor();
    await page.getByRole('tab', { name: 'Option B · Around the hearth · chosen' }).click();
    await banner.getByText('The client chose this option, so it is read-only').waitFor();
    await page.getByRole('button', { name: /Furnish/ }).click();
    await page.getByTestId('piece-sofa').click();
    expect(await page.getByLabel('Name').isDisabled()).toBe(true);
    expect(await page.getByRole('button', { name: 'Add Armchair' }).count()).toBe(0);
    await page.getByRole('button', { name: /Outline/ }).click();
    expect(await page.getByLabel('Ceiling height').isDisabled()).toBe(true);
    await page.screenshot({ path: join(shots, 'editor-chosen.png') });

    await banner.getByRole('button', { name: 'Duplicate to change' }).click();
    await page.getByRole('tab', { name: 'Option C', exact: true, selected: true }).waitFor();
    await banner.getByText('This option can still change').waitFor();
    await page.getByRole('button', { name: /Furnish/ }).click();
    await page.getByTestId('piece-sofa').click();
    await typeThenEnter(page, page.getByLabel('Name'), 'Green sofa');

    // Reopen asks first, then records who and when.
    await page.getByRole('link', { name: 'Back to the project' }).click();
    await page.getByRole('button', { name: 'Reopen' }).click();
    await page.getByRole('dialog').getByRole('heading', { name: 'Reopen this project?' }).waitFor();
    await page.screenshot({ path: join(shots, 'reopen-confirm.png') });
    await page.getByRole('dialog').getByRole('button', { name: 'Reopen' }).click();
    await page
      .getByTestId('reopened')
      .getByText(/^Reopened by Wren Designer on /)
      .waitFor();
    expect(await page.getByText('presented', { exact: true }).isVisible()).toBe(true);
    expect(await page.getByRole('button', { name: 'Reopen' }).count()).toBe(0);

    // Reopened, Option B changes again: its piece renamed in the editor.
    await page.getByRole('link', { name: /Sitting room/ }).click();
    await page.getByRole('tab', { name: 'Option B · Around the hearth', exact: true }).click();
    expect(await page.getByTestId('decided-banner').count()).toBe(0);
    await page.getByTestId('piece-sofa').click();
    await typeThenEnter(page, page.getByLabel('Name'), 'Corner sofa', p.optionIds[1]);
    await page.getByRole('link', { name: 'Back to the project' }).click();
    await page.getByText('changed since the link was made').first().waitFor();
    await page.screenshot({ path: join(shots, 'project-changed.png'), fullPage: true });
    expect(await page.getByText('changed since the link was made').count()).toBe(1);

    // The client's page: Option B is marked as changed, Option A is not.
    await client.page.goto(p.link);
    await client.page.getByText('Changed since you last saw it: Option B · Around the hearth').waitFor();
    await client.page.screenshot({ path: join(shots, 'client-welcome-changed.png') });
    await client.page.getByRole('button', { name: 'See your choices' }).click();
    const options = client.page.getByRole('group', { name: 'Options' });
    const optionB = options.getByRole('button', { name: /Option B · Around the hearth/ });
    await optionB.getByText('Changed since you last saw it').waitFor();
    expect(
      await options
        .getByRole('button', { name: /Option A/ })
        .getByText('Changed since you last saw it')
        .count(),
    ).toBe(0);
    await client.page.screenshot({ path: join(shots, 'client-changed.png') });
    // Seen now: the next visit no longer marks it.
    await optionB.click();
    await client.page.getByText('Corner sofa').first().waitFor();
    expect(await optionB.getByText('Changed since you last saw it').isVisible()).toBe(true);
    await client.page.reload();
    await options.getByRole('button', { name: /Option B/ }).waitFor();
    expect(await client.page.getByText(/Changed since you last saw it/).count()).toBe(0);

    await client.context.close();
    await designer.context.close();
  }, 180_000);
});
