// The project schemas: project states, client bodies and records, creating and changing a project,
// the project list query, and the summary and detail the projects API returns.
import { z } from 'zod';
import { emailSchema } from './studio';
import { nameText, optionalText, sortSchema } from './common';

export const projectStateSchema = z.enum(['draft', 'presented', 'decided', 'archived']);
export type ProjectState = z.infer<typeof projectStateSchema>;

export const clientBodySchema = z.object({
  name: nameText(120, 'Keep the name under 120 characters.').min(1, 'Enter the client’s name.'),
  email: z
    .union([z.literal(''), emailSchema])
    .transform((v) => (v === '' ? null : v))
    .nullable()
    .optional(),
  phone: optionalText(40),
});
export type ClientBody = z.infer<typeof clientBodySchema>;
export const clientPatchSchema = clientBodySchema.partial();

export const clientSchema = z.object({
  id: z.string(),
  name: z.string(),
  email: z.string().nullable(),
  phone: z.string().nullable(),
  projectCount: z.number().int(),
  updatedAt: z.string(),
});
export type Client = z.infer<typeof clientSchema>;

const projectNameSchema = nameText(120, 'Keep the name under 120 characters.').min(1, 'Enter a project name.');

export const createProjectSchema = z
  .object({
    name: projectNameSchema,
    address: optionalText(300),
    clientId: z.uuid({ message: 'Pick a client.' }).optional(),
    newClient: clientBodySchema.optional(),
  })
  .refine((b) => Boolean(b.clientId) !== Boolean(b.newClient), {
    message: 'Pick a client or add a new one.',
    path: ['clientId'],
  });
export type CreateProjectBody = z.infer<typeof createProjectSchema>;

export const projectPatchSchema = z.object({
  name: projectNameSchema.optional(),
  address: optionalText(300),
  state: projectStateSchema.optional(),
});
export type ProjectPatch = z.infer<typeof projectPatchSchema>;

export const listQuerySchema = z.object({
  q: nameText(120).optional(),
  sort: sortSchema,
  archived: z.enum(['include', 'exclude', 'only']).default('exclude'),
});
export type ListQuery = z.infer<typeof listQuerySchema>;

export const projectSummarySchema = z.object({
  id: z.string(),
  name: z.string(),
  address: z.string().nullable(),
  state: projectStateSchema,
  /** While archived: the state Restore brings it back to (send it as `state`); otherwise null. */
  previousState: projectStateSchema.exclude(['archived']).nullable(),
  /** When and by whom (a member's name) a decided project was last reopened. */
  reopenedAt: z.string().nullable(),
  reopenedBy: z.string().nullable(),
  client: z.object({ id: z.string(), name: z.string() }),
  roomCount: z.number().int(),
  updatedAt: z.string(),
  createdAt: z.string(),
});
export type ProjectSummary = z.infer<typeof projectSummarySchema>;

/** GET /api/projects/:id: the project and how to reach its client (its rooms are GET /api/projects/:projectId/rooms). */
export const projectDetailSchema = z.object({
  project: projectSummarySchema,
  client: clientSchema.pick({ id: true, name: true, email: true, phone: true }).nullable(),
});
export type ProjectDetail = z.infer<typeof projectDetailSchema>;
