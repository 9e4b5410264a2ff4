// A room's piece forms merged per material: one group for everything drawn in a plain colour
// (main and accent colours, paints, the parts' own colours: colours ride on the vertices) and one
// group per photo finish worn as a main or accent finish, each again apart for pieces walked over
// (rugs), drawn just above the floor. Each group becomes one mesh, so the draw calls stay a handful
// however many parts the pieces have.
import * as THREE from 'three';
import type { SceneFinish } from '../../shared/finishes/scene-finish';
import type { PieceFormData } from '../../shared/geometry/forms/piece-forms';
import type { ColourRun } from '../../shared/geometry/forms/mesh';
import type { MeshData } from '../../shared/geometry/scene';
import { isWalkedOver } from '../../shared/geometry/piece';
import type { Piece } from '../../shared/schemas/option';
import type { SurfaceFinishes } from './finish-materials';
import { ACCENT_COLOURS, SELECTION_COLOUR, SELECTION_TINT } from './materials';
import { pieceBaseColour } from './piece-colours';

/** One merged piece of a group: a piece's mesh for one slot and the colours of its vertex runs. */
export interface GroupEntry {
  pieceId: string;
  mesh: MeshData;
  runs: ColourRun[];
}

export interface FormGroup {
  /** 'colour' for the vertex-coloured group, else the photo finish's own key. */
  key: string;
  /** The photo finish the group wears; null for the colour group. */
  finish: Extract<SceneFinish, { kind: 'photo' }> | null;
  /**
   * Pieces walked over (rugs): lying a few mm thick on the floor, they are drawn lifted a little and
   * pulled towards the eye, so the floor and the soft shadows on it never show through them.
   */
  flat: boolean;
  entries: GroupEntry[];
}

const WHITE = '#ffffff';
/** Added to a group's key for the pieces walked over. */
const FLAT_KEY_SUFFIX = '|flat';
const isPhoto = (f: SceneFinish | null | undefined): f is Extract<SceneFinish, { kind: 'photo' }> => f?.kind === 'photo';
const keyOf = (f: SceneFinish) => JSON.stringify(f);
const vertices = (mesh: MeshData) => mesh.positions.length / 3;

/** The colour a piece's accent parts wear when no photo finish covers them. */
export function accentColourOf(piece: Pick<Piece, 'status' | 'accentColour'>, accent: SceneFinish | null | undefined): string {
  if (accent?.kind === 'paint') return accent.colourHex;
  return piece.accentColour ?? ACCENT_COLOURS[piece.status];
}

/** The groups for an option's forms; `pieces` carry the colours, `finishes` the photo and paint finishes by piece id. */
export function formGroups(forms: readonly PieceFormData[], pieces: readonly Piece[], finishes: SurfaceFinishes): FormGroup[] {
  const byId = new Map(pieces.map((p) => [p.id, p]));
  const groups = new Map<string, FormGroup>();
  const groupFor = (finish: Extract<SceneFinish, { kind: 'photo' }> | null, flat: boolean): FormGroup => {
    const key = `${finish ? keyOf(finish) : 'colour'}${flat ? FLAT_KEY_SUFFIX : ''}`;
    const group = groups.get(key) ?? { key, finish, flat, entries: [] };
    groups.set(key, group);
    return group;
  };
  // The plain colours first, so the one colour group leads.
  groupFor(null, false);
  const add = (finish: SceneFinish | null | undefined, entry: GroupEntry, plainColour: string, flat: boolean) => {
    if (entry.mesh.indices.length === 0) return;
    if (isPhoto(finish))
      groupFor(finish, flat).entries.push({ ...entry, runs: [{ colour: WHITE, vertexCount: vertices(entry.mesh) }] });
    else
      groupFor(null, flat).entries.push({
        ...entry,
        runs: entry.runs.length ? entry.runs : [{ colour: plainColour, vertexCount: vertices(entry.mesh) }],
      });
  };
  for (const form of forms) {
    const piece = byId.get(form.id);
    if (!piece) continue;
    const main = finishes.pieces?.[piece.id];
    const accent = finishes.pieceAccents?.[piece.id];
    const flat = isWalkedOver(piece);
    add(main, { pieceId: piece.id, mesh: form.meshes.main, runs: [] }, pieceBaseColour(piece), flat);
    add(accent, { pieceId: piece.id, mesh: form.meshes.accent, runs: [] }, accentColourOf(piece, accent), flat);
    add(null, { pieceId: piece.id, mesh: form.meshes.own, runs: form.meshes.ownColours }, WHITE, flat);
  }
  return [...groups.values()].filter((g) => g.entries.length > 0);
}

/** Per-vertex colours (linear RGB) for a group's merged mesh, the selected piece tinted towards the accent. */
export function groupVertexColours(group: FormGroup, selectedId: string | null): Float32Array {
  const total = group.entries.reduce((n, e) => n + vertices(e.mesh), 0);
  const out = new Float32Array(total * 3);
  const colour = new THREE.Color();
  const tint = new THREE.Color(SELECTION_COLOUR);
  let v = 0;
  for (const entry of group.entries) {
    for (const run of entry.runs) {
      colour.set(run.colour);
      if (entry.pieceId === selectedId) colour.lerp(tint, SELECTION_TINT);
      for (let i = 0; i < run.vertexCount; i++, v++) colour.toArray(out, v * 3);
    }
  }
  return out;
}
