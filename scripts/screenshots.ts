// npm run screenshots: signs in to a running `npm start` as the demo owner and saves the README's
// pictures under assets/screenshots/ (the designer's pages, the model library, the client's view of
// the demo sofa's model). BASE overrides the address.
import { mkdirSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { launchBrowser } from '../tests/e2e/lib/browser';
import { DEMO_SIGN_IN } from '../server/cli/seed';

const base = process.env.BASE ?? 'http://127.0.0.1:5480';
const out = resolve(import.meta.dirname, '..', 'assets', 'screenshots');
mkdirSync(out, { recursive: true });

const browser = await launchBrowser();
const context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
// Copy link on the project page puts the client's link on the clipboard, as a designer copies it.
await context.grantPermissions(['clipboard-read', 'clipboard-write'], { origin: base });
const page = await context.newPage();
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

// The model library, once the browser has drawn every model's still.
await page.goto(`${base}/models`);
const stills = page.getByRole('list', { name: 'Models' }).locator('img');
for (let i = 0; i < 60 && (await stills.count()) < 2; i++) await page.waitForTimeout(500);
await page.waitForTimeout(500);
await shot('models');

// The client's walk-through of the living room, Option A: the demo sofa drawn from its model.
await page.goto(`${base}/projects`);
await page.getByRole('link', { name: 'Canal Row flat' }).click();
await page.getByRole('button', { name: 'Copy link' }).first().click();
await page.waitForTimeout(300);
await page.goto(await page.evaluate<string>('navigator.clipboard.readText()'));
await page.getByRole('button', { name: 'Look at this room' }).first().click();
const clientView = page.locator('[data-testid=room-view]').first();
for (let i = 0; i < 60 && !((await clientView.getAttribute('data-models')) ?? '').includes('"sofa"'); i++)
  await page.waitForTimeout(500);
await page.getByRole('button', { name: 'Turn the room left' }).click();
await page.getByRole('button', { name: 'Turn the room left' }).click();
// One step closer keeps the whole room in the picture.
await page.getByRole('button', { name: 'Come closer' }).click();
await page.waitForTimeout(2500);
await page.mouse.move(0, 0);
await page.evaluate('document.activeElement && document.activeElement.blur()');
await page.waitForTimeout(300);
await shot('walk-model');
for (const extra of (process.env.SHOTS ?? '').split(',').filter(Boolean)) {
  const [name, path] = extra.split('=');
  await page.goto(`${base}${path}`);
  await page.waitForTimeout(2500);
  await shot(name);
}
await browser.close();
console.log(`Screenshots written to ${out}`);
