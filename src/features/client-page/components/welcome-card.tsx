// The presentation's welcome card: who it is from, the designer's message, and what to do next.
import type { ClientPresentation, ClientRoom } from '../../../../shared/schemas/presentation';
import { Button } from '../../../components/ui/button';
import { changedSinceSeen } from './seen-versions';
import { dayText } from './wording';

const chosenLabel = (room: ClientRoom) => room.options.find((o) => o.id === room.choice?.optionId)?.label;

/** The first thing the client sees: who it is from, the designer's message, and what to do. */
export function WelcomeCard({
  presentation,
  onOpenRoom,
}: {
  presentation: ClientPresentation;
  onOpenRoom: (roomId: string) => void;
}) {
  const { studioName, projectName, message, rooms, expiresAt, decided } = presentation;
  const next = rooms.find((r) => !r.choice) ?? rooms[0];
  const steps = [
    {
      title: 'Look round',
      text: 'Each room is shown as a small model. Drag to turn it; scroll or pinch to come closer. Choose Walk to stand in the room and walk through it.',
    },
    {
      title: 'Compare',
      text: 'Switch between the options with the buttons beside the model or the number keys, or press Compare to see two side by side. Tap a piece to see what it is.',
    },
    {
      title: 'Choose',
      text: `Press “Choose this option” for the one you like. You can change your mind until ${studioName} confirms.`,
    },
  ];
  return (
    <section aria-labelledby="welcome-title" className="mx-auto max-w-3xl px-6 py-10">
      <div className="rounded-2xl border border-line bg-white p-8">
        <p className="text-sm font-semibold text-pine">From {studioName}</p>
        <h1 id="welcome-title" className="mt-1 text-3xl leading-tight font-bold tracking-tight">
          Your options for {projectName}
        </h1>
        {message && (
          <blockquote className="mt-6 max-h-60 overflow-y-auto rounded-xl bg-paper px-5 py-4 text-[17px] leading-relaxed whitespace-pre-wrap">
            {message}
          </blockquote>
        )}

        <div className="mt-6 flex flex-wrap items-center justify-between gap-4">
          <Button variant="primary" onClick={() => onOpenRoom(next.id)}>
            {decided || rooms.every((r) => r.choice)
              ? 'See your choices'
              : rooms.some((r) => r.choice)
                ? `Carry on: ${next.name}`
                : 'Start looking'}
          </Button>
          <p className="text-sm text-ink-faint">This link works until {dayText(expiresAt)}.</p>
        </div>
        <h2 className="mt-8 text-lg font-bold">How this works</h2>
        <ol className="mt-3 grid gap-3 sm:grid-cols-3">
          {steps.map((s, i) => (
            <li key={s.title} className="rounded-xl border border-line p-4">
              <div className="flex items-center gap-2 font-semibold">
                <span
                  className="flex size-7 items-center justify-center rounded-full bg-pine-wash text-sm text-pine-dark"
                  aria-hidden
                >
                  {i + 1}
                </span>
                {s.title}
              </div>
              <p className="mt-2 text-sm leading-relaxed text-ink-soft">{s.text}</p>
            </li>
          ))}
        </ol>

        <h2 className="mt-8 text-lg font-bold">{rooms.length === 1 ? 'The room' : `The ${rooms.length} rooms`}</h2>
        <ul className="mt-3 flex flex-col divide-y divide-line rounded-xl border border-line">
          {rooms.map((room) => (
            <li key={room.id} className="flex flex-wrap items-center justify-between gap-3 px-4 py-3">
              <div className="min-w-0">
                <div className="font-semibold">{room.name}</div>
                <div className="text-sm text-ink-soft">
                  {room.options.length} option{room.options.length === 1 ? '' : 's'} ·{' '}
                  {room.choice ? (
                    <span className="font-semibold text-pine-dark">You chose {chosenLabel(room)}</span>
                  ) : (
                    'not chosen yet'
                  )}
                </div>
                {room.options.some(changedSinceSeen) && (
                  <div className="text-sm font-medium text-ochre">
                    Changed since you last saw it:{' '}
                    {room.options
                      .filter(changedSinceSeen)
                      .map((o) => o.label)
                      .join(', ')}
                  </div>
                )}
              </div>
              <Button size="sm" onClick={() => onOpenRoom(room.id)}>
                Look at this room
              </Button>
            </li>
          ))}
        </ul>
      </div>
    </section>
  );
}
