// The floor and the walls' cut, and each wall's wide invisible line that picks it (drawn in the
// selection colour when the wall is selected); pressing the floor pans like the background.
import type { PointerEvent } from 'react';
import type { RoomShell } from '../../../../../../shared/schemas/room';
import { ringPath, type PlanLayout, type Selection } from '../plan-geometry';
import { planColour, planStroke } from '../plan-style';

export function WallsLayer({
  shell,
  layout,
  selection,
  pickable,
  stroke,
  onFloorPointerDown,
  onWallPointerDown,
}: {
  shell: RoomShell;
  layout: PlanLayout;
  selection: Selection;
  /** Whether walls are picked in this step. */
  pickable: boolean;
  stroke: number;
  onFloorPointerDown: (e: PointerEvent) => void;
  onWallPointerDown: (e: PointerEvent, index: number) => void;
}) {
  const wallPath = `${ringPath(layout.outer)} ${ringPath(shell.outline)}`;
  return (
    <>
      <path d={ringPath(shell.outline)} fill={planColour.floor} onPointerDown={onFloorPointerDown} />
      <path d={wallPath} fillRule="evenodd" fill={planColour.wallFill} />
      {layout.walls.map((w) => (
        <line
          key={`wall-${w.index}`}
          x1={w.start[0]}
          y1={w.start[1]}
          x2={w.end[0]}
          y2={w.end[1]}
          stroke={selection?.kind === 'wall' && selection.index === w.index ? planColour.selectedStroke : 'transparent'}
          strokeWidth={Math.max(w.thicknessMm, stroke * planStroke.wallPickMin)}
          className={pickable ? 'cursor-pointer' : ''}
          onPointerDown={(e) => onWallPointerDown(e, w.index)}
          data-testid={`wall-${w.index}`}
        />
      ))}
    </>
  );
}
