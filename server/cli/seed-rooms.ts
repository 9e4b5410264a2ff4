// The demo flat's rooms: the L-shaped living room and the bedroom from assets/plans, each with a
// second option that moves and swaps pieces, so the client has two proposals to compare.
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import type { Db } from '../db/database';
import { readPlanFile, type PlanFile } from '../../shared/schemas/plan-file';
import { optionDocSchema, type OptionDocInput, type Piece } from '../../shared/schemas/option';
import { insertOption, insertRoom } from '../features/rooms/rooms.repository';

const PLANS = resolve(import.meta.dirname, '../../assets/plans');

function loadPlan(file: string): PlanFile {
  const read = readPlanFile(readFileSync(resolve(PLANS, file), 'utf8'));
  if (!read.ok) throw new Error(`demo plan ${file} is invalid: ${read.errors.join('; ')}`);
  return read.plan;
}

type Looks = (f: Record<string, string>) => {
  finishes: OptionDocInput['finishes'];
  pieceFinishes?: Record<string, string>;
  pieceAccents?: Record<string, string>;
};
type Variant = { nameA: string; name: string; note: string; change: (pieces: Piece[]) => Piece[]; looksA: Looks; looksB: Looks };

const LIVING_B: Variant = {
  nameA: 'Sofa by the wall',
  looksA: (f) => ({
    finishes: { floor: f['Oak boards, natural oil'], walls: f['Morning oat'] },
    pieceFinishes: { sofa: f['Washed linen'] },
    pieceAccents: { 'coffee-table': f['Oak boards, natural oil'] },
  }),
  looksB: (f) => ({
    finishes: { floor: f['Oak boards, natural oil'], walls: f['Sage hall'], wallOverrides: { '0': f['Deep harbour'] } },
    pieceFinishes: { sofa: f['Washed linen'] },
    pieceAccents: { 'coffee-table': f['Oak boards, natural oil'] },
  }),
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
  looksA: (f) => ({
    finishes: { floor: f['Oak boards, natural oil'], walls: f['Morning oat'] },
    pieceFinishes: { bed: f['Washed linen'] },
  }),
  looksB: (f) => ({
    finishes: { floor: f['Grey stone tile'], walls: f['Morning oat'], wallOverrides: { '2': f['Sprig wallpaper'] } },
    pieceFinishes: { bed: f['Washed linen'] },
  }),
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

/** Puts each look's finishes on the option and on its pieces, and the demo models on the pieces they were made for. */
function dressed(pieces: Piece[], looks: ReturnType<Looks>, modelIds: Record<string, string>) {
  return optionDocSchema.parse({
    pieces: pieces.map((p) => {
      const main = looks.pieceFinishes?.[p.id];
      const accent = looks.pieceAccents?.[p.id];
      const model = modelIds[p.id];
      return {
        ...p,
        ...(main ? { finishId: main } : {}),
        ...(accent ? { accentFinishId: accent } : {}),
        ...(model ? { modelId: model, modelWearsFinishes: true } : {}),
      };
    }),
    // A look naming a finish the studio lacks just leaves that surface plain (JSON drops undefined ids).
    finishes: JSON.parse(JSON.stringify(looks.finishes ?? {})),
  });
}

export async function seedDemoRooms(
  db: Db,
  studioId: string,
  projectId: string,
  finishIds: Record<string, string> = {},
  /** Piece models by the demo piece id that wears them (the living room's sofa and armchair). */
  modelIds: Record<string, string> = {},
): Promise<{ roomId: string; optionIds: string[] }[]> {
  const made: { roomId: string; optionIds: string[] }[] = [];
  for (const [file, variant] of [
    ['l-shaped-living-room.json', LIVING_B],
    ['bedroom.json', BEDROOM_B],
  ] as const) {
    const plan = loadPlan(file);
    const { name, ...shell } = plan.room;
    const room = await insertRoom(db, { studioId, projectId, name, shell });
    const base = optionDocSchema.parse({ pieces: plan.option.pieces });
    const docA = dressed(base.pieces, variant.looksA(finishIds), modelIds);
    const a = await insertOption(db, { studioId, roomId: room.id, name: variant.nameA, note: plan.option.note ?? '', doc: docA });
    const docB = dressed(variant.change(base.pieces), variant.looksB(finishIds), modelIds);
    const b = await insertOption(db, { studioId, roomId: room.id, name: variant.name, note: variant.note, doc: docB });
    made.push({ roomId: room.id, optionIds: [a.id, b.id] });
  }
  return made;
}
