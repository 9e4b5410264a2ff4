// axe-core injected into a page (from the npm package, never fetched), and the content security
// policy violations a page reports, for the accessibility and keyboard browser tests.
import { createRequire } from 'node:module';
import type { BrowserContext, Page } from 'playwright-core';

const AXE_PATH = createRequire(import.meta.url).resolve('axe-core/axe.min.js');
/** The impacts that fail a page; minor and moderate findings are printed but allowed. */
const FAILING_IMPACTS = new Set(['serious', 'critical']);

export interface AxeFinding {
  page: string;
  id: string;
  impact: string;
  help: string;
  targets: string[];
}

interface AxeResult {
  violations: { id: string; impact: string | null; help: string; nodes: { target: unknown[] }[] }[];
}

/** Runs axe on the page as it is now; returns the serious and critical findings. */
export async function axeFindings(page: Page, name: string): Promise<AxeFinding[]> {
  if (!(await page.evaluate(() => 'axe' in window))) await page.addScriptTag({ path: AXE_PATH });
  const result = (await page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run(ctx: Document, opts: object): Promise<unknown> } }).axe;
    return (await axe.run(document, { resultTypes: ['violations'] })) as unknown;
  })) as AxeResult;
  return result.violations
    .filter((v) => FAILING_IMPACTS.has(v.impact ?? ''))
    .map((v) => ({
      page: name,
      id: v.id,
      impact: v.impact!,
      help: v.help,
      targets: v.nodes.slice(0, 5).map((n) => n.target.map(String).join(' ')),
    }));
}

/** Records every content security policy violation the context's pages report. */
export async function watchPolicy(context: BrowserContext): Promise<() => Promise<string[]>> {
  await context.addInitScript(() => {
    const seen: string[] = [];
    (window as unknown as { __cspViolations: string[] }).__cspViolations = seen;
    document.addEventListener('securitypolicyviolation', (e) => seen.push(`${e.violatedDirective} ${e.blockedURI}`));
  });
  const messages: string[] = [];
  context.on('console', (m) => {
    if (/Content Security Policy/i.test(m.text())) messages.push(m.text());
  });
  return async () => {
    const fromPages = await Promise.all(
      context
        .pages()
        .map((p) =>
          p.evaluate(() => (window as unknown as { __cspViolations?: string[] }).__cspViolations ?? []).catch(() => []),
        ),
    );
    return [...messages, ...fromPages.flat()];
  };
}
