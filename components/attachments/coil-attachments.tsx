/**
 * The coil's photos and documents (site photos, submittals, test sheets): a list with previews for photos, and for
 * owners and designers "Add photo" (the phone's library), "Add file" (any PDF, photo, text or CSV), upload progress
 * and delete with confirmation. Mounted in the coil workspace as `<CoilAttachments coilId canEdit />`.
 */
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { ActivityIndicator, Pressable, StyleSheet, Text, View } from 'react-native';
import { attachmentKeys, deleteAttachment, listAttachments, type UploadSource } from '@/lib/api/attachments';
import { ATTACHMENT_MAX_LABEL, type Attachment } from '@/lib/schema/api-attachments';
import { AttachmentRow } from '@/components/attachments/attachment-row';
import { pickDocuments, pickPhotos } from '@/components/attachments/pick-files';
import { useAttachmentUploads, type UploadItem } from '@/components/attachments/use-attachment-uploads';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ConfirmSheet } from '@/components/ui/confirm-sheet';
import { messageOf } from '@/components/ui/form-errors';
import { colors, radius, space, type } from '@/components/ui/theme';

/** Preview links in the list last 5 minutes: refetch before they run out while the panel is open. */
const LIST_STALE_MS = 4 * 60 * 1000;

function UploadProgress({ item, onDismiss }: { item: UploadItem; onDismiss: () => void }) {
  const percent = Math.round(item.progress * 100);
  const failed = item.state === 'failed';
  return (
    <View style={styles.upload} testID="attachment-upload">
      <View style={styles.uploadHead}>
        <Text style={[type.small, styles.uploadName]} numberOfLines={1}>
          {item.name}
        </Text>
        {failed ? (
          <Pressable role="button" accessibilityLabel={`Dismiss the failed upload of ${item.name}`} onPress={onDismiss} hitSlop={8}>
            <Text style={[type.smallStrong, { color: colors.primary }]}>Dismiss</Text>
          </Pressable>
        ) : (
          <Text style={[type.number, styles.percent]}>{item.state === 'waiting' ? 'Waiting' : percent === 100 ? 'Checking' : `${percent} %`}</Text>
        )}
      </View>
      {failed ? (
        <Text style={[type.caption, { color: colors.danger }]} role="alert">
          {item.error}
        </Text>
      ) : (
        <View
          style={styles.track}
          role="progressbar"
          aria-valuemin={0}
          aria-valuemax={100}
          aria-valuenow={percent}
          accessibilityLabel={`Uploading ${item.name}`}
        >
          <View style={[styles.bar, { width: `${percent}%` }]} />
        </View>
      )}
    </View>
  );
}

export function CoilAttachments({ coilId, canEdit }: { coilId: string; canEdit: boolean }) {
  const queryClient = useQueryClient();
  const list = useQuery({
    queryKey: attachmentKeys.list(coilId),
    queryFn: () => listAttachments(coilId),
    staleTime: LIST_STALE_MS,
    refetchInterval: LIST_STALE_MS,
  });
  const uploads = useAttachmentUploads(coilId);
  const [problem, setProblem] = useState<string | null>(null);
  const [deleting, setDeleting] = useState<Attachment | null>(null);
  const remove = useMutation({
    mutationFn: (id: string) => deleteAttachment(id),
    onSuccess: () => {
      setDeleting(null);
      void queryClient.invalidateQueries({ queryKey: attachmentKeys.list(coilId) });
    },
  });

  const choose = async (picker: () => Promise<UploadSource[] | null>) => {
    setProblem(null);
    try {
      const picked = await picker();
      if (picked?.length) await uploads.start(picked);
    } catch (err) {
      setProblem(messageOf(err));
    }
  };

  const actions = canEdit ? (
    <View style={styles.headActions}>
      <Button label="Add photo" size="sm" variant="secondary" onPress={() => void choose(pickPhotos)} testID="attachments-add-photo" />
      <Button label="Add file" size="sm" variant="secondary" onPress={() => void choose(pickDocuments)} testID="attachments-add-file" />
    </View>
  ) : undefined;

  const attachments = list.data ?? [];
  return (
    <Card title="Attachments" actions={actions} testID="coil-attachments">
      <Text style={[type.caption, { color: colors.textMuted }]}>
        Photos (JPEG, PNG, WebP, HEIC), PDFs, text and CSV files up to {ATTACHMENT_MAX_LABEL} each. Review links never include them.
      </Text>
      {problem ? <Banner tone="error">{problem}</Banner> : null}
      {uploads.items.map((item) => (
        <UploadProgress key={item.key} item={item} onDismiss={() => uploads.dismiss(item.key)} />
      ))}
      {list.isPending ? (
        <ActivityIndicator color={colors.primary} accessibilityLabel="Loading attachments" />
      ) : list.isError ? (
        <Banner tone="error" title="Could not load the attachments">
          {messageOf(list.error)}
        </Banner>
      ) : attachments.length === 0 && uploads.items.length === 0 ? (
        <Text style={[type.small, styles.empty]} testID="attachments-empty">
          {canEdit ? 'No attachments yet. Add site photos, submittals or test sheets for this coil.' : 'No attachments on this coil yet.'}
        </Text>
      ) : (
        <View accessibilityLabel="Attachments of this coil">
          {attachments.map((a) => (
            <AttachmentRow key={a.id} attachment={a} canEdit={canEdit} onDelete={setDeleting} onError={setProblem} />
          ))}
        </View>
      )}
      <ConfirmSheet
        open={deleting !== null}
        title="Delete attachment?"
        message={deleting ? `"${deleting.fileName}" will be removed from this coil for everyone in the team. This cannot be undone.` : ''}
        confirmLabel="Delete"
        busy={remove.isPending}
        error={remove.isError ? messageOf(remove.error) : null}
        onConfirm={() => deleting && remove.mutate(deleting.id)}
        onClose={() => {
          setDeleting(null);
          remove.reset();
        }}
        testID="attachment-delete"
      />
    </Card>
  );
}

const styles = StyleSheet.create({
  headActions: { flexDirection: 'row', gap: space.xs, flexWrap: 'wrap' },
  empty: { color: colors.textMuted, paddingVertical: space.md },
  upload: { gap: space.xs, paddingVertical: space.xs },
  uploadHead: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  uploadName: { flex: 1, color: colors.text },
  percent: { color: colors.textMuted },
  track: { height: 6, borderRadius: radius.pill, backgroundColor: colors.surfaceMuted, overflow: 'hidden' },
  bar: { height: 6, borderRadius: radius.pill, backgroundColor: colors.primary },
});
