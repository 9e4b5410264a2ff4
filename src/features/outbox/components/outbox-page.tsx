// The Outbox page (local setup only): the e-mails the app sent, and one message opened.
import { useState } from 'react';
import { Link, useParams } from 'react-router';
import type { SentMailKind } from '../../../../shared/schemas/outbox';
import { Button } from '../../../components/ui/button';
import { Badge, Card, EmptyState, Notice, PageHeader, Spinner } from '../../../components/ui/layout';
import { errorMessage } from '../../../lib/api';
import { formatDateTime } from '../../../lib/format';
import { useSession } from '../../../lib/session';
import { useOutbox, useOutboxMessage } from '../api/outbox';

const KIND_LABELS: Record<SentMailKind, string> = { invitation: 'Invitation', presentation: 'Presentation', choice: 'Choice' };
const LINK_PATTERN = /(https?:\/\/\S+)/g;

/** The studio's sent mail in the local setup, where a stand-in mail server takes the place of real inboxes. */
export function OutboxPage() {
  const { messageId } = useParams();
  const session = useSession();
  const outbox = useOutbox();
  const messages = outbox.data?.pages.flatMap((p) => p.messages) ?? [];
  const isOwner = session.data?.member.role === 'owner';
  return (
    <div>
      <PageHeader title="Outbox">
        The e-mails {session.data?.studio.name ?? 'your studio'} sent. In this local setup they go to a stand-in mail server
        instead of real inboxes, so copy a link and pass it on to its person.
        {!isOwner && ' Invitations are shown to owners only.'}
      </PageHeader>
      <div className="grid gap-6 lg:grid-cols-[22rem_1fr]">
        <Card className="p-3">
          {outbox.isPending ? (
            <Spinner />
          ) : outbox.isError ? (
            <Notice tone="error">{errorMessage(outbox.error)}</Notice>
          ) : messages.length === 0 ? (
            <EmptyState title="No e-mails yet." />
          ) : (
            <>
              <ul className="flex flex-col gap-1" aria-label="Sent e-mails">
                {messages.map((m) => (
                  <li key={m.id}>
                    <Link
                      to={`/outbox/${m.id}`}
                      aria-current={m.id === messageId ? 'page' : undefined}
                      className="block rounded-lg px-3 py-2 hover:bg-paper aria-[current=page]:bg-pine-wash"
                    >
                      <div className="truncate text-sm text-ink-soft">To {m.to}</div>
                      <div className="truncate font-semibold">{m.subject}</div>
                      <div className="flex items-center gap-2 text-xs text-ink-soft">
                        <Badge value={m.kind} label={KIND_LABELS[m.kind]} />
                        {formatDateTime(m.sentAt)}
                      </div>
                    </Link>
                  </li>
                ))}
              </ul>
              {outbox.hasNextPage && (
                <div className="mt-2 px-3 pb-1">
                  <Button size="sm" busy={outbox.isFetchingNextPage} onClick={() => void outbox.fetchNextPage()}>
                    Show older e-mails
                  </Button>
                </div>
              )}
            </>
          )}
        </Card>
        {messageId ? (
          <MessageView id={messageId} />
        ) : (
          <Card>
            <p className="text-ink-soft">Choose an e-mail to read it.</p>
          </Card>
        )}
      </div>
    </div>
  );
}

function MessageView({ id }: { id: string }) {
  const msg = useOutboxMessage(id);
  if (msg.isPending)
    return (
      <Card>
        <Spinner />
      </Card>
    );
  if (msg.isError)
    return (
      <Card>
        <Notice tone="error">{errorMessage(msg.error)}</Notice>
      </Card>
    );
  const m = msg.data.message;
  const links = [...new Set(m.text.match(LINK_PATTERN) ?? [])];
  return (
    <Card>
      <div className="mb-4 border-b border-line pb-4 text-sm text-ink-soft">
        <div>From {m.from}</div>
        <div>To {m.to}</div>
        <div>{formatDateTime(m.sentAt)}</div>
      </div>
      <h2 className="mb-4 text-xl font-bold">{m.subject}</h2>
      <div className="whitespace-pre-wrap text-[15px] leading-relaxed">{linkify(m.text)}</div>
      {links.length > 0 && (
        <div className="mt-6 border-t border-line pt-4">
          <h3 className="mb-2 text-sm font-semibold text-ink-soft">Pass it on</h3>
          <ul className="flex flex-col gap-2">
            {links.map((href) => (
              <CopyLink key={href} href={href} to={m.to} />
            ))}
          </ul>
        </div>
      )}
    </Card>
  );
}

function CopyLink({ href, to }: { href: string; to: string }) {
  const [copied, setCopied] = useState<'yes' | 'no' | null>(null);
  const copy = async () => {
    try {
      await navigator.clipboard.writeText(href);
      setCopied('yes');
    } catch {
      setCopied('no');
    }
  };
  return (
    <li className="flex flex-wrap items-center gap-3">
      <Button size="sm" onClick={() => void copy()} aria-label={`Copy link for ${to}`}>
        Copy link
      </Button>
      <span className="text-sm text-ink-soft" role="status">
        {copied === 'yes'
          ? `Copied. Send it to ${to}.`
          : copied === 'no'
            ? 'This browser would not copy it: select the link above and copy it by hand.'
            : ''}
      </span>
    </li>
  );
}

// Links in the plain-text body become real links; the HTML part is never injected into the page.
function linkify(text: string) {
  return text.split(LINK_PATTERN).map((part, i) =>
    /^https?:\/\//.test(part) ? (
      <a key={i} href={part} className="font-semibold break-all text-pine underline">
        {part}
      </a>
    ) : (
      <span key={i}>{part}</span>
    ),
  );
}
