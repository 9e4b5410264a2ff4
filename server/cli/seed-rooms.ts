// The demo flat's rooms: the L-shaped living room and the bedroom from assets/plans, each with a
// second option that moves and swaps pieces, so the client has two proposals to compare.
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import type { Db } from '../db/database';
import { readPlanFile, type PlanFile } from '../../shared/schemas/plan-file';
import { optionDocSchema, type Piece } from '../../shared/schemas/option';
import { insertOption, insertRoom } from '../features/rooms/rooms.repository';

const PLANS = resolve(import.meta.dirname, '../../assets/plans');

function loadPlan(file: string): PlanFile {
  const read = readPlanFile(readFileSync(resolve(PLANS, file), 'utf8'));
  if (!read.ok) throw new Error(`demo plan ${file} is invalid: ${read.errors.join('; ')}`);
  return read.plan;
}

type Variant = { nameA: string; name: string; note: string; change: (pieces: Piece[]) => Piece[] };

const LIVING_B: Variant = {
  nameA: 'Sofa by the wall',
  name: 'Conversation corner',
  note: 'The sofa faces the front window; the client’s armchairs sit opposite. More open floor by the kitchen.',
  change: (pieces) =>
    pieces.map((p) => {
      if (p.id === 'sofa') return { ...p, x: 2000, y: 650, rotation: 0 };
      if (p.id === 'coffee-table') return { ...p, x: 2000, y: 1650, rotation: 0 };
      if (p.id === 'armchair') return { ...p, x: 1300, y: 2750, rotation: 180 };
      if (p.id === 'old-armchair') return { ...p, placed: true, x: 2700, y: 2750, rotation: 180 };
      return p;
    }),
};

const BEDROOM_B: Variant = {
  nameA: 'Bed on the long wall',
  name: 'Bed under the window',
  note: 'The bed moves to the window wall; the wardrobe stays by the door.',
  change: (pieces) =>
    pieces.map((p) => {
      if (p.id === 'bed') return { ...p, x: 1800, y: 1075, rotation: 0 };
      if (p.id === 'bedside-left') return { ...p, x: 775, y: 250, rotation: 0 };
      if (p.id === 'bedside-right') return { ...p, x: 2825, y: 250, rotation: 0 };
      if (p.id === 'chest') return { ...p, x: 3375, y: 1500, rotation: 90 };
      return p;
    }),
};

export async function seedDemoRooms(db: Db, studioId: string, projectId: string): Promise<void> {
  for (const [file, variant] of [['l-shaped-living-room.json', LIVING_B], ['bedroom.json', BEDROOM_B]] as const) {
    const plan = loadPlan(file);
    const { name, ...shell } = plan.room;
    const room = await insertRoom(db, { studioId, projectId, name, shell });
    const docA = optionDocSchema.parse({ pieces: plan.option.pieces, finishes: plan.option.finishes });
    await insertOption(db, { studioId, roomId: room.id, name: variant.nameA, note: plan.option.note ?? '', doc: docA });
    const docB = optionDocSchema.parse({ pieces: variant.change(docA.pieces), finishes: docA.finishes });
    await insertOption(db, { studioId, roomId: room.id, name: variant.name, note: variant.note, doc: docB });
  }
}
