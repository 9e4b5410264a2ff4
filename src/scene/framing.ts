import type { Bounds3 } from '../../shared/geometry/scene';

// Where the Overview camera starts: above and beside the room, looking at its centre, far enough
// back that the whole room fits the view. Scene metres, y up.

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
  const halfVertical = (fovDeg * Math.PI) / 360;
  const halfHorizontal = Math.atan(Math.tan(halfVertical) * Math.max(aspect, 0.01));
  // A sphere seen from outside fills the narrower half-angle exactly at this distance.
  const distance = (radius * FRAME_MARGIN) / Math.sin(Math.min(halfVertical, halfHorizontal));
  const azimuth = (OVERVIEW_AZIMUTH_DEG * Math.PI) / 180;
  const elevation = (OVERVIEW_ELEVATION_DEG * Math.PI) / 180;
  const position: [number, number, number] = [
    target[0] + distance * Math.cos(elevation) * Math.sin(azimuth),
    target[1] + distance * Math.sin(elevation),
    target[2] + distance * Math.cos(elevation) * Math.cos(azimuth),
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
