// Where the Overview camera starts: above and beside the room, looking at its centre, far enough
// back that the whole room fits the view. Scene metres, y up.
import type { Bounds3 } from '../../shared/geometry/scene';

/** The Overview looks from the front-right of the plan (its bottom edge, +z), turned this far towards +x. */
export const OVERVIEW_AZIMUTH_DEG = 28;
/** …and from this far above the horizon, so the floor and the far walls both read. */
export const OVERVIEW_ELEVATION_DEG = 42;
/** Room left round the edges of the frame, as a share of the room's size. */
export const FRAME_MARGIN = 1.08;
/** The camera never comes closer to the target than this (metres): inside a piece is no view. */
export const MIN_ORBIT_DISTANCE_M = 0.5;

export interface OverviewFrame {
  target: [number, number, number];
  position: [number, number, number];
  /** Radius (metres) of the sphere round the room's bounds, for fitting lights and clip planes. */
  radius: number;
  near: number;
  far: number;
  minDistance: number;
  maxDistance: number;
}

type Vec3 = [number, number, number];

const centreOf = (bounds: Bounds3): Vec3 => [
  (bounds.min[0] + bounds.max[0]) / 2,
  (bounds.min[1] + bounds.max[1]) / 2,
  (bounds.min[2] + bounds.max[2]) / 2,
];

/**
 * The nearest eye distance from the bounds' centre, looking back along `back` (a unit vector from
 * the target to the eye), at which every corner of the box projects inside a frame of this field
 * of view (degrees, vertical) and aspect (width / height), less the margin: a corner at depth z
 * towards the eye and offsets x, y across needs distance ≥ z + |x| / tanH and ≥ z + |y| / tanV.
 */
export function fitDistance(bounds: Bounds3, back: Vec3, fovDeg: number, aspect: number): number {
  const target = centreOf(bounds);
  const tanV = Math.tan((fovDeg * Math.PI) / 360);
  const tanH = tanV * Math.max(aspect, 0.01);
  // The camera's right and up seen from there (no roll: right stays level).
  const flat = Math.hypot(back[0], back[2]);
  const right: Vec3 = flat > 1e-9 ? [back[2] / flat, 0, -back[0] / flat] : [1, 0, 0];
  const up: Vec3 = [
    back[1] * right[2] - back[2] * right[1],
    back[2] * right[0] - back[0] * right[2],
    back[0] * right[1] - back[1] * right[0],
  ];
  let distance = 0;
  for (const cx of [bounds.min[0], bounds.max[0]]) {
    for (const cy of [bounds.min[1], bounds.max[1]]) {
      for (const cz of [bounds.min[2], bounds.max[2]]) {
        const v = [cx - target[0], cy - target[1], cz - target[2]];
        const x = v[0] * right[0] + v[1] * right[1] + v[2] * right[2];
        const y = v[0] * up[0] + v[1] * up[1] + v[2] * up[2];
        const z = v[0] * back[0] + v[1] * back[1] + v[2] * back[2];
        distance = Math.max(distance, z + (Math.abs(x) * FRAME_MARGIN) / tanH, z + (Math.abs(y) * FRAME_MARGIN) / tanV);
      }
    }
  }
  return distance;
}

/** The Overview camera for a room's bounds (scene metres), a vertical field of view (degrees) and a viewport aspect (width / height). */
export function overviewFrame(bounds: Bounds3, fovDeg: number, aspect: number): OverviewFrame {
  const target = centreOf(bounds);
  const radius = Math.max(
    Math.hypot(bounds.max[0] - bounds.min[0], bounds.max[1] - bounds.min[1], bounds.max[2] - bounds.min[2]) / 2,
    0.01,
  );
  const azimuth = (OVERVIEW_AZIMUTH_DEG * Math.PI) / 180;
  const elevation = (OVERVIEW_ELEVATION_DEG * Math.PI) / 180;
  // Unit vector from the target to the eye.
  const back: Vec3 = [Math.cos(elevation) * Math.sin(azimuth), Math.sin(elevation), Math.cos(elevation) * Math.cos(azimuth)];
  const distance = Math.max(fitDistance(bounds, back, fovDeg, aspect), radius * 1.5);
  const position: Vec3 = [target[0] + distance * back[0], target[1] + distance * back[1], target[2] + distance * back[2]];
  return {
    target,
    position,
    radius,
    near: Math.max(0.02, distance / 200),
    far: distance * 4 + radius * 4,
    minDistance: MIN_ORBIT_DISTANCE_M,
    maxDistance: distance * 2.5,
  };
}

/**
 * A camera (eye and target) seen in a view of one aspect, moved for a view of another: same
 * target, same direction, its distance scaled by how much nearer or further the room fits from
 * that direction at the new aspect. A view framed to fill its picture still fills it after a
 * resize (a half of Compare), and one brought closer stays as much closer.
 */
export function refitToAspect(
  eye: Vec3,
  target: Vec3,
  bounds: Bounds3,
  fovDeg: number,
  fromAspect: number,
  toAspect: number,
): Vec3 {
  const d: Vec3 = [eye[0] - target[0], eye[1] - target[1], eye[2] - target[2]];
  const length = Math.hypot(...d);
  if (length < 1e-9) return eye;
  const back: Vec3 = [d[0] / length, d[1] / length, d[2] / length];
  const before = fitDistance(bounds, back, fovDeg, fromAspect);
  const after = fitDistance(bounds, back, fovDeg, toAspect);
  if (!(before > 0) || !(after > 0)) return eye;
  const k = after / before;
  return [target[0] + d[0] * k, target[1] + d[1] * k, target[2] + d[2] * k];
}
