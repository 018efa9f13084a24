/**
 * Create a coil: from a blank tube sheet or from a built-in starting point (1/2 in or 5/8 in tubes, 1-8 rows),
 * for cooling or heating. A starting point comes circuited full serpentine, ready to solve.
 */
import { useState } from 'react';
import { Text, View } from 'react-native';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { SegmentedControl } from '@/components/ui/segmented-control';
import { Sheet } from '@/components/ui/sheet';
import { TextField } from '@/components/ui/text-field';
import { colors, space, type } from '@/components/ui/theme';
import { blankCoilDocument, startingPoint, startingPointDocument, type CoilMode, type StartingPointId } from '@/lib/engine/starting-points';
import type { CoilDocument } from '@/lib/engine/types';
import { NumberField } from './number-field';

type Start = 'blank' | StartingPointId;

export function NewCoilSheet({ open, onClose, onCreate, busy, error }: { open: boolean; onClose: () => void; onCreate: (name: string, doc: CoilDocument) => void; busy: boolean; error: string | null }) {
  const [name, setName] = useState('');
  const [start, setStart] = useState<Start>('half-inch');
  const [rows, setRows] = useState(4);
  const [tubes, setTubes] = useState(24);
  const [mode, setMode] = useState<CoilMode>('cooling');
  const [nameError, setNameError] = useState<string | null>(null);

  const submit = () => {
    const trimmed = name.trim();
    if (!trimmed) {
      setNameError('Give the coil a name');
      return;
    }
    setNameError(null);
    if (start === 'blank') {
      const doc = blankCoilDocument(trimmed);
      onCreate(trimmed, { ...doc, geometry: { ...doc.geometry, rows, tubesPerRow: tubes } });
    } else {
      onCreate(trimmed, startingPointDocument(start, { rows, tubesPerRow: tubes, mode, name: trimmed }));
    }
  };

  return (
    <Sheet
      open={open}
      title="New coil"
      onClose={onClose}
      testID="new-coil-sheet"
      footer={
        <>
          <Button label="Cancel" variant="secondary" onPress={onClose} disabled={busy} />
          <Button label="Create coil" onPress={submit} loading={busy} testID="new-coil-create" />
        </>
      }
    >
      <View style={{ gap: space.lg }}>
        <TextField label="Name" value={name} onChangeText={setName} error={nameError} placeholder="e.g. Level 2 cooling coil" testID="new-coil-name" autoFocus />
        <View style={{ gap: space.xs }}>
          <Text style={[type.label, { color: colors.text }]}>Start from</Text>
          <SegmentedControl<Start>
            label="Start from"
            value={start}
            options={[
              { value: 'half-inch', label: '1/2 in tubes' },
              { value: 'five-eighths-inch', label: '5/8 in tubes' },
              { value: 'blank', label: 'Blank sheet' },
            ]}
            onChange={(s) => {
              setStart(s);
              if (s !== 'blank') setTubes(startingPoint(s).defaultTubesPerRow);
            }}
            testID="new-coil-start"
          />
          <Text style={[type.caption, { color: colors.textMuted }]}>
            {start === 'blank' ? '1/2 in tubes with no bends or headers: you draw every circuit.' : `${startingPoint(start).description}; circuited full serpentine, counterflow.`}
          </Text>
        </View>
        <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: space.md }}>
          <View style={{ flexGrow: 1, flexBasis: 120 }}>
            <NumberField label="Rows" value={rows} unit="rows" decimals={0} integer check={(n) => (n < 1 || n > 8 ? '1 to 8 rows' : null)} onCommit={setRows} testID="new-coil-rows" />
          </View>
          <View style={{ flexGrow: 1, flexBasis: 120 }}>
            <NumberField label="Tubes high" value={tubes} unit="tubes" decimals={0} integer check={(n) => (n < 1 || n > 80 ? '1 to 80 tubes' : null)} onCommit={setTubes} testID="new-coil-tubes" />
          </View>
        </View>
        {start !== 'blank' ? (
          <SegmentedControl<CoilMode>
            label="Duty"
            value={mode}
            options={[
              { value: 'cooling', label: 'Cooling' },
              { value: 'heating', label: 'Heating' },
            ]}
            onChange={setMode}
            testID="new-coil-mode"
          />
        ) : null}
        {error ? <Banner tone="error">{error}</Banner> : null}
      </View>
    </Sheet>
  );
}
