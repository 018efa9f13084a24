/**
 * Guards the signed-in part of the app: while /api/me loads it shows a spinner, on 401 it sends the user to
 * /sign-in (remembering where they were going), otherwise it renders the shell around the page.
 */
import { Redirect, usePathname } from 'expo-router';
import type { ReactNode } from 'react';
import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { colors } from '@/components/ui/theme';
import { AppShell, ShellError } from '@/components/shell/app-shell';
import { isSignedOutError, useMe } from '@/components/shell/use-me';

export function AuthGate({ children }: { children: ReactNode }) {
  const me = useMe();
  const pathname = usePathname();
  if (me.isPending) {
    return (
      <View style={styles.center}>
        <ActivityIndicator size="large" color={colors.primary} accessibilityLabel="Loading your account" />
      </View>
    );
  }
  if (me.isError) {
    if (isSignedOutError(me.error)) {
      const next = pathname && pathname !== '/' ? `?next=${encodeURIComponent(pathname)}` : '';
      return <Redirect href={`/sign-in${next}`} />;
    }
    return <ShellError error={me.error} onRetry={() => void me.refetch()} />;
  }
  return <AppShell>{children}</AppShell>;
}

const styles = StyleSheet.create({
  center: { flex: 1, alignItems: 'center', justifyContent: 'center', backgroundColor: colors.background },
});
