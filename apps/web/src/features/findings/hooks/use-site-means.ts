import type { AnovaAnswer } from '@friable/contracts';
import { useQueries } from '@tanstack/react-query';
import type { PlotSeries } from '../components/plot-inputs';

/**
 * Each site's own least-squares means, from one server analysis per site, as the lines of the
 * site × treatment plot (the page computes no means of its own). Sites whose analysis fails are left out.
 */
export function useSiteMeans(sites: Array<{ name: string; options: { queryKey: readonly unknown[]; queryFn: () => Promise<AnovaAnswer> } }>): PlotSeries[] {
  const answers = useQueries({ queries: sites.map((site) => ({ queryKey: site.options.queryKey, queryFn: site.options.queryFn, staleTime: Infinity, retry: false })) });
  return sites.flatMap((site, index) => {
    const data = answers[index]?.data;
    return data ? [{ name: site.name, points: data.means.map((m) => ({ x: m.treatment, y: m.mean })) }] : [];
  });
}
