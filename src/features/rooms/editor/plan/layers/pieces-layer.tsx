// The pieces: each one's box filled by its status (a walked-over piece as floor, a walked-under one
// faded, a raised one dashed, all by the one piece rule), its top view and label, its front edge,
// and the turning handle when it is selected; flagged pieces in the finding colour. Rugs are drawn
// first, below the pieces standing on them, so those take their clicks (piece-order.ts).
import type { PointerEvent } from 'react';
import { isWalkedOver, isWalkedUnder } from '../../../../../../shared/geometry/piece';
import type { Piece } from '../../../../../../shared/schemas/option';
import { mid, pieceRing, ringPath, type PlanLayout, type Selection } from '../plan-geometry';
import { PieceLabel, PieceTopView } from '../plan-piece-forms';
import { piecesInDrawOrder } from '../piece-order';
import { dashArray, planColour, planDash, planOpacity, planStroke } from '../plan-style';
import { TurnHandle } from './handles-layer';

/** A piece's fill on the plan: a rug as floor, else its own colour, else by whether the client has it. */
export function pieceFill(piece: Piece): string {
  if (isWalkedOver(piece)) return planColour.rugFill;
  return piece.colour ?? (piece.status === 'existing' ? planColour.existingPieceFill : planColour.newPieceFill);
}

export function PiecesLayer({
  pieces,
  layout,
  selection,
  flagged,
  ghost,
  movable,
  turnable,
  stroke,
  text,
  onPiecePointerDown,
  onTurnPointerDown,
}: {
  pieces: Piece[];
  layout: PlanLayout;
  selection: Selection;
  flagged: Set<string>;
  /** Where a piece being dragged in or out of the holding area is drawn meanwhile. */
  ghost?: { id: string; at: [number, number] };
  movable: boolean;
  /** Whether a selected placed piece shows its turning handle. */
  turnable: boolean;
  stroke: number;
  text: number;
  onPiecePointerDown: (e: PointerEvent, piece: Piece) => void;
  onTurnPointerDown: (e: PointerEvent, id: string) => void;
}) {
  return (
    <>
      {piecesInDrawOrder(pieces).map((p) => {
        const held = !p.placed;
        const ghostAt = ghost?.id === p.id ? ghost.at : undefined;
        const centre = ghostAt ?? (held ? layout.holding.slots[p.id] : [p.x, p.y]);
        if (!centre) return null;
        const pose = { ...p, x: centre[0], y: centre[1] };
        const selected = selection?.kind === 'piece' && selection.id === p.id;
        const ring = pieceRing(pose);
        const flaggedPiece = flagged.has(p.id);
        const front = mid(ring[2], ring[3], 0.5);
        // Walked over (rugs) reads as floor; walked under (above head height) is drawn faded.
        const rug = isWalkedOver(p);
        const fill = pieceFill(p);
        const outline = {
          stroke: flaggedPiece ? planColour.flaggedStroke : selected ? planColour.selectedStroke : planColour.pieceStroke,
          strokeWidth: stroke * (selected || flaggedPiece ? planStroke.pieceSelected : planStroke.piece),
          strokeDasharray: p.elevation > 0 && !rug ? dashArray(planDash.raisedPiece, stroke) : undefined,
        };
        return (
          <g
            key={p.id}
            data-testid={`piece-${p.id}`}
            data-placed={p.placed ? 'true' : 'false'}
            data-x={Math.round(p.x)}
            data-y={Math.round(p.y)}
            data-rotation={Math.round(p.rotation)}
            className={movable ? 'cursor-move' : 'cursor-pointer'}
            onPointerDown={(e) => onPiecePointerDown(e, p)}
            opacity={isWalkedUnder(p) ? planOpacity.walkedUnder : 1}
          >
            <path d={ringPath(ring)} fill={fill} fillOpacity={rug ? planOpacity.rugFill : planOpacity.pieceFill} {...outline} />
            <PieceTopView piece={pose} fill={fill} stroke={stroke * planStroke.partLine} />
            {/* The box outline again over the top view: the box is what is dragged and checked. */}
            <path d={ringPath(ring)} fill="none" pointerEvents="none" {...outline} />
            {/* The front edge, where a person sits or stands to use the piece */}
            <line
              x1={ring[2][0]}
              y1={ring[2][1]}
              x2={ring[3][0]}
              y2={ring[3][1]}
              stroke={selected ? planColour.selectedStroke : planColour.pieceFront}
              strokeWidth={stroke * planStroke.pieceFront}
              strokeLinecap="round"
            />
            <PieceLabel piece={pose} text={text} fill={fill} />
            {selected && turnable && p.placed && !ghostAt && (
              <TurnHandle piece={p} front={front} stroke={stroke} onPointerDown={(e) => onTurnPointerDown(e, p.id)} />
            )}
          </g>
        );
      })}
    </>
  );
}
