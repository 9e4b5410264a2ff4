// Migration 0001: creates the first tables: studios, members, sessions, invites, sign-in failures,
// clients and projects.
import { sql, type Kysely } from 'kysely';

// Frozen once landed: studios, members, sessions, invites, sign-in failures, clients, projects.
export async function up(db: Kysely<unknown>): Promise<void> {
  await db.schema
    .createTable('studios')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('name', 'text', (c) => c.notNull())
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .execute();

  await db.schema
    .createTable('members')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('studio_id', 'uuid', (c) => c.notNull().references('studios.id').onDelete('cascade'))
    .addColumn('email', 'text', (c) => c.notNull().unique())
    .addColumn('name', 'text', (c) => c.notNull())
    .addColumn('role', 'text', (c) => c.notNull().check(sql`role in ('owner', 'designer', 'viewer')`))
    .addColumn('password_hash', 'text', (c) => c.notNull())
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex('members_studio_idx').on('members').column('studio_id').execute();

  await db.schema
    .createTable('sessions')
    .addColumn('id', 'text', (c) => c.primaryKey())
    .addColumn('member_id', 'uuid', (c) => c.notNull().references('members.id').onDelete('cascade'))
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('expires_at', 'timestamptz', (c) => c.notNull())
    .execute();
  await db.schema.createIndex('sessions_member_idx').on('sessions').column('member_id').execute();

  await db.schema
    .createTable('invites')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('studio_id', 'uuid', (c) => c.notNull().references('studios.id').onDelete('cascade'))
    .addColumn('email', 'text', (c) => c.notNull())
    .addColumn('role', 'text', (c) => c.notNull().check(sql`role in ('owner', 'designer', 'viewer')`))
    .addColumn('token_hash', 'text', (c) => c.notNull().unique())
    .addColumn('invited_by', 'uuid', (c) => c.references('members.id').onDelete('set null'))
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('expires_at', 'timestamptz', (c) => c.notNull())
    .addColumn('accepted_at', 'timestamptz')
    .execute();

  await db.schema
    .createTable('sign_in_failures')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('email', 'text', (c) => c.notNull())
    .addColumn('at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex('sign_in_failures_email_at_idx').on('sign_in_failures').columns(['email', 'at']).execute();

  await db.schema
    .createTable('clients')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('studio_id', 'uuid', (c) => c.notNull().references('studios.id').onDelete('cascade'))
    .addColumn('name', 'text', (c) => c.notNull())
    .addColumn('email', 'text')
    .addColumn('phone', 'text')
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('updated_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex('clients_studio_idx').on('clients').column('studio_id').execute();

  await db.schema
    .createTable('projects')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('studio_id', 'uuid', (c) => c.notNull().references('studios.id').onDelete('cascade'))
    .addColumn('client_id', 'uuid', (c) => c.notNull().references('clients.id').onDelete('restrict'))
    .addColumn('name', 'text', (c) => c.notNull())
    .addColumn('address', 'text')
    .addColumn('state', 'text', (c) =>
      c
        .notNull()
        .defaultTo('draft')
        .check(sql`state in ('draft', 'presented', 'decided', 'archived')`),
    )
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('updated_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex('projects_studio_updated_idx').on('projects').columns(['studio_id', 'updated_at']).execute();
}

export async function down(db: Kysely<unknown>): Promise<void> {
  for (const t of ['projects', 'clients', 'sign_in_failures', 'invites', 'sessions', 'members', 'studios']) {
    await db.schema.dropTable(t).ifExists().execute();
  }
}
