// Finish library API: paints, photo uploads and their processing, crops, serving, and bad input.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import sharp from 'sharp';
import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, relative } from 'node:path';
import { inject } from 'vitest';
import type { AppDeps } from '../../server/app';
import { loadConfig } from '../../server/config';
import { createDb } from '../../server/db/database';
import type { MailMessage } from '../../server/services/mail/mailer';
import { checkerboard, photoLike, rawToJpeg, rawToPng, rawToSharp, zeroPng } from '../../server/services/images/generate';
import { textureFraction, textureRepeat } from '../../shared/geometry/texture-repeat';
import type { Finish, PhotoFinish } from '../../shared/schemas/finish';
import { TEST_SIGN_UP_LIMIT, addMember, signUpStudio, startTestApp, type TestApp } from '../setup/app';
import { seedDemoFinishes } from '../../server/cli/seed-finishes';
import { dataDirStorage } from '../../server/services/storage/local-disk';
import { toSceneFinish } from '../../shared/finishes/scene-finish';

type Agent = ReturnType<typeof request.agent>;

let t: TestApp;
let dataDir: string;
let owner: Agent;
let viewer: Agent;
let stranger: Agent;

beforeAll(async () => {
  dataDir = mkdtempSync(join(tmpdir(), 'parlour-finishes-'));
  const db = createDb(inject('databaseUrl'), 4);
  const mail: MailMessage[] = [];
  const config = loadConfig({
    DATABASE_URL: inject('databaseUrl'),
    NODE_ENV: 'test',
    PUBLIC_URL: 'http://parlour.test',
    CLIENT_DIST: '/nonexistent',
    DATA_DIR: dataDir,
    SIGN_UP_LIMIT_PER_HOUR: TEST_SIGN_UP_LIMIT,
  });
  const deps: AppDeps = { db, mailer: { send: async (m) => void mail.push(m) }, config };
  t = { ...startTestApp(deps), db, mail };
  owner = (await signUpStudio(t.app, 'Finish Studio')).agent;
  viewer = (await addMember(t, owner, 'viewer')).agent;
  stranger = (await signUpStudio(t.app, 'Other Studio')).agent;
});
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

const upload = (agent: Agent, files: { name: string; bytes: Buffer }[], fields: Record<string, string> = {}) => {
  let r = agent.post('/api/finishes/photos');
  for (const [k, v] of Object.entries(fields)) r = r.field(k, v);
  for (const f of files) r = r.attach('photos', f.bytes, { filename: f.name, contentType: 'image/jpeg' });
  return r;
};

async function waitUntilProcessed(agent: Agent, id: string): Promise<PhotoFinish> {
  const until = Date.now() + 20_000;
  for (;;) {
    const res = await agent.get(`/api/finishes/${id}`);
    expect(res.status).toBe(200);
    const finish = res.body.finish as PhotoFinish;
    if (finish.status !== 'processing') return finish;
    if (Date.now() > until) throw new Error(`finish ${id} still processing`);
    await new Promise((r) => setTimeout(r, 50));
  }
}

const binary = (res: request.Response, cb: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
};
const fetchFile = (agent: Agent | ReturnType<typeof request>, url: string) =>
  (agent as Agent).get(url).buffer(true).parse(binary);

async function countFinishes(agent: Agent): Promise<number> {
  return ((await agent.get('/api/finishes')).body.finishes as Finish[]).length;
}

