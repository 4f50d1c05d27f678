import { formatStatistic, pClause, significanceMark } from './stat-format';

/** A rank test's answer; statistic, df and p are null when it could not run (unavailable says why). */
export interface RankTestResult {
  statistic: number | null;
  df: number | null;
  p: number | null;
  droppedBlocks?: string[];
  unavailable?: string;
}

/** The rank-based test beside the ANOVA, which does not assume normal residuals. */
export function RankTestPanel({ kind, answer, error, pending }: { kind: 'friedman' | 'kruskal-wallis'; answer?: RankTestResult; error?: Error | string | null; pending?: boolean }) {
  const name = kind === 'friedman' ? 'Friedman test (ranks within blocks)' : 'Kruskal–Wallis test (ranks)';
  return (
    <section className="fr-findings-block" aria-labelledby="fr-rank-title">
      <h3 id="fr-rank-title" className="fr-findings-heading">
        Rank-based test
      </h3>
      {pending ? (
        <p className="fr-muted">Computing the {name}…</p>
      ) : error ? (
        <p className="fr-error-line">The {name} could not be computed: {typeof error === 'string' ? error : error.message}</p>
      ) : answer && (answer.statistic === null || answer.p === null) ? (
        <p className="fr-muted">The {name} could not be run{answer.unavailable ? `: ${answer.unavailable}` : '.'}</p>
      ) : answer ? (
        <>
          <p>
            {name}: χ² = {formatStatistic(answer.statistic)} on {answer.df} df, {pClause(answer.p)}{' '}
            <span className="fr-findings-mark">{significanceMark(answer.p)}</span>
          </p>
          {answer.droppedBlocks && answer.droppedBlocks.length > 0 && (
            <p className="fr-muted fr-small">Blocks left out because a treatment is missing in them: {answer.droppedBlocks.join(', ')}.</p>
          )}
          <p className="fr-muted fr-small">It compares ranks rather than values, so one wild plot moves it less; it gives no means or letters.</p>
        </>
      ) : null}
    </section>
  );
}
