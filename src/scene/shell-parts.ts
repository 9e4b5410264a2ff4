// How the room's static surfaces are grouped into draw calls: per wall, the inside face alone (it
// will take the wall's own finish), everything else of that wall in one mesh, and the wall's window
// frames (with the linings and architraves of its doors and passages) and glass, so one wall can
// fade as a whole. Door leaves share one mesh and their handles another; the skirting and the
// leaves' edges share the trim (it stays solid, a line round the floor, when a wall fades). Scene metres.
import type * as THREE from 'three';
import type { Bounds3, MeshData, ShellSceneData } from '../../shared/geometry/scene';
import type { RoomShell } from '../../shared/schemas/room';
import { isEmptyMesh, mergeMeshData, meshDataToGeometry } from './build-geometry';

export interface WallParts {
  index: number;
  outward: [number, number, number];
  inside: MeshData;
  /** Outside face, top and reveals. */
  body: MeshData;
  /** Window frames, bars and sills, and the linings and architraves of its doors and passages. */
  frames: MeshData;
  glass: MeshData;
}

export interface ShellParts {
  floor: MeshData;
  ceiling: MeshData;
  walls: WallParts[];
  doorLeaves: MeshData;
  /** Lever handles of every door. */
  handles: MeshData;
  /** Painted trim that never fades: the skirting and the door leaves' edges. */
  trim: MeshData;
  bounds: Bounds3;
}

/** Groups a room scene's surfaces (scene metres) into the meshes the view draws. */
export function shellParts(scene: ShellSceneData, shell: RoomShell): ShellParts {
  const wallOfOpening = new Map(shell.openings.map((opening) => [opening.id, opening.wall]));
  const walls = scene.walls.map((wall) => {
    const windows = scene.windows.filter((w) => wallOfOpening.get(w.openingId) === wall.index);
    return {
      index: wall.index,
      outward: wall.outward,
      inside: wall.inside,
      body: mergeMeshData([wall.outside, wall.top, wall.reveals]),
      frames: mergeMeshData([...windows.flatMap((w) => [w.frame, w.sill]), wall.trims]),
      glass: mergeMeshData(windows.map((w) => w.glass)),
    };
  });
  return {
    floor: scene.floor,
    ceiling: scene.ceiling,
    walls,
    doorLeaves: mergeMeshData(scene.doorLeaves.map((d) => d.mesh)),
    handles: mergeMeshData(scene.doorLeaves.map((d) => d.handles)),
    trim: mergeMeshData([scene.skirting, ...scene.doorLeaves.map((d) => d.edges)]),
    bounds: scene.bounds,
  };
}

export interface WallGeometries {
  index: number;
  outward: [number, number, number];
  inside: THREE.BufferGeometry | null;
  body: THREE.BufferGeometry | null;
  frames: THREE.BufferGeometry | null;
  glass: THREE.BufferGeometry | null;
}

export interface ShellGeometries {
  floor: THREE.BufferGeometry | null;
  ceiling: THREE.BufferGeometry | null;
  walls: WallGeometries[];
  doorLeaves: THREE.BufferGeometry | null;
  handles: THREE.BufferGeometry | null;
  trim: THREE.BufferGeometry | null;
}

// Empty parts get no geometry, so they cost no draw call.
function geometryOrNull(mesh: MeshData): THREE.BufferGeometry | null {
  return isEmptyMesh(mesh) ? null : meshDataToGeometry(mesh);
}

/** BufferGeometries for every part; release them with disposeShellGeometries. */
export function shellGeometries(parts: ShellParts): ShellGeometries {
  return {
    floor: geometryOrNull(parts.floor),
    ceiling: geometryOrNull(parts.ceiling),
    walls: parts.walls.map((wall) => ({
      index: wall.index,
      outward: wall.outward,
      inside: geometryOrNull(wall.inside),
      body: geometryOrNull(wall.body),
      frames: geometryOrNull(wall.frames),
      glass: geometryOrNull(wall.glass),
    })),
    doorLeaves: geometryOrNull(parts.doorLeaves),
    handles: geometryOrNull(parts.handles),
    trim: geometryOrNull(parts.trim),
  };
}

export function disposeShellGeometries(geometries: ShellGeometries): void {
  const all = [
    geometries.floor,
    geometries.ceiling,
    geometries.doorLeaves,
    geometries.trim,
    geometries.handles,
    ...geometries.walls.flatMap((w) => [w.inside, w.body, w.frames, w.glass]),
  ];
  for (const geometry of all) geometry?.dispose();
}
