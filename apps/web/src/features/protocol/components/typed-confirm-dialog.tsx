import { Button, Callout, Dialog, DialogBody, DialogFooter, FormGroup, InputGroup } from '@blueprintjs/core';
import { useState, type ReactNode } from 'react';
import { ErrorState, LoadingState } from '../../../components/states';

/** What a destructive change would lose, as the server counted it, and whether the trial code must be typed. */
export interface ImpactInWords {
  summary: string;
  /** One line per site ("Hollow Lane: 12 plots, 30 values recorded"), under `linesLabel`. */
  lines: string[];
  linesLabel: string;
  /** Why the change is refused whatever is typed, or null. */
  refusal: string | null;
  needsTyping: boolean;
}

interface TypedConfirmDialogProps {
  isOpen: boolean;
  /** "Remove measure DT (Drain time)". */
  title: string;
  /** The button's words: "Remove measure". */
  confirmText: string;
  trialCode: string;
  /** What is being worked out, for the loading line: "what this change would clear". */
  loadingWhat: string;
  impact: { pending: boolean; error: unknown; retry: () => void; answer: ImpactInWords | undefined };
  /** Called with the code as typed (undefined when no typing was asked). */
  onConfirm: (typed: string | undefined) => void;
  onClose: () => void;
}

/**
 * The one confirmation of every destructive protocol change: the server's own account of what would be lost, then,
 * when something would, the trial's code typed (in any case) before the button works. A refusal is shown instead of
 * the button; nothing to lose: it asks once.
 */
export function TypedConfirmDialog({ isOpen, title, confirmText, trialCode, loadingWhat, impact, onConfirm, onClose }: TypedConfirmDialogProps) {
  const [typed, setTyped] = useState('');
  const answer = impact.answer;
  const refused = answer?.refusal ?? null;
  const matches = typed.trim().toUpperCase() === trialCode.toUpperCase();
  const ready = answer !== undefined && !impact.pending && !refused && (!answer.needsTyping || matches);

  function close() {
    setTyped('');
    onClose();
  }

  let body: ReactNode;
  if (impact.pending) body = <LoadingState what={loadingWhat} />;
  else if (impact.error || !answer) body = <ErrorState title={`${loadingWhat[0]!.toUpperCase()}${loadingWhat.slice(1)} could not be read`} error={impact.error} onRetry={impact.retry} />;
  else {
    body = (
      <>
        <p className="fr-impact__summary">{answer.summary}</p>
        {answer.lines.length > 0 && (
          <ul aria-label={answer.linesLabel}>
            {answer.lines.map((line) => (
              <li key={line}>{line}</li>
            ))}
          </ul>
        )}
        {refused ? (
          <Callout intent="danger" icon="disable" role="alert" className="fr-gap">
            {refused}
          </Callout>
        ) : answer.needsTyping ? (
          <FormGroup label={`Type the trial code ${trialCode} to confirm`} labelFor="fr-impact-code" className="fr-gap">
            <InputGroup id="fr-impact-code" value={typed} autoComplete="off" spellCheck={false} onChange={(event) => setTyped(event.target.value)} autoFocus />
          </FormGroup>
        ) : null}
      </>
    );
  }

  return (
    <Dialog isOpen={isOpen} title={title} icon="warning-sign" onClose={close} className="fr-impact-dialog">
      <DialogBody>{body}</DialogBody>
      <DialogFooter
        actions={
          <>
            <Button text="Cancel" onClick={close} />
            {!refused && (
              <Button
                intent="danger"
                text={confirmText}
                disabled={!ready}
                onClick={() => {
                  const code = answer?.needsTyping ? typed.trim() : undefined;
                  close();
                  onConfirm(code);
                }}
              />
            )}
          </>
        }
      />
    </Dialog>
  );
}
