// npm run screenshots: signs in to a running `npm start` as the demo owner and saves the README's
// pictures under assets/screenshots/. BASE overrides the address.
import { mkdirSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { launchBrowser } from '../tests/e2e/lib/browser';
import { DEMO_SIGN_IN } from '../server/cli/seed';

const base = process.env.BASE ?? 'http://127.0.0.1:5480';
const out = resolve(import.meta.dirname, '..', 'assets', 'screenshots');
mkdirSync(out, { recursive: true });

const browser = await launchBrowser();
const page = await browser.newPage({ viewport: { width: 1280, height: 800 } });
const shot = (name: string) => page.screenshot({ path: join(out, `${name}.png`) });
await page.goto(`${base}/sign-in`);
await shot('sign-in');
await page.getByLabel('E-mail').fill(DEMO_SIGN_IN.email);
await page.getByLabel('Password').fill(DEMO_SIGN_IN.password);
await page.getByRole('button', { name: 'Sign in' }).click();
await page.getByRole('heading', { name: 'Projects' }).waitFor();
await shot('projects');
await page.getByRole('link', { name: 'Canal Row flat' }).click();
await page.getByRole('heading', { name: /Canal Row flat/ }).waitFor();
await page.waitForTimeout(300);
await shot('project');
await page.getByRole('link', { name: /L-shaped living room/ }).click();
await page.locator('[data-testid=room-view][data-frames]').waitFor({ timeout: 30000 });
await page.getByRole('button', { name: /Furnish/ }).click();
await page.locator('[data-testid^=piece-sofa]').click();
await page.waitForTimeout(2500);
await shot('editor');
await page.getByRole('button', { name: /Check/ }).click();
await page
  .getByRole('list', { name: 'Findings' })
  .getByRole('button')
  .first()
  .click()
  .catch(() => undefined);
await page.waitForTimeout(1000);
await shot('editor-check');
for (const extra of (process.env.SHOTS ?? '').split(',').filter(Boolean)) {
  const [name, path] = extra.split('=');
  await page.goto(`${base}${path}`);
  await page.waitForTimeout(2500);
  await shot(name);
}
await browser.close();
console.log(`Screenshots written to ${out}`);
