// Caps and bounds on what a request may hold: corners, openings, pieces, sizes, numbers, text,
// links, rooms per project and options per room. Every refusal is a 4xx naming the field, and
// nothing of a refused request is kept.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import request from 'supertest';
import { sql } from 'kysely';
import { addMember, createTestApp, inviteToken, signUpStudio, uniqueEmail, type TestApp } from '../setup/app';
import { combOutline, starOutline } from '../../shared/geometry/test-outlines';
import { compareAnswer } from '../../server/features/schedules/schedules.service';
import { takeoffSettingsSchema } from '../../shared/analysis/takeoff-settings';

type Agent = ReturnType<typeof request.agent>;

let t: TestApp;
let owner: Agent;
let studioId: string;
beforeAll(async () => {
  t = createTestApp();
  owner = (await signUpStudio(t.app, 'Limits Studio')).agent;
  studioId = (await owner.get('/api/auth/me')).body.studio.id;
});
afterAll(() => t.close());

const RECT = {
  outline: [
    [0, 0],
    [4200, 0],
    [4200, 3600],
    [0, 3600],
  ],
};
const example = JSON.parse(readFileSync(resolve(import.meta.dirname, '../../assets/plans/living-room.json'), 'utf8'));
const piece = (extra: Record<string, unknown> = {}) => ({
  id: 'sofa',
  name: 'Sofa',
  x: 2100,
  y: 1800,
  width: 2000,
  depth: 900,
  height: 850,
  status: 'new',
  ...extra,
});
const square = (sideMm: number, at = 0) => ({
  outline: [
    [at, at],
    [at + sideMm, at],
    [at + sideMm, at + sideMm],
    [at, at + sideMm],
  ],
});

async function newProject(agent: Agent = owner): Promise<string> {
  return (await agent.post('/api/projects').send({ name: 'Limits project', newClient: { name: 'A client' } })).body.project.id;
}

async function roomCount(projectId: string): Promise<number> {
  return (await owner.get(`/api/projects/${projectId}/rooms`)).body.rooms.length;
}

async function newRoom(projectId: string) {
  const res = await owner.post(`/api/projects/${projectId}/rooms`).send({ name: 'Study', shell: RECT });
  expect(res.status).toBe(201);
  return { roomId: res.body.room.id as string, optionId: res.body.options[0].id as string };
}

/** Sends raw JSON text, for numbers JSON.stringify cannot write (1e400 reads back as Infinity). */
const rawJson = (req: request.Test, text: string) => req.set('Content-Type', 'application/json').send(text);

