// The on-screen controls over the 3D view: the same moves as dragging and the keys, for anyone
// who cannot drag or does not know the keys. Plain buttons with plain names; nothing here moves
// the camera itself, it asks the view.
import { useEffect, useRef, type ReactNode } from 'react';
import type { TextureProgress, ViewCommands, ViewMode, WalkMove } from '../walkthrough/walkthrough-view';

/** Eye height limits for Walk (mm): a child or a seated person up to a tall adult. */
export const EYE_HEIGHT = { minMm: 1000, maxMm: 2000, stepMm: 50, defaultMm: 1600 } as const;

const round =
  'flex size-10 items-center justify-center rounded-full bg-white/95 text-ink shadow-sm ring-1 ring-line-strong/70 transition-colors hover:bg-pine-wash hover:text-pine-dark active:bg-pine-wash';

function Icon({ children }: { children: ReactNode }) {
  return (
    <svg
      viewBox="0 0 24 24"
      className="size-5"
      fill="none"
      stroke="currentColor"
      strokeWidth={2}
      strokeLinecap="round"
      strokeLinejoin="round"
      aria-hidden
    >
      {children}
    </svg>
  );
}

const ICONS = {
  turnLeft: (
    <Icon>
      <path d="M8 5 4 9l4 4" />
      <path d="M4 9h10a6 6 0 0 1 0 12h-3" />
    </Icon>
  ),
  turnRight: (
    <Icon>
      <path d="m16 5 4 4-4 4" />
      <path d="M20 9H10a6 6 0 0 0 0 12h3" />
    </Icon>
  ),
  closer: (
    <Icon>
      <path d="M12 6v12M6 12h12" />
    </Icon>
  ),
  further: (
    <Icon>
      <path d="M6 12h12" />
    </Icon>
  ),
  above: (
    <Icon>
      <rect x="5" y="5" width="14" height="14" rx="1.5" />
      <path d="M5 12h6M15 5v8" />
    </Icon>
  ),
  start: (
    <Icon>
      <path d="M4 12a8 8 0 1 0 2.4-5.7" />
      <path d="M4 4v4h4" />
    </Icon>
  ),
  up: (
    <Icon>
      <path d="M12 19V5M6 11l6-6 6 6" />
    </Icon>
  ),
  down: (
    <Icon>
      <path d="M12 5v14M6 13l6 6 6-6" />
    </Icon>
  ),
  left: (
    <Icon>
      <path d="M19 12H5M11 6l-6 6 6 6" />
    </Icon>
  ),
  right: (
    <Icon>
      <path d="M5 12h14M13 6l6 6-6 6" />
    </Icon>
  ),
};

function CommandButton({ label, icon, onPress }: { label: string; icon: ReactNode; onPress: () => void }) {
  return (
    <button type="button" className={round} aria-label={label} title={label} onClick={onPress}>
      {icon}
    </button>
  );
}

/** Turn, closer, further, from above and back to the start, for the Overview. */
export function OverviewButtons({ commands }: { commands: React.RefObject<ViewCommands | null> }) {
  return (
    <div role="group" aria-label="Move round the room" className="flex flex-wrap gap-2">
      <CommandButton label="Turn the room left" icon={ICONS.turnLeft} onPress={() => commands.current?.turn(-1)} />
      <CommandButton label="Turn the room right" icon={ICONS.turnRight} onPress={() => commands.current?.turn(1)} />
      <CommandButton label="Come closer" icon={ICONS.closer} onPress={() => commands.current?.zoom(-1)} />
      <CommandButton label="Step back" icon={ICONS.further} onPress={() => commands.current?.zoom(1)} />
      <CommandButton label="Look from above" icon={ICONS.above} onPress={() => commands.current?.topView()} />
      <CommandButton label="Back to the first view" icon={ICONS.start} onPress={() => commands.current?.reset()} />
    </div>
  );
}

/**
 * A press shorter than this is a click: one step or one turn notch. Held longer, the button keeps
 * moving until it is let go (about the length of a deliberate click; common practice, no source).
 */
const HOLD_AFTER_MS = 250;

