// The plan, seen from above and true to size: SVG in plan millimetres (x right, y down).
// Pointer gestures turn into named commands; one gesture is one undo step.
import { useCallback, useEffect, useMemo, useRef, useState, type PointerEvent as ReactPointerEvent } from 'react';
import type { Piece } from '../../../../../shared/schemas/option';
import type { RoomShell } from '../../../../../shared/schemas/room';
import {
  holdPiece,
  moveCorner,
  movePiece,
  placePiece,
  rotatePiece,
  setOutline,
  snapAngle,
  snapPieceToPieces,
  snapPieceToWalls,
  snapToGrid,
  updateOpening,
  addPiece,
  type Command,
} from '../../../../../shared/commands';
import { pieceFromCatalogue, type CatalogueId } from '../../../../../shared/catalogue/catalogue';
import { formatLength, type LengthUnit } from '../../../../../shared/units/length';
import { isWalkedOver, isWalkedUnder } from '../../../../../shared/geometry/piece';
import { distance } from '../../../../../shared/geometry/vec';
import {
  DIMENSION_OFFSET_MM,
  fitViewBox,
  inHolding,
  pieceRing,
  placedNear,
  planLayout,
  ringPath,
  type Selection,
} from './plan-geometry';
import type { EditorStep } from '../steps';
import { PieceLabel, PieceTopView } from './plan-piece-forms';

/** Corners snap to this grid while dragged or clicked (plan mm). */
export const CORNER_GRID_MM = 10;
/** A dragged corner lines up with a neighbour's x or y when this close. */
export const ALIGN_SNAP_MM = 80;
/** Clicking this close to the first corner closes a drawn outline. */
export const CLOSE_SNAP_MM = 200;
/** How far in front of a piece its turning handle sits. */
const TURN_HANDLE_MM = 280;

export interface Highlight {
  pieceIds: string[];
  gap?: { a: [number, number]; b: [number, number]; label: string };
}

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

type Drag =
  | { kind: 'piece'; id: string; offset: [number, number]; gesture: string; held: boolean; ghost?: [number, number] }
  | { kind: 'turn'; id: string; gesture: string }
  | { kind: 'corner'; index: number; gesture: string }
  | { kind: 'wall'; index: number; start: [number, number]; outline: RoomShell['outline']; gesture: string }
  | { kind: 'opening'; id: string; grab: number; gesture: string }
  | { kind: 'pan'; start: [number, number]; box: { x: number; y: number; w: number; h: number } };

let gestureCounter = 0;
const nextGesture = (what: string) => `${what}-${++gestureCounter}`;

