// Camera moves as pure functions of a pose (scene metres, y up), for the on-screen buttons, the
// keys and the linked views. No three.js here, so every move can be tested on numbers.
import type { ViewPose } from './camera-link';

type Vec3 = [number, number, number];

const DEG = Math.PI / 180;
/** Looking straight down leaves "up" undefined for the camera; the top view keeps this much tilt (radians). */
export const TOP_VIEW_TILT = 0.002;
/** Looking up or down in Walk stops here (degrees), short of the vertical. */
export const MAX_PITCH_DEG = 70;

/** The Overview's eye moved round its target by `angleDeg`, clockwise seen from above (the plan's way up). */
export function orbitTurn(pose: ViewPose, angleDeg: number): ViewPose {
  const [tx, , tz] = pose.target;
  const dx = pose.position[0] - tx;
  const dz = pose.position[2] - tz;
  const a = angleDeg * DEG;
  const cos = Math.cos(a);
  const sin = Math.sin(a);
  return { ...pose, position: [tx + dx * cos - dz * sin, pose.position[1], tz + dx * sin + dz * cos] };
}

/** The Overview closer (factor < 1) or further (factor > 1), kept between the distance limits (m). */
export function orbitZoom(pose: ViewPose, factor: number, minDistance: number, maxDistance: number): ViewPose {
  const d = sub(pose.position, pose.target);
  const distance = Math.hypot(...d);
  if (distance === 0) return pose;
  const next = Math.min(maxDistance, Math.max(minDistance, distance * factor));
  const s = next / distance;
  return { ...pose, position: [pose.target[0] + d[0] * s, pose.target[1] + d[1] * s, pose.target[2] + d[2] * s] };
}

/** Straight down onto `target` from `distance` metres, the plan's top edge at the top of the screen. */
export function topViewPose(target: Vec3, distance: number): ViewPose {
  return {
    mode: 'overview',
    target,
    position: [target[0], target[1] + distance * Math.cos(TOP_VIEW_TILT), target[2] + distance * Math.sin(TOP_VIEW_TILT)],
  };
}

/** A walker's state: plan position in scene metres, eye height, which way they face and look. */
export interface WalkState {
  x: number;
  z: number;
  /** Turn about +y (radians); 0 looks along −z (up the plan). */
  yaw: number;
  /** Up (+) or down (−) from level, radians. */
  pitch: number;
}

/** The camera's forward direction on the floor for a yaw, scene axes (x, z). */
export function forwardOf(yaw: number): [number, number] {
  return [-Math.sin(yaw), -Math.cos(yaw)];
}

/** The yaw that faces a plan heading (degrees clockwise from +x, y down the page). */
export function yawOfPlanHeading(headingDeg: number): number {
  const h = headingDeg * DEG;
  return Math.atan2(-Math.cos(h), -Math.sin(h));
}

/** The pose of a walker whose eyes are `eyeM` above the floor. */
export function walkPose(state: WalkState, eyeM: number): ViewPose {
  const [fx, fz] = forwardOf(state.yaw);
  const c = Math.cos(state.pitch);
  return {
    mode: 'walk',
    position: [state.x, eyeM, state.z],
    target: [state.x + fx * c, eyeM + Math.sin(state.pitch), state.z + fz * c],
  };
}

/** The walker standing where a pose's camera is, facing where it looks (pitch clamped). */
export function walkStateOf(pose: ViewPose): WalkState {
  const d = sub(pose.target, pose.position);
  const flat = Math.hypot(d[0], d[2]);
  const pitch = Math.max(-MAX_PITCH_DEG * DEG, Math.min(MAX_PITCH_DEG * DEG, Math.atan2(d[1], flat)));
  return { x: pose.position[0], z: pose.position[2], yaw: flat === 0 ? 0 : Math.atan2(-d[0], -d[2]), pitch };
}

/** Smooth start and stop for a move that lasts from t = 0 to 1. */
export function easeInOut(t: number): number {
  const c = Math.min(1, Math.max(0, t));
  return c * c * (3 - 2 * c);
}

/**
 * Part way (t from 0 to 1) between two Overview poses, turning round the target rather than cutting
 * across, so a turn keeps its distance from the room.
 */
export function orbitBetween(a: ViewPose, b: ViewPose, t: number): ViewPose {
  const target = lerp3(a.target, b.target, t);
  const sa = spherical(sub(a.position, a.target));
  const sb = spherical(sub(b.position, b.target));
  let dTheta = sb.theta - sa.theta;
  if (dTheta > Math.PI) dTheta -= 2 * Math.PI;
  if (dTheta < -Math.PI) dTheta += 2 * Math.PI;
  const r = sa.r + (sb.r - sa.r) * t;
  const theta = sa.theta + dTheta * t;
  const phi = sa.phi + (sb.phi - sa.phi) * t;
  return {
    mode: b.mode,
    target,
    position: [
      target[0] + r * Math.sin(phi) * Math.sin(theta),
      target[1] + r * Math.cos(phi),
      target[2] + r * Math.sin(phi) * Math.cos(theta),
    ],
  };
}

function spherical(v: Vec3): { r: number; theta: number; phi: number } {
  const r = Math.hypot(...v);
  return { r, theta: Math.atan2(v[0], v[2]), phi: r === 0 ? 0 : Math.acos(Math.min(1, Math.max(-1, v[1] / r))) };
}

const sub = (a: Vec3, b: Vec3): Vec3 => [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
const lerp3 = (a: Vec3, b: Vec3, t: number): Vec3 => [
  a[0] + (b[0] - a[0]) * t,
  a[1] + (b[1] - a[1]) * t,
  a[2] + (b[2] - a[2]) * t,
];
