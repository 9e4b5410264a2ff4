// The plan's viewport: fitting the room to the panel, zooming about a point, the zoom's limits,
// refitting, and screen px to plan mm and back.
import { describe, expect, it } from 'vitest';
import {
  MAX_VIEW_WIDTH_MM,
  MIN_VIEW_WIDTH_MM,
  clampViewWidth,
  fitViewBox,
  mmPerPixel,
  panView,
  planToScreen,
  refitView,
  screenToPlan,
  visibleRoomCentre,
  wheelZoomFactor,
  zoomAbout,
} from './plan-viewport';

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

describe('zooming about a point', () => {
  const panel = { left: 30, top: 70, w: 600, h: 400 };
  const view = fitViewBox({ x: 0, y: 0, w: 6000, h: 4000 }, panel);

  it('keeps the plan point under the pointer where it is on screen', () => {
    const at: [number, number] = [1234, 2345];
    const before = planToScreen(view, panel, at);
    for (const factor of [0.5, 0.8, 1.25, 2]) {
      const zoomed = zoomAbout(view, at, factor);
      const after = planToScreen(zoomed, panel, at);
      expect(after[0]).toBeCloseTo(before[0], 6);
      expect(after[1]).toBeCloseTo(before[1], 6);
      expect(zoomed.w / zoomed.h).toBeCloseTo(view.w / view.h, 9);
    }
  });

  it('zooms in on a wheel turn towards the plan and out on one away from it', () => {
    expect(wheelZoomFactor(-100)).toBeLessThan(1);
    expect(wheelZoomFactor(100)).toBeGreaterThan(1);
    expect(wheelZoomFactor(100) * wheelZoomFactor(-100)).toBeCloseTo(1, 12);
  });

  it('stops at the narrowest and the widest view, the pointer still fixed', () => {
    expect(clampViewWidth(10)).toBe(MIN_VIEW_WIDTH_MM);
    expect(clampViewWidth(1e9)).toBe(MAX_VIEW_WIDTH_MM);
    expect(clampViewWidth(5000)).toBe(5000);
    const at: [number, number] = [3000, 2000];
    const near = zoomAbout(view, at, 1e-6);
    expect(near.w).toBe(MIN_VIEW_WIDTH_MM);
    expect(near.h).toBeCloseTo((view.h * MIN_VIEW_WIDTH_MM) / view.w, 9);
    expect(planToScreen(near, panel, at)[0]).toBeCloseTo(planToScreen(view, panel, at)[0], 6);
    expect(zoomAbout(view, at, 1e6).w).toBe(MAX_VIEW_WIDTH_MM);
  });
});

describe('screen and plan', () => {
  it('turn a screen point into a plan point and back, with the view centred in a panel of other proportions', () => {
    const panel = { left: 10, top: 20, w: 500, h: 300 };
    const view = { x: -100, y: -100, w: 1000, h: 1000 };
    // "meet": 0.3 px per mm, the 300 px wide view centred in 500 px.
    expect(screenToPlan(view, panel, [10 + 100, 20])).toEqual([-100, -100]);
    expect(screenToPlan(view, panel, [10 + 250, 20 + 150])).toEqual([400, 400]);
    const p = screenToPlan(view, panel, [123, 234]);
    const back = planToScreen(view, panel, p);
    expect(back[0]).toBeCloseTo(123, 9);
    expect(back[1]).toBeCloseTo(234, 9);
  });

  it('measures plan mm per pixel by the tighter axis, an unmeasured panel as 800 × 600', () => {
    expect(mmPerPixel({ x: 0, y: 0, w: 8000, h: 3000 }, { w: 800, h: 600 })).toBe(10);
    expect(mmPerPixel({ x: 0, y: 0, w: 4000, h: 6000 }, null)).toBe(10);
  });

  it('pans the other way from the drag', () => {
    expect(panView({ x: 0, y: 0, w: 100, h: 50 }, 20, -10)).toEqual({ x: -20, y: 10, w: 100, h: 50 });
  });
});

describe('refitting and the room in view', () => {
  const room = { minX: 0, minY: 0, maxX: 4000, maxY: 3000 };
  const fit = { x: -500, y: -500, w: 5000, h: 4000 };

  it('fits afresh when asked or when the room has grown past the view, else keeps the designer’s view', () => {
    const panned = { x: -200, y: -300, w: 4500, h: 3600 };
    expect(refitView(panned, fit, room, true)).toBe(fit);
    expect(refitView(panned, fit, room, false)).toBe(panned);
    expect(refitView(panned, fit, { ...room, maxX: 4400 }, false)).toBe(fit);
  });

  it('finds the middle of the room the view shows, and none when it shows no room', () => {
    expect(visibleRoomCentre({ x: 2000, y: -1000, w: 4000, h: 3000 }, room)).toEqual([3000, 1000]);
    expect(visibleRoomCentre({ x: 5000, y: 0, w: 1000, h: 1000 }, room)).toBeNull();
  });
});
