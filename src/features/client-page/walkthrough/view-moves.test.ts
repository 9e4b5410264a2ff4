// Tests for the walk-through's camera moves: Overview turning, zoom, top view and tweens, Walk poses
// at eye height, and the camera link that keeps side-by-side views in step.
import { describe, expect, it } from 'vitest';
import { CameraLink, type ViewPose } from './camera-link';
import {
  forwardOf,
  orbitBetween,
  orbitTurn,
  orbitZoom,
  topViewPose,
  walkPose,
  walkStateOf,
  yawOfPlanHeading,
} from './view-moves';

const pose: ViewPose = { mode: 'overview', target: [2, 1, 1.5], position: [2, 5, 5.5] };
const distance = (p: ViewPose) =>
  Math.hypot(p.position[0] - p.target[0], p.position[1] - p.target[1], p.position[2] - p.target[2]);

describe('Overview moves', () => {
  it('turns round the target keeping height and distance', () => {
    const turned = orbitTurn(pose, 90);
    expect(turned.position[1]).toBe(5);
    expect(distance(turned)).toBeCloseTo(distance(pose), 9);
    // From the front (+z, the plan's bottom) a quarter turn clockwise seen from above moves the eye to the left (−x).
    expect(turned.position[0]).toBeCloseTo(2 - 4, 9);
    expect(turned.position[2]).toBeCloseTo(1.5, 9);
    expect(orbitTurn(orbitTurn(pose, 30), -30).position.map((v) => Number(v.toFixed(9)))).toEqual(pose.position);
  });

  it('zooms along the line of sight, within the limits', () => {
    expect(distance(orbitZoom(pose, 0.5, 0.5, 20))).toBeCloseTo(distance(pose) / 2, 9);
    expect(distance(orbitZoom(pose, 0.01, 0.5, 20))).toBeCloseTo(0.5, 9);
    expect(distance(orbitZoom(pose, 100, 0.5, 20))).toBeCloseTo(20, 9);
  });

  it('looks straight down for the top view', () => {
    const top = topViewPose([2, 0, 1.5], 8);
    expect(top.position[0]).toBe(2);
    expect(top.position[1]).toBeCloseTo(8, 4);
    expect(top.position[2]).toBeCloseTo(1.5, 1);
  });

  it('tweens round the target, never cutting inside the distance', () => {
    const end = orbitTurn(pose, 120);
    for (const t of [0, 0.25, 0.5, 0.75, 1]) expect(distance(orbitBetween(pose, end, t))).toBeCloseTo(distance(pose), 9);
    expect(orbitBetween(pose, end, 1).position[0]).toBeCloseTo(end.position[0], 9);
  });
});

describe('Walk poses', () => {
  it('faces a plan heading: 0° is +x, 90° is down the plan (+z)', () => {
    const [x0, z0] = forwardOf(yawOfPlanHeading(0));
    expect(x0).toBeCloseTo(1, 9);
    expect(z0).toBeCloseTo(0, 9);
    const [x1, z1] = forwardOf(yawOfPlanHeading(90));
    expect(x1).toBeCloseTo(0, 9);
    expect(z1).toBeCloseTo(1, 9);
  });

  it('round-trips a walker through a pose at eye height', () => {
    const state = { x: 1.2, z: 2.5, yaw: 0.7, pitch: -0.2 };
    const p = walkPose(state, 1.6);
    expect(p.position).toEqual([1.2, 1.6, 2.5]);
    const back = walkStateOf(p);
    expect(back.x).toBe(1.2);
    expect(back.yaw).toBeCloseTo(0.7, 9);
    expect(back.pitch).toBeCloseTo(-0.2, 9);
  });
});

describe('CameraLink', () => {
  it('tells the other views, not the one that moved, and keeps the last pose', () => {
    const link = new CameraLink();
    const heard: string[] = [];
    const offA = link.subscribe('a', () => heard.push('a'));
    link.subscribe('b', () => heard.push('b'));
    link.publish('a', pose);
    expect(heard).toEqual(['b']);
    expect(link.latest).toBe(pose);
    offA();
    link.publish('b', pose);
    expect(heard).toEqual(['b']);
  });
});