describe('corners, openings and pieces are capped by the schema', () => {
  it('refuses a 4,000-corner outline at once, naming the field, and keeps nothing', async () => {
    const projectId = await newProject();
    const outline = Array.from({ length: 4000 }, (_, i) => [
      Math.round(5000 * Math.cos((2 * Math.PI * i) / 4000)),
      Math.round(5000 * Math.sin((2 * Math.PI * i) / 4000)),
    ]);
    const res = await owner.post(`/api/projects/${projectId}/rooms`).send({ name: 'Drum', shell: { outline } });
    expect(res.status).toBe(400);
    expect(res.body.error.fields['shell.outline']).toBe('has more than 200 corners (a room has at most 200)');
    expect(await roomCount(projectId)).toBe(0);
  });

  it('takes 200 corners, refuses 201, on create, save and import alike', async () => {
    const projectId = await newProject();
    const created = await owner
      .post(`/api/projects/${projectId}/rooms`)
      .send({ name: 'Comb', shell: { outline: combOutline(200) } });
    expect(created.status).toBe(201);
    const tooMany = { outline: [...combOutline(200), [-100, -500]] };
    const create = await owner.post(`/api/projects/${projectId}/rooms`).send({ name: 'Comb', shell: tooMany });
    expect(create.status).toBe(400);
    expect(Object.keys(create.body.error.fields)).toEqual(['shell.outline']);
    const save = await owner.put(`/api/rooms/${created.body.room.id}`).send({ version: 1, shell: tooMany });
    expect(save.status).toBe(400);
    expect(save.body.error.fields['shell.outline']).toMatch(/at most 200/);
    const imported = await owner
      .post(`/api/projects/${projectId}/rooms/import`)
      .send({ ...example, room: { ...example.room, outline: tooMany.outline, openings: [] } });
    expect(imported.status).toBe(400);
    expect(imported.body.error.message).toBe(
      'This plan file cannot be read: room.outline: has more than 200 corners (a room has at most 200)',
    );
    expect(await roomCount(projectId)).toBe(1);
  });

  it('lists at most 20 crossings of a 200-corner star', async () => {
    const projectId = await newProject();
    const res = await owner.post(`/api/projects/${projectId}/rooms`).send({ name: 'Star', shell: { outline: starOutline(200) } });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toBe('shell.outline: wall 0 crosses wall 2');
  });

  it('refuses 61 openings and 401 pieces', async () => {
    const projectId = await newProject();
    // 61 windows of 100 mm on the 25.2 m top wall of a 25.2 × 3.6 m room.
    const long = {
      outline: [
        [0, 0],
        [25_200, 0],
        [25_200, 3600],
        [0, 3600],
      ],
    };
    const windows = (count: number) =>
      Array.from({ length: count }, (_, i) => ({
        id: `w${i}`,
        type: 'window',
        wall: 0,
        offset: 100 + i * 400,
        width: 100,
        height: 1000,
        sill: 900,
      }));
    expect(
      (await owner.post(`/api/projects/${projectId}/rooms`).send({ name: 'Gallery', shell: { ...long, openings: windows(60) } }))
        .status,
    ).toBe(201);
    const over = await owner
      .post(`/api/projects/${projectId}/rooms`)
      .send({ name: 'Gallery', shell: { ...long, openings: windows(61) } });
    expect(over.status).toBe(400);
    expect(over.body.error.fields['shell.openings']).toBe('has more than 60 openings (a room has at most 60)');

    const { optionId } = await newRoom(projectId);
    const pieces = (count: number) => Array.from({ length: count }, (_, i) => piece({ id: `p${i}`, width: 100, depth: 100 }));
    const many = await owner.put(`/api/options/${optionId}`).send({ version: 1, doc: { pieces: pieces(401) } });
    expect(many.status).toBe(400);
    expect(many.body.error.fields['doc.pieces']).toBe('has more than 400 pieces (an option has at most 400)');
    expect((await owner.put(`/api/options/${optionId}`).send({ version: 1, doc: { pieces: pieces(400) } })).status).toBe(200);
    const file = await owner
      .post(`/api/projects/${projectId}/rooms/import`)
      .send({ ...example, option: { name: 'Full', pieces: pieces(401) } });
    expect(file.status).toBe(400);
    expect(file.body.error.fields['option.pieces']).toMatch(/at most 400/);
  });
});