describe('paints', () => {
  it('adds a paint with its colour and sheen, edits it, and refuses photo fields', async () => {
    const res = await owner.post('/api/finishes/paints').send({ name: 'Morning oat', colourHex: '#E8DCC4', sheen: 'eggshell' });
    expect(res.status).toBe(201);
    expect(res.body.finish).toMatchObject({ kind: 'paint', name: 'Morning oat', colourHex: '#e8dcc4', sheen: 'eggshell' });
    const id = res.body.finish.id;
    const patched = await owner
      .patch(`/api/finishes/${id}`)
      .send({ sheen: 'satin', supplier: 'Invented Paint Co', price: 42.5, priceUnit: 'litre' });
    expect(patched.body.finish).toMatchObject({ sheen: 'satin', supplier: 'Invented Paint Co', price: 42.5, priceUnit: 'litre' });
    const wrong = await owner.patch(`/api/finishes/${id}`).send({ repeatWidthMm: 600 });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.fields.repeatWidthMm).toMatch(/paint has no/);
  });

  it('prices a paint per litre or per m² of wall, never per unit', async () => {
    const made = await owner
      .post('/api/finishes/paints')
      .send({ name: 'Quarry grey', colourHex: '#8c8a84', price: 21.5, priceUnit: 'litre' });
    expect(made.status).toBe(201);
    expect(made.body.finish).toMatchObject({ price: 21.5, priceUnit: 'litre' });
    const perUnit = await owner.post('/api/finishes/paints').send({ name: 'Per tin', colourHex: '#8c8a84', priceUnit: 'unit' });
    expect(perUnit.status).toBe(400);
    expect(perUnit.body.error.fields.priceUnit).toBe('A paint is priced per litre or per m² of wall.');
    const patched = await owner.patch(`/api/finishes/${made.body.finish.id}`).send({ priceUnit: 'unit' });
    expect(patched.status).toBe(400);
    expect(patched.body.error.fields.priceUnit).toMatch(/per litre or per m²/);
    const perM2 = await owner.patch(`/api/finishes/${made.body.finish.id}`).send({ price: 9, priceUnit: 'm2' });
    expect(perM2.body.finish).toMatchObject({ price: 9, priceUnit: 'm2' });
  });

  it('names the field of a bad colour, and a viewer cannot add one', async () => {
    const bad = await owner.post('/api/finishes/paints').send({ name: 'Oops', colourHex: 'green' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.colourHex).toBe('Use a colour like #a0b1c2.');
    expect((await viewer.post('/api/finishes/paints').send({ name: 'Nope', colourHex: '#000000' })).status).toBe(403);
  });
});

