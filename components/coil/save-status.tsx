/**
 * The draft's save state in words, with the ways out of a conflict: load their draft, keep mine as a new version,
 * or keep both as versions and compare them. None of them writes over the other person's draft.
 */
import { StyleSheet, Text, View } from 'react-native';
import { Link } from 'expo-router';
import { Button } from '@/components/ui/button';
import { colors, radius, space, type } from '@/components/ui/theme';
import type { Autosave } from './use-autosave';

const words: Record<Autosave['state'], string> = {
  saved: 'Saved',
  pending: 'Unsaved changes',
  saving: 'Saving…',
  offline: 'Offline: will retry',
  conflict: 'Saved elsewhere',
  invalid: 'Not saved: fix a value',
  error: 'Not saved: retrying',
};

export function SaveStatus({ autosave }: { autosave: Autosave }) {
  const { state } = autosave;
  const tone = state === 'saved' ? colors.success : state === 'conflict' || state === 'invalid' || state === 'error' ? colors.danger : state === 'offline' ? colors.warning : colors.textMuted;
  return (
    <View style={styles.wrap}>
      <View style={[styles.pill, { borderColor: tone }]} accessibilityLiveRegion="polite" aria-live="polite">
        <View style={[styles.dot, { backgroundColor: tone }]} />
        <Text style={[type.caption, { color: tone }]} testID="save-status">
          {words[state]}
        </Text>
      </View>
      {state === 'conflict' ? (
        <View style={styles.conflict} testID="save-conflict">
          <Text style={[type.small, { color: colors.text, flexShrink: 1 }]}>{autosave.message}</Text>
          <Button size="sm" label="Load their draft" disabled={autosave.resolving} onPress={() => void autosave.reloadServerDraft()} testID="conflict-reload" />
          <Button
            size="sm"
            variant="secondary"
            label="Keep mine as a version"
            disabled={autosave.resolving}
            onPress={() => void autosave.keepMineAsVersion()}
            testID="conflict-keep-version"
          />
          <Button size="sm" variant="secondary" label="Compare" disabled={autosave.resolving} onPress={() => void autosave.compareWithTheirs()} testID="conflict-compare" />
        </View>
      ) : null}
      {state !== 'conflict' && autosave.kept ? (
        <View style={styles.kept} testID="conflict-kept">
          <Text style={[type.small, { color: colors.text, flexShrink: 1 }]}>Your drawing is saved as version {autosave.kept.number}.</Text>
          <Link href={`/versions/${encodeURIComponent(autosave.kept.versionId)}`} style={[type.small, { color: colors.primary }]} testID="conflict-kept-link">
            Open version {autosave.kept.number}
          </Link>
          <Button size="sm" variant="ghost" label="Dismiss" onPress={autosave.dismissKept} testID="conflict-kept-dismiss" />
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs, flexShrink: 1 },
  pill: { flexDirection: 'row', alignItems: 'center', gap: space.xs, borderWidth: 1, borderRadius: radius.pill, paddingHorizontal: space.sm, paddingVertical: 2, alignSelf: 'flex-start' },
  dot: { width: 8, height: 8, borderRadius: 4 },
  conflict: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm, padding: space.sm, backgroundColor: colors.dangerSoft, borderRadius: radius.sm },
  kept: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm, padding: space.sm, backgroundColor: colors.successSoft, borderRadius: radius.sm },
});
