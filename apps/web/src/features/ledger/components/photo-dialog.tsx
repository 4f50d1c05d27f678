import { Button, Callout, Dialog, DialogBody } from '@blueprintjs/core';
import { FilePick } from '../../../components/file-pick';
import type { Plot } from '@friable/contracts';
import { ErrorState, LoadingState } from '../../../components/states';
import { usePlotPhoto, usePutPlotPhoto } from '../../../lib/api/plot-photo';

/** The photo of one plot in this round, and a way to add or replace it (JPEG or PNG). */
export function PhotoDialog({ trialId, roundId, roundLabel, plot, canEdit, onClose }: { trialId: number; roundId: number; roundLabel: string; plot: Plot | null; canEdit: boolean; onClose: () => void }) {
  const photo = usePlotPhoto(trialId, plot?.id ?? null, roundId);
  const put = usePutPlotPhoto(trialId);
  return (
    <Dialog isOpen={plot !== null} onClose={onClose} title={plot ? `Photo of ${plot.label}, ${roundLabel}` : 'Photo'} icon="camera" className="fr-dialog fr-dialog--wide">
      <DialogBody>
        {photo.isPending ? (
          <LoadingState what="the photo" />
        ) : photo.isError ? (
          <ErrorState title="The photo could not be loaded" error={photo.error} onRetry={() => photo.refetch()} />
        ) : photo.data ? (
          <img className="fr-ledger-photo" src={photo.data} alt={`Plot ${plot?.label} in ${roundLabel}`} />
        ) : (
          <p className="fr-muted">No photo of this plot for {roundLabel} yet.</p>
        )}
        {canEdit && plot && (
          <FilePick
            className="fr-ledger-photo__pick"
            label={`${photo.data ? 'Replace the photo' : 'Add a photo'} (JPEG or PNG)`}
            accept="image/jpeg,image/png"
            ariaLabel="Photo file"
            onFile={(file) => put.mutate({ trialId, plotId: plot.id, roundId, file })}
          />
        )}
        {put.isPending && <p className="fr-muted">Sending the photo…</p>}
        {put.error && (
          <Callout intent="danger" compact role="alert">
            {put.error.message}
          </Callout>
        )}
        <div className="fr-dialog-actions">
          <Button text="Close" onClick={onClose} />
        </div>
      </DialogBody>
    </Dialog>
  );
}