// Clicked it takes one step (or turns one notch); held with a pointer it keeps moving, like a held
// key; pressed from the keyboard it takes one step.
function HoldButton({
  label,
  icon,
  move,
  commands,
}: {
  label: string;
  icon: ReactNode;
  move: WalkMove;
  commands: React.RefObject<ViewCommands | null>;
}) {
  // 'pressed': down, not yet a hold; 'holding': moving until let go.
  const press = useRef<{ phase: 'pressed' | 'holding'; timer: ReturnType<typeof setTimeout> } | null>(null);
  const release = (click: boolean) => {
    const p = press.current;
    if (!p) return;
    press.current = null;
    clearTimeout(p.timer);
    if (p.phase === 'holding') commands.current?.hold(move, false);
    else if (click) commands.current?.step(move);
  };
  // Let go if the button goes away mid-press (the mode changed).
  useEffect(
    () => () => {
      const p = press.current;
      if (!p) return;
      press.current = null;
      clearTimeout(p.timer);
      if (p.phase === 'holding') commands.current?.hold(move, false);
    },
    [commands, move],
  );
  return (
    <button
      type="button"
      className={round}
      aria-label={label}
      title={label}
      onPointerDown={(e) => {
        if (e.button !== 0 || press.current) return;
        const timer = setTimeout(() => {
          if (!press.current) return;
          press.current.phase = 'holding';
          commands.current?.hold(move, true);
        }, HOLD_AFTER_MS);
        press.current = { phase: 'pressed', timer };
      }}
      onPointerUp={() => release(true)}
      onPointerLeave={() => release(false)}
      onPointerCancel={() => release(false)}
      onClick={(e) => {
        // detail 0: pressed with Enter or Space, not with a pointer.
        if (e.detail === 0) commands.current?.step(move);
      }}
      onContextMenu={(e) => e.preventDefault()}
    >
      {icon}
    </button>
  );
}

/** Forward, back, sideways and turning, and the eye height, for Walk. */
export function WalkButtons({
  commands,
  eyeHeightMm,
  onEyeHeight,
}: {
  commands: React.RefObject<ViewCommands | null>;
  eyeHeightMm: number;
  onEyeHeight: (mm: number) => void;
}) {
  return (
    <div className="flex flex-wrap items-end gap-3">
      <div role="group" aria-label="Walk" className="grid grid-cols-3 gap-1.5">
        <HoldButton label="Turn left" icon={ICONS.turnLeft} move="turn-left" commands={commands} />
        <HoldButton label="Walk forward" icon={ICONS.up} move="forward" commands={commands} />
        <HoldButton label="Turn right" icon={ICONS.turnRight} move="turn-right" commands={commands} />
        <HoldButton label="Step left" icon={ICONS.left} move="left" commands={commands} />
        <HoldButton label="Walk back" icon={ICONS.down} move="back" commands={commands} />
        <HoldButton label="Step right" icon={ICONS.right} move="right" commands={commands} />
      </div>
      <label className="flex flex-col gap-1 rounded-xl bg-white/95 px-3 py-2 text-sm shadow-sm ring-1 ring-line-strong/70">
        <span className="font-semibold">Eye height {(eyeHeightMm / 1000).toFixed(2)} m</span>
        <input
          type="range"
          min={EYE_HEIGHT.minMm}
          max={EYE_HEIGHT.maxMm}
          step={EYE_HEIGHT.stepMm}
          value={eyeHeightMm}
          onChange={(e) => onEyeHeight(Number(e.target.value))}
          className="w-36 accent-pine"
        />
      </label>
    </div>
  );
}

/** Overview or Walk, and Compare: the three ways to look. */
export function ViewModeBar({
  mode,
  onMode,
  compare,
  onCompare,
  canCompare,
  onHelp,
}: {
  mode: ViewMode;
  onMode: (mode: ViewMode) => void;
  compare: boolean;
  onCompare: (on: boolean) => void;
  canCompare: boolean;
  onHelp: () => void;
}) {
  const seg = (on: boolean) =>
    `rounded-md px-3 py-1.5 text-sm font-semibold transition-colors ${on ? 'bg-white text-pine-dark shadow-sm' : 'text-ink-soft hover:text-ink'}`;
  return (
    <div className="flex flex-wrap items-center gap-2">
      <div role="group" aria-label="How to look" className="flex rounded-lg bg-sand p-1">
        <button
          type="button"
          className={seg(mode === 'overview')}
          aria-pressed={mode === 'overview'}
          onClick={() => onMode('overview')}
        >
          Overview
        </button>
        <button type="button" className={seg(mode === 'walk')} aria-pressed={mode === 'walk'} onClick={() => onMode('walk')}>
          Walk
        </button>
      </div>
      {canCompare && (
        <button
          type="button"
          aria-pressed={compare}
          onClick={() => onCompare(!compare)}
          className={`rounded-lg border px-3 py-1.5 text-sm font-semibold transition-colors ${compare ? 'border-pine bg-pine-wash text-pine-dark' : 'border-line-strong bg-white text-ink hover:bg-sand'}`}
        >
          Compare
        </button>
      )}
      <button
        type="button"
        onClick={onHelp}
        className="rounded-lg border border-line-strong bg-white px-3 py-1.5 text-sm font-semibold text-ink hover:bg-sand"
        aria-haspopup="dialog"
      >
        Keys
      </button>
    </div>
  );
}

