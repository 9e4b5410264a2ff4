// Fading walls in the Overview: tags on wall meshes, and swapping faded walls (and their glass) to
// see-through materials.
import * as THREE from 'three';
import type { SceneMaterials } from './materials';

/** What a wall mesh is, stored in its userData so fading can find it without React. */
export type WallPartKind = 'wall' | 'frame' | 'glass';

export interface WallPartTag {
  wallIndex: number;
  wallPart: WallPartKind;
}

function tagOf(object: THREE.Object3D): WallPartTag | null {
  const data = object.userData as Partial<WallPartTag>;
  return typeof data.wallIndex === 'number' && data.wallPart ? { wallIndex: data.wallIndex, wallPart: data.wallPart } : null;
}

/**
 * Fades the walls in `faded` under `root` by swapping them to the shared see-through materials,
 * and restores the rest. A faded wall hides its glass, which would otherwise look more solid than it.
 */
export function applyWallFade(root: THREE.Object3D, faded: ReadonlySet<number>, materials: SceneMaterials): void {
  root.traverse((object) => {
    if (!(object instanceof THREE.Mesh)) return;
    const tag = tagOf(object);
    if (!tag) return;
    const isFaded = faded.has(tag.wallIndex);
    switch (tag.wallPart) {
      case 'wall': {
        // A wall wearing a finish carries its own pair of materials.
        const own = object.userData as { solidMaterial?: THREE.Material; fadedMaterial?: THREE.Material };
        object.material = isFaded ? (own.fadedMaterial ?? materials.wallFaded) : (own.solidMaterial ?? materials.wall);
        break;
      }
      case 'frame':
        object.material = isFaded ? materials.windowFrameFaded : materials.windowFrame;
        break;
      case 'glass':
        object.visible = !isFaded;
        break;
    }
  });
}
