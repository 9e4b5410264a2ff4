// Reads the messages the stand-in SMTP server filed (local setup only).
import { readdir, readFile } from 'node:fs/promises';
import { join } from 'node:path';

export interface OutboxMessage {
  id: string;
  from: string;
  to: string;
  subject: string;
  text: string;
  html: string | null;
  receivedAt: string;
}

const ID_PATTERN = /^[a-z0-9-]{1,40}$/;

export async function listOutbox(dir: string): Promise<OutboxMessage[]> {
  let names: string[];
  try {
    names = await readdir(dir);
  } catch {
    return [];
  }
  const messages = await Promise.all(
    names.filter((n) => n.endsWith('.json')).map(async (n) => JSON.parse(await readFile(join(dir, n), 'utf8')) as OutboxMessage),
  );
  return messages.sort((a, b) => b.receivedAt.localeCompare(a.receivedAt));
}

export async function readOutboxMessage(dir: string, id: string): Promise<OutboxMessage | null> {
  if (!ID_PATTERN.test(id)) return null;
  try {
    return JSON.parse(await readFile(join(dir, `${id}.json`), 'utf8')) as OutboxMessage;
  } catch {
    return null;
  }
}
