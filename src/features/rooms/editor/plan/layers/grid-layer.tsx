// The plan's background: a fine grid with a bolder line every metre, reaching past the view on all
// sides; pressing it pans the plan (or places a corner while drawing an outline).
import type { PointerEvent } from 'react';
import { planColour, planGrid, planStroke } from '../plan-style';
import type { ViewBox } from '../plan-viewport';

export function GridLayer({
  view,
  stroke,
  onPointerDown,
}: {
  view: ViewBox;
  stroke: number;
  onPointerDown: (e: PointerEvent) => void;
}) {
  const minor = planGrid.minorMm;
  const major = planGrid.majorMm;
  return (
    <>
      <defs>
        <pattern id="plan-grid" width={String(minor)} height={String(minor)} patternUnits="userSpaceOnUse">
          <path
            d={`M${minor} 0H0V${minor}`}
            fill="none"
            stroke={planColour.gridMinor}
            strokeWidth={planStroke.gridMinor * stroke}
          />
        </pattern>
        <pattern id="plan-grid-major" width={String(major)} height={String(major)} patternUnits="userSpaceOnUse">
          <rect width={String(major)} height={String(major)} fill="url(#plan-grid)" />
          <path
            d={`M${major} 0H0V${major}`}
            fill="none"
            stroke={planColour.gridMajor}
            strokeWidth={planStroke.gridMajor * stroke}
          />
        </pattern>
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
