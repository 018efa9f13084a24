/** Typed calls for a team's projects (DEVELOPERS.md, HTTP API). */
import { api } from '@/lib/api/client';
import {
  projectListReplySchema,
  projectReplySchema,
  type CreateProjectBody,
  type ListProjectsQuery,
  type Project,
  type UpdateProjectBody,
} from '@/lib/schema/api-projects';

export async function listProjects(teamId: string, query: ListProjectsQuery = {}): Promise<Project[]> {
  const params = new URLSearchParams();
  if (query.q) params.set('q', query.q);
  if (query.sort) params.set('sort', query.sort);
  if (query.dir) params.set('dir', query.dir);
  const qs = params.toString();
  const path = `/api/teams/${encodeURIComponent(teamId)}/projects${qs ? `?${qs}` : ''}`;
  return (await api.get(path, projectListReplySchema)).projects;
}

export async function createProject(teamId: string, body: CreateProjectBody): Promise<Project> {
  return (await api.post(`/api/teams/${encodeURIComponent(teamId)}/projects`, body, projectReplySchema)).project;
}

export async function getProject(projectId: string): Promise<Project> {
  return (await api.get(`/api/projects/${encodeURIComponent(projectId)}`, projectReplySchema)).project;
}

export async function updateProject(projectId: string, body: UpdateProjectBody): Promise<Project> {
  return (await api.patch(`/api/projects/${encodeURIComponent(projectId)}`, body, projectReplySchema)).project;
}

export async function deleteProject(projectId: string): Promise<void> {
  await api.delete(`/api/projects/${encodeURIComponent(projectId)}`);
}
