import { Link, useParams } from 'react-router';
import { Card, EmptyState, Notice, PageHeader, Spinner } from '../../../components/ui/layout';
import { errorMessage } from '../../../lib/api';
import { formatDateTime } from '../../../lib/format';
import { useOutbox, useOutboxMessage } from '../api/outbox';

/** The e-mails the app sent, as the local stand-in mail server received them. */
export function OutboxPage() {
  const { messageId } = useParams();
  const outbox = useOutbox();
  return (
    <div className="mx-auto max-w-6xl px-6 py-10">
      <PageHeader title="Outbox" eyebrow={<Link to="/" className="hover:underline">Parlour</Link>}>
        In this local setup, e-mails go to a stand-in mail server instead of real inboxes. Open one to follow its links.
      </PageHeader>
      <div className="grid gap-6 lg:grid-cols-[22rem_1fr]">
        <Card className="p-3">
          {outbox.isPending ? <Spinner /> : outbox.isError ? <Notice tone="error">{errorMessage(outbox.error)}</Notice> : outbox.data.messages.length === 0 ? (
            <EmptyState title="No e-mails yet." />
          ) : (
            <ul className="flex flex-col gap-1">
              {outbox.data.messages.map((m) => (
                <li key={m.id}>
                  <Link
                    to={`/outbox/${m.id}`}
                    aria-current={m.id === messageId ? 'page' : undefined}
                    className="block rounded-lg px-3 py-2 hover:bg-paper aria-[current=page]:bg-pine-wash"
                  >
                    <div className="truncate text-sm text-ink-soft">To {m.to}</div>
                    <div className="truncate font-semibold">{m.subject}</div>
                    <div className="text-xs text-ink-faint">{formatDateTime(m.receivedAt)}</div>
                  </Link>
                </li>
              ))}
            </ul>
          )}
        </Card>
        {messageId ? <MessageView id={messageId} /> : <Card><p className="text-ink-soft">Choose an e-mail to read it.</p></Card>}
      </div>
    </div>
  );
}

function MessageView({ id }: { id: string }) {
  const msg = useOutboxMessage(id);
  if (msg.isPending) return <Card><Spinner /></Card>;
  if (msg.isError) return <Card><Notice tone="error">{errorMessage(msg.error)}</Notice></Card>;
  const m = msg.data.message;
  return (
    <Card>
      <div className="mb-4 border-b border-line pb-4 text-sm text-ink-soft">
        <div>From {m.from}</div>
        <div>To {m.to}</div>
        <div>{formatDateTime(m.receivedAt)}</div>
      </div>
      <h2 className="mb-4 text-xl font-bold">{m.subject}</h2>
      <div className="whitespace-pre-wrap text-[15px] leading-relaxed">{linkify(m.text)}</div>
    </Card>
  );
}

// Links in the plain-text body become real links; the HTML part is never injected into the page.
function linkify(text: string) {
  return text.split(/(https?:\/\/\S+)/g).map((part, i) =>
    /^https?:\/\//.test(part) ? <a key={i} href={part} className="font-semibold break-all text-pine underline">{part}</a> : <span key={i}>{part}</span>,
  );
}
