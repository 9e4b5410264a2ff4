// A model's turning preview on its page: the model drawn with plain three.js, turning slowly; it
// stops while the pointer is over it and stays still for people who ask for reduced motion.
import { useEffect, useRef, useState } from 'react';
import { Spinner } from '../../../components/ui/layout';
import { stageModel } from './model-three';

/** One turn takes this long (ms): slow enough to look at the piece as it goes round. */
const TURN_MS = 24_000;

export function ModelPreview({ url, turnDeg, name }: { url: string; turnDeg: number; name: string }) {
  const canvas = useRef<HTMLCanvasElement>(null);
  const paused = useRef(false);
  const [state, setState] = useState<'loading' | 'shown' | 'failed'>('loading');

  useEffect(() => {
    const el = canvas.current;
    if (!el) return;
    let stop = false;
    let frame = 0;
    let dispose = () => {};
    const still = window.matchMedia('(prefers-reduced-motion: reduce)').matches;
    stageModel(url, el, turnDeg)
      .then((stage) => {
        dispose = stage.dispose;
        if (stop) return dispose();
        const size = () => {
          const px = el.clientWidth || 320;
          stage.renderer.setSize(px, px, false);
        };
        size();
        setState('shown');
        let last = performance.now();
        const draw = (now: number) => {
          if (stop) return;
          if (!still && !paused.current) stage.turntable.rotation.y += ((now - last) / TURN_MS) * Math.PI * 2;
          last = now;
          stage.renderer.render(stage.scene, stage.camera);
          frame = requestAnimationFrame(draw);
        };
        frame = requestAnimationFrame(draw);
      })
      .catch(() => !stop && setState('failed'));
    return () => {
      stop = true;
      cancelAnimationFrame(frame);
      dispose();
    };
  }, [url, turnDeg]);

  return (
    <div className="relative mx-auto w-full max-w-md">
      <canvas
        ref={canvas}
        className="aspect-square w-full rounded-xl bg-sand"
        role="img"
        aria-label={`${name}, turning slowly`}
        onPointerEnter={() => (paused.current = true)}
        onPointerLeave={() => (paused.current = false)}
      />
      {state !== 'shown' && (
        <div className="absolute inset-0 flex items-center justify-center">
          {state === 'loading' ? (
            <Spinner label="Loading the model…" />
          ) : (
            <p className="text-sm text-ink-soft">This browser could not draw the model.</p>
          )}
        </div>
      )}
    </div>
  );
}
