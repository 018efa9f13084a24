import { TeamScreen } from '@/components/team/team-screen';

export default function TeamRoute() {
  return <TeamScreen />;
}
