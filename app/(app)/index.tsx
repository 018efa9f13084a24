import { ProjectsScreen } from '@/components/projects/projects-screen';

export default function ProjectsRoute() {
  return <ProjectsScreen />;
}
