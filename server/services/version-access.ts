/**
 * Who may do what with versions and their review (DEVELOPERS.md, Roles): every member reads; owners and designers
 * save, restore and share versions; owners, designers and reviewers comment; owners and reviewers decide. A version
 * of a team the caller is not in is "not found" (404).
 */
import { findVersion, type FoundVersion } from '@/db/queries/versions';
import { findRole } from '@/db/queries/teams';
import type { Executor } from '@/db/client';
import type { Role } from '@/db/schema';
import { forbidden, notFound } from '@/server/errors';

export type ReviewCapability = 'read' | 'edit' | 'comment' | 'decide';

const ALLOWED: Record<ReviewCapability, readonly Role[]> = {
  read: ['owner', 'designer', 'reviewer', 'viewer'],
  edit: ['owner', 'designer'],
  comment: ['owner', 'designer', 'reviewer'],
  decide: ['owner', 'reviewer'],
};

const REFUSAL: Record<ReviewCapability, string> = {
  read: 'You are not a member of this team.',
  edit: 'Only owners and designers can save, restore and share versions.',
  comment: 'Viewers can read comments but not write them. Ask an owner for the reviewer role.',
  decide: 'Only reviewers and owners can approve a version or request changes.',
};

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
export const isUuid = (id: string) => UUID.test(id);

export function requireReviewCapability(role: Role, capability: ReviewCapability): void {
  if (!ALLOWED[capability].includes(role)) throw forbidden(REFUSAL[capability]);
}

/** The version and the caller's role in its team; 404 when unknown or another team's, 403 when the role may not. */
export async function versionAccess(
  db: Executor,
  versionId: string,
  userId: string,
  capability: ReviewCapability,
): Promise<{ version: FoundVersion; role: Role }> {
  const version = isUuid(versionId) ? await findVersion(db, versionId) : undefined;
  const role = version && (await findRole(db, version.teamId, userId));
  if (!version || !role) throw notFound('The version');
  requireReviewCapability(role, capability);
  return { version, role };
}
