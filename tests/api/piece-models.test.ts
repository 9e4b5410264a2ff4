// Piece models API: an upload is checked at once and normalised on the job queue; its size is read
// from its bounds; hostile files are refused with their reason and nothing kept; the unit fix and
// quarter turn change the size shown; a model worn in a live project cannot be deleted; the
// client's link names the model of each piece and serves only the models its shown options wear.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, relative } from 'node:path';
import { inject } from 'vitest';
import type { AppDeps } from '../../server/app';
import { loadConfig } from '../../server/config';
import { createDb } from '../../server/db/database';
import type { MailMessage } from '../../server/services/mail/mailer';
import type { PieceModel, PieceModelList } from '../../shared/schemas/piece-model';
import type { ClientPresentation, PresentationSummary } from '../../shared/schemas/presentation';
import {
  centimetreSofaDocument,
  chairDocument,
  chairWithHugeTexture,
  editGlbJson,
  toGlb,
} from '../../server/services/gltf/test-models';
import { TEST_PRESENTATION_KEY, TEST_SIGN_UP_LIMIT, addMember, signUpStudio, startTestApp, type TestApp } from '../setup/app';

type Agent = ReturnType<typeof request.agent>;

let t: TestApp;
let dataDir: string;
let owner: Agent;
let viewer: Agent;
let stranger: Agent;
let chairGlb: Buffer;

beforeAll(async () => {
  dataDir = mkdtempSync(join(tmpdir(), 'parlour-models-'));
  const db = createDb(inject('databaseUrl'), 4);
  const config = loadConfig({
    DATABASE_URL: inject('databaseUrl'),
    NODE_ENV: 'test',
    PUBLIC_URL: 'http://parlour.test',
    CLIENT_DIST: '/nonexistent',
    DATA_DIR: dataDir,
    PRESENTATION_KEY: TEST_PRESENTATION_KEY,
    SIGN_UP_LIMIT_PER_HOUR: TEST_SIGN_UP_LIMIT,
  });
  const mail: MailMessage[] = [];
  const deps: AppDeps = { db, mailer: { send: async (m) => void mail.push(m) }, config };
  t = { ...startTestApp(deps), db, mail };
  owner = (await signUpStudio(t.app, 'Model Studio')).agent;
  viewer = (await addMember(t, owner, 'viewer')).agent;
  stranger = (await signUpStudio(t.app, 'Other Model Studio')).agent;
  chairGlb = await toGlb(await chairDocument());
}, 60_000);
afterAll(async () => {
  await t.close();
  rmSync(dataDir, { recursive: true, force: true });
});

/** Every stored file, as paths under DATA_DIR/files. */
function storedFiles(): string[] {
  const root = join(dataDir, 'files');
  try {
    return readdirSync(root, { recursive: true, withFileTypes: true })
      .filter((e) => e.isFile())
      .map((e) => relative(root, join(e.parentPath, e.name)))
      .sort();
  } catch {
    return [];
  }
}

const upload = (agent: Agent, bytes: Buffer, name = 'chair.glb', fields: Record<string, string> = {}) => {
  let r = agent.post('/api/piece-models');
  for (const [k, v] of Object.entries(fields)) r = r.field(k, v);
  return r.attach('model', bytes, { filename: name, contentType: 'model/gltf-binary' });
};

