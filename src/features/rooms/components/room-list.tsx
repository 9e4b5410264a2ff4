// The project page's room list: one entry per room, the Add a room dialog (by measured walls),
// plan file import, and the ask-first room delete.
import { useRef, useState, type FormEvent } from 'react';
import { Link, useNavigate } from 'react-router';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { TextField } from '../../../components/ui/field';
import { LengthField } from '../../../components/ui/length-field';
import { EmptyState, Notice, Spinner } from '../../../components/ui/layout';
import { ApiError, errorMessage, fieldError } from '../../../lib/api';
import { apply, createEditorDoc, type Command } from '../../../../shared/commands';
import type { RoomShell } from '../../../../shared/schemas/room';
import type { LengthUnit } from '../../../../shared/units/length';
import { MeasureWalls, type MeasuredWall } from '../editor/outline-panel';
import { formatRelative } from '../../../lib/format';
import { useCanEdit } from '../../../lib/session';
import { useCreateRoom, useDeleteRoom, useImportPlan, useRoom, useRooms } from '../api/rooms';
import { optionLabel } from '../../../../shared/schemas/room-api';

/** The rooms of one project, with adding by size and importing a plan file. */
export function RoomList({ projectId }: { projectId: string }) {
  const rooms = useRooms(projectId);
  const canEdit = useCanEdit();
  const [adding, setAdding] = useState(false);
  const importPlan = useImportPlan(projectId);
  const fileInput = useRef<HTMLInputElement>(null);
  const navigate = useNavigate();
  const [badFile, setBadFile] = useState<string | null>(null);
  const [deleting, setDeleting] = useState<{ id: string; name: string } | null>(null);

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
      <Button size="sm" onClick={() => fileInput.current?.click()} busy={importPlan.isPending}>
        Import plan file
      </Button>
      <Button size="sm" variant="primary" onClick={() => setAdding(true)}>
        Add room
      </Button>
      <input
        ref={fileInput}
        type="file"
        accept="application/json,.json"
        className="hidden"
        aria-label="Plan file to import"
        onChange={(e) => {
          void onFile(e.target.files?.[0]);
          e.target.value = '';
        }}
      />
    </div>
  );

  return (
    <div>
      <div className="mb-4 flex flex-wrap items-center justify-between gap-3">
        <p className="text-sm text-ink-soft">Each room holds its measured shell and the options you prepare for it.</p>
        {actions}
      </div>
      {importPlan.isError && (
        <div className="mb-4">
          <Notice tone="error">{errorMessage(importPlan.error)}</Notice>
        </div>
      )}
      {badFile && (
        <div className="mb-4">
          <Notice tone="error">{badFile}</Notice>
        </div>
      )}
      {rooms.isPending ? (
        <Spinner />
      ) : rooms.isError ? (
        <Notice tone="error">{errorMessage(rooms.error)}</Notice>
      ) : rooms.data.rooms.length === 0 ? (
        <EmptyState title="No rooms yet.">Add a room from its measurements, or import a plan file.</EmptyState>
      ) : (
        <ul className="grid gap-3 sm:grid-cols-2">
          {rooms.data.rooms.map((r) => (
            <li key={r.id} className="relative">
              <Link
                to={`/projects/${projectId}/rooms/${r.id}`}
                className="block rounded-xl border border-line p-4 pr-24 transition-colors hover:border-pine hover:bg-pine-wash/40"
              >
                <div className="font-semibold">{r.name}</div>
                <div className="mt-1 text-sm text-ink-soft">
                  {r.floorAreaM2.toFixed(1)} m² · {r.optionCount} option{r.optionCount === 1 ? '' : 's'} · changed{' '}
                  {formatRelative(r.updatedAt)}
                </div>
              </Link>
              {canEdit && (
                <Button
                  size="sm"
                  variant="quiet"
                  className="absolute top-3 right-3"
                  aria-label={`Delete ${r.name}`}
                  onClick={() => setDeleting({ id: r.id, name: r.name })}
                >
                  Delete
                </Button>
              )}
            </li>
          ))}
        </ul>
      )}
      {deleting && <DeleteRoomDialog roomId={deleting.id} name={deleting.name} onClose={() => setDeleting(null)} />}
      {adding && (
        <AddRoomDialog
          projectId={projectId}
          onClose={() => setAdding(false)}
          onImport={() => {
            setAdding(false);
            fileInput.current?.click();
          }}
        />
      )}
    </div>
  );
}

/** Asks before a room goes, naming the options that go with it; a refusal (a presentation still shows it) is shown as the server words it. */
function DeleteRoomDialog({ roomId, name, onClose }: { roomId: string; name: string; onClose: () => void }) {
  const detail = useRoom(roomId);
  const remove = useDeleteRoom(roomId);
  const options = detail.data?.options.map((o) => optionLabel(o.position, o.name)) ?? [];
  return (
    <Dialog
      open
      onClose={onClose}
      title={`Delete ${name}?`}
      footer={
        <>
          <Button variant="quiet" onClick={onClose}>
            Keep it
          </Button>
          <Button
            variant="danger"
            busy={remove.isPending}
            disabled={detail.isPending}
            onClick={() => remove.mutate(undefined, { onSuccess: onClose })}
          >
            Delete room
          </Button>
        </>
      }
    >
      {detail.isPending ? (
        <Spinner />
      ) : (
        <p className="text-ink-soft">
          Its walls, openings and {options.length === 1 ? 'its one option' : `all ${options.length} options`} go with it:{' '}
          <strong className="text-ink">{options.join(', ')}</strong>. This cannot be undone.
        </p>
      )}
      {remove.isError && (
        <div className="mt-4">
          <Notice tone="error">{errorMessage(remove.error)}</Notice>
        </div>
      )}
    </Dialog>
  );
}

