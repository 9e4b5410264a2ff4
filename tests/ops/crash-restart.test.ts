// Crash safety: rooms are saved in a loop while the server process is killed with SIGKILL and
// restarted by a supervisor several times. Every save answered 200/201 is intact afterwards, no
// half-written room exists (each has its option and parses), and the app comes back each time.
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createDb, type Db } from '../../server/db/database';
import { migrateToLatest } from '../../server/db/migrate';
import { roomShellSchema } from '../../shared/schemas/room';
import { optionDocSchema } from '../../shared/schemas/option';
import { freePort } from '../../scripts/lib/throwaway-cluster';
import { siblingDatabase, type SiblingDatabase } from './lib/sibling-database';
import { supervise, type Supervisor } from './lib/supervisor';

const KILLS = 5;
/** Time between kills: long enough for a restart plus a run of saves. */
const KILL_EVERY_MS = [700, 1100, 500, 900, 1300];
/** The whole loop is bounded even if the server never came back. */
const LOOP_LIMIT_MS = 60_000;
const RETRY_PAUSE_MS = 30;

interface Attempt {
  kind: 'create' | 'update';
  roomId: string | null;
  name: string;
  wallHeight: number;
  answered: boolean;
  version: number | null;
}

const shell = (wallHeight: number) => ({
  wallHeight,
  outline: [
    [0, 0],
    [3600, 0],
    [3600, 3000],
    [0, 3000],
  ],
});

const scratch = mkdtempSync(join(tmpdir(), 'parlour-crash-'));
let database: SiblingDatabase;
let db: Db;
let sup: Supervisor;
let cookie = '';

