// Configuration from the environment, parsed once with zod; defaults fit the local setup.
import { z } from 'zod';

const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  HOST: z.string().default('127.0.0.1'),
  PORT: z.coerce.number().int().min(0).max(65535).default(5480),
  DATABASE_URL: z.string().min(1, 'DATABASE_URL is required'),
  PUBLIC_URL: z.string().url().optional(),
  SMTP_HOST: z.string().default('127.0.0.1'),
  SMTP_PORT: z.coerce.number().int().min(1).max(65535).default(5482),
  MAIL_FROM: z.string().default('Parlour <no-reply@parlour.local>'),
  // When set, the app shows the mail the local stand-in SMTP server received (the Outbox page).
  OUTBOX_DIR: z.string().optional(),
  DATA_DIR: z.string().default('data'),
  CLIENT_DIST: z.string().default('dist'),
  SECURE_COOKIES: z
    .enum(['true', 'false'])
    .default('false')
    .transform((v) => v === 'true'),
});

export type AppConfig = z.infer<typeof envSchema> & { publicUrl: string };

export function loadConfig(env: NodeJS.ProcessEnv = process.env): AppConfig {
  const parsed = envSchema.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new Error(`Invalid configuration:\n${lines.join('\n')}`);
  }
  const c = parsed.data;
  return { ...c, publicUrl: c.PUBLIC_URL ?? `http://${c.HOST}:${c.PORT}` };
}
