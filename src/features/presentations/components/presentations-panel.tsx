// The project page's presentations panel: make one, send it, follow each, and confirm the client's choices.
import { useState } from 'react';
import type { CreatePresentationBody } from '../../../../shared/schemas/presentation';
import { Button } from '../../../components/ui/button';
import { EmptyState, Notice, Spinner } from '../../../components/ui/layout';
import { errorMessage } from '../../../lib/api';
import { useCanEdit } from '../../../lib/session';
import { useCreatePresentation, usePresentations, useSendPresentation } from '../api/presentations';
import { NewPresentationDialog } from './new-presentation-dialog';
import { PresentationItem } from './presentation-item';

/** The project's presentations: make one, send it, follow it, and confirm the client's choices. */
export function PresentationsPanel({
  projectId,
  projectState,
  clientEmail,
}: {
  projectId: string;
  projectState: string;
  clientEmail: string | null;
}) {
  const list = usePresentations(projectId);
  const canEdit = useCanEdit() && projectState !== 'archived';
  // A decided project takes no new presentation until it is reopened (the server says so too).
  const canPresent = canEdit && projectState !== 'decided';
  const create = useCreatePresentation(projectId);
  const send = useSendPresentation(projectId);
  const [making, setMaking] = useState(false);
  const [notice, setNotice] = useState<{ tone: 'ok' | 'error'; text: string } | null>(null);

  const onCreate = async (body: CreatePresentationBody, sendMail: boolean) => {
    setNotice(null);
    const { presentation } = await create.mutateAsync(body).catch(() => ({ presentation: null }));
    if (!presentation) return;
    setMaking(false);
    if (!sendMail) {
      setNotice({ tone: 'ok', text: 'The link is ready. Use “Copy link” and send it to your client.' });
      return;
    }
    try {
      await send.mutateAsync({ id: presentation.id });
      setNotice({ tone: 'ok', text: `Sent to ${clientEmail}.` });
    } catch (err) {
      setNotice({
        tone: 'error',
        text: `The link is made, but the e-mail did not go: ${errorMessage(err)} Use “Send by e-mail” to try again.`,
      });
    }
  };

  return (
    <div>
      <div className="mb-4 flex flex-wrap items-center justify-between gap-3">
        <p className="text-sm text-ink-soft">A link for your client to walk round the options in 3D and choose one per room.</p>
        {canPresent && (
          <Button
            size="sm"
            variant="primary"
            onClick={() => {
              create.reset();
              setMaking(true);
            }}
          >
            New presentation
          </Button>
        )}
      </div>
      {projectState === 'decided' && (
        <div className="mb-4">
          <Notice tone="ok">
            The project is decided: the client’s choices are confirmed and can no longer be changed from the link. Their options
            open read-only in the room editor. Reopen the project to change them or to make a new presentation.
          </Notice>
        </div>
      )}
      {notice && (
        <div className="mb-4">
          <Notice tone={notice.tone}>{notice.text}</Notice>
        </div>
      )}
      {list.isPending ? (
        <Spinner />
      ) : list.isError ? (
        <Notice tone="error">{errorMessage(list.error)}</Notice>
      ) : list.data.length === 0 ? (
        <EmptyState title="No presentations yet.">
          When the rooms have their options, send your client a link to walk through them and choose.
        </EmptyState>
      ) : (
        <ul className="flex flex-col gap-3">
          {list.data.map((p) => (
            <PresentationItem
              key={p.id}
              p={p}
              projectId={projectId}
              projectState={projectState}
              clientEmail={clientEmail}
              canEdit={canEdit}
            />
          ))}
        </ul>
      )}
      <p className="mt-3 text-xs text-ink-faint">
        Opening the link while signed in to Parlour is not counted as the client’s visit.
      </p>
      {making && (
        <NewPresentationDialog
          projectId={projectId}
          clientEmail={clientEmail}
          busy={create.isPending || send.isPending}
          error={create.error}
          onClose={() => setMaking(false)}
          onCreate={(body, sendMail) => void onCreate(body, sendMail)}
        />
      )}
    </div>
  );
}
