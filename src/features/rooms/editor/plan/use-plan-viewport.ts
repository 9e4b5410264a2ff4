// The plan's viewport as a hook: the panel's measured size, the layout for it (holding area beside
// or below the room), the view box fitted to the room and kept as the designer pans and zooms, and
// the screen to plan transform for pointer events.
import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import type { Piece } from '../../../../../shared/schemas/option';
import type { RoomShell } from '../../../../../shared/schemas/room';
import { planLayout } from './plan-geometry';
import { fitViewBox, mmPerPixel, refitView, screenToPlan, type PanelSize, type ViewBox } from './plan-viewport';

/** A panel this much taller than wide keeps the holding area below the room. */
const TALL_PANEL_RATIO = 1.15;

export function usePlanViewport(shell: RoomShell, pieces: Piece[]) {
  const svgRef = useRef<SVGSVGElement>(null);
  const [box, setBox] = useState<PanelSize | null>(null);
  // A tall, narrow panel (side by side with the 3D at 1280) keeps the holding area below the room,
  // so the room gets the panel's width.
  const side = box && box.h > box.w * TALL_PANEL_RATIO ? 'below' : 'right';
  const layout = useMemo(() => planLayout(shell, pieces, side), [shell, pieces, side]);
  const [view, setView] = useState<ViewBox>(layout.viewBox);
  const fitted = useRef(false);

  // Fit the view to the room, as large as the panel allows, when it first appears, when the panel
  // changes size and when the outline grows past the view. Only the room counts afterwards: pieces
  // joining the holding area never change the plan's scale.
  const boxW = box?.w ?? 0;
  const boxH = box?.h ?? 0;
  // A new panel size (plan alone, side by side, a wider window) is a fresh fit, unless the
  // designer has panned or zoomed the plan themselves.
  const moved = useRef(false);
  useEffect(() => {
    if (!moved.current) fitted.current = false;
  }, [boxW, boxH]);
  useEffect(() => {
    if (boxW === 0 || boxH === 0) return;
    const fit = fitViewBox(layout.content, { w: boxW, h: boxH });
    setView((v) => {
      const fresh = !fitted.current;
      fitted.current = true;
      return refitView(v, fit, layout.roomBounds, fresh);
    });
  }, [layout.content, layout.roomBounds, boxW, boxH]);

  // Text and lines keep their size on screen whatever the zoom: sizes are in screen pixels times
  // plan mm per pixel (the view box is fitted with "meet", so the tighter axis sets the scale).
  useEffect(() => {
    const svg = svgRef.current;
    if (!svg) return;
    const observer = new ResizeObserver(([entry]) =>
      setBox({ w: entry.contentRect.width || 800, h: entry.contentRect.height || 600 }),
    );
    observer.observe(svg);
    return () => observer.disconnect();
  }, []);

  const toPlan = useCallback(
    (clientX: number, clientY: number): [number, number] => {
      const svg = svgRef.current;
      if (!svg) return [0, 0];
      const r = svg.getBoundingClientRect();
      return screenToPlan(view, { left: r.left, top: r.top, w: r.width, h: r.height }, [clientX, clientY]);
    },
    [view],
  );

  /** The designer's own pan or zoom: from now on a new panel size keeps their view. */
  const changeView = useCallback((next: (v: ViewBox) => ViewBox) => {
    moved.current = true;
    setView(next);
  }, []);

  return { svgRef, layout, view, changeView, toPlan, mmPerPx: mmPerPixel(view, box) };
}
