// Scene data arrives as plain typed arrays (scene metres); this is the one place they become
// three.js objects, so counts and bounds stay exactly what shared/geometry computed.
import * as THREE from 'three';
import type { MeshData } from '../../shared/geometry/scene';

/** A BufferGeometry (scene metres) holding exactly the vertices, normals, uvs and triangles of `mesh`. */
export function meshDataToGeometry(mesh: MeshData): THREE.BufferGeometry {
  const geometry = new THREE.BufferGeometry();
  geometry.setAttribute('position', new THREE.BufferAttribute(mesh.positions, 3));
  geometry.setAttribute('normal', new THREE.BufferAttribute(mesh.normals, 3));
  geometry.setAttribute('uv', new THREE.BufferAttribute(mesh.uvs, 2));
  geometry.setIndex(new THREE.BufferAttribute(mesh.indices, 1));
  // Computed up front so frustum culling and raycasting never read a stale or missing box.
  geometry.computeBoundingBox();
  geometry.computeBoundingSphere();
  return geometry;
}

/** Several meshes (scene metres) as one, indices shifted; used to draw static parts in one call. */
export function mergeMeshData(meshes: readonly MeshData[]): MeshData {
  let vertexCount = 0;
  let indexCount = 0;
  for (const mesh of meshes) {
    vertexCount += mesh.positions.length / 3;
    indexCount += mesh.indices.length;
  }
  const positions = new Float32Array(vertexCount * 3);
  const normals = new Float32Array(vertexCount * 3);
  const uvs = new Float32Array(vertexCount * 2);
  const indices = new Uint32Array(indexCount);
  let vertexBase = 0;
  let indexBase = 0;
  for (const mesh of meshes) {
    positions.set(mesh.positions, vertexBase * 3);
    normals.set(mesh.normals, vertexBase * 3);
    uvs.set(mesh.uvs, vertexBase * 2);
    for (let i = 0; i < mesh.indices.length; i++) indices[indexBase + i] = mesh.indices[i] + vertexBase;
    vertexBase += mesh.positions.length / 3;
    indexBase += mesh.indices.length;
  }
  return { positions, normals, uvs, indices };
}

/** True when a mesh has no triangles, so the view can skip creating a draw call for it. */
export function isEmptyMesh(mesh: MeshData): boolean {
  return mesh.indices.length === 0;
}

/** Where each merged part's triangles and vertices start, so a hit triangle can be traced back to its part. */
export interface MergedRanges {
  /** First triangle of each part, ascending; one extra entry at the end holds the total. */
  triangleStarts: number[];
  /** First vertex of each part, ascending; one extra entry at the end holds the total. */
  vertexStarts: number[];
}

/** The triangle and vertex ranges that mergeMeshData gives the same meshes, in the same order. */
export function mergedRanges(meshes: readonly MeshData[]): MergedRanges {
  const triangleStarts = [0];
  const vertexStarts = [0];
  for (const mesh of meshes) {
    triangleStarts.push(triangleStarts[triangleStarts.length - 1] + mesh.indices.length / 3);
    vertexStarts.push(vertexStarts[vertexStarts.length - 1] + mesh.positions.length / 3);
  }
  return { triangleStarts, vertexStarts };
}

/** Index of the merged part that owns triangle `triangle`, or -1 when it is outside every part. */
export function partOfTriangle(ranges: MergedRanges, triangle: number): number {
  const starts = ranges.triangleStarts;
  if (!Number.isInteger(triangle) || triangle < 0 || triangle >= starts[starts.length - 1]) return -1;
  // Binary search: rooms hold tens of pieces, but picking should not grow with them.
  let low = 0;
  let high = starts.length - 2;
  while (low < high) {
    const mid = (low + high + 1) >> 1;
    if (starts[mid] <= triangle) low = mid;
    else high = mid - 1;
  }
  return low;
}