/** The textures still arriving; the room is drawn in flat colours until they do. */
export function LoadingBar({ progress }: { progress: TextureProgress }) {
  if (progress.total === 0 || progress.settled >= progress.total) return null;
  const share = progress.settled / progress.total;
  return (
    <div className="pointer-events-none absolute inset-x-0 top-0 z-10 flex justify-center p-3">
      <div className="w-64 rounded-full bg-white/95 px-3 py-2 shadow-sm ring-1 ring-line-strong/70">
        <div className="flex justify-between text-xs font-semibold text-ink-soft">
          <span>Loading the finishes</span>
          <span>
            {progress.settled} of {progress.total}
          </span>
        </div>
        <div
          role="progressbar"
          aria-label="Loading the finishes"
          aria-valuemin={0}
          aria-valuemax={progress.total}
          aria-valuenow={progress.settled}
          className="mt-1.5 h-1.5 overflow-hidden rounded-full bg-sand"
        >
          <div className="h-full rounded-full bg-pine transition-[width]" style={{ width: `${Math.max(6, share * 100)}%` }} />
        </div>
      </div>
    </div>
  );
}

const KEYS: Record<ViewMode, [string, string][]> = {
  overview: [
    ['Drag', 'turn the room'],
    ['Scroll or pinch', 'come closer or step back'],
    ['← →', 'turn the room'],
    ['↑ ↓', 'come closer, step back'],
  ],
  walk: [
    ['W or ↑', 'walk forward'],
    ['S or ↓', 'walk back'],
    ['A, D', 'step left, right'],
    ['← →', 'turn'],
    ['Drag', 'look round'],
    ['Click the floor', 'walk there'],
  ],
};

/** A short list of the keys, over the view; Escape or the button closes it. */
export function KeyHelp({ mode, optionCount, onClose }: { mode: ViewMode; optionCount: number; onClose: () => void }) {
  const close = useRef<HTMLButtonElement>(null);
  useEffect(() => {
    close.current?.focus();
    const onKey = (e: KeyboardEvent) => {
      if (e.key === 'Escape') onClose();
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [onClose]);
  const rows = [...KEYS[mode], ...(optionCount > 1 ? [[`1–${optionCount}`, 'show another option'] as [string, string]] : [])];
  return (
    <div
      role="dialog"
      aria-label="Keys"
      className="absolute top-3 right-3 z-20 w-72 rounded-2xl bg-white/97 p-4 shadow-lg ring-1 ring-line-strong/70"
    >
      <div className="flex items-center justify-between">
        <h2 className="font-bold">Keys in {mode === 'walk' ? 'Walk' : 'the Overview'}</h2>
        <button
          ref={close}
          type="button"
          onClick={onClose}
          className="rounded-md px-2 py-1 text-sm font-semibold text-ink-soft hover:bg-sand"
        >
          Close
        </button>
      </div>
      <p className="mt-1 text-sm text-ink-soft">Click the picture first, so the keys reach it.</p>
      <dl className="mt-3 grid grid-cols-[7rem_1fr] gap-x-3 gap-y-1.5 text-sm">
        {rows.map(([key, what]) => (
          <div key={key} className="contents">
            <dt>
              <kbd className="rounded border border-line-strong bg-paper px-1.5 py-0.5 font-sans text-xs font-semibold">
                {key}
              </kbd>
            </dt>
            <dd className="text-ink-soft">{what}</dd>
          </div>
        ))}
      </dl>
    </div>
  );
}
