/**
 * A panel over the page for forms and confirmations: a bottom sheet on phones, a side panel on wide screens.
 * Closes on the backdrop, the close button and Escape (web, via Modal's onRequestClose).
 */
import type { ReactNode } from 'react';
import { Modal, Pressable, ScrollView, StyleSheet, Text, View } from 'react-native';
import { colors, radius, space, type } from '@/components/ui/theme';
import { useBreakpoint } from '@/components/ui/use-breakpoint';

export function Sheet({
  open,
  title,
  onClose,
  children,
  footer,
  testID,
}: {
  open: boolean;
  title: string;
  onClose: () => void;
  children: ReactNode;
  footer?: ReactNode;
  testID?: string;
}) {
  const { isWide } = useBreakpoint();
  return (
    <Modal visible={open} transparent animationType={isWide ? 'fade' : 'slide'} onRequestClose={onClose}>
      <View style={[styles.root, isWide ? styles.rootWide : styles.rootPhone]}>
        <Pressable style={StyleSheet.absoluteFill} onPress={onClose} accessibilityLabel="Close panel" role="button">
          <View style={styles.backdrop} />
        </Pressable>
        <View
          role="dialog"
          aria-modal
          accessibilityLabel={title}
          style={[styles.panel, isWide ? styles.panelWide : styles.panelPhone]}
          testID={testID}
        >
          <View style={styles.head}>
            <Text role="heading" aria-level={2} style={[type.heading, styles.title]}>
              {title}
            </Text>
            <Pressable
              role="button"
              accessibilityLabel={`Close ${title}`}
              onPress={onClose}
              style={({ pressed }) => [styles.close, pressed && { backgroundColor: colors.surfaceMuted }]}
            >
              <Text style={[type.heading, { color: colors.textMuted }]}>×</Text>
            </Pressable>
          </View>
          <ScrollView style={[styles.body, isWide && styles.bodyWide]} contentContainerStyle={styles.bodyContent} keyboardShouldPersistTaps="handled">
            {children}
          </ScrollView>
          {footer ? <View style={styles.footer}>{footer}</View> : null}
        </View>
      </View>
    </Modal>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1 },
  rootPhone: { justifyContent: 'flex-end' },
  rootWide: { flexDirection: 'row', justifyContent: 'flex-end' },
  backdrop: { flex: 1, backgroundColor: 'rgba(14, 42, 51, 0.45)' },
  panel: { backgroundColor: colors.background, overflow: 'hidden' },
  panelPhone: { maxHeight: '92%', borderTopLeftRadius: radius.lg, borderTopRightRadius: radius.lg },
  panelWide: { width: 460, maxWidth: '100%', height: '100%' },
  head: {
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: space.md,
    paddingHorizontal: space.lg,
    paddingVertical: space.md,
    borderBottomWidth: 1,
    borderBottomColor: colors.border,
    backgroundColor: colors.surface,
  },
  title: { color: colors.text, flexShrink: 1 },
  close: { width: 40, height: 40, borderRadius: radius.pill, alignItems: 'center', justifyContent: 'center' },
  body: { flexGrow: 0, flexShrink: 1 },
  bodyWide: { flexGrow: 1 },
  bodyContent: { padding: space.lg, gap: space.lg },
  footer: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    justifyContent: 'flex-end',
    gap: space.sm,
    padding: space.lg,
    borderTopWidth: 1,
    borderTopColor: colors.border,
    backgroundColor: colors.surface,
  },
});