export function PlanView(props: Props) {
  const { shell, optionId, pieces, step, selection, onSelect, run, finishGesture, readOnly, unit, newId } = props;
  const svgRef = useRef<SVGSVGElement>(null);
  const [box, setBox] = useState<{ w: number; h: number } | null>(null);
  // A tall, narrow panel (side by side with the 3D at 1280) keeps the holding area below the room,
  // so the room gets the panel's width.
  const side = box && box.h > box.w * 1.15 ? 'below' : 'right';
  const layout = useMemo(() => planLayout(shell, pieces, side), [shell, pieces, side]);
  const [view, setView] = useState(layout.viewBox);
  const [drag, setDrag] = useState<Drag | null>(null);
  const [draft, setDraft] = useState<[number, number][]>([]);
  const [pointer, setPointer] = useState<[number, number] | null>(null);
  const fitted = useRef(false);

  // Fit the view to the room, as large as the panel allows, when it first appears, when the panel
  // changes size and when the outline grows past the view. Only the room counts afterwards: pieces
  // joining the holding area never change the plan's scale.
  const boxW = box?.w ?? 0;
  const boxH = box?.h ?? 0;
  // A new panel size (plan alone, side by side, a wider window) is a fresh fit, unless the
  // designer has panned or zoomed the plan themselves.
  const moved = useRef(false);
  useEffect(() => {
    if (!moved.current) fitted.current = false;
  }, [boxW, boxH]);
  useEffect(() => {
    if (boxW === 0 || boxH === 0) return;
    const fit = fitViewBox(layout.content, { w: boxW, h: boxH });
    const rb = layout.roomBounds;
    setView((v) => {
      if (!fitted.current) {
        fitted.current = true;
        return fit;
      }
      const outside = rb.minX < v.x || rb.minY < v.y || rb.maxX > v.x + v.w || rb.maxY > v.y + v.h;
      return outside ? fit : v;
    });
  }, [layout.content, layout.roomBounds, boxW, boxH]);

  useEffect(() => {
    if (!props.drawing) setDraft([]);
  }, [props.drawing]);

  const toPlan = useCallback((clientX: number, clientY: number): [number, number] => {
    const svg = svgRef.current;
    const ctm = svg?.getScreenCTM();
    if (!svg || !ctm) return [0, 0];
    const p = new DOMPoint(clientX, clientY).matrixTransform(ctm.inverse());
    return [p.x, p.y];
  }, []);

  // Text and lines keep their size on screen whatever the zoom: sizes are in screen pixels times
  // plan mm per pixel (the view box is fitted with "meet", so the tighter axis sets the scale).
  useEffect(() => {
    const svg = svgRef.current;
    if (!svg) return;
    const observer = new ResizeObserver(([entry]) =>
      setBox({ w: entry.contentRect.width || 800, h: entry.contentRect.height || 600 }),
    );
    observer.observe(svg);
    return () => observer.disconnect();
  }, []);
  const mmPerPx = Math.max(view.w / (box?.w || 800), view.h / (box?.h || 600));
  if (props.viewCentre) {
    // The visible part of the room's box, so a view panned half off the room still adds into it.
    const rb = layout.roomBounds;
    const x0 = Math.max(view.x, rb.minX);
    const x1 = Math.min(view.x + view.w, rb.maxX);
    const y0 = Math.max(view.y, rb.minY);
    const y1 = Math.min(view.y + view.h, rb.maxY);
    props.viewCentre.current = x0 < x1 && y0 < y1 ? [(x0 + x1) / 2, (y0 + y1) / 2] : null;
  }
  const text = 12 * mmPerPx;
  const stroke = 1 * mmPerPx;

  const pieceById = useMemo(() => new Map(pieces.map((p) => [p.id, p])), [pieces]);
  const editable = !readOnly;
  // Pieces move in Furnish, and in Check too, so the findings can be watched as a piece is dragged.
  const movable = editable && (step === 'furnish' || step === 'check');

  // ——— pointer handling ———
  const onPointerDownPiece = (e: ReactPointerEvent, piece: Piece) => {
    e.stopPropagation();
    onSelect({ kind: 'piece', id: piece.id });
    if (!movable) return;
    (e.target as Element).setPointerCapture?.(e.pointerId);
    const at = toPlan(e.clientX, e.clientY);
    const centre = piece.placed ? [piece.x, piece.y] : (layout.holding.slots[piece.id] ?? [piece.x, piece.y]);
    setDrag({
      kind: 'piece',
      id: piece.id,
      offset: [at[0] - centre[0], at[1] - centre[1]],
      gesture: nextGesture('move'),
      held: !piece.placed,
    });
  };

  const onPointerMove = (e: ReactPointerEvent) => {
    const at = toPlan(e.clientX, e.clientY);
    setPointer(at);
    if (!drag) return;
    if (drag.kind === 'pan') {
      const now = at;
      const dx = now[0] - drag.start[0];
      const dy = now[1] - drag.start[1];
      moved.current = true;
      setView((v) => ({ ...v, x: v.x - dx, y: v.y - dy }));
      return;
    }
    if (drag.kind === 'piece') {
      const piece = pieceById.get(drag.id);
      if (!piece) return;
      const centre: [number, number] = [at[0] - drag.offset[0], at[1] - drag.offset[1]];
      if (drag.held || inHolding(layout, centre)) {
        setDrag({ ...drag, ghost: centre });
        return;
      }
      let pose = { ...piece, x: centre[0], y: centre[1] };
      if (!e.altKey) {
        const wall = snapPieceToWalls(pose, shell);
        pose = wall.piece;
        pose = snapPieceToPieces(pose, pieces).piece;
      }
      setDrag({ ...drag, ghost: undefined });
      run(movePiece(optionId, piece.id, Math.round(pose.x), Math.round(pose.y)), { gesture: drag.gesture });
      if (pose.rotation !== piece.rotation) run(rotatePiece(optionId, piece.id, pose.rotation), { gesture: drag.gesture });
      return;
    }
    if (drag.kind === 'turn') {
      const piece = pieceById.get(drag.id);
      if (!piece) return;
      const dx = at[0] - piece.x;
      const dy = at[1] - piece.y;
      // The front (own +y) points at the pointer: rotation θ with (−sin θ, cos θ) = direction.
      const free = (Math.atan2(-dx, dy) * 180) / Math.PI;
      const rotation = e.shiftKey ? Math.round(free) : snapAngle(free);
      run(rotatePiece(optionId, piece.id, rotation), { gesture: drag.gesture });
      return;
    }
    if (drag.kind === 'corner') {
      let p = snapToGrid(at, CORNER_GRID_MM) as [number, number];
      if (!e.shiftKey) p = alignToNeighbours(shell.outline, drag.index, p);
      run(moveCorner(drag.index, p[0], p[1]), { gesture: drag.gesture });
      return;
    }
    if (drag.kind === 'wall') {
      // The wall slides square to itself: both its corners move along its outward normal.
      const wall = layout.walls[drag.index];
      if (!wall) return;
      const d = (at[0] - drag.start[0]) * wall.outward[0] + (at[1] - drag.start[1]) * wall.outward[1];
      const step = Math.round(d / CORNER_GRID_MM) * CORNER_GRID_MM;
      const n = drag.outline.length;
      const moved = drag.outline.map((c, i) =>
        i === drag.index || i === (drag.index + 1) % n
          ? ([Math.round(c[0] + wall.outward[0] * step), Math.round(c[1] + wall.outward[1] * step)] as [number, number])
          : c,
      );
      run(setOutline(moved), { gesture: drag.gesture });
      return;
    }
    if (drag.kind === 'opening') {
      const opening = shell.openings.find((o) => o.id === drag.id);
      const wall = opening && layout.walls[opening.wall];
      if (!opening || !wall) return;
      const along = (at[0] - wall.start[0]) * wall.direction[0] + (at[1] - wall.start[1]) * wall.direction[1];
      const offset = Math.round(along - drag.grab);
      run(updateOpening(opening.id, { offset: Math.max(0, offset) }), { gesture: drag.gesture });
    }
  };

  const onPointerUp = (e: ReactPointerEvent) => {
    if (drag?.kind === 'piece') {
      const piece = pieceById.get(drag.id);
      const at = toPlan(e.clientX, e.clientY);
      const centre: [number, number] = [at[0] - drag.offset[0], at[1] - drag.offset[1]];
      if (piece && inHolding(layout, centre)) {
        if (piece.placed) run(holdPiece(optionId, piece.id), { gesture: drag.gesture });
      } else if (piece && !piece.placed && drag.ghost) {
        let pose = { ...piece, x: centre[0], y: centre[1] };
        if (!e.altKey) pose = snapPieceToWalls(pose, shell).piece;
        if (
          run(placePiece(optionId, piece.id, Math.round(pose.x), Math.round(pose.y)), { gesture: drag.gesture }) &&
          pose.rotation !== piece.rotation
        ) {
          run(rotatePiece(optionId, piece.id, pose.rotation), { gesture: drag.gesture });
        }
      }
    }
    if (drag && drag.kind !== 'pan') finishGesture();
    setDrag(null);
  };

  const onBackgroundPointerDown = (e: ReactPointerEvent) => {
    const at = toPlan(e.clientX, e.clientY);
    if (props.drawing && editable) {
      const p = drawPoint(draft, at, e.shiftKey);
      if (draft.length >= 3 && distance(p, draft[0]) < Math.max(CLOSE_SNAP_MM, 14 * mmPerPx)) {
        if (run(setOutline(draft))) props.onDrawingDone();
        setDraft([]);
        return;
      }
      setDraft([...draft, p]);
      return;
    }
    onSelect(null);
    (e.target as Element).setPointerCapture?.(e.pointerId);
    setDrag({ kind: 'pan', start: at, box: view });
  };

  const onWheel = (e: React.WheelEvent) => {
    const at = toPlan(e.clientX, e.clientY);
    const factor = Math.exp(e.deltaY * 0.0015);
    moved.current = true;
    setView((v) => {
      const w = Math.min(Math.max(v.w * factor, 1500), 60000);
      const k = w / v.w;
      return { x: at[0] - (at[0] - v.x) * k, y: at[1] - (at[1] - v.y) * k, w, h: v.h * k };
    });
  };

  const onDrop = (e: React.DragEvent) => {
    const kind = e.dataTransfer.getData('application/x-parlour-catalogue');
    if (!kind || !editable) return;
    e.preventDefault();
    const at = toPlan(e.clientX, e.clientY);
    const id = newId('piece');
    let piece = pieceFromCatalogue(kind as CatalogueId, id, [Math.round(at[0]), Math.round(at[1])]);
    if (inHolding(layout, at)) piece = { ...piece, placed: false };
    else piece = placedNear(shell, pieces, piece, at);
    if (run(addPiece(optionId, piece))) onSelect({ kind: 'piece', id });
  };

  // ——— drawing ———
  const flagged = new Set([...(props.flaggedPieceIds ?? []), ...(props.highlight?.pieceIds ?? [])]);
  const wallPath = `${ringPath(layout.outer)} ${ringPath(shell.outline)}`;

  return (
    <svg
      ref={svgRef}
      role="application"
      aria-label="Plan of the room, seen from above"
      data-testid="plan"
      className={`h-full w-full touch-none select-none ${props.drawing ? 'cursor-crosshair' : drag?.kind === 'pan' ? 'cursor-grabbing' : ''}`}
      viewBox={`${view.x} ${view.y} ${view.w} ${view.h}`}
      preserveAspectRatio="xMidYMid meet"
      onPointerMove={onPointerMove}
      onPointerUp={onPointerUp}
      onPointerLeave={() => setPointer(null)}
      onWheel={onWheel}
      onDragOver={(e) => {
        if (e.dataTransfer.types.includes('application/x-parlour-catalogue')) e.preventDefault();
      }}
      onDrop={onDrop}
    >
      <defs>
        <pattern id="plan-grid" width="100" height="100" patternUnits="userSpaceOnUse">
          <path d="M100 0H0V100" fill="none" stroke="#e9e2d6" strokeWidth={0.6 * mmPerPx} />
        </pattern>
        <pattern id="plan-grid-major" width="1000" height="1000" patternUnits="userSpaceOnUse">
          <rect width="1000" height="1000" fill="url(#plan-grid)" />
          <path d="M1000 0H0V1000" fill="none" stroke="#dcd2c2" strokeWidth={1 * mmPerPx} />
        </pattern>
      </defs>
      <rect
        x={view.x - view.w}
        y={view.y - view.h}
        width={view.w * 3}
        height={view.h * 3}
        fill="url(#plan-grid-major)"
        onPointerDown={onBackgroundPointerDown}
        data-testid="plan-background"
      />

      {/* Holding area */}
      {(step === 'furnish' || pieces.some((p) => !p.placed)) && (
        <g aria-label="Holding area">
          <rect
            x={layout.holding.x}
            y={layout.holding.y}
            width={layout.holding.width}
            height={layout.holding.height}
            rx={120}
            fill="#efe8dc"
            stroke="#c9bca8"
            strokeDasharray={`${stroke * 4} ${stroke * 3}`}
            strokeWidth={stroke}
            onPointerDown={onBackgroundPointerDown}
          />
          <text
            x={layout.holding.x + layout.holding.width / 2}
            y={layout.holding.y - text * 0.7}
            textAnchor="middle"
            fontSize={text}
            fill="#5c534a"
            fontWeight={600}
          >
            Holding area
          </text>
        </g>
      )}

      {/* Floor and walls */}
      <path d={ringPath(shell.outline)} fill="#fbf8f3" onPointerDown={onBackgroundPointerDown} />
      <path d={wallPath} fillRule="evenodd" fill="#3a332d" />
      {layout.walls.map((w) => (
        <line
          key={`wall-${w.index}`}
          x1={w.start[0]}
          y1={w.start[1]}
          x2={w.end[0]}
          y2={w.end[1]}
          stroke={selection?.kind === 'wall' && selection.index === w.index ? '#2f6b5c' : 'transparent'}
          strokeWidth={Math.max(w.thicknessMm, stroke * 6)}
          className={step === 'outline' || step === 'openings' || step === 'finishes' ? 'cursor-pointer' : ''}
          onPointerDown={(e) => {
            if (step !== 'outline' && step !== 'openings' && step !== 'finishes') return;
            e.stopPropagation();
            onSelect({ kind: 'wall', index: w.index });
            if (step === 'outline' && editable && !props.drawing) {
              (e.target as Element).setPointerCapture?.(e.pointerId);
              setDrag({
                kind: 'wall',
                index: w.index,
                start: toPlan(e.clientX, e.clientY),
                outline: shell.outline,
                gesture: nextGesture('wall'),
              });
            }
          }}
          data-testid={`wall-${w.index}`}
        />
      ))}

      {/* Openings: a gap in the wall; windows show glass lines, doors their leaf and swing */}
      {layout.openings.placements.map((o) => {
        const opening = shell.openings.find((x) => x.id === o.id)!;
        const selected = selection?.kind === 'opening' && selection.id === o.id;
        return (
          <g
            key={o.id}
            data-testid={`opening-${o.id}`}
            className={step === 'openings' && editable ? 'cursor-ew-resize' : 'cursor-pointer'}
            onPointerDown={(e) => {
              e.stopPropagation();
              onSelect({ kind: 'opening', id: o.id });
              if (!editable || step !== 'openings') return;
              (e.target as Element).setPointerCapture?.(e.pointerId);
              const wall = layout.walls[opening.wall];
              const at = toPlan(e.clientX, e.clientY);
              const along = (at[0] - wall.start[0]) * wall.direction[0] + (at[1] - wall.start[1]) * wall.direction[1];
              setDrag({ kind: 'opening', id: o.id, grab: along - opening.offset, gesture: nextGesture('opening') });
            }}
          >
            <path
              d={ringPath([o.insideStart, o.insideEnd, o.outsideEnd, o.outsideStart])}
              fill={selected ? '#e3eee9' : '#fbf8f3'}
              stroke={selected ? '#2f6b5c' : 'none'}
              strokeWidth={stroke * 1.5}
            />
            {opening.type === 'window' && (
              <>
                <line
                  x1={mid(o.insideStart, o.outsideStart, 0.35)[0]}
                  y1={mid(o.insideStart, o.outsideStart, 0.35)[1]}
                  x2={mid(o.insideEnd, o.outsideEnd, 0.35)[0]}
                  y2={mid(o.insideEnd, o.outsideEnd, 0.35)[1]}
                  stroke="#5b8fa8"
                  strokeWidth={stroke}
                />
                <line
                  x1={mid(o.insideStart, o.outsideStart, 0.65)[0]}
                  y1={mid(o.insideStart, o.outsideStart, 0.65)[1]}
                  x2={mid(o.insideEnd, o.outsideEnd, 0.65)[0]}
                  y2={mid(o.insideEnd, o.outsideEnd, 0.65)[1]}
                  stroke="#5b8fa8"
                  strokeWidth={stroke}
                />
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
              stroke="#3a332d"
              strokeWidth={stroke * 1.2}
            />
            <path
              d={`M${s.closedTipMm[0]} ${s.closedTipMm[1]} A${r} ${r} 0 0 ${sweepFlag} ${s.openTipMm[0]} ${s.openTipMm[1]}`}
              fill="none"
              stroke="#786e63"
              strokeWidth={stroke * 0.8}
              strokeDasharray={`${stroke * 3} ${stroke * 2.5}`}
            />
          </g>
        );
      })}

      {/* Wall lengths */}
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
            onPointerDown={(e) => {
              e.stopPropagation();
              onSelect({ kind: 'wall', index: w.index });
            }}
            data-testid={`wall-length-${w.index}`}
          >
            <line x1={a[0]} y1={a[1]} x2={b[0]} y2={b[1]} stroke="#a39889" strokeWidth={stroke * 0.7} />
            <line
              x1={a[0] - w.outward[0] * 80}
              y1={a[1] - w.outward[1] * 80}
              x2={a[0] + w.outward[0] * 80}
              y2={a[1] + w.outward[1] * 80}
              stroke="#a39889"
              strokeWidth={stroke * 0.7}
            />
            <line
              x1={b[0] - w.outward[0] * 80}
              y1={b[1] - w.outward[1] * 80}
              x2={b[0] + w.outward[0] * 80}
              y2={b[1] + w.outward[1] * 80}
              stroke="#a39889"
              strokeWidth={stroke * 0.7}
            />
            <g transform={`translate(${m[0]} ${m[1]}) rotate(${angle})`}>
              <rect x={-text * 2.6} y={-text * 0.75} width={text * 5.2} height={text * 1.5} rx={text * 0.3} fill="#f7f3ec" />
              <text
                textAnchor="middle"
                dominantBaseline="central"
                fontSize={text * 0.95}
                fill={selection?.kind === 'wall' && selection.index === w.index ? '#24564a' : '#2a2521'}
                fontWeight={600}
              >
                {formatLength(w.lengthMm, unit)}
              </text>
            </g>
          </g>
        );
      })}

      {/* Pieces */}
      {pieces.map((p) => {
        const held = !p.placed;
        const ghost = drag?.kind === 'piece' && drag.id === p.id ? drag.ghost : undefined;
        const centre = ghost ?? (held ? layout.holding.slots[p.id] : [p.x, p.y]);
        if (!centre) return null;
        const pose = { ...p, x: centre[0], y: centre[1] };
        const selected = selection?.kind === 'piece' && selection.id === p.id;
        const ring = pieceRing(pose);
        const flaggedPiece = flagged.has(p.id);
        const front = mid(ring[2], ring[3], 0.5);
        // Walked over (rugs) reads as floor; walked under (above head height) is drawn faded.
        const rug = isWalkedOver(p);
        const fill = rug ? '#f1e7d6' : (p.colour ?? (p.status === 'existing' ? '#ece4d6' : '#ffffff'));
        const outline = {
          stroke: flaggedPiece ? '#a4472f' : selected ? '#2f6b5c' : '#5c534a',
          strokeWidth: stroke * (selected || flaggedPiece ? 2.4 : 1.1),
          strokeDasharray: p.elevation > 0 && !rug ? `${stroke * 4} ${stroke * 2}` : undefined,
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
            onPointerDown={(e) => onPointerDownPiece(e, p)}
            opacity={isWalkedUnder(p) ? 0.75 : 1}
          >
            <path d={ringPath(ring)} fill={fill} fillOpacity={rug ? 0.8 : 0.95} {...outline} />
            <PieceTopView piece={pose} fill={fill} stroke={stroke * 0.7} />
            {/* The box outline again over the top view: the box is what is dragged and checked. */}
            <path d={ringPath(ring)} fill="none" pointerEvents="none" {...outline} />
            {/* The front edge, where a person sits or stands to use the piece */}
            <line
              x1={ring[2][0]}
              y1={ring[2][1]}
              x2={ring[3][0]}
              y2={ring[3][1]}
              stroke={selected ? '#2f6b5c' : '#786e63'}
              strokeWidth={stroke * 2.4}
              strokeLinecap="round"
            />
            <PieceLabel piece={pose} text={text} fill={fill} />
            {selected && editable && step === 'furnish' && p.placed && !ghost && (
              <g>
                <line
                  x1={front[0]}
                  y1={front[1]}
                  x2={front[0] + ((front[0] - p.x) / Math.hypot(front[0] - p.x, front[1] - p.y || 1)) * TURN_HANDLE_MM}
                  y2={front[1] + ((front[1] - p.y) / Math.hypot(front[0] - p.x, front[1] - p.y || 1)) * TURN_HANDLE_MM}
                  stroke="#2f6b5c"
                  strokeWidth={stroke}
                />
                <circle
                  data-testid="turn-handle"
                  cx={front[0] + ((front[0] - p.x) / (Math.hypot(front[0] - p.x, front[1] - p.y) || 1)) * TURN_HANDLE_MM}
                  cy={front[1] + ((front[1] - p.y) / (Math.hypot(front[0] - p.x, front[1] - p.y) || 1)) * TURN_HANDLE_MM}
                  r={stroke * 7}
                  fill="#ffffff"
                  stroke="#2f6b5c"
                  strokeWidth={stroke * 1.5}
                  className="cursor-grab"
                  onPointerDown={(e) => {
                    e.stopPropagation();
                    (e.target as Element).setPointerCapture?.(e.pointerId);
                    setDrag({ kind: 'turn', id: p.id, gesture: nextGesture('turn') });
                  }}
                >
                  <title>Drag to turn (15° steps; hold Shift to turn freely)</title>
                </circle>
              </g>
            )}
          </g>
        );
      })}

      {/* A finding's narrow gap, drawn with its measurement */}
      {props.highlight?.gap && (
        <g pointerEvents="none">
          <line
            x1={props.highlight.gap.a[0]}
            y1={props.highlight.gap.a[1]}
            x2={props.highlight.gap.b[0]}
            y2={props.highlight.gap.b[1]}
            stroke="#a4472f"
            strokeWidth={stroke * 2}
          />
          <text
            x={mid(props.highlight.gap.a, props.highlight.gap.b, 0.5)[0]}
            y={mid(props.highlight.gap.a, props.highlight.gap.b, 0.5)[1] - text}
            textAnchor="middle"
            fontSize={text}
            fill="#a4472f"
            fontWeight={700}
          >
            {props.highlight.gap.label}
          </text>
        </g>
      )}

      {/* Corners, in the Outline step */}
      {step === 'outline' &&
        editable &&
        !props.drawing &&
        shell.outline.map((c, i) => (
          <circle
            key={`corner-${i}`}
            data-testid={`corner-${i}`}
            cx={c[0]}
            cy={c[1]}
            r={stroke * 6}
            fill="#ffffff"
            stroke="#2f6b5c"
            strokeWidth={stroke * 1.6}
            className="cursor-move"
            onPointerDown={(e) => {
              e.stopPropagation();
              (e.target as Element).setPointerCapture?.(e.pointerId);
              setDrag({ kind: 'corner', index: i, gesture: nextGesture('corner') });
            }}
          >
            <title>Corner {i + 1}: drag to move (hold Shift to skip lining up)</title>
          </circle>
        ))}

      {/* Drawing an outline by clicking corners */}
      {props.drawing && draft.length > 0 && (
        <g pointerEvents="none">
          <polyline
            points={[...draft, ...(pointer ? [drawPoint(draft, pointer, false)] : [])].map((p) => p.join(',')).join(' ')}
            fill="none"
            stroke="#2f6b5c"
            strokeWidth={stroke * 2}
          />
          {draft.map((p, i) => (
            <circle
              key={i}
              cx={p[0]}
              cy={p[1]}
              r={stroke * 4}
              fill={i === 0 ? '#2f6b5c' : '#ffffff'}
              stroke="#2f6b5c"
              strokeWidth={stroke}
            />
          ))}
          {pointer && (
            <text x={pointer[0] + text} y={pointer[1] - text} fontSize={text} fill="#24564a" fontWeight={600}>
              {formatLength(distance(draft[draft.length - 1], drawPoint(draft, pointer, false)), unit)}
            </text>
          )}
        </g>
      )}
      {props.preview && props.preview.length > 1 && (
        <polyline
          data-testid="walk-preview"
          points={props.preview.map((p) => p.join(',')).join(' ')}
          fill="none"
          stroke="#2f6b5c"
          strokeWidth={stroke * 2}
          strokeDasharray={`${stroke * 6} ${stroke * 4}`}
          pointerEvents="none"
        />
      )}
    </svg>
  );
}