describe('the outline and every number are bounded', () => {
  it('refuses an outline wider than 50 m, a floor over 1,000 m² and corners beyond ±100 m', async () => {
    const projectId = await newProject();
    const wide = await owner.post(`/api/projects/${projectId}/rooms`).send({
      name: 'Hall',
      shell: {
        outline: [
          [0, 0],
          [60_000, 0],
          [60_000, 10_000],
          [0, 10_000],
        ],
      },
    });
    expect(wide.status).toBe(400);
    expect(wide.body.error.fields['shell.outline']).toBe('is 60,000 mm × 10,000 mm, more than 50 m × 50 m');
    const big = await owner.post(`/api/projects/${projectId}/rooms`).send({ name: 'Hall', shell: square(40_000) });
    expect(big.status).toBe(400);
    expect(big.body.error.fields['shell.outline']).toBe('encloses 1,600 m², more than 1,000 m²');
    const far = await owner.post(`/api/projects/${projectId}/rooms`).send({ name: 'Far', shell: square(4000, 150_000) });
    expect(far.status).toBe(400);
    expect(far.body.error.fields['shell.outline[0][0]']).toBe('must be at most 100,000 mm');
    // 31.6 m square: 999 m², at the edge but inside.
    expect((await owner.post(`/api/projects/${projectId}/rooms`).send({ name: 'Barn', shell: square(31_600) })).status).toBe(201);
    expect(await roomCount(projectId)).toBe(1);
  });

  it('refuses 1e300 and numbers JSON reads as Infinity, so compare keeps working for the project', async () => {
    const projectId = await newProject();
    const { roomId, optionId } = await newRoom(projectId);
    const huge = await owner.put(`/api/rooms/${roomId}`).send({
      version: 1,
      shell: {
        outline: [
          [0, 0],
          [1e300, 0],
          [1e300, 1e300],
          [0, 1e300],
        ],
      },
    });
    expect(huge.status).toBe(400);
    expect(huge.body.error.fields['shell.outline[1][0]']).toBe('must be at most 100,000 mm');
    const infinite = await rawJson(
      owner.put(`/api/rooms/${roomId}`),
      `{"version":1,"shell":{"wallHeight":1e400,"outline":[[0,0],[4200,0],[4200,3600],[0,3600]]}}`,
    );
    expect(infinite.status).toBe(400);
    expect(Object.keys(infinite.body.error.fields)).toEqual(['shell.wallHeight']);
    const far = await owner.put(`/api/options/${optionId}`).send({ version: 1, doc: { pieces: [piece({ x: 1e300 })] } });
    expect(far.status).toBe(400);
    expect(far.body.error.fields['doc.pieces[0].x']).toBe('must be at most 100,000 mm');
    const compare = await owner.get(`/api/projects/${projectId}/compare`);
    expect(compare.status).toBe(200);
    expect(compare.body.rooms[0].options[0].freeFloorPercent).toBe(100);
  });

  it('bounds every number of a room, its openings and its pieces', async () => {
    const projectId = await newProject();
    const { roomId, optionId } = await newRoom(projectId);
    const door = { id: 'd1', type: 'door', wall: 0, offset: 300, width: 820, height: 2040, hinge: 'start', swing: 'in' };
    const shells: [Record<string, unknown>, string][] = [
      [{ ...RECT, wallHeight: 1e9 }, 'shell.wallHeight'],
      [{ ...RECT, wallThickness: 50_000 }, 'shell.wallThickness'],
      [{ ...RECT, wallThicknesses: [100, 1e12] }, 'shell.wallThicknesses[1]'],
      [{ ...RECT, openings: [{ ...door, wall: 4_000_000_000 }] }, 'shell.openings[0].wall'],
      [{ ...RECT, openings: [{ ...door, offset: 1e300 }] }, 'shell.openings[0].offset'],
      [{ ...RECT, openings: [{ ...door, height: 1e300 }] }, 'shell.openings[0].height'],
      [
        { ...RECT, openings: [{ id: 'w', type: 'window', wall: 1, offset: 300, width: 900, height: 900, sill: 1e300 }] },
        'shell.openings[0].sill',
      ],
    ];
    for (const [shell, field] of shells) {
      const res = await owner.put(`/api/rooms/${roomId}`).send({ version: 1, shell });
      expect(res.status, field).toBe(400);
      expect(Object.keys(res.body.error.fields), field).toEqual([field]);
    }
    const pieces: [Record<string, unknown>, string][] = [
      [{ width: 1e300 }, 'width'],
      [{ depth: 90_000 }, 'depth'],
      [{ height: 1e9 }, 'height'],
      [{ y: -1e300 }, 'y'],
      [{ rotation: 1e300 }, 'rotation'],
      [{ elevation: 1e300 }, 'elevation'],
      [{ price: 1e300 }, 'price'],
    ];
    for (const [extra, field] of pieces) {
      const res = await owner.put(`/api/options/${optionId}`).send({ version: 1, doc: { pieces: [piece(extra)] } });
      expect(res.status, field).toBe(400);
      expect(Object.keys(res.body.error.fields), field).toEqual([`doc.pieces[0].${field}`]);
    }
    expect((await owner.get(`/api/rooms/${roomId}`)).body.room.version).toBe(1);
  });
});

