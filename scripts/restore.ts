// npm run restore FILE: brings a backup (npm run backup) back into an empty database and an empty
// file store, then checks every table's row count against the archive's manifest. Refuses, and
// changes nothing, when the database already has tables or the store already holds files.
import { chmodSync, existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, relative, resolve, sep } from 'node:path';
import pg from 'pg';
import { binDir } from './lib/postgres';
import { openDataTarget, run, tableCounts } from './lib/data-target';
import { BACKUP_FORMAT, BACKUP_VERSION, PRESENTATION_KEY_FILE, type BackupManifest } from './lib/backup-format';

function filesUnder(dir: string): string[] {
  if (!existsSync(dir)) return [];
  return readdirSync(dir, { recursive: true, withFileTypes: true })
    .filter((e) => e.isFile())
    .map((e) => relative(dir, join(e.parentPath, e.name)).split(sep).join('/'));
}

async function main(): Promise<void> {
  const file = process.argv[2];
  if (!file) throw new Error('name the archive: npm run restore FILE');
  if (!existsSync(file)) throw new Error(`no such file: ${file}`);
  const started = Date.now();
  const stage = mkdtempSync(join(tmpdir(), 'parlour-restore-'));
  const target = await openDataTarget();
  try {
    run('tar', ['-xzf', resolve(file), '-C', stage]);
    const manifest = JSON.parse(readFileSync(join(stage, 'manifest.json'), 'utf8')) as BackupManifest;
    if (manifest.format !== BACKUP_FORMAT || manifest.version !== BACKUP_VERSION) {
      throw new Error(
        `not a Parlour backup this version can read (format ${String(manifest.format)}, version ${String(manifest.version)})`,
      );
    }

    const client = new pg.Client({ connectionString: target.databaseUrl });
    await client.connect();
    try {
      const existing = await client.query(`select count(*)::int as n from pg_tables where schemaname = 'public'`);
      if (Number(existing.rows[0].n) > 0)
        throw new Error('the database already has tables: restore needs an empty one (a new database, or a fresh DATA_DIR)');
      for await (const key of target.storage.keys())
        throw new Error(`the file store already holds files (${key}, …): restore needs an empty one`);
      const keyFile = join(target.dataDir, PRESENTATION_KEY_FILE);
      if (
        manifest.presentationKey &&
        existsSync(keyFile) &&
        readFileSync(keyFile, 'utf8') !== readFileSync(join(stage, PRESENTATION_KEY_FILE), 'utf8')
      ) {
        throw new Error(
          `${keyFile} holds another key: links signed with the backed-up key would stop working. Move it away first.`,
        );
      }

      run(join(binDir(), 'pg_restore'), [
        '--no-owner',
        '--no-privileges',
        '--exit-on-error',
        `--dbname=${target.databaseUrl}`,
        join(stage, 'database.dump'),
      ]);
      const stagedFiles = join(stage, 'files');
      const keys = filesUnder(stagedFiles);
      for (const key of keys) await target.storage.put(key, readFileSync(join(stagedFiles, key)));
      if (manifest.presentationKey) {
        mkdirSync(target.dataDir, { recursive: true });
        writeFileSync(keyFile, readFileSync(join(stage, PRESENTATION_KEY_FILE)), { mode: 0o600 });
        chmodSync(keyFile, 0o600);
      }

      const rows = await tableCounts((text) => client.query(text));
      const differ = Object.keys({ ...manifest.rows, ...rows }).filter((t) => manifest.rows[t] !== rows[t]);
      if (differ.length > 0) throw new Error(`restored row counts differ from the backup's in: ${differ.join(', ')}`);
      if (keys.length !== manifest.files)
        throw new Error(`the archive holds ${keys.length} files, its manifest says ${manifest.files}`);
      const totalRows = Object.values(rows).reduce((a, b) => a + b, 0);
      console.log(
        `Restored ${totalRows} rows in ${Object.keys(rows).length} tables and ${keys.length} files from ${file} in ${((Date.now() - started) / 1000).toFixed(1)} s`,
      );
    } finally {
      await client.end();
    }
  } finally {
    rmSync(stage, { recursive: true, force: true });
    target.release();
  }
}

main().catch((err) => {
  console.error(`Restore failed: ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});
