/** Request shapes of the team, project and coil endpoints (the account ones live in lib/schema/api-auth.ts). */
import { z } from 'zod';
import { coilDocumentSchema } from '@/lib/schema/coil-document';
import { emailSchema, roleSchema } from '@/lib/schema/api-auth';

const text = (what: string, max: number) => z.string().trim().max(max, `${what} is at most ${max} characters.`);
const requiredText = (what: string, max: number) => text(what, max).min(1, `Enter a ${what.toLowerCase()}.`);

export const createTeamBody = z.object({ name: requiredText('Team name', 100) });
export const inviteBody = z.object({ email: emailSchema, role: roleSchema });
export const roleBody = z.object({ role: roleSchema });

export const projectBody = z.object({
  name: requiredText('Project name', 120),
  client: text('Client', 120).optional(),
  site: text('Site', 200).optional(),
  notes: text('Notes', 5000).optional(),
});
export const projectPatchBody = projectBody
  .partial()
  .refine((b) => Object.values(b).some((v) => v !== undefined), { message: 'Nothing to change.' });

export const projectListQuery = z.object({
  q: z.string().max(200).optional(),
  sort: z.enum(['name', 'updatedAt', 'client']).default('updatedAt'),
  dir: z.enum(['asc', 'desc']).optional(),
});

export const createCoilBody = z.object({ name: requiredText('Coil name', 120).optional(), document: coilDocumentSchema });
export const draftBody = z.object({
  document: coilDocumentSchema,
  revision: z.number({ error: 'revision must be the revision the edit started from' }).int().min(1),
});
export const renameCoilBody = z.object({ name: requiredText('Coil name', 120) });
export const solveBody = z.object({ document: coilDocumentSchema });
