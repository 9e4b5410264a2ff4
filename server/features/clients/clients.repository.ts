// Database reads and writes for a studio's clients: search and sort the list with each client's
// project count, fetch, add and update one.
import { sql } from 'kysely';
import type { Db } from '../../db/database';
import type { Client, ClientBody, ListQuery } from '../../../shared/schemas/project';

const likePattern = (q: string) => `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
export { likePattern };

export async function listClients(db: Db, studioId: string, query: Pick<ListQuery, 'q' | 'sort'>): Promise<Client[]> {
  let qb = db
    .selectFrom('clients')
    .leftJoin('projects', 'projects.client_id', 'clients.id')
    .select(['clients.id', 'clients.name', 'clients.email', 'clients.phone', 'clients.updated_at'])
    .select((eb) => eb.fn.count<string>('projects.id').as('project_count'))
    .where('clients.studio_id', '=', studioId)
    .groupBy('clients.id');
  if (query.q) {
    const p = likePattern(query.q);
    qb = qb.where((eb) => eb.or([eb('clients.name', 'ilike', p), eb('clients.email', 'ilike', p)]));
  }
  qb = query.sort === 'name' ? qb.orderBy(sql`lower(clients.name)`) : qb.orderBy('clients.updated_at', 'desc');
  const rows = await qb.limit(500).execute();
  return rows.map((r) => ({
    id: r.id,
    name: r.name,
    email: r.email,
    phone: r.phone,
    projectCount: Number(r.project_count),
    updatedAt: r.updated_at.toISOString(),
  }));
}

export async function getClient(db: Db, studioId: string, id: string) {
  return db.selectFrom('clients').selectAll().where('studio_id', '=', studioId).where('id', '=', id).executeTakeFirst();
}

export async function insertClient(db: Db, studioId: string, body: ClientBody) {
  return db
    .insertInto('clients')
    .values({ studio_id: studioId, name: body.name, email: body.email ?? null, phone: body.phone ?? null })
    .returning(['id', 'name', 'email', 'phone', 'updated_at'])
    .executeTakeFirstOrThrow();
}

export async function updateClient(db: Db, studioId: string, id: string, patch: Partial<ClientBody>) {
  return db
    .updateTable('clients')
    .set({ ...patch, updated_at: new Date() })
    .where('studio_id', '=', studioId)
    .where('id', '=', id)
    .returning(['id', 'name', 'email', 'phone', 'updated_at'])
    .executeTakeFirst();
}
