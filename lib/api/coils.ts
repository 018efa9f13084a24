/**
 * Coils of a project (DEVELOPERS.md, HTTP API): list, create, read, save the working draft (compare-and-set on the
 * revision; 409 stale_revision when another save won), rename, duplicate, delete. Replies are parsed with zod.
 */
import { z } from 'zod';
import { api } from '@/lib/api/client';
import { coilDocumentSchema, type CoilDocument } from '@/lib/schema/coil-document';

const nullableNumber = z.number().nullable().optional();

export const coilListItemSchema = z.object({
  id: z.string(),
  name: z.string(),
  rows: z.number().int(),
  tubesPerRow: z.number().int(),
  circuitCount: nullableNumber,
  capacity_W: nullableNumber,
  waterPressureDrop_Pa: nullableNumber,
  warningCount: nullableNumber,
  valid: z.boolean().nullable().optional(),
  revision: z.number().int(),
  updatedAt: z.string(),
  /** The newest review decision on any version of the coil (approved / changes requested), or null. */
  latestDecision: z
    .object({ status: z.enum(['approved', 'changes-requested']), versionNumber: z.number().int(), createdAt: z.string() })
    .nullable()
    .optional(),
});
export type CoilListItem = z.infer<typeof coilListItemSchema>;

export const coilSummarySchema = z
  .object({
    rows: z.number().int(),
    tubesPerRow: z.number().int(),
    circuitCount: nullableNumber,
    capacity_W: nullableNumber,
    waterPressureDrop_Pa: nullableNumber,
    warningCount: nullableNumber,
    valid: z.boolean().nullable().optional(),
  })
  .nullable()
  .optional();

export const coilSchema = z.object({
  id: z.string(),
  projectId: z.string(),
  name: z.string(),
  // The stored draft may be mid-edit; the editor validates it again before solving.
  document: z.custom<CoilDocument>((v) => typeof v === 'object' && v !== null, 'coil document missing'),
  revision: z.number().int(),
  updatedAt: z.string(),
  summary: coilSummarySchema,
});
export type Coil = z.infer<typeof coilSchema>;

const listReply = z.object({ coils: z.array(coilListItemSchema) });
const coilReply = z.object({ coil: coilSchema });
const draftReply = z.object({ revision: z.number().int(), updatedAt: z.string() });
export type DraftSaved = z.infer<typeof draftReply>;

export const coilKeys = {
  list: (projectId: string) => ['projects', projectId, 'coils'] as const,
  one: (coilId: string) => ['coils', coilId] as const,
};

export async function listCoils(projectId: string): Promise<CoilListItem[]> {
  return (await api.get(`/api/projects/${encodeURIComponent(projectId)}/coils`, listReply)).coils;
}

export async function createCoil(projectId: string, name: string, document: CoilDocument): Promise<Coil> {
  const body = { name, document: coilDocumentSchema.parse({ ...document, name }) };
  return (await api.post(`/api/projects/${encodeURIComponent(projectId)}/coils`, body, coilReply)).coil;
}

export async function getCoil(coilId: string): Promise<Coil> {
  return (await api.get(`/api/coils/${encodeURIComponent(coilId)}`, coilReply)).coil;
}

export function saveDraft(coilId: string, document: CoilDocument, revision: number): Promise<DraftSaved> {
  return api.put(`/api/coils/${encodeURIComponent(coilId)}/draft`, { document, revision }, draftReply);
}

export async function renameCoil(coilId: string, name: string): Promise<Coil> {
  return (await api.patch(`/api/coils/${encodeURIComponent(coilId)}`, { name }, coilReply)).coil;
}

export async function duplicateCoil(coilId: string): Promise<Coil> {
  return (await api.post(`/api/coils/${encodeURIComponent(coilId)}/duplicate`, {}, coilReply)).coil;
}

export function deleteCoil(coilId: string): Promise<void> {
  return api.delete(`/api/coils/${encodeURIComponent(coilId)}`);
}
