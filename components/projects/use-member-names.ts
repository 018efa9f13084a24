/** user id → name for a team, from the member list (projects carry only the ids of who made and changed them). */
import { useQuery } from '@tanstack/react-query';
import { listMembers } from '@/lib/api/teams';

export function useMemberNames(teamId: string | undefined): ReadonlyMap<string, string> {
  const members = useQuery({
    queryKey: ['members', teamId],
    queryFn: () => listMembers(teamId!),
    enabled: Boolean(teamId),
  });
  return new Map((members.data?.members ?? []).map((m) => [m.userId, m.name]));
}
