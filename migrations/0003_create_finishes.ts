// Migration 0003: creates the studio's finishes (photo finishes and paints in one table) and the
// stored files each photo finish owns.
import { sql, type Kysely } from 'kysely';

// Frozen once landed: the studio's finishes (photo finishes and paints in one table, told apart by
// kind) and the stored files each photo finish owns.
export async function up(db: Kysely<unknown>): Promise<void> {
  await db.schema
    .createTable('finishes')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('studio_id', 'uuid', (c) => c.notNull().references('studios.id').onDelete('cascade'))
    .addColumn('kind', 'text', (c) => c.notNull().check(sql`kind in ('photo', 'paint')`))
    .addColumn('name', 'text', (c) => c.notNull())
    .addColumn('supplier', 'text')
    .addColumn('code', 'text')
    .addColumn('price', sql`numeric(12, 2)`, (c) => c.check(sql`price >= 0`))
    .addColumn('price_unit', 'text', (c) => c.check(sql`price_unit in ('m2', 'unit')`))
    // paints
    .addColumn('colour_hex', 'text')
    .addColumn('sheen', 'text', (c) => c.check(sql`sheen in ('matt', 'eggshell', 'satin', 'gloss')`))
    // photo finishes
    .addColumn('category', 'text', (c) =>
      c.check(sql`category in ('floor', 'wall', 'tile', 'wood', 'stone', 'fabric', 'wallpaper', 'other')`),
    )
    .addColumn('repeat_width_mm', 'double precision', (c) => c.check(sql`repeat_width_mm > 0`))
    .addColumn('repeat_height_mm', 'double precision', (c) => c.check(sql`repeat_height_mm > 0`))
    .addColumn('crop', 'jsonb')
    .addColumn('edge_blend', 'text', (c) => c.check(sql`edge_blend in ('none', 'narrow', 'wide')`))
    .addColumn('status', 'text', (c) => c.check(sql`status in ('processing', 'ready', 'failed')`))
    .addColumn('failure_reason', 'text')
    .addColumn('source_key', 'text')
    .addColumn('photo_width_px', 'integer')
    .addColumn('photo_height_px', 'integer')
    .addColumn('mean_colour_hex', 'text')
    .addColumn('revision', 'integer', (c) => c.notNull().defaultTo(1))
    .addColumn('queued_at', 'timestamptz')
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('updated_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addCheckConstraint('finishes_paint_fields', sql`kind <> 'paint' or (colour_hex is not null and sheen is not null)`)
    .addCheckConstraint(
      'finishes_photo_fields',
      sql`kind <> 'photo' or (category is not null and repeat_width_mm is not null and repeat_height_mm is not null and crop is not null and edge_blend is not null and status is not null and photo_width_px is not null and photo_height_px is not null)`,
    )
    .execute();
  await db.schema.createIndex('finishes_studio_idx').on('finishes').columns(['studio_id', 'created_at']).execute();

  await db.schema
    .createTable('finish_files')
    .addColumn('finish_id', 'uuid', (c) => c.notNull().references('finishes.id').onDelete('cascade'))
    .addColumn('studio_id', 'uuid', (c) => c.notNull().references('studios.id').onDelete('cascade'))
    .addColumn('purpose', 'text', (c) =>
      c.notNull().check(sql`purpose in ('master', 'photo', 'texture', 'texture-large', 'swatch', 'preview')`),
    )
    .addColumn('key', 'text', (c) => c.notNull())
    .addColumn('width_px', 'integer', (c) => c.notNull())
    .addColumn('height_px', 'integer', (c) => c.notNull())
    .addColumn('bytes', 'integer', (c) => c.notNull())
    .addPrimaryKeyConstraint('finish_files_pk', ['finish_id', 'purpose'])
    .execute();
  await db.schema.createIndex('finish_files_key_idx').on('finish_files').columns(['key', 'studio_id']).execute();
}

export async function down(db: Kysely<unknown>): Promise<void> {
  await db.schema.dropTable('finish_files').ifExists().execute();
  await db.schema.dropTable('finishes').ifExists().execute();
}
