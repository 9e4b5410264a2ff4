// Pieces added from the catalogue, and placed from the holding area, land on free floor inside an
// L-shaped room: none across the inner walls, none on another.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { boxesOverlap, boxInsideOutline, pieceFootprintMm } from '../../shared/commands';
import type { Piece } from '../../shared/schemas/option';
import { launchBrowser } from './lib/browser';
import { newPage, signUpThroughForm } from './lib/session';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(() => browser?.close());

// 6 m × 5 m with a 3.5 m × 3 m block out of its top right: the bounding box's centre is outside the room.
const ELL: [number, number][] = [
  [0, 0],
  [2500, 0],
  [2500, 3000],
  [6000, 3000],
  [6000, 5000],
  [0, 5000],
];
const ADDS = ['Three-seat sofa', 'Armchair', 'Armchair', 'Coffee table', 'Side table', 'Bedside table', 'Two-seat sofa'];

async function savedPieces(page: Page, roomId: string): Promise<Piece[]> {
  return page.evaluate(async (id) => (await (await fetch(`/api/rooms/${id}`)).json()).options[0].doc.pieces, roomId);
}

describe('where added pieces land', () => {
  it('in an L-shaped room, eight pieces by clicks land inside the outline and on free floor', async () => {
    const { context, page } = await newPage(browser);
    await signUpThroughForm(page, 'Placement Studio');
    const { projectId, roomId } = await page.evaluate(async (outline) => {
      const post = async (url: string, body: unknown) =>
        (
          await fetch(url, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) })
        ).json();
      const { project } = await post('/api/projects', { name: 'Corner flat', newClient: { name: 'Corner client' } });
      const { room } = await post(`/api/projects/${project.id}/rooms`, { name: 'Sitting room', shell: { outline } });
      return { projectId: project.id as string, roomId: room.id as string };
    }, ELL);
    await page.goto(`/projects/${projectId}/rooms/${roomId}`);
    await page.getByRole('button', { name: /Furnish/ }).click();
    for (const name of ADDS) {
      await page
        .getByRole('button', { name: `Add ${name}`, exact: true })
        .first()
        .click();
      await page.getByText(`Added ${name}.`).waitFor();
    }
    // The eighth waits in the holding area first, then is placed in the room; the plan keeps its scale.
    const plan = page.getByTestId('plan');
    const scaleBefore = await plan.getAttribute('viewBox');
    // A piece wider than the holding area widens it.
    await page.getByRole('button', { name: 'Put a Desk in the holding area' }).click();
    await page.getByText('Desk is in the holding area.').waitFor();
    await page.getByRole('button', { name: 'Edit Desk' }).click();
    await page.getByText('In the holding area', { exact: true }).waitFor();
    expect(await plan.getAttribute('viewBox')).toBe(scaleBefore);
    await page.getByRole('button', { name: 'Place in the room' }).click();
    await page.getByText('In the room', { exact: true }).waitFor();
    await page.locator('[data-testid=save-state][data-state=saved]').waitFor({ timeout: 15000 });

    const pieces = await savedPieces(page, roomId);
    expect(pieces).toHaveLength(8);
    for (const p of pieces) {
      expect(p.placed).toBe(true);
      // A piece snapped to a wall touches it; a hair smaller it must be wholly inside.
      const within = pieceFootprintMm({ ...p, width: p.width - 2, depth: p.depth - 2 });
      expect(boxInsideOutline(ELL, within), `${p.name} at ${p.x}, ${p.y} stands across a wall`).toBe(true);
      for (const q of pieces) {
        if (q.id !== p.id)
          expect(boxesOverlap(pieceFootprintMm(p), pieceFootprintMm(q)), `${p.name} overlaps ${q.name}`).toBe(false);
      }
    }
    await context.close();
  }, 180_000);
});
