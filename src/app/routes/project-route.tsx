import { useParams } from 'react-router';
import { ProjectPage } from '../../features/projects/components/project-page';
import { RoomList } from '../../features/rooms/components/room-list';

export function ProjectRoute() {
  const { projectId = '' } = useParams();
  return <ProjectPage id={projectId} rooms={<RoomList projectId={projectId} />} />;
}
