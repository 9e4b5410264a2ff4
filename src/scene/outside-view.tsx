// The outside seen through the windows (shared/geometry/outside): a sky-to-ground sphere round the
// room, drawn only where a window's glass was drawn (the glass marks the stencil), so neither the
// Overview from above nor an open doorway ever shows it as a wall of colour: only windows look out.
import { useEffect, useMemo } from 'react';
import * as THREE from 'three';
import { buildOutside } from '../../shared/geometry/outside';
import type { Bounds3 } from '../../shared/geometry/scene';

/** The stencil value the glass writes and the outside is drawn through. */
export const WINDOW_STENCIL = 1;
/** Drawn after everything else, over the glass it shows through. */
const OUTSIDE_RENDER_ORDER = 10;
/** A little of the glass's tint stays over the view out. */
const OUTSIDE_OPACITY = 0.9;

export function OutsideView({ bounds }: { bounds: Bounds3 }) {
  const geometry = useMemo(() => {
    const data = buildOutside(bounds);
    const colour = new THREE.Color();
    const linear = new Float32Array(data.colours.length);
    for (let i = 0; i < data.colours.length; i += 3) {
      colour.setRGB(data.colours[i]!, data.colours[i + 1]!, data.colours[i + 2]!, THREE.SRGBColorSpace);
      linear.set([colour.r, colour.g, colour.b], i);
    }
    const g = new THREE.BufferGeometry();
    g.setAttribute('position', new THREE.BufferAttribute(data.positions, 3));
    g.setAttribute('color', new THREE.BufferAttribute(linear, 3));
    g.setIndex(new THREE.BufferAttribute(data.indices, 1));
    g.computeBoundingSphere();
    return g;
  }, [bounds]);
  useEffect(() => () => geometry.dispose(), [geometry]);
  const material = useMemo(
    () =>
      new THREE.MeshBasicMaterial({
        vertexColors: true,
        transparent: true,
        opacity: OUTSIDE_OPACITY,
        depthWrite: false,
        toneMapped: false,
        stencilWrite: true,
        stencilRef: WINDOW_STENCIL,
        stencilFunc: THREE.EqualStencilFunc,
      }),
    [],
  );
  useEffect(() => () => material.dispose(), [material]);
  // Not a surface of the room: clicks pass through it.
  return <mesh geometry={geometry} material={material} renderOrder={OUTSIDE_RENDER_ORDER} raycast={() => null} />;
}
