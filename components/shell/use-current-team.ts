/**
 * Which of the user's teams the screens show. The choice is remembered in localStorage (web) so the next visit
 * opens the same team; a remembered team the user has left falls back to the first team.
 */
import { create } from 'zustand';
import type { TeamMembership } from '@/lib/schema/api-auth';
import { useMe } from '@/components/shell/use-me';

const STORAGE_KEY = 'tubeloom.currentTeamId';

function readStored(): string | null {
  try {
    return typeof localStorage === 'undefined' ? null : localStorage.getItem(STORAGE_KEY);
  } catch {
    return null;
  }
}

const useTeamChoice = create<{ teamId: string | null; choose: (id: string) => void }>((set) => ({
  teamId: readStored(),
  choose: (id) => {
    try {
      if (typeof localStorage !== 'undefined') localStorage.setItem(STORAGE_KEY, id);
    } catch {
      // Storage may be unavailable (private mode); the choice then lasts for this visit only.
    }
    set({ teamId: id });
  },
}));

export interface CurrentTeam {
  team: TeamMembership | null;
  teams: TeamMembership[];
  chooseTeam: (id: string) => void;
}

export function useCurrentTeam(): CurrentTeam {
  const me = useMe();
  const { teamId, choose } = useTeamChoice();
  const teams = me.data?.teams ?? [];
  const team = teams.find((t) => t.id === teamId) ?? teams[0] ?? null;
  return { team, teams, chooseTeam: choose };
}

/** Role names for people, and what each may do (DEVELOPERS.md, Roles). */
export const ROLE_LABELS = {
  owner: 'Owner',
  designer: 'Designer',
  reviewer: 'Reviewer',
  viewer: 'Viewer',
} as const;

export const ROLE_DESCRIPTIONS = {
  owner: 'Everything, including inviting people and changing roles',
  designer: 'Create and edit projects and coils',
  reviewer: 'Read everything and review shared designs',
  viewer: 'Read projects, coils and results',
} as const;

export function canEditProjects(role: TeamMembership['role'] | undefined): boolean {
  return role === 'owner' || role === 'designer';
}
