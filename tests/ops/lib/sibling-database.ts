// A database of a test's own beside the run's test database (same server), for tests that need
// two empty databases of their own even when npm test hands every file the same one.
import pg from 'pg';

export interface SiblingDatabase {
  url: string;
  drop(): Promise<void>;
}

async function onServer(baseUrl: string, text: string): Promise<void> {
  const admin = new URL(baseUrl);
  admin.pathname = '/postgres';
  const client = new pg.Client({ connectionString: admin.toString() });
  await client.connect();
  try {
    await client.query(text);
  } finally {
    await client.end();
  }
}

/** Creates `<name>_<pid>` afresh on the server of `baseUrl`. */
export async function siblingDatabase(baseUrl: string, name: string): Promise<SiblingDatabase> {
  const database = `${name}_${process.pid}`;
  await onServer(baseUrl, `DROP DATABASE IF EXISTS "${database}" WITH (FORCE)`);
  await onServer(baseUrl, `CREATE DATABASE "${database}"`);
  const url = new URL(baseUrl);
  url.pathname = `/${database}`;
  return { url: url.toString(), drop: () => onServer(baseUrl, `DROP DATABASE IF EXISTS "${database}" WITH (FORCE)`) };
}
