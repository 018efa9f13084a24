/**
 * One saved version, read only: the tube sheet with comment markers, the results and warnings, the message, the
 * discussion (threads, replies, resolve / reopen), the review decision, the review links and "restore as the
 * working draft". What is offered follows the viewer's role; the server checks again.
 */
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { Link, useRouter } from 'expo-router';
import { useMemo, useState } from 'react';
import { ActivityIndicator, StyleSheet, Text } from 'react-native';
import { coilKeys } from '@/lib/api/coils';
import { solve } from '@/lib/api/solve';
import { getVersion, restoreVersion, versionKeys } from '@/lib/api/versions';
import type { TubeRef } from '@/lib/engine/types';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ConfirmSheet } from '@/components/ui/confirm-sheet';
import { messageOf } from '@/components/ui/form-errors';
import { PageHeader, Row, Screen } from '@/components/ui/screen';
import { colors, space, type, TOUCH_TARGET } from '@/components/ui/theme';
import { useUnitSystem } from '@/components/ui/use-unit-system';
import { CommentComposer } from '@/components/comments/comment-composer';
import { CommentThreads } from '@/components/comments/comment-threads';
import { useVersionComments } from '@/components/comments/use-version-comments';
import { circuitLookup } from '@/components/review/circuit-of-tube';
import { ResultsSummary } from '@/components/review/results-summary';
import { SplitLayout } from '@/components/review/split-layout';
import { StaticSheet } from '@/components/review/static-sheet';
import { DecisionPanel } from '@/components/versions/decision-panel';
import { formatDateTime } from '@/components/versions/format';
import { ShareLinksPanel } from '@/components/versions/share-links-panel';
import { useCoilAccess } from '@/components/versions/use-coil-access';
import { versionsHref } from '@/components/versions/version-link';

export function VersionScreen({ versionId }: { versionId: string }) {
  const version = useQuery({ queryKey: versionKeys.one(versionId), queryFn: () => getVersion(versionId) });
  if (version.isPending) {
    return (
      <Screen>
        <ActivityIndicator color={colors.primary} accessibilityLabel="Loading the version" />
      </Screen>
    );
  }
  if (version.isError) {
    return (
      <Screen>
        <Banner tone="error" title="This version could not be opened">
          {messageOf(version.error)}
        </Banner>
      </Screen>
    );
  }
  return <VersionBody version={version.data} />;
}

function VersionBody({ version }: { version: Awaited<ReturnType<typeof getVersion>> }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const { unitSystem } = useUnitSystem();
  const access = useCoilAccess(version.coilId);
  const comments = useVersionComments(version.id);
  const [tube, setTube] = useState<TubeRef | null>(null);
  const [confirmRestore, setConfirmRestore] = useState(false);
  const circuitOf = useMemo(() => circuitLookup(version.document), [version.document]);
  const result = useQuery({
    queryKey: [...versionKeys.one(version.id), 'result'],
    queryFn: () => solve(version.document),
    staleTime: Infinity, // a version never changes, so neither does its solve
  });
  const restore = useMutation({
    mutationFn: () => restoreVersion(version.id),
    onSuccess: () => {
      setConfirmRestore(false);
      // The workspace must load the restored draft, not a copy cached before the restore.
      queryClient.removeQueries({ queryKey: coilKeys.one(version.coilId) });
      if (access.projectId) router.push(`/projects/${encodeURIComponent(access.projectId)}/coils/${encodeURIComponent(version.coilId)}`);
    },
  });
  const markers = comments.threads
    .filter((t) => t.root.pin !== null)
    .map((t) => ({ id: t.root.id, number: t.number, pin: t.root.pin!, resolved: t.root.resolved }));

  const main = (
    <>
      <Card title="Tube sheet">
        <StaticSheet
          document={version.document}
          result={result.data ?? null}
          markers={markers}
          selectedTube={tube}
          onTubePress={access.canComment ? setTube : undefined}
          testID="version-sheet"
        />
        <Text style={[type.caption, { color: colors.textMuted }]}>
          {`${version.document.geometry.rows} rows, ${version.document.geometry.tubesPerRow} tubes high. Connection-end bends solid, opposite-end bends dashed. Numbered markers are comments.`}
        </Text>
      </Card>
      {result.data ? <ResultsSummary result={result.data} system={unitSystem} /> : null}
      {result.isPending ? <ActivityIndicator color={colors.primary} accessibilityLabel="Solving the version" /> : null}
      {result.error ? <Banner tone="error">{messageOf(result.error)}</Banner> : null}
    </>
  );

  const top = (
    <Card title="Message">
      <Text style={[type.body, { color: colors.text }]} testID="version-message">
        {version.message}
      </Text>
      <Text style={[type.caption, { color: colors.textMuted }]}>
        {`Saved ${formatDateTime(version.createdAt)}${version.author ? ` by ${version.author.name}` : ''} from draft revision ${version.draftRevision}`}
      </Text>
    </Card>
  );

  const aside = (
    <>
      <DecisionPanel versionId={version.id} coilId={version.coilId} latest={version.latestDecision} canDecide={access.canDecide} />
      <Card title="Comments" testID="comments">
        {comments.query.error ? <Banner tone="error">{messageOf(comments.query.error)}</Banner> : null}
        <CommentThreads
          threads={comments.threads}
          onReply={access.canComment ? comments.reply : undefined}
          onSetResolved={access.canComment ? (c, resolved) => comments.setResolved(c.id, resolved) : undefined}
        />
        {access.canComment ? (
          <CommentComposer tube={tube} circuit={tube ? circuitOf(tube) : null} onClearTube={() => setTube(null)} onSubmit={comments.add} />
        ) : null}
      </Card>
      {access.canEdit ? <ShareLinksPanel coilId={version.coilId} versionId={version.id} versionNumber={version.number} /> : null}
    </>
  );

  return (
    <Screen maxWidth={1400}>
      <PageHeader
        title={`Version ${version.number}`}
        subtitle={[access.coilName, access.projectName].filter(Boolean).join(' · ') || undefined}
        actions={
          access.canEdit ? (
            <Button label="Restore as working draft" variant="secondary" onPress={() => setConfirmRestore(true)} testID="version-restore" />
          ) : undefined
        }
      />
      {access.projectId ? (
        <Row gap="sm">
          <Link href={versionsHref(access.projectId, version.coilId)} style={styles.back}>
            <Text style={[type.smallStrong, { color: colors.primary }]}>← All versions</Text>
          </Link>
          <Link href={`/projects/${encodeURIComponent(access.projectId)}/coils/${encodeURIComponent(version.coilId)}`} style={styles.back}>
            <Text style={[type.smallStrong, { color: colors.primary }]}>Open the coil</Text>
          </Link>
        </Row>
      ) : null}
      <SplitLayout top={top} main={main} aside={aside} />
      <ConfirmSheet
        open={confirmRestore}
        title={`Restore version ${version.number}?`}
        message={`The working draft is replaced by version ${version.number}'s drawing and settings, as a new revision. Saved versions stay as they are; anyone editing the coil now is asked to reload.`}
        confirmLabel="Restore"
        onConfirm={() => restore.mutate()}
        onClose={() => setConfirmRestore(false)}
        busy={restore.isPending}
        error={restore.error ? messageOf(restore.error) : null}
        testID="version-restore-sheet"
      />
    </Screen>
  );
}

const styles = StyleSheet.create({
  back: { minHeight: TOUCH_TARGET, justifyContent: 'center', display: 'flex', alignItems: 'center', paddingRight: space.md },
});
