// The room editor's command layer: the editor document, named pure commands, undo history with
// gestures, and snapping helpers. Everything is plan mm (x right, y down) and degrees clockwise.
export { createEditorDoc, type EditorDoc } from './editor-doc';
export { apply, type Command, type CommandName, type CommandResult, type RunResult } from './command';
export {
  closeOutlineGap,
  insertCorner,
  moveCorner,
  removeCorner,
  setChildRoom,
  setOutline,
  setWallHeight,
  setWallLength,
  setWallThickness,
  MIN_CORNERS,
} from './outline-commands';
export { addOpening, flipHinge, flipSwing, removeOpening, updateOpening, type OpeningPatch } from './opening-commands';
export {
  addPiece,
  duplicatePiece,
  holdPiece,
  movePiece,
  placePiece,
  removePiece,
  resizePiece,
  rotatePiece,
  updatePiece,
  DUPLICATE_OFFSET_MM,
  type PiecePatch,
  type PieceSize,
} from './piece-commands';
export { assignFinish, type FinishSurface } from './finish-commands';
export { markSeen, unmarkSeen } from './seen-commands';
export {
  applyToHistory,
  canRedo,
  canUndo,
  createHistory,
  endGesture,
  redo,
  redoLabel,
  undo,
  undoLabel,
  DEFAULT_HISTORY_LIMIT,
  type ApplyOptions,
  type History,
  type HistoryOptions,
  type HistoryResult,
  type HistoryStep,
} from './history';
export { applyPatches, diffDocs, type Patch, type PathKey, type Slot } from './patch';
export { mergeOptionDoc, mergeShell } from './merge';
export {
  normaliseRotationDeg,
  pieceAxes,
  pieceBoundsMm,
  pieceFootprintMm,
  type PiecePose,
  type PlanBounds,
} from '../geometry/piece';
export { findPlacement, boxInsideOutline, boxesOverlap, PLACEMENT_STEP_MM, type PlacementRequest } from './placement';
export {
  nudge,
  snapAngle,
  snapPieceToPieces,
  snapPieceToWalls,
  snapToGrid,
  DEFAULT_ANGLE_STEP_DEG,
  DEFAULT_GRID_MM,
  NUDGE_LARGE_STEP_MM,
  NUDGE_STEP_MM,
  PIECE_SNAP_TOLERANCE_MM,
  WALL_SNAP_TOLERANCE_MM,
  type EdgeSnap,
  type PieceSnap,
  type WallSnap,
} from './snapping';
