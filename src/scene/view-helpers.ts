// Pieces both 3D views (the editor's preview and the client's walk-through) share: stable memo
// keys, guarded builds, what each surface wears, and fading the walls that face the eye.
import { useCallback, useLayoutEffect, useMemo, useRef } from 'react';
import type * as THREE from 'three';
import type { Piece } from '../../shared/schemas/option';
import type { SceneMaterials } from './materials';
import { finishColourHex, type FinishMaterialPair, type FinishMaterials, type SurfaceFinishes } from './finish-materials';
import type { ShellParts } from './shell-parts';
import { applyWallFade } from './wall-fade';
import { wallsFacingEye } from './wall-facing';

/** The same value while its JSON stays the same, so memos key on content, not on object identity. */
export function useStableValue<T>(value: T): T {
  const key = JSON.stringify(value);
  return useMemo(() => JSON.parse(key) as T, [key]);
}

// A shell mid-edit can break a rule the geometry relies on; the view then draws nothing for it
// rather than taking the page down, and the editor's checks say what is wrong.
export function tryBuild<T>(what: string, build: () => T): T | null {
  try {
    return build();
  } catch (error) {
    console.warn(`3D view could not build the ${what}:`, error);
    return null;
  }
}

/** The materials an option's floor, ceiling and each wall's inside face wear; missing ones keep the defaults. */
export interface SurfaceMaterials {
  floor?: FinishMaterialPair;
  ceiling?: FinishMaterialPair;
  inside: (wallIndex: number) => FinishMaterialPair | undefined;
}

export function surfaceMaterials(finishes: SurfaceFinishes, finishMaterials: FinishMaterials): SurfaceMaterials {
  return {
    floor: finishes.floor ? finishMaterials.get(finishes.floor) : undefined,
    ceiling: finishes.ceiling ? finishMaterials.get(finishes.ceiling) : undefined,
    inside: (wall: number) => {
      const f = finishes.wallOverrides?.[String(wall)] ?? finishes.walls ?? null;
      return f ? finishMaterials.get(f) : undefined;
    },
  };
}

/** Placed pieces, each wearing its finish's colour (a photo's mean colour: pieces share one mesh). */
export function dressedPieces(pieces: readonly Piece[], finishes: SurfaceFinishes): Piece[] {
  return pieces
    .filter((p) => p.placed)
    .map((p) => (finishes.pieces?.[p.id] ? { ...p, colour: finishColourHex(finishes.pieces[p.id]) } : p));
}

/**
 * Fades the walls between the eye and the room (when `fadeNearWalls`), hides the ceiling seen
 * from above, and records the faded walls on the host. Runs on every camera move: mutates meshes
 * and one data attribute, never React state.
 */
export function updateWallFade(
  parts: ShellParts,
  camera: THREE.Camera,
  fadeNearWalls: boolean,
  walls: THREE.Group | null,
  ceiling: THREE.Mesh | null,
  materials: SceneMaterials,
  host: HTMLElement | null,
): void {
  const { min, max } = parts.bounds;
  const centre: [number, number, number] = [(min[0] + max[0]) / 2, (min[1] + max[1]) / 2, (min[2] + max[2]) / 2];
  const eye: [number, number, number] = [camera.position.x, camera.position.y, camera.position.z];
  const faded = fadeNearWalls ? wallsFacingEye(parts.walls, eye, centre) : [];
  if (walls) applyWallFade(walls, new Set(faded), materials);
  // Seen from above the ceiling faces away and only costs a draw call; from below it closes the room.
  if (ceiling) ceiling.visible = eye[1] < max[1];
  if (host) host.dataset.fadedWalls = faded.join(',');
}

/**
 * The meshes and callback that keep the walls faded as the camera moves: hand `walls` and
 * `ceiling` to the shell and call `updateView` after every camera move (cheap; mutates meshes,
 * never React state). New wall meshes mount solid and `fadeNearWalls` can change without the
 * camera moving, so both re-apply the last camera and ask for a frame.
 */
export function useWallFade(
  parts: ShellParts | null,
  fadeNearWalls: boolean,
  materials: SceneMaterials,
  host: React.RefObject<HTMLElement | null>,
  invalidate: () => void,
  surfaces: unknown,
) {
  const walls = useRef<THREE.Group>(null);
  const ceiling = useRef<THREE.Mesh>(null);
  const lastCamera = useRef<THREE.Camera | null>(null);
  const updateView = useCallback(
    (camera: THREE.Camera) => {
      lastCamera.current = camera;
      if (!parts) return;
      updateWallFade(parts, camera, fadeNearWalls, walls.current, ceiling.current, materials, host.current);
    },
    [parts, fadeNearWalls, materials, host],
  );
  useLayoutEffect(() => {
    if (lastCamera.current) updateView(lastCamera.current);
    invalidate();
  }, [updateView, invalidate, surfaces]);
  return { walls, ceiling, lastCamera, updateView };
}
