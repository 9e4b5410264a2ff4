// One presentation in a project's list: its state, opens, what was looked at and chosen, and the
// Send by e-mail, Copy link, Extend, Withdraw and Mark as decided actions with their dialogs.
import { useState, type FormEvent } from 'react';
import type { PresentationSummary } from '../../../../shared/schemas/presentation';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { SelectField, TextField } from '../../../components/ui/field';
import { Badge, Notice } from '../../../components/ui/layout';
import { errorMessage, fieldError } from '../../../lib/api';
import { formatDate, formatDateTime } from '../../../lib/format';
import { useDecideProject, useExtendPresentation, useSendPresentation, useWithdrawPresentation } from '../api/presentations';

const EXTEND_CHOICES = [7, 14, 30, 60, 90];

/** One presentation: its state, when it was opened, what was looked at and chosen, and its actions. */
export function PresentationItem({
  p,
  projectId,
  projectState,
  clientEmail,
  canEdit,
}: {
  p: PresentationSummary;
  projectId: string;
  projectState: string;
  clientEmail: string | null;
  canEdit: boolean;
}) {
  const [dialog, setDialog] = useState<'send' | 'extend' | 'withdraw' | 'decide' | null>(null);
  const [copied, setCopied] = useState<'yes' | 'no' | null>(null);
  const chosen = p.rooms.filter((r) => r.choice).length;

  const copy = async () => {
    try {
      await navigator.clipboard.writeText(p.link ?? '');
      setCopied('yes');
    } catch {
      setCopied('no');
    }
  };

  const sent = p.sentAt ? `Sent to ${p.sentTo} on ${formatDate(p.sentAt)}` : 'Not e-mailed yet';
  const until =
    p.state === 'withdrawn'
      ? `withdrawn ${formatDateTime(p.withdrawnAt!)}`
      : `${p.state === 'expired' ? 'expired' : 'works until'} ${formatDate(p.expiresAt)}`;
  return (
    <li className="rounded-xl border border-line p-4" aria-label={`Presentation of ${formatDateTime(p.createdAt)}`}>
      <div className="flex flex-wrap items-start justify-between gap-2">
        <div className="min-w-0">
          <div className="flex flex-wrap items-center gap-2 font-semibold">
            Presentation of {formatDateTime(p.createdAt)} <Badge value={p.state} />
            {p.decidedAt && <Badge value="decided" label="decided" />}
          </div>
          <p className="mt-0.5 text-sm text-ink-soft">
            {[p.createdBy && `by ${p.createdBy}`, sent, `link ${until}`, p.showPrices ? 'prices shown' : 'prices hidden']
              .filter(Boolean)
              .join(' · ')}
          </p>
          <p className="mt-0.5 text-sm text-ink-soft">
            {p.lastOpenedAt && p.firstOpenedAt
              ? `Opened ${p.openCount} time${p.openCount === 1 ? '' : 's'} · first ${formatDateTime(p.firstOpenedAt)} · last ${formatDateTime(p.lastOpenedAt)}`
              : 'Not opened yet'}
          </p>
        </div>
        <p className="text-sm font-semibold text-ink-soft">
          {chosen} of {p.rooms.length} chosen
        </p>
      </div>

      <table className="mt-3 w-full table-fixed text-left text-sm">
        <colgroup>
          <col className="w-[26%]" />
          <col className="w-[40%]" />
          <col />
        </colgroup>
        <thead className="text-ink-faint">
          <tr>
            <th className="py-1 pr-3 font-medium">Room</th>
            <th className="py-1 pr-3 font-medium">Options shown · looked at</th>
            <th className="py-1 font-medium">Choice</th>
          </tr>
        </thead>
        <tbody className="align-top">
          {p.rooms.map((r) => {
            const choice = r.choice && r.options.find((o) => o.optionId === r.choice!.optionId);
            return (
              <tr key={r.roomId} className="border-t border-line">
                <td className="py-2 pr-3 font-semibold">{r.name}</td>
                <td className="py-2 pr-3">
                  <ul>
                    {r.options.map((o) => (
                      <li key={o.optionId} className="flex justify-between gap-2">
                        <span className="min-w-0">
                          {o.label}
                          {o.changedSinceSent && <span className="block text-ochre">changed since the link was made</span>}
                        </span>
                        <span className="shrink-0 text-ink-faint">{o.viewCount > 0 ? `${o.viewCount}×` : '—'}</span>
                      </li>
                    ))}
                  </ul>
                </td>
                <td className="py-2">
                  {r.choice && choice ? (
                    <div>
                      <div className="font-semibold text-pine-dark">{choice.label}</div>
                      <div className="text-ink-faint">{formatDateTime(r.choice.chosenAt)}</div>
                      {r.choice.comment && <div className="mt-0.5 text-ink-soft">“{r.choice.comment}”</div>}
                    </div>
                  ) : (
                    <span className="text-ink-faint">No choice yet</span>
                  )}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>

      {canEdit && p.state !== 'withdrawn' && (
        <div className="mt-3 flex flex-wrap items-center gap-2 border-t border-line pt-3">
          {p.state === 'active' && (
            <Button size="sm" onClick={() => setDialog('send')}>
              Send by e-mail
            </Button>
          )}
          {p.state === 'active' && p.link && (
            <Button size="sm" onClick={() => void copy()}>
              Copy link
            </Button>
          )}
          <Button size="sm" onClick={() => setDialog('extend')}>
            Extend
          </Button>
          <Button size="sm" variant="danger" onClick={() => setDialog('withdraw')}>
            Withdraw
          </Button>
          {p.complete && projectState !== 'decided' && projectState !== 'archived' && (
            <Button size="sm" variant="primary" className="ml-auto" onClick={() => setDialog('decide')}>
              Mark as decided
            </Button>
          )}
        </div>
      )}
      {copied === 'yes' && (
        <p className="mt-2 text-sm text-pine-dark" role="status">
          Link copied. Paste it into a message to your client.
        </p>
      )}
      {copied === 'no' && p.link && (
        <div className="mt-2">
          <TextField label="Link (select and copy it)" readOnly value={p.link} onFocus={(e) => e.target.select()} />
        </div>
      )}

      {dialog === 'send' && <SendDialog p={p} projectId={projectId} clientEmail={clientEmail} onClose={() => setDialog(null)} />}
      {dialog === 'extend' && <ExtendDialog p={p} projectId={projectId} onClose={() => setDialog(null)} />}
      {dialog === 'withdraw' && <WithdrawDialog p={p} projectId={projectId} onClose={() => setDialog(null)} />}
      {dialog === 'decide' && <DecideDialog p={p} projectId={projectId} onClose={() => setDialog(null)} />}
    </li>
  );
}

function SendDialog({
  p,
  projectId,
  clientEmail,
  onClose,
}: {
  p: PresentationSummary;
  projectId: string;
  clientEmail: string | null;
  onClose: () => void;
}) {
  const send = useSendPresentation(projectId);
  const [to, setTo] = useState(p.sentTo ?? clientEmail ?? '');
  const submit = (e: FormEvent) => {
    e.preventDefault();
    send.mutate({ id: p.id, to }, { onSuccess: onClose });
  };
  return (
    <Dialog open onClose={onClose} title="Send the link by e-mail">
      <form onSubmit={submit} className="flex flex-col gap-4" noValidate>
        <TextField
          label="E-mail"
          type="email"
          value={to}
          onChange={(e) => setTo(e.target.value)}
          error={fieldError(send.error, 'to')}
          autoFocus
        />
        <p className="text-sm text-ink-soft">The e-mail carries your message and the link; the client needs no account.</p>
        {send.isError && !fieldError(send.error, 'to') && <Notice tone="error">{errorMessage(send.error)}</Notice>}
        <div className="flex justify-end gap-2">
          <Button variant="quiet" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" variant="primary" busy={send.isPending}>
            Send
          </Button>
        </div>
      </form>
    </Dialog>
  );
}

function ExtendDialog({ p, projectId, onClose }: { p: PresentationSummary; projectId: string; onClose: () => void }) {
  const extend = useExtendPresentation(projectId);
  const [days, setDays] = useState(30);
  const submit = (e: FormEvent) => {
    e.preventDefault();
    extend.mutate({ id: p.id, days }, { onSuccess: onClose });
  };
  return (
    <Dialog open onClose={onClose} title="Extend the link">
      <form onSubmit={submit} className="flex flex-col gap-4" noValidate>
        <p className="text-[15px]">
          The link {p.state === 'expired' ? 'expired' : 'works until'} {formatDate(p.expiresAt)}. The client keeps the same link.
        </p>
        <SelectField
          label={p.state === 'expired' ? 'Open it again for' : 'Add'}
          value={days}
          onChange={(e) => setDays(Number(e.target.value))}
        >
          {EXTEND_CHOICES.map((d) => (
            <option key={d} value={d}>
              {d} days
            </option>
          ))}
        </SelectField>
        <p className="text-sm text-ink-faint">A link can be kept open until {formatDate(p.latestExpiry)} at the latest.</p>
        {extend.isError && <Notice tone="error">{errorMessage(extend.error)}</Notice>}
        <div className="flex justify-end gap-2">
          <Button variant="quiet" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" variant="primary" busy={extend.isPending}>
            Extend
          </Button>
        </div>
      </form>
    </Dialog>
  );
}

function WithdrawDialog({ p, projectId, onClose }: { p: PresentationSummary; projectId: string; onClose: () => void }) {
  const withdraw = useWithdrawPresentation(projectId);
  return (
    <Dialog open onClose={onClose} title="Withdraw this link?">
      <p className="text-[15px]">
        The link stops working straight away. The client’s choices so far stay on the project. A withdrawn link cannot be opened
        again; you can make a new presentation.
      </p>
      {withdraw.isError && (
        <div className="mt-4">
          <Notice tone="error">{errorMessage(withdraw.error)}</Notice>
        </div>
      )}
      <div className="mt-6 flex justify-end gap-2">
        <Button variant="quiet" onClick={onClose}>
          Keep it
        </Button>
        <Button variant="danger" busy={withdraw.isPending} onClick={() => withdraw.mutate(p.id, { onSuccess: onClose })}>
          Withdraw
        </Button>
      </div>
    </Dialog>
  );
}

/** Mark as decided names what it freezes before it does: each room with the option its client chose. */
function DecideDialog({ p, projectId, onClose }: { p: PresentationSummary; projectId: string; onClose: () => void }) {
  const decide = useDecideProject(projectId);
  return (
    <Dialog
      open
      onClose={onClose}
      title="Mark the project as decided?"
      footer={
        <>
          <Button variant="quiet" onClick={onClose}>
            Not yet
          </Button>
          <Button variant="primary" busy={decide.isPending} onClick={() => decide.mutate(p.id, { onSuccess: onClose })}>
            Mark as decided
          </Button>
        </>
      }
    >
      <div className="flex flex-col gap-3 text-[15px]">
        <p>These options become read-only, with the walls and openings of their rooms:</p>
        <ul className="flex flex-col gap-1 rounded-lg bg-sand px-4 py-3" aria-label="Options to be frozen">
          {p.rooms.map((r) => {
            const choice = r.choice && r.options.find((o) => o.optionId === r.choice!.optionId);
            return (
              <li key={r.roomId}>
                <span className="font-semibold">{r.name}</span>: {choice ? choice.label : 'no choice'}
              </li>
            );
          })}
        </ul>
        <p className="text-ink-soft">
          The client can no longer change their choices from the link, and no new presentation can be made. To change a chosen
          option, duplicate it, or reopen the project.
        </p>
        {decide.isError && <Notice tone="error">{errorMessage(decide.error)}</Notice>}
      </div>
    </Dialog>
  );
}
