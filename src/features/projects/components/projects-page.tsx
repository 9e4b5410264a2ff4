// The Projects page: the studio's projects with search, sort and a Show filter (current, archived or
// all), and the new project dialog.
import { useDeferredValue, useState } from 'react';
import { Link } from 'react-router';
import type { ListQuery } from '../../../../shared/schemas/project';
import { Button } from '../../../components/ui/button';
import { ListToolbar, SORT_OPTIONS, ToolbarSelect } from '../../../components/ui/list-toolbar';
import { Badge, EmptyState, Notice, PageHeader, Spinner } from '../../../components/ui/layout';
import { errorMessage } from '../../../lib/api';
import { formatRelative } from '../../../lib/format';
import { useCanEdit } from '../../../lib/session';
import { useProjects } from '../api/projects';
import { NewProjectDialog } from './new-project-dialog';

export function ProjectsPage({ clients }: { clients: { id: string; name: string }[] }) {
  const [q, setQ] = useState('');
  const [sort, setSort] = useState<ListQuery['sort']>('updated');
  const [archived, setArchived] = useState<ListQuery['archived']>('exclude');
  const [creating, setCreating] = useState(false);
  const deferredQ = useDeferredValue(q);
  const projects = useProjects({ q: deferredQ || undefined, sort, archived });
  const canEdit = useCanEdit();

  return (
    <div>
      <PageHeader
        title="Projects"
        actions={
          canEdit && (
            <Button variant="primary" onClick={() => setCreating(true)}>
              New project
            </Button>
          )
        }
      >
        Every client job, with its rooms, options and presentations.
      </PageHeader>

      <ListToolbar label="Search projects" placeholder="Search by project, client or address" query={q} onQuery={setQ}>
        <ToolbarSelect label="Sort" value={sort} onChange={setSort} options={SORT_OPTIONS} />
        <ToolbarSelect
          label="Show"
          value={archived}
          onChange={setArchived}
          options={[
            { value: 'exclude', label: 'Current' },
            { value: 'only', label: 'Archived' },
            { value: 'include', label: 'All' },
          ]}
        />
      </ListToolbar>

      {projects.isPending ? (
        <Spinner label="Loading projects…" />
      ) : projects.isError ? (
        <Notice tone="error">{errorMessage(projects.error)}</Notice>
      ) : projects.data.projects.length === 0 ? (
        <EmptyState
          title={q ? 'No project matches that search.' : 'No projects yet.'}
          action={
            canEdit &&
            !q && (
              <Button variant="primary" onClick={() => setCreating(true)}>
                Start your first project
              </Button>
            )
          }
        >
          {!q && 'A project is one client job at one address. Add its rooms, then prepare options to present.'}
        </EmptyState>
      ) : (
        <div className="overflow-hidden rounded-2xl border border-line bg-white">
          <table className="w-full text-left text-[15px]">
            <thead className="border-b border-line bg-paper/60 text-sm text-ink-soft">
              <tr>
                <th scope="col" className="px-5 py-3 font-semibold">
                  Project
                </th>
                <th scope="col" className="px-5 py-3 font-semibold">
                  Client
                </th>
                <th scope="col" className="px-5 py-3 font-semibold">
                  Rooms
                </th>
                <th scope="col" className="px-5 py-3 font-semibold">
                  State
                </th>
                <th scope="col" className="px-5 py-3 font-semibold">
                  Last change
                </th>
              </tr>
            </thead>
            <tbody>
              {projects.data.projects.map((p) => (
                <tr key={p.id} className="border-b border-line last:border-0 hover:bg-paper/50">
                  <td className="px-5 py-4">
                    <Link to={`/projects/${p.id}`} className="font-semibold text-ink hover:text-pine hover:underline">
                      {p.name}
                    </Link>
                    {p.address && <div className="text-sm text-ink-faint">{p.address}</div>}
                  </td>
                  <td className="px-5 py-4 text-ink-soft">{p.client.name}</td>
                  <td className="px-5 py-4 text-ink-soft tabular-nums">{p.roomCount}</td>
                  <td className="px-5 py-4">
                    <Badge value={p.state} />
                  </td>
                  <td className="px-5 py-4 text-ink-soft" title={new Date(p.updatedAt).toLocaleString()}>
                    {formatRelative(p.updatedAt)}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
      {creating && <NewProjectDialog open onClose={() => setCreating(false)} clients={clients} />}
    </div>
  );
}
