// Route for the Projects list: loads the studio's clients, by name, for the new project dialog.
import { ProjectsPage } from '../../features/projects/components/projects-page';
import { useClients } from '../../features/clients/api/clients';

export function ProjectsRoute() {
  const clients = useClients({ sort: 'name' });
  return <ProjectsPage clients={clients.data?.clients ?? []} />;
}
