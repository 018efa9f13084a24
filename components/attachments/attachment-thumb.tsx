/**
 * The 56 px preview beside an attachment: the server's thumbnail for photos, an extension badge otherwise. A
 * preview link that has expired (they last minutes) is fetched once more before falling back to the badge.
 * Give it `key={thumbnailUrl}` so a list reply with fresh links starts it over.
 */
import { useState } from 'react';
import { Image, StyleSheet, Text, View } from 'react-native';
import { attachmentThumbnailLink } from '@/lib/api/attachments';
import type { Attachment } from '@/lib/schema/api-attachments';
import { extensionLabel } from '@/components/attachments/format-size';
import { colors, radius, type } from '@/components/ui/theme';

export const THUMB_SIZE = 56;

export function AttachmentThumb({ attachment }: { attachment: Attachment }) {
  const [uri, setUri] = useState(attachment.thumbnailUrl);
  const [retried, setRetried] = useState(false);
  const [failed, setFailed] = useState(false);

  const onError = () => {
    if (retried || !attachment.hasThumbnail) {
      setFailed(true);
      return;
    }
    setRetried(true);
    attachmentThumbnailLink(attachment.id).then(
      (link) => setUri(link.url),
      () => setFailed(true),
    );
  };

  if (uri && !failed) {
    return (
      <Image
        source={{ uri }}
        onError={onError}
        style={styles.box}
        resizeMode="cover"
        accessibilityLabel={`Preview of ${attachment.fileName}`}
      />
    );
  }
  return (
    <View style={[styles.box, styles.badge]} accessibilityElementsHidden importantForAccessibility="no-hide-descendants">
      <Text style={[type.caption, styles.badgeText]} numberOfLines={1}>
        {extensionLabel(attachment.fileName)}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { width: THUMB_SIZE, height: THUMB_SIZE, borderRadius: radius.sm, backgroundColor: colors.surfaceMuted },
  badge: { alignItems: 'center', justifyContent: 'center', borderWidth: 1, borderColor: colors.border },
  badgeText: { color: colors.accentStrong, fontWeight: '600' },
});
