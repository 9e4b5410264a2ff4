import { useEffect, useState, type FormEvent } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import type { RoomRecord } from '../../../../shared/schemas/room-api';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { LengthField } from '../../../components/ui/length-field';
import { Notice } from '../../../components/ui/layout';
import { ApiError, errorMessage, fieldError } from '../../../lib/api';
import { roomKeys, useSaveRoom, type RoomDetail } from '../api/rooms';

interface Draft { name: string; wallHeight: number | null; wallThickness: number | null }

const draftOf = (room: RoomRecord): Draft => ({ name: room.name, wallHeight: room.shell.wallHeight, wallThickness: room.shell.wallThickness });

/** Name, ceiling height and wall thickness of a room, saved with the version check. */
export function RoomSettings({ room, readOnly }: { room: RoomRecord; readOnly: boolean }) {
  const save = useSaveRoom(room.id);
  const qc = useQueryClient();
  const [draft, setDraft] = useState<Draft>(() => draftOf(room));
  const [conflict, setConflict] = useState<RoomRecord | null>(null);
  const [saved, setSaved] = useState(false);
  useEffect(() => {
    if (!conflict) setDraft(draftOf(room));
  }, [room, conflict]);

  const dirty = draft.name !== room.name || draft.wallHeight !== room.shell.wallHeight || draft.wallThickness !== room.shell.wallThickness;

  const send = (version: number, base: RoomRecord, values: Draft = draft) => {
    if (!values.wallHeight || !values.wallThickness) return;
    setSaved(false);
    save.mutate(
      { version, name: values.name, shell: { ...base.shell, wallHeight: values.wallHeight, wallThickness: values.wallThickness } },
      {
        onSuccess: ({ room: savedRoom }) => {
          setConflict(null);
          setDraft(draftOf(savedRoom));
          setSaved(true);
        },
        onError: (err) => {
          if (err instanceof ApiError && err.status === 409) setConflict((err.body as { current: RoomRecord }).current);
        },
      },
    );
  };
  const submit = (e: FormEvent) => {
    e.preventDefault();
    send(room.version, room);
  };
  // Keep mine: the fields this tab changed go on top of theirs, so neither person's change is lost.
  const keepMine = () => {
    if (!conflict) return;
    const mine = draftOf(room);
    const theirs = draftOf(conflict);
    const merged = (Object.keys(theirs) as (keyof Draft)[]).reduce<Draft>(
      (acc, k) => ({ ...acc, [k]: draft[k] !== mine[k] ? draft[k] : theirs[k] }),
      theirs,
    );
    setDraft(merged);
    send(conflict.version, conflict, merged);
  };
  const loadTheirs = () => {
    if (!conflict) return;
    qc.setQueryData<RoomDetail>(roomKeys.detail(room.id), (d) => (d ? { ...d, room: conflict } : d));
    setDraft(draftOf(conflict));
    setConflict(null);
    save.reset();
  };

  const err = save.error;
  return (
    <form onSubmit={submit} className="flex flex-col gap-4" noValidate>
      {conflict && (
        <Notice tone="warn">
          <p>Someone saved this room after you opened it (they set the ceiling to {conflict.shell.wallHeight / 10} cm and named it “{conflict.name}”). Your changes are still here.</p>
          <div className="mt-3 flex gap-2">
            <Button size="sm" onClick={loadTheirs}>Load theirs</Button>
            <Button size="sm" variant="primary" onClick={keepMine}>Keep mine</Button>
          </div>
        </Notice>
      )}
      <TextField label="Room name" value={draft.name} disabled={readOnly} onChange={(e) => setDraft({ ...draft, name: e.target.value })} error={fieldError(err, 'name')} />
      <div className="grid grid-cols-2 gap-3">
        <LengthField label="Ceiling height" valueMm={draft.wallHeight} onChange={(v) => setDraft({ ...draft, wallHeight: v })} error={fieldError(err, 'shell.wallHeight')} />
        <LengthField label="Wall thickness" valueMm={draft.wallThickness} onChange={(v) => setDraft({ ...draft, wallThickness: v })} error={fieldError(err, 'shell.wallThickness')} />
      </div>
      {err && !(err instanceof ApiError && err.status === 409) && Object.keys((err as ApiError).fields ?? {}).length === 0 && <Notice tone="error">{errorMessage(err)}</Notice>}
      {!readOnly && (
        <div className="flex items-center gap-3">
          <Button type="submit" variant="primary" size="sm" disabled={!dirty || !!conflict} busy={save.isPending}>Save room</Button>
          {saved && !dirty && <span className="text-sm text-pine-dark" role="status">Saved</span>}
        </div>
      )}
    </form>
  );
}
