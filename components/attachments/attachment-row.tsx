/** One attachment: preview, name, size, who added it and when; Open for everyone, Delete for owners and designers. */
import { useState } from 'react';
import { Linking, StyleSheet, Text, View } from 'react-native';
import { attachmentDownloadLink } from '@/lib/api/attachments';
import type { Attachment } from '@/lib/schema/api-attachments';
import { AttachmentThumb } from '@/components/attachments/attachment-thumb';
import { formatFileSize } from '@/components/attachments/format-size';
import { formatWhenBy } from '@/components/projects/format';
import { Button } from '@/components/ui/button';
import { messageOf } from '@/components/ui/form-errors';
import { colors, space, type } from '@/components/ui/theme';

export function AttachmentRow({
  attachment,
  canEdit,
  onDelete,
  onError,
}: {
  attachment: Attachment;
  canEdit: boolean;
  onDelete: (attachment: Attachment) => void;
  onError: (message: string) => void;
}) {
  const [opening, setOpening] = useState(false);
  const open = async () => {
    setOpening(true);
    try {
      // A fresh 5-minute link each time, so an old page never offers a dead one.
      const { url } = await attachmentDownloadLink(attachment.id);
      await Linking.openURL(url);
    } catch (err) {
      onError(messageOf(err));
    } finally {
      setOpening(false);
    }
  };

  const meta = `${formatFileSize(attachment.sizeBytes)} · ${formatWhenBy(attachment.createdAt, attachment.uploadedBy?.name ?? null)}`;
  return (
    <View style={styles.row} testID={`attachment-${attachment.id}`}>
      <AttachmentThumb key={attachment.thumbnailUrl ?? attachment.id} attachment={attachment} />
      <View style={styles.text}>
        <Text style={[type.smallStrong, styles.name]} numberOfLines={2}>
          {attachment.fileName}
        </Text>
        <Text style={[type.caption, styles.meta]} numberOfLines={2}>
          {meta}
        </Text>
      </View>
      <View style={styles.actions}>
        <Button
          label="Open"
          size="sm"
          variant="secondary"
          onPress={() => void open()}
          loading={opening}
          accessibilityLabel={`Open ${attachment.fileName}`}
        />
        {canEdit ? (
          <Button
            label="Delete"
            size="sm"
            variant="ghost"
            onPress={() => onDelete(attachment)}
            accessibilityLabel={`Delete ${attachment.fileName}`}
          />
        ) : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  row: {
    flexDirection: 'row',
    alignItems: 'center',
    flexWrap: 'wrap',
    gap: space.md,
    paddingVertical: space.sm,
    borderBottomWidth: StyleSheet.hairlineWidth,
    borderBottomColor: colors.border,
  },
  text: { flex: 1, minWidth: 140, gap: space.xxs },
  name: { color: colors.text },
  meta: { color: colors.textMuted },
  actions: { flexDirection: 'row', gap: space.xs, marginLeft: 'auto' },
});
