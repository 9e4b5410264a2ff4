// The new presentation dialog: pick rooms and options and their order, write a message, choose
// whether prices show and when the link expires.
import { useState, type FormEvent } from 'react';
import { DEFAULT_EXPIRY_DAYS, MAX_OPTIONS_PER_ROOM, type CreatePresentationBody } from '../../../../shared/schemas/presentation';
import { optionLabel } from '../../../../shared/schemas/room-api';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { SelectField, TextAreaField } from '../../../components/ui/field';
import { Notice, Spinner } from '../../../components/ui/layout';
import { errorMessage } from '../../../lib/api';
import { usePresentationPicker, type PickerRoom } from '../api/presentations';

const EXPIRY_CHOICES = [7, 14, DEFAULT_EXPIRY_DAYS, 60, 90];

interface Pick {
  id: string;
  name: string;
  included: boolean;
  options: { id: string; label: string; included: boolean }[];
}

const initialPicks = (rooms: PickerRoom[]): Pick[] =>
  rooms.map((r) => ({
    id: r.id,
    name: r.name,
    included: r.options.length > 0,
    options: r.options.map((o, i) => ({ id: o.id, label: optionLabel(o.position, o.name), included: i < MAX_OPTIONS_PER_ROOM })),
  }));

function move<T>(list: T[], from: number, by: -1 | 1): T[] {
  const to = from + by;
  if (to < 0 || to >= list.length) return list;
  const next = [...list];
  [next[from], next[to]] = [next[to], next[from]];
  return next;
}

/** Pick rooms and options (and their order), write a message, choose prices and expiry. */
export function NewPresentationDialog({
  projectId,
  clientEmail,
  busy,
  error,
  onClose,
  onCreate,
}: {
  projectId: string;
  clientEmail: string | null;
  busy: boolean;
  error: unknown;
  onClose: () => void;
  onCreate: (body: CreatePresentationBody, send: boolean) => void;
}) {
  const picker = usePresentationPicker(projectId);
  return (
    <Dialog open onClose={onClose} title="New presentation">
      {picker.isPending ? (
        <Spinner label="Loading rooms…" />
      ) : picker.isError ? (
        <Notice tone="error">{errorMessage(picker.error)}</Notice>
      ) : (
        <PresentationForm
          rooms={picker.data}
          clientEmail={clientEmail}
          busy={busy}
          error={error}
          onClose={onClose}
          onCreate={onCreate}
        />
      )}
    </Dialog>
  );
}

