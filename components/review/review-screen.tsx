/**
 * The public review page a review link opens (no sign-in, phone first): the version's sheet, results, warnings
 * and message, and, when the link allows it, the discussion where a guest comments under their name, pinned to a
 * tube or circuit by tapping the sheet. A revoked, expired or unknown link gets a plain "no longer available".
 */
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useEffect, useMemo, useState, type ReactNode } from 'react';
import { ActivityIndicator, StyleSheet, Text, View } from 'react-native';
import { ApiError } from '@/lib/api/client';
import { addGuestComment, openReview, versionKeys } from '@/lib/api/versions';
import type { TubeRef } from '@/lib/engine/types';
import type { CommentPin, ReviewReply } from '@/lib/schema/api-versions';
import { Brand } from '@/components/shell/brand';
import { Banner } from '@/components/ui/banner';
import { Card } from '@/components/ui/card';
import { messageOf } from '@/components/ui/form-errors';
import { Screen } from '@/components/ui/screen';
import { colors, space, type } from '@/components/ui/theme';
import { CommentComposer } from '@/components/comments/comment-composer';
import { CommentThreads } from '@/components/comments/comment-threads';
import { groupThreads } from '@/components/comments/threads';
import { circuitLookup } from '@/components/review/circuit-of-tube';
import { ResultsSummary } from '@/components/review/results-summary';
import { SplitLayout } from '@/components/review/split-layout';
import { StaticSheet } from '@/components/review/static-sheet';
import { useGuestUnits, UnitToggle } from '@/components/review/unit-toggle';
import { formatDate, formatDateTime } from '@/components/versions/format';

const GUEST_NAME_KEY = 'tubeloom.guestName';

function storedGuestName(): string {
  try {
    return typeof localStorage === 'undefined' ? '' : (localStorage.getItem(GUEST_NAME_KEY) ?? '');
  } catch {
    return '';
  }
}

function rememberGuestName(name: string): void {
  try {
    if (typeof localStorage !== 'undefined') localStorage.setItem(GUEST_NAME_KEY, name);
  } catch {
    // Storage may be unavailable (private mode): the visitor types the name again next time.
  }
}

export function ReviewScreen({ token }: { token: string }) {
  const review = useQuery({
    queryKey: versionKeys.review(token),
    queryFn: () => openReview(token),
    retry: (count, error) => !(error instanceof ApiError && error.status >= 400 && error.status < 500) && count < 2,
    refetchOnWindowFocus: false, // every fetch counts as an opening of the link
    staleTime: Infinity,
  });
  if (review.isPending) {
    return (
      <Frame>
        <ActivityIndicator color={colors.primary} accessibilityLabel="Opening the design" />
      </Frame>
    );
  }
  if (review.isError) {
    const gone = review.error instanceof ApiError && review.error.status === 404;
    return (
      <Frame>
        <View style={styles.gone} testID={gone ? 'review-unavailable' : 'review-error'}>
          <Text role="heading" aria-level={1} style={[type.title, { color: colors.text, textAlign: 'center' }]}>
            {gone ? 'This review link is no longer available' : 'The design could not be opened'}
          </Text>
          <Text style={[type.body, { color: colors.textMuted, textAlign: 'center' }]}>
            {gone
              ? 'It may have expired or been withdrawn by the person who shared it. Ask them for a new link.'
              : messageOf(review.error)}
          </Text>
        </View>
      </Frame>
    );
  }
  return <ReviewBody token={token} review={review.data} />;
}

function Frame({ children }: { children: ReactNode }) {
  return (
    <Screen maxWidth={1400}>
      <View style={styles.brand}>
        <Brand onDark={false} />
        <Text style={[type.small, { color: colors.textMuted }]}>Design review</Text>
      </View>
      {children}
    </Screen>
  );
}

function ReviewBody({ token, review }: { token: string; review: ReviewReply }) {
  const queryClient = useQueryClient();
  const { version, result } = review;
  const [units, setUnits] = useGuestUnits();
  const [tube, setTube] = useState<TubeRef | null>(null);
  const [guestName, setGuestName] = useState('');
  useEffect(() => setGuestName(storedGuestName()), []);
  const circuitOf = useMemo(() => circuitLookup(version.document), [version.document]);
  const threads = useMemo(() => groupThreads(review.comments ?? []), [review.comments]);
  const markers = threads
    .filter((t) => t.root.pin !== null)
    .map((t) => ({ id: t.root.id, number: t.number, pin: t.root.pin!, resolved: t.root.resolved }));

  const post = async (body: string, pin: CommentPin | null, parentId?: string) => {
    const name = guestName.trim();
    if (!name) throw new Error('Enter your name in the comment form first.');
    const comment = await addGuestComment(token, { guestName: name, body, pin, parentId });
    rememberGuestName(name);
    // Add it in place: fetching the review again would count as another opening of the link.
    queryClient.setQueryData<ReviewReply>(versionKeys.review(token), (old) => (old ? { ...old, comments: [...(old.comments ?? []), comment] } : old));
  };

  const main = (
    <>
      <Card title="Tube sheet">
        <StaticSheet
          document={version.document}
          result={result}
          markers={markers}
          selectedTube={review.allowComments ? tube : null}
          onTubePress={review.allowComments ? setTube : undefined}
          testID="review-sheet"
        />
        <Text style={[type.caption, { color: colors.textMuted }]}>
          {`${version.document.geometry.rows} rows, ${version.document.geometry.tubesPerRow} tubes high; air enters at row 1. Connection-end bends solid, opposite-end bends dashed; S and R mark the supply and return connections.`}
        </Text>
      </Card>
      <ResultsSummary result={result} system={units} testID="review-results" />
    </>
  );

  const top = (
    <Card title="About this version">
      <Text style={[type.body, { color: colors.text }]} testID="review-message">
        {version.message}
      </Text>
      <Text style={[type.caption, { color: colors.textMuted }]}>
        {`Saved ${formatDateTime(version.createdAt)}${version.author ? ` by ${version.author}` : ''}${review.expiresAt ? ` · link open until ${formatDate(review.expiresAt)}` : ''}`}
      </Text>
      <UnitToggle value={units} onChange={setUnits} />
    </Card>
  );

  const aside = (
    <>
      <Card title="Comments" testID="review-comments">
        {review.allowComments ? (
          <>
            <CommentThreads threads={threads} onReply={(parentId, body) => post(body, null, parentId)} />
            <CommentComposer
              tube={tube}
              circuit={tube ? circuitOf(tube) : null}
              onClearTube={() => setTube(null)}
              guestName={{ value: guestName, onChange: setGuestName }}
              onSubmit={(body, pin) => post(body, pin)}
            />
          </>
        ) : (
          <Banner tone="info">Comments are turned off for this link.</Banner>
        )}
      </Card>
    </>
  );

  return (
    <Frame>
      <View style={styles.title}>
        <Text role="heading" aria-level={1} style={[type.title, { color: colors.text }]} testID="review-title">
          {`${version.coilName}, version ${version.number}`}
        </Text>
      </View>
      <SplitLayout top={top} main={main} aside={aside} />
    </Frame>
  );
}

const styles = StyleSheet.create({
  brand: { flexDirection: 'row', alignItems: 'center', gap: space.md, flexWrap: 'wrap' },
  title: { gap: space.xs },
  gone: { alignItems: 'center', gap: space.md, paddingVertical: space.xxxl, maxWidth: 520, alignSelf: 'center' },
});
