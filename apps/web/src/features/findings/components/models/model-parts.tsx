import { Callout } from '@blueprintjs/core';
import type { ControlRatio, LikelihoodRatioTest } from '@friable/contracts';
import type { ReactNode } from 'react';
import { SignificanceLegend } from '../anova-table';
import { FindingsTable } from '../findings-table';
import { formatP, formatStatistic, significanceMark } from '../stat-format';

/** A titled part of a model's answer. */
export function ModelSection({ id, title, children }: { id: string; title: string; children: ReactNode }) {
  return (
    <section className="fr-findings-block" aria-labelledby={id}>
      <h3 id={id} className="fr-findings-heading">
        {title}
      </h3>
      {children}
    </section>
  );
}

/** A compact table in Friable's look, scrolling inside its own box on a phone: the first column names the row, the others are numbers. */
export function ModelTable({ label, head, children }: { label: string; head: ReactNode[]; children: ReactNode }) {
  return (
    <FindingsTable label={label} columns={head.map((cell, index) => (index === 0 && typeof cell === 'string' ? cell : { head: cell, num: index > 0 }))}>
      {children}
    </FindingsTable>
  );
}

/** "GYP" and its name beside it (the name hides on a phone). */
export function TreatmentCell({ code, names }: { code: string; names: Record<string, string> }) {
  return (
    <th scope="row">
      {code}
      {names[code] && names[code] !== code ? <span className="fr-findings-name fr-muted"> {names[code]}</span> : null}
    </th>
  );
}

/** p with its significance mark, as two cells. */
export function PCells({ p }: { p: number | null | undefined }) {
  return (
    <>
      <td className="fr-num">{formatP(p)}</td>
      <td className="fr-findings-mark">{significanceMark(p)}</td>
    </>
  );
}

const termWords: Record<string, string> = { treatment: 'Treatments', block: 'Blocks', site: 'Sites', 'block:site': 'Blocks within sites', round: 'Rounds', 'treatment:round': 'Treatment × round' };
export const modelTermLabel = (term: string) => termWords[term] ?? term;

/** Likelihood-ratio tests of each term, each dropped from the full model. */
export function LikelihoodRatioTable({ tests, label }: { tests: LikelihoodRatioTest[]; label: string }) {
  return (
    <>
      <ModelTable label={label} head={['Term dropped', 'df', 'χ²', 'p', '']}>
        {tests.map((row) => (
          <tr key={row.term}>
            <th scope="row">{modelTermLabel(row.term)}</th>
            <td className="fr-num">{row.df}</td>
            <td className="fr-num">{formatStatistic(row.chiSquare)}</td>
            <PCells p={row.p} />
          </tr>
        ))}
      </ModelTable>
      <SignificanceLegend />
    </>
  );
}

/** Ratios of each treatment to the control with simultaneous 95 % limits and adjusted p-values. */
export function RatioTable({ ratios, names, label, adjustment }: { ratios: ControlRatio[]; names: Record<string, string>; label: string; adjustment: string }) {
  return (
    <div>
      <ModelTable label={label} head={['Treatment', label, '95 % interval', 'p (adjusted)', '']}>
        {ratios.map((row) => (
          <tr key={row.treatment}>
            <TreatmentCell code={row.treatment} names={names} />
            <td className="fr-num">{formatStatistic(row.ratio)}</td>
            <td className="fr-num">
              {formatStatistic(row.lower)} – {formatStatistic(row.upper)}
            </td>
            <PCells p={row.p} />
          </tr>
        ))}
      </ModelTable>
      <p className="fr-muted fr-small">{adjustment}</p>
    </div>
  );
}

/** The engine's own sentences about this answer. */
export function ModelWarnings({ warnings }: { warnings: string[] }) {
  if (warnings.length === 0) return null;
  return (
    <Callout intent="warning" icon="warning-sign" className="fr-findings-warnings" title="Read with care">
      <ul>
        {warnings.map((warning) => (
          <li key={warning}>{warning}</li>
        ))}
      </ul>
    </Callout>
  );
}
