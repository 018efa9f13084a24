/**
 * The workspace's "Versions & files" panel: downloads of the working draft (data sheet, drawings, CSV, JSON) and
 * the coil's attachments. Upload and delete only for owners and designers; the server checks again.
 */
import { StyleSheet, View } from 'react-native';
import { CoilAttachments } from '@/components/attachments/coil-attachments';
import { ExportPanel } from '@/components/exports/export-panel';
import { space } from '@/components/ui/theme';
import { useCoilAccess } from '@/components/versions/use-coil-access';

export function CoilFilesPanel({ coilId }: { coilId: string }) {
  const { canEdit } = useCoilAccess(coilId);
  return (
    <View style={styles.stack} testID="coil-files-panel">
      <ExportPanel coilId={coilId} />
      <CoilAttachments coilId={coilId} canEdit={canEdit} />
    </View>
  );
}

const styles = StyleSheet.create({ stack: { gap: space.md } });