/** A piece's name along its longer side, upright, shrunk to fit inside the box. */
function mid(a: readonly [number, number], b: readonly [number, number], t: number): [number, number] {
  return [a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t];
}

/** A clicked corner: on the 10 mm grid, and at a 15° step from the previous corner unless Shift is held. */
function drawPoint(draft: readonly [number, number][], at: [number, number], free: boolean): [number, number] {
  const grid = snapToGrid(at, CORNER_GRID_MM) as [number, number];
  const last = draft[draft.length - 1];
  if (!last || free) return grid;
  const dx = at[0] - last[0];
  const dy = at[1] - last[1];
  const len = Math.round(Math.hypot(dx, dy) / CORNER_GRID_MM) * CORNER_GRID_MM;
  const angle = (snapAngle((Math.atan2(dy, dx) * 180) / Math.PI) * Math.PI) / 180;
  return [Math.round(last[0] + Math.cos(angle) * len), Math.round(last[1] + Math.sin(angle) * len)];
}

/** A dragged corner lines up with its neighbours' x or y when close, so walls stay square. */
function alignToNeighbours(outline: RoomShell['outline'], index: number, p: [number, number]): [number, number] {
  const n = outline.length;
  const neighbours = [outline[(index + n - 1) % n], outline[(index + 1) % n]];
  let [x, y] = p;
  for (const q of neighbours) {
    if (Math.abs(q[0] - x) < ALIGN_SNAP_MM) x = q[0];
    if (Math.abs(q[1] - y) < ALIGN_SNAP_MM) y = q[1];
  }
  return [x, y];
}
