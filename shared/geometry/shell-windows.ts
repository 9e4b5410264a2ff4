// Windows in the 3D shell, plan mm in, scene metres out: the frame round the hole, glazing bars on
// wide and tall windows, the glass, and an inside sill board under it projecting into the room.
import { alignedBox, MeshWriter, writeBox, type MeshData } from './mesh-writer';
import type { OpeningPlacement } from './openings';
import type { WallLayout } from './walls';

/** Window frame members are this wide on the face (mm) and this deep through the wall (mm) (common practice, no source). */
export const WINDOW_FRAME_WIDTH_MM = 50;
export const WINDOW_FRAME_DEPTH_MM = 60;
/** Glass panes are drawn this thick (mm) so they show from both sides. */
export const GLASS_THICKNESS_MM = 10;
/**
 * Glazing bars: one upright bar down the middle of a window wider than this (mm), one across the
 * middle of a window taller than it, each this wide on the face (mm) (common practice, no source).
 */
export const GLAZING_BAR_ABOVE_MM = 1200;
export const GLAZING_BAR_WIDTH_MM = 35;
/** The inside sill board: this thick (mm), projecting this far into the room past the wall face (mm) and this far past each side of the hole (mm) (common practice, no source). */
export const SILL_BOARD_THICKNESS_MM = 25;
export const SILL_BOARD_PROJECTION_MM = 30;
export const SILL_BOARD_EARS_MM = 30;

export interface WindowSceneData {
  openingId: string;
  /** The frame round the hole and its glazing bars. */
  frame: MeshData;
  glass: MeshData;
  /** The inside sill board, its top at the sill. */
  sill: MeshData;
}

/** One window on its wall (plan mm): frame, bars, glass and inside sill board as scene meshes. */
export function buildWindow(wall: WallLayout, placement: OpeningPlacement): WindowSceneData {
  const { fromMm, toMm, sillMm, headMm } = placement;
  const depthMm = Math.min(WINDOW_FRAME_DEPTH_MM, wall.thicknessMm);
  const f = Math.min(WINDOW_FRAME_WIDTH_MM, (toMm - fromMm) / 4, (headMm - sillMm) / 4);
  const mid = wall.thicknessMm / 2;
  // A box across the frame's depth (or the glass's) between two points along the wall.
  const member = (writer: MeshWriter, a: number, b: number, thicknessMm: number, bottomMm: number, topMm: number) =>
    writeBox(
      writer,
      alignedBox(wall.start, wall.direction, wall.outward, a, b, mid - thicknessMm / 2, mid + thicknessMm / 2),
      bottomMm,
      topMm - bottomMm,
    );
  const frame = new MeshWriter();
  const innerFrom = fromMm + f;
  const innerTo = toMm - f;
  member(frame, fromMm, innerFrom, depthMm, sillMm, headMm);
  member(frame, innerTo, toMm, depthMm, sillMm, headMm);
  member(frame, innerFrom, innerTo, depthMm, sillMm, sillMm + f);
  member(frame, innerFrom, innerTo, depthMm, headMm - f, headMm);
  const bar = Math.min(GLAZING_BAR_WIDTH_MM, f);
  const middleAlong = (fromMm + toMm) / 2;
  const middleUp = (sillMm + headMm) / 2;
  if (toMm - fromMm > GLAZING_BAR_ABOVE_MM)
    member(frame, middleAlong - bar / 2, middleAlong + bar / 2, depthMm, sillMm + f, headMm - f);
  if (headMm - sillMm > GLAZING_BAR_ABOVE_MM) member(frame, innerFrom, innerTo, depthMm, middleUp - bar / 2, middleUp + bar / 2);
  const glass = new MeshWriter();
  member(glass, innerFrom, innerTo, GLASS_THICKNESS_MM, sillMm + f, headMm - f);
  // The board runs from the frame's inside face out past the wall face, a little wider than the hole.
  const sill = new MeshWriter();
  const boardFrom = Math.max(fromMm - SILL_BOARD_EARS_MM, 0);
  const boardTo = Math.min(toMm + SILL_BOARD_EARS_MM, wall.lengthMm);
  const bottom = Math.max(sillMm - SILL_BOARD_THICKNESS_MM, 0);
  if (sillMm > bottom) {
    writeBox(
      sill,
      alignedBox(wall.start, wall.direction, wall.outward, boardFrom, boardTo, -SILL_BOARD_PROJECTION_MM, mid - depthMm / 2),
      bottom,
      sillMm - bottom,
    );
  }
  return { openingId: placement.id, frame: frame.toMesh(), glass: glass.toMesh(), sill: sill.toMesh() };
}
