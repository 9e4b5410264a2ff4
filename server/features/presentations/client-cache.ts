// The client's presentation data, kept ready per link so that opening a link costs no database
// round trip: the answer is built once, serialised once, and served until something it shows
// changes. Every instance LISTENs for the database's change notices (migration 0006: any write
// to the studio's projects, rooms, options, finishes, choices or the link itself; 0017: its piece
// models) and drops that studio's entries the moment one arrives; routes that withdraw, extend or
// decide also drop the entry locally before they answer. While the listening connection is down nothing is cached,
// so a withdrawn link can never be served from a stale entry.
import pg from 'pg';
import { createHash } from 'node:crypto';
import type { Db } from '../../db/database';
import type { Logger } from '../../services/logging/logger';
import { recordOpens } from './presentations.repository';

export const CHANGE_CHANNEL = 'parlour_changes';
/** A safety net only: notices normally drop entries long before this. */
const ENTRY_TTL_MS = 60_000;
/** Links kept at once per instance; the oldest go first. */
const MAX_ENTRIES = 2000;
/** "Opened" counts are written together at most this often, not once per visit. */
const OPEN_FLUSH_MS = 1000;
const RECONNECT_MIN_MS = 250;
const RECONNECT_MAX_MS = 5000;

export interface CachedLink {
  presentationId: string;
  studioId: string;
  expiresAt: Date;
  /** The whole JSON answer, ready to send. */
  body: string;
}

/** A link's answer as it goes out: its bytes and their ETag, worked out once, not per request. */
export interface ReadyLink extends CachedLink {
  bytes: Buffer;
  /** The weak ETag Express would compute for these bytes on every answer. */
  etag: string;
}

interface Entry extends ReadyLink {
  storedAt: number;
}

/** The bytes and ETag of an answer; the ETag is spelled as Express spells its weak ones. */
export function readyLink(link: CachedLink): ReadyLink {
  const bytes = Buffer.from(link.body, 'utf8');
  const hash = createHash('sha1').update(bytes).digest('base64').substring(0, 27);
  return { ...link, bytes, etag: `W/"${bytes.length.toString(16)}-${hash}"` };
}
interface Opens {
  count: number;
  first: Date;
  last: Date;
}

export class ClientLinkCache {
  private readonly entries = new Map<string, Entry>();
  private readonly opens = new Map<string, Opens>();
  private listener: pg.Client | null = null;
  private listening = false;
  private closed = false;
  private reconnectMs = RECONNECT_MIN_MS;
  /** Bumped by every notice, so an answer built across one is not stored. */
  private generation = 0;
  private flushing: Promise<void> = Promise.resolve();
  private flushTimer: NodeJS.Timeout | null = null;

  constructor(
    private readonly db: Db,
    private readonly databaseUrl: string,
    private readonly logger?: Logger,
  ) {}

  /** Starts listening (and the flush timer) on first use: an app that serves no link holds no connection. */
  private start(): void {
    if (this.flushTimer || this.closed) return;
    this.flushTimer = setInterval(() => void this.flushOpens(), OPEN_FLUSH_MS);
    this.flushTimer.unref();
    this.connect();
  }

  /** The ready answer for `token`, if one is held and the link has not run out since. */
  get(token: string, now = Date.now()): ReadyLink | undefined {
    this.start();
    const e = this.entries.get(token);
    if (!e) return undefined;
    if (!this.listening || e.expiresAt.getTime() <= now || now - e.storedAt > ENTRY_TTL_MS) {
      this.entries.delete(token);
      return undefined;
    }
    return e;
  }

  /** Builds the answer (which throws for a link that does not work) and keeps it when it is safe to. */
  async load(token: string, build: () => Promise<CachedLink>): Promise<ReadyLink> {
    this.start();
    const before = this.generation;
    const link = readyLink(await build());
    if (this.listening && this.generation === before) {
      if (this.entries.size >= MAX_ENTRIES) this.entries.delete(this.entries.keys().next().value!);
      this.entries.set(token, { ...link, storedAt: Date.now() });
    }
    return link;
  }

  forgetStudio(studioId: string): void {
    this.generation += 1;
    for (const [token, e] of this.entries) if (e.studioId === studioId) this.entries.delete(token);
  }

  forgetPresentation(presentationId: string): void {
    this.generation += 1;
    for (const [token, e] of this.entries) if (e.presentationId === presentationId) this.entries.delete(token);
  }

  /** Counts one visit; written with the others of the next second. */
  recordOpened(presentationId: string, at = new Date()): void {
    this.start();
    const o = this.opens.get(presentationId);
    if (o) {
      o.count += 1;
      o.last = at;
    } else this.opens.set(presentationId, { count: 1, first: at, last: at });
  }

  /** Writes the visits counted so far; the designer's summary calls this before it reads them. */
  flushOpens(): Promise<void> {
    this.flushing = this.flushing.then(async () => {
      if (this.opens.size === 0) return;
      const batch = [...this.opens];
      this.opens.clear();
      try {
        for (const [id, o] of batch) {
          await recordOpens(this.db, id, o);
        }
      } catch (err) {
        this.logger?.warn({ err }, 'link opens not written yet; kept for the next try');
        // The database is away: keep the counts for the next try rather than lose them.
        for (const [id, o] of batch) {
          const now = this.opens.get(id);
          this.opens.set(id, now ? { count: now.count + o.count, first: o.first, last: now.last } : o);
        }
      }
    });
    return this.flushing;
  }

  async close(): Promise<void> {
    this.closed = true;
    if (this.flushTimer) clearInterval(this.flushTimer);
    await this.flushOpens();
    this.listening = false;
    await this.listener?.end().catch(() => undefined);
  }

  private connect(): void {
    if (this.closed) return;
    const client = new pg.Client({ connectionString: this.databaseUrl });
    this.listener = client;
    const lost = () => {
      if (this.listener !== client) return;
      this.listener = null;
      this.listening = false;
      this.entries.clear();
      client.end().catch(() => undefined);
      if (this.closed) return;
      const wait = this.reconnectMs;
      this.reconnectMs = Math.min(this.reconnectMs * 2, RECONNECT_MAX_MS);
      setTimeout(() => this.connect(), wait).unref();
    };
    client.on('error', lost);
    client.on('end', lost);
    client.on('notification', (n) => {
      if (n.channel === CHANGE_CHANNEL && n.payload) this.forgetStudio(n.payload);
    });
    client
      .connect()
      .then(() => client.query(`LISTEN ${CHANGE_CHANNEL}`))
      .then(() => {
        if (this.listener !== client) return;
        // The listening connection must not keep a finished process (or test) alive.
        (client as unknown as { connection?: { stream?: { unref?: () => void } } }).connection?.stream?.unref?.();
        this.reconnectMs = RECONNECT_MIN_MS;
        this.entries.clear();
        this.listening = true;
      })
      .catch(lost);
  }
}