describe('a photo finish from upload to texture', () => {
  let finish: PhotoFinish;
  let input: Buffer;

  beforeAll(async () => {
    // A 1200 × 800 photo lying on its side (EXIF orientation 6) with a GPS position in its EXIF.
    input = await rawToSharp(photoLike(1200, 800))
      .withMetadata({ orientation: 6 })
      .withExif({
        IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '51/1 30/1 0/1', GPSLongitudeRef: 'W', GPSLongitude: '0/1 7/1 0/1' },
      })
      .jpeg({ quality: 90 })
      .toBuffer();
    const meta = await sharp(input).metadata();
    expect(meta.exif?.includes(Buffer.from([0x25, 0x88]))).toBe(true); // the GPS IFD pointer tag, 0x8825
    const res = await upload(owner, [{ name: 'oak_boards-02.jpg', bytes: input }], {
      category: 'wood',
      repeatWidthMm: '600',
      repeatHeightMm: '900',
    });
    expect(res.status).toBe(201);
    expect(res.body.finishes).toHaveLength(1);
    expect(res.body.finishes[0]).toMatchObject({
      kind: 'photo',
      name: 'Oak boards 02',
      category: 'wood',
      status: 'processing',
      repeatWidthMm: 600,
      repeatHeightMm: 900,
    });
    finish = await waitUntilProcessed(owner, res.body.finishes[0].id);
  });

  it('is ready, turned upright, with the largest centred square as its crop', () => {
    expect(finish.status).toBe('ready');
    expect(finish.failureReason).toBeNull();
    // Orientation 6 turns 1200 × 800 into 800 × 1200.
    expect([finish.photoWidthPx, finish.photoHeightPx]).toEqual([800, 1200]);
    expect(finish.crop.x).toBeCloseTo(0, 9);
    expect(finish.crop.width).toBeCloseTo(1, 9);
    expect(finish.crop.y).toBeCloseTo(200 / 1200, 9);
    expect(finish.crop.height).toBeCloseTo(800 / 1200, 9);
    expect(finish.meanColourHex).toMatch(/^#[0-9a-f]{6}$/);
    for (const url of Object.values(finish.files)) expect(url).toMatch(/^\/api\/files\/[0-9a-f]{64}\.webp$/);
  });

  it('serves WebP outputs without any metadata (no EXIF, GPS, ICC or XMP), in sRGB, at their sizes', async () => {
    const sizes: Record<string, [number, number]> = {
      swatchUrl: [256, 256],
      textureUrl: [800, 800], // the crop is 800 px square: not enlarged
      textureLargeUrl: [800, 800],
      previewUrl: [1536, 1536], // 3 × 512
      photoUrl: [800, 1200],
    };
    for (const [key, url] of Object.entries(finish.files)) {
      const res = await fetchFile(owner, url!);
      expect(res.status).toBe(200);
      expect(res.headers['content-type']).toBe('image/webp');
      expect(res.headers['cache-control']).toBe('private, max-age=31536000, immutable');
      const meta = await sharp(res.body as Buffer).metadata();
      expect(meta.format).toBe('webp');
      expect(meta.exif).toBeUndefined();
      expect(meta.icc).toBeUndefined();
      expect(meta.xmp).toBeUndefined();
      expect(meta.orientation).toBeUndefined();
      expect(meta.space).toBe('srgb');
      expect([meta.width, meta.height]).toEqual(sizes[key]);
    }
  });

  it('keeps no copy of the upload: only the metadata-free original and the derived images', async () => {
    const files = storedFiles();
    expect(files.filter((f) => f.startsWith('uploads/'))).toEqual([]);
    const masters = files.filter((f) => f.startsWith('masters/'));
    expect(masters).toHaveLength(1);
    const master = await sharp(join(dataDir, 'files', masters[0])).metadata();
    expect(master.exif).toBeUndefined();
    expect([master.width, master.height]).toEqual([800, 1200]);
  });

  it('lets only signed-in members of the studio load the files; answers 304 to a cached copy', async () => {
    const url = finish.files.textureUrl!;
    expect((await fetchFile(viewer, url)).status).toBe(200);
    expect((await fetchFile(stranger, url)).status).toBe(404);
    expect((await fetchFile(request(t.app), url)).status).toBe(401);
    const etag = (await fetchFile(owner, url)).headers.etag;
    expect((await owner.get(url).set('If-None-Match', etag)).status).toBe(304);
    expect((await owner.get('/api/files/not-a-file.webp')).status).toBe(404);
    expect((await owner.get(`/api/files/${'0'.repeat(64)}.webp`)).status).toBe(404);
  });

  it('re-processes when the crop changes, and drops the images nobody uses any more', async () => {
    const before = storedFiles();
    const oldTexture = finish.files.textureUrl!;
    const res = await owner.patch(`/api/finishes/${finish.id}`).send({ crop: { x: 0.1, y: 0.1, width: 0.5, height: 0.4 } });
    expect(res.status).toBe(200);
    expect(res.body.finish.status).toBe('processing');
    const after = await waitUntilProcessed(owner, finish.id);
    expect(after.status).toBe('ready');
    expect(after.crop).toEqual({ x: 0.1, y: 0.1, width: 0.5, height: 0.4 });
    // 0.5 × 800 by 0.4 × 1200: a 400 × 480 texture.
    const texture = await sharp((await fetchFile(owner, after.files.textureUrl!)).body as Buffer).metadata();
    expect([texture.width, texture.height]).toEqual([400, 480]);
    expect(after.files.textureUrl).not.toBe(oldTexture);
    expect((await fetchFile(owner, oldTexture)).status).toBe(404);
    const now = storedFiles();
    expect(now.filter((f) => f.startsWith('masters/'))).toEqual(before.filter((f) => f.startsWith('masters/')));
    // Under 1024 px the two textures are the same bytes, so the same file.
    expect(after.files.textureLargeUrl).toBe(after.files.textureUrl);
    expect(now.filter((f) => f.startsWith('derived/'))).toHaveLength(4);
    finish = after;
  });

  it('refuses a crop off the photo, naming the field', async () => {
    const res = await owner.patch(`/api/finishes/${finish.id}`).send({ crop: { x: 0.8, y: 0, width: 0.5, height: 0.5 } });
    expect(res.status).toBe(400);
    expect(res.body.error.fields['crop.width']).toBe('The crop runs off the right of the photo.');
  });

  it('edits the real size, supplier and price without re-processing', async () => {
    const res = await owner
      .patch(`/api/finishes/${finish.id}`)
      .send({ repeatWidthMm: 200, repeatHeightMm: 1200, supplier: 'Timber yard', code: 'OB-2', price: 64, priceUnit: 'm2' });
    expect(res.body.finish).toMatchObject({
      status: 'ready',
      repeatWidthMm: 200,
      repeatHeightMm: 1200,
      supplier: 'Timber yard',
      code: 'OB-2',
      price: 64,
      priceUnit: 'm2',
    });
    expect(res.body.finish.files).toEqual(finish.files);
    expect((await viewer.patch(`/api/finishes/${finish.id}`).send({ name: 'Mine now' })).status).toBe(403);
  });

  it('finds finishes by name, supplier or code, by category and by kind', async () => {
    const names = async (q: string) => ((await owner.get(`/api/finishes?${q}`)).body.finishes as Finish[]).map((f) => f.name);
    expect(await names('q=timber')).toEqual(['Oak boards 02']);
    expect(await names('q=OB-2')).toEqual(['Oak boards 02']);
    expect(await names('category=wood')).toEqual(['Oak boards 02']);
    expect(await names('category=fabric')).toEqual([]);
    expect(await names('kind=paint')).toContain('Morning oat');
    expect((await owner.get('/api/finishes?category=velvet')).status).toBe(400);
    expect((await stranger.get('/api/finishes')).body.finishes as Finish[]).toEqual([]);
  });

  it('deletes the finish and every file only it used', async () => {
    expect((await owner.delete(`/api/finishes/${finish.id}`)).status).toBe(204);
    expect((await owner.get(`/api/finishes/${finish.id}`)).status).toBe(404);
    expect(storedFiles()).toEqual([]);
  });
});

