// Take-off, schedules (JSON and CSV) and the comparison of options (findings marked as seen counted
// apart), through the API.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { addMember, createTestApp, signUpStudio, type TestApp } from '../setup/app';
import { csvHeader } from '../../server/features/schedules/schedules.service';
import { checkFit } from '../../shared/analysis/fit';
import { findingKey } from '../../shared/analysis/fit/finding-key';
import { optionDocSchema } from '../../shared/schemas/option';
import { roomShellSchema } from '../../shared/schemas/room';

const CSV_HEADER = csvHeader('GBP');

type Agent = ReturnType<typeof request.agent>;

/** An RFC 4180 reader written apart from the app's writer, so the test reads what a spreadsheet would. */
function parseCsv(text: string): string[][] {
  const records: string[][] = [];
  let record: string[] = [];
  let field = '';
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const c = text[i];
    if (quoted) {
      if (c === '"' && text[i + 1] === '"') {
        field += '"';
        i++;
      } else if (c === '"') quoted = false;
      else field += c;
    } else if (c === '"') quoted = true;
    else if (c === ',') {
      record.push(field);
      field = '';
    } else if (c === '\r' && text[i + 1] === '\n') {
      record.push(field);
      records.push(record);
      record = [];
      field = '';
      i++;
    } else field += c;
  }
  if (field !== '' || record.length > 0) throw new Error('the last record does not end with CRLF');
  return records;
}

let t: TestApp;
let owner: Agent;
let viewer: Agent;
let stranger: Agent;
let projectId: string;
let roomId: string;
let optionA: string;
let optionB: string;
let oakId: string;
let paintId: string;

// 5 m × 4 m, 2.5 m high; a 1 × 2 m door on wall 0 (2 m² off 12.5 m²): net walls 43 m², floor 20 m².
const SHELL = {
  wallHeight: 2500,
  outline: [
    [0, 0],
    [5000, 0],
    [5000, 4000],
    [0, 4000],
  ],
  openings: [{ id: 'd1', type: 'door', wall: 0, offset: 500, width: 1000, height: 2000, hinge: 'start', swing: 'in' }],
};
const at = { y: 2500, depth: 800, height: 800 };
const PIECES_A = [
  {
    id: 'sofa',
    name: 'Sofa, "Linen"',
    x: 2500,
    ...at,
    width: 2000,
    status: 'new',
    price: 1450,
    supplierUrl: 'https://example.com/sofa',
  },
  { id: 'chair-1', name: 'Side chair', x: 800, ...at, width: 500, status: 'new', price: 189.99 },
  { id: 'chair-2', name: 'Side chair', x: 4200, ...at, width: 500, status: 'new', price: 189.99 },
  { id: 'armchair', name: 'Armchair', x: 2500, y: 3500, width: 800, depth: 800, height: 900, status: 'existing', price: 600 },
];

