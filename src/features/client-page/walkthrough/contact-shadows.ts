// Soft shadows under and beside the pieces, baked once per option as plain geometry on the floor:
// each piece gets a dark patch the shape of its footprint that fades out round its edges, a little
// wider for taller pieces and pushed away from the windows the daylight comes through. The room
// never moves, so this costs one draw call and no shadow map lookups on every pixel — which is
// what makes the walk-through smooth on software rendering. Scene metres, y up; pure.
import type { MeshData } from '../../../../shared/geometry/scene';
import { pieceFootprintMm } from '../../../../shared/geometry/piece';
import type { Piece } from '../../../../shared/schemas/option';

/** The patch sits this far (m) above the floor, under anything standing on it. */
export const SHADOW_LIFT_M = 0.002;
/** Darkness of the patch right under a piece standing on the floor (alpha). */
export const SHADOW_DARKNESS = 0.32;
/** The fade reaches this far (m) past the footprint of a low piece, plus a share of the piece's height. */
const SPREAD_BASE_M = 0.07;
const SPREAD_PER_HEIGHT = 0.12;
const MAX_SPREAD_M = 0.3;
/** The patch moves away from the daylight by this share of the piece's height, at most MAX_OFFSET_M. */
const OFFSET_PER_HEIGHT = 0.08;
const MAX_OFFSET_M = 0.15;
/** A piece hung this high (m) or higher leaves almost no patch on the floor. */
const FADE_ELEVATION_M = 1.5;
const MIN_DARKNESS_SHARE = 0.2;

export interface ContactShadowData {
  positions: Float32Array;
  /** RGBA per vertex: black, with the patch's alpha. */
  colours: Float32Array;
  indices: Uint32Array;
}

/**
 * The floor patches of all placed pieces as one mesh (scene metres). `awayFromLight` is the
 * horizontal direction (scene x, z) the daylight travels, e.g. the mean inward normal of the
 * windows; [0, 0] keeps each patch centred under its piece.
 */
export function contactShadows(pieces: readonly Piece[], awayFromLight: readonly [number, number]): ContactShadowData {
  const placed = pieces.filter((p) => p.placed);
  const positions = new Float32Array(placed.length * 8 * 3);
  const colours = new Float32Array(placed.length * 8 * 4);
  const indices = new Uint32Array(placed.length * 30);
  const away = Math.hypot(awayFromLight[0], awayFromLight[1]);
  const [lx, lz] = away > 0 ? [awayFromLight[0] / away, awayFromLight[1] / away] : [0, 0];
  placed.forEach((piece, n) => {
    const heightM = piece.height / 1000;
    const elevationM = piece.elevation / 1000;
    const spread = Math.min(MAX_SPREAD_M, SPREAD_BASE_M + SPREAD_PER_HEIGHT * (heightM + elevationM));
    const offset = Math.min(MAX_OFFSET_M, OFFSET_PER_HEIGHT * (heightM + elevationM));
    const share = 1 - (1 - MIN_DARKNESS_SHARE) * Math.min(1, elevationM / FADE_ELEVATION_M);
    const alpha = SHADOW_DARKNESS * share;
    // The footprint (shifted away from the light) then the same box grown by the spread, plan mm.
    const shifted = { ...piece, x: piece.x + lx * offset * 1000, y: piece.y + lz * offset * 1000 };
    const inner = pieceFootprintMm(shifted);
    const outer = pieceFootprintMm({ ...shifted, width: piece.width + 2000 * spread, depth: piece.depth + 2000 * spread });
    const base = n * 8;
    for (const [ring, corners] of [
      [0, inner],
      [1, outer],
    ] as const) {
      corners.forEach(([x, y], k) => {
        const i = base + ring * 4 + k;
        positions.set([x / 1000, SHADOW_LIFT_M, y / 1000], i * 3);
        colours.set([0, 0, 0, ring === 0 ? alpha : 0], i * 4);
      });
    }
    // Facing up: the inner quad, then a band of two triangles along each side.
    const tri: number[] = [base, base + 2, base + 1, base, base + 3, base + 2];
    for (let k = 0; k < 4; k++) {
      const a = base + k;
      const b = base + ((k + 1) % 4);
      const oa = a + 4;
      const ob = b + 4;
      tri.push(a, b, oa, b, ob, oa);
    }
    indices.set(tri, n * 30);
  });
  return { positions, colours, indices };
}

/** The direction daylight travels into the room: the mean inward normal of the windows, weighted by their size. */
export function daylightDirection(
  windows: readonly { inward: readonly [number, number, number]; widthM: number; heightM: number }[],
): [number, number] {
  let x = 0;
  let z = 0;
  for (const w of windows) {
    const area = w.widthM * w.heightM;
    x += w.inward[0] * area;
    z += w.inward[2] * area;
  }
  return [x, z];
}

/** True when a mesh (of either kind) has nothing to draw. */
export const noShadows = (data: ContactShadowData | MeshData) => data.indices.length === 0;
