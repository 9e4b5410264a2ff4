// Database reads and writes for a studio's members: find one by e-mail, list, fetch, count the
// owners, add one, change a role, remove one and end their sessions.
import type { Db } from '../../db/database';
import type { Member, Role } from '../../../shared/schemas/studio';

type MemberRow = { id: string; name: string; email: string; role: Role; created_at: Date };

export const toMember = (r: MemberRow): Member => ({
  id: r.id,
  name: r.name,
  email: r.email,
  role: r.role,
  createdAt: r.created_at.toISOString(),
});

export async function findMemberByEmail(db: Db, email: string) {
  return db.selectFrom('members').selectAll().where('email', '=', email).executeTakeFirst();
}

export async function listMembers(db: Db, studioId: string): Promise<Member[]> {
  const rows = await db
    .selectFrom('members')
    .select(['id', 'name', 'email', 'role', 'created_at'])
    .where('studio_id', '=', studioId)
    .orderBy('created_at')
    .execute();
  return rows.map(toMember);
}

export async function getMember(db: Db, studioId: string, id: string) {
  return db
    .selectFrom('members')
    .select(['id', 'name', 'email', 'role', 'created_at'])
    .where('studio_id', '=', studioId)
    .where('id', '=', id)
    .executeTakeFirst();
}

export async function countOwners(db: Db, studioId: string): Promise<number> {
  const r = await db
    .selectFrom('members')
    .select((eb) => eb.fn.countAll<string>().as('n'))
    .where('studio_id', '=', studioId)
    .where('role', '=', 'owner')
    .executeTakeFirstOrThrow();
  return Number(r.n);
}

export async function insertMember(
  db: Db,
  m: { studioId: string; email: string; name: string; role: Role; passwordHash: string },
) {
  return db
    .insertInto('members')
    .values({ studio_id: m.studioId, email: m.email, name: m.name, role: m.role, password_hash: m.passwordHash })
    .returning(['id', 'name', 'email', 'role', 'created_at'])
    .executeTakeFirstOrThrow();
}

export async function setMemberRole(db: Db, id: string, role: Role): Promise<void> {
  await db.updateTable('members').set({ role }).where('id', '=', id).execute();
}

export async function deleteMember(db: Db, id: string): Promise<void> {
  await db.deleteFrom('members').where('id', '=', id).execute();
}

export async function deleteSessionsOf(db: Db, memberId: string): Promise<void> {
  await db.deleteFrom('sessions').where('member_id', '=', memberId).execute();
}
