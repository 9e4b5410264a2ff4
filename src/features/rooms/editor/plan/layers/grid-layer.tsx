// The plan's background: a fine grid with a bolder line every metre, reaching past the view on all
// sides; pressing it pans the plan (or places a corner while drawing an outline).
import type { PointerEvent, ReactNode } from 'react';
import { planColour, planGrid, planStroke } from '../plan-style';
import type { ViewBox } from '../plan-viewport';

/** One square of a grid, its top and left edges drawn; `children` go beneath the lines. */
function GridPattern({
  id,
  size,
  colour,
  width,
  children,
}: {
  id: string;
  size: number;
  colour: string;
  width: number;
  children?: ReactNode;
}) {
  return (
    <pattern id={id} width={String(size)} height={String(size)} patternUnits="userSpaceOnUse">
      {children}
      <path d={`M${size} 0H0V${size}`} fill="none" stroke={colour} strokeWidth={width} />
    </pattern>
  );
}

export function GridLayer({
  view,
  stroke,
  onPointerDown,
}: {
  view: ViewBox;
  stroke: number;
  onPointerDown: (e: PointerEvent) => void;
}) {
  return (
    <>
      <defs>
        <GridPattern id="plan-grid" size={planGrid.minorMm} colour={planColour.gridMinor} width={planStroke.gridMinor * stroke} />
        <GridPattern
          id="plan-grid-major"
          size={planGrid.majorMm}
          colour={planColour.gridMajor}
          width={planStroke.gridMajor * stroke}
        >
          <rect width={String(planGrid.majorMm)} height={String(planGrid.majorMm)} fill="url(#plan-grid)" />
        </GridPattern>
      </defs>
      <rect
        x={view.x - view.w}
        y={view.y - view.h}
        width={view.w * 3}
        height={view.h * 3}
        fill="url(#plan-grid-major)"
        onPointerDown={onPointerDown}
        data-testid="plan-background"
      />
    </>
  );
}
