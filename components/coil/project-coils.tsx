/**
 * The coils of one project, shown on the project page: each coil's size, circuits, capacity, water pressure drop
 * and warnings in the user's units; create (blank or from a starting point), open, rename, duplicate, delete.
 */
import { useState } from 'react';
import { ActivityIndicator, Pressable, StyleSheet, Text, View } from 'react-native';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useRouter } from 'expo-router';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ConfirmSheet } from '@/components/ui/confirm-sheet';
import { Sheet } from '@/components/ui/sheet';
import { TextField } from '@/components/ui/text-field';
import { colors, radius, space, type } from '@/components/ui/theme';
import { useUnitSystem } from '@/components/ui/use-unit-system';
import { canEditProjects, useCurrentTeam } from '@/components/shell/use-current-team';
import { coilKeys, createCoil, deleteCoil, duplicateCoil, listCoils, renameCoil, type CoilListItem } from '@/lib/api/coils';
import type { CoilDocument } from '@/lib/engine/types';
import { formatQuantity, type UnitSystem } from '@/lib/units';
import { ImportCoilButton } from '@/components/exports/import-coil-button';
import { NewCoilSheet } from './new-coil-sheet';

function coilFigures(c: CoilListItem, system: UnitSystem): string[] {
  const parts = [`${c.rows} rows × ${c.tubesPerRow} tubes high`];
  if (c.circuitCount != null) parts.push(`${c.circuitCount} circuit${c.circuitCount === 1 ? '' : 's'}`);
  parts.push(c.capacity_W != null ? `capacity ${formatQuantity('power', c.capacity_W, system).label}` : 'no capacity yet');
  if (c.waterPressureDrop_Pa != null) parts.push(`water pressure drop ${formatQuantity('waterPressureDrop', c.waterPressureDrop_Pa, system).label}`);
  if (c.warningCount != null) parts.push(`${c.warningCount} warning${c.warningCount === 1 ? '' : 's'}`);
  return parts;
}

