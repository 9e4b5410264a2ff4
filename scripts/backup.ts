// npm run backup [-- --out FILE]: one tar.gz with the database (pg_dump, custom format), every
// stored file and the presentation key, plus a manifest with row counts to check a restore by.
// The archive holds the key that signs client links: it is written readable by this user only.
import { chmodSync, copyFileSync, existsSync, mkdirSync, mkdtempSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import pg from 'pg';
import { binDir } from './lib/postgres';
import { openDataTarget, run, tableCounts } from './lib/data-target';
import { BACKUP_FORMAT, BACKUP_VERSION, PRESENTATION_KEY_FILE, type BackupManifest } from './lib/backup-format';

function argValue(name: string): string | undefined {
  const i = process.argv.indexOf(name);
  return i >= 0 ? process.argv[i + 1] : undefined;
}

async function main(): Promise<void> {
  const started = Date.now();
  const target = await openDataTarget();
  const stage = mkdtempSync(join(tmpdir(), 'parlour-backup-'));
  try {
    const out = resolve(
      argValue('--out') ?? join(target.dataDir, 'backups', `parlour-${new Date().toISOString().replace(/[:.]/g, '-')}.tar.gz`),
    );
    // The rows counted and the dump taken in one snapshot would need pg_dump's own snapshot; the
    // counts are taken first, so a busy database may hold a few more rows than the manifest says.
    const client = new pg.Client({ connectionString: target.databaseUrl });
    await client.connect();
    const rows = await tableCounts((text) => client.query(text)).finally(() => client.end());
    run(join(binDir(), 'pg_dump'), [
      '--format=custom',
      '--no-owner',
      '--no-privileges',
      `--file=${join(stage, 'database.dump')}`,
      `--dbname=${target.databaseUrl}`,
    ]);

    let files = 0;
    let fileBytes = 0;
    for await (const key of target.storage.keys()) {
      const bytes = await target.storage.get(key);
      if (!bytes) continue; // deleted while we listed
      const path = join(stage, 'files', key);
      mkdirSync(dirname(path), { recursive: true });
      writeFileSync(path, bytes);
      files += 1;
      fileBytes += bytes.length;
    }
    const keyFile = join(target.dataDir, PRESENTATION_KEY_FILE);
    const presentationKey = existsSync(keyFile);
    if (presentationKey) copyFileSync(keyFile, join(stage, PRESENTATION_KEY_FILE));
    const manifest: BackupManifest = {
      format: BACKUP_FORMAT,
      version: BACKUP_VERSION,
      createdAt: new Date().toISOString(),
      rows,
      files,
      fileBytes,
      presentationKey,
    };
    writeFileSync(join(stage, 'manifest.json'), `${JSON.stringify(manifest, null, 2)}\n`);

    mkdirSync(dirname(out), { recursive: true });
    writeFileSync(out, '', { mode: 0o600 });
    chmodSync(out, 0o600);
    run('tar', ['-czf', out, '-C', stage, '.']);
    const totalRows = Object.values(rows).reduce((a, b) => a + b, 0);
    console.log(
      `Backed up ${totalRows} rows in ${Object.keys(rows).length} tables and ${files} files (${fileBytes} bytes) to ${out}`,
    );
    console.log(`archive: ${statSync(out).size} bytes, ${((Date.now() - started) / 1000).toFixed(1)} s`);
  } finally {
    rmSync(stage, { recursive: true, force: true });
    target.release();
  }
}

main().catch((err) => {
  console.error(`Backup failed: ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});
