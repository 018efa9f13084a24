/**
 * The coil workspace: the editor, the geometry and conditions forms and the live results. Wide screens put the
 * editor in the middle with forms on the left and results on the right; phones give the editor the screen and
 * put forms and results under tabs. The draft autosaves; results follow every change.
 */
import { useCallback, useDeferredValue, useMemo, useState, type ReactNode } from 'react';
import { ActivityIndicator, ScrollView, StyleSheet, Text, View } from 'react-native';
import { useQuery } from '@tanstack/react-query';
import { Link } from 'expo-router';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { SegmentedControl } from '@/components/ui/segmented-control';
import { Sheet } from '@/components/ui/sheet';
import { colors, space, type } from '@/components/ui/theme';
import { useBreakpoint } from '@/components/ui/use-breakpoint';
import { useUnitSystem } from '@/components/ui/use-unit-system';
import { CircuitEditor } from '@/canvas/editor';
import { createEditorStore, type EditorStore } from '@/canvas/store';
import { useEditor } from '@/canvas/use-editor';
import { coilKeys, getCoil, type Coil } from '@/lib/api/coils';
import type { TubeRef } from '@/lib/engine/types';
import { formatQuantity, type UnitSystem } from '@/lib/units';
import { CircuitSummary } from './circuit-summary';
import { ConditionsForm } from './conditions-form';
import { GeneratorPanel } from './generator-panel';
import { GeometryForm } from './geometry-form';
import { ResultsPanel } from './results-panel';
import { SaveStatus } from './save-status';
import { useAutosave } from './use-autosave';
import { SaveVersionButton } from '@/components/versions/save-version-button';
import { VersionLink } from '@/components/versions/version-link';
import { useLiveSolve } from './use-live-solve';

export interface CoilWorkspaceProps {
  projectId: string;
  coilId: string;
  /**
   * Panels the app mounts beside the results (versions, files, exports): shown under the results in the right-hand
   * column on wide screens and at the end of the Results tab on phones, under the heading "Versions & files".
   */
  extraPanels?: ReactNode;
}

export function CoilWorkspace({ projectId, coilId, extraPanels }: CoilWorkspaceProps) {
  const coil = useQuery({ queryKey: coilKeys.one(coilId), queryFn: () => getCoil(coilId), staleTime: Infinity, gcTime: 0 });
  if (coil.isPending) {
    return (
      <View style={styles.center}>
        <ActivityIndicator color={colors.primary} />
      </View>
    );
  }
  if (coil.isError) {
    return (
      <View style={styles.center}>
        <Banner tone="error" title="This coil could not be opened">
          {coil.error.message}
        </Banner>
        <Link href={`/projects/${projectId}`} style={[type.bodyStrong, { color: colors.primary }]}>
          Back to the project
        </Link>
      </View>
    );
  }
  return <LoadedWorkspace key={coil.data.id} coil={coil.data} extraPanels={extraPanels} />;
}

type PhoneTab = 'sheet' | 'geometry' | 'conditions' | 'results';
type FormTab = 'geometry' | 'conditions';

