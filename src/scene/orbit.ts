// The one orbit set-up round a room, for the editor's 3D preview and the walk-through's Overview:
// the orbit's limits, and the hook that frames the whole room when its bounds change.
import type { OrbitControls } from '@react-three/drei';
import { useThree } from '@react-three/fiber';
import { useEffectEvent, useLayoutEffect, useRef, type ComponentRef, type RefObject } from 'react';
import * as THREE from 'three';
import type { Bounds3 } from '../../shared/geometry/scene';
import { overviewFrame, type OverviewFrame } from './framing';

export type OrbitHandle = ComponentRef<typeof OrbitControls>;

/** The eye stays this far (radians) above the horizon of the target, so it never dips under the floor. */
export const MAX_POLAR_ANGLE = Math.PI / 2 - 0.08;

/** What every orbit round a room is given: the default controls, no drift after a drag, the eye kept above the floor. */
export const ORBIT_LIMITS = {
  makeDefault: true,
  enableDamping: false,
  maxPolarAngle: MAX_POLAR_ANGLE,
} as const;

/**
 * Frames the whole room for the orbit, on mount and whenever the room's bounds change: sets the
 * field of view (when given), fits the clip planes and the orbit's distance limits to the room, then
 * hands the frame to `place` to put the camera. With `refit`, a view that changes shape (a half of
 * Compare) is framed again for its new size and `refit` is handed the aspects before and after, to
 * move the camera. Returns the latest frame.
 */
export function useOrbitFraming(
  controls: RefObject<OrbitHandle | null>,
  bounds: Bounds3,
  place: (frame: OverviewFrame, orbit: OrbitHandle) => void,
  fovDeg?: number,
  refit?: (frame: OverviewFrame, fromAspect: number, toAspect: number) => void,
): RefObject<OverviewFrame | null> {
  const camera = useThree((state) => state.camera);
  const size = useThree((state) => state.size);
  const sizeRef = useRef(size);
  sizeRef.current = size;
  const frame = useRef<OverviewFrame | null>(null);
  // The aspect the frame was made for.
  const framedAspect = useRef<number | null>(null);
  // The effect calls the latest `place` without re-running when it is rebuilt.
  const placeInFrame = useEffectEvent(place);
  const refitFrame = useEffectEvent((f: OverviewFrame, from: number, to: number) => refit?.(f, from, to));
  const hasRefit = refit !== undefined;

  const [minX, minY, minZ] = bounds.min;
  const [maxX, maxY, maxZ] = bounds.max;
  // Keyed on the numbers, not the object: a resize or a piece moved must not throw away the view.
  useLayoutEffect(() => {
    const orbit = controls.current;
    if (!(camera instanceof THREE.PerspectiveCamera) || !orbit) return;
    if (fovDeg !== undefined) camera.fov = fovDeg;
    const { width, height } = sizeRef.current;
    const aspect = width / Math.max(height, 1);
    const f = overviewFrame({ min: [minX, minY, minZ], max: [maxX, maxY, maxZ] }, camera.fov, aspect);
    frame.current = f;
    framedAspect.current = aspect;
    fitOrbit(camera, orbit, f);
    placeInFrame(f, orbit);
  }, [controls, camera, fovDeg, minX, minY, minZ, maxX, maxY, maxZ]);

  const aspect = size.width / Math.max(size.height, 1);
  useLayoutEffect(() => {
    const orbit = controls.current;
    const from = framedAspect.current;
    if (!hasRefit || !(camera instanceof THREE.PerspectiveCamera) || !orbit || from === null) return;
    if (Math.abs(from - aspect) < 1e-3) return;
    const f = overviewFrame({ min: [minX, minY, minZ], max: [maxX, maxY, maxZ] }, camera.fov, aspect);
    frame.current = f;
    framedAspect.current = aspect;
    fitOrbit(camera, orbit, f);
    refitFrame(f, from, aspect);
    // Only a change of shape refits: a change of bounds was framed by the effect above first.
  }, [aspect, hasRefit, controls, camera, minX, minY, minZ, maxX, maxY, maxZ]);

  return frame;
}

/** Fits the clip planes and the orbit's distance limits to a frame. */
function fitOrbit(camera: THREE.PerspectiveCamera, orbit: OrbitHandle, f: OverviewFrame): void {
  camera.near = f.near;
  camera.far = f.far;
  camera.updateProjectionMatrix();
  orbit.minDistance = f.minDistance;
  orbit.maxDistance = f.maxDistance;
}