describe('rooms per project and options per room', () => {
  it('refuses a 61st room on create and import, even when created in parallel', async () => {
    const projectId = await newProject();
    // 58 rooms written straight to the table, as the API would, to keep the test short.
    await t.db
      .insertInto('rooms')
      .values(
        Array.from({ length: 58 }, (_, i) => ({
          studio_id: studioId,
          project_id: projectId,
          name: `Room ${i}`,
          shell: sql`${JSON.stringify({ ...RECT, wallHeight: 2600, wallThickness: 100, openings: [] })}::jsonb`,
          position: i,
        })),
      )
      .execute();
    const racing = await Promise.all(
      Array.from({ length: 5 }, () => owner.post(`/api/projects/${projectId}/rooms`).send({ name: 'Spare', shell: RECT })),
    );
    expect(racing.map((r) => r.status).sort()).toEqual([201, 201, 409, 409, 409]);
    expect(racing.find((r) => r.status === 409)!.body.error).toMatchObject({
      code: 'too_many_rooms',
      message: 'A project holds at most 60 rooms. Delete one before adding another.',
    });
    const imported = await owner.post(`/api/projects/${projectId}/rooms/import`).send(example);
    expect(imported.status).toBe(409);
    expect(await roomCount(projectId)).toBe(60);
  });

  it('refuses a 13th option on add and on duplicate', async () => {
    const projectId = await newProject();
    const { roomId, optionId } = await newRoom(projectId);
    for (let i = 1; i < 12; i++)
      expect((await owner.post(`/api/rooms/${roomId}/options`).send({ name: `O${i}` })).status).toBe(201);
    const add = await owner.post(`/api/rooms/${roomId}/options`).send({ name: 'One more' });
    expect(add.status).toBe(409);
    expect(add.body.error).toMatchObject({
      code: 'too_many_options',
      message: 'A room holds at most 12 options. Delete one before adding another.',
    });
    expect((await owner.post(`/api/rooms/${roomId}/options`).send({ fromOptionId: optionId })).status).toBe(409);
    expect((await owner.get(`/api/rooms/${roomId}`)).body.options).toHaveLength(12);
  });
});

describe('compare yields to other requests between options', () => {
  it('gives the event loop a turn before each option’s fit check', async () => {
    const projectId = await newProject();
    const { roomId } = await newRoom(projectId);
    for (let i = 0; i < 3; i++)
      await owner
        .post(`/api/rooms/${roomId}/options`)
        .send({ name: `O${i}` })
        .expect(201);
    await newRoom(projectId);
    const turns = vi.spyOn(globalThis, 'setImmediate');
    try {
      const answer = await compareAnswer(t.db, studioId, projectId, takeoffSettingsSchema.parse({}));
      expect(answer.rooms.flatMap((r) => r.options)).toHaveLength(5);
      expect(turns.mock.calls.length).toBeGreaterThanOrEqual(5);
    } finally {
      turns.mockRestore();
    }
  });
});

