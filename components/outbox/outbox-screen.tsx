/**
 * E-mail captured by the development/test mail fake: newest first, with the links in each message clickable
 * (links to this app open in place).
 */
import { useQuery } from '@tanstack/react-query';
import { Link, type Href } from 'expo-router';
import { ActivityIndicator, Linking, Platform, StyleSheet, Text, View } from 'react-native';
import { ApiError } from '@/lib/api/client';
import { listOutbox } from '@/lib/api/outbox';
import type { OutboxMessage } from '@/lib/schema/api-outbox';
import { formatWhen } from '@/components/projects/format';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { messageOf } from '@/components/ui/form-errors';
import { PageHeader, Screen } from '@/components/ui/screen';
import { colors, fonts, space, type } from '@/components/ui/theme';

const URL_PATTERN = /(https?:\/\/[^\s<>"')]+)/g;

/** The app-internal path of a URL on this origin, or null for another site. */
function internalPath(url: string): string | null {
  if (Platform.OS !== 'web' || typeof window === 'undefined') return null;
  try {
    const u = new URL(url);
    return u.origin === window.location.origin ? `${u.pathname}${u.search}` : null;
  } catch {
    return null;
  }
}

function MessageText({ text }: { text: string }) {
  const parts = text.split(URL_PATTERN);
  return (
    <Text style={[type.small, styles.text]}>
      {parts.map((part, i) => {
        if (i % 2 === 0) return part;
        const path = internalPath(part);
        return path ? (
          <Link key={i} href={path as Href} style={styles.link}>
            {part}
          </Link>
        ) : (
          <Text key={i} role="link" style={styles.link} onPress={() => void Linking.openURL(part)}>
            {part}
          </Text>
        );
      })}
    </Text>
  );
}

function MessageCard({ m }: { m: OutboxMessage }) {
  return (
    <Card testID="outbox-message" accessibilityLabel={`E-mail to ${m.to}: ${m.subject}`}>
      <View style={styles.head}>
        <Text style={[type.bodyStrong, { color: colors.text }]}>{m.subject}</Text>
        <Text style={[type.caption, { color: colors.textMuted }]}>
          To {m.to} · {formatWhen(m.sentAt)}
        </Text>
      </View>
      <MessageText text={m.text} />
    </Card>
  );
}

export function OutboxScreen() {
  const outbox = useQuery({ queryKey: ['outbox'], queryFn: listOutbox, refetchInterval: 5_000 });
  let body: React.ReactNode;
  if (outbox.isPending) body = <ActivityIndicator color={colors.primary} accessibilityLabel="Loading the outbox" />;
  else if (outbox.isError) {
    const refused = outbox.error instanceof ApiError && outbox.error.status === 403;
    body = (
      <Banner tone="error" title={refused ? 'The outbox is for team owners' : 'Could not load the outbox'}>
        {messageOf(outbox.error)}
      </Banner>
    );
  } else if (outbox.data.length === 0) {
    body = <EmptyState title="No e-mail yet" message="Invitations and password-reset links sent by Tubeloom appear here in development." />;
  } else {
    const newestFirst = [...outbox.data].sort((a, b) => b.sentAt.localeCompare(a.sentAt));
    body = newestFirst.map((m) => <MessageCard key={m.id} m={m} />);
  }
  return (
    <Screen testID="outbox-screen">
      <PageHeader
        title="Outbox"
        subtitle="E-mail captured by the development mail server. Nothing here left the machine."
        actions={<Button label="Refresh" variant="secondary" size="sm" onPress={() => void outbox.refetch()} loading={outbox.isFetching} />}
      />
      {body}
    </Screen>
  );
}

const styles = StyleSheet.create({
  head: { gap: space.xxs },
  text: { color: colors.text, fontFamily: fonts.sans },
  link: { color: colors.primary, textDecorationLine: 'underline', fontFamily: fonts.sans },
});
