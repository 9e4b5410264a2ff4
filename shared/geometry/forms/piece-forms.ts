// Every placed piece of an option as its form, in scene metres, beside the plain boxes the checks
// use (shared/geometry/scene.ts builds those; both stay reachable so they can be compared).
import type { Piece } from '../../schemas/option';
import { formParts } from './index';
import { planForm, writeForm, type FormMeshes, type FormPlan } from './mesh';

/**
 * Form plans (parts and the sizes of their meshes) by kind, settings and box: pieces alike share
 * one, and a piece moved or turned is written again without working out its parts. Bounded,
 * oldest dropped first.
 */
let PLANS = new Map<string, FormPlan>();
const PLANS_MAX = 400;

/**
 * Placed forms kept from earlier builds, by piece id, with the plan and placement they were
 * written for: a rebuild (a piece dragged, the others where they were) hands back the others'
 * meshes as they are (never written to once made). A few placements per piece (two views of
 * the same piece, or undo), a bounded number of pieces, oldest dropped first.
 */
interface KeptForm {
  plan: FormPlan;
  x: number;
  y: number;
  rotation: number;
  elevation: number;
  meshes: FormMeshes;
}
let KEPT = new Map<string, KeptForm[]>();
const KEPT_PIECES_MAX = 1000;
const KEPT_PER_PIECE = 4;

function planOf(p: Piece): FormPlan {
  const key = `${p.kind}|${p.width}|${p.depth}|${p.height}|${p.settings ? JSON.stringify(p.settings) : ''}`;
  const known = PLANS.get(key);
  if (known) return known;
  const made = planForm(formParts(p.kind, p.settings, { width: p.width, depth: p.depth, height: p.height }));
  if (PLANS.size >= PLANS_MAX) PLANS.delete(PLANS.keys().next().value!);
  PLANS.set(key, made);
  return made;
}

function keptFor(p: Piece, plan: FormPlan): FormMeshes | undefined {
  const kept = KEPT.get(p.id);
  if (!kept) return undefined;
  for (const k of kept)
    if (k.plan === plan && k.x === p.x && k.y === p.y && k.rotation === p.rotation && k.elevation === p.elevation)
      return k.meshes;
  return undefined;
}

function keep(p: Piece, plan: FormPlan, meshes: FormMeshes): void {
  let kept = KEPT.get(p.id);
  if (!kept) {
    if (KEPT.size >= KEPT_PIECES_MAX) KEPT.delete(KEPT.keys().next().value!);
    kept = [];
    KEPT.set(p.id, kept);
  }
  if (kept.length >= KEPT_PER_PIECE) kept.shift();
  kept.push({ plan, x: p.x, y: p.y, rotation: p.rotation, elevation: p.elevation, meshes });
}

/**
 * Forgets every built form (the bench measures building from nothing with it). New maps, not
 * cleared ones: a cleared map's old table lingers until a full collection and holds on to the
 * young forms put in after, so every collection of young garbage kept them and they piled up
 * for a full one.
 */
export function clearFormCache(): void {
  PLANS = new Map();
  KEPT = new Map();
}

export interface PieceFormData {
  id: string;
  meshes: FormMeshes;
}

/**
 * The forms of an option's placed pieces, in document order, scene metres. Forms not kept from
 * an earlier build are counted first, then written once into one buffer of that size.
 */
export function buildPieceForms(pieces: readonly Piece[]): PieceFormData[] {
  const placed: Piece[] = [];
  const plans: FormPlan[] = [];
  const meshes: (FormMeshes | undefined)[] = [];
  let size = 0;
  for (const p of pieces) {
    if (!p.placed) continue;
    const plan = planOf(p);
    const kept = keptFor(p, plan);
    placed.push(p);
    plans.push(plan);
    meshes.push(kept);
    if (!kept) size += plan.size;
  }
  const buffer = new ArrayBuffer(size * 4);
  let at = 0;
  const built: PieceFormData[] = [];
  for (let i = 0; i < placed.length; i++) {
    const p = placed[i]!;
    let made = meshes[i];
    if (!made) {
      const plan = plans[i]!;
      made = writeForm(plan, p, buffer, at);
      at += plan.size;
      keep(p, plan, made);
    }
    built.push({ id: p.id, meshes: made });
  }
  return built;
}
