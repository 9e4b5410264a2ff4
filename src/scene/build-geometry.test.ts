// Tests for turning scene mesh data into three.js geometry: every vertex and triangle kept, true
// sizes in metres, merged meshes, and tracing a triangle back to its piece.
import * as THREE from 'three';
import { describe, expect, it } from 'vitest';
import { buildRoomScene, meshBounds, type MeshData } from '../../shared/geometry/scene';
import { mergeMeshData, mergedRanges, meshDataToGeometry, partOfTriangle } from './build-geometry';
import { exampleShell, examplePieces } from './test-rooms';

const scene = buildRoomScene(exampleShell, { pieces: examplePieces });

function expectBoxToMatch(box: THREE.Box3 | null, mesh: MeshData) {
  const bounds = meshBounds(mesh);
  expect(box).not.toBeNull();
  expect(box!.min.toArray()).toEqual(bounds.min);
  expect(box!.max.toArray()).toEqual(bounds.max);
}

describe('meshDataToGeometry', () => {
  it('keeps every vertex, uv and triangle of the floor and of each wall', () => {
    for (const mesh of [scene.floor, ...scene.walls.map((w) => w.inside)]) {
      const geometry = meshDataToGeometry(mesh);
      expect(geometry.getAttribute('position').count).toBe(mesh.positions.length / 3);
      expect(geometry.getAttribute('normal').count).toBe(mesh.positions.length / 3);
      expect(geometry.getAttribute('uv').count).toBe(mesh.uvs.length / 2);
      expect(geometry.getIndex()!.count).toBe(mesh.indices.length);
      expectBoxToMatch(geometry.boundingBox, mesh);
      geometry.dispose();
    }
  });

  it('gives the floor of a 4.2 × 3.6 m room its true size in metres', () => {
    const geometry = meshDataToGeometry(scene.floor);
    const size = geometry.boundingBox!.getSize(new THREE.Vector3());
    expect(size.x).toBeCloseTo(4.2, 6);
    expect(size.y).toBe(0);
    expect(size.z).toBeCloseTo(3.6, 6);
    geometry.dispose();
  });
});

describe('mergeMeshData', () => {
  const parts = scene.pieces.map((p) => p.mesh);
  const merged = mergeMeshData(parts);

  it('holds all parts, with indices shifted onto their own vertices', () => {
    const vertices = parts.reduce((sum, m) => sum + m.positions.length / 3, 0);
    expect(merged.positions.length / 3).toBe(vertices);
    expect(merged.indices.length).toBe(parts.reduce((sum, m) => sum + m.indices.length, 0));
    expect(Math.max(...merged.indices)).toBe(vertices - 1);
    const second = parts[1];
    const firstVertices = parts[0].positions.length / 3;
    expect(merged.indices[parts[0].indices.length]).toBe(second.indices[0] + firstVertices);
  });

  it('covers the same space as its parts together', () => {
    const geometry = meshDataToGeometry(merged);
    const union = new THREE.Box3();
    for (const part of parts) {
      const bounds = meshBounds(part);
      union.union(new THREE.Box3(new THREE.Vector3(...bounds.min), new THREE.Vector3(...bounds.max)));
    }
    expect(geometry.boundingBox!.equals(union)).toBe(true);
    geometry.dispose();
  });

  it('of nothing is an empty mesh', () => {
    const empty = mergeMeshData([]);
    expect(empty.positions.length).toBe(0);
    expect(empty.indices.length).toBe(0);
  });
});

describe('partOfTriangle', () => {
  const parts = scene.pieces.map((p) => p.mesh);
  const ranges = mergedRanges(parts);

  it('traces every triangle of the merged pieces back to its own piece', () => {
    expect(scene.pieces.map((p) => p.id)).toEqual(['sofa', 'table', 'wardrobe']);
    let triangle = 0;
    parts.forEach((part, index) => {
      for (let t = 0; t < part.indices.length / 3; t++, triangle++) expect(partOfTriangle(ranges, triangle)).toBe(index);
    });
  });

  it('answers -1 outside the merged triangles', () => {
    const total = ranges.triangleStarts[ranges.triangleStarts.length - 1];
    expect(partOfTriangle(ranges, total)).toBe(-1);
    expect(partOfTriangle(ranges, -1)).toBe(-1);
  });
});
