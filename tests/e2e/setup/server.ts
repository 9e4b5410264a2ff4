// globalSetup for browser tests: the migrated test database, the stand-in SMTP server and the
// app itself on free loopback ports, serving the built client.
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { join, resolve } from 'node:path';
import { tmpdir } from 'node:os';
import type { TestProject } from 'vitest/node';
import { testDatabase } from '../../setup/test-database';
import { startStandInSmtp } from '../../../server/services/mail/stand-in-smtp';
import { startServer } from '../../../server/index';

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
    outboxDir: string;
  }
}

function freePort(): Promise<number> {
  return new Promise((res, rej) => {
    const s = createServer();
    s.once('error', rej);
    s.listen(0, '127.0.0.1', () => {
      const port = (s.address() as { port: number }).port;
      s.close(() => res(port));
    });
  });
}

export default async function setup(project: TestProject) {
  const root = resolve(import.meta.dirname, '../../..');
  const { url: databaseUrl, drop } = await testDatabase('parlour_e2e');
  const outboxDir = mkdtempSync(join(tmpdir(), 'parlour-outbox-'));
  const smtp = await startStandInSmtp({ port: 0, dir: outboxDir });
  const port = await freePort();
  const app = await startServer({
    DATABASE_URL: databaseUrl,
    PORT: String(port),
    HOST: '127.0.0.1',
    SMTP_PORT: String(smtp.port),
    OUTBOX_DIR: outboxDir,
    DATA_DIR: join(outboxDir, 'data'),
    CLIENT_DIST: join(root, 'dist'),
    NODE_ENV: 'test',
    // Every browser test signs up its own studios, all from loopback.
    SIGN_UP_LIMIT_PER_HOUR: '100000',
  });
  project.provide('baseUrl', app.config.publicUrl);
  project.provide('outboxDir', outboxDir);
  return async () => {
    await app.close();
    await smtp.close();
    rmSync(outboxDir, { recursive: true, force: true });
    await drop();
  };
}
