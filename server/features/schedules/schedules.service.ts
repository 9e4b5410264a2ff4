// Gathers a project's rooms, options, finishes and choices, and hands them to the shared take-off,
// schedule and comparison functions, so the page, the CSV and the analysis agree.
import type { Db } from '../../db/database';
import { notFound } from '../../http/errors';
import { getOption, getRoom, listOptions, listRooms, toRoom } from '../rooms/rooms.repository';
import { latestChoices } from './schedules.repository';
import { finishesByIds } from '../finishes/finishes.service';
import { projectOrThrow as projectSummaryOrThrow } from '../projects/projects.service';
import { studioMoney } from '../studio/studios.repository';
import { DEFAULT_MONEY } from '../../../shared/units/money';
import type { Finish } from '../../../shared/schemas/finish';
import { isWebLink, type OptionDoc } from '../../../shared/schemas/option';
import { optionFinishIds } from '../../../shared/finishes/option-surfaces';
import { optionLabel, type OptionRecord, type RoomRecord } from '../../../shared/schemas/room-api';
import { QUANTITY_UNIT_LABELS, buildSchedule } from '../../../shared/analysis/schedule-lines';
import { compareOption } from '../../../shared/analysis/compare';
import { projectTakeoff, roomTakeoff, type FinishInfo, type FinishLookup } from '../../../shared/analysis/finish-takeoff';
import { pieceSizeText } from '../../../shared/units/piece-size';
import { type CompareAnswer, type ProjectTakeoffAnswer, type ScheduleAnswer } from '../../../shared/schemas/schedule-api';
import { type TakeoffSettings } from '../../../shared/analysis/takeoff-settings';
import { toCsv, type CsvCell } from './csv';

interface RoomWithOptions {
  room: RoomRecord;
  options: OptionRecord[];
}

async function projectOrThrow(db: Db, studioId: string, projectId: string) {
  const found = await projectSummaryOrThrow(db, studioId, projectId);
  return { id: found.id, name: found.name, clientName: found.client.name };
}

async function roomsOf(db: Db, studioId: string, projectId: string): Promise<RoomWithOptions[]> {
  const rooms = (await listRooms(db, studioId, projectId)).map(toRoom);
  return Promise.all(rooms.map(async (room) => ({ room, options: await listOptions(db, studioId, room.id) })));
}

export function toFinishInfo(f: Finish): FinishInfo {
  const base = { id: f.id, name: f.name, supplier: f.supplier, code: f.code, price: f.price, priceUnit: f.priceUnit };
  return f.kind === 'paint'
    ? { ...base, kind: 'paint', colourHex: f.colourHex }
    : { ...base, kind: 'photo', category: f.category, swatchUrl: f.files.swatchUrl };
}

async function lookupFor(db: Db, studioId: string, docs: readonly OptionDoc[]): Promise<FinishLookup> {
  const finishes = await finishesByIds(db, studioId, docs.flatMap(optionFinishIds));
  return new Map(finishes.map((f) => [f.id, toFinishInfo(f)]));
}

const refOf = (o: OptionRecord) => ({ id: o.id, label: optionLabel(o.position, o.name) });
// Options are listed by position; the label letter follows the list order, as on the room page.
const withPositions = (options: OptionRecord[]) => options.map((o, position) => ({ ...o, position }));

/** A project with its rooms and their options, the client's latest choice per room, and every finish the options use. */
async function projectRooms(db: Db, studioId: string, projectId: string) {
  const project = await projectOrThrow(db, studioId, projectId);
  const [rooms, choices] = await Promise.all([roomsOf(db, studioId, projectId), latestChoices(db, studioId, projectId)]);
  const finishes = await lookupFor(
    db,
    studioId,
    rooms.flatMap((r) => r.options.map((o) => o.doc)),
  );
  return { project, rooms, choices, finishes };
}

/**
 * The project's take-off: each room counted with one option (the one asked for, else the client's
 * choice, else the first), and the totals over the rooms.
 */
export async function projectTakeoffAnswer(
  db: Db,
  studioId: string,
  projectId: string,
  settings: TakeoffSettings,
  countedIds: readonly string[],
): Promise<ProjectTakeoffAnswer> {
  const { project, rooms, choices, finishes } = await projectRooms(db, studioId, projectId);
  const asked = new Set(countedIds);
  const answered = rooms.map(({ room, options }) => {
    const listed = withPositions(options);
    const chosenOptionId = choices.get(room.id) ?? null;
    const counted = listed.find((o) => asked.has(o.id)) ?? listed.find((o) => o.id === chosenOptionId) ?? listed[0] ?? null;
    return {
      id: room.id,
      name: room.name,
      options: listed.map(refOf),
      counted: counted && refOf(counted),
      chosenOptionId,
      takeoff: counted && roomTakeoff(room.shell, counted.doc.finishes, finishes, settings),
    };
  });
  const totals = projectTakeoff(
    answered.flatMap((r) => (r.takeoff ? [{ name: r.name, takeoff: r.takeoff }] : [])),
    settings,
  );
  return { project: { id: project.id, name: project.name }, settings, rooms: answered, totals };
}