async function waitUntilProcessed(agent: Agent, id: string): Promise<PieceModel> {
  const until = Date.now() + 60_000;
  for (;;) {
    const res = await agent.get(`/api/piece-models/${id}`);
    expect(res.status).toBe(200);
    const model = res.body.model as PieceModel;
    if (model.status !== 'processing') return model;
    if (Date.now() > until) throw new Error(`model ${id} still processing`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

async function readyChair(agent: Agent = owner, fields: Record<string, string> = {}): Promise<PieceModel> {
  const res = await upload(agent, chairGlb, 'oak_dining-chair.glb', fields);
  expect(res.status).toBe(201);
  const model = await waitUntilProcessed(agent, res.body.model.id);
  expect(model.status).toBe('ready');
  return model;
}

describe('uploading a model', () => {
  it('makes a processing model at once, then a ready one with its size read from its bounds', async () => {
    const res = await upload(owner, chairGlb, 'oak_dining-chair.glb', { kind: 'dining-chair' });
    expect(res.status).toBe(201);
    expect(res.body.model).toMatchObject({ name: 'Oak dining chair', status: 'processing', size: null, kind: 'dining-chair' });
    const model = await waitUntilProcessed(owner, res.body.model.id);
    expect(model).toMatchObject({
      status: 'ready',
      size: { widthMm: 450, depthMm: 500, heightMm: 900 },
      unitHint: null,
      triangles: 72,
      materials: 2,
    });
    const file = await owner.get(model.modelUrl!);
    expect(file.status).toBe(200);
    expect(file.headers['content-type']).toMatch(/model\/gltf-binary/);
    // Nobody outside the studio loads it; the viewer of the studio does.
    expect((await viewer.get(model.modelUrl!)).status).toBe(200);
    expect((await stranger.get(model.modelUrl!)).status).toBe(404);
    expect((await stranger.get(`/api/piece-models/${model.id}`)).status).toBe(404);
    // The original is gone once processed: only the normalised file is kept.
    expect(storedFiles().filter((f) => f.startsWith('uploads/'))).toEqual([]);
  });

  it('viewers read the library but cannot upload', async () => {
    expect((await upload(viewer, chairGlb)).status).toBe(403);
    const list = (await viewer.get('/api/piece-models')).body as PieceModelList;
    expect(list.quotaBytes).toBe(2 * 1024 ** 3);
    expect(list.usedBytes).toBeGreaterThan(0);
  });

  const hostile: [string, () => Promise<Buffer>, number, string][] = [
    ['a text file renamed .glb', async () => Buffer.from('not a model at all\n'), 415, 'not_gltf'],
    ['a cut-short .glb', async () => chairGlb.subarray(0, chairGlb.length - 200), 422, 'truncated'],
    [
      'an outside URI',
      async () =>
        editGlbJson(chairGlb, (j) => void (j.images as object[]).splice(0, 1, { uri: 'https://example.invalid/a.png' })),
      422,
      'external_uri',
    ],
    [
      'an accessor claiming more than its buffer',
      async () => editGlbJson(chairGlb, (j) => void ((j.accessors as { count: number }[])[0].count = 1_000_000)),
      422,
      'bad_sizes',
    ],
    ['a 20000 × 20000 texture', () => chairWithHugeTexture(20000, 20000), 422, 'texture_too_large'],
  ];
  for (const [what, make, status, code] of hostile) {
    it(`refuses ${what} with its reason, keeping nothing`, async () => {
      const before = storedFiles();
      const count = ((await owner.get('/api/piece-models')).body as PieceModelList).models.length;
      const res = await upload(owner, await make());
      expect([res.status, res.body.error.code]).toEqual([status, code]);
      expect(res.body.error.fields.model).toBe(res.body.error.message);
      expect(storedFiles()).toEqual(before);
      expect(((await owner.get('/api/piece-models')).body as PieceModelList).models).toHaveLength(count);
    });
  }

  it('refuses a file over 25 MB before reading it', async () => {
    const res = await upload(owner, Buffer.alloc(25 * 1024 * 1024 + 1, 0x20));
    expect([res.status, res.body.error.code]).toEqual([413, 'file_too_large']);
  });

  it('refuses two files in one upload and a request with none', async () => {
    const two = await owner.post('/api/piece-models').attach('model', chairGlb, 'a.glb').attach('model', chairGlb, 'b.glb');
    expect([two.status, two.body.error.code]).toEqual([400, 'too_many_files']);
    const none = await owner.post('/api/piece-models').field('name', 'Nothing');
    expect([none.status, none.body.error.code]).toEqual([400, 'no_model']);
  });
});

describe('changing a model', () => {
  it('flags a sofa authored in centimetres, and the one-click fix reads it at its true size', async () => {
    const res = await upload(owner, await toGlb(await centimetreSofaDocument()), 'sofa.glb');
    const model = await waitUntilProcessed(owner, res.body.model.id);
    expect(model).toMatchObject({
      status: 'ready',
      unitHint: 'cm',
      size: { widthMm: 210_000, depthMm: 90_000, heightMm: 85_000 },
    });
    const fixed = await owner.patch(`/api/piece-models/${model.id}`).send({ scale: 0.01 });
    expect(fixed.status).toBe(200);
    expect(fixed.body.model).toMatchObject({ scale: 0.01, unitHint: null, size: { widthMm: 2100, depthMm: 900, heightMm: 850 } });
  });

  it('a model facing −X measures 500 wide; the quarter turn brings it back to 450 × 500', async () => {
    const res = await upload(owner, await toGlb(await chairDocument({ facing: 'x-' })), 'turned.glb');
    const model = await waitUntilProcessed(owner, res.body.model.id);
    expect(model.size).toEqual({ widthMm: 500, depthMm: 450, heightMm: 900 });
    const turned = await owner.patch(`/api/piece-models/${model.id}`).send({ turnDeg: 90 });
    expect(turned.body.model.size).toEqual({ widthMm: 450, depthMm: 500, heightMm: 900 });
    const bad = await owner.patch(`/api/piece-models/${model.id}`).send({ turnDeg: 45 });
    expect(bad.status).toBe(400);
  });

  it('keeps a browser-rendered PNG thumbnail as WebP, and refuses what is not a PNG', async () => {
    const model = await readyChair();
    const sharp = (await import('sharp')).default;
    const png = await sharp({ create: { width: 640, height: 480, channels: 3, background: '#c8b8a0' } })
      .png()
      .toBuffer();
    const res = await owner.put(`/api/piece-models/${model.id}/thumbnail`).attach('thumbnail', png, 'thumb.png');
    expect(res.status).toBe(200);
    const thumb = await owner.get(res.body.model.thumbnailUrl);
    expect(thumb.headers['content-type']).toMatch(/image\/webp/);
    const meta = await sharp(thumb.body as Buffer).metadata();
    expect([meta.width, meta.height]).toEqual([320, 240]);
    const jpeg = await owner
      .put(`/api/piece-models/${model.id}/thumbnail`)
      .attach('thumbnail', await sharp(png).jpeg().toBuffer(), 'thumb.jpg');
    expect([jpeg.status, jpeg.body.error.code]).toEqual([415, 'not_png']);
  });
});

describe('models on pieces and the client link', () => {
  let model: PieceModel;
  let projectId: string;
  let optionId: string;
  let token: string;

  beforeAll(async () => {
    model = await readyChair();
    const project = (await owner.post('/api/projects').send({ name: 'Mill house', newClient: { name: 'A. Client' } })).body
      .project;
    projectId = project.id;
    const room = (
      await owner.post(`/api/projects/${project.id}/rooms`).send({
        name: 'Dining room',
        shell: {
          outline: [
            [0, 0],
            [4000, 0],
            [4000, 3500],
            [0, 3500],
          ],
        },
      })
    ).body;
    const option = room.options[0];
    optionId = option.id;
    const doc = {
      pieces: [
        {
          id: 'chair',
          name: 'Chair',
          x: 2000,
          y: 1500,
          width: 450,
          depth: 500,
          height: 900,
          status: 'new',
          kind: 'dining-chair',
          modelId: model.id,
        },
        { id: 'sofa', name: 'Sofa', x: 2000, y: 3000, width: 2000, depth: 900, height: 800, status: 'new' },
      ],
    };
    expect((await owner.put(`/api/options/${option.id}`).send({ doc, version: option.version })).status).toBe(200);
    const made = await owner
      .post(`/api/projects/${project.id}/presentations`)
      .send({ rooms: [{ roomId: room.room.id, optionIds: [option.id] }] });
    expect(made.status).toBe(201);
    token = (made.body.presentation as PresentationSummary).link!.split('/p/')[1];
  }, 60_000);

  it('names the model of each piece that wears one, behind the link’s own file route', async () => {
    const res = await request(t.app).get(`/api/p/${token}`);
    const presentation = res.body.presentation as ClientPresentation;
    const [chair, sofa] = presentation.rooms[0].options[0].pieces;
    expect(sofa.model).toBeUndefined();
    expect(chair.model).toMatchObject({
      sizeMm: { widthMm: 450, depthMm: 500, heightMm: 900 },
      minMm: [-225, 0, -250],
      turnDeg: 0,
      wearsFinishes: false,
    });
    expect('modelId' in chair).toBe(false);
    const fileName = model.modelUrl!.slice(model.modelUrl!.lastIndexOf('/') + 1);
    expect(chair.model!.url).toBe(`/api/p/${token}/files/${fileName}`);
    const file = await request(t.app).get(chair.model!.url);
    expect(file.status).toBe(200);
    expect(file.headers['content-type']).toMatch(/model\/gltf-binary/);
  });

  it('serves no other model through the link, not even another of the studio’s own', async () => {
    const other = await upload(owner, await toGlb(await chairDocument({ scale: 1.2 })), 'bigger.glb');
    const otherModel = await waitUntilProcessed(owner, other.body.model.id);
    const name = otherModel.modelUrl!.slice(otherModel.modelUrl!.lastIndexOf('/') + 1);
    expect((await request(t.app).get(`/api/p/${token}/files/${name}`)).status).toBe(404);
    // Another studio's link cannot load this studio's model either.
    const theirs = await readyChair(stranger);
    const theirName = theirs.modelUrl!.slice(theirs.modelUrl!.lastIndexOf('/') + 1);
    expect(theirName).toBe(model.modelUrl!.slice(model.modelUrl!.lastIndexOf('/') + 1)); // same bytes, same name
    const project = (await stranger.post('/api/projects').send({ name: 'Elsewhere', newClient: { name: 'B. Client' } })).body
      .project;
    const room = (
      await stranger.post(`/api/projects/${project.id}/rooms`).send({
        name: 'Hall',
        shell: {
          outline: [
            [0, 0],
            [3000, 0],
            [3000, 3000],
            [0, 3000],
          ],
        },
      })
    ).body;
    const made = await stranger
      .post(`/api/projects/${project.id}/presentations`)
      .send({ rooms: [{ roomId: room.room.id, optionIds: [room.options[0].id] }] });
    const theirToken = (made.body.presentation as PresentationSummary).link!.split('/p/')[1];
    expect((await request(t.app).get(`/api/p/${theirToken}/files/${theirName}`)).status).toBe(404);
  });

  it('shows a change to the model on the link’s next opens, even after the answer was kept ready', async () => {
    const opened = async () =>
      ((await request(t.app).get(`/api/p/${token}`)).body.presentation as ClientPresentation).rooms[0].options[0].pieces[0].model;
    for (let i = 0; i < 3; i += 1) expect((await opened())?.turnDeg).toBe(0);
    expect((await owner.patch(`/api/piece-models/${model.id}`).send({ turnDeg: 90 })).status).toBe(200);
    // The database's change notice may take a moment on a loaded machine; the kept answer lives 60 s.
    let seen = await opened();
    for (const until = Date.now() + 5000; seen?.turnDeg !== 90 && Date.now() < until; seen = await opened())
      await new Promise((r) => setTimeout(r, 25));
    expect(seen?.turnDeg).toBe(90);
    expect((await owner.patch(`/api/piece-models/${model.id}`).send({ turnDeg: 0 })).status).toBe(200);
  });

  it('refuses to delete a model worn in a live project, naming where; once archived it can go', async () => {
    const refused = await owner.delete(`/api/piece-models/${model.id}`);
    expect([refused.status, refused.body.error.code]).toEqual([409, 'model_in_use']);
    // The option as the designer sees it named: its letter, then its name when it has one.
    expect(refused.body.error.message).toContain('Mill house · Dining room · Option A');
    expect(refused.body.wornBy).toEqual([{ projectName: 'Mill house', roomName: 'Dining room', optionName: 'Option A' }]);
    expect((await owner.patch(`/api/projects/${projectId}`).send({ state: 'archived' })).status).toBe(200);
    expect((await owner.delete(`/api/piece-models/${model.id}`)).status).toBe(204);
    expect((await owner.get(`/api/piece-models/${model.id}`)).status).toBe(404);
    expect(optionId).toBeTruthy();
  });
});