type AddWay = 'rectangle' | 'walls' | 'file';
const WAYS: { id: AddWay; label: string }[] = [
  { id: 'rectangle', label: 'A rectangle' },
  { id: 'walls', label: 'Type the walls' },
  { id: 'file', label: 'A plan file' },
];
/** The outline a typed walk is checked against until it replaces it (any sound shell would do). */
const PLACEHOLDER_OUTLINE: [number, number][] = [
  [0, 0],
  [1000, 0],
  [1000, 1000],
  [0, 1000],
];

function AddRoomDialog({ projectId, onClose, onImport }: { projectId: string; onClose: () => void; onImport: () => void }) {
  const create = useCreateRoom(projectId);
  const navigate = useNavigate();
  const [way, setWay] = useState<AddWay>('rectangle');
  const [name, setName] = useState('');
  const [widthMm, setWidth] = useState<number | null>(4000);
  const [lengthMm, setLength] = useState<number | null>(3500);
  const [heightMm, setHeight] = useState<number | null>(2600);
  const [walls, setWalls] = useState<MeasuredWall[]>([]);
  const [tried, setTried] = useState(false);
  const [wallsError, setWallsError] = useState<string | null>(null);
  const unit = (localStorage.getItem('parlour:length-unit') as LengthUnit | null) ?? 'cm';

  const createWith = (outline: RoomShell['outline']) => {
    if (!heightMm) {
      setTried(true);
      return;
    }
    create.mutate(
      { name, shell: { outline, wallHeight: heightMm } },
      { onSuccess: ({ room }) => navigate(`/projects/${projectId}/rooms/${room.id}`) },
    );
  };
  const submit = (e: FormEvent) => {
    e.preventDefault();
    setTried(true);
    if (way !== 'rectangle' || !widthMm || !lengthMm || !heightMm) return;
    createWith([
      [0, 0],
      [widthMm, 0],
      [widthMm, lengthMm],
      [0, lengthMm],
    ]);
  };
  const useWalls = (command: Command) => {
    const result = apply(createEditorDoc({ outline: PLACEHOLDER_OUTLINE }), command);
    if (!result.ok) {
      setWallsError(result.message);
      return;
    }
    setWallsError(null);
    createWith(result.doc.shell.outline);
  };
  const err = create.error;
  const needed = (v: number | null, what: string) => (tried && v === null ? `Type the ${what}, e.g. 420 or 4.2m.` : undefined);
  const serverField = err instanceof ApiError ? Object.keys(err.fields).length > 0 : false;
  return (
    <Dialog open onClose={onClose} title="Add a room">
      <form onSubmit={submit} className="flex flex-col gap-4" noValidate>
        <TextField
          label="Room name"
          value={name}
          onChange={(e) => setName(e.target.value)}
          error={fieldError(err, 'name')}
          placeholder="e.g. Living room"
          autoFocus
        />
        <fieldset>
          <legend className="mb-1.5 text-sm font-semibold">Start from</legend>
          <div className="flex flex-wrap gap-2" role="radiogroup">
            {WAYS.map((w) => (
              <label
                key={w.id}
                className={`cursor-pointer rounded-lg border px-3 py-2 text-sm font-semibold ${way === w.id ? 'border-pine bg-pine-wash text-pine-dark' : 'border-line-strong bg-white'}`}
              >
                <input type="radio" name="add-way" className="sr-only" checked={way === w.id} onChange={() => setWay(w.id)} />
                {w.label}
              </label>
            ))}
          </div>
        </fieldset>
        {way !== 'file' && (
          <LengthField
            label="Ceiling height"
            unit={unit}
            valueMm={heightMm}
            onChange={setHeight}
            error={fieldError(err, 'shell.wallHeight') ?? needed(heightMm, 'ceiling height')}
          />
        )}
        {way === 'rectangle' && (
          <>
            <p className="text-sm text-ink-soft">The overall size; you can shape the outline wall by wall in the room editor.</p>
            <div className="grid gap-4 sm:grid-cols-2">
              <LengthField label="Width" unit={unit} valueMm={widthMm} onChange={setWidth} error={needed(widthMm, 'width')} />
              <LengthField
                label="Length"
                unit={unit}
                valueMm={lengthMm}
                onChange={setLength}
                error={needed(lengthMm, 'length')}
              />
            </div>
          </>
        )}
        {way === 'walls' && (
          <MeasureWalls
            walls={walls}
            unit={unit}
            onChange={setWalls}
            onCancel={() => setWay('rectangle')}
            onUse={useWalls}
            autoFocus={false}
          />
        )}
        {way === 'file' && (
          <div className="flex flex-col gap-2">
            <p className="text-sm text-ink-soft">
              A plan file holds one room with one option (a .json file downloaded from Parlour or written by hand; see the
              README). Its name and ceiling come from the file.
            </p>
            <div>
              <Button onClick={onImport}>Choose a plan file…</Button>
            </div>
          </div>
        )}
        {wallsError && <Notice tone="error">{wallsError}</Notice>}
        {err && !serverField && <Notice tone="error">{errorMessage(err)}</Notice>}
        <div className="flex justify-end gap-2">
          <Button variant="quiet" onClick={onClose}>
            Cancel
          </Button>
          {way === 'rectangle' && (
            <Button type="submit" variant="primary" busy={create.isPending}>
              Add room
            </Button>
          )}
        </div>
      </form>
    </Dialog>
  );
}
