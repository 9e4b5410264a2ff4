import { z } from 'zod';

export const idParamSchema = z.object({ id: z.uuid({ message: 'Not a valid id.' }) });

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
