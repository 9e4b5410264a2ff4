import { useRef, useState, type FormEvent } from 'react';
import { Link, useNavigate } from 'react-router';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { TextField } from '../../../components/ui/field';
import { LengthField } from '../../../components/ui/length-field';
import { EmptyState, Notice, Spinner } from '../../../components/ui/layout';
import { errorMessage, fieldError } from '../../../lib/api';
import { formatRelative } from '../../../lib/format';
import { useCanEdit } from '../../../lib/session';
import { useCreateRoom, useImportPlan, useRooms } from '../api/rooms';

/** The rooms of one project, with adding by size and importing a plan file. */
export function RoomList({ projectId }: { projectId: string }) {
  const rooms = useRooms(projectId);
  const canEdit = useCanEdit();
  const [adding, setAdding] = useState(false);
  const importPlan = useImportPlan(projectId);
  const fileInput = useRef<HTMLInputElement>(null);
  const navigate = useNavigate();
  const [badFile, setBadFile] = useState<string | null>(null);

  const onFile = async (file: File | undefined) => {
    if (!file) return;
    let plan: unknown;
    try {
      plan = JSON.parse(await file.text());
    } catch {
      importPlan.reset();
      setBadFile(`“${file.name}” is not a plan file (it is not JSON).`);
      return;
    }
    setBadFile(null);
    importPlan.mutate(plan, { onSuccess: ({ room }) => navigate(`/projects/${projectId}/rooms/${room.id}`) });
  };

  const actions = canEdit && (
    <div className="flex gap-2">
      <Button size="sm" onClick={() => fileInput.current?.click()} busy={importPlan.isPending}>Import plan file</Button>
      <Button size="sm" variant="primary" onClick={() => setAdding(true)}>Add room</Button>
      <input ref={fileInput} type="file" accept="application/json,.json" className="hidden" aria-label="Plan file to import" onChange={(e) => { void onFile(e.target.files?.[0]); e.target.value = ''; }} />
    </div>
  );

  return (
    <div>
      <div className="mb-4 flex flex-wrap items-center justify-between gap-3">
        <p className="text-sm text-ink-soft">Each room holds its measured shell and the options you prepare for it.</p>
        {actions}
      </div>
      {importPlan.isError && <div className="mb-4"><Notice tone="error">{errorMessage(importPlan.error)}</Notice></div>}
      {badFile && <div className="mb-4"><Notice tone="error">{badFile}</Notice></div>}
      {rooms.isPending ? <Spinner /> : rooms.isError ? <Notice tone="error">{errorMessage(rooms.error)}</Notice> : rooms.data.rooms.length === 0 ? (
        <EmptyState title="No rooms yet.">Add a room from its measurements, or import a plan file.</EmptyState>
      ) : (
        <ul className="grid gap-3 sm:grid-cols-2">
          {rooms.data.rooms.map((r) => (
            <li key={r.id}>
              <Link to={`/projects/${projectId}/rooms/${r.id}`} className="block rounded-xl border border-line p-4 transition-colors hover:border-pine hover:bg-pine-wash/40">
                <div className="font-semibold">{r.name}</div>
                <div className="mt-1 text-sm text-ink-soft">
                  {r.floorAreaM2.toFixed(1)} m² · {r.optionCount} option{r.optionCount === 1 ? '' : 's'} · changed {formatRelative(r.updatedAt)}
                </div>
              </Link>
            </li>
          ))}
        </ul>
      )}
      {adding && <AddRoomDialog projectId={projectId} onClose={() => setAdding(false)} />}
    </div>
  );
}

function AddRoomDialog({ projectId, onClose }: { projectId: string; onClose: () => void }) {
  const create = useCreateRoom(projectId);
  const navigate = useNavigate();
  const [name, setName] = useState('');
  const [widthMm, setWidth] = useState<number | null>(4000);
  const [lengthMm, setLength] = useState<number | null>(3500);
  const [heightMm, setHeight] = useState<number | null>(2600);
  const [missing, setMissing] = useState<string | null>(null);

  const submit = (e: FormEvent) => {
    e.preventDefault();
    if (!widthMm || !lengthMm || !heightMm) {
      setMissing('Type the width, length and ceiling height, e.g. 420 or 4.2m.');
      return;
    }
    setMissing(null);
    const outline: [number, number][] = [[0, 0], [widthMm, 0], [widthMm, lengthMm], [0, lengthMm]];
    create.mutate(
      { name, shell: { outline, wallHeight: heightMm } },
      { onSuccess: ({ room }) => navigate(`/projects/${projectId}/rooms/${room.id}`) },
    );
  };
  const err = create.error;
  return (
    <Dialog open onClose={onClose} title="Add a room">
      <form onSubmit={submit} className="flex flex-col gap-4" noValidate>
        <TextField label="Room name" value={name} onChange={(e) => setName(e.target.value)} error={fieldError(err, 'name')} placeholder="e.g. Living room" autoFocus />
        <p className="text-sm text-ink-soft">Start from the overall size; you can shape the outline wall by wall in the room editor.</p>
        <div className="grid gap-4 sm:grid-cols-3">
          <LengthField label="Width" valueMm={widthMm} onChange={setWidth} />
          <LengthField label="Length" valueMm={lengthMm} onChange={setLength} />
          <LengthField label="Ceiling height" valueMm={heightMm} onChange={setHeight} error={fieldError(err, 'shell.wallHeight')} />
        </div>
        {missing && <Notice tone="error">{missing}</Notice>}
        {err && !fieldError(err, 'name') && <Notice tone="error">{errorMessage(err)}</Notice>}
        <div className="flex justify-end gap-2">
          <Button variant="quiet" onClick={onClose}>Cancel</Button>
          <Button type="submit" variant="primary" busy={create.isPending}>Add room</Button>
        </div>
      </form>
    </Dialog>
  );
}
