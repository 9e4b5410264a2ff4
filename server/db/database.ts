// The one Database interface: every table's row type, as Kysely sees it.
import type { Logger } from '../services/logging/logger';
import { Kysely, PostgresDialect, type Generated, type ColumnType } from 'kysely';
import pg from 'pg';

type Timestamp = ColumnType<Date, Date | string | undefined, Date | string>;

export interface StudiosTable {
  id: Generated<string>;
  name: string;
  created_at: Timestamp;
  /** ISO 4217 and BCP 47, for every price (migration 0012). */
  currency: Generated<string>;
  locale: Generated<string>;
}

export interface MembersTable {
  id: Generated<string>;
  studio_id: string;
  email: string;
  name: string;
  role: 'owner' | 'designer' | 'viewer';
  password_hash: string;
  created_at: Timestamp;
}

export interface SessionsTable {
  id: string; // sha-256 of the cookie token
  member_id: string;
  created_at: Timestamp;
  expires_at: Timestamp;
}

export interface InvitesTable {
  id: Generated<string>;
  studio_id: string;
  email: string;
  role: 'owner' | 'designer' | 'viewer';
  token_hash: string;
  invited_by: string | null;
  created_at: Timestamp;
  expires_at: Timestamp;
  accepted_at: Date | null;
}

export interface ClientsTable {
  id: Generated<string>;
  studio_id: string;
  name: string;
  email: string | null;
  phone: string | null;
  created_at: Timestamp;
  updated_at: Timestamp;
}

export interface ProjectsTable {
  id: Generated<string>;
  studio_id: string;
  client_id: string;
  name: string;
  address: string | null;
  state: ColumnType<'draft' | 'presented' | 'decided' | 'archived', 'draft' | 'presented' | 'decided' | 'archived' | undefined>;
  /** While archived: the state Restore goes back to. */
  previous_state: 'draft' | 'presented' | 'decided' | null;
  /** Who last took the project back from decided (Reopen), and when. */
  reopened_by: string | null;
  reopened_at: Date | null;
  created_at: Timestamp;
  updated_at: Timestamp;
}

export interface RoomsTable {
  id: Generated<string>;
  studio_id: string;
  project_id: string;
  name: string;
  position: ColumnType<number, number | undefined, number>;
  shell: unknown; // RoomShell, parsed with its zod schema on the way out
  version: Generated<number>;
  created_at: Timestamp;
  updated_at: Timestamp;
}

export interface OptionsTable {
  id: Generated<string>;
  studio_id: string;
  room_id: string;
  name: string;
  note: ColumnType<string, string | undefined, string>;
  position: ColumnType<number, number | undefined, number>;
  doc: unknown; // OptionDoc, parsed with its zod schema on the way out
  version: Generated<number>;
  created_at: Timestamp;
  updated_at: Timestamp;
}

export interface FinishesTable {
  id: Generated<string>;
  studio_id: string;
  kind: 'photo' | 'paint';
  name: string;
  supplier: string | null;
  code: string | null;
  price: ColumnType<string | null, number | null | undefined, number | null>; // numeric arrives as text
  price_unit: 'm2' | 'unit' | 'litre' | null;
  colour_hex: string | null;
  sheen: 'matt' | 'eggshell' | 'satin' | 'gloss' | null;
  category: 'floor' | 'wall' | 'tile' | 'wood' | 'stone' | 'fabric' | 'wallpaper' | 'other' | null;
  repeat_width_mm: number | null;
  repeat_height_mm: number | null;
  crop: unknown; // Crop, parsed with its zod schema on the way out
  edge_blend: 'none' | 'narrow' | 'wide' | null;
  status: 'processing' | 'ready' | 'failed' | null;
  failure_reason: string | null;
  source_key: string | null; // the private original: the upload until processed, then its master
  photo_width_px: number | null;
  photo_height_px: number | null;
  mean_colour_hex: string | null;
  revision: Generated<number>;
  queued_at: Date | null;
  created_at: Timestamp;
  updated_at: Timestamp;
}

export interface FinishFilesTable {
  finish_id: string;
  studio_id: string;
  purpose: 'master' | 'photo' | 'texture' | 'texture-large' | 'swatch' | 'preview';
  key: string;
  width_px: number;
  height_px: number;
  bytes: number;
}

