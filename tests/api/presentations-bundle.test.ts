// The client's page is its own entry: its chunk graph (what /p/<token> can ever download) holds
// no designer module, and what it loads before showing anything stays small.
import { beforeAll, describe, expect, it } from 'vitest';
import { DESIGNER_MODULE, measureClientBundle, type ClientBundleReport } from '../../scripts/measure-client-bundle';

/** Budget for the page before the 3D view: React, the query cache and the page itself (gzip). */
const INITIAL_BUDGET_BYTES = 140 * 1024;
/** Budget with the 3D view, for a page whose options wear no model (the forms issue's figure, gzip). */
const WITH_VIEW_BUDGET_BYTES = 384 * 1024;

let report: ClientBundleReport;
beforeAll(async () => {
  report = await measureClientBundle();
}, 120_000);

describe('the client page bundle', () => {
  it('carries the presentation page and the 3D view', () => {
    expect(report.initialModules).toContain('src/features/client-page/components/presentation-page.tsx');
    expect(report.lazyModules).toContain('src/features/client-page/walkthrough/walkthrough-view.tsx');
  });

  it('contains no designer module, before or after the 3D view loads', () => {
    const all = [...report.initialModules, ...report.lazyModules];
    expect(all.filter((m) => DESIGNER_MODULE.test(m))).toEqual([]);
    expect(all).not.toContain('src/app/router.tsx');
    expect(all.some((m) => m.includes('node_modules/react-router'))).toBe(false);
  });

  it('loads three.js only after the page is up, and stays within its budget', () => {
    expect(report.initialModules.some((m) => m.includes('node_modules/three/'))).toBe(false);
    expect(report.initialGzipBytes).toBeLessThan(INITIAL_BUDGET_BYTES);
    expect(report.initialGzipBytes).toBeLessThan(report.appInitialGzipBytes);
  });

  it('stays within its budget with the 3D view, the glTF loader apart (fetched only for a piece wearing a model)', () => {
    const loader = report.lazy.filter((c) => /GLTFLoader/.test(c.file));
    expect(loader).toHaveLength(1);
    const withView = report.initialGzipBytes + report.lazyGzipBytes - loader[0].gzipBytes;
    expect(withView).toBeLessThanOrEqual(WITH_VIEW_BUDGET_BYTES);
  });

  it('the designer pattern does flag designer modules (so the checks above can fail)', () => {
    expect(DESIGNER_MODULE.test('src/features/projects/components/project-page.tsx')).toBe(true);
    expect(DESIGNER_MODULE.test('src/app/router.tsx')).toBe(true);
    expect(DESIGNER_MODULE.test('src/lib/session.ts')).toBe(true);
    expect(DESIGNER_MODULE.test('src/features/client-page/main.tsx')).toBe(false);
  });
});
