/** A link from the coil workspace to the coil's saved versions. */
import { Link } from 'expo-router';
import { StyleSheet, Text } from 'react-native';
import { colors, space, type, TOUCH_TARGET } from '@/components/ui/theme';

export function versionsHref(projectId: string, coilId: string): string {
  return `/projects/${encodeURIComponent(projectId)}/coils/${encodeURIComponent(coilId)}/versions`;
}

export function VersionLink({ projectId, coilId, label = 'Versions' }: { projectId: string; coilId: string; label?: string }) {
  return (
    <Link href={versionsHref(projectId, coilId)} style={styles.link} testID="versions-link" accessibilityLabel="Saved versions of this coil">
      <Text style={[type.smallStrong, { color: colors.primary }]}>{label}</Text>
    </Link>
  );
}

const styles = StyleSheet.create({
  link: { minHeight: TOUCH_TARGET, paddingHorizontal: space.sm, justifyContent: 'center', display: 'flex', alignItems: 'center' },
});
