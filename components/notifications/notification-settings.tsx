/** E-mail notification switches (GET / PUT /api/me/notifications): one per kind of message, saved on change. */
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { ActivityIndicator, StyleSheet, Switch, Text, View } from 'react-native';
import { getNotificationSettings, saveNotificationSettings, versionKeys } from '@/lib/api/versions';
import type { NotificationSettings as Settings } from '@/lib/schema/api-versions';
import { Banner } from '@/components/ui/banner';
import { Card } from '@/components/ui/card';
import { messageOf } from '@/components/ui/form-errors';
import { colors, FORM_MAX_WIDTH, space, type } from '@/components/ui/theme';

const KINDS: { key: keyof Settings; title: string; detail: string }[] = [
  { key: 'reviewRequested', title: 'Review requested', detail: 'A designer shares a version with your team for review.' },
  { key: 'newComment', title: 'New comment', detail: 'Someone comments on a version of a coil you created or last edited.' },
  { key: 'decision', title: 'Decision on your version', detail: 'A reviewer approves a version you saved or asks for changes.' },
];

export function NotificationSettings() {
  const queryClient = useQueryClient();
  const settings = useQuery({ queryKey: versionKeys.notifications, queryFn: getNotificationSettings });
  const save = useMutation({
    mutationFn: saveNotificationSettings,
    onMutate: async (next) => {
      await queryClient.cancelQueries({ queryKey: versionKeys.notifications });
      const before = queryClient.getQueryData<Settings>(versionKeys.notifications);
      queryClient.setQueryData(versionKeys.notifications, next);
      return { before };
    },
    onError: (_err, _next, context) => {
      if (context?.before) queryClient.setQueryData(versionKeys.notifications, context.before);
    },
    onSuccess: (saved) => queryClient.setQueryData(versionKeys.notifications, saved),
  });
  return (
    <Card title="E-mail notifications" style={{ maxWidth: FORM_MAX_WIDTH }} testID="notification-settings">
      {settings.isPending ? <ActivityIndicator color={colors.primary} accessibilityLabel="Loading notification settings" /> : null}
      {settings.error ? <Banner tone="error">{messageOf(settings.error)}</Banner> : null}
      {settings.data
        ? KINDS.map((k) => (
            <View key={k.key} style={styles.row}>
              <View style={styles.text}>
                <Text style={[type.bodyStrong, { color: colors.text }]}>{k.title}</Text>
                <Text style={[type.small, { color: colors.textMuted }]}>{k.detail}</Text>
              </View>
              <Switch
                value={settings.data[k.key]}
                onValueChange={(on) => save.mutate({ ...settings.data, [k.key]: on })}
                accessibilityLabel={`E-mail me: ${k.title}`}
                trackColor={{ true: colors.primary, false: colors.borderStrong }}
                testID={`notify-${k.key}`}
              />
            </View>
          ))
        : null}
      {save.error ? <Banner tone="error">{messageOf(save.error)}</Banner> : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md, paddingVertical: space.xs },
  text: { flex: 1, gap: space.xxs },
});