describe('a 10 cm checkerboard photo set to its real size', () => {
  it('gives a texture that repeats exactly every 100 mm of the scene', async () => {
    // 4 × 4 squares of 25 mm: 100 mm across, photographed at 10 px per mm. It already repeats,
    // so no edge blending.
    const photo = await rawToPng(checkerboard(1000, 4));
    const res = await upload(owner, [{ name: 'checker.png', bytes: photo }], {
      repeatWidthMm: '100',
      repeatHeightMm: '100',
      edgeBlend: 'none',
    });
    expect(res.status).toBe(201);
    const finish = await waitUntilProcessed(owner, res.body.finishes[0].id);
    const { data, info } = await sharp((await fetchFile(owner, finish.files.textureLargeUrl!)).body as Buffer)
      .raw()
      .toBuffer({ resolveWithObject: true });
    const { repeatU, repeatV } = textureRepeat(finish);
    expect(repeatU).toBeCloseTo(10, 12); // 10 repeats per metre
    expect(repeatV).toBeCloseTo(10, 12);
    // Walk 30 cm of floor in 5 mm steps, sampling the texture the way a repeat-wrapped texture is
    // sampled; the centre of each 25 mm square must show that square's colour.
    for (let mm = 12.5; mm < 300; mm += 25) {
      for (let vMm = 12.5; vMm < 100; vMm += 25) {
        const x = Math.floor(textureFraction(mm / 1000, repeatU) * info.width);
        const y = Math.floor(textureFraction(vMm / 1000, repeatV) * info.height);
        const value = data[(y * info.width + x) * info.channels];
        const dark = (Math.floor(mm / 25) + Math.floor(vMm / 25)) % 2 === 0;
        expect(dark ? value < 80 : value > 180, `at ${mm} mm, ${vMm} mm`).toBe(true);
      }
    }
    await owner.delete(`/api/finishes/${finish.id}`);
  });
});

