// The plan's gestures as a hook: pointer drags of pieces, their turning handle, corners, walls and
// openings turned into named commands (one gesture is one undo step), panning and wheel zoom,
// clicking corners to draw an outline, and catalogue pieces dropped onto the plan.
import { useEffect, useState, type DragEvent, type PointerEvent, type WheelEvent } from 'react';
import type { Piece } from '../../../../../shared/schemas/option';
import type { RoomShell } from '../../../../../shared/schemas/room';
import {
  addPiece,
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
  type Command,
} from '../../../../../shared/commands';
import { pieceFromCatalogue, type CatalogueId } from '../../../../../shared/catalogue/catalogue';
import { distance } from '../../../../../shared/geometry/vec';
import type { EditorStep } from '../steps';
import { inHolding, placedNear, type PlanLayout, type Selection } from './plan-geometry';
import { alignToNeighbours, CLOSE_SNAP_MM, CORNER_GRID_MM, drawPoint } from './plan-snap';
import { planHandle } from './plan-style';
import { panView, wheelZoomFactor, zoomAbout, type ViewBox } from './plan-viewport';

/** What a catalogue entry dragged onto the plan carries. */
export const CATALOGUE_DRAG_TYPE = 'application/x-parlour-catalogue';

export type Drag =
  | { kind: 'piece'; id: string; offset: [number, number]; gesture: string; held: boolean; ghost?: [number, number] }
  | { kind: 'turn'; id: string; gesture: string }
  | { kind: 'corner'; index: number; gesture: string }
  | { kind: 'wall'; index: number; start: [number, number]; outline: RoomShell['outline']; gesture: string }
  | { kind: 'opening'; id: string; grab: number; gesture: string }
  | { kind: 'pan'; start: [number, number]; box: ViewBox };

let gestureCounter = 0;
const nextGesture = (what: string) => `${what}-${++gestureCounter}`;

/** The steps in which a wall is picked on the plan. */
const WALL_STEPS: readonly EditorStep[] = ['outline', 'openings', 'finishes'];
export const wallsPickable = (step: EditorStep) => WALL_STEPS.includes(step);

export interface PlanGestureInput {
  shell: RoomShell;
  optionId: string;
  pieces: Piece[];
  pieceById: Map<string, Piece>;
  step: EditorStep;
  layout: PlanLayout;
  view: ViewBox;
  changeView: (next: (v: ViewBox) => ViewBox) => void;
  toPlan: (clientX: number, clientY: number) => [number, number];
  mmPerPx: number;
  editable: boolean;
  movable: boolean;
  drawing: boolean;
  onDrawingDone: () => void;
  onSelect: (s: Selection) => void;
  run: (command: Command, options?: { gesture?: string }) => boolean;
  finishGesture: () => void;
  newId: (prefix: string) => string;
}

const capture = (e: PointerEvent) => (e.target as Element).setPointerCapture?.(e.pointerId);

