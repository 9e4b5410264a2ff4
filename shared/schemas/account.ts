// Making an account: a new password, signing up, accepting an invitation. Apart from studio.ts
// because the new-password rule carries the list of common passwords (about 380 KB), which the
// client's bundles must not pull in; the client imports only types from here.
import { z } from 'zod';
import { isCommonPassword } from './common-passwords';
import { NEW_PASSWORD_MIN_LENGTH, PASSWORD_MAX_LENGTH } from './password-rule';
import { emailSchema, nameSchema } from './studio';

/**
 * A password being set (sign-up, accepting an invitation): long enough, not only spaces, and not
 * one of the common passwords that are tried first. Signing in takes any stored password.
 */
export const newPasswordSchema = z
  .string({ error: 'Choose a password.' })
  .min(NEW_PASSWORD_MIN_LENGTH, `Use at least ${NEW_PASSWORD_MIN_LENGTH} characters. A few words you will remember work well.`)
  .max(PASSWORD_MAX_LENGTH, `Use at most ${PASSWORD_MAX_LENGTH} characters.`)
  .refine((p) => p.trim().length > 0, 'A password cannot be only spaces. Use letters, numbers or words.')
  .refine(
    (p) => !isCommonPassword(p),
    'This is one of the most common passwords, so it is among the first to be guessed. Choose another.',
  );

export const signUpSchema = z.object({
  studioName: nameSchema('the studio name'),
  name: nameSchema('your name'),
  email: emailSchema,
  password: newPasswordSchema,
});
export type SignUpBody = z.infer<typeof signUpSchema>;

export const acceptInviteSchema = z.object({ name: nameSchema('your name'), password: newPasswordSchema });
export type AcceptInviteBody = z.infer<typeof acceptInviteSchema>;
