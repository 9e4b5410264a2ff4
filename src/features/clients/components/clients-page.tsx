// The Clients page: a searchable, sortable table of clients with their projects count, the Add
// client dialog, and an edit dialog whose fields save one by one.
import { useDeferredValue, useState, type FormEvent } from 'react';
import type { ListQuery } from '../../../../shared/schemas/project';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { CommitTextField } from '../../../components/ui/commit-field';
import { TextField } from '../../../components/ui/field';
import { textParser, asIs } from '../../../components/ui/use-commit-text';
import { ListToolbar, SORT_OPTIONS, ToolbarSelect } from '../../../components/ui/list-toolbar';
import { EmptyState, Notice, PageHeader, Spinner } from '../../../components/ui/layout';
import { commitAnswer, errorMessage, fieldError } from '../../../lib/api';
import { formatRelative } from '../../../lib/format';
import { useCanEdit } from '../../../lib/session';
import { useClients, useCreateClient, useUpdateClient } from '../api/clients';
import type { Client, ClientBody } from '../../../../shared/schemas/project';

export function ClientsPage() {
  const [q, setQ] = useState('');
  const [sort, setSort] = useState<ListQuery['sort']>('updated');
  const [editing, setEditing] = useState<Client | 'new' | null>(null);
  const clients = useClients({ q: useDeferredValue(q) || undefined, sort });
  const canEdit = useCanEdit();

  return (
    <div>
      <PageHeader
        title="Clients"
        actions={
          canEdit && (
            <Button variant="primary" onClick={() => setEditing('new')}>
              Add client
            </Button>
          )
        }
      >
        The households and people your projects are for.
      </PageHeader>
      <ListToolbar label="Search clients" placeholder="Search by name or e-mail" query={q} onQuery={setQ}>
        <ToolbarSelect label="Sort" value={sort} onChange={setSort} options={SORT_OPTIONS} />
      </ListToolbar>
      {clients.isPending ? (
        <Spinner />
      ) : clients.isError ? (
        <Notice tone="error">{errorMessage(clients.error)}</Notice>
      ) : clients.data.clients.length === 0 ? (
        <EmptyState title={q ? 'No client matches that search.' : 'No clients yet.'} />
      ) : (
        <div className="overflow-hidden rounded-2xl border border-line bg-white">
          <table className="w-full text-left text-[15px]">
            <thead className="border-b border-line bg-paper/60 text-sm text-ink-soft">
              <tr>
                <th scope="col" className="px-5 py-3 font-semibold">
                  Name
                </th>
                <th scope="col" className="px-5 py-3 font-semibold">
                  E-mail
                </th>
                <th scope="col" className="px-5 py-3 font-semibold">
                  Projects
                </th>
                <th scope="col" className="px-5 py-3 font-semibold">
                  Last change
                </th>
                {canEdit && (
                  <th scope="col" className="px-5 py-3">
                    <span className="sr-only">Actions</span>
                  </th>
                )}
              </tr>
            </thead>
            <tbody>
              {clients.data.clients.map((c) => (
                <tr key={c.id} className="border-b border-line last:border-0">
                  <td className="px-5 py-4 font-semibold">{c.name}</td>
                  <td className="px-5 py-4 text-ink-soft">{c.email ?? '—'}</td>
                  <td className="px-5 py-4 text-ink-soft tabular-nums">{c.projectCount}</td>
                  <td className="px-5 py-4 text-ink-soft">{formatRelative(c.updatedAt)}</td>
                  {canEdit && (
                    <td className="px-5 py-4 text-right">
                      <Button size="sm" variant="quiet" onClick={() => setEditing(c)} aria-label={`Edit ${c.name}`}>
                        Edit
                      </Button>
                    </td>
                  )}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
      {editing === 'new' && <ClientDialog client={null} onClose={() => setEditing(null)} />}
      {editing && editing !== 'new' && <EditClientDialog client={editing} onClose={() => setEditing(null)} />}
    </div>
  );
}

function ClientDialog({ client, onClose }: { client: Client | null; onClose: () => void }) {
  const create = useCreateClient();
  const update = useUpdateClient(client?.id ?? '');
  const mutation = client ? update : create;
  const [name, setName] = useState(client?.name ?? '');
  const [email, setEmail] = useState(client?.email ?? '');
  const [phone, setPhone] = useState(client?.phone ?? '');
  const submit = (e: FormEvent) => {
    e.preventDefault();
    mutation.mutate({ name, email, phone }, { onSuccess: onClose });
  };
  const err = mutation.error;
  return (
    <Dialog open onClose={onClose} title={client ? 'Edit client' : 'Add client'}>
      <form onSubmit={submit} className="flex flex-col gap-4" noValidate>
        {err && Object.keys((err as { fields?: object }).fields ?? {}).length === 0 && (
          <Notice tone="error">{errorMessage(err)}</Notice>
        )}
        <TextField
          label="Name"
          value={name}
          onChange={(e) => setName(e.target.value)}
          error={fieldError(err, 'name')}
          autoFocus
        />
        <TextField
          label="E-mail"
          type="email"
          value={email}
          onChange={(e) => setEmail(e.target.value)}
          error={fieldError(err, 'email')}
        />
        <TextField label="Phone" value={phone} onChange={(e) => setPhone(e.target.value)} error={fieldError(err, 'phone')} />
        <div className="flex justify-end gap-2">
          <Button variant="quiet" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" variant="primary" busy={mutation.isPending}>
            {client ? 'Save' : 'Add client'}
          </Button>
        </div>
      </form>
    </Dialog>
  );
}

/** An existing client: each field saves on Enter or on moving on, Escape puts back the saved value. */
function EditClientDialog({ client, onClose }: { client: Client; onClose: () => void }) {
  const update = useUpdateClient(client.id);
  const [saved, setSaved] = useState(client);
  const save = (patch: Partial<ClientBody>, field: keyof ClientBody) =>
    commitAnswer(
      update.mutateAsync(patch).then(({ client: c }) => setSaved((s) => ({ ...s, ...c }))),
      field,
    );
  return (
    <Dialog
      open
      onClose={onClose}
      title="Edit client"
      footer={
        <Button variant="primary" onClick={onClose}>
          Done
        </Button>
      }
    >
      <div className="flex flex-col gap-4">
        <CommitTextField
          label="Name"
          value={saved.name}
          format={asIs}
          parse={textParser('Enter the client’s name.')}
          onCommit={(name) => save({ name }, 'name')}
        />
        <CommitTextField
          label="E-mail"
          type="email"
          value={saved.email ?? ''}
          format={asIs}
          parse={textParser(null)}
          onCommit={(email) => save({ email }, 'email')}
        />
        <CommitTextField
          label="Phone"
          value={saved.phone ?? ''}
          format={asIs}
          parse={textParser(null)}
          onCommit={(phone) => save({ phone }, 'phone')}
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
