import { useLocalSearchParams } from 'expo-router';
import { VersionsScreen } from '@/components/versions/versions-screen';

export default function CoilVersionsRoute() {
  const { projectId, coilId } = useLocalSearchParams<{ projectId: string; coilId: string }>();
  return <VersionsScreen projectId={String(projectId)} coilId={String(coilId)} />;
}
