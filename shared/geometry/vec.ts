// Small 2D helpers for plan points (mm, x right, y down). Tuples keep them compatible with the
// outline's [x, y] arrays without conversion.

export type Vec2 = readonly [number, number];

/** Plan vector a + b (any 2D space). */
export function add(a: Vec2, b: Vec2): [number, number] {
  return [a[0] + b[0], a[1] + b[1]];
}

/** Plan vector a − b (any 2D space). */
export function sub(a: Vec2, b: Vec2): [number, number] {
  return [a[0] - b[0], a[1] - b[1]];
}

/** Plan vector a scaled by s. */
export function scale(a: Vec2, s: number): [number, number] {
  return [a[0] * s, a[1] * s];
}

/** a + b·s, the point s along direction b from a. */
export function addScaled(a: Vec2, b: Vec2, s: number): [number, number] {
  return [a[0] + b[0] * s, a[1] + b[1] * s];
}

/** Dot product. */
export function dot(a: Vec2, b: Vec2): number {
  return a[0] * b[0] + a[1] * b[1];
}

/** z of the 3D cross product; on the y-down plan a positive value means b is clockwise from a. */
export function cross(a: Vec2, b: Vec2): number {
  return a[0] * b[1] - a[1] * b[0];
}

/** Euclidean length. */
export function length(a: Vec2): number {
  return Math.hypot(a[0], a[1]);
}

/** Distance between two points. */
export function distance(a: Vec2, b: Vec2): number {
  return Math.hypot(a[0] - b[0], a[1] - b[1]);
}

/** Unit vector, or [0, 0] for a zero vector. */
export function normalise(a: Vec2): [number, number] {
  const l = length(a);
  return l === 0 ? [0, 0] : [a[0] / l, a[1] / l];
}

/** Direction at angleDeg measured clockwise on the plan from +x (y is down). */
export function directionDeg(angleDeg: number): [number, number] {
  const r = (angleDeg * Math.PI) / 180;
  return [Math.cos(r), Math.sin(r)];
}

/** Angle of v in degrees, clockwise on the plan from +x, in (−180, 180]. */
export function angleDegOf(v: Vec2): number {
  return (Math.atan2(v[1], v[0]) * 180) / Math.PI;
}

/** An angle in degrees folded into (−180, 180]. */
export function normaliseAngleDeg(angleDeg: number): number {
  let a = angleDeg % 360;
  if (a <= -180) a += 360;
  if (a > 180) a -= 360;
  return a;
}
