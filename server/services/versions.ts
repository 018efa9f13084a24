/**
 * Versions of a coil: immutable numbered snapshots of the draft with the solve summary of that moment; restoring
 * one makes it the draft again as a new revision; two versions of a team can be compared; reviewers and owners
 * record decisions on them.
 */
import { touchProject } from '@/db/queries/projects';
import {
  insertDecision,
  insertVersion,
  latestDecisions,
  listVersions,
  lockCoilDraft,
  nextVersionNumber,
  restoreDraft,
  type DecisionListRow,
} from '@/db/queries/versions';
import { findUserById } from '@/db/queries/users';
import type { CoilVersionRow } from '@/db/schema';
import type { CoilDocument } from '@/lib/engine/types';
import type { CompareReply, CreateDecisionBody, Decision, RestoreVersionReply, VersionDetail, VersionListItem } from '@/lib/schema/api-versions';
import { notFound } from '@/server/errors';
import { coilAccess, conflict } from '@/server/services/access';
import { summarizeCoil } from '@/server/services/coil-summary';
import { coilUrl } from '@/server/services/comments';
import type { ServiceDeps } from '@/server/services/context';
import type { NotificationService } from '@/server/services/notifications';
import { versionAccess } from '@/server/services/version-access';
import { compareDrawings } from '@/server/services/version-compare';
import { compareResults, solveVersion, versionSummary } from '@/server/services/version-results';

interface VersionListRow {
  id: string;
  coilId: string;
  number: number;
  message: string;
  draftRevision: number;
  summary: CoilVersionRow['summary'];
  createdAt: Date;
  authorId: string | null;
  authorName: string | null;
}

export function presentDecision(d: DecisionListRow): Decision {
  return {
    id: d.id,
    versionId: d.versionId,
    status: d.status,
    note: d.note,
    decidedBy: d.decidedById ? { id: d.decidedById, name: d.decidedByName ?? '' } : null,
    createdAt: d.createdAt.toISOString(),
  };
}

export function presentVersion(v: VersionListRow, latest: DecisionListRow | undefined): VersionListItem {
  return {
    id: v.id,
    coilId: v.coilId,
    number: v.number,
    message: v.message,
    draftRevision: v.draftRevision,
    author: v.authorId ? { id: v.authorId, name: v.authorName ?? '' } : null,
    createdAt: v.createdAt.toISOString(),
    summary: v.summary,
    latestDecision: latest ? presentDecision(latest) : null,
  };
}

export function versionService(deps: ServiceDeps, notifications: NotificationService) {
  const { db, logger } = deps;
  const solve = (document: Parameters<typeof solveVersion>[0]) => solveVersion(document, deps.solve, logger);

  return {
    /**
     * Numbers are taken under a lock on the coil row, so concurrent saves queue and get 1, 2, 3... The solve runs
     * before the lock on the draft as read then, and again inside only if the draft changed meanwhile. With a
     * `document` (a drawing kept from a conflicting edit) that document is stored instead and the draft is left
     * as it is; the version still records the draft revision it was taken beside.
     */
    async create(userId: string, coilId: string, message: string, document?: CoilDocument): Promise<VersionListItem> {
      const { coil } = await coilAccess(db, coilId, userId, 'edit');
      let solvedRevision = coil.revision;
      let summary = versionSummary(solve(document ?? coil.document));
      const row = await db.transaction(async (tx) => {
        const draft = await lockCoilDraft(tx, coilId);
        if (!draft) throw notFound('The coil');
        if (!document && draft.revision !== solvedRevision) {
          summary = versionSummary(solve(draft.document));
          solvedRevision = draft.revision;
        }
        const number = await nextVersionNumber(tx, coilId);
        const stored = document ?? draft.document;
        return insertVersion(tx, { coilId, number, message, document: stored, draftRevision: draft.revision, summary, authorId: userId });
      });
      const author = await findUserById(db, userId);
      return presentVersion({ ...row, authorName: author?.name ?? null }, undefined);
    },

    async list(userId: string, coilId: string): Promise<VersionListItem[]> {
      await coilAccess(db, coilId, userId, 'read');
      const rows = await listVersions(db, coilId);
      const decisions = new Map((await latestDecisions(db, rows.map((r) => r.id))).map((d) => [d.versionId, d]));
      return rows.map((r) => presentVersion(r, decisions.get(r.id)));
    },

    async get(userId: string, versionId: string): Promise<VersionDetail> {
      const { version } = await versionAccess(db, versionId, userId, 'read');
      const [latest] = await latestDecisions(db, [version.id]);
      return { ...presentVersion(version, latest), document: version.document };
    },

    /** The version's document becomes the draft as a new revision; editors holding the old revision get 409 on save. */
    async restore(userId: string, versionId: string): Promise<RestoreVersionReply> {
      const { version } = await versionAccess(db, versionId, userId, 'edit');
      const saved = await restoreDraft(db, version.coilId, {
        document: version.document,
        summary: summarizeCoil(version.document, deps.solve, logger),
        updatedBy: userId,
      });
      if (!saved) throw conflict('gone', 'The coil was deleted meanwhile.');
      await touchProject(db, version.projectId, userId);
      return { revision: saved.revision, updatedAt: saved.updatedAt.toISOString() };
    },

    async compare(userId: string, aId: string, bId: string): Promise<CompareReply> {
      const { version: a } = await versionAccess(db, aId, userId, 'read');
      const { version: b } = await versionAccess(db, bId, userId, 'read');
      if (a.teamId !== b.teamId) throw notFound('The version');
      return {
        a: { id: a.id, number: a.number, coilId: a.coilId },
        b: { id: b.id, number: b.number, coilId: b.coilId },
        ...compareDrawings(a.document, b.document),
        results: compareResults(solve(a.document), solve(b.document)),
      };
    },

    async decide(userId: string, versionId: string, input: CreateDecisionBody, origin: string): Promise<Decision> {
      const { version } = await versionAccess(db, versionId, userId, 'decide');
      const row = await insertDecision(db, { versionId, status: input.status, note: input.note ?? '', decidedBy: userId });
      const actor = await findUserById(db, userId);
      const actorName = actor?.name ?? '';
      await notifications.decisionRecorded(
        { teamId: version.teamId, coilName: version.coilName, versionNumber: version.number },
        { authorId: version.authorId, actorId: userId, actorName, status: row.status, note: row.note, url: coilUrl(origin, version) },
      );
      return presentDecision({ ...row, decidedById: row.decidedBy, decidedByName: actorName });
    },
  };
}