export interface PresentationsTable {
  id: Generated<string>;
  studio_id: string;
  project_id: string;
  created_by: string | null;
  token_id: string; // the token's jti: the link works only while this row says so
  message: ColumnType<string, string | undefined, string>;
  show_prices: ColumnType<boolean, boolean | undefined, boolean>;
  issued_at: Timestamp;
  token_expires_at: Timestamp;
  expires_at: Timestamp;
  withdrawn_at: Date | null;
  decided_at: Date | null;
  sent_at: Date | null;
  sent_to: string | null;
  first_opened_at: Date | null;
  last_opened_at: Date | null;
  open_count: Generated<number>;
  created_at: Timestamp;
}

export interface PresentationRoomsTable {
  presentation_id: string;
  room_id: string;
  position: number;
}

export interface PresentationOptionsTable {
  presentation_id: string;
  room_id: string;
  option_id: string;
  position: number;
  view_count: Generated<number>;
  first_viewed_at: Date | null;
  last_viewed_at: Date | null;
  /** The option's version when the link was made (migration 0012). */
  sent_version: number | null;
}

export interface ChoicesTable {
  presentation_id: string;
  room_id: string;
  option_id: string;
  comment: string;
  chosen_at: Timestamp;
}

export interface RateLimitCountsTable {
  bucket: string;
  key: string;
  window_start: Date;
  count: ColumnType<number, number | undefined, number>;
}

export interface SentMailTable {
  id: Generated<string>;
  studio_id: string;
  kind: 'invitation' | 'presentation' | 'choice';
  sender: string;
  recipient: string;
  subject: string;
  text_body: string;
  html_body: string | null;
  created_at: Timestamp; // milliseconds only: the Outbox pages by it
}

export interface QueuedMailTable {
  id: Generated<string>;
  studio_id: string;
  project_id: string | null;
  /** The invitation this mail carries, if it is one (deleted with it). */
  invite_id: string | null;
  kind: 'invitation' | 'presentation' | 'choice';
  recipient: string;
  subject: string;
  /** The message, until it is sent. */
  text_body: string | null;
  html_body: string | null;
  state: Generated<'sending' | 'sent' | 'failing' | 'failed'>;
  attempts: Generated<number>;
  last_error: string | null;
  created_at: Timestamp;
  sent_at: Date | null;
}

export interface PieceModelsTable {
  id: Generated<string>;
  studio_id: string;
  name: string;
  supplier: string | null;
  link: string | null;
  price: ColumnType<string | null, number | null | undefined, number | null>; // numeric arrives as text
  kind: string | null;
  turn_deg: ColumnType<number, number | undefined, number>;
  /** The one-click unit fix: 0.01 for a model authored in centimetres, 0.001 in millimetres. */
  scale: ColumnType<number, number | undefined, number>;
  status: ColumnType<
    'processing' | 'ready' | 'failed',
    'processing' | 'ready' | 'failed' | undefined,
    'processing' | 'ready' | 'failed'
  >;
  failure_reason: string | null;
  file_name: string;
  /** The private original: kept until processing ends. */
  source_key: string | null;
  source_bytes: number;
  model_key: string | null;
  model_bytes: number | null;
  thumbnail_key: string | null;
  thumbnail_bytes: number | null;
  width_mm: number | null;
  depth_mm: number | null;
  height_mm: number | null;
  min_mm: unknown; // [x, y, z] mm, parsed on the way out
  triangles: number | null;
  source_triangles: number | null;
  materials: number | null;
  unit_hint: 'cm' | 'mm' | null;
  queued_at: Date | null;
  processed_ms: number | null;
  created_at: Timestamp;
  updated_at: Timestamp;
}

export interface Database {
  rooms: RoomsTable;
  options: OptionsTable;
  studios: StudiosTable;
  members: MembersTable;
  sessions: SessionsTable;
  invites: InvitesTable;
  clients: ClientsTable;
  projects: ProjectsTable;
  finishes: FinishesTable;
  finish_files: FinishFilesTable;
  presentations: PresentationsTable;
  presentation_rooms: PresentationRoomsTable;
  presentation_options: PresentationOptionsTable;
  choices: ChoicesTable;
  rate_limit_counts: RateLimitCountsTable;
  sent_mail: SentMailTable;
  queued_mail: QueuedMailTable;
  piece_models: PieceModelsTable;
}

export type Db = Kysely<Database>;

export function createDb(connectionString: string, max = 10, logger?: Pick<Logger, 'warn'>): Db {
  const pool = new pg.Pool({ connectionString, max });
  // A dropped connection must not take the process down; the next query reconnects.
  pool.on('error', (err) =>
    logger
      ? logger.warn({ err }, 'idle database connection lost')
      : // eslint-disable-next-line no-console -- no logger was given (tests and command-line tools)
        console.error('[db] idle client error:', err.message),
  );
  return new Kysely<Database>({ dialect: new PostgresDialect({ pool }) });
}
