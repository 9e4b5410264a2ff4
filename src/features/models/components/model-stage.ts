// The stage a piece model is drawn on in the designer's library: its .glb loaded, framed from a
// three-quarter view with soft lights. Loaded on demand by model-three.ts, with three.js and its
// loader named class by class, so the bundle keeps only what is drawn here.
import {
  Box3,
  DirectionalLight,
  Group,
  HemisphereLight,
  PerspectiveCamera,
  Scene,
  SRGBColorSpace,
  Vector3,
  WebGLRenderer,
  type Object3D,
} from 'three';
import { GLTFLoader } from 'three/examples/jsm/loaders/GLTFLoader.js';

/** The three-quarter view: this far round from the front, and this far above the middle (radians). */
const VIEW_TURN = Math.PI / 5;
const VIEW_RISE = Math.PI / 9;

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
  const gltf = await new GLTFLoader().loadAsync(url);
  const renderer = new WebGLRenderer({ canvas, antialias: true, alpha: true, preserveDrawingBuffer: true });
  renderer.setPixelRatio(1);
  renderer.outputColorSpace = SRGBColorSpace;
  const scene = new Scene();
  scene.add(new HemisphereLight(0xffffff, 0xd8cfc2, 2.2));
  const key = new DirectionalLight(0xfff6ea, 1.6);
  key.position.set(2, 4, 3);
  scene.add(key);
  const fill = new DirectionalLight(0xeaf0ff, 0.5);
  fill.position.set(-3, 2, -1);
  scene.add(fill);

  const model = gltf.scene;
  model.rotation.y = (-turnDeg * Math.PI) / 180;
  const bounds = new Box3().setFromObject(model);
  const centre = bounds.getCenter(new Vector3());
  const radius = Math.max(bounds.getSize(new Vector3()).length() / 2, 0.01);
  model.position.sub(centre);
  const turntable = new Group();
  turntable.add(model);
  scene.add(turntable);

  const camera = new PerspectiveCamera(30, 1, radius / 100, radius * 100);
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
