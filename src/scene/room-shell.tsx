import { useEffect, useMemo } from 'react';
import type * as THREE from 'three';
import type { SceneMaterials } from './materials';
import { disposeShellGeometries, shellGeometries, type ShellParts } from './shell-parts';
import type { WallPartTag } from './wall-fade';

interface RoomShellProps {
  parts: ShellParts;
  materials: SceneMaterials;
  ceilingRef: React.RefObject<THREE.Mesh | null>;
  /** Receives the group holding the tagged wall meshes, for fading. */
  wallsRef: React.RefObject<THREE.Group | null>;
}

function tag(wallIndex: number, wallPart: WallPartTag['wallPart']): WallPartTag {
  return { wallIndex, wallPart };
}

/** Floor, ceiling, walls, door leaves and windows of one room, drawn from grouped scene data. */
export function RoomShellMeshes({ parts, materials, ceilingRef, wallsRef }: RoomShellProps) {
  const geometries = useMemo(() => shellGeometries(parts), [parts]);
  useEffect(() => () => disposeShellGeometries(geometries), [geometries]);

  return (
    <group>
      {geometries.floor && <mesh geometry={geometries.floor} material={materials.floor} receiveShadow />}
      {/* Walls, windows and the ceiling cast no shadows: the sun is there to seat the pieces, and a
          wall's shadow across the floor would hide the layout (the ceiling's would hide it all). */}
      {geometries.ceiling && <mesh ref={ceilingRef} geometry={geometries.ceiling} material={materials.ceiling} receiveShadow />}
      {geometries.doorLeaves && <mesh geometry={geometries.doorLeaves} material={materials.doorLeaf} castShadow receiveShadow />}
      <group ref={wallsRef}>
        {geometries.walls.map((wall) => (
          <group key={wall.index}>
            {wall.inside && <mesh geometry={wall.inside} material={materials.wall} userData={tag(wall.index, 'wall')} receiveShadow />}
            {wall.body && <mesh geometry={wall.body} material={materials.wall} userData={tag(wall.index, 'wall')} receiveShadow />}
            {wall.frames && <mesh geometry={wall.frames} material={materials.windowFrame} userData={tag(wall.index, 'frame')} receiveShadow />}
            {wall.glass && <mesh geometry={wall.glass} material={materials.glass} userData={tag(wall.index, 'glass')} />}
          </group>
        ))}
      </group>
    </group>
  );
}