describe('bad input', () => {
  let baseline: number;
  beforeAll(async () => {
    baseline = await countFinishes(owner);
  });

  async function expectRefused(res: request.Response, status: number, code: string, message: RegExp) {
    expect(res.status).toBe(status);
    expect(res.body.error.code).toBe(code);
    expect(res.body.error.message).toMatch(message);
    // Nothing half-saved, and the server keeps serving.
    expect(await countFinishes(owner)).toBe(baseline);
    expect(storedFiles()).toEqual([]);
    expect((await owner.get('/api/auth/me')).status).toBe(200);
  }

  it('refuses a request without photos', async () => {
    await expectRefused(await owner.post('/api/finishes/photos').send({}), 400, 'no_photos', /Choose at least one photo/);
  });

  it('refuses a zero-byte file', async () => {
    await expectRefused(
      await upload(owner, [{ name: 'empty.jpg', bytes: Buffer.alloc(0) }]),
      400,
      'empty_file',
      /“empty.jpg” is empty/,
    );
  });

  it('refuses a text file named .jpg (the type comes from the content)', async () => {
    await expectRefused(
      await upload(owner, [{ name: 'notes.jpg', bytes: Buffer.from('Measure the bay window again.\n') }]),
      415,
      'unsupported_type',
      /not a JPEG, PNG or WebP/,
    );
  });

  it('refuses a 20000 × 20000 image by its pixel count', async () => {
    const huge = zeroPng(20_000, 20_000, 8, 50);
    expect(huge.length).toBeLessThan(1_000_000);
    await expectRefused(
      await upload(owner, [{ name: 'huge.png', bytes: huge }]),
      413,
      'too_many_pixels',
      /20000 × 20000 pixels \(400 megapixels\); the limit is 40 megapixels/,
    );
  });

  it('refuses a small PNG that decodes to gigabytes before decoding it', async () => {
    // 60000 × 60000 one-bit pixels: 450 kB on disk, 3.6 GB once decoded to 8-bit samples.
    const bomb = zeroPng(60_000, 60_000, 1, 100);
    expect(bomb.length).toBeLessThan(1_000_000);
    // The same builder's small PNGs decode, so this one is a real PNG, not noise.
    expect(
      (
        await sharp(zeroPng(64, 64, 1, 8))
          .raw()
          .toBuffer({ resolveWithObject: true })
      ).info.width,
    ).toBe(64);
    const rssBefore = process.memoryUsage().rss;
    const started = performance.now();
    await expectRefused(await upload(owner, [{ name: 'bomb.png', bytes: bomb }]), 413, 'too_many_pixels', /3600 megapixels/);
    expect(performance.now() - started).toBeLessThan(5000);
    expect(process.memoryUsage().rss - rssBefore).toBeLessThan(200 * 1024 * 1024);
  });

  it('refuses a file over 25 MB', async () => {
    const big = Buffer.alloc(25 * 1024 * 1024 + 1);
    big.set([0xff, 0xd8, 0xff, 0xe0]);
    await expectRefused(await upload(owner, [{ name: 'big.jpg', bytes: big }]), 413, 'file_too_large', /larger than 25 MB/);
  });

  it('refuses more than 10 photos in one request', async () => {
    const small = await rawToJpeg(checkerboard(64, 2));
    const files = Array.from({ length: 11 }, (_, i) => ({ name: `p${i}.jpg`, bytes: small }));
    await expectRefused(await upload(owner, files), 400, 'too_many_files', /at most 10 photos/);
  });

  it('refuses the whole request when one photo of several is bad, storing none of them', async () => {
    const good = await rawToJpeg(checkerboard(64, 2));
    const res = await upload(owner, [
      { name: 'good.jpg', bytes: good },
      { name: 'bad.jpg', bytes: Buffer.from('nope') },
    ]);
    await expectRefused(res, 415, 'unsupported_type', /“bad.jpg”/);
    expect(res.body.error.fields).toEqual({ 'photos[1]': expect.stringMatching(/not a JPEG/) });
  });

  it('refuses a truncated JPEG or PNG at upload as damaged or cut short, keeping nothing of the request', async () => {
    const whole = await rawToJpeg(photoLike(800, 600));
    const cut = await upload(owner, [{ name: 'cut-short.jpg', bytes: whole.subarray(0, Math.floor(whole.length * 0.6)) }]);
    await expectRefused(cut, 422, 'damaged', /“cut-short.jpg” is damaged or cut short/);
    expect(cut.body.error.fields).toEqual({ 'photos[0]': expect.stringMatching(/damaged or cut short/) });
    // Only the last few bytes missing, beside a good photo: the whole request is refused.
    const good = await rawToJpeg(checkerboard(64, 2));
    const nearly = await upload(owner, [
      { name: 'good.jpg', bytes: good },
      { name: 'nearly.jpg', bytes: whole.subarray(0, whole.length - 40) },
    ]);
    await expectRefused(nearly, 422, 'damaged', /“nearly.jpg”/);
    expect(Object.keys(nearly.body.error.fields)).toEqual(['photos[1]']);
    const png = await rawToPng(photoLike(400, 300));
    await expectRefused(
      await upload(owner, [{ name: 'cut.png', bytes: png.subarray(0, Math.floor(png.length * 0.7)) }]),
      422,
      'damaged',
      /damaged or cut short/,
    );
  });

  it('takes several good photos in one request', async () => {
    const photos = await Promise.all([1, 2, 3].map((n) => rawToJpeg(checkerboard(120 * n, 2))));
    const res = await upload(
      owner,
      photos.map((bytes, i) => ({ name: `sample ${i + 1}.jpg`, bytes })),
      { category: 'tile' },
    );
    expect(res.status).toBe(201);
    const done = await Promise.all((res.body.finishes as Finish[]).map((f) => waitUntilProcessed(owner, f.id)));
    expect(done.map((f) => [f.name, f.status, f.category])).toEqual([
      ['Sample 1', 'ready', 'tile'],
      ['Sample 2', 'ready', 'tile'],
      ['Sample 3', 'ready', 'tile'],
    ]);
    for (const f of done) await owner.delete(`/api/finishes/${f.id}`);
    expect(storedFiles()).toEqual([]);
  });
});