async function api(method: string, path: string, body?: unknown): Promise<{ status: number; body: Record<string, unknown> }> {
  const res = await fetch(`${sup.url}${path}`, {
    method,
    headers: { 'content-type': 'application/json', cookie },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  const text = await res.text();
  return { status: res.status, body: text ? (JSON.parse(text) as Record<string, unknown>) : {} };
}

beforeAll(async () => {
  database = await siblingDatabase(inject('databaseUrl'), 'parlour_crash');
  db = createDb(database.url, 2);
  await migrateToLatest(db);
  sup = await supervise({
    port: await freePort(),
    logFile: join(scratch, 'server.log'),
    env: {
      DATABASE_URL: database.url,
      DATA_DIR: join(scratch, 'data'),
      PRESENTATION_KEY: 'c4'.repeat(32),
      NODE_ENV: 'production',
      LOG_LEVEL: 'warn',
      CLIENT_DIST: '/nonexistent',
    },
  });
  const res = await fetch(`${sup.url}/api/auth/sign-up`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({
      studioName: 'Crash Studio',
      name: 'Cy Crash',
      email: 'crash@test.parlour',
      password: 'a-long-crash-password',
    }),
  });
  cookie = (res.headers.get('set-cookie') ?? '').split(';')[0];
  expect(res.status).toBe(201);
}, 60_000);

afterAll(async () => {
  await sup?.stop();
  await db?.destroy();
  await database?.drop();
  rmSync(scratch, { recursive: true, force: true });
});

describe('saving rooms while the server is killed', () => {
  it('keeps every answered save, leaves no half-written room and comes back after each kill', async () => {
    const project = await api('POST', '/api/projects', { name: 'Crash flat', newClient: { name: 'Kit Vale', email: '' } });
    expect(project.status).toBe(201);
    const projectId = (project.body.project as { id: string }).id;

    const attempts: Attempt[] = [];
    const known = new Map<string, number>(); // room id → version as last answered
    let kills = 0;
    let stop = false;
    let n = 0;

    const saver = (async () => {
      const deadline = Date.now() + LOOP_LIMIT_MS;
      while (!stop && Date.now() < deadline) {
        n += 1;
        const rooms = [...known.keys()];
        const update = rooms.length > 0 && n % 3 !== 0;
        const roomId = update ? rooms[n % rooms.length] : null;
        const attempt: Attempt = {
          kind: update ? 'update' : 'create',
          roomId,
          name: `Room ${n}`,
          wallHeight: 2000 + n,
          answered: false,
          version: null,
        };
        attempts.push(attempt);
        try {
          const res = update
            ? await api('PUT', `/api/rooms/${roomId}`, {
                name: attempt.name,
                shell: shell(attempt.wallHeight),
                version: known.get(roomId!),
              })
            : await api('POST', `/api/projects/${projectId}/rooms`, { name: attempt.name, shell: shell(attempt.wallHeight) });
          const room = res.body.room as { id: string; version: number } | undefined;
          if (res.status === 200 || res.status === 201) {
            attempt.answered = true;
            attempt.roomId = room!.id;
            attempt.version = room!.version;
            known.set(room!.id, room!.version);
          } else if (res.status === 409 && roomId) {
            // The save before was cut off after it committed: learn the version it left.
            const current = await api('GET', `/api/rooms/${roomId}`);
            known.set(roomId, (current.body.room as { version: number }).version);
          }
        } catch {
          // Connection refused or cut: the server is down; the supervisor is bringing it back.
          await new Promise((r) => setTimeout(r, RETRY_PAUSE_MS));
        }
      }
    })();

    for (const wait of KILL_EVERY_MS.slice(0, KILLS)) {
      await new Promise((r) => setTimeout(r, wait));
      await sup.ready();
      const proc = sup.current();
      expect(proc).not.toBeNull();
      proc!.child.kill('SIGKILL');
      await proc!.exited;
      kills += 1;
    }
    await sup.ready();
    const afterLastKill = attempts.length;
    // A few saves after the last restart prove the app is back for writing, not just reading.
    while (attempts.slice(afterLastKill).filter((a) => a.answered).length < 3) await new Promise((r) => setTimeout(r, 50));
    stop = true;
    await saver;

    expect(kills).toBe(KILLS);
    expect(sup.restarts.length).toBe(KILLS);
    const answered = attempts.filter((a) => a.answered);
    const lost = attempts.filter((a) => !a.answered);
    console.log(
      `[crash] ${attempts.length} saves, ${answered.length} answered, ${lost.length} cut off or refused by ${KILLS} kills; restarts answered after ${sup.restarts.join(', ')} ms`,
    );
    expect(answered.length).toBeGreaterThanOrEqual(2 * KILLS);

    const rooms = await db.selectFrom('rooms').selectAll().where('project_id', '=', projectId).execute();
    const options = await db
      .selectFrom('options')
      .select(['room_id', 'doc'])
      .where(
        'room_id',
        'in',
        rooms.map((r) => r.id),
      )
      .execute();
    // No half-written rows: every room parses and has its first option, every option parses.
    for (const r of rooms) {
      expect(() => roomShellSchema.parse(r.shell)).not.toThrow();
      expect(options.some((o) => o.room_id === r.id)).toBe(true);
    }
    for (const o of options) expect(() => optionDocSchema.parse(o.doc)).not.toThrow();

    // Every answered save is there: each room holds its last answered save, or a later one that
    // was cut off after it committed.
    const byId = new Map(rooms.map((r) => [r.id, r]));
    for (const [roomId, version] of known) {
      const row = byId.get(roomId);
      expect(row, `room ${roomId}`).toBeDefined();
      const last = answered.filter((a) => a.roomId === roomId).at(-1)!;
      expect(row!.version).toBeGreaterThanOrEqual(last.version!);
      const shown = { name: row!.name, wallHeight: (row!.shell as { wallHeight: number }).wallHeight };
      const candidates = [last, ...lost.filter((a) => a.roomId === roomId || a.kind === 'create')].map((a) => ({
        name: a.name,
        wallHeight: a.wallHeight,
      }));
      expect(candidates).toContainEqual(shown);
      expect(version).toBeLessThanOrEqual(row!.version);
    }
    // A room nobody heard about can only come from a create that was cut off after it committed.
    const unheard = rooms.filter((r) => !known.has(r.id));
    for (const r of unheard) expect(lost.some((a) => a.kind === 'create' && a.name === r.name)).toBe(true);

    const log = readFileSync(join(scratch, 'server.log'), 'utf8');
    expect(log).not.toMatch(/Migration .* failed/);
  }, 90_000);
});
