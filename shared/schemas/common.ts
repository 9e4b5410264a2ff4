import { z } from 'zod';

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

/** Optional free text up to `max` characters; an empty string is stored as null. */
export const optionalText = (max: number) =>
  z
    .string()
    .trim()
    .max(max, `Keep it under ${max} characters.`)
    .transform((v) => (v === '' ? null : v))
    .nullable()
    .optional();
