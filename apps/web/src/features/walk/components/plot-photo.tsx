import { FileInput, Tag } from '@blueprintjs/core';
import type { Plot } from '@friable/contracts';
import { useEffect, useState } from 'react';
import { usePlotPhoto } from '../../../lib/api/plot-photo';
import { queuePhoto, type QueuedPhoto } from '../queue/field-queue';

/** Photos above this size are refused here, before they fill the phone's storage (the server's default limit, 8 MB). */
const MAX_PHOTO_BYTES = 8 * 1024 * 1024;

/** A photo of the plot from the phone's camera, queued like the values; the stored one shows when online. */
export function PlotPhoto({ trialId, siteId, roundId, plot, queued }: { trialId: number; siteId: number; roundId: number; plot: Plot; queued: QueuedPhoto | undefined }) {
  const stored = usePlotPhoto(trialId, queued ? null : plot.id, roundId);
  const [problem, setProblem] = useState<string | null>(null);
  const [preview, setPreview] = useState<string | null>(null);
  useEffect(() => {
    if (!queued) return setPreview(null);
    const url = URL.createObjectURL(new Blob([queued.bytes], { type: queued.contentType }));
    setPreview(url);
    return () => URL.revokeObjectURL(url);
  }, [queued]);
  const shown = preview ?? stored.data ?? null;

  async function take(file: File) {
    setProblem(null);
    if (!/^image\/(jpeg|png)$/.test(file.type)) return setProblem('The photo must be a JPEG or PNG picture.');
    if (file.size > MAX_PHOTO_BYTES) return setProblem('The photo is larger than 8 MB; take it again at a smaller size.');
    await queuePhoto({ trialId, siteId, roundId, plotId: plot.id, plotLabel: plot.label, bytes: await file.arrayBuffer(), contentType: file.type, fileName: file.name || `${plot.label}.jpg` });
  }

  return (
    <div className="fr-walk-photo">
      <label className="fr-walk-measure__label" htmlFor={`fr-walk-photo-${plot.id}`}>
        Photo of {plot.label}
      </label>
      <FileInput
        large
        className="fr-touch"
        text={shown ? 'Take another photo' : 'Take a photo'}
        buttonText="Camera"
        inputProps={{ id: `fr-walk-photo-${plot.id}`, accept: 'image/jpeg,image/png', capture: 'environment' }}
        onInputChange={(event) => {
          const file = (event.target as HTMLInputElement).files?.[0];
          if (file) void take(file);
        }}
      />
      {queued && <Tag intent={queued.state === 'refused' ? 'danger' : 'primary'}>{queued.state === 'refused' ? 'Photo not accepted — see above' : 'Photo waiting to be sent'}</Tag>}
      {problem && (
        <p className="fr-walk-measure__problem" role="alert">
          {problem}
        </p>
      )}
      {shown && <img className="fr-walk-photo__image" src={shown} alt={`Photo of ${plot.label}`} />}
    </div>
  );
}
