// One room of a presentation: the 3D walk-through (Overview or Walk, one option or two side by
// side), the option switcher, the pieces and the client's choice.
import { lazy, Suspense, useCallback, useEffect, useMemo, useRef, useState } from 'react';
import type { ClientRoom } from '../../../../shared/schemas/presentation';
import type { MoneySettings } from '../../../../shared/units/money';
import { CameraLink } from '../walkthrough/camera-link';
import type { TextureProgress, ViewCommands, ViewMode } from '../walkthrough/walkthrough-view';
import { Button } from '../../../components/ui/button';
import { markLookedAt } from '../api/presentation';
import { ChooseDialog } from './choose-dialog';
import { halvesShowing, openHalves, settledHalves, type Halves } from './compare-halves';
import { changedSinceSeen, rememberSeen } from './seen-versions';
import { PieceCard } from './piece-card';
import { EYE_HEIGHT, KeyHelp, LoadingBar, OverviewButtons, ViewModeBar, WalkButtons } from './view-controls';
import { chooseLabel, momentText, PAGE_FRAME, pieceName, piecesHeading, SAFETY_LINE } from './wording';

// three.js is most of the page's weight: it loads after the page itself has appeared.
const WalkthroughView = lazy(() => import('../walkthrough/walkthrough-view'));

/** Typing in a field must not switch options. */
const isTyping = (target: EventTarget | null) =>
  target instanceof HTMLElement && (target.isContentEditable || ['INPUT', 'TEXTAREA', 'SELECT'].includes(target.tagName));

const REDUCED_MOTION = '(prefers-reduced-motion: reduce)';

/** The client's wish for less motion, followed live. */
function usePrefersReducedMotion(): boolean {
  const [reduced, setReduced] = useState(
    () => typeof window !== 'undefined' && window.matchMedia?.(REDUCED_MOTION).matches === true,
  );
  useEffect(() => {
    const query = window.matchMedia?.(REDUCED_MOTION);
    if (!query) return undefined;
    const onChange = () => setReduced(query.matches);
    query.addEventListener('change', onChange);
    return () => query.removeEventListener('change', onChange);
  }, []);
  return reduced;
}

const NO_PROGRESS: TextureProgress = { settled: 0, total: 0 };

/**
 * One room: the walk-through in 3D (Overview or Walk, one option or two side by side), its options
 * (one click or keys 1–9, the camera staying where it is), the pieces, and the choice.
 */
