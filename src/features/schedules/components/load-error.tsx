// What the take-off and schedule pages show when their figures could not be loaded.
import { Link } from 'react-router';
import { Notice } from '../../../components/ui/layout';
import { errorMessage } from '../../../lib/api';

/** What a page shows when its figures could not be loaded (another studio's link, a server error). */
export function LoadError({ error, projectId }: { error: unknown; projectId: string }) {
  return (
    <div className="flex flex-col gap-4">
      <Notice tone="error">{errorMessage(error)}</Notice>
      <Link to={`/projects/${projectId}`} className="font-semibold text-pine">
        Back to the project
      </Link>
    </div>
  );
}