describe('names and versions (control characters, text-direction marks, 32-bit versions)', () => {
  const NUL = '\u0000';
  const RLO = '\u202e';

  it('refuses NUL, other control characters and text-direction marks in every name, naming the field', async () => {
    const projectId = await newProject();
    const { roomId, optionId } = await newRoom(projectId);
    const clientId = (await owner.get(`/api/projects/${projectId}`)).body.project.client.id;
    const bad = [`Living${NUL}room`, `Study\tdesk`, `Bed${RLO}moor`, `Den\u2066x\u2069`, `Line\nbreak`, `C1\u0085`];
    for (const name of bad) {
      const shown = JSON.stringify(name);
      const checks: [request.Test, string][] = [
        [owner.post(`/api/projects/${projectId}/rooms`).send({ name, shell: RECT }), 'name'],
        [owner.put(`/api/rooms/${roomId}`).send({ version: 1, name }), 'name'],
        [owner.put(`/api/options/${optionId}`).send({ version: 1, name }), 'name'],
        [owner.put(`/api/options/${optionId}`).send({ version: 1, doc: { pieces: [piece({ name })] } }), 'doc.pieces[0].name'],
        [owner.put(`/api/options/${optionId}`).send({ version: 1, doc: { pieces: [piece({ id: name })] } }), 'doc.pieces[0].id'],
        [owner.post('/api/projects').send({ name, newClient: { name: 'C' } }), 'name'],
        [owner.patch(`/api/projects/${projectId}`).send({ name }), 'name'],
        [owner.post('/api/clients').send({ name }), 'name'],
        [owner.patch(`/api/clients/${clientId}`).send({ name }), 'name'],
        [owner.post('/api/finishes/paints').send({ name, colourHex: '#aabbcc' }), 'name'],
        [
          owner.post(`/api/projects/${projectId}/rooms/import`).send({ ...example, room: { ...example.room, name } }),
          'room.name',
        ],
        [
          owner.post(`/api/projects/${projectId}/rooms/import`).send({ ...example, option: { ...example.option, name } }),
          'option.name',
        ],
      ];
      for (const [req, field] of checks) {
        const res = await req;
        expect(res.status, `${field} ${shown}`).toBe(400);
        expect(res.body.error.fields?.[field], `${field} ${shown}`).toBe('Remove control characters and text-direction marks.');
      }
    }
    expect(await roomCount(projectId)).toBe(1);
    expect((await owner.get(`/api/rooms/${roomId}`)).body.room.version).toBe(1);
  });

  it('refuses the same in the studio’s and the owner’s name at sign-up', async () => {
    for (const [body, field] of [
      [{ studioName: `Wren${NUL}`, name: 'Ana' }, 'studioName'],
      [{ studioName: 'Wren', name: `Ana${RLO}` }, 'name'],
    ] as const) {
      const res = await request(t.app)
        .post('/api/auth/sign-up')
        .send({ ...body, email: uniqueEmail('names'), password: 'correct-horse-battery' });
      expect(res.status).toBe(400);
      expect(res.body.error.fields[field]).toBe('Remove control characters and text-direction marks.');
    }
  });

  it('refuses the same in a member’s name when an invitation is accepted', async () => {
    const studio = await signUpStudio(t.app, 'Invite Studio');
    const email = uniqueEmail('invitee');
    await studio.agent.post('/api/studio/invites').send({ email, role: 'designer' }).expect(201);
    const token = await inviteToken(t, email);
    const res = await request(t.app)
      .post(`/api/invites/${token}/accept`)
      .send({ name: `Theo${RLO}`, password: 'correct-horse-battery' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.name).toBe('Remove control characters and text-direction marks.');
    // The invitation is still open.
    expect(
      (await request(t.app).post(`/api/invites/${token}/accept`).send({ name: 'Theo', password: 'correct-horse-battery' }))
        .status,
    ).toBe(201);
  });

  it('takes tabs and line breaks in notes and messages, but not NUL or text-direction marks', async () => {
    const projectId = await newProject();
    const { roomId, optionId } = await newRoom(projectId);
    const ok = await owner.put(`/api/options/${optionId}`).send({ version: 1, note: 'Sofa\tunder the window.\nRug later.' });
    expect(ok.status).toBe(200);
    expect(ok.body.option.note).toBe('Sofa\tunder the window.\nRug later.');
    for (const note of [`a${NUL}b`, `a${RLO}b`, 'bell\u0007']) {
      const res = await owner.put(`/api/options/${optionId}`).send({ version: 2, note });
      expect(res.status).toBe(400);
      expect(Object.keys(res.body.error.fields)).toEqual(['note']);
    }
    const message = await owner
      .post(`/api/projects/${projectId}/presentations`)
      .send({ rooms: [{ roomId, optionIds: [optionId] }], message: `Hello${NUL}` });
    expect(message.status).toBe(400);
    expect(Object.keys(message.body.error.fields)).toEqual(['message']);
  });

  it('refuses versions beyond a 32-bit integer with 400, not 500', async () => {
    const projectId = await newProject();
    const { roomId, optionId } = await newRoom(projectId);
    for (const path of [`/api/rooms/${roomId}`, `/api/options/${optionId}`]) {
      const res = await owner.put(path).send({ version: 999_999_999_999, name: 'Later' });
      expect(res.status).toBe(400);
      expect(res.body.error.fields.version).toBe('This version does not exist.');
    }
    // The largest 32-bit version is a version that is not current: a conflict, not a crash.
    expect((await owner.put(`/api/rooms/${roomId}`).send({ version: 2_147_483_647, name: 'Later' })).status).toBe(409);
  });
});

describe('the same length limits in the API and in plan files', () => {
  it('refuses a 10,000-character room name and a 100,000-character note in a plan file, as the API does', async () => {
    const projectId = await newProject();
    const longName = await owner
      .post(`/api/projects/${projectId}/rooms/import`)
      .send({ ...example, room: { ...example.room, name: 'R'.repeat(10_000) } });
    expect(longName.status).toBe(400);
    expect(longName.body.error.fields['room.name']).toBe('Keep the name under 80 characters.');
    const api = await owner.post(`/api/projects/${projectId}/rooms`).send({ name: 'R'.repeat(81), shell: RECT });
    expect(api.body.error.fields.name).toBe('Keep the name under 80 characters.');
    const longNote = await owner
      .post(`/api/projects/${projectId}/rooms/import`)
      .send({ ...example, option: { ...example.option, note: 'n'.repeat(100_000) } });
    expect(longNote.status).toBe(400);
    expect(longNote.body.error.fields['option.note']).toBe('Keep the note under 2,000 characters.');
    const longPiece = await owner
      .post(`/api/projects/${projectId}/rooms/import`)
      .send({ ...example, option: { name: 'A', pieces: [piece({ name: 'p'.repeat(121) })] } });
    expect(longPiece.body.error.fields['option.pieces[0].name']).toBe('Keep the name under 120 characters.');
    expect(await roomCount(projectId)).toBe(0);
  });

  it('refuses a 1.5 M-character piece name on PUT /api/options/:id', async () => {
    const projectId = await newProject();
    const { optionId } = await newRoom(projectId);
    const res = await owner
      .put(`/api/options/${optionId}`)
      .send({ version: 1, doc: { pieces: [piece({ name: 'p'.repeat(1_500_000) })] } });
    expect(res.status).toBe(400);
    expect(res.body.error.fields['doc.pieces[0].name']).toBe('Keep the name under 120 characters.');
    const long = await owner
      .put(`/api/options/${optionId}`)
      .send({ version: 1, doc: { pieces: [piece({ id: 'i'.repeat(101), kind: 'k'.repeat(61), finishId: 'f'.repeat(101) })] } });
    expect(Object.keys(long.body.error.fields).sort()).toEqual([
      'doc.pieces[0].finishId',
      'doc.pieces[0].id',
      'doc.pieces[0].kind',
    ]);
  });
});

describe('supplier links', () => {
  it('takes http(s) links only', async () => {
    const projectId = await newProject();
    const { optionId } = await newRoom(projectId);
    for (const link of [
      'javascript:alert(document.cookie)',
      'data:text/html,<script>alert(1)</script>',
      'JavaScript:alert(1)',
      'ftp://files.example/x',
      'vbscript:msgbox',
    ]) {
      const res = await owner
        .put(`/api/options/${optionId}`)
        .send({ version: 1, doc: { pieces: [piece({ supplierUrl: link })] } });
      expect(res.status, link).toBe(400);
      expect(res.body.error.fields['doc.pieces[0].supplierUrl'], link).toBe(
        'must be a web link starting with http:// or https://',
      );
    }
    const ok = await owner
      .put(`/api/options/${optionId}`)
      .send({ version: 1, doc: { pieces: [piece({ supplierUrl: 'https://supplier.example/sofa?c=oat' })] } });
    expect(ok.status).toBe(200);
    const file = await owner
      .post(`/api/projects/${projectId}/rooms/import`)
      .send({ ...example, option: { name: 'A', pieces: [piece({ supplierUrl: 'javascript:alert(1)' })] } });
    expect(file.body.error.fields['option.pieces[0].supplierUrl']).toBe('must be a web link starting with http:// or https://');
  });

  it('never writes another kind of link to the schedule or its CSV, even one an older row holds', async () => {
    const projectId = await newProject();
    const { optionId } = await newRoom(projectId);
    const pieces = [
      piece({ id: 'a', supplierUrl: 'javascript:alert(1)', price: 10 }),
      piece({ id: 'b', name: 'Chair', supplierUrl: 'https://supplier.example/chair', price: 20 }),
    ];
    // An option saved before links were limited: written straight to the table.
    await t.db
      .updateTable('options')
      .set({ doc: sql`${JSON.stringify({ pieces, finishes: {} })}::jsonb` })
      .where('id', '=', optionId)
      .execute();
    const viewer = (await addMember(t, owner, 'viewer')).agent;
    const schedule = await viewer.get(`/api/options/${optionId}/schedule`);
    expect(schedule.status).toBe(200);
    expect(schedule.body.schedule.lines.map((l: { supplierUrl: string | null }) => l.supplierUrl).sort()).toEqual([
      'https://supplier.example/chair',
      null,
    ]);
    const csv = await viewer
      .get(`/api/options/${optionId}/schedule.csv`)
      .buffer(true)
      .parse((r, done) => {
        let text = '';
        r.on('data', (c: Buffer) => (text += c.toString('utf8')));
        r.on('end', () => done(null, text));
      });
    expect(csv.status).toBe(200);
    expect(csv.body).toContain('https://supplier.example/chair');
    expect(csv.body).not.toMatch(/javascript/i);
  });
});
