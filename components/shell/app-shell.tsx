/**
 * The signed-in frame. Phones: a header (mark, team picker, sign out) over the page and a bottom tab bar.
 * Wide screens (>= 1024 px): a sidebar with the mark, team, navigation and account.
 */
import { Link, usePathname } from 'expo-router';
import type { ReactNode } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import { Banner } from '@/components/ui/banner';
import { colors, palette, radius, space, type } from '@/components/ui/theme';
import { useBreakpoint } from '@/components/ui/use-breakpoint';
import { messageOf } from '@/components/ui/form-errors';
import { Brand } from '@/components/shell/brand';
import { NavIcon, type NavIconName } from '@/components/shell/nav-icons';
import { TeamPicker } from '@/components/shell/team-picker';
import { useMe } from '@/components/shell/use-me';
import { useSignOut } from '@/components/shell/use-sign-out';

interface NavItem {
  href: '/' | '/team' | '/settings' | '/outbox';
  label: string;
  icon: NavIconName;
}

// Under <Link asChild> (web) a style function is dropped and a style array crashes ("Failed to set an indexed
// property on CSSStyleDeclaration"), so children of Link asChild get one flattened style object.
const NAV: readonly NavItem[] = [
  { href: '/', label: 'Projects', icon: 'projects' },
  { href: '/team', label: 'Team', icon: 'team' },
  { href: '/settings', label: 'Settings', icon: 'settings' },
  { href: '/outbox', label: 'Outbox', icon: 'outbox' },
];

function isActive(href: NavItem['href'], pathname: string): boolean {
  return href === '/' ? pathname === '/' || pathname.startsWith('/projects') : pathname.startsWith(href);
}

export function AppShell({ children }: { children: ReactNode }) {
  const { isWide } = useBreakpoint();
  return isWide ? <WideShell>{children}</WideShell> : <PhoneShell>{children}</PhoneShell>;
}

function SignOutButton({ onDark }: { onDark: boolean }) {
  const signOut = useSignOut();
  return (
    <View style={styles.signOutWrap}>
      <Pressable
        role="button"
        accessibilityLabel="Sign out"
        aria-busy={signOut.isPending}
        disabled={signOut.isPending}
        onPress={() => signOut.mutate()}
        style={({ pressed }) => [styles.signOut, onDark && styles.signOutDark, pressed && { opacity: 0.7 }]}
        testID="sign-out"
      >
        <Text style={[type.smallStrong, { color: onDark ? colors.textOnDark : colors.primary }]}>
          {signOut.isPending ? 'Signing out…' : 'Sign out'}
        </Text>
      </Pressable>
      {signOut.error ? <Text style={[type.caption, { color: onDark ? palette.copper100 : colors.danger }]}>{messageOf(signOut.error)}</Text> : null}
    </View>
  );
}

function WideShell({ children }: { children: ReactNode }) {
  const pathname = usePathname();
  const me = useMe();
  return (
    <View style={styles.wideRoot}>
      <View style={styles.sidebar} role="navigation" accessibilityLabel="Main">
        <Brand />
        <TeamPicker onDark />
        <View style={styles.navList}>
          {NAV.map((item) => {
            const active = isActive(item.href, pathname);
            return (
              <Link key={item.href} href={item.href} asChild>
                <Pressable
                  role="link"
                  accessibilityLabel={item.label}
                  aria-selected={active}
                  style={StyleSheet.flatten([styles.sideItem, active && styles.sideItemOn])}
                >
                  <NavIcon name={item.icon} color={active ? palette.copper500 : colors.textOnDarkMuted} />
                  <Text style={[type.bodyStrong, { color: active ? colors.textOnDark : colors.textOnDarkMuted }]}>{item.label}</Text>
                </Pressable>
              </Link>
            );
          })}
        </View>
        <View style={styles.account}>
          {me.data ? (
            <View style={styles.accountText}>
              <Text style={[type.smallStrong, { color: colors.textOnDark }]} numberOfLines={1}>
                {me.data.user.name}
              </Text>
              <Text style={[type.caption, { color: colors.textOnDarkMuted }]} numberOfLines={1}>
                {me.data.user.email}
              </Text>
            </View>
          ) : null}
          <SignOutButton onDark />
        </View>
      </View>
      <View style={styles.wideMain} role="main">
        {children}
      </View>
    </View>
  );
}