beforeAll(async () => {
  t = createTestApp();
  const a = await signUpStudio(t.app, 'Schedule Studio');
  owner = a.agent;
  viewer = (await addMember(t, owner, 'viewer')).agent;
  stranger = (await signUpStudio(t.app, 'Other Studio')).agent;
  projectId = (await owner.post('/api/projects').send({ name: 'Canal flat', newClient: { name: 'A household' } })).body.project
    .id;
  const room = (await owner.post(`/api/projects/${projectId}/rooms`).send({ name: 'Living room', shell: SHELL })).body;
  roomId = room.room.id;
  optionA = room.options[0].id;
  paintId = (
    await owner
      .post('/api/finishes/paints')
      .send({ name: 'Oat', colourHex: '#e6dcc8', price: 12.5, priceUnit: 'litre', supplier: 'Paint mill', code: 'OAT-1' })
  ).body.finish.id;
  // A photo finish row as processing leaves it; the schedule needs only its name, category and price.
  const { studio_id } = await t.db.selectFrom('finishes').select('studio_id').where('id', '=', paintId).executeTakeFirstOrThrow();
  const oak = await t.db
    .insertInto('finishes')
    .values({
      studio_id,
      kind: 'photo',
      name: 'Oak boards',
      category: 'wood',
      repeat_width_mm: 720,
      repeat_height_mm: 1440,
      price: 40,
      price_unit: 'm2',
      supplier: 'Timber yard',
      code: '=OAK',
      crop: JSON.stringify({ x: 0, y: 0, width: 1, height: 1 }),
      edge_blend: 'none',
      status: 'ready',
      photo_width_px: 8,
      photo_height_px: 8,
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  oakId = oak.id;
  await owner
    .put(`/api/options/${optionA}`)
    .send({ version: 1, name: 'Calm', doc: { pieces: PIECES_A, finishes: { floor: oakId, walls: paintId } } })
    .expect(200);
  optionB = (await owner.post(`/api/rooms/${roomId}/options`).send({ name: 'Bold' })).body.option.id;
  await owner
    .put(`/api/options/${optionB}`)
    .send({
      version: 1,
      doc: {
        pieces: [
          { id: 'bench', name: 'Bench', x: 2500, y: 1000, width: 1500, depth: 400, height: 450, status: 'new', price: 300 },
        ],
        finishes: { walls: paintId, ceiling: paintId },
      },
    })
    .expect(200);
});
afterAll(() => t.close());

describe('GET /api/options/:id/schedule', () => {
  it('lists pieces and finishes with quantities and prices, and the budget', async () => {
    const res = await viewer.get(`/api/options/${optionA}/schedule`);
    expect(res.status).toBe(200);
    expect(res.body.option).toMatchObject({ id: optionA, label: 'Option A · Calm' });
    expect(res.body.room).toEqual({ id: roomId, name: 'Living room' });
    const byName = Object.fromEntries(res.body.schedule.lines.map((l: { name: string }) => [l.name, l]));
    expect(byName['Side chair']).toMatchObject({ quantity: 2, total: 379.98 });
    expect(byName['Armchair']).toMatchObject({ status: 'existing', total: 0 });
    // 20 m² + 10 % = 22 m² × 40 = 880. 43 m² × 2 coats ÷ 10 m²/L = 8.6 L; within 0.75 L over, the fewest
    // tins are four: 5 + 2.5 + 2 × 0.75 = 9 L (5 + 3 × 1 + 0.75 = 8.75 L takes five): × 12.50 = 112.50.
    expect(byName['Oak boards']).toMatchObject({ quantity: 22, total: 880, supplier: 'Timber yard' });
    expect(byName['Oat']).toMatchObject({
      quantityUnit: 'L',
      quantity: 9,
      quantityNote: '5 L + 2.5 L + 2 × 0.75 L for 8.6 L',
      total: 112.5,
    });
    // 1829.98 + 880 + 112.50
    expect(res.body.schedule.totals).toMatchObject({
      newPiecesCost: 1829.98,
      finishesCost: 992.5,
      budget: 2822.48,
      newPieceCount: 3,
      existingPieceCount: 1,
    });
  });

  it('follows the coats, coverage, waste and box size asked for', async () => {
    const res = await owner
      .get(`/api/options/${optionA}/schedule`)
      .query({ coats: 1, coverage: 8.6, waste: 5, unitM2: `${oakId}:2.2` });
    expect(res.status).toBe(200);
    const byName = Object.fromEntries(res.body.schedule.lines.map((l: { name: string }) => [l.name, l]));
    // 43 m² ÷ 8.6 = 5 L exactly; 21 m² ÷ 2.2 = 9.55 → 10 boxes = 22 m²
    expect(byName['Oat']).toMatchObject({ quantity: 5, quantityNote: '5 L for 5 L' });
    expect(byName['Oak boards']).toMatchObject({ quantity: 22, quantityNote: '10 × 2.2 m² for 21 m² with 5 % waste' });
    expect(res.body.settings).toEqual({ coats: 1, coverageM2PerL: 8.6, wastePercent: 5, unitCoverageM2: { [oakId]: 2.2 } });
  });

  it('refuses settings no paint job has, naming the field', async () => {
    const res = await owner.get(`/api/options/${optionA}/schedule`).query({ coats: 0 });
    expect(res.status).toBe(400);
    expect(res.body.error).toMatchObject({ code: 'invalid', message: 'At least 1 coat.' });
    const box = await owner.get(`/api/options/${optionA}/schedule`).query({ unitM2: 'just-a-word' });
    expect(box.status).toBe(400);
    expect(box.body.error.fields.unitM2).toMatch(/finishId:m2/);
    expect((await owner.get('/api/options/not-an-id/schedule')).status).toBe(400);
  });

  it('answers 404 for another studio’s option and for an option that is not there', async () => {
    expect((await stranger.get(`/api/options/${optionA}/schedule`)).status).toBe(404);
    expect((await stranger.get(`/api/options/${optionA}/schedule.csv`)).status).toBe(404);
    expect((await owner.get('/api/options/00000000-0000-4000-8000-000000000000/schedule')).status).toBe(404);
  });
});

describe('GET /api/options/:id/schedule.csv', () => {
  it('downloads RFC 4180 CSV that parses back to the schedule', async () => {
    const res = await viewer
      .get(`/api/options/${optionA}/schedule.csv`)
      .buffer(true)
      .parse((r, done) => {
        let text = '';
        r.setEncoding('utf8');
        r.on('data', (chunk: string) => {
          text += chunk;
        });
        r.on('end', () => done(null, text));
      });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv; charset=utf-8/);
    expect(res.headers['content-disposition']).toBe('attachment; filename="canal-flat-living-room-option-a-schedule.csv"');
    const text = res.body as string;
    expect(text.startsWith('\uFEFF')).toBe(true);
    const records = parseCsv(text.slice(1));
    expect(records[0]).toEqual(CSV_HEADER);
    expect(new Set(records.map((r) => r.length))).toEqual(new Set([CSV_HEADER.length]));
    const col = (name: string) => CSV_HEADER.indexOf(name);
    const row = (name: string) => records.find((r) => r[col('Name')] === name)!;
    // A name with a comma and quotes survives the round trip.
    expect(row('Sofa, "Linen"')).toEqual(
      expect.arrayContaining(['Piece', 'new', '200 × 80 × 80 cm', '1', 'pcs', '1450.00', 'https://example.com/sofa']),
    );
    expect(row('Side chair')[col('Total (GBP)')]).toBe('379.98');
    expect(row('Armchair')[col('Total (GBP)')]).toBe('0.00');
    // A code that looks like a formula is kept as text.
    expect(row('Oak boards')[col('Code')]).toBe("'=OAK");
    expect(row('Oat')).toEqual([
      'Finish',
      'Oat',
      '',
      'Walls 1, 2, 3, 4 · 2 coats at 10 m²/L',
      '9',
      'L',
      '5 L + 2.5 L + 2 × 0.75 L for 8.6 L',
      '12.50',
      'L',
      '112.50',
      'Paint mill',
      'OAT-1',
      '',
    ]);
    expect(records.slice(-3).map((r) => [r[col('Name')], r[col('Total (GBP)')]])).toEqual([
      ['New pieces', '1829.98'],
      ['Finishes', '992.50'],
      ['Budget', '2822.48'],
    ]);
  });
});

describe('GET /api/projects/:projectId/takeoff', () => {
  it('counts each room with its first option, or the one asked for, and totals the project', async () => {
    const res = await viewer.get(`/api/projects/${projectId}/takeoff`);
    expect(res.status).toBe(200);
    const [room] = res.body.rooms;
    expect(room.options.map((o: { label: string }) => o.label)).toEqual(['Option A · Calm', 'Option B · Bold']);
    expect(room.counted.id).toBe(optionA);
    expect(room.takeoff.paints[0]).toMatchObject({ finishId: paintId, areaM2: 43, litres: 8.6, tins: { totalL: 9 } });
    expect(room.takeoff.coverings[0]).toMatchObject({ finishId: oakId, orderAreaM2: 22, units: null });
    expect(res.body.totals).toMatchObject({ floorAreaM2: 20, paints: [{ litres: 8.6, rooms: ['Living room'] }] });

    const b = await viewer.get(`/api/projects/${projectId}/takeoff`).query({ options: optionB });
    // Walls 43 m² + ceiling 20 m² = 63 m² × 2 ÷ 10 = 12.6 L; no floor finish: 22 m² to order, unassigned.
    expect(b.body.rooms[0]).toMatchObject({
      counted: { id: optionB },
      takeoff: { paints: [{ litres: 12.6 }], coverings: [], bare: { floorOrderM2: 22 } },
    });
  });

  it('refuses a counted option that is not an id, and another studio’s project', async () => {
    const bad = await owner.get(`/api/projects/${projectId}/takeoff`).query({ options: 'first' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.message).toBe('Each counted option must be an option id.');
    expect((await stranger.get(`/api/projects/${projectId}/takeoff`)).status).toBe(404);
  });
});

describe('GET /api/projects/:projectId/compare', () => {
  it('puts the options side by side, with the client’s latest choice', async () => {
    const before = await viewer.get(`/api/projects/${projectId}/compare`);
    expect(before.status).toBe(200);
    const [room] = before.body.rooms;
    expect(room.chosenOptionId).toBeNull();
    const [a, b] = room.options;
    expect(a).toMatchObject({ id: optionA, budget: 2822.48, newPieceCount: 3, chosen: false });
    expect(b).toMatchObject({ id: optionB, newPieceCount: 1, findingCount: 0 });
    // Bench 1.5 × 0.4 m on 20 m² → 97 % free.
    expect(b.freeFloorPercent).toBeCloseTo(97, 0);
    expect(a.freeFloorPercent).toBeLessThan(b.freeFloorPercent);

    // The client chooses B through a presentation (the choice row as the client route writes it).
    const p = await owner
      .post(`/api/projects/${projectId}/presentations`)
      .send({ rooms: [{ roomId, optionIds: [optionA, optionB] }] });
    expect(p.status).toBe(201);
    await t.db
      .insertInto('choices')
      .values({ presentation_id: p.body.presentation.id, room_id: roomId, option_id: optionB, comment: '' })
      .execute();
    const after = await viewer.get(`/api/projects/${projectId}/compare`);
    expect(after.body.rooms[0].chosenOptionId).toBe(optionB);
    expect(after.body.rooms[0].options.map((o: { chosen: boolean }) => o.chosen)).toEqual([false, true]);
    // The take-off now counts the chosen option.
    expect((await viewer.get(`/api/projects/${projectId}/takeoff`)).body.rooms[0].counted.id).toBe(optionB);

    // A withdrawn presentation's choice no longer stands.
    await owner.post(`/api/presentations/${p.body.presentation.id}/withdraw`).expect(200);
    expect((await viewer.get(`/api/projects/${projectId}/compare`)).body.rooms[0].chosenOptionId).toBeNull();
  });

  it('answers 404 to another studio', async () => {
    expect((await stranger.get(`/api/projects/${projectId}/compare`)).status).toBe(404);
  });

  it('counts the findings marked as seen apart from the open ones, from the saved option', async () => {
    const project = (await owner.post('/api/projects').send({ name: 'Seen flat', newClient: { name: 'B household' } })).body
      .project.id;
    const room = (await owner.post(`/api/projects/${project}/rooms`).send({ name: 'Study', shell: SHELL })).body;
    const option = room.options[0];
    // Two pairs of chairs, each pair on one spot: at least two findings.
    const chair = { width: 500, depth: 500, height: 800, status: 'new' };
    const pieces = [
      { id: 'a', name: 'Chair', x: 1500, y: 2000, ...chair },
      { id: 'b', name: 'Chair', x: 1500, y: 2000, ...chair },
      { id: 'c', name: 'Chair', x: 3500, y: 2000, ...chair },
      { id: 'd', name: 'Chair', x: 3500, y: 2000, ...chair },
    ];
    const findings = checkFit(roomShellSchema.parse(SHELL), optionDocSchema.parse({ pieces }).pieces);
    expect(findings.length).toBeGreaterThanOrEqual(2);
    const seen = [
      { key: findingKey(findings[0]!), note: 'Two chairs stacked, on purpose', at: '2026-12-03T14:00:00.000Z' },
      // A finding that no longer occurs: kept in the document, not counted.
      { key: findingKey({ kind: 'unreachable', pieces: ['gone'], openings: [] }), note: '', at: '2026-12-03T14:00:00.000Z' },
    ];
    const saved = await owner.put(`/api/options/${option.id}`).send({ version: option.version, doc: { pieces, seen } });
    expect(saved.status).toBe(200);
    expect(saved.body.option.doc.seen).toEqual(seen);

    const compared = (await viewer.get(`/api/projects/${project}/compare`)).body.rooms[0].options[0];
    expect(compared).toMatchObject({ findingCount: findings.length, seenFindingCount: 1 });

    const tooLong = await owner
      .put(`/api/options/${option.id}`)
      .send({ version: saved.body.option.version, doc: { pieces, seen: [{ ...seen[0], note: 'x'.repeat(201) }] } });
    expect(tooLong.status).toBe(400);
    expect(Object.keys(tooLong.body.error.fields ?? {})).toContain('doc.seen[0].note');
  });
});
