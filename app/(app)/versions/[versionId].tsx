import { useLocalSearchParams } from 'expo-router';
import { VersionScreen } from '@/components/versions/version-screen';

export default function VersionRoute() {
  const { versionId } = useLocalSearchParams<{ versionId: string }>();
  return <VersionScreen key={String(versionId)} versionId={String(versionId)} />;
}
