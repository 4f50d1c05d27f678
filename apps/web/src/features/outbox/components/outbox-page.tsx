import { Button, Card, H3, H4, Tab, Tabs } from '@blueprintjs/core';
import type { OutboxMessage } from '@friable/contracts';
import { useState } from 'react';
import { EmptyState, ErrorState, LoadingState } from '../../../components/states';
import { useOutbox } from '../api/get-outbox';

const received = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit', second: '2-digit' });

/** Development only: the e-mails Friable sent, as the local SMTP sink caught them, newest first. */
export function OutboxPage() {
  const outbox = useOutbox();
  return (
    <div className="fr-outbox">
      <div className="fr-outbox__head">
        <H3>Outbox</H3>
      </div>
      <p className="fr-muted">
        Development only: e-mails are caught here instead of being delivered. Links in them work on this machine.
      </p>
      {outbox.isPending || !outbox.isFetchedAfterMount ? (
        <LoadingState what="the Outbox" />
      ) : outbox.isError ? (
        <ErrorState title="The Outbox could not be loaded" error={outbox.error} onRetry={() => outbox.refetch()} />
      ) : outbox.data.length === 0 ? (
        <EmptyState title="No e-mails yet" description="Invitations and reminders appear here as soon as Friable sends them." />
      ) : (
        <ul className="fr-card-list">
          {outbox.data.map((message, index) => (
            <li key={message.id}>
              <OutboxCard message={message} startOpen={index === 0} />
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}

/** One caught e-mail: its envelope always, its body when opened (the newest starts open). */
function OutboxCard({ message, startOpen }: { message: OutboxMessage; startOpen: boolean }) {
  const [view, setView] = useState<'text' | 'html'>('text');
  const [open, setOpen] = useState(startOpen);
  return (
    <Card elevation={0} className="fr-outbox__message" aria-label={`E-mail: ${message.subject}`}>
      <div className="fr-outbox__top">
        <H4 className="fr-outbox__subject">{message.subject}</H4>
        <Button
          variant="minimal"
          size="small"
          icon={open ? 'chevron-up' : 'chevron-down'}
          text={open ? 'Hide' : 'Show'}
          aria-expanded={open}
          aria-label={`${open ? 'Hide' : 'Show'} the e-mail “${message.subject}” to ${message.to.join(', ')}`}
          onClick={() => setOpen(!open)}
        />
      </div>
      <dl className="fr-outbox__meta">
        <dt>To</dt>
        <dd>{message.to.join(', ')}</dd>
        <dt>From</dt>
        <dd>{message.from}</dd>
        <dt>Received</dt>
        <dd>{received.format(new Date(message.receivedAt))}</dd>
      </dl>
      {open && message.html !== null && (
        <Tabs id={`outbox-${message.id}`} selectedTabId={view} onChange={(id) => setView(id as 'text' | 'html')}>
          <Tab id="text" title="Plain text" />
          <Tab id="html" title="HTML" />
        </Tabs>
      )}
      {!open ? null : view === 'html' && message.html !== null ? (
        // The sink's copy of our own e-mail, shown in a sandbox with no scripts.
        <iframe className="fr-outbox__html" title={`HTML of ${message.subject}`} sandbox="" srcDoc={message.html} />
      ) : (
        <pre className="fr-outbox__text">{linkify(message.text)}</pre>
      )}
    </Card>
  );
}

/** The plain text with its web addresses as links, so an invitation can be opened from here. */
function linkify(text: string) {
  return text.split(/(https?:\/\/\S+)/g).map((part, index) =>
    /^https?:\/\//.test(part) ? (
      <a key={index} href={part}>
        {part}
      </a>
    ) : (
      part
    ),
  );
}
