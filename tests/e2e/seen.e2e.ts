// Browser test of marking a fit-check finding as seen and intended: a pointer click on "Mark as seen",
// a note typed then a click elsewhere; the finding stays listed, muted with its note, after the open
// ones; Undo takes the mark off, Redo puts it back; a reload keeps it; Compare counts it apart.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchBrowser } from './lib/browser';
import { newPage, signUpThroughForm } from './lib/session';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(() => browser?.close());

const SWING = 'The wardrobe stands in the door’s swing';
const NOTE = 'Client keeps this door shut';

describe('a finding marked as seen', () => {
  it('stays listed, muted with its note, survives a reload, comes off with Undo and counts apart in Compare', async () => {
    const { context, page } = await newPage(browser);
    await signUpThroughForm(page, 'Seen Studio');
    const made = await page.evaluate(async () => {
      const json = (method: string, body: unknown) => ({
        method,
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify(body),
      });
      const project = (await (await fetch('/api/projects', json('POST', { name: 'Seen flat', newClient: { name: 'S' } }))).json())
        .project;
      const created = await (
        await fetch(
          `/api/projects/${project.id}/rooms`,
          json('POST', {
            name: 'Bedroom',
            shell: {
              outline: [
                [0, 0],
                [4000, 0],
                [4000, 3500],
                [0, 3500],
              ],
              openings: [{ id: 'd1', type: 'door', wall: 0, offset: 300, width: 820, height: 2040, hinge: 'start', swing: 'in' }],
            },
          }),
        )
      ).json();
      const option = created.options[0];
      // A wardrobe in the door leaf's sweep, and a crate half through the right wall: two findings.
      const box = { rotation: 0, status: 'existing' };
      await fetch(
        `/api/options/${option.id}`,
        json('PUT', {
          version: option.version,
          doc: {
            pieces: [
              { id: 'wardrobe', name: 'Wardrobe', x: 800, y: 700, width: 1000, depth: 600, height: 2000, ...box },
              { id: 'crate', name: 'Crate', x: 4000, y: 2500, width: 400, depth: 400, height: 400, ...box },
            ],
          },
        }),
      );
      return { projectId: project.id, url: `/projects/${project.id}/rooms/${created.room.id}` };
    });
    await page.goto(made.url);
    await page.getByRole('button', { name: /Check/ }).click();
    const findings = page.getByRole('list', { name: 'Findings' });
    const swing = findings.getByRole('listitem').filter({ hasText: SWING });
    await swing.waitFor();
    const listed = await findings.getByRole('listitem').count();
    expect(listed).toBeGreaterThanOrEqual(2);
    expect(await swing.getAttribute('data-finding-state')).toBe('open');

    // Mark it: a pointer click, the note typed, then a click elsewhere in the panel commits it.
    await swing.getByRole('button', { name: 'Mark as seen' }).click();
    await page.keyboard.type(NOTE);
    await page.getByRole('heading', { name: 'Check', exact: true }).click();
    const shownSeen = async () => {
      await expect.poll(() => swing.getAttribute('data-finding-state'), { timeout: 10000 }).toBe('seen');
      expect(await swing.getByTestId('seen-note').textContent()).toBe(`“${NOTE}”`);
      expect(await swing.getByText('Seen', { exact: true }).isVisible()).toBe(true);
      // Muted and listed after the open ones.
      const states = await findings
        .getByRole('listitem')
        .evaluateAll((items) => items.map((li) => li.getAttribute('data-finding-state')));
      expect(states.at(-1)).toBe('seen');
      expect(states.filter((s) => s === 'open')).toHaveLength(listed - 1);
      const colour = await swing.getByText(SWING).evaluate((el) => getComputedStyle(el).color);
      const openColour = await findings
        .locator('li[data-finding-state=open] button > span:nth-child(2)')
        .first()
        .evaluate((el) => getComputedStyle(el).color);
      expect(colour).not.toBe(openColour);
      expect(await page.getByTestId('findings-badge').getAttribute('aria-label')).toBe(
        `${listed - 1} open finding${listed - 1 === 1 ? '' : 's'}, 1 seen`,
      );
    };
    await shownSeen();

    // Undo takes the mark off; Redo puts it back.
    await page.getByRole('button', { name: 'Undo' }).click();
    await expect.poll(() => swing.getAttribute('data-finding-state'), { timeout: 10000 }).toBe('open');
    expect(await page.getByTestId('findings-badge').getAttribute('aria-label')).toBe(`${listed} open findings`);
    await page.getByRole('button', { name: 'Redo' }).click();
    await shownSeen();

    // Saved with the option: a reload keeps it.
    await page.getByText('All changes saved').waitFor({ timeout: 15000 });
    await page.reload();
    const check = page.getByRole('button', { name: /Check/ });
    await check.waitFor();
    if ((await page.getByRole('list', { name: 'Findings' }).count()) === 0) await check.click();
    await swing.waitFor();
    await shownSeen();

    // Compare counts the seen finding apart.
    await page.goto(`/projects/${made.projectId}/take-off`);
    const compare = page.getByRole('table', { name: 'Options for Bedroom' });
    await compare.waitFor();
    await expect
      .poll(() => compare.getByRole('row', { name: /Fit check findings/ }).textContent(), { timeout: 10000 })
      .toBe(`Fit check findings${listed - 1} open · 1 seen`);
    await context.close();
  });
});
