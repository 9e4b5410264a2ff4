// Wall lengths: a dimension line outside each wall with its end ticks and the length on a label,
// turned to read along the wall, never upside down; pressing one selects its wall.
import type { PointerEvent } from 'react';
import { formatLength, type LengthUnit } from '../../../../../../shared/units/length';
import { DIMENSION_OFFSET_MM, mid, type PlanLayout, type Selection } from '../plan-geometry';
import { planColour, planHandle, planStroke, planText } from '../plan-style';

export function DimensionsLayer({
  layout,
  selection,
  unit,
  stroke,
  text,
  onWallLengthPointerDown,
}: {
  layout: PlanLayout;
  selection: Selection;
  unit: LengthUnit;
  stroke: number;
  text: number;
  onWallLengthPointerDown: (e: PointerEvent, index: number) => void;
}) {
  const tick = planHandle.dimensionTickMm;
  const back = planText.dimensionBack;
  return (
    <>
      {layout.walls.map((w) => {
        const off = w.thicknessMm + DIMENSION_OFFSET_MM;
        const a: [number, number] = [w.start[0] + w.outward[0] * off, w.start[1] + w.outward[1] * off];
        const b: [number, number] = [w.end[0] + w.outward[0] * off, w.end[1] + w.outward[1] * off];
        const m = mid(a, b, 0.5);
        let angle = (Math.atan2(w.direction[1], w.direction[0]) * 180) / Math.PI;
        if (angle > 90 || angle < -90) angle += 180;
        return (
          <g
            key={`dim-${w.index}`}
            className="cursor-pointer"
            onPointerDown={(e) => onWallLengthPointerDown(e, w.index)}
            data-testid={`wall-length-${w.index}`}
          >
            <line
              x1={a[0]}
              y1={a[1]}
              x2={b[0]}
              y2={b[1]}
              stroke={planColour.dimensionLine}
              strokeWidth={stroke * planStroke.dimension}
            />
            {[a, b].map((end, i) => (
              <line
                key={i}
                x1={end[0] - w.outward[0] * tick}
                y1={end[1] - w.outward[1] * tick}
                x2={end[0] + w.outward[0] * tick}
                y2={end[1] + w.outward[1] * tick}
                stroke={planColour.dimensionLine}
                strokeWidth={stroke * planStroke.dimension}
              />
            ))}
            <g transform={`translate(${m[0]} ${m[1]}) rotate(${angle})`}>
              <rect
                x={-text * back.halfWidth}
                y={-text * back.halfHeight}
                width={text * back.width}
                height={text * back.height}
                rx={text * back.radius}
                fill={planColour.dimensionLabelBack}
              />
              <text
                textAnchor="middle"
                dominantBaseline="central"
                fontSize={text * planText.dimensionScale}
                fill={
                  selection?.kind === 'wall' && selection.index === w.index
                    ? planColour.dimensionTextSelected
                    : planColour.dimensionText
                }
                fontWeight={planText.weight}
              >
                {formatLength(w.lengthMm, unit)}
              </text>
            </g>
          </g>
        );
      })}
    </>
  );
}
