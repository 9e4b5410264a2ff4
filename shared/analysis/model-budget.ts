// Whether an option's piece models stay within what a client's laptop draws smoothly: an estimate of
// the client's walk-through of the option (draw calls and triangles), from the shell and the forms as
// the views group them and from each worn model's stored triangles and materials (one draw call per
// material of each placed copy). Pure; the Check step shows it in plain words.
import type { SceneFinish } from '../finishes/scene-finish';
import type { PieceFormData } from '../geometry/forms/piece-forms';
import { buildOutside } from '../geometry/outside';
import { isWalkedOver } from '../geometry/piece';
import type { MeshData, ShellSceneData } from '../geometry/scene';
import type { Piece } from '../schemas/option';
import type { RoomShell } from '../schemas/room';
import { MODEL_BUDGET } from '../schemas/piece-model';

export { MODEL_BUDGET };

/** The client's walk-through draws its baked floor shadows in one mesh (a few triangles a piece, left out). */
export const FLOOR_SHADOW_DRAW_CALLS = 1;

export interface SceneFigures {
  drawCalls: number;
  triangles: number;
}

/** What one worn model holds, as stored when it was made ready. */
export interface WornModelFigures {
  triangles: number;
  materials: number;
}

const trianglesOf = (mesh: MeshData) => mesh.indices.length / 3;
const drawn = (mesh: MeshData) => mesh.indices.length > 0;

function add(into: SceneFigures, meshes: readonly MeshData[]): void {
  const kept = meshes.filter(drawn);
  if (kept.length === 0) return;
  into.drawCalls += 1;
  for (const m of kept) into.triangles += trianglesOf(m);
}

/**
 * The shell as both views draw it: the outside seen through the windows, the floor, the ceiling,
 * the door leaves, their handles, the trim (skirting and leaf edges), and per wall its inside face,
 * the rest of it, its frames and linings, and its glass; an empty part costs nothing.
 */
export function shellFigures(scene: ShellSceneData, shell: Pick<RoomShell, 'openings'>): SceneFigures {
  const out: SceneFigures = { drawCalls: 0, triangles: 0 };
  const outside = buildOutside(scene.bounds);
  out.drawCalls += 1;
  out.triangles += outside.indices.length / 3;
  add(out, [scene.floor]);
  add(out, [scene.ceiling]);
  add(
    out,
    scene.doorLeaves.map((d) => d.mesh),
  );
  add(
    out,
    scene.doorLeaves.map((d) => d.handles),
  );
  add(out, [scene.skirting, ...scene.doorLeaves.map((d) => d.edges)]);
  const wallOfOpening = new Map(shell.openings.map((o) => [o.id, o.wall]));
  for (const wall of scene.walls) {
    const windows = scene.windows.filter((w) => wallOfOpening.get(w.openingId) === wall.index);
    add(out, [wall.inside]);
    add(out, [wall.outside, wall.top, wall.reveals]);
    add(out, [...windows.flatMap((w) => [w.frame, w.sill]), wall.trims]);
    add(
      out,
      windows.map((w) => w.glass),
    );
  }
  return out;
}

/** What the forms' pieces wear, by piece id: photo finishes each get a mesh of their own. */
export interface FormFinishes {
  pieces?: Record<string, SceneFinish>;
  pieceAccents?: Record<string, SceneFinish>;
}

/**
 * The forms as the views merge them: one mesh for every plain colour, one per photo finish worn as a
 * main or accent finish, each again apart for pieces walked over (rugs).
 */
export function formFigures(forms: readonly PieceFormData[], pieces: readonly Piece[], finishes: FormFinishes): SceneFigures {
  const byId = new Map(pieces.map((p) => [p.id, p]));
  const groups = new Set<string>();
  let triangles = 0;
  const slot = (mesh: MeshData, finish: SceneFinish | undefined, flat: boolean) => {
    if (!drawn(mesh)) return;
    triangles += trianglesOf(mesh);
    groups.add(`${finish?.kind === 'photo' ? JSON.stringify(finish) : 'colour'}${flat ? '|flat' : ''}`);
  };
  for (const form of forms) {
    const piece = byId.get(form.id);
    if (!piece) continue;
    const flat = isWalkedOver(piece);
    slot(form.meshes.main, finishes.pieces?.[piece.id], flat);
    slot(form.meshes.accent, finishes.pieceAccents?.[piece.id], flat);
    slot(form.meshes.own, undefined, flat);
  }
  return { drawCalls: groups.size, triangles };
}

export interface ModelBudget extends SceneFigures {
  /** Placed pieces wearing a model. */
  models: number;
  overDrawCalls: boolean;
  overTriangles: boolean;
}

/**
 * The estimate for an option whose placed pieces wear `models` (one entry per placed copy), drawn
 * with `room` (the shell and the other pieces' forms); null when no piece wears a model.
 */
export function modelBudget(room: SceneFigures, models: readonly WornModelFigures[]): ModelBudget | null {
  if (models.length === 0) return null;
  const drawCalls = room.drawCalls + FLOOR_SHADOW_DRAW_CALLS + models.reduce((n, m) => n + Math.max(1, m.materials), 0);
  const triangles = room.triangles + models.reduce((n, m) => n + m.triangles, 0);
  return {
    drawCalls,
    triangles,
    models: models.length,
    overDrawCalls: drawCalls > MODEL_BUDGET.drawCalls,
    overTriangles: triangles > MODEL_BUDGET.triangles,
  };
}
