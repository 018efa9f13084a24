/** One project: its details with edit and delete (owners and designers), then its coils. */
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { Link, useRouter } from 'expo-router';
import { useState } from 'react';
import { ActivityIndicator, StyleSheet, Text, View } from 'react-native';
import { ApiError } from '@/lib/api/client';
import { deleteProject, getProject } from '@/lib/api/projects';
import { ProjectCoils } from '@/components/coil/project-coils';
import { canEditProjects, useCurrentTeam } from '@/components/shell/use-current-team';
import { formatWhenBy, nameOf } from '@/components/projects/format';
import { useMemberNames } from '@/components/projects/use-member-names';
import { ProjectFormSheet } from '@/components/projects/project-form-sheet';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ConfirmSheet } from '@/components/ui/confirm-sheet';
import { messageOf } from '@/components/ui/form-errors';
import { PageHeader, Screen } from '@/components/ui/screen';
import { colors, space, type } from '@/components/ui/theme';
import { useBreakpoint } from '@/components/ui/use-breakpoint';

function Detail({ label, value }: { label: string; value: string }) {
  return (
    <View style={styles.detail}>
      <Text style={[type.caption, { color: colors.textMuted }]}>{label}</Text>
      <Text style={[type.body, { color: colors.text }]}>{value}</Text>
    </View>
  );
}

export function ProjectScreen({ projectId }: { projectId: string }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const { isWide } = useBreakpoint();
  const { teams } = useCurrentTeam();
  const [editing, setEditing] = useState(false);
  const [confirming, setConfirming] = useState(false);
  const project = useQuery({ queryKey: ['project', projectId], queryFn: () => getProject(projectId) });
  const names = useMemberNames(project.data?.teamId);
  const remove = useMutation({
    mutationFn: () => deleteProject(projectId),
    onSuccess: () => {
      setConfirming(false);
      queryClient.removeQueries({ queryKey: ['project', projectId] });
      void queryClient.invalidateQueries({ queryKey: ['projects'] });
      router.replace('/');
    },
  });

  const back = (
    <Link href="/" style={[type.smallStrong, styles.back]}>
      ← All projects
    </Link>
  );

  if (project.isPending) {
    return (
      <Screen>
        {back}
        <ActivityIndicator color={colors.primary} accessibilityLabel="Loading the project" />
      </Screen>
    );
  }
  if (project.isError) {
    const missing = project.error instanceof ApiError && project.error.status === 404;
    return (
      <Screen>
        {back}
        <Banner tone="error" title={missing ? 'Project not found' : 'Could not load the project'}>
          {missing ? 'It may have been deleted, or it belongs to a team you are not in.' : messageOf(project.error)}
        </Banner>
      </Screen>
    );
  }

  const p = project.data;
  const role = teams.find((t) => t.id === p.teamId)?.role;
  const canEdit = canEditProjects(role);
  return (
    <Screen testID="project-screen">
      {back}
      <PageHeader
        title={p.name}
        subtitle={[p.client, p.site].filter(Boolean).join(' · ') || undefined}
        actions={
          canEdit ? (
            <>
              <Button label="Edit" variant="secondary" onPress={() => setEditing(true)} accessibilityLabel={`Edit project ${p.name}`} testID="project-edit" />
              <Button label="Delete" variant="danger" onPress={() => setConfirming(true)} accessibilityLabel={`Delete project ${p.name}`} testID="project-delete" />
            </>
          ) : null
        }
      />
      <Card title="Details">
        <View style={[styles.details, isWide && styles.detailsWide]}>
          <Detail label="Client" value={p.client || '—'} />
          <Detail label="Site" value={p.site || '—'} />
          <Detail label="Created" value={formatWhenBy(p.createdAt, nameOf(p.createdBy, p.createdByName, names))} />
          <Detail label="Last updated" value={formatWhenBy(p.updatedAt, nameOf(p.updatedBy, p.updatedByName, names))} />
        </View>
        {p.notes ? <Detail label="Notes" value={p.notes} /> : null}
      </Card>
      <ProjectCoils projectId={p.id} />
      <ProjectFormSheet open={editing} onClose={() => setEditing(false)} project={p} />
      <ConfirmSheet
        open={confirming}
        title="Delete this project?"
        message={`“${p.name}” and every coil in it will be deleted for everyone in the team. This cannot be undone.`}
        confirmLabel="Delete project"
        onConfirm={() => remove.mutate()}
        onClose={() => {
          setConfirming(false);
          remove.reset();
        }}
        busy={remove.isPending}
        error={remove.error ? messageOf(remove.error) : null}
        testID="project-delete-sheet"
      />
    </Screen>
  );
}

const styles = StyleSheet.create({
  back: { color: colors.primary, alignSelf: 'flex-start', paddingVertical: space.xs },
  details: { gap: space.md },
  detailsWide: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.xxl },
  detail: { gap: space.xxs, minWidth: 180, flexShrink: 1 },
});
