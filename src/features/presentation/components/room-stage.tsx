import { lazy, Suspense, useEffect, useRef, useState } from 'react';
import type { ClientRoom } from '../../../../shared/schemas/presentation';
import { Button } from '../../../components/ui/button';
import { markLookedAt } from '../api/presentation';
import { ChooseDialog } from './choose-dialog';
import { PieceCard } from './piece-card';
import { momentText, pieceName, SAFETY_LINE } from './wording';

// three.js is most of the page's weight: it loads after the page itself has appeared.
const RoomView = lazy(() => import('../../../scene/room-view'));

/** Typing in a field must not switch options. */
const isTyping = (target: EventTarget | null) =>
  target instanceof HTMLElement && (target.isContentEditable || ['INPUT', 'TEXTAREA', 'SELECT'].includes(target.tagName));

/** One room: the Overview in 3D, its options (one click or keys 1–9), the pieces, and the choice. */
export function RoomStage({ token, room, studioName, showPrices, decided, nextRoom, onGoTo }: {
  token: string;
  room: ClientRoom;
  studioName: string;
  showPrices: boolean;
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

  const show = (id: string) => {
    setOptionId(id);
    setPieceId(null);
  };

  // Each option counts once per visit as "looked at", however often the client flips back to it.
  const lookedAt = useRef(new Set<string>());
  useEffect(() => {
    if (lookedAt.current.has(option.id)) return;
    lookedAt.current.add(option.id);
    markLookedAt(token, option.id);
  }, [token, option.id]);

  const options = room.options;
  useEffect(() => {
    if (choosing) return;
    const onKey = (e: KeyboardEvent) => {
      if (e.altKey || e.ctrlKey || e.metaKey || isTyping(e.target)) return;
      const n = Number(e.key);
      if (Number.isInteger(n) && n >= 1 && n <= options.length) {
        e.preventDefault();
        setOptionId(options[n - 1].id);
        setPieceId(null);
      }
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [choosing, options]);

  const isChosen = chosen?.id === option.id;
  return (
    <div className="mx-auto grid max-w-7xl gap-6 px-6 py-6 lg:grid-cols-[minmax(0,1fr)_24rem]">
      <section aria-labelledby="room-title" className="flex min-w-0 flex-col gap-3">
        <div className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1">
          <h1 id="room-title" className="text-2xl font-bold tracking-tight">{room.name}</h1>
          <p className="text-sm text-ink-soft">Option {options.indexOf(option) + 1} of {options.length}</p>
        </div>
        <div className="relative h-[min(50vh,26rem)] min-h-72 overflow-hidden lg:h-[min(64vh,42rem)] rounded-2xl border border-line bg-sand">
          <Suspense fallback={<div className="flex h-full items-center justify-center text-ink-soft" role="status">Setting up the 3D view…</div>}>
            <RoomView
              shell={room.shell}
              pieces={option.pieces}
              selectedPieceId={pieceId}
              onPieceClick={setPieceId}
              label={`${room.name}, ${option.label}, in 3D`}
            />
          </Suspense>
          <div className="pointer-events-none absolute top-3 left-3 rounded-full bg-white/90 px-3 py-1 text-sm font-semibold shadow-sm">{option.label}</div>
        </div>
        <p className="text-sm text-ink-soft">
          Drag to turn the room · scroll or pinch to come closer · tap a piece to see what it is
          {options.length > 1 && <> · keys 1–{options.length} switch options</>}
        </p>
        <p className="text-sm text-ink-faint">{SAFETY_LINE}</p>
      </section>

      <aside className="flex flex-col gap-4" aria-label="Options and your choice">
        <section aria-labelledby="options-title" className="rounded-2xl border border-line bg-white p-5">
          <h2 id="options-title" className="font-bold">{options.length === 1 ? 'The option' : `${options.length} options for this room`}</h2>
          <div role="group" aria-label="Options" className="mt-3 flex flex-col gap-2">
            {options.map((o, i) => (
              <button
                key={o.id}
                type="button"
                aria-pressed={o.id === option.id}
                onClick={() => show(o.id)}
                className="flex items-center gap-3 rounded-xl border border-line px-3 py-2.5 text-left transition-colors hover:border-pine aria-pressed:border-pine aria-pressed:bg-pine-wash"
              >
                <kbd className="flex size-7 shrink-0 items-center justify-center rounded-md border border-line-strong bg-white font-sans text-sm font-semibold">{i + 1}</kbd>
                <span className="min-w-0 flex-1 font-semibold">{o.label}</span>
                {chosen?.id === o.id && <span className="shrink-0 rounded-full bg-pine px-2 py-0.5 text-xs font-semibold text-white">Your choice</span>}
              </button>
            ))}
          </div>
          {option.note && <p className="mt-4 text-[15px] leading-relaxed whitespace-pre-wrap">{option.note}</p>}
        </section>

        <section aria-labelledby="pieces-title" className="rounded-2xl border border-line bg-white p-5">
          <h2 id="pieces-title" className="font-bold">In this option</h2>
          {piece ? (
            <div className="mt-3"><PieceCard piece={piece} showPrices={showPrices} onClose={() => setPieceId(null)} /></div>
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
          <h2 id="choice-title" className="font-bold">Your choice</h2>
          {chosen && room.choice ? (
            <div className="mt-1 text-[15px]">
              <p><strong>{chosen.label}</strong>, chosen {momentText(room.choice.chosenAt)}.</p>
              {room.choice.comment && <p className="mt-1 text-ink-soft">“{room.choice.comment}”</p>}
            </div>
          ) : (
            <p className="mt-1 text-[15px] text-ink-soft">Not chosen yet. Look at each option, then choose the one you like.</p>
          )}
          {chosen && !isChosen && !decided && <p className="mt-3 text-sm text-ink-soft">Choosing {option.label} replaces your choice.</p>}
          {decided ? (
            <p className="mt-3 text-sm text-ink-soft">{studioName} has confirmed the choices. To change anything, get in touch with them.</p>
          ) : (
            <Button variant={isChosen ? 'secondary' : 'primary'} className="mt-4 w-full" onClick={() => setChoosing(true)}>
              {isChosen ? 'Change your comment' : 'Choose this option'}
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
