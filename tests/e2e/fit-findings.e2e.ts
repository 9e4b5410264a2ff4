// Browser test of the fit check's door and safety findings: a wardrobe added by clicks lands facing
// a bench too close for its doors, `cannot-open` lists its depths and draws the swing on the plan,
// ticking "Fixed to the wall" takes the tall-storage finding away, and marking the room as a
// child's in Outline lists the bench under the window as climbable.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchBrowser } from './lib/browser';
import { newPage, signUpThroughForm } from './lib/session';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(() => browser?.close());

describe('door and safety findings', () => {
  it('lists a wardrobe that cannot open with its depths and zone, and drops the tall-storage finding once it is fixed; a child’s room flags the bench under the window', async () => {
    const { context, page } = await newPage(browser);
    await signUpThroughForm(page, 'Fronts Studio');
    const url = await page.evaluate(async () => {
      const json = (method: string, body: unknown) => ({
        method,
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify(body),
      });
      const project = (
        await (await fetch('/api/projects', json('POST', { name: 'Fronts flat', newClient: { name: 'F' } }))).json()
      ).project;
      // 2.4 × 1.5 m: a bench fills the bottom 50 cm, so only 1 m of floor is left above it,
      // and a 60 cm deep wardrobe facing down has at most 40 cm in front of its 50 cm doors.
      const created = await (
        await fetch(
          `/api/projects/${project.id}/rooms`,
          json('POST', {
            name: 'Box room',
            shell: {
              outline: [
                [0, 0],
                [2400, 0],
                [2400, 1500],
                [0, 1500],
              ],
              // A window over the bench, sill 900 mm: 45 cm above the bench's seat.
              openings: [{ id: 'w1', type: 'window', wall: 2, offset: 800, width: 1000, height: 1200, sill: 900 }],
            },
          }),
        )
      ).json();
      const option = created.options[0];
      await fetch(
        `/api/options/${option.id}`,
        json('PUT', {
          version: option.version,
          doc: {
            pieces: [
              {
                id: 'bench',
                name: 'Bench',
                kind: 'bench',
                x: 1200,
                y: 1250,
                width: 2380,
                depth: 500,
                height: 450,
                rotation: 0,
                status: 'existing',
              },
            ],
          },
        }),
      );
      return `/projects/${project.id}/rooms/${created.room.id}`;
    });
    await page.goto(url);
    await page.getByRole('button', { name: /Furnish/ }).click();
    await page.getByRole('button', { name: 'Add Wardrobe', exact: true }).first().click();
    await page.getByText('Added Wardrobe.').waitFor();
    await page.locator('[data-testid=save-state][data-state=saved]').waitFor({ timeout: 15000 });

    await page.getByRole('button', { name: /Check/ }).click();
    const findings = page.getByRole('list', { name: 'Findings' });
    const cannotOpen = findings.getByRole('button', { name: /The wardrobe’s doors cannot open fully/ });
    await cannotOpen.waitFor({ timeout: 20000 });
    // Its clear depth and the depth a 50 cm leaf needs.
    expect(await cannotOpen.textContent()).toMatch(/cm clear in front, blocked by the bench.* where 50 cm is usual/);
    expect(await page.getByTestId('finding-zone').count()).toBe(0);
    await cannotOpen.click();
    await page.getByTestId('finding-zone').waitFor();
    const points = (await page.getByTestId('finding-zone').getAttribute('points')) ?? '';
    // A quarter disc: the hinge and the arc, 18 points.
    expect(points.split(' ')).toHaveLength(18);

    const tallText = /The wardrobe \(200 cm tall\) is not marked as fixed to the wall/;
    await findings.getByText(tallText).waitFor();

    await page.getByRole('button', { name: /Furnish/ }).click();
    const fixed = page.getByLabel('Fixed to the wall');
    // The added piece may still be the one being edited; else pick it from the list.
    if (!(await fixed.isVisible())) await page.getByRole('button', { name: 'Edit Wardrobe' }).click();
    await fixed.click();
    expect(await fixed.isChecked()).toBe(true);
    await page.locator('[data-testid=save-state][data-state=saved]').waitFor({ timeout: 15000 });

    await page.getByRole('button', { name: /Check/ }).click();
    await findings.getByRole('button', { name: /The wardrobe’s doors cannot open fully/ }).waitFor();
    expect(await page.getByText(tallText).count()).toBe(0);

    // Marked as a child's room in Outline (kept after a reload), the bench under the window is climbable.
    const climbText = /The bench stands 45 cm below the window sill, within reach/;
    expect(await page.getByText(climbText).count()).toBe(0);
    await page.getByRole('button', { name: /Outline/ }).click();
    await page.getByLabel(/A child’s room/).click();
    await page.locator('[data-testid=save-state][data-state=saved]').waitFor({ timeout: 15000 });
    await page.reload();
    await page.getByRole('button', { name: /Outline/ }).click();
    expect(await page.getByLabel(/A child’s room/).isChecked()).toBe(true);
    await page.getByRole('button', { name: /Check/ }).click();
    await findings.getByText(climbText).waitFor();
    await context.close();
  }, 180_000);
});
