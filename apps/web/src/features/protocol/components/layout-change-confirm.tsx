import { Button, Callout, Dialog, DialogBody, DialogFooter, FormGroup, InputGroup } from '@blueprintjs/core';
import type { TrialDetail } from '@friable/contracts';
import { useState, type ReactNode } from 'react';
import { ErrorState, LoadingState } from '../../../components/states';
import { useLayoutImpact } from '../api/get-layout-impact';

/** A change waiting for its confirmation: what it is, which layouts it touches, and what to do once confirmed. */
export interface PendingLayoutChange {
  /** "Remove treatment GYP (Gypsum)". */
  what: string;
  /** One site's layout; absent: every site's. */
  siteId?: number;
  /** The button's words: "Remove treatment". */
  confirmText: string;
  proceed: () => void;
}

/**
 * Before a change that clears plot layouts (the design, adding or removing a treatment, removing a site): the
 * server says exactly what would be lost ("Clears the layouts of 3 sites, 60 plots …"); when layouts would go, the
 * person types the trial's code to go on. Values recorded refuse the change, and the dialog says so instead.
 * Nothing to clear: it asks once.
 */
export function LayoutChangeConfirm({ trial, change, onClose }: { trial: TrialDetail; change: PendingLayoutChange | null; onClose: () => void }) {
  const impact = useLayoutImpact(trial.id, change?.siteId, change !== null);
  const [typed, setTyped] = useState('');
  const needsTyping = (impact.data?.layouts ?? 0) > 0;
  const refused = impact.data?.refusal ?? null;
  const matches = typed.trim().toUpperCase() === trial.code.toUpperCase();
  const ready = impact.isSuccess && !refused && (!needsTyping || matches);

  function close() {
    setTyped('');
    onClose();
  }

  let body: ReactNode;
  if (impact.isPending) body = <LoadingState what="what this change would clear" />;
  else if (impact.isError) body = <ErrorState title="What this change would clear could not be read" error={impact.error} onRetry={() => impact.refetch()} />;
  else {
    const data = impact.data;
    body = (
      <>
        <p className="fr-impact__summary">{data.summary}</p>
        {data.sites.length > 0 && (
          <ul aria-label="Layouts it clears">
            {data.sites.map((site) => (
              <li key={site.siteId}>
                {site.siteName}: {site.plots} plots{site.values > 0 ? `, ${site.values} values recorded` : ''}
              </li>
            ))}
          </ul>
        )}
        {refused ? (
          <Callout intent="danger" icon="disable" role="alert" className="fr-gap">
            {refused}
          </Callout>
        ) : needsTyping ? (
          <FormGroup label={`Type the trial code ${trial.code} to confirm`} labelFor="fr-impact-code" className="fr-gap">
            <InputGroup id="fr-impact-code" value={typed} autoComplete="off" spellCheck={false} onChange={(event) => setTyped(event.target.value)} autoFocus />
          </FormGroup>
        ) : null}
      </>
    );
  }

  return (
    <Dialog isOpen={change !== null} title={change?.what ?? ''} icon="warning-sign" onClose={close} className="fr-impact-dialog">
      <DialogBody>{body}</DialogBody>
      <DialogFooter
        actions={
          <>
            <Button text="Cancel" onClick={close} />
            {!refused && (
              <Button
                intent="danger"
                text={change?.confirmText ?? 'Confirm'}
                disabled={!ready}
                onClick={() => {
                  const proceed = change?.proceed;
                  close();
                  proceed?.();
                }}
              />
            )}
          </>
        }
      />
    </Dialog>
  );
}
