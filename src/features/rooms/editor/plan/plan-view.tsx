// The plan, seen from above and true to size: SVG in plan millimetres (x right, y down).
// Pointer gestures turn into named commands; one gesture is one undo step. This file composes the
// viewport, the gestures and the drawing layers (layers/), drawn in the style of plan-style.ts.
import { useMemo } from 'react';
import type { Command } from '../../../../../shared/commands';
import type { Piece } from '../../../../../shared/schemas/option';
import type { RoomShell } from '../../../../../shared/schemas/room';
import type { LengthUnit } from '../../../../../shared/units/length';
import type { EditorStep } from '../steps';
import { DimensionsLayer } from './layers/dimensions-layer';
import { DraftLayer, WalkPreviewLayer } from './layers/drawing-layer';
import { GapLayer } from './layers/gap-layer';
import { ZoneLayer } from './layers/zone-layer';
import { GridLayer } from './layers/grid-layer';
import { CornerHandles } from './layers/handles-layer';
import { HoldingLayer } from './layers/holding-layer';
import { OpeningsLayer } from './layers/openings-layer';
import { PiecesLayer } from './layers/pieces-layer';
import { WallsLayer } from './layers/walls-layer';
import type { Highlight, Selection } from './plan-geometry';
import { planStroke, planText } from './plan-style';
import { visibleRoomCentre } from './plan-viewport';
import { usePlanGestures, wallsPickable } from './use-plan-gestures';
import { usePlanViewport } from './use-plan-viewport';

export type { Highlight } from './plan-geometry';
export { ALIGN_SNAP_MM, CLOSE_SNAP_MM, CORNER_GRID_MM } from './plan-snap';

interface Props {
  shell: RoomShell;
  optionId: string;
  pieces: Piece[];
  step: EditorStep;
  selection: Selection;
  onSelect: (s: Selection) => void;
  run: (command: Command, options?: { gesture?: string }) => boolean;
  finishGesture: () => void;
  readOnly: boolean;
  unit: LengthUnit;
  newId: (prefix: string) => string;
  drawing: boolean;
  onDrawingDone: () => void;
  highlight?: Highlight | null;
  flaggedPieceIds?: string[];
  /** A typed walk being measured, drawn dashed before it replaces the outline. */
  preview?: [number, number][] | null;
  /** Kept up to date with the middle of what the plan shows of the room, where added pieces land. */
  viewCentre?: { current: [number, number] | null };
}

export function PlanView(props: Props) {
  const { shell, pieces, step, selection, readOnly, unit } = props;
  const { svgRef, layout, view, changeView, toPlan, mmPerPx } = usePlanViewport(shell, pieces);
  if (props.viewCentre) {
    // The visible part of the room's box, so a view panned half off the room still adds into it.
    props.viewCentre.current = visibleRoomCentre(view, layout.roomBounds);
  }
  const text = planText.sizePx * mmPerPx;
  const stroke = planStroke.basePx * mmPerPx;

  const pieceById = useMemo(() => new Map(pieces.map((p) => [p.id, p])), [pieces]);
  const editable = !readOnly;
  // Pieces move in Furnish, and in Check too, so the findings can be watched as a piece is dragged.
  const movable = editable && (step === 'furnish' || step === 'check');
  const g = usePlanGestures({
    shell,
    optionId: props.optionId,
    pieces,
    pieceById,
    step,
    layout,
    view,
    changeView,
    toPlan,
    mmPerPx,
    editable,
    movable,
    drawing: props.drawing,
    onDrawingDone: props.onDrawingDone,
    onSelect: props.onSelect,
    run: props.run,
    finishGesture: props.finishGesture,
    newId: props.newId,
  });
  const drag = g.drag;
  const ghost = drag?.kind === 'piece' && drag.ghost ? { id: drag.id, at: drag.ghost } : undefined;
  // What every drawing of the room itself takes: the layout, the selection and the line width.
  const drawn = { layout, selection, stroke };
  const flagged = new Set([...(props.flaggedPieceIds ?? []), ...(props.highlight?.pieceIds ?? [])]);

  return (
    <svg
      ref={svgRef}
      role="application"
      aria-label="Plan of the room, seen from above"
      data-testid="plan"
      className={`h-full w-full touch-none select-none ${props.drawing ? 'cursor-crosshair' : drag?.kind === 'pan' ? 'cursor-grabbing' : ''}`}
      viewBox={`${view.x} ${view.y} ${view.w} ${view.h}`}
      preserveAspectRatio="xMidYMid meet"
      onPointerMove={g.onPointerMove}
      onPointerUp={g.onPointerUp}
      onPointerLeave={g.onPointerLeave}
      onWheel={g.onWheel}
      onDragOver={g.onDragOver}
      onDrop={g.onDrop}
    >
      <GridLayer view={view} stroke={stroke} onPointerDown={g.onBackgroundPointerDown} />
      {(step === 'furnish' || pieces.some((p) => !p.placed)) && (
        <HoldingLayer holding={layout.holding} stroke={stroke} text={text} onPointerDown={g.onBackgroundPointerDown} />
      )}
      <WallsLayer
        shell={shell}
        {...drawn}
        pickable={wallsPickable(step)}
        onFloorPointerDown={g.onBackgroundPointerDown}
        onWallPointerDown={g.onWallPointerDown}
      />
      <OpeningsLayer
        shell={shell}
        {...drawn}
        draggable={step === 'openings' && editable}
        onOpeningPointerDown={g.onOpeningPointerDown}
      />
      <DimensionsLayer {...drawn} unit={unit} text={text} onWallLengthPointerDown={g.onWallLengthPointerDown} />
      <PiecesLayer
        {...drawn}
        pieces={pieces}
        flagged={flagged}
        ghost={ghost}
        movable={movable}
        turnable={editable && step === 'furnish'}
        text={text}
        onPiecePointerDown={g.onPiecePointerDown}
        onTurnPointerDown={g.onTurnPointerDown}
      />
      {props.highlight?.zone && <ZoneLayer zone={props.highlight.zone} stroke={stroke} />}
      {props.highlight?.gap && <GapLayer gap={props.highlight.gap} stroke={stroke} text={text} />}
      {step === 'outline' && editable && !props.drawing && (
        <CornerHandles outline={shell.outline} stroke={stroke} onPointerDown={g.onCornerPointerDown} />
      )}
      {props.drawing && g.draft.length > 0 && (
        <DraftLayer draft={g.draft} pointer={g.pointer} unit={unit} stroke={stroke} text={text} />
      )}
      {props.preview && props.preview.length > 1 && <WalkPreviewLayer preview={props.preview} stroke={stroke} />}
    </svg>
  );
}
