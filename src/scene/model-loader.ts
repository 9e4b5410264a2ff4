// Loading piece models (normalised .glb files) for the 3D views. The glTF loader is its own lazy
// chunk, fetched only when a shown piece wears a model, so a page without models stays at its size.
// Each file is loaded once per page and kept (switching options, or two pieces wearing one model,
// loads nothing again); its bounds are measured once as it arrives.
import * as THREE from 'three';
import type { ModelBounds } from '../../shared/geometry/model-fit';

export interface LoadedModel {
  /** The model's scene; placed copies share its geometries and materials. */
  scene: THREE.Group;
  bounds: ModelBounds;
  triangles: number;
}

const loads = new Map<string, Promise<LoadedModel>>();

async function load(url: string): Promise<LoadedModel> {
  const { GLTFLoader } = await import('three/examples/jsm/loaders/GLTFLoader.js');
  const gltf = await new GLTFLoader().loadAsync(url);
  const scene = gltf.scene;
  scene.updateMatrixWorld(true);
  const box = new THREE.Box3().setFromObject(scene);
  let triangles = 0;
  scene.traverse((o) => {
    const mesh = o as THREE.Mesh;
    if (!mesh.isMesh) return;
    const g = mesh.geometry;
    triangles += Math.floor((g.index ? g.index.count : g.getAttribute('position').count) / 3);
  });
  return { scene, bounds: { min: box.min.toArray(), max: box.max.toArray() }, triangles };
}

/** The model at `url`, loaded once per page; a failed load is forgotten so a later view may try again. */
export function loadModel(url: string): Promise<LoadedModel> {
  let known = loads.get(url);
  if (!known) {
    known = load(url);
    loads.set(url, known);
    known.catch(() => loads.delete(url));
  }
  return known;
}
