import type { IntakeImport } from '@friable/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, unwrap } from '../../../lib/api-client';

/** How often a running upload's stage and counts are asked for (the server writes them at most every 400 ms). */
export const FOLLOW_EVERY_MS = 500;

/** GET /api/trials/:trialId/intake-imports?siteId&roundId — the latest uploads for a site and round, running ones with their stage and counts. */
export function getIntakeImports(trialId: number, siteId: number, roundId: number): Promise<IntakeImport[]> {
  return unwrap(api.GET('/api/trials/{trialId}/intake-imports', { params: { path: { trialId }, query: { siteId, roundId } } })) as Promise<IntakeImport[]>;
}

export const intakeImportsQueryOptions = (trialId: number, siteId: number, roundId: number) =>
  queryOptions({ queryKey: ['trials', trialId, 'intake-imports', siteId, roundId], queryFn: () => getIntakeImports(trialId, siteId, roundId) });

/**
 * The site and round's uploads, asked again twice a second while one of them runs or `follow` is set
 * (an upload of this page is on its way), so a long import can be followed, also after a page reload.
 */
export function useIntakeImports(trialId: number, siteId: number | undefined, roundId: number | undefined, follow: boolean) {
  return useQuery({
    ...intakeImportsQueryOptions(trialId, siteId ?? 0, roundId ?? 0),
    enabled: siteId !== undefined && roundId !== undefined,
    refetchInterval: (query) => (follow || (query.state.data ?? []).some((record) => record.finishedAt === null) ? FOLLOW_EVERY_MS : false),
  });
}