describe('demo finishes', () => {
  it('gives a studio four drawn photo finishes, ready with swatches, and three paints', async () => {
    const { agent } = await signUpStudio(t.app, 'Demo-like Studio');
    const studioId = (await agent.get('/api/auth/me')).body.studio.id;
    await t.db.transaction().execute((trx) => seedDemoFinishes(trx, studioId, dataDirStorage(dataDir)));
    const finishes = (await agent.get('/api/finishes')).body.finishes as Finish[];
    const photos = finishes.filter((f): f is PhotoFinish => f.kind === 'photo');
    expect(photos.map((f) => [f.category, f.status]).sort()).toEqual([
      ['fabric', 'ready'],
      ['tile', 'ready'],
      ['wallpaper', 'ready'],
      ['wood', 'ready'],
    ]);
    for (const f of photos) {
      expect((await fetchFile(agent, f.files.swatchUrl!)).status).toBe(200);
      expect(toSceneFinish(f)).toMatchObject({ kind: 'photo', textureUrl: f.files.textureUrl, repeatWidthMm: f.repeatWidthMm });
    }
    expect(
      finishes
        .filter((f) => f.kind === 'paint')
        .map((f) => f.name)
        .sort(),
    ).toEqual(['Deep harbour', 'Morning oat', 'Sage hall']);
    expect(storedFiles().filter((f) => f.startsWith('uploads/'))).toEqual([]);
  });
});
