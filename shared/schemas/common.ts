// Schemas and helpers every other schema shares: id parameters, the error body, sorting, names and
// notes free of control characters and text-direction marks, document ids and record versions.
import { z } from 'zod';

/** Any UUID written as text (ids typed by hand in a plan file may be something else). */
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
export const isUuid = (text: string): boolean => UUID.test(text);

export const idParamSchema = z.object({ id: z.uuid({ message: 'Not a valid id.' }) });
export const projectIdParamSchema = z.object({ projectId: z.uuid({ message: 'Not a valid id.' }) });

/** The one error body every 4xx and 5xx answer carries. */
export const errorBodySchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    fields: z.record(z.string(), z.string()).optional(),
  }),
});
export type ErrorBody = z.infer<typeof errorBodySchema>;

export const sortSchema = z.enum(['updated', 'name']).default('updated');

// ---- Text every schema shares -----------------------------------------------------------------

/**
 * Characters no name may hold: C0 and C1 control characters (NUL included: PostgreSQL refuses it)
 * and the bidirectional embeddings, overrides and isolates U+202A–U+202E, U+2066–U+2069, which
 * can make a name read differently from what it holds ("Trojan Source", CVE-2021-42574).
 */
// eslint-disable-next-line no-control-regex -- finding control characters is the point
const NAME_FORBIDDEN = /[\u0000-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/;
/** The same for notes and messages, where tab and line breaks (\t \n \r) are welcome. */
// eslint-disable-next-line no-control-regex -- finding control characters is the point
const NOTE_FORBIDDEN = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/;

export const NAME_CHARACTERS_MESSAGE = 'Remove control characters and text-direction marks.';

/** Whether a name holds only characters a name may hold (see NAME_FORBIDDEN). */
export const isCleanName = (text: string): boolean => !NAME_FORBIDDEN.test(text);
/** The text without the characters no name may hold (for names made from file names). */
export const withoutUncleanCharacters = (text: string): string => text.replace(new RegExp(NAME_FORBIDDEN.source, 'g'), '');
/** Whether a note or message holds only characters it may hold (tab and line breaks allowed). */
export const isCleanNote = (text: string): boolean => !NOTE_FORBIDDEN.test(text);

/**
 * One line of text: trimmed, at most `max` characters, no control characters or text-direction
 * marks. Every name (studio, member, client, project, room, option, piece, finish…) and every
 * short single-line field uses it; `tooLong` is the message for more than `max` characters.
 */
export const nameText = (max: number, tooLong = `Keep it under ${max} characters.`) =>
  z.string().trim().max(max, tooLong).refine(isCleanName, NAME_CHARACTERS_MESSAGE);

/** Notes, messages and comments: trimmed, at most `max` characters; tab and line breaks allowed. */
export const noteText = (max: number, tooLong = `Keep it under ${max} characters.`) =>
  z
    .string()
    .trim()
    .max(max, tooLong)
    .refine(isCleanNote, 'Remove control characters and text-direction marks (tabs and line breaks are fine).');

/** Ids chosen by the editor or a plan file (pieces, openings, finishes): up to 100 plain characters. */
export const MAX_DOC_ID_LENGTH = 100;
export const docIdText = z
  .string()
  .min(1, 'Enter an id.')
  .max(MAX_DOC_ID_LENGTH, `Keep ids under ${MAX_DOC_ID_LENGTH} characters.`)
  .refine(isCleanName, NAME_CHARACTERS_MESSAGE);

/** The largest PostgreSQL `integer`: record versions (and other counters) stay below it. */
export const MAX_INT32 = 2_147_483_647;
/** A record's version for optimistic saves: a whole number from 1 up to a 32-bit integer. */
export const versionSchema = z
  .number({ message: 'Send the version you opened.' })
  .int('The version is a whole number.')
  .positive('The version is a whole number from 1.')
  .max(MAX_INT32, 'This version does not exist.');

/** Optional single-line text up to `max` characters (as nameText); an empty string is stored as null. */
export const optionalText = (max: number) =>
  nameText(max)
    .transform((v) => (v === '' ? null : v))
    .nullable()
    .optional();
