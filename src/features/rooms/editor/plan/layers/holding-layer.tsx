// The holding area: a dashed panel beside or below the room where pieces wait before they are
// placed, with its label; pressing it pans the plan like the background.
import type { PointerEvent } from 'react';
import type { PlanLayout } from '../plan-geometry';
import { dashArray, planColour, planDash, planHandle, planStroke, planText } from '../plan-style';

export function HoldingLayer({
  holding,
  stroke,
  text,
  onPointerDown,
}: {
  holding: PlanLayout['holding'];
  stroke: number;
  text: number;
  onPointerDown: (e: PointerEvent) => void;
}) {
  return (
    <g aria-label="Holding area">
      <rect
        x={holding.x}
        y={holding.y}
        width={holding.width}
        height={holding.height}
        rx={planHandle.holdingRadiusMm}
        fill={planColour.holdingFill}
        stroke={planColour.holdingStroke}
        strokeDasharray={dashArray(planDash.holding, stroke)}
        strokeWidth={stroke * planStroke.holding}
        onPointerDown={onPointerDown}
      />
      <text
        x={holding.x + holding.width / 2}
        y={holding.y - text * planText.holdingLabelRise}
        textAnchor="middle"
        fontSize={text}
        fill={planColour.holdingText}
        fontWeight={planText.weight}
      >
        Holding area
      </text>
    </g>
  );
}
