// The studio schemas: member roles, e-mail, sign-in and invitation bodies, members, the studio's
// currency and locale for prices, and the session and invitation info the API returns.
import { z } from 'zod';
import { PASSWORD_MAX_LENGTH } from './password-rule';
import { nameText } from './common';
import { canonicalLocale, isCurrency } from '../units/money';

export const roleSchema = z.enum(['owner', 'designer', 'viewer']);
export type Role = z.infer<typeof roleSchema>;

export const emailSchema = z
  .string()
  .trim()
  .toLowerCase()
  .pipe(z.email({ message: 'Enter an e-mail address like name@example.com.' }));

const nameSchema = (what: string) => nameText(120, `Keep ${what} under 120 characters.`).min(1, `Enter ${what}.`);

export const signInSchema = z.object({
  email: emailSchema,
  password: z.string().min(1, 'Enter your password.').max(PASSWORD_MAX_LENGTH),
});
export type SignInBody = z.infer<typeof signInSchema>;

export const inviteSchema = z.object({ email: emailSchema, role: roleSchema });
export type InviteBody = z.infer<typeof inviteSchema>;

export const changeRoleSchema = z.object({ role: roleSchema });

export const memberSchema = z.object({
  id: z.string(),
  name: z.string(),
  email: z.string(),
  role: roleSchema,
  createdAt: z.string(),
});
export type Member = z.infer<typeof memberSchema>;

export const currencySchema = z
  .string()
  .trim()
  .toUpperCase()
  .refine(isCurrency, 'Enter a currency code such as GBP, EUR or USD.');
export const localeSchema = z
  .string()
  .trim()
  .max(35)
  .refine((v) => canonicalLocale(v) !== null, 'Enter a locale such as en-GB, de-DE or fr-CA.')
  .transform((v) => canonicalLocale(v)!);

/** The studio's settings for prices: its currency and how its prices are written. */
export const studioSettingsSchema = z.object({ currency: currencySchema, locale: localeSchema }).partial();
export type StudioSettingsBody = z.input<typeof studioSettingsSchema>;

export const sessionInfoSchema = z.object({
  member: memberSchema,
  studio: z.object({ id: z.string(), name: z.string(), currency: z.string(), locale: z.string() }),
  outbox: z.boolean(),
});
export type SessionInfo = z.infer<typeof sessionInfoSchema>;

export const inviteInfoSchema = z.object({
  id: z.string(),
  email: z.string(),
  role: roleSchema,
  studioName: z.string().optional(),
  createdAt: z.string(),
  expiresAt: z.string(),
  acceptedAt: z.string().nullable(),
});
export type InviteInfo = z.infer<typeof inviteInfoSchema>;

// Sign-up and invitation bodies (account.ts) name people and studios the same way.
export { nameSchema };
