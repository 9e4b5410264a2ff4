// A fit check finding's zone: the floor a blocked door swings or a drawer pulls out into, drawn as
// a thin dashed outline with a faint wash, like a room door's swing.
import { dashArray, planColour, planDash, planOpacity, planStroke } from '../plan-style';

export function ZoneLayer({ zone, stroke }: { zone: readonly (readonly [number, number])[]; stroke: number }) {
  return (
    <polygon
      data-testid="finding-zone"
      pointerEvents="none"
      points={zone.map(([x, y]) => `${x},${y}`).join(' ')}
      fill={planColour.flaggedStroke}
      fillOpacity={planOpacity.zoneFill}
      stroke={planColour.flaggedStroke}
      strokeWidth={stroke * planStroke.zone}
      strokeDasharray={dashArray(planDash.zone, stroke)}
      strokeLinejoin="round"
    />
  );
}
