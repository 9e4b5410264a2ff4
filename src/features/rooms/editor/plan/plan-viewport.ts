// The plan's viewport, pure: the view box (plan mm) the SVG shows, fitted to the room, panned,
// zoomed about a point within its limits, and the transforms between screen pixels and plan mm for
// an SVG drawn with preserveAspectRatio "xMidYMid meet".
import type { Bounds2 } from '../../../../../shared/geometry/polygon';

export interface ViewBox {
  x: number;
  y: number;
  w: number;
  h: number;
}

/** A panel's size on screen, px. */
export interface PanelSize {
  w: number;
  h: number;
}

/** Where the panel stands on screen and how big it is, px (the SVG's client rectangle). */
export interface PanelRect extends PanelSize {
  left: number;
  top: number;
}

/** Room left round the drawing on screen, for the dimension labels and handles (px, common practice). */
export const PLAN_MARGIN_PX = 44;
/** The panel's size taken before it has been measured, px. */
export const UNMEASURED_PANEL: PanelSize = { w: 800, h: 600 };
/** The narrowest view a zoom reaches (plan mm across). */
export const MIN_VIEW_WIDTH_MM = 1500;
/** The widest view a zoom reaches (plan mm across). */
export const MAX_VIEW_WIDTH_MM = 60000;
/** How fast the wheel zooms: the view grows by e^(rate × deltaY). */
export const WHEEL_ZOOM_RATE = 0.0015;

/**
 * The view box that shows `content` (plan mm) as large as the panel allows: the panel's own
 * proportions, the content centred, a margin of `marginPx` screen pixels all round.
 */
export function fitViewBox(content: ViewBox, panel: PanelSize, marginPx = PLAN_MARGIN_PX): ViewBox {
  const innerW = Math.max(panel.w - 2 * marginPx, panel.w / 2, 1);
  const innerH = Math.max(panel.h - 2 * marginPx, panel.h / 2, 1);
  const mmPerPx = Math.max(content.w / innerW, content.h / innerH);
  const w = panel.w * mmPerPx;
  const h = panel.h * mmPerPx;
  return { x: content.x + content.w / 2 - w / 2, y: content.y + content.h / 2 - h / 2, w, h };
}

/** Whether the room's box reaches outside the view. */
export function roomOutsideView(view: ViewBox, room: Bounds2): boolean {
  return room.minX < view.x || room.minY < view.y || room.maxX > view.x + view.w || room.maxY > view.y + view.h;
}

/**
 * The view after the room or the panel changed: the fitted one when a fresh fit is due or the
 * room has grown past the view, else the view as the designer left it.
 */
export function refitView(view: ViewBox, fit: ViewBox, room: Bounds2, fresh: boolean): ViewBox {
  return fresh || roomOutsideView(view, room) ? fit : view;
}

/** Plan mm per screen pixel: with "meet" the tighter axis sets the scale. */
export function mmPerPixel(view: ViewBox, panel: PanelSize | null): number {
  return Math.max(view.w / (panel?.w || UNMEASURED_PANEL.w), view.h / (panel?.h || UNMEASURED_PANEL.h));
}

/** A view width kept within the zoom's limits. */
export function clampViewWidth(w: number): number {
  return Math.min(Math.max(w, MIN_VIEW_WIDTH_MM), MAX_VIEW_WIDTH_MM);
}

/** The view moved by (dx, dy) plan mm the other way, as when the plan is dragged by that much. */
export function panView(view: ViewBox, dx: number, dy: number): ViewBox {
  return { ...view, x: view.x - dx, y: view.y - dy };
}

/** The view scaled by `factor` about the plan point `at`, which stays where it is on screen; the width stays within its limits. */
export function zoomAbout(view: ViewBox, at: readonly [number, number], factor: number): ViewBox {
  const w = clampViewWidth(view.w * factor);
  const k = w / view.w;
  return { x: at[0] - (at[0] - view.x) * k, y: at[1] - (at[1] - view.y) * k, w, h: view.h * k };
}

/** The zoom factor for a wheel turn of deltaY (positive: away from the plan). */
export function wheelZoomFactor(deltaY: number): number {
  return Math.exp(deltaY * WHEEL_ZOOM_RATE);
}

/** The scale (px per plan mm) and the offsets (px) with which "xMidYMid meet" draws the view in the panel. */
function meet(view: ViewBox, panel: PanelSize): { scale: number; dx: number; dy: number } {
  const scale = Math.min(panel.w / view.w, panel.h / view.h);
  return { scale, dx: (panel.w - view.w * scale) / 2, dy: (panel.h - view.h * scale) / 2 };
}

/** A screen point (client px) as a plan point (mm). */
export function screenToPlan(view: ViewBox, panel: PanelRect, client: readonly [number, number]): [number, number] {
  const m = meet(view, panel);
  return [view.x + (client[0] - panel.left - m.dx) / m.scale, view.y + (client[1] - panel.top - m.dy) / m.scale];
}

/** A plan point (mm) as a screen point (client px). */
export function planToScreen(view: ViewBox, panel: PanelRect, point: readonly [number, number]): [number, number] {
  const m = meet(view, panel);
  return [panel.left + m.dx + (point[0] - view.x) * m.scale, panel.top + m.dy + (point[1] - view.y) * m.scale];
}

/** The middle of the part of the room's box the view shows, or null when the view shows none of it. */
export function visibleRoomCentre(view: ViewBox, room: Bounds2): [number, number] | null {
  const x0 = Math.max(view.x, room.minX);
  const x1 = Math.min(view.x + view.w, room.maxX);
  const y0 = Math.max(view.y, room.minY);
  const y1 = Math.min(view.y + view.h, room.maxY);
  return x0 < x1 && y0 < y1 ? [(x0 + x1) / 2, (y0 + y1) / 2] : null;
}
