// Soft daylight without an environment map (nothing is fetched): sky and floor bounce from a
// hemisphere, one sun for the shadows under the pieces, a weak warm fill so the sides the sun
// misses do not go grey, and a wide soft beam of daylight from every window into the room.
import { useLayoutEffect, useMemo, useRef } from 'react';
import * as THREE from 'three';
import type { Bounds3 } from '../../shared/geometry/scene';
import type { WindowLightRect } from './window-lights';

/**
 * Towards the sun from the room centre: about 50° up and from the front-left of the plan, so the
 * far walls the Overview looks at are lit and the pieces' shadows fall to the right, in view.
 */
const SUN_DIRECTION = new THREE.Vector3(-0.45, 0.77, 0.45).normalize();
/** The fill comes low from the other side, lighting the walls the sun misses without brightening the floor. */
const FILL_DIRECTION = new THREE.Vector3(0.95, 0.2, -0.2).normalize();
// Intensities are balanced so a wall facing the eye shows close to its swatch: the sky and the
// bounce are equally bright (vertical walls get the same share), the sun adds shape and shadows.
const SKY = { sky: '#fdfbf7', ground: '#ebe5db', intensity: 2.6 } as const;
const SUN = { colour: '#fff8ee', intensity: 1.2 } as const;
const FILL = { colour: '#ffeedd', intensity: 0.6 } as const;
/** Enough texels for crisp shadows of a room a few metres across, and cheap on software WebGL. */
export const SHADOW_MAP_SIZE = 2048;
/** How much the shadow filter blurs (texels): soft edges like an overcast room, not a spotlight. */
const SHADOW_SOFTNESS = 3;
/**
 * Daylight through a window: a cool-white beam from the pane into the room and down towards the
 * floor, wide and soft-edged, bright enough to wash the floor and the walls beside the window
 * without burning them out (chosen by eye against the paint swatches). A spot per window costs
 * far less per pixel than an area light and needs no lookup tables in the bundle.
 */
const WINDOW_LIGHT = { colour: '#f3f6ff', intensity: 7, angle: (62 * Math.PI) / 180, penumbra: 1, decay: 1.6 } as const;
/** The beam aims this far into the room (m) and this far below the window's middle (m): daylight falls. */
const WINDOW_AIM = { inwardM: 2.5, dropM: 1.1 } as const;

interface SceneLightsProps {
  bounds: Bounds3;
  /** One soft daylight rectangle per window; none by default. */
  windows?: readonly WindowLightRect[];
  /** The sun draws a shadow map (default); a view with baked floor shadows turns it off. */
  sunShadows?: boolean;
}

export function SceneLights({ bounds, windows = [], sunShadows = true }: SceneLightsProps) {
  const [cx, cy, cz, radius] = useMemo(() => {
    const size = bounds.max.map((max, axis) => max - bounds.min[axis]);
    return [
      (bounds.min[0] + bounds.max[0]) / 2,
      (bounds.min[1] + bounds.max[1]) / 2,
      (bounds.min[2] + bounds.max[2]) / 2,
      Math.max(Math.hypot(size[0], size[1], size[2]) / 2, 0.5),
    ];
  }, [bounds]);
  const target = useMemo(() => new THREE.Object3D(), []);
  const sun = useRef<THREE.DirectionalLight>(null);

  // The shadow camera hugs the room's bounding sphere so the map's texels are spent on the room.
  useLayoutEffect(() => {
    const light = sun.current;
    if (!light) return;
    const camera = light.shadow.camera;
    camera.left = -radius;
    camera.right = radius;
    camera.top = radius;
    camera.bottom = -radius;
    camera.near = radius * 0.5;
    camera.far = radius * 5.5;
    camera.updateProjectionMatrix();
    light.shadow.needsUpdate = true;
  }, [radius]);

  const sunDistance = radius * 3;
  return (
    <>
      {windows.map((w) => (
        <WindowLight key={w.openingId} rect={w} />
      ))}
      <hemisphereLight args={[SKY.sky, SKY.ground, SKY.intensity]} />
      <primitive object={target} position={[cx, 0, cz]} />
      <directionalLight
        ref={sun}
        color={SUN.colour}
        intensity={SUN.intensity}
        position={[cx + SUN_DIRECTION.x * sunDistance, cy + SUN_DIRECTION.y * sunDistance, cz + SUN_DIRECTION.z * sunDistance]}
        target={target}
        castShadow={sunShadows}
        shadow-mapSize={[SHADOW_MAP_SIZE, SHADOW_MAP_SIZE]}
        shadow-radius={SHADOW_SOFTNESS}
        shadow-bias={-0.0004}
        shadow-normalBias={0.02}
      />
      <directionalLight
        color={FILL.colour}
        intensity={FILL.intensity}
        position={[cx + FILL_DIRECTION.x * sunDistance, cy + FILL_DIRECTION.y * sunDistance, cz + FILL_DIRECTION.z * sunDistance]}
        target={target}
      />
    </>
  );
}

function WindowLight({ rect }: { rect: WindowLightRect }) {
  const [x, y, z] = rect.centre;
  const [ix, , iz] = rect.inward;
  const target = useMemo(() => new THREE.Object3D(), []);
  return (
    <>
      <primitive
        object={target}
        position={[x + ix * WINDOW_AIM.inwardM, Math.max(0, y - WINDOW_AIM.dropM), z + iz * WINDOW_AIM.inwardM]}
      />
      <spotLight
        color={WINDOW_LIGHT.colour}
        intensity={WINDOW_LIGHT.intensity * rect.widthM * rect.heightM}
        angle={WINDOW_LIGHT.angle}
        penumbra={WINDOW_LIGHT.penumbra}
        decay={WINDOW_LIGHT.decay}
        position={[x, y, z]}
        target={target}
      />
    </>
  );
}