export function RoomStage({
  token,
  room,
  studioName,
  showPrices,
  money,
  decided,
  nextRoom,
  onGoTo,
}: {
  token: string;
  room: ClientRoom;
  studioName: string;
  showPrices: boolean;
  money: MoneySettings;
  decided: boolean;
  nextRoom: ClientRoom | null;
  onGoTo: (roomId: string | 'welcome') => void;
}) {
  const [optionId, setOptionId] = useState(room.choice?.optionId ?? room.options[0].id);
  const option = room.options.find((o) => o.id === optionId) ?? room.options[0];
  const [pieceId, setPieceId] = useState<string | null>(null);
  const piece = option.pieces.find((p) => p.id === pieceId) ?? null;
  const [choosing, setChoosing] = useState(false);
  const chosen = room.options.find((o) => o.id === room.choice?.optionId) ?? null;
  const [mode, setMode] = useState<ViewMode>('overview');
  const [compare, setCompare] = useState(false);
  // The options side by side while comparing, [left, right]: they stay put as either is selected.
  const [halves, setHalves] = useState<Halves | null>(null);
  const [eyeHeightMm, setEyeHeightMm] = useState<number>(EYE_HEIGHT.defaultMm);
  const [help, setHelp] = useState(false);
  const [progress, setProgress] = useState<TextureProgress>(NO_PROGRESS);
  const reducedMotion = usePrefersReducedMotion();
  // One link per room: the views of a comparison move together, and a view opened later starts where the others are.
  const [link] = useState(() => new CameraLink());
  const commands = useRef<ViewCommands>(null);

  const selected = useRef(option.id);
  selected.current = option.id;
  // Shows an option; while comparing it takes the half not selected, unless it is on show already.
  const show = useCallback((id: string) => {
    setHalves((h) => (h ? halvesShowing(h, selected.current, id) : h));
    setOptionId(id);
    setPieceId(null);
  }, []);

  // Each option counts once per visit as "looked at", however often the client flips back to it.
  const lookedAt = useRef(new Set<string>());
  useEffect(() => {
    rememberSeen(option);
    if (lookedAt.current.has(option.id)) return;
    lookedAt.current.add(option.id);
    markLookedAt(token, option.id);
  }, [token, option]);

  const options = room.options;
  const others = options.filter((o) => o.id !== option.id);
  const optionIds = useMemo(() => options.map((o) => o.id), [options]);
  const pair = compare ? settledHalves(halves, option.id, optionIds) : null;
  const comparing = pair !== null;
  const byId = (id: string) => options.find((o) => o.id === id) ?? option;
  const [left, right] = pair ? [byId(pair[0]), byId(pair[1])] : [option, null];
  const compared = right && (right.id === option.id ? left : right);
  const onCompare = (on: boolean) => {
    setCompare(on);
    setHalves(on ? openHalves(option.id, optionIds) : null);
  };
  useEffect(() => {
    if (choosing) return;
    const onKey = (e: KeyboardEvent) => {
      if (e.altKey || e.ctrlKey || e.metaKey || isTyping(e.target)) return;
      const n = Number(e.key);
      if (Number.isInteger(n) && n >= 1 && n <= options.length) {
        e.preventDefault();
        show(options[n - 1].id);
      } else if (e.key === '?') {
        e.preventDefault();
        setHelp((h) => !h);
      }
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [choosing, options, show]);

  // Every option of the room goes to the view at once: it builds each one once and keeps it.
  const viewOptions = useMemo(() => options.map((o) => ({ id: o.id, pieces: o.pieces, finishes: o.surfaces })), [options]);
  const closeHelp = useCallback(() => setHelp(false), []);

  const isChosen = chosen?.id === option.id;
  const chip =
    'pointer-events-none absolute top-3 left-3 max-w-[calc(100%-1.5rem)] truncate rounded-full bg-white/90 px-3 py-1 text-sm font-semibold shadow-sm';
  // `?pieces=boxes` draws the plain boxes instead of the forms, so the two can be compared (the bench does).
  const pieceBuild = useMemo(
    () => (new URLSearchParams(window.location.search).get('pieces') === 'boxes' ? 'boxes' : 'forms'),
    [],
  );
  const viewProps = { shell: room.shell, options: viewOptions, mode, eyeHeightMm, reducedMotion, link, pieceBuild } as const;
  return (
    <div className={`${PAGE_FRAME} flex flex-col gap-4 py-4 lg:h-[calc(100dvh-4.25rem)] lg:flex-row`} data-testid="room-frame">
      <section aria-labelledby="room-title" className="flex min-h-0 min-w-0 flex-1 flex-col gap-2">
        <div className="flex flex-wrap items-center justify-between gap-x-4 gap-y-2">
          <div className="flex min-w-0 items-baseline gap-3">
            <h1 id="room-title" className="truncate text-2xl font-bold tracking-tight">
              {room.name}
            </h1>
            <p className="shrink-0 text-sm text-ink-soft">
              Option {options.indexOf(option) + 1} of {options.length}
            </p>
          </div>
          <ViewModeBar
            mode={mode}
            onMode={setMode}
            compare={comparing}
            onCompare={onCompare}
            canCompare={others.length > 0}
            onHelp={() => setHelp((h) => !h)}
          />
        </div>
        <div className="relative min-h-[22rem] flex-1 overflow-hidden rounded-2xl border border-line bg-sand max-lg:h-[min(62vh,34rem)]">
          <Suspense
            fallback={
              <div className="flex h-full items-center justify-center text-ink-soft" role="status">
                Setting up the 3D view…
              </div>
            }
          >
            <div className={`grid h-full gap-px bg-line ${comparing ? 'grid-cols-2' : 'grid-cols-1'}`}>
              {[left, right].map((shown, i) =>
                shown ? (
                  <div key={i === 0 ? 'main' : 'compare'} className="relative min-w-0 bg-sand">
                    <WalkthroughView
                      {...viewProps}
                      optionId={shown.id}
                      viewId={i === 0 ? 'main' : 'compare'}
                      selectedPieceId={shown.id === option.id ? pieceId : null}
                      // A tap on a piece selects its half's option and opens the piece.
                      onPieceClick={(id) => {
                        if (shown.id !== option.id) show(shown.id);
                        setPieceId(id);
                      }}
                      commandsRef={i === 0 ? commands : undefined}
                      onTextureProgress={i === 0 ? setProgress : undefined}
                      label={`${room.name}, ${shown.label}, in 3D${i === 0 ? '' : ', side by side'}`}
                    />
                    <div className={comparing && shown.id === option.id ? `${chip} bg-pine! text-white` : chip}>
                      {shown.label}
                      {comparing && shown.id === option.id && <span className="font-normal"> · selected</span>}
                    </div>
                    {comparing && shown.id === option.id && (
                      <div className="pointer-events-none absolute inset-0 ring-3 ring-pine ring-inset" aria-hidden />
                    )}
                  </div>
                ) : null,
              )}
            </div>
          </Suspense>
          <LoadingBar progress={progress} />
          <div className="absolute bottom-3 left-3 z-10">
            {mode === 'overview' ? (
              <OverviewButtons commands={commands} />
            ) : (
              <WalkButtons commands={commands} eyeHeightMm={eyeHeightMm} onEyeHeight={setEyeHeightMm} />
            )}
          </div>
          {comparing && others.length > 1 && (
            <label className="absolute right-3 bottom-3 z-10 flex items-center gap-2 rounded-xl bg-white/95 px-3 py-2 text-sm font-semibold shadow-sm ring-1 ring-line-strong/70">
              Side by side with
              <select
                value={compared?.id}
                onChange={(e) => setHalves((h) => (h ? halvesShowing(h, option.id, e.target.value) : h))}
                className="rounded-md border border-line-strong bg-white px-2 py-1 font-normal"
              >
                {others.map((o) => (
                  <option key={o.id} value={o.id}>
                    {o.label}
                  </option>
                ))}
              </select>
            </label>
          )}
          {help && <KeyHelp mode={mode} optionCount={options.length} onClose={closeHelp} />}
        </div>
        <p className="text-sm text-ink-soft">
          {mode === 'overview' ? (
            <>Drag to turn the room · scroll or pinch to come closer · tap a piece to see what it is</>
          ) : (
            <>Click the picture, then walk with W A S D or the arrow keys · drag to look round · click the floor to walk there</>
          )}
          {options.length > 1 && <> · keys 1–{options.length} switch options</>}
          {comparing && <> · the two views move together</>}
        </p>
        <p className="text-sm text-ink-faint">{SAFETY_LINE}</p>
      </section>

      <aside
        className="flex shrink-0 flex-col gap-4 lg:w-[22rem] lg:overflow-y-auto lg:pb-2"
        aria-label="Options and your choice"
      >
        <section aria-labelledby="options-title" className="rounded-2xl border border-line bg-white p-5">
          <h2 id="options-title" className="font-bold">
            {options.length === 1 ? 'The option' : `${options.length} options for this room`}
          </h2>
          <div role="group" aria-label="Options" className="mt-3 flex flex-col gap-2">
            {options.map((o, i) => (
              <button
                key={o.id}
                type="button"
                aria-pressed={o.id === option.id}
                onClick={() => show(o.id)}
                className="flex items-center gap-3 rounded-xl border border-line px-3 py-2.5 text-left transition-colors hover:border-pine aria-pressed:border-pine aria-pressed:bg-pine-wash"
              >
                <kbd className="flex size-7 shrink-0 items-center justify-center rounded-md border border-line-strong bg-white font-sans text-sm font-semibold">
                  {i + 1}
                </kbd>
                <span className="min-w-0 flex-1">
                  <span className="block font-semibold">{o.label}</span>
                  {changedSinceSeen(o) && (
                    <span className="block text-sm font-medium text-ochre">Changed since you last saw it</span>
                  )}
                </span>
                {chosen?.id === o.id && (
                  <span className="shrink-0 rounded-full bg-pine px-2 py-0.5 text-xs font-semibold text-white">Your choice</span>
                )}
              </button>
            ))}
          </div>
          {option.note && <p className="mt-4 text-[15px] leading-relaxed whitespace-pre-wrap">{option.note}</p>}
        </section>

        <section aria-labelledby="pieces-title" className="rounded-2xl border border-line bg-white p-5">
          <h2 id="pieces-title" className="font-bold">
            {piecesHeading(comparing ? { label: option.label, side: pair[0] === option.id ? 'left' : 'right' } : null)}
          </h2>
          {piece ? (
            <div className="mt-3">
              <PieceCard piece={piece} showPrices={showPrices} money={money} onClose={() => setPieceId(null)} />
            </div>
          ) : (
            <p className="mt-1 text-sm text-ink-soft">Tap a piece in the picture, or a name below, to see its size and finish.</p>
          )}
          {option.pieces.length === 0 ? (
            <p className="mt-3 text-sm text-ink-soft">This option has no furniture yet.</p>
          ) : (
            <ul className="mt-3 flex flex-wrap gap-1.5">
              {option.pieces.map((p) => (
                <li key={p.id}>
                  <button
                    type="button"
                    aria-pressed={p.id === pieceId}
                    onClick={() => setPieceId(p.id === pieceId ? null : p.id)}
                    className="rounded-full border border-line px-3 py-1 text-sm hover:border-pine aria-pressed:border-pine aria-pressed:bg-pine-wash"
                  >
                    {pieceName(p)}
                  </button>
                </li>
              ))}
            </ul>
          )}
        </section>

        <section aria-labelledby="choice-title" className="rounded-2xl border border-line bg-white p-5">
          <h2 id="choice-title" className="font-bold">
            Your choice
          </h2>
          {chosen && room.choice ? (
            <div className="mt-1 text-[15px]">
              <p>
                <strong>{chosen.label}</strong>, chosen {momentText(room.choice.chosenAt)}.
              </p>
              {room.choice.comment && <p className="mt-1 text-ink-soft">“{room.choice.comment}”</p>}
            </div>
          ) : (
            <p className="mt-1 text-[15px] text-ink-soft">Not chosen yet. Look at each option, then choose the one you like.</p>
          )}
          {chosen && !isChosen && !decided && (
            <p className="mt-3 text-sm text-ink-soft">Choosing {option.label} replaces your choice.</p>
          )}
          {decided ? (
            <p className="mt-3 text-sm text-ink-soft">
              {studioName} has confirmed the choices. To change anything, get in touch with them.
            </p>
          ) : (
            <Button variant={isChosen ? 'secondary' : 'primary'} className="mt-4 w-full" onClick={() => setChoosing(true)}>
              {isChosen ? 'Change your comment' : chooseLabel(comparing ? option.label : null)}
            </Button>
          )}
        </section>
      </aside>

      {choosing && (
        <ChooseDialog
          token={token}
          room={room}
          option={option}
          studioName={studioName}
          nextRoom={nextRoom}
          onClose={() => setChoosing(false)}
          onGoTo={(id) => {
            setChoosing(false);
            onGoTo(id);
          }}
        />
      )}
    </div>
  );
}
