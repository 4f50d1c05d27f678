import { Button, Callout, H2 } from '@blueprintjs/core';
import { SEPARATION_METHODS, type ReportMeasure, type ReportReview, type SeparationMethod, type TrialDetail, type TrialReport } from '@friable/contracts';
import { lazy, Suspense } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { ErrorState, LoadingState } from '../../../components/states';
import { paths } from '../../../config/paths';
import { designLabels, formatArea, formatDate, formatRate } from '../../../lib/format';
import { useReport, type ReportChoices } from '../api/get-report';
import { AnovaTable } from './anova-table';
import { FindingsTable, numeric } from './findings-table';
import { RankTestPanel } from './rank-test-panel';
import { ReportModelTables } from './report-model';
import { SignOffLine } from './review-panel';
import { formatMeasureValue, methodLabels } from './stat-format';
import { inProtocolOrder } from './stat-format';

const ReportMeansPlot = lazy(() => import('./report-means-plot'));
const percent = new Intl.NumberFormat('en-US', { maximumFractionDigits: 0 });

/** The printable report: protocol, sites, per measure the ANOVA, means with letters and a plot, the cautions and what the statistics show. */
/** The Findings page's choices, from the report's address (the same names as the Findings page's own). */
function readReportChoices(params: URLSearchParams): ReportChoices {
  const whole = (key: string) => (/^[1-9]\d{0,9}$/.test(params.get(key) ?? '') ? Number(params.get(key)) : undefined);
  const method = params.get('method');
  const alpha = Number(params.get('alpha'));
  return {
    ...(whole('round') ? { roundId: whole('round') } : {}),
    ...(whole('site') ? { siteId: whole('site') } : {}),
    ...(params.get('sites') === 'fixed' ? { sitesAre: 'fixed' as const } : {}),
    ...(SEPARATION_METHODS.includes(method as SeparationMethod) ? { method: method as SeparationMethod } : {}),
    ...(params.get('alpha') && alpha > 0 && alpha < 1 ? { alpha } : {}),
  };
}

export function ReportPage({ trial }: { trial: TrialDetail }) {
  const [params] = useSearchParams();
  const choices = readReportChoices(params);
  const report = useReport(trial.id, choices);
  if (report.isPending) return <LoadingState what="the report" />;
  if (report.isError) return <ErrorState title="The report could not be made" error={report.error} onRetry={() => report.refetch()} />;
  const r = report.data;
  const p = r.protocol;
  return (
    <article className="fr-report fr-report-page">
      <div className="fr-findings-actions fr-report__screen-only">
        <Link to={`${paths.trialFindings.href(trial.id)}${params.toString() ? `?${params.toString()}` : ''}`}>← Back to the Findings</Link>
        <Button icon="print" text="Print the report" onClick={() => window.print()} />
      </div>
      <H2>
        {p.title} <span className="fr-code">{p.code}</span>
      </H2>
      <p className="fr-muted fr-small">
        Report made on {formatDate(r.generatedAt)} by Friable (analysis engine {r.engineVersion}).
      </p>
      <ReportChoicesLine report={r} />
      {p.question && (
        <p>
          <strong>Question:</strong> {p.question}
        </p>
      )}
      <p>
        <strong>Design:</strong> {designLabels[p.design] ?? p.design}
        {p.startDate ? ` · started ${formatDate(p.startDate)}` : ''}
      </p>
      <h3 className="fr-findings-heading">Treatments</h3>
      <FindingsTable label="Treatments" columns={['Code', 'Name', 'Rate']}>
        {p.treatments.map((t) => (
          <tr key={t.id}>
            <th scope="row" className="fr-code">
              {t.code}
            </th>
            <td>
              {t.name}
              {t.isControl ? ' (control)' : ''}
            </td>
            <td>{formatRate(t.rateValue, t.rateUnit)}</td>
          </tr>
        ))}
      </FindingsTable>
      <h3 className="fr-findings-heading">Sites</h3>
      <FindingsTable label="Sites" columns={['Site', 'Soil', numeric('Blocks'), 'Plot size']}>
        {r.sites.map((s) => (
          <tr key={s.id}>
            <th scope="row">{s.name}</th>
            <td>{s.soilDescription ?? '—'}</td>
            <td className="fr-num">{s.blocks}</td>
            <td>{formatArea(s.areaM2)}</td>
          </tr>
        ))}
      </FindingsTable>
      {r.measures.map((m) => (
        <ReportMeasureSection key={m.measure.id} entry={m} treatmentOrder={p.treatments.map((t) => t.code)} control={p.treatments.find((t) => t.isControl)?.code} />
      ))}
      <ReportReviews reviews={r.reviews} />
      <section className="fr-report__measure">
        <h3 className="fr-findings-heading">Cautions</h3>
        {r.cautions.length ? (
          <ul>
            {r.cautions.map((c) => (
              <li key={c}>{c}</li>
            ))}
          </ul>
        ) : (
          <p>The analyses raised no cautions.</p>
        )}
        <h3 className="fr-findings-heading">What these statistics show, and what they do not</h3>
        <p>{r.explanation}</p>
        {p.safetyNotes && (
          <p>
            <strong>Safety:</strong> {p.safetyNotes}
          </p>
        )}
      </section>
    </article>
  );
}

