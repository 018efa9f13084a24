/** Switch between the user's teams; shown only when there is more than one. The choice is remembered. */
import { useQueryClient } from '@tanstack/react-query';
import { StyleSheet, Text, View } from 'react-native';
import { Select } from '@/components/ui/select';
import { colors, space, type } from '@/components/ui/theme';
import { ROLE_LABELS, useCurrentTeam } from '@/components/shell/use-current-team';

export function TeamPicker({ onDark = false, compact = false }: { onDark?: boolean; compact?: boolean }) {
  const { team, teams, chooseTeam } = useCurrentTeam();
  const queryClient = useQueryClient();
  if (!team) return null;
  if (teams.length < 2) {
    if (compact) return null;
    return (
      <View style={styles.single}>
        <Text style={[type.caption, { color: onDark ? colors.textOnDarkMuted : colors.textMuted }]}>Team</Text>
        <Text style={[type.bodyStrong, { color: onDark ? colors.textOnDark : colors.text }]} numberOfLines={2}>
          {team.name}
        </Text>
      </View>
    );
  }
  return (
    <View style={compact ? styles.compact : styles.single}>
      {compact ? null : <Text style={[type.caption, { color: onDark ? colors.textOnDarkMuted : colors.textMuted }]}>Team</Text>}
      <Select
        label="Team"
        hideLabel
        value={team.id}
        options={teams.map((t) => ({ value: t.id, label: t.name, description: `Your role: ${ROLE_LABELS[t.role]}` }))}
        onChange={(id) => {
          chooseTeam(id);
          void queryClient.invalidateQueries({ queryKey: ['projects'] });
        }}
        testID="team-picker"
      />
    </View>
  );
}

const styles = StyleSheet.create({
  single: { gap: space.xxs },
  compact: { maxWidth: 180, flexShrink: 1 },
});
