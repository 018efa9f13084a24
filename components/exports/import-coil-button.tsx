/**
 * "Import coil file": picks a coil document (.json, as "Coil document (JSON)" exports it) and creates a coil from it
 * in this project. When the server refuses the file it lists every problem (where in the file, and why) and nothing
 * is created. Show it to owners and designers only; the server refuses other roles anyway.
 */
import { useMutation, useQueryClient } from '@tanstack/react-query';
import * as DocumentPicker from 'expo-document-picker';
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { ApiError } from '@/lib/api/client';
import { coilKeys, type Coil } from '@/lib/api/coils';
import { importCoilDocument } from '@/lib/api/exports';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { messageOf } from '@/components/ui/form-errors';
import { colors, space, type } from '@/components/ui/theme';

/** Larger than any real coil document; the server stops at 2 MB. */
const MAX_FILE_BYTES = 2 * 1024 * 1024;

interface Problem {
  message: string;
  /** Where in the file and what is wrong, e.g. ["geometry.rows", "at least 1 row"]. */
  fields: [string, string][];
}

async function readPickedText(asset: DocumentPicker.DocumentPickerAsset): Promise<string> {
  if (asset.file) return asset.file.text();
  return (await fetch(asset.uri)).text();
}

/** The server reports paths under `document.`; the file itself is the document, so the prefix is dropped. */
const filePath = (path: string) => path.replace(/^document\.?/, '') || 'the whole file';

function problemOf(err: unknown): Problem {
  if (err instanceof ApiError && err.status === 400 && Object.keys(err.fields).length > 0) {
    return { message: err.message, fields: Object.entries(err.fields).map(([path, reason]) => [filePath(path), reason]) };
  }
  return { message: messageOf(err), fields: [] };
}

export function ImportCoilButton({ projectId, onImported }: { projectId: string; onImported?: (coil: Coil) => void }) {
  const queryClient = useQueryClient();
  const [problem, setProblem] = useState<Problem | null>(null);
  const [imported, setImported] = useState<string | null>(null);
  const mutation = useMutation({
    mutationFn: (json: unknown) => importCoilDocument(projectId, json),
    onSuccess: (coil) => {
      setImported(coil.name);
      void queryClient.invalidateQueries({ queryKey: coilKeys.list(projectId) });
      onImported?.(coil);
    },
    onError: (err) => setProblem(problemOf(err)),
  });

  const pick = async () => {
    setProblem(null);
    setImported(null);
    const picked = await DocumentPicker.getDocumentAsync({ type: ['application/json', '.json'], multiple: false, base64: false });
    if (picked.canceled || !picked.assets[0]) return;
    const asset = picked.assets[0];
    if ((asset.size ?? asset.file?.size ?? 0) > MAX_FILE_BYTES) {
      setProblem({ message: `"${asset.name}" is larger than 2 MB, so it cannot be a Tubeloom coil file.`, fields: [] });
      return;
    }
    let json: unknown;
    try {
      json = JSON.parse(await readPickedText(asset));
    } catch {
      setProblem({ message: `"${asset.name}" is not a JSON file. Choose a coil file exported from Tubeloom.`, fields: [] });
      return;
    }
    mutation.mutate(json);
  };

  return (
    <View style={styles.wrap}>
      <Button
        label="Import coil file"
        accessibilityLabel="Import a coil from a JSON coil file"
        variant="secondary"
        loading={mutation.isPending}
        onPress={() => void pick()}
        testID="import-coil"
      />
      {imported ? <Banner tone="success">{`Imported "${imported}" as a new coil.`}</Banner> : null}
      {problem ? (
        <Banner tone="error" title="Nothing was imported" testID="import-problems">
          <Text style={type.small}>{problem.message}</Text>
          {problem.fields.map(([path, reason]) => (
            <Text key={path} style={[type.small, styles.problem]}>
              <Text style={type.number}>{path}</Text>: {reason}
            </Text>
          ))}
        </Banner>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm, alignItems: 'flex-start' },
  problem: { color: colors.text, marginTop: space.xxs },
});
