import { useLocalSearchParams } from 'expo-router';
import { CoilFilesPanel } from '@/components/coil/coil-files-panel';
import { CoilWorkspace } from '@/components/coil/coil-workspace';

export default function CoilRoute() {
  const { projectId, coilId } = useLocalSearchParams<{ projectId: string; coilId: string }>();
  return <CoilWorkspace projectId={String(projectId)} coilId={String(coilId)} extraPanels={<CoilFilesPanel coilId={String(coilId)} />} />;
}
