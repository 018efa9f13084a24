/**
 * "Save version": asks for a message, snapshots the coil's draft as the next numbered version and says which
 * number it got. Shown only to owners and designers of the coil's team. The version is made from the draft on the
 * server; the workspace autosaves, so pass `disabled` while a save is pending so it never misses the latest edit.
 */
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { Text } from 'react-native';
import { saveVersion, versionKeys } from '@/lib/api/versions';
import { createVersionBodySchema, type VersionListItem } from '@/lib/schema/api-versions';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { fieldErrorsFromApi, messageOf } from '@/components/ui/form-errors';
import { Row, Stack } from '@/components/ui/screen';
import { Sheet } from '@/components/ui/sheet';
import { TextField } from '@/components/ui/text-field';
import { colors, type } from '@/components/ui/theme';
import { useCoilAccess } from '@/components/versions/use-coil-access';

export function SaveVersionButton({
  coilId,
  disabled = false,
  onSaved,
}: {
  coilId: string;
  disabled?: boolean;
  onSaved?: (version: VersionListItem) => void;
}) {
  const queryClient = useQueryClient();
  const { canEdit } = useCoilAccess(coilId);
  const [open, setOpen] = useState(false);
  const [message, setMessage] = useState('');
  const [error, setError] = useState<string | null>(null);
  const [saved, setSaved] = useState<VersionListItem | null>(null);
  const save = useMutation({
    mutationFn: (text: string) => saveVersion(coilId, text),
    onSuccess: (version) => {
      setSaved(version);
      setMessage('');
      void queryClient.invalidateQueries({ queryKey: versionKeys.list(coilId) });
      onSaved?.(version);
    },
    onError: (err) => setError(fieldErrorsFromApi(err).message ?? null),
  });
  const submit = () => {
    const parsed = createVersionBodySchema.safeParse({ message });
    if (!parsed.success) {
      setError(parsed.error.issues[0]?.message ?? 'Describe what this version changes.');
      return;
    }
    setError(null);
    save.mutate(parsed.data.message);
  };
  const close = () => {
    setOpen(false);
    setSaved(null);
    setError(null);
    save.reset();
  };
  if (!canEdit) return null;
  return (
    <>
      <Button label="Save version" variant="secondary" size="sm" onPress={() => setOpen(true)} disabled={disabled} testID="save-version" />
      <Sheet open={open} title={saved ? `Version ${saved.number} saved` : 'Save a version'} onClose={close} testID="save-version-sheet">
        {saved ? (
          <Stack gap="md">
            <Banner tone="success" testID="save-version-done">{`Saved as version ${saved.number}. It stays as it is now, whatever you change next.`}</Banner>
            <Row>
              <Button label="Done" onPress={close} testID="save-version-close" />
            </Row>
          </Stack>
        ) : (
          <Stack gap="md">
            <Text style={[type.small, { color: colors.textMuted }]}>
              A version keeps the drawing, the conditions and the results as they are now. Reviewers see the message.
            </Text>
            <TextField
              label="What changed"
              value={message}
              onChangeText={setMessage}
              error={error}
              multiline
              maxLength={500}
              placeholder="e.g. Split into 8 circuits to bring the pressure drop down"
              testID="save-version-message"
            />
            {save.error && !error ? <Banner tone="error">{messageOf(save.error)}</Banner> : null}
            <Row>
              <Button label="Save version" onPress={submit} loading={save.isPending} testID="save-version-submit" />
              <Button label="Cancel" variant="ghost" onPress={close} />
            </Row>
          </Stack>
        )}
      </Sheet>
    </>
  );
}
