// The project page's link to its take-off, schedules and options comparison.
import { Link } from 'react-router';

/** The way from a project to its take-off, schedules and comparison. */
export function SchedulesLink({ projectId }: { projectId: string }) {
  return (
    <Link
      to={`/projects/${projectId}/take-off`}
      className="mt-4 flex items-center justify-between rounded-xl border border-line bg-paper/60 px-4 py-3 transition-colors hover:border-pine hover:bg-pine-wash/40"
    >
      <span>
        <span className="block font-semibold">Take-off and comparison</span>
        <span className="block text-sm text-ink-soft">
          Paint, flooring and skirting to buy, each option’s schedule and budget, options side by side.
        </span>
      </span>
      <span aria-hidden className="text-xl text-pine">
        →
      </span>
    </Link>
  );
}
