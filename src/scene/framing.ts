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

/** The Overview camera for a room's bounds (scene metres), a vertical field of view (degrees) and a viewport aspect (width / height). */
export function overviewFrame(bounds: Bounds3, fovDeg: number, aspect: number): OverviewFrame {
  const target: [number, number, number] = [
    (bounds.min[0] + bounds.max[0]) / 2,
    (bounds.min[1] + bounds.max[1]) / 2,
    (bounds.min[2] + bounds.max[2]) / 2,
  ];
  const radius = Math.max(
    Math.hypot(bounds.max[0] - bounds.min[0], bounds.max[1] - bounds.min[1], bounds.max[2] - bounds.min[2]) / 2,
    0.01,
  );
  const tanV = Math.tan((fovDeg * Math.PI) / 360);
  const tanH = tanV * Math.max(aspect, 0.01);
  const azimuth = (OVERVIEW_AZIMUTH_DEG * Math.PI) / 180;
  const elevation = (OVERVIEW_ELEVATION_DEG * Math.PI) / 180;
  // Unit vector from the target to the eye, and the camera's right and up seen from there.
  const back: [number, number, number] = [
    Math.cos(elevation) * Math.sin(azimuth),
    Math.sin(elevation),
    Math.cos(elevation) * Math.cos(azimuth),
  ];
  const right: [number, number, number] = [Math.cos(azimuth), 0, -Math.sin(azimuth)];
  const up: [number, number, number] = [
    back[1] * right[2] - back[2] * right[1],
    back[2] * right[0] - back[0] * right[2],
    back[0] * right[1] - back[1] * right[0],
  ];
  // The nearest eye distance at which every corner of the box projects inside the frame (less
  // the margin): a corner at depth z towards the eye and offsets x, y across needs
  // distance ≥ z + |x| / tanH and ≥ z + |y| / tanV, scaled by the margin.
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
  distance = Math.max(distance, radius * 1.5);
  const position: [number, number, number] = [
    target[0] + distance * back[0],
    target[1] + distance * back[1],
    target[2] + distance * back[2],
  ];
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
