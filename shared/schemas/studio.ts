import { z } from 'zod';
import { nameText } from './common';

export const roleSchema = z.enum(['owner', 'designer', 'viewer']);
export type Role = z.infer<typeof roleSchema>;

export const emailSchema = z
  .string()
  .trim()
  .toLowerCase()
  .pipe(z.email({ message: 'Enter an e-mail address like name@example.com.' }));

// At least 10 characters: long enough to resist guessing, short enough to type (common practice).
export const passwordSchema = z
  .string()
  .min(10, 'Use at least 10 characters.')
  .max(200, 'Use at most 200 characters.');

const nameSchema = (what: string) => nameText(120, `Keep ${what} under 120 characters.`).min(1, `Enter ${what}.`);

export const signUpSchema = z.object({
  studioName: nameSchema('the studio name'),
  name: nameSchema('your name'),
  email: emailSchema,
  password: passwordSchema,
});
export type SignUpBody = z.infer<typeof signUpSchema>;

export const signInSchema = z.object({
  email: emailSchema,
  password: z.string().min(1, 'Enter your password.').max(200),
});
export type SignInBody = z.infer<typeof signInSchema>;

export const inviteSchema = z.object({ email: emailSchema, role: roleSchema });
export type InviteBody = z.infer<typeof inviteSchema>;

export const acceptInviteSchema = z.object({ name: nameSchema('your name'), password: passwordSchema });
export type AcceptInviteBody = z.infer<typeof acceptInviteSchema>;

export const changeRoleSchema = z.object({ role: roleSchema });

export const memberSchema = z.object({
  id: z.string(),
  name: z.string(),
  email: z.string(),
  role: roleSchema,
  createdAt: z.string(),
});
export type Member = z.infer<typeof memberSchema>;

export const sessionInfoSchema = z.object({
  member: memberSchema,
  studio: z.object({ id: z.string(), name: z.string() }),
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
