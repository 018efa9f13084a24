import { useLocalSearchParams } from 'expo-router';
import { CoilWorkspace } from '@/components/coil/coil-workspace';

export default function CoilRoute() {
  const { projectId, coilId } = useLocalSearchParams<{ projectId: string; coilId: string }>();
  return <CoilWorkspace projectId={String(projectId)} coilId={String(coilId)} />;
}
