/**
 * Review links of one version (owners and designers): make a link (comments on or off, optional expiry), copy it
 * (the link is shown once: only its hash is stored), see who opened the version's links, revoke them.
 */
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import * as Clipboard from 'expo-clipboard';
import { useState } from 'react';
import { StyleSheet, Switch, Text, View } from 'react-native';
import { createShareLink, listShareLinks, revokeShareLink, versionKeys } from '@/lib/api/versions';
import type { CreatedShareLinkReply, ShareLink } from '@/lib/schema/api-versions';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ConfirmSheet } from '@/components/ui/confirm-sheet';
import { messageOf } from '@/components/ui/form-errors';
import { Row, Stack } from '@/components/ui/screen';
import { SegmentedControl } from '@/components/ui/segmented-control';
import { colors, fonts, radius, space, type } from '@/components/ui/theme';
import { formatDate, formatDateTime } from '@/components/versions/format';

type Expiry = 'never' | '1' | '7' | '30';
const EXPIRY_CHOICES = [
  { value: 'never', label: 'No expiry' },
  { value: '1', label: '1 day', accessibilityLabel: 'Expires after 1 day' },
  { value: '7', label: '7 days', accessibilityLabel: 'Expires after 7 days' },
  { value: '30', label: '30 days', accessibilityLabel: 'Expires after 30 days' },
] as const;

const DAY_ms = 24 * 3600 * 1000;

/** The link as the server gives it, made absolute against this page's origin when the server sent a path. */
function absoluteUrl(url: string): string {
  if (/^https?:\/\//.test(url)) return url;
  const origin = typeof window !== 'undefined' && window.location ? window.location.origin : '';
  return `${origin}${url.startsWith('/') ? '' : '/'}${url}`;
}

const STATE_WORDS: Record<ShareLink['state'], string> = { active: 'Active', revoked: 'Revoked', expired: 'Expired' };

export function ShareLinksPanel({ coilId, versionId, versionNumber }: { coilId: string; versionId: string; versionNumber: number }) {
  const queryClient = useQueryClient();
  const [allowComments, setAllowComments] = useState(true);
  const [expiry, setExpiry] = useState<Expiry>('7');
  const [created, setCreated] = useState<CreatedShareLinkReply | null>(null);
  const [copied, setCopied] = useState(false);
  const [revoking, setRevoking] = useState<ShareLink | null>(null);

  const links = useQuery({ queryKey: versionKeys.shareLinks(coilId), queryFn: () => listShareLinks(coilId) });
  const refresh = () => queryClient.invalidateQueries({ queryKey: versionKeys.shareLinks(coilId) });
  const create = useMutation({
    mutationFn: () =>
      createShareLink(versionId, {
        allowComments,
        expiresAt: expiry === 'never' ? null : new Date(Date.now() + Number(expiry) * DAY_ms).toISOString(),
      }),
    onSuccess: (reply) => {
      setCreated(reply);
      setCopied(false);
      void refresh();
    },
  });
  const revoke = useMutation({
    mutationFn: (link: ShareLink) => revokeShareLink(link.id),
    onSuccess: () => {
      setRevoking(null);
      void refresh();
    },
  });
  const mine = (links.data ?? []).filter((l) => l.versionId === versionId);
  const url = created ? absoluteUrl(created.url) : null;

  return (
    <Card title="Review links" testID="share-links">
      <Text style={[type.small, { color: colors.textMuted }]}>
        {`Anyone with a link can see version ${versionNumber} without signing in. Your team's reviewers get an e-mail when you make one.`}
      </Text>
      <Stack gap="md">
        <View style={styles.switchRow}>
          <Text style={[type.body, { color: colors.text, flex: 1 }]}>Let visitors comment</Text>
          <Switch
            value={allowComments}
            onValueChange={setAllowComments}
            accessibilityLabel="Let visitors comment"
            trackColor={{ true: colors.primary, false: colors.borderStrong }}
            testID="share-allow-comments"
          />
        </View>
        <SegmentedControl<Expiry> label="Link expiry" value={expiry} options={EXPIRY_CHOICES} onChange={setExpiry} testID="share-expiry" />
        <Row>
          <Button label="Create review link" onPress={() => create.mutate()} loading={create.isPending} testID="share-create" />
        </Row>
        {create.error ? <Banner tone="error">{messageOf(create.error)}</Banner> : null}
        {url ? (
          <Banner tone="success" title="Link ready: copy it now, it is shown only once" testID="share-created">
            <Text selectable style={styles.url} testID="share-url">
              {url}
            </Text>
            <Row gap="sm">
              <Button
                label={copied ? 'Copied' : 'Copy link'}
                size="sm"
                variant="secondary"
                onPress={() => {
                  void Clipboard.setStringAsync(url).then(() => setCopied(true));
                }}
                testID="share-copy"
              />
            </Row>
          </Banner>
        ) : null}
      </Stack>
      {links.error ? <Banner tone="error">{messageOf(links.error)}</Banner> : null}
      {mine.length > 0 ? (
        <View style={styles.list} testID="share-list">
          {mine.map((l) => (
            <View key={l.id} style={styles.link} testID={`share-link-${l.id}`}>
              <View style={styles.linkText}>
                <Text style={[type.smallStrong, { color: l.state === 'active' ? colors.success : colors.textMuted }]}>
                  {`${STATE_WORDS[l.state]} · ${l.allowComments ? 'comments on' : 'comments off'}`}
                </Text>
                <Text style={[type.caption, { color: colors.textMuted }]}>
                  {`Made ${formatDateTime(l.createdAt)}${l.createdBy ? ` by ${l.createdBy.name}` : ''} · ${l.expiresAt ? `expires ${formatDate(l.expiresAt)}` : 'no expiry'}`}
                </Text>
                <Text style={[type.caption, { color: colors.textMuted }]}>
                  {l.openCount === 0 ? 'Not opened yet' : `Opened ${l.openCount} ${l.openCount === 1 ? 'time' : 'times'}, last ${formatDateTime(l.lastOpenedAt ?? l.createdAt)}`}
                </Text>
              </View>
              {l.state === 'active' ? (
                <Button label="Revoke" size="sm" variant="secondary" onPress={() => setRevoking(l)} accessibilityLabel="Revoke this review link" testID="share-revoke" />
              ) : null}
            </View>
          ))}
        </View>
      ) : null}
      <ConfirmSheet
        open={revoking !== null}
        title="Revoke this review link?"
        message="People who open it will see that it is no longer available. Comments already left stay with the version."
        confirmLabel="Revoke link"
        onConfirm={() => revoking && revoke.mutate(revoking)}
        onClose={() => setRevoking(null)}
        busy={revoke.isPending}
        error={revoke.error ? messageOf(revoke.error) : null}
        testID="share-revoke-sheet"
      />
    </Card>
  );
}

const styles = StyleSheet.create({
  switchRow: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  url: { fontFamily: fonts.mono, fontSize: 13, color: colors.text, backgroundColor: colors.surface, padding: space.sm, borderRadius: radius.sm },
  list: { gap: space.sm },
  link: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.md, paddingVertical: space.sm, borderTopWidth: 1, borderTopColor: colors.border },
  linkText: { flex: 1, minWidth: 200, gap: space.xxs },
});
