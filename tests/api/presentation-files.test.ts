// Textures behind a presentation link: the client's payload names them at the large size on the
// link's own file route, and that route serves exactly the textures of the finishes the shown
// options wear — never another finish's files, another studio's, a swatch, or after withdrawal.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { inject } from 'vitest';
import type { AppDeps } from '../../server/app';
import { loadConfig } from '../../server/config';
import { createDb } from '../../server/db/database';
import { seedDemoFinishes } from '../../server/cli/seed-finishes';
import { dataDirStorage } from '../../server/services/storage/local-disk';
import { photoLike, rawToJpeg } from '../../server/services/images/generate';
import type { Finish, PhotoFinish } from '../../shared/schemas/finish';
import type { ClientPresentation, PresentationSummary } from '../../shared/schemas/presentation';
import { TEST_PRESENTATION_KEY, TEST_SIGN_UP_LIMIT, signUpStudio, startTestApp, type TestApp } from '../setup/app';

type Agent = ReturnType<typeof request.agent>;
const SQUARE = {
  outline: [
    [0, 0],
    [4000, 0],
    [4000, 3500],
    [0, 3500],
  ],
};

let t: TestApp;
let dataDir: string;
let owner: Agent;
let photos: Map<string, PhotoFinish>;
let paints: Map<string, Finish>;
let otherStudioTexture: string;
let token: string;
let presentationId: string;
let shownOptionId: string;

const fileName = (url: string) => url.slice(url.lastIndexOf('/') + 1);
const linkFile = (name: string, link = token) => request(t.app).get(`/api/p/${link}/files/${name}`);

async function studioWithDemoFinishes(name: string) {
  const { agent } = await signUpStudio(t.app, name);
  const studioId = (await agent.get('/api/auth/me')).body.studio.id as string;
  await t.db.transaction().execute((trx) => seedDemoFinishes(trx, studioId, dataDirStorage(dataDir)));
  const finishes = (await agent.get('/api/finishes')).body.finishes as Finish[];
  return { agent, finishes };
}

beforeAll(async () => {
  dataDir = mkdtempSync(join(tmpdir(), 'parlour-presentation-files-'));
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
  const deps: AppDeps = { db, mailer: { send: async () => undefined }, config };
  t = { ...startTestApp(deps), db, mail: [] };

  const mine = await studioWithDemoFinishes('Ashgrove Interiors');
  owner = mine.agent;
  photos = new Map(mine.finishes.filter((f): f is PhotoFinish => f.kind === 'photo').map((f) => [f.name, f]));
  paints = new Map(mine.finishes.filter((f) => f.kind === 'paint').map((f) => [f.name, f]));
  // Another studio's own photo: the demo drawings are the same bytes (and names) in every studio.
  const other = (await signUpStudio(t.app, 'Someone Else Studio')).agent;
  const uploaded = await other.post('/api/finishes/photos').attach('photos', await rawToJpeg(photoLike(640, 480, 99)), 'own.jpg');
  expect(uploaded.status).toBe(201);
  const otherId = uploaded.body.finishes[0].id as string;
  let otherFinish = (await other.get(`/api/finishes/${otherId}`)).body.finish as PhotoFinish;
  for (let waited = 0; otherFinish.status === 'processing' && waited < 30_000; waited += 200) {
    await new Promise((r) => setTimeout(r, 200));
    otherFinish = (await other.get(`/api/finishes/${otherId}`)).body.finish;
  }
  expect(otherFinish.status).toBe('ready');
  otherStudioTexture = fileName(otherFinish.files.textureLargeUrl!);

  const project = (await owner.post('/api/projects').send({ name: 'Quay flat', newClient: { name: 'R. Client' } })).body.project;
  const room = (await owner.post(`/api/projects/${project.id}/rooms`).send({ name: 'Sitting room', shell: SQUARE })).body;
  const shown = room.options[0];
  const hidden = (await owner.post(`/api/rooms/${room.room.id}/options`).send({ name: 'Not shown' })).body.option;
  // Shown: oak floor, a paint on the walls, the wallpaper on wall 1, linen on a sofa.
  const shownDoc = {
    pieces: [
      {
        id: 'sofa',
        name: 'Sofa',
        x: 2000,
        y: 2800,
        width: 2000,
        depth: 900,
        height: 800,
        status: 'new',
        finishId: photos.get('Washed linen')!.id,
      },
    ],
    finishes: {
      floor: photos.get('Oak boards, natural oil')!.id,
      walls: paints.get('Morning oat')!.id,
      wallOverrides: { '1': photos.get('Sprig wallpaper')!.id },
    },
  };
  // Not shown: the stone tile, which the link must not reach.
  const hiddenDoc = { pieces: [], finishes: { floor: photos.get('Grey stone tile')!.id } };
  expect((await owner.put(`/api/options/${shown.id}`).send({ doc: shownDoc, version: shown.version })).status).toBe(200);
  expect((await owner.put(`/api/options/${hidden.id}`).send({ doc: hiddenDoc, version: hidden.version })).status).toBe(200);
  const made = await owner
    .post(`/api/projects/${project.id}/presentations`)
    .send({ rooms: [{ roomId: room.room.id, optionIds: [shown.id] }] });
  expect(made.status).toBe(201);
  const summary = made.body.presentation as PresentationSummary;
  token = summary.link!.split('/p/')[1];
  presentationId = summary.id;
  shownOptionId = shown.id;
}, 60_000);

