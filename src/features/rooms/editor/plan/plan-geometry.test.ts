// The plan's view box fitted to a panel: content as large as it allows, centred, in the panel's proportions.
import { describe, expect, it } from 'vitest';
import { fitViewBox } from './plan-geometry';

describe('fitViewBox', () => {
  it('shows the content as large as the panel allows, centred, in the panel’s proportions', () => {
    // 8 m × 4 m of plan in a 440 × 620 px panel with 40 px margins: the width sets the scale,
    // 8000 mm over 360 px.
    const v = fitViewBox({ x: 0, y: 0, w: 8000, h: 4000 }, { w: 440, h: 620 }, 40);
    const mmPerPx = 8000 / 360;
    expect(v.w).toBeCloseTo(440 * mmPerPx, 6);
    expect(v.h).toBeCloseTo(620 * mmPerPx, 6);
    expect(v.x + v.w / 2).toBeCloseTo(4000, 6);
    expect(v.y + v.h / 2).toBeCloseTo(2000, 6);
    // The margin on the tighter side is exactly 40 px.
    expect((0 - v.x) / mmPerPx).toBeCloseTo(40, 6);
  });
  it('lets the height set the scale in a wide, low panel', () => {
    const v = fitViewBox({ x: 100, y: 100, w: 4000, h: 4000 }, { w: 1000, h: 300 }, 50);
    expect(v.h / 300).toBeCloseTo(4000 / 200, 6);
    expect(v.w / 1000).toBeCloseTo(4000 / 200, 6);
  });
});
