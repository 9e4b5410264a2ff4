import { useLayoutEffect, useMemo, useRef } from 'react';
import * as THREE from 'three';
import { RectAreaLightUniformsLib } from 'three/examples/jsm/lights/RectAreaLightUniformsLib.js';
import type { Bounds3 } from '../../shared/geometry/scene';
import type { WindowLightRect } from './window-lights';

// Soft daylight without an environment map (nothing is fetched): sky and floor bounce from a
// hemisphere, one sun for the shadows under the pieces, a weak warm fill so the sides the sun
// misses do not go grey, and a soft rectangle of sky light in every window shining into the room.

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
 * Daylight through a window: a cool-white sky colour, bright enough to wash the floor and the
 * walls beside the window without burning them out (chosen by eye against the paint swatches).
 */
const WINDOW_LIGHT = { colour: '#f4f7ff', intensity: 2.2 } as const;

let areaLightsReady = false;
// The area lights' lookup tables are built in code (nothing fetched), once per page.
function prepareAreaLights(): void {
  if (areaLightsReady) return;
  RectAreaLightUniformsLib.init();
  areaLightsReady = true;
}

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
  if (windows.length > 0) prepareAreaLights();
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
  const light = useRef<THREE.RectAreaLight>(null);
  const [x, y, z] = rect.centre;
  const [ix, , iz] = rect.inward;
  // An area light shines along its own −z: aim it at a point just inside the room, level with it.
  useLayoutEffect(() => {
    light.current?.lookAt(x + ix, y, z + iz);
  }, [x, y, z, ix, iz]);
  return <rectAreaLight ref={light} args={[WINDOW_LIGHT.colour, WINDOW_LIGHT.intensity, rect.widthM, rect.heightM]} position={[x, y, z]} />;
}
