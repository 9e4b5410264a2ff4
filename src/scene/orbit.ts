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
 * hands the frame to `place` to put the camera. Returns the latest frame.
 */
export function useOrbitFraming(
  controls: RefObject<OrbitHandle | null>,
  bounds: Bounds3,
  place: (frame: OverviewFrame, orbit: OrbitHandle) => void,
  fovDeg?: number,
): RefObject<OverviewFrame | null> {
  const camera = useThree((state) => state.camera);
  const size = useThree((state) => state.size);
  const sizeRef = useRef(size);
  sizeRef.current = size;
  const frame = useRef<OverviewFrame | null>(null);
  // The effect calls the latest `place` without re-running when it is rebuilt.
  const placeInFrame = useEffectEvent(place);

  const [minX, minY, minZ] = bounds.min;
  const [maxX, maxY, maxZ] = bounds.max;
  // Keyed on the numbers, not the object: a resize or a piece moved must not throw away the view.
  useLayoutEffect(() => {
    const orbit = controls.current;
    if (!(camera instanceof THREE.PerspectiveCamera) || !orbit) return;
    if (fovDeg !== undefined) camera.fov = fovDeg;
    const { width, height } = sizeRef.current;
    const f = overviewFrame({ min: [minX, minY, minZ], max: [maxX, maxY, maxZ] }, camera.fov, width / Math.max(height, 1));
    frame.current = f;
    camera.near = f.near;
    camera.far = f.far;
    camera.updateProjectionMatrix();
    orbit.minDistance = f.minDistance;
    orbit.maxDistance = f.maxDistance;
    placeInFrame(f, orbit);
  }, [controls, camera, fovDeg, minX, minY, minZ, maxX, maxY, maxZ]);

  return frame;
}
