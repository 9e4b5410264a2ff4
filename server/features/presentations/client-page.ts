// The client's page has an HTML entry of its own (no designer code), served for /p/:token.
import type { Express } from 'express';
import { existsSync } from 'node:fs';
import { join } from 'node:path';

/** Where Vite writes the presentation entry inside the client build. */
export const PRESENTATION_HTML = 'src/features/client-page/presentation.html';

export function mountPresentationPage(app: Express, dist: string): void {
  const file = join(dist, PRESENTATION_HTML);
  if (!existsSync(file)) return;
  app.get('/p/:token', (_req, res) => {
    res.setHeader('Cache-Control', 'no-cache');
    // The token is in the address: do not hand it on to other sites, and keep the page out of search.
    res.setHeader('Referrer-Policy', 'no-referrer');
    res.setHeader('X-Robots-Tag', 'noindex');
    res.sendFile(file);
  });
}
