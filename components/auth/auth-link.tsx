/** An inline text link between the account pages ("Forgot your password?"). */
import { Link, type Href } from 'expo-router';
import { StyleSheet, Text } from 'react-native';
import { colors, type } from '@/components/ui/theme';

export function AuthLink({ href, children }: { href: Href; children: string }) {
  return (
    <Link href={href} style={[type.bodyStrong, styles.link]}>
      {children}
    </Link>
  );
}

export function AuthNote({ children }: { children: React.ReactNode }) {
  return <Text style={[type.body, { color: colors.textMuted }]}>{children}</Text>;
}

const styles = StyleSheet.create({
  link: { color: colors.primary, textDecorationLine: 'underline' },
});
