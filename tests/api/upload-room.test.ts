// Memory for uploads is bounded per instance: a request declaring more than its route can accept
// is refused before its body is read, and while other uploads hold the instance's room a new one
// is answered 503 with Retry-After rather than read into memory; the room comes back when they end,
// finished or cut off.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { createTestApp, signUpStudio, type TestApp } from '../setup/app';

const MB = 1024 * 1024;
let t: TestApp;
let server: http.Server;
let port: number;
let cookie: string;

beforeAll(async () => {
  // 32 MB: room for one 25 MB model upload at a time.
  t = createTestApp({ env: { UPLOAD_MEMORY_MB: '32' } });
  server = http.createServer(t.app).listen(0, '127.0.0.1');
  await new Promise((r) => server.once('listening', r));
  port = (server.address() as AddressInfo).port;
  const owner = await signUpStudio(t.app, 'Upload Room Studio');
  const me = await owner.agent.get('/api/auth/me');
  cookie = (me.request as unknown as { cookies: string }).cookies;
  expect(cookie).toMatch(/=/);
});
afterAll(async () => {
  server.closeAllConnections();
  await new Promise((r) => server.close(r));
  await t.close();
});

interface Sent {
  req: http.ClientRequest;
  answer: Promise<{ status: number; body: { error?: { code: string; message: string } }; headers: http.IncomingHttpHeaders }>;
}

const SMALL_HEAD =
  '--xyz\r\nContent-Disposition: form-data; name="model"; filename="big.glb"\r\nContent-Type: model/gltf-binary\r\n\r\n';
const SMALL_TAIL = 'not a model\r\n--xyz--\r\n';

/** Starts a multipart upload declaring `declaredBytes`, sending only its first part (the rest never comes unless `finish`). */
function startUpload(path: string, declaredBytes: number): Sent {
  const req = http.request({
    host: '127.0.0.1',
    port,
    path,
    method: 'POST',
    headers: { cookie, 'content-type': 'multipart/form-data; boundary=xyz', 'content-length': String(declaredBytes) },
  });
  const answer = new Promise<Awaited<Sent['answer']>>((resolve, reject) => {
    req.on('response', (res) => {
      let text = '';
      res.on('data', (c) => (text += c));
      res.on('end', () => resolve({ status: res.statusCode!, body: text ? JSON.parse(text) : {}, headers: res.headers }));
    });
    req.on('error', reject);
  });
  req.write(SMALL_HEAD);
  return { req, answer };
}

describe('upload room', () => {
  it('refuses at once a request declaring more than the route could accept, without reading it', async () => {
    const sent = startUpload('/api/piece-models', 300 * MB);
    const res = await sent.answer;
    expect([res.status, res.body.error?.code]).toEqual([413, 'upload_too_large']);
    expect(res.body.error?.message).toMatch(/larger than 25 MB/);
    sent.req.destroy();
  });

  it('answers 503 with Retry-After while another upload holds the room, and has room again once it is cut off', async () => {
    const first = startUpload('/api/piece-models', 25 * MB);
    // The first upload is being read (its body is still coming): the room is taken.
    await new Promise((r) => setTimeout(r, 300));
    const second = startUpload('/api/piece-models', 20 * MB);
    const busy = await second.answer;
    expect([busy.status, busy.body.error?.code]).toEqual([503, 'uploads_busy']);
    expect(busy.headers['retry-after']).toBe('5');
    expect(busy.body.error?.message).toMatch(/Try again in a few seconds/);
    second.req.destroy();

    // The first client goes away mid-upload: its room comes back.
    first.req.destroy();
    await first.answer.catch(() => undefined);
    let third: Awaited<Sent['answer']> | undefined;
    for (const until = Date.now() + 5000; Date.now() < until;) {
      // A small, complete, wrong body: once let in, it is read and refused for what it is.
      const sent = startUpload('/api/piece-models', SMALL_HEAD.length + SMALL_TAIL.length);
      sent.req.end(SMALL_TAIL);
      third = await sent.answer.catch(() => undefined);
      if (third && third.status !== 503) break;
      await new Promise((r) => setTimeout(r, 100));
    }
    expect([third?.status, third?.body.error?.code]).toEqual([415, expect.any(String)]);
  });
});
