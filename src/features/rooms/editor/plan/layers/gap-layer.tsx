// A fit check finding's narrow gap, drawn as a line between the two pieces with its measurement.
import { mid, type Highlight } from '../plan-geometry';
import { planColour, planStroke, planText } from '../plan-style';

export function GapLayer({ gap, stroke, text }: { gap: NonNullable<Highlight['gap']>; stroke: number; text: number }) {
  const middle = mid(gap.a, gap.b, 0.5);
  return (
    <g pointerEvents="none">
      <line
        x1={gap.a[0]}
        y1={gap.a[1]}
        x2={gap.b[0]}
        y2={gap.b[1]}
        stroke={planColour.flaggedStroke}
        strokeWidth={stroke * planStroke.gap}
      />
      <text
        x={middle[0]}
        y={middle[1] - text}
        textAnchor="middle"
        fontSize={text}
        fill={planColour.flaggedStroke}
        fontWeight={planText.gapWeight}
      >
        {gap.label}
      </text>
    </g>
  );
}
