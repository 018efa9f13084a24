/** The version's latest decision for everyone, and Approve / Request changes (with a note) for owners and reviewers. */
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { recordDecision, versionKeys } from '@/lib/api/versions';
import type { Decision, DecisionStatus } from '@/lib/schema/api-versions';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { messageOf } from '@/components/ui/form-errors';
import { Row } from '@/components/ui/screen';
import { TextField } from '@/components/ui/text-field';
import { colors, radius, space, type } from '@/components/ui/theme';
import { DECISION_LABELS, formatDateTime } from '@/components/versions/format';

export function DecisionBadge({ decision, testID }: { decision: Decision | null; testID?: string }) {
  const status = decision?.status;
  const look = status === 'approved' ? styles.approved : status === 'changes-requested' ? styles.changes : styles.pending;
  const fg = status === 'approved' ? colors.success : status === 'changes-requested' ? colors.danger : colors.textMuted;
  return (
    <View style={[styles.badge, look]} testID={testID}>
      <Text style={[type.caption, { color: fg, fontFamily: type.smallStrong.fontFamily }]}>{status ? DECISION_LABELS[status] : 'Not reviewed'}</Text>
    </View>
  );
}

export function DecisionPanel({
  versionId,
  coilId,
  latest,
  canDecide,
}: {
  versionId: string;
  coilId: string;
  latest: Decision | null;
  canDecide: boolean;
}) {
  const queryClient = useQueryClient();
  const [note, setNote] = useState('');
  const decide = useMutation({
    mutationFn: (status: DecisionStatus) => recordDecision(versionId, { status, note: note.trim() || undefined }),
    onSuccess: () => {
      setNote('');
      void queryClient.invalidateQueries({ queryKey: versionKeys.one(versionId) });
      void queryClient.invalidateQueries({ queryKey: versionKeys.list(coilId) });
    },
  });
  return (
    <Card title="Review decision" testID="decision-panel">
      <View style={styles.current}>
        <DecisionBadge decision={latest} testID="decision-status" />
        {latest ? (
          <Text style={[type.small, { color: colors.textMuted, flexShrink: 1 }]}>
            {`${latest.decidedBy?.name ?? 'A former member'}, ${formatDateTime(latest.createdAt)}`}
          </Text>
        ) : null}
      </View>
      {latest?.note ? (
        <Text style={[type.body, { color: colors.text }]} testID="decision-note">
          {latest.note}
        </Text>
      ) : null}
      {canDecide ? (
        <>
          <TextField label="Note (optional)" value={note} onChangeText={setNote} multiline maxLength={2000} testID="decision-note-input" />
          {decide.error ? <Banner tone="error">{messageOf(decide.error)}</Banner> : null}
          <Row gap="sm">
            <Button label="Approve" onPress={() => decide.mutate('approved')} loading={decide.isPending && decide.variables === 'approved'} disabled={decide.isPending} testID="decision-approve" />
            <Button
              label="Request changes"
              variant="secondary"
              onPress={() => decide.mutate('changes-requested')}
              loading={decide.isPending && decide.variables === 'changes-requested'}
              disabled={decide.isPending}
              testID="decision-request-changes"
            />
          </Row>
        </>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  current: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexWrap: 'wrap' },
  badge: { paddingHorizontal: space.sm, paddingVertical: space.xxs, borderRadius: radius.pill, borderWidth: 1, alignSelf: 'flex-start' },
  approved: { backgroundColor: colors.successSoft, borderColor: colors.success },
  changes: { backgroundColor: colors.dangerSoft, borderColor: colors.danger },
  pending: { backgroundColor: colors.surfaceMuted, borderColor: colors.border },
});
