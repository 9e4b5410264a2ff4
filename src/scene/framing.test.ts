// Tests for the Overview camera's starting frame: every corner of a room in the picture, filling
// it, and looking at the room's middle; and a camera refitted when its view changes shape (Compare).
import * as THREE from 'three';
import { describe, expect, it } from 'vitest';
import { buildRoomScene, type Bounds3 } from '../../shared/geometry/scene';
import { overviewFrame, refitToAspect } from './framing';
import { exampleShell, lShapedShell } from './test-rooms';

function cornersOf(bounds: Bounds3): THREE.Vector3[] {
  const corners: THREE.Vector3[] = [];
  for (const x of [bounds.min[0], bounds.max[0]])
    for (const y of [bounds.min[1], bounds.max[1]])
      for (const z of [bounds.min[2], bounds.max[2]]) corners.push(new THREE.Vector3(x, y, z));
  return corners;
}

describe('overviewFrame', () => {
  it.each([
    ['the example room, wide view', exampleShell, 1280 / 800],
    ['the example room, tall view', exampleShell, 0.6],
    ['the L-shaped room, wide view', lShapedShell, 16 / 9],
  ] as const)('keeps every corner of %s inside the picture, seen from above', (_, shell, aspect) => {
    const bounds = buildRoomScene(shell, { pieces: [] }).bounds;
    const frame = overviewFrame(bounds, 40, aspect);
    const camera = new THREE.PerspectiveCamera(40, aspect, frame.near, frame.far);
    camera.position.set(...frame.position);
    camera.lookAt(...frame.target);
    camera.updateMatrixWorld();
    expect(frame.position[1]).toBeGreaterThan(bounds.max[1]);
    let widest = 0;
    for (const corner of cornersOf(bounds)) {
      const ndc = corner.clone().project(camera);
      expect(Math.abs(ndc.x)).toBeLessThan(1);
      expect(Math.abs(ndc.y)).toBeLessThan(1);
      expect(ndc.z).toBeGreaterThan(-1);
      expect(ndc.z).toBeLessThan(1);
      widest = Math.max(widest, Math.abs(ndc.x), Math.abs(ndc.y));
    }
    // …and fills it: the room is as large as the margin allows, not lost in the middle.
    expect(widest).toBeGreaterThan(0.85);
  });

  it('looks at the middle of the room', () => {
    const frame = overviewFrame(buildRoomScene(exampleShell, { pieces: [] }).bounds, 40, 1.6);
    expect(frame.target[0]).toBeCloseTo(2.1, 1);
    expect(frame.target[2]).toBeCloseTo(1.8, 1);
  });

  it('refits a framed camera to a half-width view (Compare) as if framed there, and back again', () => {
    const bounds = buildRoomScene(exampleShell, { pieces: [] }).bounds;
    const full = overviewFrame(bounds, 40, 1280 / 800);
    const half = overviewFrame(bounds, 40, 640 / 800);
    const refitted = refitToAspect(full.position, full.target, bounds, 40, 1280 / 800, 640 / 800);
    refitted.forEach((v, k) => expect(v).toBeCloseTo(half.position[k], 6));
    // A narrower picture needs the camera further back to keep the whole room in it.
    const away = (p: number[]) => Math.hypot(p[0] - full.target[0], p[1] - full.target[1], p[2] - full.target[2]);
    expect(away(refitted)).toBeGreaterThan(away(full.position) * 1.2);
    const back = refitToAspect(refitted, full.target, bounds, 40, 640 / 800, 1280 / 800);
    back.forEach((v, k) => expect(v).toBeCloseTo(full.position[k], 6));
  });

  it('keeps a turned, closer camera as much closer and looking the same way', () => {
    const bounds = buildRoomScene(exampleShell, { pieces: [] }).bounds;
    const target = overviewFrame(bounds, 40, 1.6).target;
    const eye: [number, number, number] = [target[0] - 3, target[1] + 4, target[2] + 1];
    const moved = refitToAspect(eye, target, bounds, 40, 1.6, 0.8);
    const d0 = eye.map((v, k) => v - target[k]);
    const d1 = moved.map((v, k) => v - target[k]);
    const k = Math.hypot(...d1) / Math.hypot(...d0);
    expect(k).toBeGreaterThan(1);
    d1.forEach((v, i) => expect(v).toBeCloseTo(d0[i] * k, 9));
  });
});
