// The Check step's sentence for heavy models names only the figures over the budget, rounded as an
// estimate, with the budget beside each (counts grouped as the reader writes them; here en).
import { afterEach, describe, expect, it, vi } from 'vitest';
import { heavyModelsText } from './model-budget-words';

const budget = (triangles: number, drawCalls: number) => ({
  triangles,
  drawCalls,
  models: 10,
  overTriangles: triangles > 300_000,
  overDrawCalls: drawCalls > 90,
});

describe('heavyModelsText', () => {
  afterEach(() => vi.unstubAllGlobals());
  it('says the triangles alone when only they pass the budget', () => {
    vi.stubGlobal('navigator', { language: 'en-GB' });
    expect(heavyModelsText(budget(341_620, 61))).toBe(
      'The models in this option are heavy for a client’s laptop: about 342,000 triangles (keep under 300,000). The walk-through may stutter. Choose lighter models, or let some pieces show their drawn form.',
    );
  });
  it('says both when both pass', () => {
    vi.stubGlobal('navigator', { language: 'en-GB' });
    expect(heavyModelsText(budget(301_000, 104))).toContain(
      'about 301,000 triangles (keep under 300,000) and about 104 separate parts to draw in each picture (keep under 90).',
    );
  });
  it('groups the figures in the reader’s language', () => {
    vi.stubGlobal('navigator', { language: 'de-DE' });
    expect(heavyModelsText(budget(341_620, 40))).toContain('about 342.000 triangles (keep under 300.000)');
  });
});