export function usePlanGestures(input: PlanGestureInput) {
  const { shell, optionId, pieces, pieceById, step, layout, view, changeView, toPlan, mmPerPx } = input;
  const { editable, movable, drawing, onSelect, run, finishGesture } = input;
  const [drag, setDrag] = useState<Drag | null>(null);
  const [draft, setDraft] = useState<[number, number][]>([]);
  const [pointer, setPointer] = useState<[number, number] | null>(null);

  useEffect(() => {
    if (!drawing) setDraft([]);
  }, [drawing]);

  const onPiecePointerDown = (e: PointerEvent, piece: Piece) => {
    e.stopPropagation();
    onSelect({ kind: 'piece', id: piece.id });
    if (!movable) return;
    capture(e);
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

  const onTurnPointerDown = (e: PointerEvent, id: string) => {
    e.stopPropagation();
    capture(e);
    setDrag({ kind: 'turn', id, gesture: nextGesture('turn') });
  };

  const onCornerPointerDown = (e: PointerEvent, index: number) => {
    e.stopPropagation();
    capture(e);
    setDrag({ kind: 'corner', index, gesture: nextGesture('corner') });
  };

  const onWallPointerDown = (e: PointerEvent, index: number) => {
    if (!wallsPickable(step)) return;
    e.stopPropagation();
    onSelect({ kind: 'wall', index });
    if (step === 'outline' && editable && !drawing) {
      capture(e);
      setDrag({
        kind: 'wall',
        index,
        start: toPlan(e.clientX, e.clientY),
        outline: shell.outline,
        gesture: nextGesture('wall'),
      });
    }
  };

  const onWallLengthPointerDown = (e: PointerEvent, index: number) => {
    e.stopPropagation();
    onSelect({ kind: 'wall', index });
  };

  const onOpeningPointerDown = (e: PointerEvent, id: string) => {
    e.stopPropagation();
    onSelect({ kind: 'opening', id });
    if (!editable || step !== 'openings') return;
    const opening = shell.openings.find((x) => x.id === id)!;
    capture(e);
    const wall = layout.walls[opening.wall];
    const at = toPlan(e.clientX, e.clientY);
    const along = (at[0] - wall.start[0]) * wall.direction[0] + (at[1] - wall.start[1]) * wall.direction[1];
    setDrag({ kind: 'opening', id, grab: along - opening.offset, gesture: nextGesture('opening') });
  };

  const onPointerMove = (e: PointerEvent) => {
    const at = toPlan(e.clientX, e.clientY);
    setPointer(at);
    if (!drag) return;
    if (drag.kind === 'pan') {
      const dx = at[0] - drag.start[0];
      const dy = at[1] - drag.start[1];
      changeView((v) => panView(v, dx, dy));
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
      const slide = Math.round(d / CORNER_GRID_MM) * CORNER_GRID_MM;
      const n = drag.outline.length;
      const moved = drag.outline.map((c, i) =>
        i === drag.index || i === (drag.index + 1) % n
          ? ([Math.round(c[0] + wall.outward[0] * slide), Math.round(c[1] + wall.outward[1] * slide)] as [number, number])
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

  const onPointerUp = (e: PointerEvent) => {
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

  const onBackgroundPointerDown = (e: PointerEvent) => {
    const at = toPlan(e.clientX, e.clientY);
    if (drawing && editable) {
      const p = drawPoint(draft, at, e.shiftKey);
      if (draft.length >= 3 && distance(p, draft[0]) < Math.max(CLOSE_SNAP_MM, planHandle.closeSnapPx * mmPerPx)) {
        if (run(setOutline(draft))) input.onDrawingDone();
        setDraft([]);
        return;
      }
      setDraft([...draft, p]);
      return;
    }
    onSelect(null);
    capture(e);
    setDrag({ kind: 'pan', start: at, box: view });
  };

  const onWheel = (e: WheelEvent) => {
    const at = toPlan(e.clientX, e.clientY);
    const factor = wheelZoomFactor(e.deltaY);
    changeView((v) => zoomAbout(v, at, factor));
  };

  const onDragOver = (e: DragEvent) => {
    if (e.dataTransfer.types.includes(CATALOGUE_DRAG_TYPE)) e.preventDefault();
  };

  const onDrop = (e: DragEvent) => {
    const kind = e.dataTransfer.getData(CATALOGUE_DRAG_TYPE);
    if (!kind || !editable) return;
    e.preventDefault();
    const at = toPlan(e.clientX, e.clientY);
    const id = input.newId('piece');
    let piece = pieceFromCatalogue(kind as CatalogueId, id, [Math.round(at[0]), Math.round(at[1])]);
    if (inHolding(layout, at)) piece = { ...piece, placed: false };
    else piece = placedNear(shell, pieces, piece, at);
    if (run(addPiece(optionId, piece))) onSelect({ kind: 'piece', id });
  };

  return {
    drag,
    draft,
    pointer,
    onPointerMove,
    onPointerUp,
    onPointerLeave: () => setPointer(null),
    onWheel,
    onDragOver,
    onDrop,
    onBackgroundPointerDown,
    onPiecePointerDown,
    onTurnPointerDown,
    onCornerPointerDown,
    onWallPointerDown,
    onWallLengthPointerDown,
    onOpeningPointerDown,
  };
}

export type PlanGestures = ReturnType<typeof usePlanGestures>;
