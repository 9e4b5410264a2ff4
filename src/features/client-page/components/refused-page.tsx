// The page for a presentation link that does not work: a plain sentence and a retry, nothing of the
// presentation itself.
import { ApiError } from '../../../lib/api';
import { Button } from '../../../components/ui/button';

/** A link that does not work: a calm sentence and nothing of the presentation behind it. */
export function RefusedPage({ error, onRetry }: { error: unknown; onRetry: () => void }) {
  const status = error instanceof ApiError ? error.status : 0;
  const refused = status === 404 || status === 410;
  const title = status === 410 ? 'This link is closed' : status === 404 ? 'This link does not work' : 'The page could not load';
  const said = error instanceof ApiError ? error.message : 'Something went wrong. Please try again.';
  // The heading already says what the server's first sentence says; the page goes on from there.
  const message = withoutRepeatedTitle(said, title);
  return (
    <main className="flex min-h-screen items-center justify-center px-6">
      <div className="max-w-md rounded-2xl border border-line bg-white p-8 text-center">
        <h1 className="text-2xl font-bold">{title}</h1>
        <p className="mt-3 text-[15px] leading-relaxed text-ink-soft">{message}</p>
        {!refused && (
          <div className="mt-6">
            <Button variant="primary" onClick={onRetry}>
              Try again
            </Button>
          </div>
        )}
      </div>
    </main>
  );
}

/** The message without a first sentence that repeats the title ("This link does not work. Check…" → "Check…"). */
export function withoutRepeatedTitle(message: string, title: string): string {
  if (!message.toLowerCase().startsWith(title.toLowerCase())) return message;
  const rest = message.slice(message.indexOf('.') + 1).trim();
  return rest === '' ? message : rest;
}