/** One option's schedule in its room and project. */
export async function scheduleAnswer(
  db: Db,
  studioId: string,
  optionId: string,
  settings: TakeoffSettings,
): Promise<ScheduleAnswer> {
  const option = await getOption(db, studioId, optionId);
  if (!option) throw notFound('That option');
  const room = await getRoom(db, studioId, option.roomId);
  if (!room) throw notFound('That option');
  const [project, siblings, finishes] = await Promise.all([
    projectOrThrow(db, studioId, room.projectId),
    listOptions(db, studioId, room.id),
    lookupFor(db, studioId, [option.doc]),
  ]);
  const position = Math.max(
    0,
    siblings.findIndex((o) => o.id === option.id),
  );
  return {
    project: { id: project.id, name: project.name },
    client: { name: project.clientName },
    money: await studioMoney(db, studioId),
    room: { id: room.id, name: room.name },
    option: { id: option.id, label: optionLabel(position, option.name), note: option.note },
    settings,
    schedule: buildSchedule(room.shell, option.doc, finishes, settings),
  };
}

/** Lets other requests run: the rest of the work continues after the event loop's pending I/O. */
const yieldToOthers = () => new Promise<void>((resolve) => setImmediate(resolve));

/**
 * Every room's options side by side: budget, new pieces, findings, free floor, the client's choice.
 * Each option's fit check is a slice of work of its own: between two options the event loop
 * answers whatever else is waiting, so a large project never holds up other requests for long.
 */
export async function compareAnswer(
  db: Db,
  studioId: string,
  projectId: string,
  settings: TakeoffSettings,
): Promise<CompareAnswer> {
  const { project, rooms, choices, finishes } = await projectRooms(db, studioId, projectId);
  const answered: CompareAnswer['rooms'] = [];
  for (const { room, options } of rooms) {
    const chosenOptionId = choices.get(room.id) ?? null;
    const compared: CompareAnswer['rooms'][number]['options'] = [];
    for (const o of withPositions(options)) {
      await yieldToOthers();
      compared.push({ ...refOf(o), ...compareOption(room.shell, o.doc, finishes, settings), chosen: o.id === chosenOptionId });
    }
    answered.push({ id: room.id, name: room.name, chosenOptionId, options: compared });
  }
  return { project: { id: project.id, name: project.name }, money: await studioMoney(db, studioId), settings, rooms: answered };
}

/** The columns, the money ones naming the studio's currency ("Total (GBP)"). */
export const csvHeader = (currency: string) => [
  'Section',
  'Name',
  'Status',
  'Size or surfaces',
  'Quantity',
  'Unit',
  'Made up of',
  `Unit price (${currency})`,
  'Price per',
  `Total (${currency})`,
  'Supplier',
  'Code',
  'Link',
];

const money = (v: number | null) => (v === null ? null : v.toFixed(2));

/** The schedule as CSV: one record per line, then the totals; money with two decimals, its currency in the header. */
export function scheduleCsv(answer: ScheduleAnswer): string {
  const { lines, totals } = answer.schedule;
  const records: CsvCell[][] = [csvHeader((answer.money ?? DEFAULT_MONEY).currency)];
  for (const l of lines) {
    records.push([
      l.section === 'piece' ? 'Piece' : 'Finish',
      l.name,
      l.status,
      l.sizeMm ? [pieceSizeText(l.sizeMm), l.detail].filter(Boolean).join(' · ') : l.detail,
      l.quantity,
      QUANTITY_UNIT_LABELS[l.quantityUnit],
      l.quantityNote,
      money(l.unitPrice),
      l.priceUnit && QUANTITY_UNIT_LABELS[l.priceUnit],
      l.status === 'existing' ? '0.00' : money(l.total),
      l.supplier,
      l.code,
      // Only web links reach the file, whatever an older row may hold.
      l.supplierUrl && isWebLink(l.supplierUrl) ? l.supplierUrl : null,
    ]);
  }
  const totalRow = (name: string, value: number): CsvCell[] => [
    'Total',
    name,
    null,
    null,
    null,
    null,
    null,
    null,
    null,
    money(value),
  ];
  records.push(
    totalRow('New pieces', totals.newPiecesCost),
    totalRow('Finishes', totals.finishesCost),
    totalRow('Budget', totals.budget),
  );
  return toCsv(records);
}
