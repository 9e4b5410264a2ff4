// The typical room's first build after the page loads, boxes against forms, with nothing compiled
// yet: each build in a fresh Node process, and in a fresh Chromium page (the engine the client's
// browser runs, fed the minified bundle); boxes and forms taken in turn, who goes first
// alternating; medians with their ranges and the load.
import { existsSync } from 'node:fs';
import { loadavg } from 'node:os';
import { build } from 'vite';
import { buildPieceForms } from '../../shared/geometry/forms/piece-forms';
import { buildRoomScene } from '../../shared/geometry/scene';
import { launchBrowser } from '../../tests/e2e/lib/browser';
import type { PageFirstBuild } from './first-build-page';
import { runFresh, serveAsWorker } from './fresh-process';
import { typicalFurnishedRoom } from './typical-room';

/** Fresh processes, and fresh pages, per build. */
const RUNS = 15;
const WORKER_FLAG = '--forms-first-build-worker';
const PAGE_ORIGIN = 'http://first-build.test';
const CHROMIUM = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';

type Build = 'boxes' | 'forms';
interface Timing {
  /** ms for the whole build, and for the forms' own part (0 for boxes). */
  wall: number;
  formsWall: number;
  /**
   * CPU time, ms: in Node the process's (the engine's compiler and collector threads count too), in
   * Chromium the page's main thread's.
   */
  cpu: number;
}

const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)]!;
/** "least–most" of `values`, to `digits` places, with `unit` after. */
export const range = (values: number[], digits: number, unit = '') =>
  `${Math.min(...values).toFixed(digits)}–${Math.max(...values).toFixed(digits)}${unit}`;

/**
 * In a fresh worker: the room's scene data built once, as the page does when it has loaded: the
 * shell and boxes, then (for forms) every piece's form. Garbage from loading is collected first, so
 * a collection it would cause falls on neither build by chance.
 */
function buildOnce(which: Build): Timing {
  const { shell, option } = typicalFurnishedRoom();
  (globalThis as { gc?: () => void }).gc?.();
  const c0 = process.cpuUsage();
  const t0 = performance.now();
  buildRoomScene(shell, option);
  const t1 = performance.now();
  if (which === 'forms') buildPieceForms(option.pieces);
  const t2 = performance.now();
  const c = process.cpuUsage(c0);
  return { wall: t2 - t0, formsWall: t2 - t1, cpu: (c.user + c.system) / 1000 };
}

/** `RUNS` of each build, boxes and forms in turn (who goes first alternating), and the load after each pair. */
async function inTurn(run: (which: Build) => Promise<Timing>): Promise<{ runs: Record<Build, Timing[]>; loads: number[] }> {
  const runs: Record<Build, Timing[]> = { boxes: [], forms: [] };
  const loads: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    for (const which of i % 2 === 0 ? (['boxes', 'forms'] as const) : (['forms', 'boxes'] as const))
      runs[which].push(await run(which));
    loads.push(loadavg()[0]!);
  }
  return { runs, loads };
}

function report(where: string, { runs, loads }: { runs: Record<Build, Timing[]>; loads: number[] }, cpuName: string): void {
  const wall = (b: Build) => runs[b].map((r) => r.wall);
  const cpuOf = (b: Build) => runs[b].map((r) => r.cpu);
  const cpuNote = (b: Build) => `; ${cpuName} ${median(cpuOf(b)).toFixed(2)} ms`;
  console.log(
    `forms: first build after the page loads, ${where} (nothing compiled yet; ${RUNS} of each, in turn): ` +
      `boxes median ${median(wall('boxes')).toFixed(2)} ms (${range(wall('boxes'), 2, ' ms')}${cpuNote('boxes')}), ` +
      `forms median ${median(wall('forms')).toFixed(2)} ms (${range(wall('forms'), 2, ' ms')}${cpuNote('forms')}; ` +
      `the forms' own part ${median(runs.forms.map((r) => r.formsWall)).toFixed(2)} ms): ` +
      `${(median(wall('forms')) / median(wall('boxes'))).toFixed(2)}× the boxes` +
      ` (${cpuName} ${(median(cpuOf('forms')) / median(cpuOf('boxes'))).toFixed(2)}×)` +
      ` (load ${range(loads, 1)}; budget: forms ≤ 1.5× the boxes)`,
  );
}

/** The page's script: the bench page entry bundled and minified as the client's is. */
async function pageScript(): Promise<string> {
  const built = await build({
    configFile: false,
    logLevel: 'silent',
    build: {
      write: false,
      minify: true,
      lib: { entry: new URL('./first-build-page.ts', import.meta.url).pathname, formats: ['es'], fileName: 'page' },
    },
  });
  const [output] = Array.isArray(built) ? built : [built];
  if (!output || !('output' in output)) throw new Error('the bench page did not bundle');
  return output.output[0].code;
}

/** Each build in a fresh Chromium page: a context of its own, the script loaded, then one timed build. */
async function inChromium(): Promise<void> {
  if (!existsSync(CHROMIUM)) {
    console.log(`forms: first build in Chromium skipped: no browser at ${CHROMIUM}`);
    return;
  }
  const script = await pageScript();
  const browser = await launchBrowser();
  try {
    const measured = await inTurn(async (which) => {
      const context = await browser.newContext();
      try {
        const page = await context.newPage();
        await page.route(`${PAGE_ORIGIN}/**`, (route) =>
          route.request().url().endsWith('.js')
            ? route.fulfill({ contentType: 'text/javascript', body: script })
            : route.fulfill({ contentType: 'text/html', body: '<!doctype html><script type="module" src="/page.js"></script>' }),
        );
        await page.goto(`${PAGE_ORIGIN}/`);
        await page.waitForFunction(() => 'firstBuild' in globalThis);
        // The main thread's CPU time (DevTools' ThreadTime, seconds) round the build, less that of
        // an empty call made just before (the first call of a page costs more: one is made first).
        const devtools = await context.newCDPSession(page);
        await devtools.send('Performance.enable');
        const threadTime = async () =>
          (await devtools.send('Performance.getMetrics')).metrics.find((m) => m.name === 'ThreadTime')!.value;
        await page.evaluate(() => 0);
        const e0 = await threadTime();
        await page.evaluate(() => 0);
        const c0 = await threadTime();
        const t = await page.evaluate(
          (forms) => (globalThis as unknown as { firstBuild: (forms: boolean) => PageFirstBuild }).firstBuild(forms),
          which === 'forms',
        );
        const cpu = ((await threadTime()) - c0 - (c0 - e0)) * 1000;
        return { wall: t.total, formsWall: t.total - t.boxes, cpu };
      } finally {
        await context.close();
      }
    });
    report('in a fresh Chromium page each', measured, 'main-thread CPU');
  } finally {
    await browser.close();
  }
}

/** Prints the first build's figures: fresh Node processes, then fresh Chromium pages. */
export async function benchFormsFirstBuild(): Promise<void> {
  const inNode = await inTurn((which) =>
    Promise.resolve(runFresh<Timing>(import.meta.url, WORKER_FLAG, [which], ['--expose-gc'])),
  );
  report('in a fresh Node process each', inNode, 'process CPU');
  await inChromium();
}

await serveAsWorker(WORKER_FLAG, ([which]) => Promise.resolve(buildOnce(which as Build)));
