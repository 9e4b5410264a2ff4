// The room's shell in 3D: floor, ceiling, walls, door leaves, trims and windows with their finishes,
// the outside seen through the windows, and clicks on a surface (not drags) reported to the caller.
import { useEffect, useMemo } from 'react';
import type { ThreeEvent } from '@react-three/fiber';
import type * as THREE from 'three';
import type { SceneMaterials } from './materials';
import type { FinishMaterialPair } from './finish-materials';
import { disposeShellGeometries, shellGeometries, type ShellParts } from './shell-parts';
import type { WallPartTag } from './wall-fade';
import { OutsideView } from './outside-view';

interface RoomShellProps {
  parts: ShellParts;
  materials: SceneMaterials;
  ceilingRef: React.RefObject<THREE.Mesh | null>;
  /** Receives the group holding the tagged wall meshes, for fading. */
  wallsRef: React.RefObject<THREE.Group | null>;
  /** Finishes on the floor, the ceiling and each wall's inside face; missing ones keep the defaults. */
  surfaces?: {
    floor?: FinishMaterialPair;
    ceiling?: FinishMaterialPair;
    inside?: (wallIndex: number) => FinishMaterialPair | undefined;
  };
  /** A click (not a drag) on the floor, the ceiling or a wall's inside face. */
  onSurfaceClick?: (surface: SurfaceHit) => void;
  /** A click (not a drag) on the floor, with the point hit (scene metres on the floor plane). */
  onFloorPoint?: (x: number, z: number) => void;
}

export type SurfaceHit = 'floor' | 'ceiling' | { wall: number };

/** Pointer travel (px) above which a press is a turn of the view, not a click. */
const CLICK_SLOP_PX = 5;

function tag(wallIndex: number, wallPart: WallPartTag['wallPart']): WallPartTag {
  return { wallIndex, wallPart };
}

/** Floor, ceiling, walls, door leaves and windows of one room, drawn from grouped scene data. */
export function RoomShellMeshes({
  parts,
  materials,
  ceilingRef,
  wallsRef,
  surfaces,
  onSurfaceClick,
  onFloorPoint,
}: RoomShellProps) {
  const click = (surface: SurfaceHit) =>
    onSurfaceClick
      ? (e: ThreeEvent<MouseEvent>) => {
          if (e.delta > CLICK_SLOP_PX) return;
          e.stopPropagation();
          onSurfaceClick(surface);
        }
      : undefined;
  const floorClick = onFloorPoint
    ? (e: ThreeEvent<MouseEvent>) => {
        if (e.delta > CLICK_SLOP_PX) return;
        e.stopPropagation();
        onFloorPoint(e.point.x, e.point.z);
      }
    : click('floor');
  const geometries = useMemo(() => shellGeometries(parts), [parts]);
  useEffect(() => () => disposeShellGeometries(geometries), [geometries]);

  return (
    <group>
      <OutsideView bounds={parts.bounds} />
      {geometries.floor && (
        <mesh
          geometry={geometries.floor}
          material={surfaces?.floor?.solid ?? materials.floor}
          receiveShadow
          onClick={floorClick}
        />
      )}
      {/* Walls, windows and the ceiling cast no shadows: the sun is there to seat the pieces, and a
          wall's shadow across the floor would hide the layout (the ceiling's would hide it all). */}
      {geometries.ceiling && (
        <mesh
          ref={ceilingRef}
          geometry={geometries.ceiling}
          material={surfaces?.ceiling?.solid ?? materials.ceiling}
          receiveShadow
          onClick={click('ceiling')}
        />
      )}
      {geometries.doorLeaves && <mesh geometry={geometries.doorLeaves} material={materials.doorLeaf} castShadow receiveShadow />}
      {geometries.handles && <mesh geometry={geometries.handles} material={materials.handle} castShadow />}
      {/* The skirting and the leaves' edges wear the window frames' paint; they stay solid when a wall fades. */}
      {geometries.trim && <mesh geometry={geometries.trim} material={materials.windowFrame} receiveShadow />}
      <group ref={wallsRef}>
        {geometries.walls.map((wall) => {
          const own = surfaces?.inside?.(wall.index);
          return (
            <group key={wall.index}>
              {wall.inside && (
                <mesh
                  geometry={wall.inside}
                  material={own?.solid ?? materials.wall}
                  userData={{ ...tag(wall.index, 'wall'), solidMaterial: own?.solid, fadedMaterial: own?.faded }}
                  receiveShadow
                  onClick={click({ wall: wall.index })}
                />
              )}
              {wall.body && (
                <mesh geometry={wall.body} material={materials.wall} userData={tag(wall.index, 'wall')} receiveShadow />
              )}
              {wall.frames && (
                <mesh geometry={wall.frames} material={materials.windowFrame} userData={tag(wall.index, 'frame')} receiveShadow />
              )}
              {wall.glass && <mesh geometry={wall.glass} material={materials.glass} userData={tag(wall.index, 'glass')} />}
            </group>
          );
        })}
      </group>
    </group>
  );
}
