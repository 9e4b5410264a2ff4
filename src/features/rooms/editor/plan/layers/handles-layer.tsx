// Selection handles: the turning handle in front of a selected piece, and the corner handles of
// the outline in the Outline step.
import type { PointerEvent } from 'react';
import type { Piece } from '../../../../../../shared/schemas/option';
import type { RoomShell } from '../../../../../../shared/schemas/room';
import { planColour, planHandle, planStroke } from '../plan-style';

/** The arm from a piece's front edge to its turning handle, and the handle that turns it. */
export function TurnHandle({
  piece,
  front,
  stroke,
  onPointerDown,
}: {
  piece: Pick<Piece, 'x' | 'y'>;
  front: [number, number];
  stroke: number;
  onPointerDown: (e: PointerEvent) => void;
}) {
  const p = piece;
  const arm = planHandle.turnArmMm;
  return (
    <g>
      <line
        x1={front[0]}
        y1={front[1]}
        x2={front[0] + ((front[0] - p.x) / Math.hypot(front[0] - p.x, front[1] - p.y || 1)) * arm}
        y2={front[1] + ((front[1] - p.y) / Math.hypot(front[0] - p.x, front[1] - p.y || 1)) * arm}
        stroke={planColour.selectedStroke}
        strokeWidth={stroke * planStroke.turnArm}
      />
      <circle
        data-testid="turn-handle"
        cx={front[0] + ((front[0] - p.x) / (Math.hypot(front[0] - p.x, front[1] - p.y) || 1)) * arm}
        cy={front[1] + ((front[1] - p.y) / (Math.hypot(front[0] - p.x, front[1] - p.y) || 1)) * arm}
        r={stroke * planHandle.turnRadius}
        fill={planColour.handleFill}
        stroke={planColour.selectedStroke}
        strokeWidth={stroke * planStroke.handle}
        className="cursor-grab"
        onPointerDown={onPointerDown}
      >
        <title>Drag to turn (15° steps; hold Shift to turn freely)</title>
      </circle>
    </g>
  );
}

/** One handle per corner of the outline, dragged to move it. */
export function CornerHandles({
  outline,
  stroke,
  onPointerDown,
}: {
  outline: RoomShell['outline'];
  stroke: number;
  onPointerDown: (e: PointerEvent, index: number) => void;
}) {
  return (
    <>
      {outline.map((c, i) => (
        <circle
          key={`corner-${i}`}
          data-testid={`corner-${i}`}
          cx={c[0]}
          cy={c[1]}
          r={stroke * planHandle.cornerRadius}
          fill={planColour.handleFill}
          stroke={planColour.selectedStroke}
          strokeWidth={stroke * planStroke.corner}
          className="cursor-move"
          onPointerDown={(e) => onPointerDown(e, i)}
        >
          <title>Corner {i + 1}: drag to move (hold Shift to skip lining up)</title>
        </circle>
      ))}
    </>
  );
}
