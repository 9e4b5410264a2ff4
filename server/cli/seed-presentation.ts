// The demo flat's presentation: both rooms, both options each, ready to send to the household.
import type { Db } from '../db/database';
import { insertPresentation, insertShownRooms, setProjectState } from '../features/presentations/presentations.repository';
import { LINK_LIFETIME_DAYS } from '../../shared/schemas/presentation';
import { newTokenId, toTokenTime } from '../services/tokens/presentation-token';

const DAY_MS = 86_400_000;
/** The demo link works for the usual 30 days. */
const DEMO_EXPIRY_DAYS = 30;

export async function seedDemoPresentation(
  db: Db,
  v: { studioId: string; projectId: string; createdBy: string; rooms: { roomId: string; optionIds: string[] }[] },
): Promise<void> {
  const issuedAt = toTokenTime(new Date());
  const created = await insertPresentation(db, {
    studioId: v.studioId,
    projectId: v.projectId,
    createdBy: v.createdBy,
    tokenId: newTokenId(),
    message: 'Here are two ideas for each room. Walk round them, take your time, and choose the one that feels like home. — Ines',
    showPrices: true,
    issuedAt,
    tokenExpiresAt: new Date(issuedAt.getTime() + LINK_LIFETIME_DAYS * DAY_MS),
    expiresAt: new Date(issuedAt.getTime() + DEMO_EXPIRY_DAYS * DAY_MS),
  });
  await insertShownRooms(db, created.id, v.rooms);
  await setProjectState(db, v.projectId, 'presented');
}
