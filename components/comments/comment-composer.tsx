/**
 * Writing a comment: the text, where it is pinned (the tube tapped on the sheet, or that tube's whole circuit,
 * or nothing) and, for guests on a review link, their name.
 */
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { TubeRef } from '@/lib/engine/types';
import type { CommentPin } from '@/lib/schema/api-versions';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { messageOf } from '@/components/ui/form-errors';
import { Row, Stack } from '@/components/ui/screen';
import { SegmentedControl } from '@/components/ui/segmented-control';
import { TextField } from '@/components/ui/text-field';
import { colors, radius, space, type } from '@/components/ui/theme';
import { pinLabel } from '@/components/comments/threads';

type PinChoice = 'tube' | 'circuit';

export interface ComposerProps {
  /** The tube tapped on the sheet, if any. */
  tube: TubeRef | null;
  /** The circuit that tube belongs to (1-based), if any. */
  circuit: number | null;
  onClearTube: () => void;
  /** Guests give a name; members do not. */
  guestName?: { value: string; onChange: (next: string) => void };
  onSubmit: (body: string, pin: CommentPin | null) => Promise<unknown>;
}

export function CommentComposer({ tube, circuit, onClearTube, guestName, onSubmit }: ComposerProps) {
  const [body, setBody] = useState('');
  const [choice, setChoice] = useState<PinChoice>('tube');
  const [errors, setErrors] = useState<{ body?: string; name?: string }>({});
  const [failure, setFailure] = useState<unknown>(null);
  const [sending, setSending] = useState(false);

  const pin: CommentPin | null = tube
    ? choice === 'circuit' && circuit !== null
      ? { kind: 'circuit', index: circuit }
      : { kind: 'tube', row: tube.row, tube: tube.tube }
    : null;

  const submit = async () => {
    const next: { body?: string; name?: string } = {};
    if (!body.trim()) next.body = 'Write a comment.';
    if (guestName && !guestName.value.trim()) next.name = 'Enter your name.';
    setErrors(next);
    if (next.body || next.name) return;
    setSending(true);
    setFailure(null);
    try {
      await onSubmit(body.trim(), pin);
      setBody('');
      onClearTube();
    } catch (err) {
      setFailure(err);
    } finally {
      setSending(false);
    }
  };

  return (
    <Stack gap="md">
      {guestName ? (
        <TextField label="Your name" value={guestName.value} onChangeText={guestName.onChange} error={errors.name} autoComplete="name" maxLength={100} testID="comment-guest-name" />
      ) : null}
      <View style={styles.pinBox} testID="comment-pin">
        {pin ? (
          <Stack gap="sm">
            <Text style={[type.small, { color: colors.text }]}>{`Pinned to: ${pinLabel(pin)}`}</Text>
            <Row gap="sm">
              {circuit !== null ? (
                <SegmentedControl<PinChoice>
                  label="Pin the comment to"
                  value={choice}
                  onChange={setChoice}
                  options={[
                    { value: 'tube', label: 'This tube' },
                    { value: 'circuit', label: `Circuit ${circuit}` },
                  ]}
                  testID="comment-pin-choice"
                />
              ) : null}
              <Button label="Unpin" variant="ghost" size="sm" onPress={onClearTube} testID="comment-unpin" />
            </Row>
          </Stack>
        ) : (
          <Text style={[type.small, { color: colors.textMuted }]}>Tap a tube on the sheet to pin your comment to it or to its circuit.</Text>
        )}
      </View>
      <TextField label="Comment" value={body} onChangeText={setBody} error={errors.body} multiline maxLength={5000} testID="comment-body" />
      {failure ? <Banner tone="error">{messageOf(failure)}</Banner> : null}
      <Row>
        <Button label="Add comment" onPress={() => void submit()} loading={sending} testID="comment-submit" />
      </Row>
    </Stack>
  );
}

const styles = StyleSheet.create({
  pinBox: { padding: space.md, borderRadius: radius.sm, borderWidth: 1, borderColor: colors.border, backgroundColor: colors.surfaceStripe },
});
