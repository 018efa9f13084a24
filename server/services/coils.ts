/** Coils of a project: read by every member; created, saved, renamed, copied and deleted by owners and designers. */
import { deleteCoil, findCoilTeam, insertCoil, listCoils, renameCoil, saveCoilDraft } from '@/db/queries/coils';
import { touchProject } from '@/db/queries/projects';
import { latestDecisionPerCoil } from '@/db/queries/versions';
import type { CoilRow } from '@/db/schema';
import type { CoilDocument } from '@/lib/engine/types';
import { notFound } from '@/server/errors';
import { coilAccess, conflict, projectAccess } from '@/server/services/access';
import { summarizeCoil } from '@/server/services/coil-summary';
import type { ServiceDeps } from '@/server/services/context';

export function publicCoil(row: CoilRow) {
  return {
    id: row.id,
    projectId: row.projectId,
    name: row.name,
    document: row.document,
    revision: row.revision,
    summary: row.summary,
    createdBy: row.createdBy,
    updatedBy: row.updatedBy,
    createdAt: row.createdAt,
    updatedAt: row.updatedAt,
  };
}

export function coilService(deps: ServiceDeps) {
  const { db, logger } = deps;
  const summarize = (document: CoilDocument) => summarizeCoil(document, deps.solve, logger);

  return {
    async list(userId: string, projectId: string) {
      await projectAccess(db, projectId, userId, 'read');
      const rows = await listCoils(db, projectId);
      const decisions = new Map((await latestDecisionPerCoil(db, rows.map((r) => r.id))).map((d) => [d.coilId, d]));
      return rows.map((r) => ({
        id: r.id,
        name: r.name,
        rows: r.rows,
        tubesPerRow: r.tubesPerRow,
        circuitCount: r.summary?.circuitCount ?? null,
        capacity_W: r.summary?.capacity_W ?? null,
        waterPressureDrop_Pa: r.summary?.waterPressureDrop_Pa ?? null,
        warningCount: r.summary?.warningCount ?? null,
        valid: r.summary?.valid ?? null,
        revision: r.revision,
        updatedAt: r.updatedAt,
        latestDecision: (() => {
          const d = decisions.get(r.id);
          return d ? { status: d.status, versionNumber: d.versionNumber, createdAt: d.createdAt } : null;
        })(),
      }));
    },

    async create(userId: string, projectId: string, input: { name?: string; document: CoilDocument }) {
      await projectAccess(db, projectId, userId, 'edit');
      const row = await db.transaction(async (tx) => {
        const coil = await insertCoil(tx, {
          projectId,
          name: input.name ?? input.document.name,
          document: input.document,
          summary: summarize(input.document),
          createdBy: userId,
          updatedBy: userId,
        });
        await touchProject(tx, projectId, userId);
        return coil;
      });
      return publicCoil(row);
    },

    async get(userId: string, coilId: string) {
      return publicCoil((await coilAccess(db, coilId, userId, 'read')).coil);
    },

    /** Compare-and-set on the revision: exactly one of several saves from the same revision wins. */
    async saveDraft(userId: string, coilId: string, input: { document: CoilDocument; revision: number }) {
      const { coil } = await coilAccess(db, coilId, userId, 'edit');
      const saved = await saveCoilDraft(db, coilId, input.revision, {
        document: input.document,
        summary: summarize(input.document),
        updatedBy: userId,
      });
      if (!saved) {
        const current = (await findCoilTeam(db, coilId))?.revision;
        throw conflict(
          'stale_revision',
          `This coil was saved elsewhere since revision ${input.revision}; it is now at revision ${current ?? 'unknown'}. Reload to continue.`,
          { revision: String(current ?? '') },
        );
      }
      await touchProject(db, coil.projectId, userId);
      return saved;
    },

    async rename(userId: string, coilId: string, name: string) {
      await coilAccess(db, coilId, userId, 'edit');
      const row = await renameCoil(db, coilId, name, userId);
      if (!row) throw notFound('The coil'); // deleted between the check and the update
      return publicCoil(row);
    },

    async duplicate(userId: string, coilId: string) {
      const { coil } = await coilAccess(db, coilId, userId, 'edit');
      const row = await insertCoil(db, {
        projectId: coil.projectId,
        name: `${coil.name} (copy)`,
        document: coil.document,
        summary: coil.summary,
        createdBy: userId,
        updatedBy: userId,
      });
      await touchProject(db, coil.projectId, userId);
      return publicCoil(row);
    },

    async remove(userId: string, coilId: string) {
      const { coil } = await coilAccess(db, coilId, userId, 'edit');
      await deleteCoil(db, coilId);
      await touchProject(db, coil.projectId, userId);
    },
  };
}
