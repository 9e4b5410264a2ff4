// Debian's Chromium driven by playwright-core (never a downloaded browser), with software WebGL.
import { chromium, type Browser } from 'playwright-core';

export const CHROMIUM_ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--no-first-run',
  '--enable-unsafe-swiftshader',
  '--use-angle=swiftshader',
  '--disable-dev-shm-usage',
];

export function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: CHROMIUM_ARGS,
    headless: true,
  });
}
