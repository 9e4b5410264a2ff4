// An outline being drawn by clicking corners (the corners so far, the line on to the pointer and
// its length), and a typed walk being measured, drawn dashed before it replaces the outline.
import { distance } from '../../../../../../shared/geometry/vec';
import { formatLength, type LengthUnit } from '../../../../../../shared/units/length';
import { drawPoint } from '../plan-snap';
import { dashArray, planColour, planDash, planHandle, planStroke, planText } from '../plan-style';

export function DraftLayer({
  draft,
  pointer,
  unit,
  stroke,
  text,
}: {
  draft: [number, number][];
  pointer: [number, number] | null;
  unit: LengthUnit;
  stroke: number;
  text: number;
}) {
  return (
    <g pointerEvents="none">
      <polyline
        points={[...draft, ...(pointer ? [drawPoint(draft, pointer, false)] : [])].map((p) => p.join(',')).join(' ')}
        fill="none"
        stroke={planColour.draftStroke}
        strokeWidth={stroke * planStroke.draft}
      />
      {draft.map((p, i) => (
        <circle
          key={i}
          cx={p[0]}
          cy={p[1]}
          r={stroke * planHandle.draftCornerRadius}
          fill={i === 0 ? planColour.draftStroke : planColour.handleFill}
          stroke={planColour.draftStroke}
          strokeWidth={stroke * planStroke.draftCorner}
        />
      ))}
      {pointer && (
        <text
          x={pointer[0] + text}
          y={pointer[1] - text}
          fontSize={text}
          fill={planColour.draftText}
          fontWeight={planText.weight}
        >
          {formatLength(distance(draft[draft.length - 1], drawPoint(draft, pointer, false)), unit)}
        </text>
      )}
    </g>
  );
}

export function WalkPreviewLayer({ preview, stroke }: { preview: [number, number][]; stroke: number }) {
  return (
    <polyline
      data-testid="walk-preview"
      points={preview.map((p) => p.join(',')).join(' ')}
      fill="none"
      stroke={planColour.draftStroke}
      strokeWidth={stroke * planStroke.preview}
      strokeDasharray={dashArray(planDash.walkPreview, stroke)}
      pointerEvents="none"
    />
  );
}
