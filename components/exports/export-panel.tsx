/**
 * Downloads of a coil's working draft, or of one saved version when `versionId` is given: the data sheet (PDF, SI or
 * IP, A4 or Letter), both end-face drawings (SVG), the tube sheet for CAD (DXF), the circuit, tube and material
 * tables (CSV, in the chosen units) and the coil document itself (JSON, importable again). Every team member may
 * download. Units start from the user's own setting.
 */
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { downloadExport, exportPath, type ExportTarget } from '@/lib/api/exports';
import type { ExportFile } from '@/lib/schema/api-exports';
import type { UnitSystem } from '@/lib/units';
import { CAN_SAVE_FILES, saveFile } from '@/components/exports/save-file';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { messageOf } from '@/components/ui/form-errors';
import { SegmentedControl, type Choice } from '@/components/ui/segmented-control';
import { colors, space, type } from '@/components/ui/theme';
import { useUnitSystem } from '@/components/ui/use-unit-system';

type Paper = 'A4' | 'Letter';

const UNIT_CHOICES: readonly Choice<UnitSystem>[] = [
  { value: 'si', label: 'SI', accessibilityLabel: 'SI units (kW, kPa, °C)' },
  { value: 'ip', label: 'IP', accessibilityLabel: 'IP units (MBH, ft of water, °F)' },
];
const PAPER_CHOICES: readonly Choice<Paper>[] = [
  { value: 'A4', label: 'A4' },
  { value: 'Letter', label: 'Letter' },
];

interface Download {
  key: string;
  label: string;
  hint: string;
  file: ExportFile;
  query: (units: UnitSystem, paper: Paper) => Record<string, string>;
}

const GROUPS: { title: string; items: Download[] }[] = [
  {
    title: 'Report',
    items: [
      { key: 'datasheet', label: 'Data sheet', hint: 'PDF', file: 'datasheet', query: (units, paper) => ({ units, paper }) },
    ],
  },
  {
    title: 'Drawings',
    items: [
      { key: 'face-connection', label: 'Connection end', hint: 'SVG', file: 'endFace', query: () => ({ face: 'connection' }) },
      { key: 'face-opposite', label: 'Opposite end', hint: 'SVG', file: 'endFace', query: () => ({ face: 'opposite' }) },
      { key: 'tube-sheet', label: 'Tube sheet for CAD', hint: 'DXF', file: 'tubeSheet', query: () => ({}) },
    ],
  },
  {
    title: 'Tables',
    items: [
      { key: 'circuits', label: 'Circuits', hint: 'CSV', file: 'circuits', query: (units) => ({ units }) },
      { key: 'tubes', label: 'Tubes', hint: 'CSV', file: 'tubes', query: (units) => ({ units }) },
      { key: 'bom', label: 'Bill of materials', hint: 'CSV', file: 'billOfMaterials', query: (units) => ({ units }) },
    ],
  },
  {
    title: 'Coil file',
    items: [{ key: 'document', label: 'Coil document', hint: 'JSON', file: 'document', query: () => ({}) }],
  },
];

export function ExportPanel({ coilId, versionId }: { coilId: string; versionId?: string }) {
  const { unitSystem } = useUnitSystem();
  // Follows the user's setting until they pick units here.
  const [chosenUnits, setChosenUnits] = useState<UnitSystem | null>(null);
  const units = chosenUnits ?? unitSystem;
  // Letter goes with IP and A4 with SI until the user picks a paper size.
  const [chosenPaper, setChosenPaper] = useState<Paper | null>(null);
  const paper = chosenPaper ?? (units === 'ip' ? 'Letter' : 'A4');
  const [busy, setBusy] = useState<string | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const target: ExportTarget = versionId ? { versionId, coilId } : { coilId };

  const run = async (item: Download) => {
    setBusy(item.key);
    setProblem(null);
    try {
      saveFile(await downloadExport(exportPath(target, item.file, item.query(units, paper))));
    } catch (err) {
      setProblem(messageOf(err));
    } finally {
      setBusy(null);
    }
  };

  return (
    <Card title={versionId ? 'Export this version' : 'Export the working draft'} testID="export-panel">
      {!versionId ? (
        <Text style={[type.small, styles.note]}>Files are made from the last saved draft and the data sheet is marked as a working draft. Save a version to issue it.</Text>
      ) : null}
      <View style={styles.options}>
        <View style={styles.option}>
          <Text style={type.label}>Units</Text>
          <SegmentedControl label="Units of the exported files" value={units} options={UNIT_CHOICES} onChange={setChosenUnits} testID="export-units" />
        </View>
        <View style={styles.option}>
          <Text style={type.label}>Paper</Text>
          <SegmentedControl label="Paper size of the data sheet" value={paper} options={PAPER_CHOICES} onChange={setChosenPaper} testID="export-paper" />
        </View>
      </View>
      {!CAN_SAVE_FILES ? <Banner tone="info">Downloads work in the web app. Open Tubeloom in a browser to save files.</Banner> : null}
      {problem ? <Banner tone="error" title="The download failed">{problem}</Banner> : null}
      {GROUPS.map((group) => (
        <View key={group.title} style={styles.group}>
          <Text role="heading" aria-level={3} style={[type.smallStrong, styles.groupTitle]}>
            {group.title}
          </Text>
          <View style={styles.buttons}>
            {group.items.map((item) => (
              <Button
                key={item.key}
                label={`${item.label} (${item.hint})`}
                accessibilityLabel={`Download ${item.label.toLowerCase()} as ${item.hint}`}
                variant="secondary"
                size="sm"
                loading={busy === item.key}
                disabled={!CAN_SAVE_FILES || (busy !== null && busy !== item.key)}
                onPress={() => void run(item)}
                testID={`export-${item.key}`}
              />
            ))}
          </View>
        </View>
      ))}
    </Card>
  );
}

const styles = StyleSheet.create({
  note: { color: colors.textMuted, marginBottom: space.sm },
  options: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg, marginBottom: space.md },
  option: { gap: space.xs },
  group: { marginTop: space.sm, gap: space.xs },
  groupTitle: { color: colors.textMuted },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
