// The canvas both 3D views draw in (the editor's preview and the client's walk-through): the host
// element, the WebGL check and its message, the error boundary and one renderer set-up.
import { Canvas } from '@react-three/fiber';
import { useState, type HTMLAttributes, type ReactNode } from 'react';
import * as THREE from 'three';
import { SCENE_BACKGROUND } from './materials';
import { browserHasWebGL, SceneErrorBoundary } from './scene-error-boundary';

const FIELD_OF_VIEW_DEG = 40;

export interface SceneCanvasProps extends Omit<HTMLAttributes<HTMLDivElement>, 'children' | 'role' | 'aria-label'> {
  /** The host element: the scene publishes its renderer figures on it for browser tests. */
  host: React.RefObject<HTMLDivElement | null>;
  /** Accessible name of the view's region. */
  label: string;
  /** Shown instead of the view when the browser has no WebGL or the renderer fails. */
  webglMessage: string;
  /**
   * Shadow maps for the sun's shadows under the pieces. Off where the soft shadows under the
   * pieces are baked into the floor instead.
   */
  shadowMaps?: boolean;
  /** The scene, drawn inside the canvas. */
  children: ReactNode;
  /** Shown over the canvas, inside the host (short messages about the view). */
  overlay?: ReactNode;
}

/**
 * A region holding one canvas drawn only when something changes, with neutral tone mapping and the
 * scene's background; without WebGL, or when the renderer fails, `webglMessage` takes its place.
 */
export function SceneCanvas({
  host,
  label,
  webglMessage,
  shadowMaps = false,
  children,
  overlay,
  ...hostProps
}: SceneCanvasProps) {
  const [webgl] = useState(browserHasWebGL);
  const fallback = <WebGLMessage text={webglMessage} />;
  return (
    <div ref={host} role="region" aria-label={label} data-testid="room-view" {...hostProps}>
      {webgl ? (
        <SceneErrorBoundary fallback={fallback}>
          <Canvas
            frameloop="demand"
            shadows={shadowMaps ? 'percentage' : undefined}
            dpr={[1, 2]}
            // Neutral tone mapping keeps a lit paint close to its swatch; the output is sRGB.
            // A stencil buffer: the windows' glass marks where the outside is drawn (outside-view.tsx).
            gl={{
              preserveDrawingBuffer: true,
              stencil: true,
              antialias: true,
              toneMapping: THREE.NeutralToneMapping,
              outputColorSpace: THREE.SRGBColorSpace,
            }}
            camera={{ fov: FIELD_OF_VIEW_DEG, near: 0.05, far: 200, position: [0, 8, 8] }}
            fallback={fallback}
          >
            <color attach="background" args={[SCENE_BACKGROUND]} />
            {children}
          </Canvas>
        </SceneErrorBoundary>
      ) : (
        fallback
      )}
      {overlay}
    </div>
  );
}

function WebGLMessage({ text }: { text: string }) {
  return (
    <div className="flex h-full w-full items-center justify-center bg-sand p-4 text-sm text-ink-soft">
      <p>{text}</p>
    </div>
  );
}
