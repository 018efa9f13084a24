/** Projects of a team: every member reads, owners and designers create, edit and delete. */
import { deleteProject, insertProject, listProjects, updateProject, type ProjectSort } from '@/db/queries/projects';
import type { ProjectRow } from '@/db/schema';
import { projectAccess, teamRole } from '@/server/services/access';
import type { ServiceDeps } from '@/server/services/context';

export interface ProjectInput {
  name: string;
  client?: string;
  site?: string;
  notes?: string;
}

export function publicProject(row: { project: ProjectRow; coilCount: number; createdByName: string | null; updatedByName: string | null }) {
  const p = row.project;
  return {
    id: p.id,
    teamId: p.teamId,
    name: p.name,
    client: p.client,
    site: p.site,
    notes: p.notes,
    coilCount: row.coilCount,
    createdBy: p.createdBy,
    createdByName: row.createdByName,
    updatedBy: p.updatedBy,
    updatedByName: row.updatedByName,
    createdAt: p.createdAt,
    updatedAt: p.updatedAt,
  };
}

export function projectService(deps: ServiceDeps) {
  const { db } = deps;
  return {
    async list(userId: string, teamId: string, options: { q?: string; sort: ProjectSort; dir: 'asc' | 'desc' }) {
      await teamRole(db, teamId, userId, 'read');
      return (await listProjects(db, teamId, options)).map(publicProject);
    },

    async create(userId: string, teamId: string, input: ProjectInput) {
      await teamRole(db, teamId, userId, 'edit');
      const row = await insertProject(db, { ...input, teamId, createdBy: userId, updatedBy: userId });
      return publicProject(await projectAccess(db, row.id, userId, 'read'));
    },

    async get(userId: string, projectId: string) {
      return publicProject(await projectAccess(db, projectId, userId, 'read'));
    },

    async update(userId: string, projectId: string, patch: Partial<ProjectInput>) {
      await projectAccess(db, projectId, userId, 'edit');
      await updateProject(db, projectId, { ...patch, updatedBy: userId });
      return publicProject(await projectAccess(db, projectId, userId, 'read'));
    },

    async remove(userId: string, projectId: string) {
      await projectAccess(db, projectId, userId, 'edit');
      await deleteProject(db, projectId);
    },
  };
}

export type { ProjectSort };
