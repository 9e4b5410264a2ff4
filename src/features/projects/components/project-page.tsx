// One project's page: its client, name and address (saving field by field), state and Reopen, with
// the rooms and presentations sections passed in by the route.
import { useState, type ReactNode } from 'react';
import { Link } from 'react-router';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { CommitTextField } from '../../../components/ui/commit-field';
import { textParser, asIs } from '../../../components/ui/use-commit-text';
import { Badge, Card, EmptyState, Notice, PageHeader, Spinner } from '../../../components/ui/layout';
import { commitAnswer, errorMessage } from '../../../lib/api';
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
              <Button onClick={() => setRenaming(true)}>Edit details</Button>
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
      {renaming && <DetailsDialog name={p.name} address={p.address} onClose={() => setRenaming(false)} projectId={id} />}
      {reopening && <ReopenDialog onClose={() => setReopening(false)} projectId={id} />}
    </div>
  );
}

/** The project's name and address: each saves on Enter or on moving on, Escape puts back the saved value. */
function DetailsDialog({
  name,
  address,
  onClose,
  projectId,
}: {
  name: string;
  address: string | null;
  onClose: () => void;
  projectId: string;
}) {
  const update = useUpdateProject(projectId);
  return (
    <Dialog
      open
      onClose={onClose}
      title="Project details"
      footer={
        <Button variant="primary" onClick={onClose}>
          Done
        </Button>
      }
    >
      <div className="flex flex-col gap-4">
        <CommitTextField
          label="Project name"
          value={name}
          format={asIs}
          parse={textParser('Enter a project name.')}
          onCommit={(v) => commitAnswer(update.mutateAsync({ name: v }), 'name')}
        />
        <CommitTextField
          label="Address"
          value={address ?? ''}
          format={asIs}
          parse={textParser(null)}
          onCommit={(v) => commitAnswer(update.mutateAsync({ address: v }), 'address')}
        />
        <p className="text-sm text-ink-faint" role="status">
          {update.isPending
            ? 'Saving…'
            : update.isSuccess
              ? 'All changes saved'
              : 'Each field saves when you press Enter or move on.'}
        </p>
      </div>
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
