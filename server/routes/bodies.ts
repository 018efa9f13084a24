/**
 * Request shapes the server parses. Where the app validates the same form, the schema comes from lib/schema so the
 * messages match on both ends; the rest are server-only.
 */
import { z } from 'zod';
import { coilDocumentSchema } from '@/lib/schema/coil-document';
import { createProjectBodySchema, listProjectsQuerySchema, updateProjectBodySchema } from '@/lib/schema/api-projects';

export { changeRoleBodySchema as roleBody, createTeamBodySchema as createTeamBody, inviteBodySchema as inviteBody } from '@/lib/schema/api-teams';

export const projectBody = createProjectBodySchema;
export const projectPatchBody = updateProjectBodySchema.refine((b) => Object.values(b).some((v) => v !== undefined), {
  message: 'Nothing to change.',
});
export const projectListQuery = listProjectsQuerySchema;

const coilName = z.string().trim().min(1, 'Give the coil a name.').max(120, 'Keep the name under 120 characters.');
export const createCoilBody = z.object({ name: coilName.optional(), document: coilDocumentSchema });
export const draftBody = z.object({
  document: coilDocumentSchema,
  revision: z.number({ error: 'revision must be the revision the edit started from' }).int().min(1),
});
export const renameCoilBody = z.object({ name: coilName });
export const solveBody = z.object({
  document: coilDocumentSchema,
  /** Include the part-load (turndown) solves; default true. */
  turndown: z.boolean({ error: 'turndown must be true or false' }).optional(),
});
