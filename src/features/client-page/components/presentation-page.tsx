// The client's presentation page behind the link: the welcome, then one room at a time.
import { useCallback, useEffect, useState } from 'react';
import type { ClientPresentation } from '../../../../shared/schemas/presentation';
import { Notice, Spinner } from '../../../components/ui/layout';
import { usePresentation } from '../api/presentation';
import { RefusedPage } from './refused-page';
import { RoomStage } from './room-stage';
import { WelcomeCard } from './welcome-card';
import { PAGE_FRAME, SAFETY_LINE } from './wording';

/** The client's page behind the link: welcome, then one room at a time. */
export function PresentationPage({ token }: { token: string }) {
  const presentation = usePresentation(token);
  if (presentation.isPending)
    return (
      <div className="flex min-h-screen items-center justify-center">
        <Spinner label="Opening your presentation…" />
      </div>
    );
  if (presentation.isError) return <RefusedPage error={presentation.error} onRetry={() => void presentation.refetch()} />;
  return <PresentationView token={token} presentation={presentation.data} />;
}

// The room on show lives in the address (#room-2), so Back returns to the welcome and a reload
// stays in the same room.
function useStep(roomIds: string[]): [string, (step: string) => void] {
  const read = useCallback(() => {
    const n = Number(/^#room-(\d+)$/.exec(window.location.hash)?.[1]);
    return roomIds[n - 1] ?? 'welcome';
  }, [roomIds]);
  const [step, setStepState] = useState(read);
  useEffect(() => {
    const onHash = () => setStepState(read());
    window.addEventListener('hashchange', onHash);
    return () => window.removeEventListener('hashchange', onHash);
  }, [read]);
  const setStep = useCallback(
    (next: string) => {
      const index = roomIds.indexOf(next);
      window.location.hash = index >= 0 ? `room-${index + 1}` : '';
      setStepState(index >= 0 ? next : 'welcome');
      window.scrollTo({ top: 0 });
    },
    [roomIds],
  );
  return [step, setStep];
}

function PresentationView({ token, presentation }: { token: string; presentation: ClientPresentation }) {
  const { rooms, studioName, projectName, decided } = presentation;
  const [roomIds] = useState(() => rooms.map((r) => r.id));
  const [step, setStep] = useStep(roomIds);
  const room = rooms.find((r) => r.id === step) ?? null;
  const chosenCount = rooms.filter((r) => r.choice).length;
  // After choosing, lead on to the next room still open, looking forward first.
  const nextRoom = room
    ? ([...rooms.slice(rooms.indexOf(room) + 1), ...rooms.slice(0, rooms.indexOf(room))].find((r) => !r.choice) ?? null)
    : null;

  useEffect(() => {
    document.title = `${projectName} · ${studioName}`;
  }, [projectName, studioName]);

  const tab = (current: boolean) =>
    `rounded-lg px-3 py-2 text-[15px] font-semibold transition-colors ${current ? 'bg-pine-wash text-pine-dark' : 'text-ink-soft hover:bg-sand hover:text-ink'}`;

  return (
    <div className="flex min-h-screen flex-col">
      <header className="border-b border-line bg-paper/95">
        <div className={`${PAGE_FRAME} flex flex-wrap items-center gap-x-6 gap-y-2 py-3`} data-testid="page-header-frame">
          <div className="min-w-0">
            <div className="text-sm font-semibold text-pine">{studioName}</div>
            <div className="truncate font-bold">{projectName}</div>
          </div>
          <nav aria-label="Rooms" className="flex flex-wrap items-center gap-1">
            <button
              type="button"
              className={tab(step === 'welcome')}
              aria-current={step === 'welcome' ? 'page' : undefined}
              onClick={() => setStep('welcome')}
            >
              Welcome
            </button>
            {rooms.map((r) => (
              <button
                key={r.id}
                type="button"
                className={tab(r.id === step)}
                aria-current={r.id === step ? 'page' : undefined}
                onClick={() => setStep(r.id)}
              >
                {r.name}
                {r.choice && (
                  <>
                    <span className="ml-1.5 text-pine" aria-hidden>
                      ✓
                    </span>
                    <span className="sr-only"> (chosen)</span>
                  </>
                )}
              </button>
            ))}
          </nav>
          <p className="ml-auto text-sm text-ink-soft" aria-live="polite">
            {chosenCount} of {rooms.length} room{rooms.length === 1 ? '' : 's'} chosen
          </p>
        </div>
      </header>
      <main className="flex-1">
        {decided && (
          <div className="mx-auto max-w-7xl px-6 pt-6">
            <Notice tone="ok">
              {studioName} has confirmed your choices. Thank you! To change anything now, get in touch with them.
            </Notice>
          </div>
        )}
        {room ? (
          <RoomStage
            key={room.id}
            token={token}
            room={room}
            studioName={studioName}
            showPrices={presentation.showPrices}
            money={presentation}
            decided={decided}
            nextRoom={nextRoom}
            onGoTo={setStep}
          />
        ) : (
          <WelcomeCard presentation={presentation} onOpenRoom={setStep} />
        )}
      </main>
      {/* The room view carries the same line right under the picture. */}
      {!room && (
        <footer className="mx-auto max-w-3xl px-6 pt-2 pb-8 text-center text-sm leading-relaxed text-ink-faint">
          {SAFETY_LINE}
        </footer>
      )}
    </div>
  );
}