export function ProjectCoils({ projectId }: { projectId: string }) {
  const queryClient = useQueryClient();
  const router = useRouter();
  const { unitSystem } = useUnitSystem();
  const { team } = useCurrentTeam();
  const canEdit = canEditProjects(team?.role);
  const coils = useQuery({ queryKey: coilKeys.list(projectId), queryFn: () => listCoils(projectId) });
  const [creating, setCreating] = useState(false);
  const [renaming, setRenaming] = useState<CoilListItem | null>(null);
  const [newName, setNewName] = useState('');
  const [deleting, setDeleting] = useState<CoilListItem | null>(null);
  const refresh = () => queryClient.invalidateQueries({ queryKey: coilKeys.list(projectId) });

  const create = useMutation({
    mutationFn: ({ name, doc }: { name: string; doc: CoilDocument }) => createCoil(projectId, name, doc),
    onSuccess: (coil) => {
      setCreating(false);
      void refresh();
      router.push(`/projects/${projectId}/coils/${coil.id}`);
    },
  });
  const rename = useMutation({
    mutationFn: ({ id, name }: { id: string; name: string }) => renameCoil(id, name),
    onSuccess: () => {
      setRenaming(null);
      void refresh();
    },
  });
  const duplicate = useMutation({ mutationFn: (id: string) => duplicateCoil(id), onSuccess: () => void refresh() });
  const remove = useMutation({
    mutationFn: (id: string) => deleteCoil(id),
    onSuccess: () => {
      setDeleting(null);
      void refresh();
    },
  });

  return (
    <Card title="Coils" actions={canEdit ? <Button size="sm" label="New coil" onPress={() => setCreating(true)} testID="new-coil" /> : undefined} testID={`project-coils-${projectId}`}>
      {canEdit ? <ImportCoilButton projectId={projectId} onImported={(c) => router.push(`/projects/${projectId}/coils/${c.id}`)} /> : null}
      {coils.isPending ? <ActivityIndicator color={colors.primary} /> : null}
      {coils.isError ? <Banner tone="error">{coils.error.message}</Banner> : null}
      {coils.data && coils.data.length === 0 ? (
        <Text style={[type.body, { color: colors.textMuted }]}>No coils yet. Start one from a blank tube sheet or a 1/2 in or 5/8 in starting point.</Text>
      ) : null}
      {duplicate.error ? <Banner tone="error">{duplicate.error.message}</Banner> : null}
      <View style={styles.list} testID="coil-list">
        {coils.data?.map((c) => (
          <View key={c.id} style={styles.item} testID={`coil-item-${c.id}`}>
            <Pressable role="link" accessibilityLabel={`Open coil ${c.name}`} onPress={() => router.push(`/projects/${projectId}/coils/${c.id}`)} style={styles.itemMain} testID="coil-open">
              <Text style={[type.bodyStrong, { color: colors.primary }]} numberOfLines={1}>
                {c.name}
              </Text>
              <View style={styles.figures}>
                {coilFigures(c, unitSystem).map((f) => (
                  <Text key={f} style={[type.number, styles.figure]}>
                    {f}
                  </Text>
                ))}
                {c.valid === false ? <Text style={[type.smallStrong, { color: colors.danger }]}>circuiting incomplete</Text> : null}
                {c.latestDecision ? (
                  <Text
                    style={[type.smallStrong, { color: c.latestDecision.status === 'approved' ? colors.success : colors.warning }]}
                    testID="coil-latest-decision"
                  >
                    {c.latestDecision.status === 'approved' ? 'approved' : 'changes requested'} (version {c.latestDecision.versionNumber})
                  </Text>
                ) : null}
              </View>
            </Pressable>
            {canEdit ? (
              <View style={styles.actions}>
                <Button size="sm" variant="ghost" label="Rename" accessibilityLabel={`Rename coil ${c.name}`} onPress={() => { setNewName(c.name); setRenaming(c); }} testID="coil-rename" />
                <Button size="sm" variant="ghost" label="Duplicate" accessibilityLabel={`Duplicate coil ${c.name}`} onPress={() => duplicate.mutate(c.id)} testID="coil-duplicate" />
                <Button size="sm" variant="ghost" label="Delete" accessibilityLabel={`Delete coil ${c.name}`} onPress={() => setDeleting(c)} testID="coil-delete" />
              </View>
            ) : null}
          </View>
        ))}
      </View>
      <NewCoilSheet open={creating} onClose={() => setCreating(false)} onCreate={(name, doc) => create.mutate({ name, doc })} busy={create.isPending} error={create.error ? create.error.message : null} />
      <Sheet
        open={renaming !== null}
        title="Rename coil"
        onClose={() => setRenaming(null)}
        testID="rename-coil-sheet"
        footer={
          <>
            <Button label="Cancel" variant="secondary" onPress={() => setRenaming(null)} />
            <Button label="Rename" loading={rename.isPending} onPress={() => renaming && newName.trim() && rename.mutate({ id: renaming.id, name: newName.trim() })} testID="rename-coil-save" />
          </>
        }
      >
        <TextField label="Name" value={newName} onChangeText={setNewName} error={rename.error ? rename.error.message : null} testID="rename-coil-name" />
      </Sheet>
      <ConfirmSheet
        open={deleting !== null}
        title="Delete coil"
        message={deleting ? `Delete "${deleting.name}" and its draft? This cannot be undone.` : ''}
        confirmLabel="Delete coil"
        onConfirm={() => deleting && remove.mutate(deleting.id)}
        onClose={() => setDeleting(null)}
        busy={remove.isPending}
        error={remove.error ? remove.error.message : null}
        testID="delete-coil"
      />
    </Card>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  item: { borderWidth: 1, borderColor: colors.border, borderRadius: radius.sm, padding: space.md, gap: space.sm, backgroundColor: colors.surface },
  itemMain: { gap: space.xs },
  figures: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.md, rowGap: space.xxs },
  figure: { color: colors.text },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
});
