import { useState, type FormEvent, type ReactNode } from 'react';
import { Link } from 'react-router';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { TextField } from '../../../components/ui/field';
import { Badge, Card, EmptyState, Notice, PageHeader, Spinner } from '../../../components/ui/layout';
import { errorMessage, fieldError } from '../../../lib/api';
import { formatDateTime, formatRelative } from '../../../lib/format';
import { useCanEdit } from '../../../lib/session';
import { useProject, useReopenProject, useUpdateProject } from '../api/projects';

/** One project: its client, its rooms and its presentations (the latter two passed in by the route). */
export function ProjectPage({ id, rooms, presentations }: { id: string; rooms?: ReactNode; presentations?: ReactNode }) {
  const project = useProject(id);
  const update = useUpdateProject(id);
  const canEdit = useCanEdit();
  const [renaming, setRenaming] = useState(false);
  const [reopening, setReopening] = useState(false);

  if (project.isPending) return <Spinner label="Loading project…" />;
  if (project.isError) {
    return (
      <div className="flex flex-col gap-4">
        <Notice tone="error">{errorMessage(project.error)}</Notice>
        <Link to="/projects" className="font-semibold text-pine">
          Back to projects
        </Link>
      </div>
    );
  }
  const { project: p, client } = project.data;
  const archived = p.state === 'archived';

  return (
    <div>
      <PageHeader
        eyebrow={
          <Link to="/projects" className="hover:text-ink hover:underline">
            Projects
          </Link>
        }
        title={
          <span className="flex flex-wrap items-center gap-3">
            {p.name} <Badge value={p.state} />
          </span>
        }
        actions={
          canEdit && (
            <>
              <Button onClick={() => setRenaming(true)}>Rename</Button>
              {p.state === 'decided' && <Button onClick={() => setReopening(true)}>Reopen</Button>}
              <Button
                variant={archived ? 'secondary' : 'quiet'}
                busy={update.isPending}
                onClick={() => update.mutate({ state: archived ? (p.previousState ?? 'draft') : 'archived' })}
              >
                {archived ? 'Restore' : 'Archive'}
              </Button>
            </>
          )
        }
      >
        {[p.address, `changed ${formatRelative(p.updatedAt)}`].filter(Boolean).join(' · ')}
        {p.reopenedAt && (
          <span className="block" data-testid="reopened">
            Reopened {p.reopenedBy ? `by ${p.reopenedBy} ` : ''}on {formatDateTime(p.reopenedAt)}
          </span>
        )}
      </PageHeader>
      {update.isError && (
        <div className="mb-4">
          <Notice tone="error">{errorMessage(update.error)}</Notice>
        </div>
      )}
      {archived && (
        <div className="mb-6">
          <Notice tone="info">This project is archived. Restore it to keep working on it.</Notice>
        </div>
      )}

      <div className="grid gap-6 lg:grid-cols-[1fr_20rem]">
        <div className="flex flex-col gap-6">
          <Card title="Rooms">{rooms ?? <EmptyState title="No rooms yet." />}</Card>
          <Card title="Presentations">
            {presentations ?? (
              <EmptyState title="No presentations yet.">
                When the rooms have their options, send your client a link to walk through them and choose.
              </EmptyState>
            )}
          </Card>
        </div>
        <Card title="Client" className="self-start">
          {client ? (
            <dl className="flex flex-col gap-3 text-[15px]">
              <div>
                <dt className="text-sm text-ink-faint">Name</dt>
                <dd className="font-semibold">{client.name}</dd>
              </div>
              <div>
                <dt className="text-sm text-ink-faint">E-mail</dt>
                <dd>{client.email ?? '—'}</dd>
              </div>
              <div>
                <dt className="text-sm text-ink-faint">Phone</dt>
                <dd>{client.phone ?? '—'}</dd>
              </div>
            </dl>
          ) : (
            <p className="text-ink-soft">No client.</p>
          )}
        </Card>
      </div>
      {renaming && <RenameDialog current={p.name} onClose={() => setRenaming(false)} projectId={id} />}
      {reopening && <ReopenDialog onClose={() => setReopening(false)} projectId={id} />}
    </div>
  );
}

function RenameDialog({ current, onClose, projectId }: { current: string; onClose: () => void; projectId: string }) {
  const update = useUpdateProject(projectId);
  const [name, setName] = useState(current);
  const submit = (e: FormEvent) => {
    e.preventDefault();
    update.mutate({ name }, { onSuccess: onClose });
  };
  return (
    <Dialog open onClose={onClose} title="Rename project">
      <form onSubmit={submit} className="flex flex-col gap-4" noValidate>
        <TextField
          label="Project name"
          value={name}
          onChange={(e) => setName(e.target.value)}
          error={fieldError(update.error, 'name')}
          autoFocus
        />
        <div className="flex justify-end gap-2">
          <Button variant="quiet" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" variant="primary" busy={update.isPending}>
            Save
          </Button>
        </div>
      </form>
    </Dialog>
  );
}

/** Decided → presented, on purpose: said plainly before it happens. */
function ReopenDialog({ onClose, projectId }: { onClose: () => void; projectId: string }) {
  const reopen = useReopenProject(projectId);
  return (
    <Dialog
      open
      onClose={onClose}
      title="Reopen this project?"
      footer={
        <>
          <Button variant="quiet" onClick={onClose}>
            Keep it decided
          </Button>
          <Button variant="primary" busy={reopen.isPending} onClick={() => reopen.mutate(undefined, { onSuccess: onClose })}>
            Reopen
          </Button>
        </>
      }
    >
      <div className="flex flex-col gap-3 text-[15px]">
        <p>The chosen options can be changed again, and so can the walls and openings of their rooms.</p>
        <p>
          The client’s links open for choosing again, and you can make new presentations. Parlour notes that you reopened it, and
          when.
        </p>
        {reopen.isError && <Notice tone="error">{errorMessage(reopen.error)}</Notice>}
      </div>
    </Dialog>
  );
}
