// Migration 0016 (frozen once landed): the studio's piece models, uploaded glTF files normalised on
// the job queue. A row keeps the private original until processing ends, then the normalised .glb
// (content-hashed, served) and its still thumbnail; the size is read from the model's bounds.
import { sql, type Kysely } from 'kysely';

export async function up(db: Kysely<unknown>): Promise<void> {
  await db.schema
    .createTable('piece_models')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('studio_id', 'uuid', (c) => c.notNull().references('studios.id').onDelete('cascade'))
    .addColumn('name', 'text', (c) => c.notNull())
    .addColumn('supplier', 'text')
    .addColumn('link', 'text')
    .addColumn('price', sql`numeric(12, 2)`, (c) => c.check(sql`price >= 0`))
    .addColumn('kind', 'text')
    .addColumn('turn_deg', 'integer', (c) =>
      c
        .notNull()
        .defaultTo(0)
        .check(sql`turn_deg in (0, 90, 180, 270)`),
    )
    .addColumn('scale', 'double precision', (c) =>
      c
        .notNull()
        .defaultTo(1)
        .check(sql`scale > 0`),
    )
    .addColumn('status', 'text', (c) =>
      c
        .notNull()
        .defaultTo('processing')
        .check(sql`status in ('processing', 'ready', 'failed')`),
    )
    .addColumn('failure_reason', 'text')
    .addColumn('file_name', 'text', (c) => c.notNull())
    .addColumn('source_key', 'text')
    .addColumn('source_bytes', 'integer', (c) => c.notNull())
    .addColumn('model_key', 'text')
    .addColumn('model_bytes', 'integer')
    .addColumn('thumbnail_key', 'text')
    .addColumn('thumbnail_bytes', 'integer')
    .addColumn('width_mm', 'double precision')
    .addColumn('depth_mm', 'double precision')
    .addColumn('height_mm', 'double precision')
    .addColumn('min_mm', 'jsonb')
    .addColumn('triangles', 'integer')
    .addColumn('source_triangles', 'integer')
    .addColumn('materials', 'integer')
    .addColumn('unit_hint', 'text', (c) => c.check(sql`unit_hint in ('cm', 'mm')`))
    .addColumn('queued_at', 'timestamptz')
    .addColumn('processed_ms', 'integer')
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('updated_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addCheckConstraint(
      'piece_models_ready_fields',
      sql`status <> 'ready' or (model_key is not null and width_mm is not null and depth_mm is not null and height_mm is not null and min_mm is not null)`,
    )
    .execute();
  await db.schema.createIndex('piece_models_studio_idx').on('piece_models').columns(['studio_id', 'created_at']).execute();
  await db.schema.createIndex('piece_models_model_key_idx').on('piece_models').columns(['model_key', 'studio_id']).execute();
  await sql`comment on table piece_models is 'The studio''s 3D models of pieces (glTF), normalised on the job queue'`.execute(db);
}

export async function down(db: Kysely<unknown>): Promise<void> {
  await db.schema.dropTable('piece_models').execute();
}
