import type { Observation } from '@friable/contracts';
import { ApiError } from '../../../lib/api-client';
import { getObservations } from '../../../lib/api/get-observations';
import { putPlotPhoto } from '../../../lib/api/plot-photo';
import { saveObservation } from '../../../lib/api/save-observation';
import { fieldQueue, type FieldQueueDatabase, type QueuedValue } from './field-queue';

export interface SendReport {
  sent: Observation[];
  photosSent: number;
  conflicts: number;
  refused: number;
  /** True when the server could not be reached (or the session ended): the rest waits. */
  stopped: boolean;
}

/** The server lists the warning's switch among the problems when a value is only unusual; that one may be kept on purpose. */
const isUnusual = (error: ApiError) => error.status === 422 && (error.details ?? []).some((d) => d.field === 'acceptWarnings');

/** Stops the round of sending: the server is out of reach, the session is over, or it is failing. */
const mustStop = (error: unknown) => !(error instanceof ApiError) || error.status === 0 || error.status === 401 || error.status >= 500;

async function currentValue(entry: QueuedValue): Promise<Observation | undefined> {
  const stored = await getObservations(entry.trialId, entry.siteId, entry.roundId, entry.measureId);
  return stored.find((o) => o.plotId === entry.plotId && o.measureId === entry.measureId);
}

async function sendValue(entry: QueuedValue, db: FieldQueueDatabase, report: SendReport): Promise<boolean> {
  try {
    const saved = await saveObservation({
      trialId: entry.trialId,
      observationId: entry.seen.observationId,
      plotId: entry.plotId,
      roundId: entry.roundId,
      measureId: entry.measureId,
      edit: { version: entry.seen.version, value: entry.value, notes: entry.notes, missingReason: entry.missingReason, acceptWarnings: entry.acceptWarnings || undefined },
    });
    // Only the entry that was sent goes: a newer value typed meanwhile stays to be sent next.
    await db.transaction('rw', db.values, async () => {
      const now = await db.values.get(entry.id!);
      if (now && now.queuedAt === entry.queuedAt) await db.values.delete(entry.id!);
      else if (now) await db.values.update(entry.id!, { seen: { observationId: saved.id, version: saved.version, text: saved.valueText ?? '' } });
    });
    report.sent.push(saved);
    return true;
  } catch (error) {
    if (mustStop(error)) {
      report.stopped = true;
      return false;
    }
    const apiError = error as ApiError;
    if (apiError.status === 409) {
      const current = await currentValue(entry).catch(() => undefined);
      // The same version as seen means nobody changed it: a refusal (a locked trial), not a conflict.
      if ((current?.version ?? 0) === entry.seen.version && (current?.id ?? null) === entry.seen.observationId) {
        await db.values.update(entry.id!, { state: 'refused', problem: apiError.message, unusual: false });
        report.refused += 1;
      } else {
        await db.values.update(entry.id!, { state: 'conflict', current: current ?? null });
        report.conflicts += 1;
      }
      return true;
    }
    await db.values.update(entry.id!, { state: 'refused', problem: apiError.message, unusual: isUnusual(apiError) });
    report.refused += 1;
    return true;
  }
}

/**
 * Send waiting — sends every waiting value and photo, oldest first, and stops at the first sign the
 * server is out of reach (they stay queued for the next try). A changed-meanwhile value becomes a
 * conflict and a refused one keeps the server's sentence; neither blocks the rest.
 */
export async function sendWaiting(db: FieldQueueDatabase = fieldQueue): Promise<SendReport> {
  const report: SendReport = { sent: [], photosSent: 0, conflicts: 0, refused: 0, stopped: false };
  const values = await db.values.where('state').equals('waiting').sortBy('queuedAt');
  for (const entry of values) {
    if (!(await sendValue(entry, db, report))) return report;
  }
  const photos = await db.photos.where('state').equals('waiting').sortBy('queuedAt');
  for (const photo of photos) {
    try {
      await putPlotPhoto({ trialId: photo.trialId, plotId: photo.plotId, roundId: photo.roundId, file: new Blob([photo.bytes], { type: photo.contentType }), fileName: photo.fileName });
      await db.photos.delete(photo.id!);
      report.photosSent += 1;
    } catch (error) {
      if (mustStop(error)) {
        report.stopped = true;
        return report;
      }
      await db.photos.update(photo.id!, { state: 'refused', problem: (error as ApiError).message });
    }
  }
  return report;
}

let running: Promise<SendReport> | null = null;

/** One round of sending at a time in this tab, and (where the browser has Web Locks) across tabs. */
export function sendWaitingOnce(db: FieldQueueDatabase = fieldQueue): Promise<SendReport> {
  if (running) return running;
  const locks = typeof navigator !== 'undefined' ? navigator.locks : undefined;
  const run = locks ? (locks.request('friable-field-queue', () => sendWaiting(db)) as unknown as Promise<SendReport>) : sendWaiting(db);
  running = run.finally(() => {
    running = null;
  });
  return running;
}