function LoadedWorkspace({ coil, extraPanels }: { coil: Coil; extraPanels?: ReactNode }) {
  const [store] = useState<EditorStore>(() => createEditorStore(coil.document));
  const autosave = useAutosave(coil.id, store, coil.revision);
  // Deferred: the editor subscribes to the store itself and draws an edit at once; the forms, results and live
  // solve follow in a deferred render, so they never hold up the sheet.
  const document = useDeferredValue(useEditor(store, (s) => s.document));
  const version = useDeferredValue(useEditor(store, (s) => s.documentVersion));
  const live = useLiveSolve(coil.id, document, version);
  const { unitSystem, setUnitSystem } = useUnitSystem();
  const { isWide } = useBreakpoint();
  const [phoneTab, setPhoneTab] = useState<PhoneTab>('sheet');
  const [formTab, setFormTab] = useState<FormTab>('geometry');
  const [generatorOpen, setGeneratorOpen] = useState(false);

  const fieldErrors = useMemo(() => Object.fromEntries(live.documentIssues.map((i) => [i.path, i.message])), [live.documentIssues]);
  const formatTemperature = useCallback((c: number) => formatQuantity('temperature', c, unitSystem).label, [unitSystem]);
  const onSelectIssue = useCallback(
    (tubes: TubeRef[], circuits: number[]) => {
      store.getState().select({ kind: 'issue', tubes, circuits });
      setPhoneTab('sheet');
    },
    [store],
  );
  const onSelectCircuit = useCallback(
    (index: number) => {
      store.getState().select({ kind: 'circuit', circuit: index });
      setPhoneTab('sheet');
    },
    [store],
  );

  // Elements kept between renders: an edit re-renders the workspace, and React skips children whose element is
  // the same object (the forms subscribe to their own part of the document).
  // The editor is told which document the result belongs to: it may already show a newer one.
  const resultDocument = live.fresh ? document : null;
  const editor = useMemo(
    () => (
      <CircuitEditor store={store} result={live.fresh ? live.result : null} resultDocument={resultDocument} formatTemperature={formatTemperature} keyboard={isWide} />
    ),
    [store, live.fresh, live.result, resultDocument, formatTemperature, isWide],
  );
  const results = useMemo(
    () => (
      <>
        <ResultsPanel live={live} system={unitSystem} onSelectIssue={onSelectIssue} onSelectCircuit={onSelectCircuit} />
        {extraPanels ? (
          <View style={styles.extra} testID="workspace-extra-panels">
            <Text role="heading" aria-level={2} style={[type.smallStrong, styles.extraTitle]}>
              Versions & files
            </Text>
            {extraPanels}
          </View>
        ) : null}
      </>
    ),
    [live, unitSystem, onSelectIssue, onSelectCircuit, extraPanels],
  );
  const geometryForm = useMemo(() => <GeometryForm store={store} system={unitSystem} fieldErrors={fieldErrors} />, [store, unitSystem, fieldErrors]);
  const conditionsForm = useMemo(() => <ConditionsForm store={store} system={unitSystem} fieldErrors={fieldErrors} />, [store, unitSystem, fieldErrors]);
  const summary = useMemo(() => <CircuitSummary topology={live.topology} />, [live.topology]);

  // The parts of the layout are memoised too: an edit or a save-state change re-renders the workspace at once (the
  // store and the autosave state are read here), and only what depends on them should follow.
  const saveBlocked = autosave.state !== 'saved';
  const title = useMemo(
    () => (
      <View style={styles.titleBlock}>
        <Link href={`/projects/${coil.projectId}`} style={[type.caption, { color: colors.primary }]} testID="back-to-project">
          ‹ Project
        </Link>
        <Text role="heading" aria-level={1} style={[isWide ? type.heading : type.bodyStrong, { color: colors.text }]} numberOfLines={1} testID="coil-title">
          {document.name}
        </Text>
      </View>
    ),
    [coil.projectId, isWide, document.name],
  );
  const headerActions = useMemo(
    () => (
      <View style={styles.headerActions}>
        <SegmentedControl<UnitSystem>
          label="Units"
          value={unitSystem}
          options={[
            { value: 'si', label: 'SI', accessibilityLabel: 'SI units' },
            { value: 'ip', label: 'IP', accessibilityLabel: 'IP units' },
          ]}
          onChange={setUnitSystem}
          testID="unit-switch"
        />
        <Button size="sm" variant="secondary" label="Standard circuiting" onPress={() => setGeneratorOpen(true)} testID="open-generator" />
        <VersionLink projectId={coil.projectId} coilId={coil.id} />
        {/* A version is cut from the server's draft: wait until every edit is saved. */}
        <SaveVersionButton coilId={coil.id} disabled={saveBlocked} />
      </View>
    ),
    [unitSystem, setUnitSystem, coil.projectId, coil.id, saveBlocked],
  );
  const header = (
    <View style={styles.header}>
      {title}
      <SaveStatus autosave={autosave} />
      {headerActions}
    </View>
  );

  const generator = useMemo(
    () => (
      <Sheet open={generatorOpen} title="Standard circuiting" onClose={() => setGeneratorOpen(false)} testID="generator-sheet">
        {generatorOpen ? <GeneratorPanel store={store} system={unitSystem} onApplied={() => setGeneratorOpen(false)} /> : null}
      </Sheet>
    ),
    [generatorOpen, store, unitSystem],
  );

  const wideBody = useMemo(
    () =>
      isWide ? (
        <View style={styles.wideBody}>
          <View style={styles.side}>
            <View style={styles.sideTabs}>
              <SegmentedControl<FormTab>
                label="Form"
                value={formTab}
                options={[
                  { value: 'geometry', label: 'Geometry' },
                  { value: 'conditions', label: 'Conditions' },
                ]}
                onChange={setFormTab}
                testID="form-tabs"
              />
            </View>
            <ScrollView contentContainerStyle={styles.sideContent} keyboardShouldPersistTaps="handled">
              {formTab === 'geometry' ? geometryForm : conditionsForm}
            </ScrollView>
          </View>
          <View style={styles.centre}>
            {editor}
            {summary}
          </View>
          <View style={[styles.side, styles.results]}>
            <ScrollView contentContainerStyle={styles.sideContent}>{results}</ScrollView>
          </View>
        </View>
      ) : null,
    [isWide, formTab, geometryForm, conditionsForm, editor, summary, results],
  );
  const phoneBody = useMemo(
    () =>
      isWide ? null : (
        <>
          <View style={styles.phoneTabs}>
            <SegmentedControl<PhoneTab>
              label="Workspace section"
              value={phoneTab}
              options={[
                { value: 'sheet', label: 'Sheet' },
                { value: 'geometry', label: 'Geometry' },
                { value: 'conditions', label: 'Conditions' },
                { value: 'results', label: 'Results' },
              ]}
              onChange={setPhoneTab}
              testID="phone-tabs"
            />
          </View>
          {summary}
          {phoneTab === 'sheet' ? (
            <View style={styles.phoneEditor}>{editor}</View>
          ) : (
            <ScrollView style={styles.phoneScroll} contentContainerStyle={styles.sideContent} keyboardShouldPersistTaps="handled">
              {phoneTab === 'geometry' ? geometryForm : phoneTab === 'conditions' ? conditionsForm : results}
            </ScrollView>
          )}
        </>
      ),
    [isWide, phoneTab, summary, editor, geometryForm, conditionsForm, results],
  );

  return (
    <View style={styles.root} testID="coil-workspace">
      {header}
      {isWide ? wideBody : phoneBody}
      {generator}
    </View>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1, minHeight: 0, minWidth: 0, backgroundColor: colors.background },
  center: { flex: 1, alignItems: 'center', justifyContent: 'center', gap: space.lg, padding: space.xl },
  header: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.md, paddingHorizontal: space.md, paddingVertical: space.sm, backgroundColor: colors.surface, borderBottomWidth: 1, borderBottomColor: colors.border },
  titleBlock: { flexGrow: 1, flexShrink: 1, flexBasis: 160, minWidth: 0 },
  headerActions: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm, flexShrink: 1, maxWidth: '100%' },
  wideBody: { flex: 1, flexDirection: 'row', minHeight: 0 },
  side: { width: 320, borderRightWidth: 1, borderRightColor: colors.border, backgroundColor: colors.surface, minHeight: 0 },
  results: { width: 460, borderRightWidth: 0, borderLeftWidth: 1, borderLeftColor: colors.border, backgroundColor: colors.background },
  sideTabs: { padding: space.md, paddingBottom: 0 },
  sideContent: { padding: space.md, gap: space.lg },
  centre: { flex: 1, minWidth: 0, minHeight: 0 },
  extra: { gap: space.md, paddingTop: space.md, borderTopWidth: 1, borderTopColor: colors.border },
  extraTitle: { color: colors.textMuted, textTransform: 'uppercase', letterSpacing: 0.6 },
  phoneTabs: { paddingHorizontal: space.md, paddingTop: space.sm },
  phoneEditor: { flex: 1, minHeight: 0 },
  phoneScroll: { flex: 1 },
});
