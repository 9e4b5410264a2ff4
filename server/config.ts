// Configuration from the environment, parsed once with zod; defaults fit the local setup.
import { randomBytes } from 'node:crypto';
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { z } from 'zod';

/** HS256 wants a key at least as long as its hash: 256 bits. */
const MIN_PRESENTATION_KEY_BYTES = 32;
const PRESENTATION_KEY_FILE = 'presentation-key';

const envSchema = z
  .object({
    NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
    HOST: z.string().default('127.0.0.1'),
    PORT: z.coerce.number().int().min(0).max(65535).default(5480),
    DATABASE_URL: z.string().min(1, 'DATABASE_URL is required'),
    PUBLIC_URL: z.string().url().optional(),
    SMTP_HOST: z.string().default('127.0.0.1'),
    SMTP_PORT: z.coerce.number().int().min(1).max(65535).default(5482),
    MAIL_FROM: z.string().default('Parlour <no-reply@parlour.local>'),
    // Set when mail goes to the local stand-in SMTP server (which files it here): the app then records
    // what it sends per studio and shows each studio its own on the Outbox page.
    OUTBOX_DIR: z.string().optional(),
    DATA_DIR: z.string().default('data'),
    CLIENT_DIST: z.string().default('dist'),
    SECURE_COOKIES: z
      .enum(['true', 'false'])
      .default('false')
      .transform((v) => v === 'true'),
    // Signs presentation links (hex or base64, at least 256 bits). Without it, one is generated
    // into DATA_DIR/presentation-key on first start; every instance must share the same key.
    PRESENTATION_KEY: z.string().trim().min(1).optional(),
    // Structured log lines on stdout; tests are quiet unless asked.
    LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).optional(),
    // Where photos and textures are kept: DATA_DIR/files, or an S3-compatible bucket shared by
    // every instance.
    STORAGE: z.enum(['local', 's3']).default('local'),
    S3_ENDPOINT: z.string().url().optional(),
    S3_BUCKET: z.string().min(1).optional(),
    S3_REGION: z.string().min(1).default('us-east-1'),
    S3_ACCESS_KEY_ID: z.string().min(1).optional(),
    S3_SECRET_ACCESS_KEY: z.string().min(1).optional(),
    // Stand-ins and many self-hosted stores want bucket/key paths rather than bucket host names.
    S3_FORCE_PATH_STYLE: z
      .enum(['true', 'false'])
      .default('false')
      .transform((v) => v === 'true'),
    // New studios per hour from one client address (IPv6 counted per /64): sign-up is open, so this
    // is what keeps per-studio limits from being beaten by signing up again. Tests raise it.
    SIGN_UP_LIMIT_PER_HOUR: z.coerce.number().int().min(1).default(5),
    // Photos this process processes at once from the job queue (each needs a few hundred MB at the
    // pixel limit, hence at most 2); it also sends queued mail unless 0. 0 on an app instance leaves
    // all of it to worker processes (npm run worker).
    WORKERS: z.coerce.number().int().min(0).max(2).default(1),
    // Memory this process lets uploads (photos, models) hold while they are checked; an upload that
    // would pass it is answered 503 with Retry-After. Each upload reserves what it declares.
    UPLOAD_MEMORY_MB: z.coerce.number().int().min(32).max(16384).default(320),
    // A photo job running longer than this has failed (its worker died or hung) and is tried again.
    PHOTO_JOB_TIMEOUT_SECONDS: z.coerce.number().int().min(10).max(3600).default(180),
    // How often the job queue looks for jobs that ran out of time (and tidies finished ones).
    JOB_MAINTENANCE_SECONDS: z.coerce.number().int().min(1).max(600).default(30),
  })
  .refine((c) => c.STORAGE !== 's3' || c.S3_BUCKET, { path: ['S3_BUCKET'], message: 'is required when STORAGE=s3' });

type LogLevel = NonNullable<z.infer<typeof envSchema>['LOG_LEVEL']>;

export type AppConfig = Omit<z.infer<typeof envSchema>, 'PRESENTATION_KEY' | 'LOG_LEVEL'> & {
  publicUrl: string;
  presentationKey: Uint8Array;
  logLevel: LogLevel;
};

export function loadConfig(env: NodeJS.ProcessEnv = process.env): AppConfig {
  const parsed = envSchema.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new Error(`Invalid configuration:\n${lines.join('\n')}`);
  }
  const { PRESENTATION_KEY, LOG_LEVEL, ...c } = parsed.data;
  const presentationKey = PRESENTATION_KEY
    ? decodeKey(PRESENTATION_KEY, 'PRESENTATION_KEY')
    : readOrCreateKeyFile(join(c.DATA_DIR, PRESENTATION_KEY_FILE));
  const logLevel = LOG_LEVEL ?? (c.NODE_ENV === 'test' ? 'silent' : 'info');
  return { ...c, publicUrl: c.PUBLIC_URL ?? `http://${c.HOST}:${c.PORT}`, presentationKey, logLevel };
}

/** Hex when it looks like hex, else base64 or base64url; refuses anything under 256 bits. */
export function decodeKey(text: string, name: string): Uint8Array {
  const value = text.trim();
  let bytes: Buffer;
  if (/^(?:[0-9a-fA-F]{2})+$/.test(value)) bytes = Buffer.from(value, 'hex');
  else if (/^[A-Za-z0-9+/_-]+={0,2}$/.test(value)) bytes = Buffer.from(value, 'base64');
  else throw new Error(`Invalid configuration:\n  ${name}: write the key as hex or base64`);
  if (bytes.length < MIN_PRESENTATION_KEY_BYTES) {
    throw new Error(
      `Invalid configuration:\n  ${name}: needs at least ${MIN_PRESENTATION_KEY_BYTES * 8} bits, this one has ${bytes.length * 8}`,
    );
  }
  return new Uint8Array(bytes);
}

// First start on a machine: a fresh key, readable by this user only. 'wx' makes two processes
// starting at once agree on one file instead of overwriting each other's.
function readOrCreateKeyFile(path: string): Uint8Array {
  try {
    return decodeKey(readFileSync(path, 'utf8'), path);
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code !== 'ENOENT') throw err;
  }
  mkdirSync(join(path, '..'), { recursive: true });
  try {
    writeFileSync(path, `${randomBytes(MIN_PRESENTATION_KEY_BYTES).toString('hex')}\n`, { mode: 0o600, flag: 'wx' });
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code !== 'EEXIST') throw err;
  }
  return decodeKey(readFileSync(path, 'utf8'), path);
}
