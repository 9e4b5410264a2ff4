// The editor preview's camera: an orbit round the room that frames the whole room on mount and
// whenever its bounds change.
import { OrbitControls } from '@react-three/drei';
import { useThree } from '@react-three/fiber';
import { useRef } from 'react';
import type * as THREE from 'three';
import type { Bounds3 } from '../../shared/geometry/scene';
import { ORBIT_LIMITS, useOrbitFraming, type OrbitHandle } from './orbit';

interface OverviewControlsProps {
  bounds: Bounds3;
  /** Called after every camera move (orbit, zoom, pan, reframe); must be cheap and must not set React state. */
  onView: (camera: THREE.Camera) => void;
}

/** Orbit round the room; reframes the whole room on mount and whenever its bounds change. */
export function OverviewControls({ bounds, onView }: OverviewControlsProps) {
  const controls = useRef<OrbitHandle>(null);
  const camera = useThree((state) => state.camera);
  const invalidate = useThree((state) => state.invalidate);
  const onViewRef = useRef(onView);
  onViewRef.current = onView;

  useOrbitFraming(controls, bounds, (frame, orbit) => {
    camera.position.set(...frame.position);
    orbit.target.set(...frame.target);
    orbit.update();
    onViewRef.current(camera);
    invalidate();
  });

  return <OrbitControls ref={controls} {...ORBIT_LIMITS} onChange={() => onViewRef.current(camera)} />;
}