afterAll(async () => {
  await t.close();
  rmSync(dataDir, { recursive: true, force: true });
});

describe('textures for presentations', () => {
  it('names the large textures on the link’s own route, with their real repeat size, in the client payload', async () => {
    const res = await request(t.app).get(`/api/p/${token}`);
    expect(res.status).toBe(200);
    const option = (res.body.presentation as ClientPresentation).rooms[0].options[0];
    expect(option.id).toBe(shownOptionId);
    const oak = photos.get('Oak boards, natural oil')!;
    expect(option.surfaces.floor).toEqual({
      kind: 'photo',
      textureUrl: `/api/p/${token}/files/${fileName(oak.files.textureLargeUrl!)}`,
      repeatWidthMm: 720,
      repeatHeightMm: 1440,
      roughness: expect.any(Number),
      meanColourHex: oak.meanColourHex,
    });
    expect(option.surfaces.walls).toMatchObject({ kind: 'paint', colourHex: '#e6dcc8' });
    expect(option.surfaces.wallOverrides['1']).toMatchObject({ kind: 'photo', repeatWidthMm: 265 });
    expect(option.surfaces.pieces.sofa).toMatchObject({
      kind: 'photo',
      meanColourHex: photos.get('Washed linen')!.meanColourHex,
    });
    // Nothing in the payload points at the studio's own file route or names a finish.
    expect(res.text).not.toContain('"/api/files/');
    for (const f of [...photos.values(), ...paints.values()]) expect(res.text).not.toContain(f.id);
  });

  it('serves those textures without an account, privately and immutably cached', async () => {
    const oak = fileName(photos.get('Oak boards, natural oil')!.files.textureLargeUrl!);
    const res = await linkFile(oak);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^image\/webp/);
    expect(res.headers['cache-control']).toBe('private, max-age=31536000, immutable');
    expect(res.body.length).toBeGreaterThan(1000);
    const again = await linkFile(oak).set('If-None-Match', res.headers.etag);
    expect(again.status).toBe(304);
    // The standard size of a worn finish is a texture of it too.
    expect((await linkFile(fileName(photos.get('Sprig wallpaper')!.files.textureUrl!))).status).toBe(200);
    expect((await linkFile(fileName(photos.get('Washed linen')!.files.textureLargeUrl!))).status).toBe(200);
  });

  it('refuses another finish’s files, another studio’s, a worn finish’s swatch and preview, and made-up names, all alike', async () => {
    const tile = photos.get('Grey stone tile')!;
    const oak = photos.get('Oak boards, natural oil')!;
    const refused = [
      fileName(tile.files.textureLargeUrl!),
      fileName(tile.files.textureUrl!),
      otherStudioTexture,
      fileName(oak.files.swatchUrl!),
      fileName(oak.files.previewUrl!),
      'f'.repeat(64) + '.webp',
      '..%2F..%2Fmasters%2Fx.jpg',
    ];
    // A small drawing's cropping view can be the very same bytes (so the same name) as its texture.
    const textures = new Set([oak.files.textureUrl, oak.files.textureLargeUrl].map((u) => fileName(u!)));
    if (!textures.has(fileName(oak.files.photoUrl!))) refused.push(fileName(oak.files.photoUrl!));
    for (const name of refused) {
      const res = await linkFile(name);
      expect(res.status, name).toBe(404);
      expect(Object.keys(res.body)).toEqual(['error']);
    }
    // The designer's own route still needs a session.
    expect((await request(t.app).get(oak.files.textureLargeUrl!)).status).toBe(401);
  });

  it('stops serving when the token is bad or the link is withdrawn', async () => {
    const oak = fileName(photos.get('Oak boards, natural oil')!.files.textureLargeUrl!);
    expect((await linkFile(oak, 'not-a-token')).status).toBe(404);
    expect((await linkFile(oak, `${token}x`)).status).toBe(404);
    expect((await owner.post(`/api/presentations/${presentationId}/withdraw`)).status).toBe(200);
    expect((await linkFile(oak)).status).toBe(410);
  });
});
