// The demo scenario (invented): a small studio, one client household, a two-room flat.
// Idempotent: does nothing when the demo studio's owner already exists.
import type { Db } from '../db/database';
import { hashPassword } from '../services/auth/passwords';
import { seedDemoRooms } from './seed-rooms';
import { seedDemoPresentation } from './seed-presentation';
import { demoFileStorage, seedDemoFinishes } from './seed-finishes';
import { seedDemoModels } from './seed-models';

export const DEMO_SIGN_IN = { email: 'demo@parlour.local', password: 'parlour-demo' } as const;

export async function seedDemo(db: Db): Promise<boolean> {
  const exists = await db.selectFrom('members').select('id').where('email', '=', DEMO_SIGN_IN.email).executeTakeFirst();
  if (exists) return false;
  const [ownerHash, otherHash] = await Promise.all([hashPassword(DEMO_SIGN_IN.password), hashPassword('parlour-demo-team')]);
  await db.transaction().execute(async (trx) => {
    const studio = await trx
      .insertInto('studios')
      .values({ name: 'Wren & Tallow Interiors' })
      .returning('id')
      .executeTakeFirstOrThrow();
    const [owner] = await trx
      .insertInto('members')
      .values([
        { studio_id: studio.id, email: DEMO_SIGN_IN.email, name: 'Ines Calloway', role: 'owner', password_hash: ownerHash },
        { studio_id: studio.id, email: 'theo@parlour.local', name: 'Theo Marsh', role: 'designer', password_hash: otherHash },
        { studio_id: studio.id, email: 'pia@parlour.local', name: 'Pia Lund', role: 'viewer', password_hash: otherHash },
      ])
      .returning('id')
      .execute();
    const client = await trx
      .insertInto('clients')
      .values({
        studio_id: studio.id,
        name: 'The Harrow-Okonjo household',
        email: 'harrow-okonjo@example.com',
        phone: '0100 555 0142',
      })
      .returning('id')
      .executeTakeFirstOrThrow();
    const other = await trx
      .insertInto('clients')
      .values({ studio_id: studio.id, name: 'Marguerite Delacourt', email: 'm.delacourt@example.com' })
      .returning('id')
      .executeTakeFirstOrThrow();
    const flat = await trx
      .insertInto('projects')
      .values({ studio_id: studio.id, client_id: client.id, name: 'Canal Row flat', address: '4 Canal Row, second floor' })
      .returning('id')
      .executeTakeFirstOrThrow();
    await trx
      .insertInto('projects')
      .values({
        studio_id: studio.id,
        client_id: other.id,
        name: 'Garden studio refresh',
        address: '17 Orchard Lane',
        updated_at: new Date(Date.now() - 3 * 86_400_000),
      })
      .execute();
    const finishes = await seedDemoFinishes(trx, studio.id, demoFileStorage());
    const models = await seedDemoModels(trx, studio.id, demoFileStorage());
    const rooms = await seedDemoRooms(trx, studio.id, flat.id, finishes, models);
    await seedDemoPresentation(trx, { studioId: studio.id, projectId: flat.id, createdBy: owner.id, rooms });
  });
  return true;
}
