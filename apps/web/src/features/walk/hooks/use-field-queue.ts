import { liveQuery } from 'dexie';
import { useEffect, useState } from 'react';
import { fieldQueue, type QueuedPhoto, type QueuedValue } from '../queue/field-queue';

export interface FieldQueueView {
  /** Every queued value and photo of the round (waiting, in conflict or refused). */
  values: QueuedValue[];
  photos: QueuedPhoto[];
  /** Entries still to be sent: waiting values and photos (conflicts and refusals wait for the person). */
  waiting: number;
  loaded: boolean;
}

const empty: FieldQueueView = { values: [], photos: [], waiting: 0, loaded: false };

/** The walk's queue for one trial and round, kept current as entries are added, sent or settled (Dexie's live query). */
export function useFieldQueue(trialId: number, roundId: number): FieldQueueView {
  const [view, setView] = useState<FieldQueueView>(empty);
  useEffect(() => {
    const subscription = liveQuery(async () => {
      const [values, photos, waitingValues, waitingPhotos] = await Promise.all([
        fieldQueue.values.where('[trialId+roundId]').equals([trialId, roundId]).toArray(),
        fieldQueue.photos.where('[trialId+roundId]').equals([trialId, roundId]).toArray(),
        fieldQueue.values.where('state').equals('waiting').count(),
        fieldQueue.photos.where('state').equals('waiting').count(),
      ]);
      // Photos are kept as bytes; the view needs only what they are, not the bytes themselves.
      return { values, photos, waiting: waitingValues + waitingPhotos, loaded: true };
    }).subscribe({ next: setView, error: () => setView((v) => ({ ...v, loaded: true })) });
    return () => subscription.unsubscribe();
  }, [trialId, roundId]);
  return view;
}
