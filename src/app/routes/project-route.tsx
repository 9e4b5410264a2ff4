import { useParams } from 'react-router';
import { ProjectPage } from '../../features/projects/components/project-page';

export function ProjectRoute() {
  const { projectId = '' } = useParams();
  return <ProjectPage id={projectId} />;
}
