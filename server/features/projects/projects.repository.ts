// Database reads and writes for projects: list and search a studio's projects with their client,
// fetch, add and update one, lock its state, mark it changed, and reopen a decided one.
import { sql } from 'kysely';
import type { Db } from '../../db/database';
import type { ListQuery, ProjectPatch, ProjectSummary, ProjectState } from '../../../shared/schemas/project';
import { likePattern } from '../clients/clients.repository';
import type { KeptState } from './project-states';

export async function listProjects(db: Db, studioId: string, query: ListQuery): Promise<ProjectSummary[]> {
  let qb = db
    .selectFrom('projects')
    .innerJoin('clients', 'clients.id', 'projects.client_id')
    .leftJoin('members as reopener', 'reopener.id', 'projects.reopened_by')
    .select([
      'projects.id',
      'projects.name',
      'projects.address',
      'projects.state',
      'projects.created_at',
      'projects.updated_at',
      'projects.previous_state',
      'projects.reopened_at',
      'reopener.name as reopened_by_name',
      'clients.id as client_id',
      'clients.name as client_name',
    ])
    .select(roomCount)
    .where('projects.studio_id', '=', studioId);
  if (query.archived === 'exclude') qb = qb.where('projects.state', '!=', 'archived');
  if (query.archived === 'only') qb = qb.where('projects.state', '=', 'archived');
  if (query.q) {
    const p = likePattern(query.q);
    qb = qb.where((eb) =>
      eb.or([eb('projects.name', 'ilike', p), eb('clients.name', 'ilike', p), eb('projects.address', 'ilike', p)]),
    );
  }
  qb = query.sort === 'name' ? qb.orderBy(sql`lower(projects.name)`) : qb.orderBy('projects.updated_at', 'desc');
  const rows = await qb.limit(500).execute();
  return rows.map(toSummary);
}

const roomCount = sql<number>`(select count(*)::int from rooms where rooms.project_id = projects.id)`.as('room_count');

type SummaryRow = {
  id: string;
  name: string;
  address: string | null;
  state: ProjectState;
  created_at: Date;
  updated_at: Date;
  previous_state: KeptState | null;
  reopened_at: Date | null;
  reopened_by_name: string | null;
  client_id: string;
  client_name: string;
  room_count: number;
};

const toSummary = (r: SummaryRow): ProjectSummary => ({
  id: r.id,
  name: r.name,
  address: r.address,
  state: r.state,
  previousState: r.state === 'archived' ? (r.previous_state ?? 'draft') : null,
  reopenedAt: r.reopened_at?.toISOString() ?? null,
  reopenedBy: r.reopened_by_name,
  client: { id: r.client_id, name: r.client_name },
  roomCount: Number(r.room_count),
  createdAt: r.created_at.toISOString(),
  updatedAt: r.updated_at.toISOString(),
});

export async function getProject(db: Db, studioId: string, id: string): Promise<ProjectSummary | undefined> {
  const r = await db
    .selectFrom('projects')
    .innerJoin('clients', 'clients.id', 'projects.client_id')
    .leftJoin('members as reopener', 'reopener.id', 'projects.reopened_by')
    .select([
      'projects.id',
      'projects.name',
      'projects.address',
      'projects.state',
      'projects.created_at',
      'projects.updated_at',
      'projects.previous_state',
      'projects.reopened_at',
      'reopener.name as reopened_by_name',
      'clients.id as client_id',
      'clients.name as client_name',
    ])
    .select(roomCount)
    .where('projects.studio_id', '=', studioId)
    .where('projects.id', '=', id)
    .executeTakeFirst();
  return r ? toSummary(r) : undefined;
}

export async function insertProject(db: Db, v: { studioId: string; clientId: string; name: string; address: string | null }) {
  return db
    .insertInto('projects')
    .values({ studio_id: v.studioId, client_id: v.clientId, name: v.name, address: v.address })
    .returning('id')
    .executeTakeFirstOrThrow();
}

/** The project's state, its row held until the transaction ends, so state changes happen one at a time. */
export async function lockProjectState(db: Db, studioId: string, id: string, mode: 'update' | 'share' = 'update') {
  const q = db.selectFrom('projects').select(['state', 'previous_state']).where('studio_id', '=', studioId).where('id', '=', id);
  return (mode === 'update' ? q.forUpdate() : q.forShare()).executeTakeFirst();
}

export type ProjectChanges = Omit<ProjectPatch, 'state'> & { state?: ProjectState; previous_state?: KeptState | null };

export async function updateProject(db: Db, studioId: string, id: string, patch: ProjectChanges): Promise<boolean> {
  const r = await db
    .updateTable('projects')
    .set({ ...patch, updated_at: new Date() })
    .where('studio_id', '=', studioId)
    .where('id', '=', id)
    .executeTakeFirst();
  return Number(r.numUpdatedRows) > 0;
}

/** Marks a project changed (any edit to its rooms counts as a change to the project). */
export async function touchProject(db: Db, id: string): Promise<void> {
  await db.updateTable('projects').set({ updated_at: new Date() }).where('id', '=', id).execute();
}

/** Decided → presented, recording who reopened it and when; false unless the project was decided. */
export async function reopenProject(db: Db, studioId: string, id: string, memberId: string): Promise<boolean> {
  const now = new Date();
  const r = await db
    .updateTable('projects')
    .set({ state: 'presented', reopened_by: memberId, reopened_at: now, updated_at: now })
    .where('studio_id', '=', studioId)
    .where('id', '=', id)
    .where('state', '=', 'decided')
    .executeTakeFirst();
  return Number(r.numUpdatedRows) > 0;
}