function ReportMeasureSection({ entry, treatmentOrder, control }: { entry: ReportMeasure; treatmentOrder: string[]; control?: string }) {
  const { measure } = entry;
  const means = inProtocolOrder(entry.means, treatmentOrder);
  const headingId = `fr-report-measure-${measure.id}`;
  return (
    <section className="fr-report__measure" aria-labelledby={`${headingId}-name`}>
      <h3 id={`${headingId}-name`} className="fr-findings-heading">
        {measure.name} ({measure.unit}){entry.round ? ` — ${entry.round.label}, ${entry.scopeLabel}` : ''}
      </h3>
      {entry.model && <ReportModelTables model={entry.model} measureName={measure.name} />}
      {entry.unavailable || !entry.anova || !entry.summary ? (
        <Callout icon="info-sign">{entry.unavailable ?? 'No analysis yet.'}</Callout>
      ) : (
        <>
          <AnovaTable answer={{ anova: entry.anova, summary: entry.summary }} decimals={measure.decimals} unit={measure.unit} headingId={`${headingId}-anova`} />
          <FindingsTable label={`Means of ${measure.name}`} columns={['Treatment', numeric('n'), numeric('Mean ± SE'), { head: entry.method === 'dunnett' ? 'Differs from the control' : 'Letters' }, numeric('% of control')]}>
            {means.map((mean) => (
              <tr key={mean.treatment}>
                <th scope="row" className="fr-code">
                  {mean.treatment}
                </th>
                <td className="fr-num">{mean.n}</td>
                <td className="fr-num">
                  {formatMeasureValue(mean.mean, measure.decimals)} ± {formatMeasureValue(mean.se, measure.decimals)}
                </td>
                <td className="fr-findings-letters">{entry.method === 'dunnett' ? (mean.differsFromControl === null ? '—' : mean.differsFromControl ? 'yes' : 'no') : (mean.letters ?? '')}</td>
                <td className="fr-num">{mean.percentOfControl === null ? '—' : `${percent.format(mean.percentOfControl)} %`}</td>
              </tr>
            ))}
          </FindingsTable>
          <p className="fr-muted fr-small">
            {methodLabels[entry.method]} at α = {entry.alpha}
            {entry.method === 'dunnett' ? `: each treatment against ${control ?? 'the control'}.` : ': means sharing a letter do not differ significantly.'}
          </p>
          {entry.rankTest && <RankTestPanel kind={entry.rankTest.test} answer={entry.rankTest} />}
          <Suspense fallback={<LoadingState what="the plot" />}>
            <ReportMeansPlot means={means} measureName={measure.name} unit={measure.unit} treatmentOrder={treatmentOrder} control={control} />
          </Suspense>
          {entry.warnings.length > 0 && (
            <ul className="fr-findings-checks">
              {entry.warnings.map((w) => (
                <li key={w}>{w}</li>
              ))}
            </ul>
          )}
        </>
      )}
    </section>
  );
}

/** "Round: Day 14 · Scope: Hollow Lane · Means compared by Fisher's protected LSD at α = 0.05", the choices the report was made with. */
function ReportChoicesLine({ report }: { report: TrialReport }) {
  const first = report.measures[0];
  if (!first) return null;
  const rounds = [...new Set(report.measures.flatMap((m) => (m.round ? [m.round.label] : [])))];
  return (
    <p className="fr-report__choices" aria-label="Choices of this report">
      <strong>Round:</strong> {rounds.length === 1 ? rounds[0] : 'each measure’s latest round with data'} · <strong>Scope:</strong> {first.scopeLabel} · <strong>Means compared by</strong>{' '}
      {methodLabels[first.method]} at α = {first.alpha}
    </p>
  );
}

/** Review: each saved analysis with its sign-offs (statements and states) and the comments still open. */
function ReportReviews({ reviews }: { reviews: ReportReview[] }) {
  return (
    <section className="fr-report__measure" aria-labelledby="fr-report-review">
      <h3 id="fr-report-review" className="fr-findings-heading">
        Review and sign-off
      </h3>
      {reviews.length === 0 ? (
        <p>No saved analysis of this trial has been signed off or commented on yet.</p>
      ) : (
        reviews.map((review) => (
          <div key={review.analysisId} className="fr-report__review">
            <h4>
              {review.title} <span className="fr-muted fr-small">({review.measureName}, {review.roundLabel}, {review.scopeLabel})</span>
            </h4>
            <p>
              <strong>{review.review.label}.</strong>
              {review.review.awaiting.length > 0 ? ` Awaiting ${review.review.awaiting.join(', ')}.` : ''}
            </p>
            {review.signOffs.length > 0 && (
              <ul className="fr-sign-offs" aria-label={`Sign-offs of ${review.title}`}>
                {review.signOffs.map((s) => (
                  <SignOffLine key={s.id} signOff={s} />
                ))}
              </ul>
            )}
            {review.openComments.length > 0 ? (
              <>
                <p>Open comments:</p>
                <ul aria-label={`Open comments on ${review.title}`}>
                  {review.openComments.map((c) => (
                    <li key={c.id}>
                      <span className="fr-muted fr-small">
                        {c.authorName ?? 'Someone'}, {formatDate(c.createdAt)}
                        {c.replyCount > 0 ? ` (${c.replyCount} repl${c.replyCount === 1 ? 'y' : 'ies'})` : ''}:
                      </span>{' '}
                      {c.body}
                    </li>
                  ))}
                </ul>
              </>
            ) : (
              <p className="fr-muted">No open comments.</p>
            )}
          </div>
        ))
      )}
    </section>
  );
}
