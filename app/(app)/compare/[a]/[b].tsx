import { useLocalSearchParams } from 'expo-router';
import { CompareScreen } from '@/components/versions/compare-screen';

export default function CompareRoute() {
  const { a, b } = useLocalSearchParams<{ a: string; b: string }>();
  return <CompareScreen a={String(a)} b={String(b)} />;
}
