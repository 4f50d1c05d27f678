import { formatP, formatStatistic, significanceMark } from './stat-format';

/** The F, p and mark cells of one tested row (the ANOVA table and the factors panel). */
export function TestCells({ f, p }: { f: number | null; p: number | null }) {
  return (
    <>
      <td className="fr-num">{formatStatistic(f)}</td>
      <td className="fr-num">{formatP(p)}</td>
      <td className="fr-findings-mark">{significanceMark(p)}</td>
    </>
  );
}

/** The F, p and mark column headings that go with `TestCells`. */
export function TestHeadings() {
  return (
    <>
      <th scope="col" className="fr-num">F</th>
      <th scope="col" className="fr-num">p</th>
      <th scope="col"><span className="bp6-text-muted">mark</span></th>
    </>
  );
}
