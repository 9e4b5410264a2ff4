import { lazy, Suspense, useState } from 'react';
import { Link } from 'react-router';
import { optionLabel } from '../../../../shared/schemas/room-api';
import { Card, Notice, Spinner } from '../../../components/ui/layout';
import { errorMessage } from '../../../lib/api';
import { useCanEdit } from '../../../lib/session';
import { useRoom } from '../api/rooms';
import { RoomSettings } from './room-settings';
import { TakeoffTable } from './takeoff-table';

// three.js and the scene live in their own chunk, loaded only where a room is shown.
const RoomView = lazy(() => import('../../../scene/room-view'));

export function RoomPage({ projectId, roomId }: { projectId: string; roomId: string }) {
  const room = useRoom(roomId);
  const canEdit = useCanEdit();
  const [optionId, setOptionId] = useState<string | null>(null);

  if (room.isPending) return <div className="px-6"><Spinner label="Loading room…" /></div>;
  if (room.isError) {
    return (
      <div className="mx-auto flex max-w-6xl flex-col gap-4 px-6 py-10">
        <Notice tone="error">{errorMessage(room.error)}</Notice>
        <Link to={`/projects/${projectId}`} className="font-semibold text-pine">Back to the project</Link>
      </div>
    );
  }
  const { room: r, options } = room.data;
  const option = options.find((o) => o.id === optionId) ?? options[0];

  return (
    <div className="flex h-[calc(100vh-4rem)] min-h-[560px] flex-col">
      <div className="flex flex-wrap items-center gap-4 border-b border-line px-6 py-3">
        <div className="min-w-0">
          <Link to={`/projects/${projectId}`} className="text-sm text-ink-faint hover:text-ink hover:underline">Back to the project</Link>
          <h1 className="truncate text-xl font-bold">{r.name}</h1>
        </div>
        <div role="tablist" aria-label="Options" className="ml-4 flex flex-wrap gap-1">
          {options.map((o) => (
            <button
              key={o.id}
              role="tab"
              aria-selected={o.id === option?.id}
              onClick={() => setOptionId(o.id)}
              className="rounded-lg px-3 py-1.5 text-sm font-semibold text-ink-soft hover:bg-sand aria-selected:bg-pine aria-selected:text-white"
            >
              {optionLabel(o.position, o.name)}
            </button>
          ))}
        </div>
        {option && (
          <a className="ml-auto text-sm font-semibold text-pine hover:underline" href={`/api/rooms/${r.id}/plan-file?optionId=${option.id}`} download>
            Download plan file
          </a>
        )}
      </div>
      <div className="grid min-h-0 flex-1 lg:grid-cols-[22rem_1fr]">
        <aside className="flex flex-col gap-6 overflow-y-auto border-r border-line p-6">
          <Card title="Room" className="p-5">
            <RoomSettings room={r} readOnly={!canEdit} />
          </Card>
          <Card title="Take-off" className="p-5">
            <TakeoffTable shell={r.shell} />
          </Card>
          {option?.note && <Card title="About this option" className="p-5"><p className="text-ink-soft">{option.note}</p></Card>}
        </aside>
        <section aria-label="3D preview" className="relative min-h-[360px] bg-sand">
          <Suspense fallback={<Spinner label="Loading the 3D preview…" />}>
            <RoomView shell={r.shell} pieces={option?.doc.pieces ?? []} className="absolute inset-0" label={`${r.name} in 3D`} />
          </Suspense>
        </section>
      </div>
    </div>
  );
}
