/**
 * The signed-in user's unit system (SI or IP), read from GET /api/me through react-query and changed with
 * PATCH /api/me. The cached /api/me reply is updated in place so every screen switches units at once.
 */
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { getMe, ME_QUERY_KEY, updateMe } from '@/lib/api/me';
import type { MeReply, UnitSystem } from '@/lib/schema/api-auth';

export interface UnitSystemState {
  /** 'si' until /api/me has answered. */
  unitSystem: UnitSystem;
  /** True once the user's own choice is known. */
  isLoaded: boolean;
  setUnitSystem: (next: UnitSystem) => void;
  isSaving: boolean;
  /** Readable message when saving failed. */
  saveError: string | null;
}

export function useUnitSystem(): UnitSystemState {
  const queryClient = useQueryClient();
  const me = useQuery({ queryKey: ME_QUERY_KEY, queryFn: getMe });
  const mutation = useMutation({
    mutationFn: (unitSystem: UnitSystem) => updateMe({ unitSystem }),
    onSuccess: (user) => {
      queryClient.setQueryData<MeReply>(ME_QUERY_KEY, (old) => (old ? { ...old, user } : old));
    },
  });
  return {
    unitSystem: me.data?.user.unitSystem ?? 'si',
    isLoaded: me.data !== undefined,
    setUnitSystem: (next) => mutation.mutate(next),
    isSaving: mutation.isPending,
    saveError: mutation.error ? mutation.error.message : null,
  };
}
