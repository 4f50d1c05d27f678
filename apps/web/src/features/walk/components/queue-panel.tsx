import { Button, Callout } from '@blueprintjs/core';
import { formatNumber } from '../../../lib/format';
import { cellText } from '../../../lib/observation-text';
import { dropPhoto, dropValue, keepMine, keepUnusual, type QueuedPhoto, type QueuedValue } from '../queue/field-queue';
import type { SenderState } from '../hooks/use-sender';

const entries = (n: number) => `${formatNumber(n, 0)} ${n === 1 ? 'entry' : 'entries'}`;

/** "3 entries waiting to be sent", whether there is a connection, and the last try in words. */
export function QueueStatus({ waiting, needYou, sender }: { waiting: number; needYou: number; sender: SenderState }) {
  const stopped = sender.last?.stopped && waiting > 0;
  return (
    <div className={`fr-walk-status${waiting + needYou > 0 ? ' fr-walk-status--waiting' : ''}`} role="status" aria-live="polite">
      <span className="fr-walk-status__count">
        {waiting === 0 && needYou === 0 ? 'Everything is sent' : waiting > 0 ? `${entries(waiting)} waiting to be sent` : ''}
        {needYou > 0 ? `${waiting > 0 ? ' · ' : ''}${entries(needYou)} need${needYou === 1 ? 's' : ''} you (below)` : ''}
      </span>
      <span className="fr-muted fr-small">
        {!sender.online || stopped ? 'No connection: entries stay on this phone and go when the connection returns.' : sender.sending ? 'Sending…' : ''}
      </span>
      {waiting > 0 && <Button className="fr-touch" icon="refresh" text="Send now" loading={sender.sending} onClick={() => void sender.send()} />}
    </div>
  );
}

/**
 * Values that need the person: a conflict (someone changed the value meanwhile — theirs and the
 * stored one side by side, nothing overwritten until they choose) and values the server refused.
 */
export function QueueProblems({ values, photos, onSettled }: { values: QueuedValue[]; photos: QueuedPhoto[]; onSettled: () => void }) {
  const conflicts = values.filter((v) => v.state === 'conflict');
  const refused = values.filter((v) => v.state === 'refused');
  const refusedPhotos = photos.filter((p) => p.state === 'refused');
  if (!conflicts.length && !refused.length && !refusedPhotos.length) return null;
  const settle = (work: Promise<void>) => void work.then(onSettled);
  return (
    <section className="fr-walk-problems" aria-label="Entries that need you">
      {conflicts.map((entry) => (
        <Callout key={entry.id} intent="warning" icon="git-merge" title={`${entry.plotLabel} · ${entry.measureName}: changed meanwhile`} role="alert">
          <p>
            You wrote <strong>{entry.value}</strong> where you had seen <strong>{entry.seen.text || 'no value'}</strong>. Meanwhile{' '}
            {entry.current ? (
              <>
                {entry.current.recordedBy ?? 'someone'} saved <strong>{cellText(entry.current)}</strong>.
              </>
            ) : (
              <>the value was removed.</>
            )}{' '}
            Nothing was overwritten: choose which stays.
          </p>
          <div className="fr-walk-problems__actions">
            <Button className="fr-touch" intent="warning" text={`Keep mine (${entry.value})`} onClick={() => settle(keepMine(entry.id!))} />
            <Button className="fr-touch" text={entry.current ? `Keep the saved one (${cellText(entry.current)})` : 'Leave it removed'} onClick={() => settle(dropValue(entry.id!))} />
          </div>
        </Callout>
      ))}
      {refused.map((entry) => (
        <Callout key={entry.id} intent="danger" icon="error" title={`${entry.plotLabel} · ${entry.measureName}: ${entry.value} was not accepted`} role="alert">
          <p>{entry.problem}</p>
          <div className="fr-walk-problems__actions">
            {entry.unusual && <Button className="fr-touch" intent="warning" text="Keep it: the value is right" onClick={() => settle(keepUnusual(entry.id!))} />}
            <Button className="fr-touch" text="Drop this entry" onClick={() => settle(dropValue(entry.id!))} />
          </div>
        </Callout>
      ))}
      {refusedPhotos.map((photo) => (
        <Callout key={photo.id} intent="danger" icon="media" title={`${photo.plotLabel}: the photo was not accepted`} role="alert">
          <p>{photo.problem}</p>
          <Button className="fr-touch" text="Drop the photo" onClick={() => settle(dropPhoto(photo.id!))} />
        </Callout>
      ))}
    </section>
  );
}
