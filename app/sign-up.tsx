import { useLocalSearchParams } from 'expo-router';
import { SignUpScreen } from '@/components/auth/sign-up-screen';

export default function SignUpRoute() {
  const { next } = useLocalSearchParams<{ next?: string }>();
  return <SignUpScreen next={typeof next === 'string' ? next : undefined} />;
}
