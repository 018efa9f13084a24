/**
 * The current team's projects: searchable and sortable (by the server), a table on wide screens and a list of
 * cards on phones, with "New project" for owners and designers.
 */
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { Link, useRouter } from 'expo-router';
import { useEffect, useState } from 'react';
import { ActivityIndicator, Pressable, StyleSheet, Text, View } from 'react-native';
import { listProjects } from '@/lib/api/projects';
import type { Project, ProjectSort } from '@/lib/schema/api-projects';
import { canEditProjects, useCurrentTeam } from '@/components/shell/use-current-team';
import { clientAndSite, formatWhenBy, nameOf } from '@/components/projects/format';
import { useMemberNames } from '@/components/projects/use-member-names';
import { ProjectFormSheet } from '@/components/projects/project-form-sheet';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { DataTable, type Column, type SortState } from '@/components/ui/data-table';
import { EmptyState } from '@/components/ui/empty-state';
import { messageOf } from '@/components/ui/form-errors';
import { PageHeader, Row, Screen, Stack } from '@/components/ui/screen';
import { Select } from '@/components/ui/select';
import { TextField } from '@/components/ui/text-field';
import { colors, radius, space, type } from '@/components/ui/theme';
import { useBreakpoint } from '@/components/ui/use-breakpoint';

const SORT_OPTIONS = [
  { value: 'updatedAt:desc', label: 'Recently updated' },
  { value: 'name:asc', label: 'Name, A to Z' },
  { value: 'name:desc', label: 'Name, Z to A' },
  { value: 'client:asc', label: 'Client, A to Z' },
] as const;
type SortOption = (typeof SORT_OPTIONS)[number]['value'];

function useDebounced<T>(value: T, ms: number): T {
  const [v, setV] = useState(value);
  useEffect(() => {
    const id = setTimeout(() => setV(value), ms);
    return () => clearTimeout(id);
  }, [value, ms]);
  return v;
}

