// The outside seen through the windows, drawn in code (nothing is downloaded): a large sphere round
// the room, seen from inside, with a colour per vertex from a pale sky overhead through a soft, hazy
// horizon to a muted green-grey ground below. Scene metres; colours are sRGB in 0–1.
import type { Bounds3 } from './scene';

export interface OutsideData {
  positions: Float32Array;
  /** sRGB, three per vertex. */
  colours: Float32Array;
  /** Wound to face the sphere's centre. */
  indices: Uint32Array;
  centre: [number, number, number];
  radiusM: number;
}

/** How far out the outside sits past the room's bounds (m): far enough that it does not move as one walks. */
export const OUTSIDE_DISTANCE_M = 60;
/** Segments round the horizon. */
const SEGMENTS = 32;

/**
 * Colour stops by elevation above the horizon (degrees) as sRGB hex: rings are placed at the
 * stops, closest together round the horizon where the colour changes fastest.
 */
export const OUTSIDE_STOPS: readonly (readonly [number, string])[] = [
  [-90, '#8f9884'],
  [-20, '#9ba38d'],
  [-4, '#b3b8a3'],
  [-1, '#cfd1c3'],
  [0, '#e3e4da'],
  [2, '#eceee8'],
  [8, '#e2eaee'],
  [25, '#cfdfea'],
  [55, '#bcd3e6'],
  [90, '#b2cce2'],
];

function hexToRgb(hex: string): [number, number, number] {
  const n = parseInt(hex.slice(1), 16);
  return [((n >> 16) & 255) / 255, ((n >> 8) & 255) / 255, (n & 255) / 255];
}

/** The outside sphere round a room's bounds (scene metres), centred over the room at eye height. */
export function buildOutside(bounds: Bounds3, eyeHeightM = 1.5): OutsideData {
  const centre: [number, number, number] = [(bounds.min[0] + bounds.max[0]) / 2, eyeHeightM, (bounds.min[2] + bounds.max[2]) / 2];
  const half = Math.hypot(bounds.max[0] - bounds.min[0], bounds.max[2] - bounds.min[2]) / 2;
  const radiusM = half + OUTSIDE_DISTANCE_M;
  const positions: number[] = [];
  const colours: number[] = [];
  const indices: number[] = [];
  const rings = OUTSIDE_STOPS.length;
  for (const [elevationDeg, hex] of OUTSIDE_STOPS) {
    const e = (elevationDeg * Math.PI) / 180;
    const [r, g, b] = hexToRgb(hex);
    for (let k = 0; k <= SEGMENTS; k++) {
      const a = (k / SEGMENTS) * 2 * Math.PI;
      positions.push(
        centre[0] + radiusM * Math.cos(e) * Math.cos(a),
        centre[1] + radiusM * Math.sin(e),
        centre[2] + radiusM * Math.cos(e) * Math.sin(a),
      );
      colours.push(r, g, b);
    }
  }
  const row = SEGMENTS + 1;
  for (let i = 0; i + 1 < rings; i++) {
    for (let k = 0; k < SEGMENTS; k++) {
      const a = i * row + k;
      const b = a + 1;
      const c = a + row;
      const d = c + 1;
      // Seen from the centre these run counter-clockwise (the sphere is looked at from inside).
      if (i > 0) indices.push(a, b, c);
      if (i + 2 < rings) indices.push(b, d, c);
    }
  }
  return {
    positions: new Float32Array(positions),
    colours: new Float32Array(colours),
    indices: new Uint32Array(indices),
    centre,
    radiusM,
  };
}
