import { useEffect, useState } from 'react';
import { useIntakeImports } from '../api/get-intake-imports';

/** The ticket of this tab's upload for a site and round that had not answered when the page was left. */
function readSent(key: string): string[] {
  try {
    const ticket = window.sessionStorage.getItem(key);
    return ticket ? [ticket] : [];
  } catch {
    return [];
  }
}

/**
 * The uploads for a site and round: this page's own (`ticket`), and the others seen running (sent
 * before a reload under `sentKey`, or by someone else), followed to their end.
 */
export function useFollowedImports(trialId: number, siteId: number | undefined, roundId: number | undefined, ticket: string | null, sending: boolean, sentKey: string) {
  const imports = useIntakeImports(trialId, siteId, roundId, sending);
  const mine = imports.data?.find((record) => record.ticket === ticket);
  const [watched, setWatched] = useState<ReadonlySet<string>>(() => new Set(readSent(sentKey)));
  useEffect(() => {
    const running = (imports.data ?? []).filter((record) => record.finishedAt === null && record.ticket !== ticket && !watched.has(record.ticket));
    if (running.length) setWatched(new Set([...watched, ...running.map((record) => record.ticket)]));
  }, [imports.data, ticket, watched]);
  const followed = (imports.data ?? []).filter((record) => record.ticket !== ticket && watched.has(record.ticket));
  useEffect(() => {
    // Shown now that it has ended: a later reload need not show it again.
    const [sent] = readSent(sentKey);
    if (sent && sent !== ticket && imports.data?.some((record) => record.ticket === sent && record.finishedAt !== null)) window.sessionStorage.removeItem(sentKey);
  }, [imports.data, sentKey, ticket]);
  return { mine, followed };
}
