/** The signed-in user and their teams (GET /api/me), shared by every screen through one react-query key. */
import { useQuery } from '@tanstack/react-query';
import { ApiError } from '@/lib/api/client';
import { getMe, ME_QUERY_KEY } from '@/lib/api/me';

export function useMe() {
  return useQuery({
    queryKey: ME_QUERY_KEY,
    queryFn: getMe,
    // 401 means "not signed in": an answer, not a failure worth retrying.
    retry: (count, error) => !(error instanceof ApiError && error.status >= 400 && error.status < 500) && count < 2,
  });
}

export function isSignedOutError(error: unknown): boolean {
  return error instanceof ApiError && error.status === 401;
}
