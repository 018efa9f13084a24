/**
 * Comment threads, oldest first: the first comment with its pin and number (the number of its marker on the
 * sheet), its replies, a reply box, and resolve / reopen for those allowed to.
 */
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { Comment } from '@/lib/schema/api-versions';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { messageOf } from '@/components/ui/form-errors';
import { Row, Stack } from '@/components/ui/screen';
import { TextField } from '@/components/ui/text-field';
import { colors, radius, space, type } from '@/components/ui/theme';
import { authorName, pinLabel, type Thread } from '@/components/comments/threads';
import { formatDateTime } from '@/components/versions/format';

export interface ThreadActions {
  /** Present when the viewer may reply. */
  onReply?: (parentId: string, body: string) => Promise<unknown>;
  /** Present when the viewer may resolve and reopen threads. */
  onSetResolved?: (comment: Comment, resolved: boolean) => Promise<unknown>;
}

export function CommentThreads({ threads, ...actions }: { threads: readonly Thread[] } & ThreadActions) {
  if (threads.length === 0) {
    return (
      <Text style={[type.small, { color: colors.textMuted }]} testID="comments-empty">
        No comments yet.
      </Text>
    );
  }
  return (
    <Stack gap="md">
      {threads.map((t) => (
        <ThreadView key={t.root.id} thread={t} {...actions} />
      ))}
    </Stack>
  );
}

function CommentBody({ comment }: { comment: Comment }) {
  return (
    <View style={styles.comment}>
      <Text style={[type.smallStrong, { color: colors.text }]}>
        {authorName(comment)}
        <Text style={[type.caption, { color: colors.textMuted }]}>{`  ${formatDateTime(comment.createdAt)}`}</Text>
      </Text>
      <Text style={[type.body, { color: colors.text }]}>{comment.body}</Text>
    </View>
  );
}

function ThreadView({ thread, onReply, onSetResolved }: { thread: Thread } & ThreadActions) {
  const { root, replies, number } = thread;
  const [replying, setReplying] = useState(false);
  const [reply, setReply] = useState('');
  const [replyError, setReplyError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const [failure, setFailure] = useState<unknown>(null);

  const run = async (work: () => Promise<unknown>) => {
    setBusy(true);
    setFailure(null);
    try {
      await work();
      return true;
    } catch (err) {
      setFailure(err);
      return false;
    } finally {
      setBusy(false);
    }
  };

  const sendReply = async () => {
    if (!reply.trim()) {
      setReplyError('Write a reply.');
      return;
    }
    setReplyError(null);
    if (onReply && (await run(() => onReply(root.id, reply.trim())))) {
      setReply('');
      setReplying(false);
    }
  };

  return (
    <View style={[styles.thread, root.resolved && styles.resolved]} testID={`thread-${number}`}>
      <View style={styles.head}>
        <View style={[styles.badge, root.resolved && styles.badgeResolved]}>
          <Text style={[type.smallStrong, { color: '#FFFFFF' }]}>{String(number)}</Text>
        </View>
        <Text style={[type.caption, styles.pin]}>{root.pin ? pinLabel(root.pin) : 'Whole design'}</Text>
        {root.resolved ? <Text style={[type.caption, styles.state]}>Resolved</Text> : null}
      </View>
      <CommentBody comment={root} />
      {replies.length > 0 ? (
        <View style={styles.replies}>
          {replies.map((r) => (
            <CommentBody key={r.id} comment={r} />
          ))}
        </View>
      ) : null}
      {replying ? (
        <Stack gap="sm">
          <TextField label="Reply" value={reply} onChangeText={setReply} error={replyError} multiline maxLength={5000} testID={`thread-${number}-reply-body`} />
          <Row gap="sm">
            <Button label="Send reply" size="sm" onPress={() => void sendReply()} loading={busy} testID={`thread-${number}-reply-send`} />
            <Button label="Cancel" size="sm" variant="ghost" onPress={() => setReplying(false)} />
          </Row>
        </Stack>
      ) : (
        <Row gap="sm">
          {onReply ? <Button label="Reply" size="sm" variant="ghost" onPress={() => setReplying(true)} testID={`thread-${number}-reply`} /> : null}
          {onSetResolved ? (
            <Button
              label={root.resolved ? 'Reopen' : 'Resolve'}
              size="sm"
              variant="secondary"
              loading={busy}
              onPress={() => void run(() => onSetResolved(root, !root.resolved))}
              accessibilityLabel={`${root.resolved ? 'Reopen' : 'Resolve'} thread ${number}`}
              testID={`thread-${number}-${root.resolved ? 'reopen' : 'resolve'}`}
            />
          ) : null}
        </Row>
      )}
      {failure ? <Banner tone="error">{messageOf(failure)}</Banner> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  thread: { borderWidth: 1, borderColor: colors.border, borderRadius: radius.md, padding: space.md, gap: space.sm, backgroundColor: colors.surface },
  resolved: { backgroundColor: colors.surfaceStripe },
  head: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexWrap: 'wrap' },
  badge: { minWidth: 26, height: 26, borderRadius: 13, backgroundColor: colors.accent, alignItems: 'center', justifyContent: 'center', paddingHorizontal: space.xs },
  badgeResolved: { backgroundColor: colors.textMuted },
  pin: { color: colors.textMuted, flexShrink: 1 },
  state: { color: colors.success, fontFamily: type.smallStrong.fontFamily },
  comment: { gap: space.xxs },
  replies: { borderLeftWidth: 3, borderLeftColor: colors.border, paddingLeft: space.md, gap: space.sm },
});
