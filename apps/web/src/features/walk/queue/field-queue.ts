import type { Observation } from '@friable/contracts';
import Dexie, { type EntityTable } from 'dexie';

/** What the person saw in a cell when they typed: the stored value and its version (0 and null for an empty cell). */
export interface SeenValue {
  observationId: number | null;
  version: number;
  /** "412", ">600", "NA" or "" as it was shown. */
  text: string;
}

/** Where a queued item was taken on the walk: the trial, site, round and plot (with its label, for the person). */
interface QueuedAtPlot {
  id?: number;
  trialId: number;
  siteId: number;
  roundId: number;
  plotId: number;
  plotLabel: string;
}

/**
 * A value recorded on the Round walk and kept in the browser until the server has it. It carries the
 * version it was based on, so a change made meanwhile (at the desk, by someone else) comes back as a
 * conflict for the person to settle, never overwritten in silence.
 */
export interface QueuedValue extends QueuedAtPlot {
  measureId: number;
  measureName: string;
  /** Canonical text for the server: "412", "12.5", ">600", "NA". */
  value: string;
  notes: string | null;
  missingReason: string | null;
  acceptWarnings: boolean;
  seen: SeenValue;
  /** waiting: to be sent; conflict: changed meanwhile, the person chooses; refused: the server said why. */
  state: 'waiting' | 'conflict' | 'refused';
  /** The server's sentence for a refused value. */
  problem: string | null;
  /** True when the refusal is only "unusual" (outside the plausible range) and can be kept on purpose. */
  unusual: boolean;
  /** For a conflict: the value stored now (undefined if it was removed). */
  current: Observation | null;
  queuedAt: number;
}

/** A plot photo taken on the walk, kept until it is uploaded. */
export interface QueuedPhoto extends QueuedAtPlot {
  /** The picture's bytes and type (kept as bytes, which every browser's IndexedDB stores). */
  bytes: ArrayBuffer;
  contentType: string;
  fileName: string;
  state: 'waiting' | 'refused';
  problem: string | null;
  queuedAt: number;
}

/** The walk's store in IndexedDB (through Dexie): values and photos waiting to be sent. */
export class FieldQueueDatabase extends Dexie {
  values!: EntityTable<QueuedValue, 'id'>;
  photos!: EntityTable<QueuedPhoto, 'id'>;

  constructor(name = 'friable-field-queue') {
    super(name);
    this.version(1).stores({
      values: '++id, state, [trialId+roundId], [trialId+roundId+plotId+measureId]',
      photos: '++id, state, [trialId+roundId], [trialId+roundId+plotId]',
    });
  }
}

export const fieldQueue = new FieldQueueDatabase();

export type NewValue = Omit<QueuedValue, 'id' | 'state' | 'problem' | 'unusual' | 'current' | 'queuedAt' | 'acceptWarnings'> & { acceptWarnings?: boolean };

/**
 * Queues a value. A second value for the same cell replaces the first one still waiting, but keeps
 * the version the first was based on: what the person saw before they started is what counts.
 */
export async function queueValue(entry: NewValue, db: FieldQueueDatabase = fieldQueue): Promise<number> {
  return db.transaction('rw', db.values, async () => {
    const existing = await db.values.where('[trialId+roundId+plotId+measureId]').equals([entry.trialId, entry.roundId, entry.plotId, entry.measureId]).first();
    if (existing?.id !== undefined) {
      const state = existing.state === 'conflict' ? 'conflict' : 'waiting';
      await db.values.update(existing.id, {
        value: entry.value,
        notes: entry.notes,
        missingReason: entry.missingReason,
        acceptWarnings: entry.acceptWarnings ?? false,
        state,
        problem: null,
        unusual: false,
        queuedAt: Date.now(),
      });
      return existing.id;
    }
    return (await db.values.add({ ...entry, acceptWarnings: entry.acceptWarnings ?? false, state: 'waiting', problem: null, unusual: false, current: null, queuedAt: Date.now() })) as number;
  });
}

export async function queuePhoto(entry: Omit<QueuedPhoto, 'id' | 'state' | 'problem' | 'queuedAt'>, db: FieldQueueDatabase = fieldQueue): Promise<number> {
  return db.transaction('rw', db.photos, async () => {
    // One photo per plot and round: a newer one replaces one still waiting.
    await db.photos.where('[trialId+roundId+plotId]').equals([entry.trialId, entry.roundId, entry.plotId]).delete();
    return (await db.photos.add({ ...entry, state: 'waiting', problem: null, queuedAt: Date.now() })) as number;
  });
}

/** The person settles a conflict: their own value goes again over the version stored now. */
export async function keepMine(id: number, db: FieldQueueDatabase = fieldQueue): Promise<void> {
  const entry = await db.values.get(id);
  if (!entry || entry.state !== 'conflict') return;
  const current = entry.current;
  await db.values.update(id, {
    state: 'waiting',
    current: null,
    seen: { observationId: current?.id ?? null, version: current?.version ?? 0, text: current?.valueText ?? '' },
  });
}

/** The value stored meanwhile stays; the person's own is dropped (or a refused one given up). */
export async function dropValue(id: number, db: FieldQueueDatabase = fieldQueue): Promise<void> {
  await db.values.delete(id);
}

/** A value refused only as unusual is kept on purpose: sent again with the warning accepted. */
export async function keepUnusual(id: number, db: FieldQueueDatabase = fieldQueue): Promise<void> {
  await db.values.update(id, { state: 'waiting', acceptWarnings: true, problem: null, unusual: false });
}

export async function dropPhoto(id: number, db: FieldQueueDatabase = fieldQueue): Promise<void> {
  await db.photos.delete(id);
}