function PresentationForm({
  rooms,
  clientEmail,
  busy,
  error,
  onClose,
  onCreate,
}: {
  rooms: PickerRoom[];
  clientEmail: string | null;
  busy: boolean;
  error: unknown;
  onClose: () => void;
  onCreate: (body: CreatePresentationBody, send: boolean) => void;
}) {
  const [picks, setPicks] = useState(() => initialPicks(rooms));
  const [message, setMessage] = useState('');
  const [showPrices, setShowPrices] = useState(false);
  const [days, setDays] = useState(DEFAULT_EXPIRY_DAYS);
  const [problem, setProblem] = useState<string | null>(null);
  const [sendMail, setSendMail] = useState(Boolean(clientEmail));

  const update = (roomIndex: number, change: (p: Pick) => Pick) =>
    setPicks((all) => all.map((p, i) => (i === roomIndex ? change(p) : p)));

  const submit = (e: FormEvent) => {
    e.preventDefault();
    const chosen = picks
      .filter((p) => p.included)
      .map((p) => ({ roomId: p.id, optionIds: p.options.filter((o) => o.included).map((o) => o.id) }));
    if (chosen.length === 0) return setProblem('Pick at least one room.');
    const empty = picks.find((p) => p.included && !p.options.some((o) => o.included));
    if (empty) return setProblem(`Pick at least one option for ${empty.name}, or leave the room out.`);
    const crowded = picks.find((p) => p.included && p.options.filter((o) => o.included).length > MAX_OPTIONS_PER_ROOM);
    if (crowded) return setProblem(`Show at most ${MAX_OPTIONS_PER_ROOM} options for ${crowded.name}.`);
    setProblem(null);
    onCreate({ rooms: chosen, message, showPrices, expiresInDays: days }, sendMail && Boolean(clientEmail));
  };

  if (rooms.length === 0) {
    return (
      <div className="flex flex-col gap-4">
        <Notice tone="info">This project has no rooms yet. Add a room and its options first.</Notice>
        <div className="flex justify-end">
          <Button onClick={onClose}>Close</Button>
        </div>
      </div>
    );
  }

  const arrow = 'size-7 rounded-md text-ink-soft hover:bg-sand disabled:opacity-30';
  return (
    <form onSubmit={submit} className="flex flex-col gap-5" noValidate>
      <fieldset>
        <legend className="text-sm font-semibold">Rooms and options, in the order the client sees them</legend>
        <ul className="mt-2 flex flex-col gap-2">
          {picks.map((room, ri) => (
            <li key={room.id} className="rounded-xl border border-line p-3">
              <div className="flex items-center gap-2">
                <label className="flex min-w-0 flex-1 items-center gap-2 font-semibold">
                  <input
                    type="checkbox"
                    className="size-4 accent-pine"
                    checked={room.included}
                    disabled={room.options.length === 0}
                    onChange={(e) => update(ri, (p) => ({ ...p, included: e.target.checked }))}
                  />
                  <span className="truncate">{room.name}</span>
                </label>
                <button
                  type="button"
                  className={arrow}
                  aria-label={`Move ${room.name} up`}
                  disabled={ri === 0}
                  onClick={() => setPicks((all) => move(all, ri, -1))}
                >
                  ↑
                </button>
                <button
                  type="button"
                  className={arrow}
                  aria-label={`Move ${room.name} down`}
                  disabled={ri === picks.length - 1}
                  onClick={() => setPicks((all) => move(all, ri, 1))}
                >
                  ↓
                </button>
              </div>
              {room.included && (
                <ul className="mt-2 flex flex-col gap-1 pl-6">
                  {room.options.map((o, oi) => (
                    <li key={o.id} className="flex items-center gap-2">
                      <label className="flex min-w-0 flex-1 items-center gap-2 text-[15px]">
                        <input
                          type="checkbox"
                          className="size-4 accent-pine"
                          checked={o.included}
                          onChange={(e) =>
                            update(ri, (p) => ({
                              ...p,
                              options: p.options.map((x) => (x.id === o.id ? { ...x, included: e.target.checked } : x)),
                            }))
                          }
                          aria-label={`Show ${o.label} of ${room.name}`}
                        />
                        <span className="truncate">{o.label}</span>
                      </label>
                      <button
                        type="button"
                        className={arrow}
                        aria-label={`Move ${o.label} up`}
                        disabled={oi === 0}
                        onClick={() => update(ri, (p) => ({ ...p, options: move(p.options, oi, -1) }))}
                      >
                        ↑
                      </button>
                      <button
                        type="button"
                        className={arrow}
                        aria-label={`Move ${o.label} down`}
                        disabled={oi === room.options.length - 1}
                        onClick={() => update(ri, (p) => ({ ...p, options: move(p.options, oi, 1) }))}
                      >
                        ↓
                      </button>
                    </li>
                  ))}
                </ul>
              )}
            </li>
          ))}
        </ul>
        <p className="mt-2 text-sm text-ink-faint">The client sees the options of each room lettered A, B, C… in this order.</p>
      </fieldset>

      <TextAreaField
        label="Message to the client"
        value={message}
        onChange={(e) => setMessage(e.target.value)}
        placeholder="A few words on what to look at and when you would like to hear back."
        maxLength={4000}
      />

      <div className="grid gap-4 sm:grid-cols-2">
        <SelectField label="Link works for" value={days} onChange={(e) => setDays(Number(e.target.value))}>
          {EXPIRY_CHOICES.map((d) => (
            <option key={d} value={d}>
              {d} days
            </option>
          ))}
        </SelectField>
        <label className="flex items-center gap-2 self-end pb-2 text-[15px]">
          <input
            type="checkbox"
            className="size-4 accent-pine"
            checked={showPrices}
            onChange={(e) => setShowPrices(e.target.checked)}
          />
          Show prices to the client
        </label>
      </div>

      <label className="flex items-center gap-2 text-[15px]">
        <input
          type="checkbox"
          className="size-4 accent-pine"
          checked={sendMail}
          disabled={!clientEmail}
          onChange={(e) => setSendMail(e.target.checked)}
        />
        {clientEmail ? (
          <>E-mail the link to {clientEmail}</>
        ) : (
          <span className="text-ink-faint">The client has no e-mail address: copy the link once it is made.</span>
        )}
      </label>

      {(problem || error != null) && <Notice tone="error">{problem ?? errorMessage(error)}</Notice>}
      <div className="flex justify-end gap-2">
        <Button variant="quiet" onClick={onClose}>
          Cancel
        </Button>
        <Button type="submit" variant="primary" busy={busy}>
          {sendMail && clientEmail ? 'Create and send' : 'Create link'}
        </Button>
      </div>
    </form>
  );
}
