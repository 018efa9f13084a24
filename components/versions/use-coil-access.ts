/**
 * The coil a version screen belongs to, its project, and the signed-in user's role in that project's team: the
 * screens show only the actions the role may take (DEVELOPERS.md, Roles); the server checks again.
 */
import { useQuery } from '@tanstack/react-query';
import { getCoil } from '@/lib/api/coils';
import { getProject } from '@/lib/api/projects';
import type { Role } from '@/lib/schema/api-auth';
import { useMe } from '@/components/shell/use-me';

export interface CoilAccess {
  coilName: string | null;
  projectId: string | null;
  projectName: string | null;
  role: Role | null;
  canEdit: boolean;
  canComment: boolean;
  canDecide: boolean;
}

export function useCoilAccess(coilId: string | null | undefined): CoilAccess {
  const me = useMe();
  // Its own key: the workspace caches the coil under coilKeys.one with its own rules (loaded once per visit).
  const coil = useQuery({ queryKey: ['coil-access', coilId], queryFn: () => getCoil(coilId!), enabled: Boolean(coilId), staleTime: 60_000 });
  const projectId = coil.data?.projectId ?? null;
  const project = useQuery({ queryKey: ['project', projectId], queryFn: () => getProject(projectId!), enabled: Boolean(projectId) });
  const teamId = project.data?.teamId;
  const role = (teamId ? me.data?.teams.find((t) => t.id === teamId)?.role : undefined) ?? null;
  return {
    coilName: coil.data?.name ?? null,
    projectId,
    projectName: project.data?.name ?? null,
    role,
    canEdit: role === 'owner' || role === 'designer',
    canComment: role === 'owner' || role === 'designer' || role === 'reviewer',
    canDecide: role === 'owner' || role === 'reviewer',
  };
}
