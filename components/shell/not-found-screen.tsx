/** An address that leads nowhere. */
import { Link } from 'expo-router';
import { StyleSheet, Text, View } from 'react-native';
import { Brand } from '@/components/shell/brand';
import { colors, space, type } from '@/components/ui/theme';

export function NotFoundScreen() {
  return (
    <View style={styles.root}>
      <Brand onDark={false} size="lg" />
      <Text role="heading" aria-level={1} style={[type.title, { color: colors.text, textAlign: 'center' }]}>
        Nothing at this address
      </Text>
      <Text style={[type.body, { color: colors.textMuted, textAlign: 'center' }]}>
        The page may have moved, or the link is missing a part.
      </Text>
      <Link href="/" style={[type.bodyStrong, { color: colors.primary, textDecorationLine: 'underline' }]}>
        Go to your projects
      </Link>
    </View>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1, alignItems: 'center', justifyContent: 'center', gap: space.lg, padding: space.xl, backgroundColor: colors.background },
});
