/** Signed-in routes: the auth guard (401 → /sign-in) and the shell around every page. */
import { Slot } from 'expo-router';
import { AuthGate } from '@/components/shell/auth-gate';

export default function SignedInLayout() {
  return (
    <AuthGate>
      <Slot />
    </AuthGate>
  );
}
