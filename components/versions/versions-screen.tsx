/**
 * A coil's saved versions, newest first: number, message, author, date, headline results with units, the latest
 * review decision; "Save version" for owners and designers, and a picker to compare any two versions.
 */
import { useQuery } from '@tanstack/react-query';
import { Link, useRouter } from 'expo-router';
import { useEffect, useState } from 'react';
import { ActivityIndicator, Pressable, StyleSheet, Text, View } from 'react-native';
import { listVersions, versionKeys } from '@/lib/api/versions';
import type { VersionListItem } from '@/lib/schema/api-versions';
import { formatQuantity, type UnitSystem } from '@/lib/units';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { messageOf } from '@/components/ui/form-errors';
import { PageHeader, Row, Screen, Stack } from '@/components/ui/screen';
import { Select } from '@/components/ui/select';
import { colors, radius, space, type, TOUCH_TARGET } from '@/components/ui/theme';
import { useUnitSystem } from '@/components/ui/use-unit-system';
import { DecisionBadge } from '@/components/versions/decision-panel';
import { formatDateTime } from '@/components/versions/format';
import { SaveVersionButton } from '@/components/versions/save-version-button';
import { useCoilAccess } from '@/components/versions/use-coil-access';

export function versionHref(versionId: string): string {
  return `/versions/${encodeURIComponent(versionId)}`;
}

export function compareHref(a: string, b: string): string {
  return `/compare/${encodeURIComponent(a)}/${encodeURIComponent(b)}`;
}

function summaryText(v: VersionListItem, system: UnitSystem): string {
  const s = v.summary;
  const parts: string[] = [];
  if (!s.valid) parts.push(`circuiting incomplete (${s.errorCount} ${s.errorCount === 1 ? 'error' : 'errors'})`);
  if (s.capacity_W !== null) parts.push(formatQuantity('power', s.capacity_W, system).label);
  if (s.waterPressureDrop_Pa !== null) parts.push(`water ${formatQuantity('waterPressureDrop', s.waterPressureDrop_Pa, system).label}`);
  parts.push(`${s.circuitCount} ${s.circuitCount === 1 ? 'circuit' : 'circuits'}`);
  parts.push(`${s.warningCount} ${s.warningCount === 1 ? 'warning' : 'warnings'}`);
  return parts.join(' · ');
}

export function VersionsScreen({ projectId, coilId }: { projectId: string; coilId: string }) {
  const { unitSystem } = useUnitSystem();
  const access = useCoilAccess(coilId);
  const versions = useQuery({ queryKey: versionKeys.list(coilId), queryFn: () => listVersions(coilId) });
  const list = versions.data ?? [];
  return (
    <Screen>
      <PageHeader
        title="Versions"
        subtitle={access.coilName ? `${access.coilName}${access.projectName ? ` · ${access.projectName}` : ''}` : undefined}
        actions={access.canEdit ? <SaveVersionButton coilId={coilId} /> : undefined}
      />
      <Link href={`/projects/${encodeURIComponent(projectId)}/coils/${encodeURIComponent(coilId)}`} style={styles.back}>
        <Text style={[type.smallStrong, { color: colors.primary }]}>← Back to the coil</Text>
      </Link>
      {versions.isPending ? <ActivityIndicator color={colors.primary} accessibilityLabel="Loading versions" /> : null}
      {versions.error ? <Banner tone="error">{messageOf(versions.error)}</Banner> : null}
      {versions.data && list.length === 0 ? (
        <EmptyState
          title="No versions yet"
          message="A version keeps the coil exactly as it is at that moment, so you can compare designs, share one for review and go back to it later."
          action={access.canEdit ? <SaveVersionButton coilId={coilId} /> : undefined}
          testID="versions-empty"
        />
      ) : null}
      {list.length >= 2 ? <ComparePicker versions={list} /> : null}
      {list.length > 0 ? (
        <Stack gap="sm">
          {list.map((v) => (
            <VersionRow key={v.id} version={v} system={unitSystem} />
          ))}
        </Stack>
      ) : null}
    </Screen>
  );
}

function VersionRow({ version: v, system }: { version: VersionListItem; system: UnitSystem }) {
  const router = useRouter();
  return (
    <Pressable
      role="link"
      accessibilityLabel={`Version ${v.number}: ${v.message}`}
      onPress={() => router.push(versionHref(v.id))}
      style={({ pressed }) => [styles.row, pressed && { backgroundColor: colors.surfaceMuted }]}
      testID={`version-row-${v.number}`}
    >
      <View style={styles.number}>
        <Text style={[type.numberLarge, { color: colors.primary }]}>{`v${v.number}`}</Text>
      </View>
      <View style={styles.rowText}>
        <Text style={[type.bodyStrong, { color: colors.text }]} numberOfLines={2}>
          {v.message}
        </Text>
        <Text style={[type.small, { color: colors.textMuted }]}>{summaryText(v, system)}</Text>
        <Text style={[type.caption, { color: colors.textMuted }]}>{`${v.author?.name ?? 'A former member'}, ${formatDateTime(v.createdAt)}`}</Text>
      </View>
      <DecisionBadge decision={v.latestDecision} testID={`version-row-${v.number}-decision`} />
    </Pressable>
  );
}

function ComparePicker({ versions }: { versions: VersionListItem[] }) {
  const router = useRouter();
  const [a, setA] = useState(versions[1].id);
  const [b, setB] = useState(versions[0].id);
  // A newly saved version becomes the default "later" side.
  useEffect(() => {
    setB(versions[0].id);
    setA(versions[1].id);
  }, [versions]);
  const options = versions.map((v) => ({ value: v.id, label: `Version ${v.number}`, description: v.message }));
  return (
    <Card title="Compare two versions" testID="compare-picker">
      <Row align="flex-end">
        <View style={styles.pick}>
          <Select label="Earlier" value={a} options={options} onChange={setA} testID="compare-a" />
        </View>
        <View style={styles.pick}>
          <Select label="Later" value={b} options={options} onChange={setB} testID="compare-b" />
        </View>
        <Button label="Compare" onPress={() => router.push(compareHref(a, b))} disabled={a === b} testID="compare-go" />
      </Row>
      {a === b ? <Text style={[type.small, { color: colors.textMuted }]}>Pick two different versions.</Text> : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  back: { minHeight: TOUCH_TARGET, justifyContent: 'center', display: 'flex', alignItems: 'center', alignSelf: 'flex-start' },
  row: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    alignItems: 'center',
    gap: space.md,
    padding: space.md,
    backgroundColor: colors.surface,
    borderWidth: 1,
    borderColor: colors.border,
    borderRadius: radius.md,
  },
  number: { minWidth: 48 },
  rowText: { flex: 1, minWidth: 200, gap: space.xxs },
  pick: { flexGrow: 1, flexBasis: 160, minWidth: 140 },
});