export function ProjectsScreen() {
  const { isWide } = useBreakpoint();
  const router = useRouter();
  const { team } = useCurrentTeam();
  const [search, setSearch] = useState('');
  const q = useDebounced(search.trim(), 250);
  const [sort, setSort] = useState<SortState>({ key: 'updatedAt', dir: 'desc' });
  const [creating, setCreating] = useState(false);
  const canEdit = canEditProjects(team?.role);
  const names = useMemberNames(team?.id);
  const createdBy = (p: Project) => nameOf(p.createdBy, p.createdByName, names);
  const updatedBy = (p: Project) => nameOf(p.updatedBy, p.updatedByName, names);

  const projects = useQuery({
    queryKey: ['projects', team?.id, q, sort.key, sort.dir],
    queryFn: () => listProjects(team!.id, { q: q || undefined, sort: sort.key as ProjectSort, dir: sort.dir }),
    enabled: Boolean(team),
    placeholderData: keepPreviousData,
  });

  const newButton = canEdit ? (
    <Button label="New project" variant="accent" onPress={() => setCreating(true)} testID="new-project" />
  ) : null;

  const columns: Column<Project>[] = [
    {
      key: 'name',
      title: 'Project',
      sortable: true,
      flex: 2,
      minWidth: 200,
      render: (p) => (
        <Link href={`/projects/${p.id}`} style={[type.bodyStrong, styles.nameLink]} numberOfLines={2}>
          {p.name}
        </Link>
      ),
    },
    { key: 'client', title: 'Client', sortable: true, flex: 1.4, minWidth: 150, render: (p) => p.client || '—' },
    { key: 'site', title: 'Site', flex: 1.4, minWidth: 150, render: (p) => p.site || '—' },
    { key: 'coils', title: 'Coils', numeric: true, flex: 0.6, minWidth: 80, render: (p) => (p.coilCount == null ? '—' : p.coilCount) },
    { key: 'created', title: 'Created', flex: 1.5, minWidth: 180, render: (p) => formatWhenBy(p.createdAt, createdBy(p)) },
    { key: 'updatedAt', title: 'Last updated', sortable: true, flex: 1.5, minWidth: 180, render: (p) => formatWhenBy(p.updatedAt, updatedBy(p)) },
  ];

  const list = projects.data ?? [];
  let body: React.ReactNode;
  if (!team) {
    body = <Banner tone="warning">You are not in any team yet. Accept an invitation or ask an owner to add you.</Banner>;
  } else if (projects.isPending) {
    body = <ActivityIndicator color={colors.primary} accessibilityLabel="Loading projects" />;
  } else if (projects.isError) {
    body = (
      <Banner tone="error" title="Could not load the projects">
        {messageOf(projects.error)}
      </Banner>
    );
  } else if (list.length === 0 && !q) {
    body = (
      <EmptyState
        testID="projects-empty"
        title="No projects yet"
        message="A project holds the coils of one job: their tube sheets, circuits, results and versions. Start one for the job on your desk."
        action={newButton}
      />
    );
  } else if (list.length === 0) {
    body = <EmptyState title="No project matches" message={`Nothing in ${team.name} matches “${q}”. Try part of the name, client or site.`} />;
  } else if (isWide) {
    body = (
      <DataTable
        label={`Projects of ${team.name}`}
        columns={columns}
        rows={list}
        rowKey={(p) => p.id}
        sort={sort}
        onSortChange={setSort}
        testID="projects-table"
      />
    );
  } else {
    body = (
      <View role="list" accessibilityLabel={`Projects of ${team.name}`} style={styles.cards} testID="projects-list">
        {list.map((p) => (
          <Link key={p.id} href={`/projects/${p.id}`} asChild>
            <Pressable role="link" accessibilityLabel={`Open project ${p.name}`} style={styles.card}>
              <Text style={[type.bodyStrong, { color: colors.text }]} numberOfLines={2}>
                {p.name}
              </Text>
              <Text style={[type.small, { color: colors.textMuted }]} numberOfLines={2}>
                {clientAndSite(p)}
              </Text>
              <Text style={[type.caption, { color: colors.textMuted }]} numberOfLines={2}>
                {`Updated ${formatWhenBy(p.updatedAt, updatedBy(p))}`}
                {p.coilCount != null ? ` · ${p.coilCount} ${p.coilCount === 1 ? 'coil' : 'coils'}` : ''}
              </Text>
            </Pressable>
          </Link>
        ))}
      </View>
    );
  }

  const showTools = Boolean(team) && !(list.length === 0 && !q && projects.isSuccess);

  return (
    <Screen testID="projects-screen">
      <PageHeader title="Projects" subtitle={team ? team.name : undefined} actions={newButton} />
      <Stack>
        {showTools ? (
          <Row align="flex-end" style={styles.tools}>
            <View style={styles.search}>
              <TextField
                label="Search projects"
                value={search}
                onChangeText={setSearch}
                placeholder="Name, client or site"
                inputMode="search"
                testID="projects-search"
              />
            </View>
            {!isWide ? (
              <View style={styles.sortBox}>
                <Select<SortOption>
                  label="Sort by"
                  value={`${sort.key}:${sort.dir}` as SortOption}
                  options={SORT_OPTIONS}
                  onChange={(v) => {
                    const [key, dir] = v.split(':') as [string, 'asc' | 'desc'];
                    setSort({ key, dir });
                  }}
                />
              </View>
            ) : null}
            {projects.isFetching && !projects.isPending ? <ActivityIndicator color={colors.primary} accessibilityLabel="Refreshing" /> : null}
          </Row>
        ) : null}
        {body}
      </Stack>
      {team ? (
        <ProjectFormSheet
          open={creating}
          onClose={() => setCreating(false)}
          teamId={team.id}
          onSaved={(p) => router.push(`/projects/${p.id}`)}
        />
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  tools: { justifyContent: 'space-between' },
  search: { flexGrow: 1, flexBasis: 240, maxWidth: 480 },
  sortBox: { flexGrow: 1, flexBasis: 180 },
  cards: { gap: space.sm },
  card: {
    backgroundColor: colors.surface,
    borderWidth: 1,
    borderColor: colors.border,
    borderLeftWidth: 4,
    borderLeftColor: colors.accent,
    borderRadius: radius.md,
    padding: space.lg,
    gap: space.xs,
  },
  nameLink: { color: colors.primary },
});
