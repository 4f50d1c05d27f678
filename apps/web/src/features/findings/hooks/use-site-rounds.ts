import type { FindingsModelsQuery, RepeatedAnswer } from '@friable/contracts';
import { useQueries } from '@tanstack/react-query';
import { findingsQueryOptions } from '../api/get-findings';

/**
 * Each site's own rounds-over-time analysis (same choices, one site), for the means-over-time charts beside the
 * combined one; asked only once the combined answer is on screen. Sites whose analysis fails are left out.
 */
export function useSiteRounds(trialId: number, query: FindingsModelsQuery | null, sites: Array<{ id: number; name: string }>) {
  const answers = useQueries({
    queries: (query ? sites : []).map((site) => ({ ...findingsQueryOptions(trialId, { ...query!, siteId: site.id }), staleTime: Infinity })),
  });
  return sites.flatMap((site, index) => {
    const data = answers[index]?.data;
    return data && 'analysis' in data && data.analysis === 'repeated' ? [{ site: site.name, answer: data as Pick<RepeatedAnswer, 'means' | 'rounds'> }] : [];
  });
}