function PhoneShell({ children }: { children: ReactNode }) {
  const pathname = usePathname();
  const insets = useSafeAreaInsets();
  return (
    <View style={styles.phoneRoot}>
      <View style={[styles.phoneHeader, { paddingTop: insets.top + space.sm }]} role="banner">
        <Brand />
        <View style={styles.headerRight}>
          <TeamPicker onDark compact />
          <SignOutButton onDark />
        </View>
      </View>
      <View style={styles.phoneMain} role="main">
        {children}
      </View>
      <View style={[styles.tabBar, { paddingBottom: insets.bottom }]} role="navigation" accessibilityLabel="Main">
        {NAV.map((item) => {
          const active = isActive(item.href, pathname);
          return (
            <Link key={item.href} href={item.href} asChild>
              <Pressable
                role="link"
                accessibilityLabel={item.label}
                aria-selected={active}
                style={styles.tab}
              >
                <View style={[styles.tabPill, active && styles.tabPillOn]}>
                  <NavIcon name={item.icon} color={active ? colors.primary : colors.textMuted} />
                </View>
                <Text style={[type.caption, { color: active ? colors.primary : colors.textMuted }]} numberOfLines={1}>
                  {item.label}
                </Text>
              </Pressable>
            </Link>
          );
        })}
      </View>
    </View>
  );
}

/** Shown by the auth gate when /api/me fails for a reason other than "not signed in". */
export function ShellError({ error, onRetry }: { error: unknown; onRetry: () => void }) {
  return (
    <View style={styles.center}>
      <Banner tone="error" title="Tubeloom could not load your account">
        {messageOf(error)}
      </Banner>
      <Pressable role="button" accessibilityLabel="Try again" onPress={onRetry} style={styles.retry}>
        <Text style={[type.bodyStrong, { color: colors.primary }]}>Try again</Text>
      </Pressable>
    </View>
  );
}

const styles = StyleSheet.create({
  wideRoot: { flex: 1, flexDirection: 'row', backgroundColor: colors.background },
  sidebar: {
    width: 248,
    backgroundColor: colors.chrome,
    paddingHorizontal: space.lg,
    paddingVertical: space.xl,
    gap: space.xl,
  },
  navList: { gap: space.xs, flex: 1 },
  sideItem: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.md,
    paddingHorizontal: space.md,
    minHeight: 44,
    borderRadius: radius.sm,
  },
  sideItemOn: { backgroundColor: colors.chromeRaised, borderLeftWidth: 3, borderLeftColor: palette.copper500 },
  account: { gap: space.sm, borderTopWidth: 1, borderTopColor: colors.chromeRaised, paddingTop: space.lg },
  accountText: { gap: space.xxs },
  wideMain: { flex: 1, minWidth: 0 },
  phoneRoot: { flex: 1, backgroundColor: colors.background },
  phoneHeader: {
    backgroundColor: colors.chrome,
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: space.sm,
    paddingHorizontal: space.lg,
    paddingBottom: space.sm,
  },
  headerRight: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexShrink: 1 },
  phoneMain: { flex: 1, minHeight: 0 },
  tabBar: {
    flexDirection: 'row',
    backgroundColor: colors.surface,
    borderTopWidth: 1,
    borderTopColor: colors.border,
  },
  tab: { flex: 1, alignItems: 'center', justifyContent: 'center', paddingVertical: space.xs, minHeight: 56, gap: space.xxs },
  tabPill: { paddingHorizontal: space.md, paddingVertical: space.xxs, borderRadius: radius.pill },
  tabPillOn: { backgroundColor: colors.primarySoft },
  signOutWrap: { alignItems: 'flex-start', gap: space.xxs },
  signOut: {
    minHeight: 36,
    justifyContent: 'center',
    paddingHorizontal: space.md,
    borderRadius: radius.sm,
    borderWidth: 1,
    borderColor: colors.borderStrong,
  },
  signOutDark: { borderColor: colors.chromeRaised, backgroundColor: colors.chromeRaised },
  center: { flex: 1, alignItems: 'center', justifyContent: 'center', padding: space.xl, gap: space.lg, backgroundColor: colors.background },
  retry: { minHeight: 44, justifyContent: 'center', paddingHorizontal: space.lg },
});
