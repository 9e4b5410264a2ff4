// Drawing a piece model in the browser with plain three.js: the stage (model-stage.ts: its .glb
// framed from a three-quarter view with soft lights), a still PNG for the library's thumbnail, and a
// slow turn for its page. The stage, three and its loader are imported on demand so the library
// page's own chunk stays small; importing three by name there (never `import('three')` whole) keeps
// the three.js the client's page shares with this app to what is used.
import type { ModelStage } from './model-stage';

export type { ModelStage };

export const STILL_PX = 320;

/** Loads the model at `url` and sets it on a lit stage framed to its bounds, drawn on `canvas`. */
export async function stageModel(url: string, canvas: HTMLCanvasElement | OffscreenCanvas, turnDeg = 0): Promise<ModelStage> {
  return (await import('./model-stage')).stageModel(url, canvas, turnDeg);
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
