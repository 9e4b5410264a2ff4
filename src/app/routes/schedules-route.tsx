// Routes for a project's take-off page and an option's schedule page, keyed by their ids from the URL.
import { useParams } from 'react-router';
import { TakeoffPage } from '../../features/schedules/components/takeoff-page';
import { SchedulePage } from '../../features/schedules/components/schedule-page';

export function TakeoffRoute() {
  const { projectId = '' } = useParams();
  return <TakeoffPage key={projectId} projectId={projectId} />;
}

export function ScheduleRoute() {
  const { projectId = '', optionId = '' } = useParams();
  return <SchedulePage key={optionId} projectId={projectId} optionId={optionId} />;
}
