// The crop box drawn over a photo finish's photo: drag to move it, drag a corner to resize it, or
// use the arrow keys; plus the pure drag maths.
import { useRef, type KeyboardEvent, type PointerEvent } from 'react';
import { MIN_CROP_FRACTION, type Crop } from '../../../../shared/schemas/finish';

type Drag = 'move' | 'nw' | 'ne' | 'sw' | 'se';
/** Tallest the photo is drawn, so a portrait photo does not push the page down. */
const MAX_HEIGHT_REM = 30;
/** One arrow key press moves the crop by this fraction of the photo. */
const KEY_STEP = 0.01;

const clamp = (v: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, v));

/** Moves or resizes `start` by (dx, dy), fractions of the photo, keeping it on the photo. */
export function dragCrop(start: Crop, drag: Drag, dx: number, dy: number): Crop {
  if (drag === 'move') {
    return { ...start, x: clamp(start.x + dx, 0, 1 - start.width), y: clamp(start.y + dy, 0, 1 - start.height) };
  }
  let left = start.x;
  let top = start.y;
  let right = start.x + start.width;
  let bottom = start.y + start.height;
  if (drag === 'nw' || drag === 'sw') left = clamp(left + dx, 0, right - MIN_CROP_FRACTION);
  if (drag === 'ne' || drag === 'se') right = clamp(right + dx, left + MIN_CROP_FRACTION, 1);
  if (drag === 'nw' || drag === 'ne') top = clamp(top + dy, 0, bottom - MIN_CROP_FRACTION);
  if (drag === 'sw' || drag === 'se') bottom = clamp(bottom + dy, top + MIN_CROP_FRACTION, 1);
  return { x: left, y: top, width: right - left, height: bottom - top };
}

const HANDLES: { drag: Exclude<Drag, 'move'>; className: string; label: string }[] = [
  { drag: 'nw', className: 'top-0.5 left-0.5 cursor-nwse-resize', label: 'top left corner' },
  { drag: 'ne', className: 'top-0.5 right-0.5 cursor-nesw-resize', label: 'top right corner' },
  { drag: 'sw', className: 'bottom-0.5 left-0.5 cursor-nesw-resize', label: 'bottom left corner' },
  { drag: 'se', className: 'right-0.5 bottom-0.5 cursor-nwse-resize', label: 'bottom right corner' },
];

/** The photo with the crop drawn on it; drag the box to move it, a corner to resize it. */
export function CropBox({
  src,
  widthPx,
  heightPx,
  crop,
  onChange,
  disabled = false,
}: {
  src: string;
  widthPx: number;
  heightPx: number;
  crop: Crop;
  onChange: (crop: Crop) => void;
  disabled?: boolean;
}) {
  const frame = useRef<HTMLDivElement>(null);
  const dragging = useRef<{ drag: Drag; x: number; y: number; start: Crop } | null>(null);
  const aspect = widthPx / heightPx;

  const begin = (drag: Drag) => (e: PointerEvent) => {
    if (disabled) return;
    e.preventDefault();
    e.stopPropagation();
    (e.currentTarget as HTMLElement).setPointerCapture(e.pointerId);
    dragging.current = { drag, x: e.clientX, y: e.clientY, start: crop };
  };
  const move = (e: PointerEvent) => {
    const d = dragging.current;
    const rect = frame.current?.getBoundingClientRect();
    if (!d || !rect) return;
    onChange(dragCrop(d.start, d.drag, (e.clientX - d.x) / rect.width, (e.clientY - d.y) / rect.height));
  };
  const end = () => {
    dragging.current = null;
  };
  const onKey = (e: KeyboardEvent) => {
    const step = { ArrowLeft: [-KEY_STEP, 0], ArrowRight: [KEY_STEP, 0], ArrowUp: [0, -KEY_STEP], ArrowDown: [0, KEY_STEP] }[
      e.key
    ];
    if (!step || disabled) return;
    e.preventDefault();
    onChange(dragCrop(crop, e.shiftKey ? 'se' : 'move', step[0], step[1]));
  };

  return (
    <div
      ref={frame}
      className="relative mx-auto touch-none overflow-hidden rounded-xl bg-sand select-none"
      style={{ aspectRatio: `${widthPx} / ${heightPx}`, width: `min(100%, ${MAX_HEIGHT_REM * aspect}rem)` }}
      onPointerMove={move}
      onPointerUp={end}
      onPointerCancel={end}
    >
      <img src={src} alt="The whole photo" className="absolute inset-0 size-full" draggable={false} />
      <div
        role="group"
        tabIndex={disabled ? -1 : 0}
        aria-label={`Crop: ${Math.round(crop.width * 100)}% by ${Math.round(crop.height * 100)}% of the photo. Arrow keys move it, Shift and arrows resize it.`}
        onKeyDown={onKey}
        onPointerDown={begin('move')}
        className={`absolute border-2 border-white shadow-[0_0_0_9999px_rgba(42,37,33,0.5)] ${disabled ? '' : 'cursor-move'}`}
        style={{
          left: `${crop.x * 100}%`,
          top: `${crop.y * 100}%`,
          width: `${crop.width * 100}%`,
          height: `${crop.height * 100}%`,
        }}
      >
        {!disabled &&
          HANDLES.map((h) => (
            <span
              key={h.drag}
              aria-hidden
              title={`Drag the ${h.label}`}
              onPointerDown={begin(h.drag)}
              className={`absolute size-4 rounded-full border-2 border-white bg-pine ${h.className}`}
            />
          ))}
      </div>
    </div>
  );
}
