/**
 * Request and reply contracts of the project endpoints (DEVELOPERS.md, HTTP API). The app validates its forms with
 * the same body schemas the server parses, so the messages beside each field match on both ends.
 */
import { z } from 'zod';

export const PROJECT_NAME_MAX = 120;
export const PROJECT_CLIENT_MAX = 120;
export const PROJECT_SITE_MAX = 200;
export const PROJECT_NOTES_MAX = 5000;

const optionalText = (max: number, what: string) =>
  z.string().trim().max(max, `Keep the ${what} under ${max} characters.`).optional();

export const projectNameSchema = z
  .string()
  .trim()
  .min(1, 'Give the project a name.')
  .max(PROJECT_NAME_MAX, `Keep the name under ${PROJECT_NAME_MAX} characters.`);

/** POST /api/teams/:teamId/projects. An empty client/site/notes string means "none". */
export const createProjectBodySchema = z.object({
  name: projectNameSchema,
  client: optionalText(PROJECT_CLIENT_MAX, 'client'),
  site: optionalText(PROJECT_SITE_MAX, 'site'),
  notes: optionalText(PROJECT_NOTES_MAX, 'notes'),
});
export type CreateProjectBody = z.infer<typeof createProjectBodySchema>;

/** PATCH /api/projects/:projectId: any subset; an empty string clears client/site/notes. */
export const updateProjectBodySchema = createProjectBodySchema.partial();
export type UpdateProjectBody = z.infer<typeof updateProjectBodySchema>;

export const projectSortSchema = z.enum(['name', 'updatedAt', 'client']);
export type ProjectSort = z.infer<typeof projectSortSchema>;
export const sortDirSchema = z.enum(['asc', 'desc']);

/** Query of GET /api/teams/:teamId/projects. */
export const listProjectsQuerySchema = z.object({
  q: z.string().trim().max(200).optional(),
  sort: projectSortSchema.optional(),
  dir: sortDirSchema.optional(),
});
export type ListProjectsQuery = z.infer<typeof listProjectsQuerySchema>;

/** Who made or last changed a project: the server may send a user id or `{ id, name }`; both read as a PersonRef. */
export const personRefSchema = z.object({ id: z.string(), name: z.string().nullish() });
export type PersonRef = { id: string; name: string | null };
const personSchema = z
  .union([z.string(), personRefSchema])
  .nullish()
  .transform((v): PersonRef | null => (v == null ? null : typeof v === 'string' ? { id: v, name: null } : { id: v.id, name: v.name ?? null }));

export const projectSchema = z.object({
  id: z.string(),
  teamId: z.string(),
  name: z.string(),
  client: z.string().nullish(),
  site: z.string().nullish(),
  notes: z.string().nullish(),
  createdAt: z.string(),
  updatedAt: z.string(),
  createdBy: personSchema,
  updatedBy: personSchema,
  /** Names beside the ids, when the server sends them. */
  createdByName: z.string().nullish(),
  updatedByName: z.string().nullish(),
  coilCount: z.number().int().nonnegative().nullish(),
});
export type Project = z.infer<typeof projectSchema>;

export const projectReplySchema = z.object({ project: projectSchema });
export const projectListReplySchema = z.object({ projects: z.array(projectSchema) });
