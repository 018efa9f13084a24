import { useLocalSearchParams } from 'expo-router';
import { ReviewScreen } from '@/components/review/review-screen';

export default function ReviewRoute() {
  const { token } = useLocalSearchParams<{ token: string }>();
  return <ReviewScreen token={String(token)} />;
}
