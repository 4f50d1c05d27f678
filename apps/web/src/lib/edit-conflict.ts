import { useState } from 'react';
import { ApiError } from './api-client';

/** An edit refused because someone else saved the record first: what the person sent, and what is stored now. */
export interface EditConflict<TMine, TStored> {
  mine: TMine;
  current: TStored;
}

/** The stored record a 409 for a stale version carries, or undefined for any other error (a locked trial, say). */
export function conflictCurrent<T>(error: unknown): T | undefined {
  return error instanceof ApiError && error.status === 409 && error.current !== undefined ? (error.current as T) : undefined;
}

interface Mutation<TSave> {
  mutate(save: TSave, options: { onSuccess: () => void; onError: (error: unknown) => void }): void;
  reset(): void;
}

/**
 * A form that edits a versioned record. `send(mine)` saves with the version the form was opened at; when someone
 * else saved first, the answer's stored record is kept in `conflict` (nothing is overwritten) until the person
 * chooses: `keepMine()` sends theirs again with the stored version, `takeStored()` leaves the stored record.
 */
export function useVersionedForm<TMine, TStored extends { version: number }, TSave>(
  mutation: Mutation<TSave>,
  toSave: (mine: TMine, version: number | undefined) => TSave,
  opened: { version: number } | null,
  onDone: () => void,
) {
  const [conflict, setConflict] = useState<EditConflict<TMine, TStored> | null>(null);
  function send(mine: TMine, version = opened?.version) {
    mutation.mutate(toSave(mine, version), {
      onSuccess: onDone,
      onError: (error) => {
        const current = conflictCurrent<TStored>(error);
        if (current === undefined) return;
        mutation.reset();
        setConflict({ mine, current });
      },
    });
  }
  return {
    send,
    conflict,
    keepMine() {
      if (!conflict) return;
      setConflict(null);
      send(conflict.mine, conflict.current.version);
    },
    takeStored() {
      setConflict(null);
      onDone();
    },
  };
}
