// Draws each frame of a 3D view itself and publishes the renderer's figures (draw calls, triangles,
// live geometries and textures, frames) and the piece models drawn on the view's host element for
// browser tests.
import { useFrame } from '@react-three/fiber';
import { useRef } from 'react';
import { shownModels } from './piece-models';

/** The performance mark set when a view has drawn its first frame (browser tests read it). */
export const FIRST_VIEW_MARK = 'parlour:first-view';

interface RenderAndReportProps {
  host: React.RefObject<HTMLDivElement | null>;
  /** More figures for the host's data attributes, read after each frame; must be cheap. */
  extra?: () => Record<string, string>;
}

/**
 * Takes over drawing (a frame callback with priority above zero) so renderer.info can be read
 * right after the frame it describes, and publishes it on the host for browser tests:
 * data-draw-calls, data-triangles, data-geometries and data-textures (live on the GPU), data-frames,
 * and data-models: the placed piece models drawn, as JSON by piece id with what their "main" and
 * "accent" materials wear.
 */
export function RenderAndReport({ host, extra }: RenderAndReportProps) {
  const frames = useRef(0);
  useFrame(({ gl, scene, camera, invalidate }) => {
    // A frame that redraws baked shadows is followed by a plain one, so the figures left on the
    // host describe the frames the client sees while moving, not the one-off bake.
    const baking = gl.shadowMap.enabled && !gl.shadowMap.autoUpdate && gl.shadowMap.needsUpdate;
    gl.render(scene, camera);
    if (baking) invalidate();
    frames.current += 1;
    if (
      frames.current === 1 &&
      typeof performance !== 'undefined' &&
      performance.getEntriesByName(FIRST_VIEW_MARK).length === 0
    ) {
      performance.mark(FIRST_VIEW_MARK);
    }
    const element = host.current;
    if (!element) return;
    element.dataset.drawCalls = String(gl.info.render.calls);
    element.dataset.triangles = String(gl.info.render.triangles);
    element.dataset.geometries = String(gl.info.memory.geometries);
    element.dataset.textures = String(gl.info.memory.textures);
    element.dataset.frames = String(frames.current);
    element.dataset.models = JSON.stringify(shownModels(scene));
    if (extra) Object.assign(element.dataset, extra());
  }, 1);
  return null;
}
