/**
 * Who may do what (DEVELOPERS.md, Roles): every member reads; owners and designers edit projects, coils and
 * drafts; only owners manage members. Anything of a team the caller is not in is "not found" (404), so ids of
 * other teams leak nothing.
 */
import type { Executor } from '@/db/client';
import { findCoil } from '@/db/queries/coils';
import { findProject } from '@/db/queries/projects';
import { findRole } from '@/db/queries/teams';
import type { Role } from '@/db/schema';
import { AppError, forbidden, notFound } from '@/server/errors';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export type Capability = 'read' | 'edit' | 'manage';

const ALLOWED: Record<Capability, readonly Role[]> = {
  read: ['owner', 'designer', 'reviewer', 'viewer'],
  edit: ['owner', 'designer'],
  manage: ['owner'],
};

const REFUSAL: Record<Capability, string> = {
  read: 'You are not a member of this team.',
  edit: 'Only owners and designers can change projects and coils. Ask an owner for the designer role.',
  manage: 'Only team owners can invite, change roles or remove members.',
};

export function can(role: Role, capability: Capability): boolean {
  return ALLOWED[capability].includes(role);
}

export function requireCapability(role: Role, capability: Capability): void {
  if (!can(role, capability)) throw forbidden(REFUSAL[capability]);
}

function assertId(id: string, what: string): void {
  if (!UUID.test(id)) throw notFound(what);
}

export async function teamRole(db: Executor, teamId: string, userId: string, capability: Capability): Promise<Role> {
  assertId(teamId, 'The team');
  const role = await findRole(db, teamId, userId);
  if (!role) throw notFound('The team');
  requireCapability(role, capability);
  return role;
}

export async function projectAccess(db: Executor, projectId: string, userId: string, capability: Capability) {
  assertId(projectId, 'The project');
  const found = await findProject(db, projectId);
  const role = found && (await findRole(db, found.project.teamId, userId));
  if (!found || !role) throw notFound('The project');
  requireCapability(role, capability);
  return { ...found, role };
}

export async function coilAccess(db: Executor, coilId: string, userId: string, capability: Capability) {
  assertId(coilId, 'The coil');
  const found = await findCoil(db, coilId);
  const role = found && (await findRole(db, found.teamId, userId));
  if (!found || !role) throw notFound('The coil');
  requireCapability(role, capability);
  return { ...found, role };
}

export const conflict = (code: string, message: string, fields?: Record<string, string>) => new AppError(409, code, message, fields);
