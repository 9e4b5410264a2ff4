// Every placed piece of an option as its form, in scene metres, beside the plain boxes the checks
// use (shared/geometry/scene.ts builds those; both stay reachable so they can be compared).
import type { Piece } from '../../schemas/option';
import { formParts } from './index';
import { localFormMeshes, placedSize, placeForm, type FormMeshes } from './mesh';

/**
 * Forms already built in their own frame, by kind, settings and box: moving or turning a piece
 * only places the same form again, so a drag rebuilds nothing. Bounded, oldest dropped first.
 */
const LOCAL_FORMS = new Map<string, FormMeshes>();
const LOCAL_FORMS_MAX = 400;

function localForm(p: Piece): FormMeshes {
  const key = JSON.stringify([p.kind, p.settings, p.width, p.depth, p.height]);
  const known = LOCAL_FORMS.get(key);
  if (known) return known;
  const made = localFormMeshes(formParts(p.kind, p.settings, { width: p.width, depth: p.depth, height: p.height }));
  if (LOCAL_FORMS.size >= LOCAL_FORMS_MAX) LOCAL_FORMS.delete(LOCAL_FORMS.keys().next().value!);
  LOCAL_FORMS.set(key, made);
  return made;
}

/** Forgets every built form (the bench measures building from nothing with it). */
export function clearFormCache(): void {
  LOCAL_FORMS.clear();
}

export interface PieceFormData {
  id: string;
  meshes: FormMeshes;
}

/**
 * The forms of an option's placed pieces, in document order, scene metres. Every piece's placed
 * positions and normals are written into one buffer sized first, not one buffer per mesh.
 */
export function buildPieceForms(pieces: readonly Piece[]): PieceFormData[] {
  const placed = pieces.filter((p) => p.placed);
  const locals = placed.map(localForm);
  let size = 0;
  for (const local of locals) size += placedSize(local);
  const out = new Float32Array(size);
  let at = 0;
  return placed.map((p, i) => {
    const local = locals[i]!;
    const meshes = placeForm(local, { x: p.x, y: p.y, rotation: p.rotation, elevation: p.elevation }, out, at);
    at += placedSize(local);
    return { id: p.id, meshes };
  });
}
