/** Sign out: end the session, forget every cached reply, go to the sign-in page. */
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useRouter } from 'expo-router';
import { signOut } from '@/lib/api/auth';

export function useSignOut() {
  const queryClient = useQueryClient();
  const router = useRouter();
  return useMutation({
    mutationFn: signOut,
    onSuccess: () => {
      queryClient.clear();
      router.replace('/sign-in');
    },
  });
}
