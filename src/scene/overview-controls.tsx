import { OrbitControls } from '@react-three/drei';
import { useThree } from '@react-three/fiber';
import { useLayoutEffect, useRef, type ComponentRef } from 'react';
import * as THREE from 'three';
import type { Bounds3 } from '../../shared/geometry/scene';
import { overviewFrame } from './framing';

/** The eye stays this far (radians) above the horizon of the target, so it never dips under the floor. */
const MAX_POLAR_ANGLE = Math.PI / 2 - 0.08;

interface OverviewControlsProps {
  bounds: Bounds3;
  /** Called after every camera move (orbit, zoom, pan, reframe); must be cheap and must not set React state. */
  onView: (camera: THREE.Camera) => void;
}

/** Orbit round the room; reframes the whole room on mount and whenever its bounds change. */
export function OverviewControls({ bounds, onView }: OverviewControlsProps) {
  const controls = useRef<ComponentRef<typeof OrbitControls>>(null);
  const camera = useThree((state) => state.camera);
  const size = useThree((state) => state.size);
  const invalidate = useThree((state) => state.invalidate);
  const sizeRef = useRef(size);
  sizeRef.current = size;
  const onViewRef = useRef(onView);
  onViewRef.current = onView;

  const [minX, minY, minZ] = bounds.min;
  const [maxX, maxY, maxZ] = bounds.max;
  // Keyed on the numbers, not the object: a resize or a piece moved must not throw away the user's view.
  useLayoutEffect(() => {
    const orbit = controls.current;
    if (!(camera instanceof THREE.PerspectiveCamera) || !orbit) return;
    const { width, height } = sizeRef.current;
    const frame = overviewFrame({ min: [minX, minY, minZ], max: [maxX, maxY, maxZ] }, camera.fov, width / Math.max(height, 1));
    camera.position.set(...frame.position);
    camera.near = frame.near;
    camera.far = frame.far;
    camera.updateProjectionMatrix();
    orbit.target.set(...frame.target);
    orbit.minDistance = frame.minDistance;
    orbit.maxDistance = frame.maxDistance;
    orbit.update();
    onViewRef.current(camera);
    invalidate();
  }, [camera, invalidate, minX, minY, minZ, maxX, maxY, maxZ]);

  return (
    <OrbitControls
      ref={controls}
      makeDefault
      enableDamping={false}
      maxPolarAngle={MAX_POLAR_ANGLE}
      onChange={() => onViewRef.current(camera)}
    />
  );
}
