// Openings: a gap in the wall (washed when selected), windows with their two glass lines, and each
// door's leaf standing open with its dashed swing.
import type { PointerEvent } from 'react';
import type { RoomShell } from '../../../../../../shared/schemas/room';
import { mid, ringPath, type PlanLayout, type Selection } from '../plan-geometry';
import { dashArray, planColour, planDash, planStroke, WINDOW_GLASS_AT } from '../plan-style';

export function OpeningsLayer({
  shell,
  layout,
  selection,
  draggable,
  stroke,
  onOpeningPointerDown,
}: {
  shell: RoomShell;
  layout: PlanLayout;
  selection: Selection;
  /** Whether openings slide along their walls in this step. */
  draggable: boolean;
  stroke: number;
  onOpeningPointerDown: (e: PointerEvent, id: string) => void;
}) {
  return (
    <>
      {layout.openings.placements.map((o) => {
        const opening = shell.openings.find((x) => x.id === o.id)!;
        const selected = selection?.kind === 'opening' && selection.id === o.id;
        return (
          <g
            key={o.id}
            data-testid={`opening-${o.id}`}
            className={draggable ? 'cursor-ew-resize' : 'cursor-pointer'}
            onPointerDown={(e) => onOpeningPointerDown(e, o.id)}
          >
            <path
              d={ringPath([o.insideStart, o.insideEnd, o.outsideEnd, o.outsideStart])}
              fill={selected ? planColour.openingSelectedFill : planColour.openingFill}
              stroke={selected ? planColour.selectedStroke : 'none'}
              strokeWidth={stroke * planStroke.openingSelected}
            />
            {opening.type === 'window' && (
              <>
                {WINDOW_GLASS_AT.map((t) => (
                  <line
                    key={t}
                    x1={mid(o.insideStart, o.outsideStart, t)[0]}
                    y1={mid(o.insideStart, o.outsideStart, t)[1]}
                    x2={mid(o.insideEnd, o.outsideEnd, t)[0]}
                    y2={mid(o.insideEnd, o.outsideEnd, t)[1]}
                    stroke={planColour.windowGlass}
                    strokeWidth={stroke * planStroke.windowGlass}
                  />
                ))}
              </>
            )}
          </g>
        );
      })}
      {layout.openings.swings.map((s) => {
        const r = s.leafLengthMm;
        const sweepFlag = s.sweepDeg > 0 ? 1 : 0;
        return (
          <g key={`swing-${s.openingId}`} pointerEvents="none">
            <line
              x1={s.hingeMm[0]}
              y1={s.hingeMm[1]}
              x2={s.openTipMm[0]}
              y2={s.openTipMm[1]}
              stroke={planColour.doorLeaf}
              strokeWidth={stroke * planStroke.doorLeaf}
            />
            <path
              d={`M${s.closedTipMm[0]} ${s.closedTipMm[1]} A${r} ${r} 0 0 ${sweepFlag} ${s.openTipMm[0]} ${s.openTipMm[1]}`}
              fill="none"
              stroke={planColour.doorSwing}
              strokeWidth={stroke * planStroke.doorSwing}
              strokeDasharray={dashArray(planDash.doorSwing, stroke)}
            />
          </g>
        );
      })}
    </>
  );
}
