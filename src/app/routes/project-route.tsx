// Route for one project: its page with the room list, the schedules link and the presentations panel.
import { useParams } from 'react-router';
import { ProjectPage } from '../../features/projects/components/project-page';
import { useProject } from '../../features/projects/api/projects';
import { RoomList } from '../../features/rooms/components/room-list';
import { PresentationsPanel } from '../../features/presentations/components/presentations-panel';
import { SchedulesLink } from '../../features/schedules/components/schedules-link';

export function ProjectRoute() {
  const { projectId = '' } = useParams();
  // The same query the page itself runs, so this reads the cache rather than fetching twice.
  const project = useProject(projectId);
  const presentations = project.data && (
    <PresentationsPanel
      projectId={projectId}
      projectState={project.data.project.state}
      clientEmail={project.data.client?.email ?? null}
    />
  );
  return (
    <ProjectPage
      id={projectId}
      rooms={
        <>
          <RoomList projectId={projectId} />
          <SchedulesLink projectId={projectId} />
        </>
      }
      presentations={presentations}
    />
  );
}
