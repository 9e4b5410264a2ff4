// Migration 0012: shown options keep the version they had when the link was made, paint prices per
// unit become per litre, and studios get a currency and a locale.
import { sql, type Kysely } from 'kysely';

// Frozen once landed.
// 1. Each option a presentation shows keeps the version it had when the link was made, so the
//    client's page can tell an option changed since then. Links made before this keep today's
//    versions (nothing reads as changed).
// 2. A paint is priced per litre or per m² of wall; "per unit" was only ever read as per litre, so
//    stored paint prices per unit become per-litre prices. Photo finishes keep m² or unit.
// 3. A studio has a currency (ISO 4217) and a locale (BCP 47) for its prices; studios made before
//    this get the demo's.

export async function up(db: Kysely<unknown>): Promise<void> {
  await db.schema.alterTable('presentation_options').addColumn('sent_version', 'integer').execute();
  await sql`update presentation_options po set sent_version = o.version from options o where o.id = po.option_id`.execute(db);

  await sql`alter table finishes drop constraint finishes_price_unit_check`.execute(db);
  await sql`update finishes set price_unit = 'litre' where kind = 'paint' and price_unit = 'unit'`.execute(db);
  await sql`alter table finishes add constraint finishes_price_unit_check check (
    (kind = 'paint' and price_unit in ('litre', 'm2')) or (kind = 'photo' and price_unit in ('m2', 'unit')) or price_unit is null
  )`.execute(db);

  await db.schema
    .alterTable('studios')
    .addColumn('currency', 'text', (c) => c.notNull().defaultTo('GBP'))
    .addColumn('locale', 'text', (c) => c.notNull().defaultTo('en-GB'))
    .execute();
}

export async function down(db: Kysely<unknown>): Promise<void> {
  await db.schema.alterTable('studios').dropColumn('currency').dropColumn('locale').execute();
  await sql`alter table finishes drop constraint finishes_price_unit_check`.execute(db);
  await sql`update finishes set price_unit = 'unit' where price_unit = 'litre'`.execute(db);
  await sql`alter table finishes add constraint finishes_price_unit_check check (price_unit in ('m2', 'unit'))`.execute(db);
  await db.schema.alterTable('presentation_options').dropColumn('sent_version').execute();
}
