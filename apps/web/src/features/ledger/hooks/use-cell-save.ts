import type { Observation, ObservationEdit } from '@friable/contracts';
import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { ApiError } from '../../../lib/api-client';
import { observationsQueryOptions } from '../../../lib/api/get-observations';
import { useSaveObservation } from '../../../lib/api/save-observation';
import { cellKey } from '../components/ledger-cells';

export interface CellTarget {
  plotId: number;
  plotLabel: string;
  measureId: number;
  measureName: string;
  /** The stored value the person saw when they started editing; undefined for an empty cell. */
  seen: Observation | undefined;
}

export interface CellRefusal {
  text: string;
  message: string;
  /** Only unusual (outside the plausible range): it can be kept on purpose. */
  warning: boolean;
  edit?: Omit<ObservationEdit, 'version'>;
}

export interface CellConflict {
  target: CellTarget;
  mine: Omit<ObservationEdit, 'version'>;
  /** The value as stored now, by someone else; undefined if it has since been removed. */
  current: Observation | undefined;
}

/**
 * Saving Ledger cells: the server's 422 sentence stays beside the cell that caused it; a 409 (someone
 * else changed the value) loads the current value and waits for the person's choice, so nothing
 * is overwritten silently.
 */
export function useCellSave(trialId: number, siteId: number, roundId: number) {
  const queryClient = useQueryClient();
  const save = useSaveObservation(trialId);
  const [refusals, setRefusals] = useState<Map<string, CellRefusal>>(new Map());
  const [conflict, setConflict] = useState<CellConflict | null>(null);
  const [savingKey, setSavingKey] = useState<string | null>(null);

  const setRefusal = (key: string, refusal: CellRefusal | null) =>
    setRefusals((before) => {
      const next = new Map(before);
      if (refusal) next.set(key, refusal);
      else next.delete(key);
      return next;
    });

  async function send(target: CellTarget, mine: Omit<ObservationEdit, 'version'>, base: Observation | undefined) {
    const key = cellKey(target.plotId, target.measureId);
    setSavingKey(key);
    try {
      await save.mutateAsync({
        trialId,
        observationId: base?.id ?? null,
        plotId: target.plotId,
        roundId,
        measureId: target.measureId,
        edit: { ...mine, version: base?.version ?? 0 },
      });
      setRefusal(key, null);
    } catch (error) {
      if (error instanceof ApiError && error.status === 409) {
        const fresh = await queryClient.fetchQuery({ ...observationsQueryOptions(trialId, siteId, roundId), staleTime: 0 });
        const current = fresh.find((o) => o.plotId === target.plotId && o.measureId === target.measureId);
        // A 409 with the value as it was (a locked trial, say) is a refusal, not someone else's change.
        if (current?.version === base?.version) {
          setRefusal(key, { text: mine.value, message: error.message, warning: false });
        } else {
          setRefusal(key, null);
          setConflict({ target, mine, current });
        }
      } else {
        const message = error instanceof Error ? error.message : 'The value could not be saved.';
        // The server lists acceptWarnings among the problems when the value is only unusual: the person may keep it.
        setRefusal(key, { text: mine.value, message, warning: error instanceof ApiError && error.status === 422 && error.details?.some((d) => d.field === 'acceptWarnings') === true, edit: mine });
      }
    } finally {
      setSavingKey(null);
    }
  }

  return {
    savingKey,
    refusals,
    conflict,
    /** Saves what the person typed over the value they saw. */
    saveCell: (target: CellTarget, mine: Omit<ObservationEdit, 'version'>) => send(target, mine, target.seen),
    /** Their own value wins: sent again over the version stored now. */
    keepMine: () => {
      if (!conflict) return;
      setConflict(null);
      void send({ ...conflict.target, seen: conflict.current }, conflict.mine, conflict.current);
    },
    /** The other person's value stays (it is already shown). */
    takeCurrent: () => setConflict(null),
    forget: (key: string) => setRefusal(key, null),
    /** A value refused before it is sent (a number that could be read two ways), in words. */
    refuse: (target: CellTarget, text: string, message: string) => setRefusal(cellKey(target.plotId, target.measureId), { text, message, warning: false }),
    /** Sends a value refused only as unusual again, this time accepted on purpose. */
    keepUnusual: (target: CellTarget, refusal: CellRefusal) => send(target, { ...(refusal.edit ?? { value: refusal.text }), acceptWarnings: true }, target.seen),
  };
}
