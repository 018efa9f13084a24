/** Ask before something that cannot be undone; shows progress and the failure in place. */
import { Text } from 'react-native';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Sheet } from '@/components/ui/sheet';
import { colors, type } from '@/components/ui/theme';

export function ConfirmSheet({
  open,
  title,
  message,
  confirmLabel,
  onConfirm,
  onClose,
  busy = false,
  error,
  testID,
}: {
  open: boolean;
  title: string;
  message: string;
  confirmLabel: string;
  onConfirm: () => void;
  onClose: () => void;
  busy?: boolean;
  error?: string | null;
  testID?: string;
}) {
  return (
    <Sheet
      open={open}
      title={title}
      onClose={onClose}
      testID={testID}
      footer={
        <>
          <Button label="Cancel" variant="secondary" onPress={onClose} disabled={busy} />
          <Button label={confirmLabel} variant="danger" onPress={onConfirm} loading={busy} testID={testID ? `${testID}-confirm` : undefined} />
        </>
      }
    >
      <Text style={[type.body, { color: colors.text }]}>{message}</Text>
      {error ? <Banner tone="error">{error}</Banner> : null}
    </Sheet>
  );
}
