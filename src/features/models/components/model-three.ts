// Drawing a piece model in the browser with plain three.js: loading its .glb, framing it from a
// three-quarter view with soft lights, a still PNG for the library's thumbnail, and a slow turn for
// its page. three and its loader are imported on demand so the library page's own chunk stays small.
import type { Object3D, PerspectiveCamera, Scene, WebGLRenderer } from 'three';

/** The three-quarter view: this far round from the front, and this far above the middle (radians). */
const VIEW_TURN = Math.PI / 5;
const VIEW_RISE = Math.PI / 9;
export const STILL_PX = 320;

export interface ModelStage {
  renderer: WebGLRenderer;
  scene: Scene;
  camera: PerspectiveCamera;
  /** The model, turned about its middle's vertical axis. */
  turntable: Object3D;
  dispose: () => void;
}

/** Loads the model at `url` and sets it on a lit stage framed to its bounds, drawn on `canvas`. */
export async function stageModel(url: string, canvas: HTMLCanvasElement | OffscreenCanvas, turnDeg = 0): Promise<ModelStage> {
  const [THREE, { GLTFLoader }] = await Promise.all([import('three'), import('three/examples/jsm/loaders/GLTFLoader.js')]);
  const gltf = await new GLTFLoader().loadAsync(url);
  const renderer = new THREE.WebGLRenderer({ canvas, antialias: true, alpha: true, preserveDrawingBuffer: true });
  renderer.setPixelRatio(1);
  renderer.outputColorSpace = THREE.SRGBColorSpace;
  const scene = new THREE.Scene();
  scene.add(new THREE.HemisphereLight(0xffffff, 0xd8cfc2, 2.2));
  const key = new THREE.DirectionalLight(0xfff6ea, 1.6);
  key.position.set(2, 4, 3);
  scene.add(key);
  const fill = new THREE.DirectionalLight(0xeaf0ff, 0.5);
  fill.position.set(-3, 2, -1);
  scene.add(fill);

  const model = gltf.scene;
  model.rotation.y = (-turnDeg * Math.PI) / 180;
  const bounds = new THREE.Box3().setFromObject(model);
  const centre = bounds.getCenter(new THREE.Vector3());
  const radius = Math.max(bounds.getSize(new THREE.Vector3()).length() / 2, 0.01);
  model.position.sub(centre);
  const turntable = new THREE.Group();
  turntable.add(model);
  scene.add(turntable);

  const camera = new THREE.PerspectiveCamera(30, 1, radius / 100, radius * 100);
  const distance = radius / Math.sin((camera.fov * Math.PI) / 360);
  camera.position.set(
    distance * Math.cos(VIEW_RISE) * Math.sin(VIEW_TURN),
    distance * Math.sin(VIEW_RISE),
    distance * Math.cos(VIEW_RISE) * Math.cos(VIEW_TURN),
  );
  camera.lookAt(0, 0, 0);
  return {
    renderer,
    scene,
    camera,
    turntable,
    dispose: () => {
      renderer.dispose();
      scene.traverse((o) => {
        const mesh = o as { geometry?: { dispose: () => void } };
        mesh.geometry?.dispose();
      });
    },
  };
}

/** A still of the model from the three-quarter view, as a PNG of STILL_PX square. */
export async function renderStill(url: string, turnDeg = 0): Promise<Blob> {
  const canvas = document.createElement('canvas');
  canvas.width = STILL_PX;
  canvas.height = STILL_PX;
  const stage = await stageModel(url, canvas, turnDeg);
  try {
    stage.renderer.setSize(STILL_PX, STILL_PX, false);
    stage.renderer.render(stage.scene, stage.camera);
    return await new Promise<Blob>((resolve, reject) =>
      canvas.toBlob((blob) => (blob ? resolve(blob) : reject(new Error('The still could not be drawn.'))), 'image/png'),
    );
  } finally {
    stage.dispose();
  }
}
