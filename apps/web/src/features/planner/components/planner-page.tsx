import { Button, Callout, Card, H2, H3, HTMLTable } from '@blueprintjs/core';
import type { TrialSummary } from '@friable/contracts';
import { lazy, Suspense, useState, type FormEvent } from 'react';
import { Field, FormErrorCallout } from '../../../components/field-errors';
import { NumberText } from '../../../components/number-text';
import { ErrorState, LoadingState } from '../../../components/states';
import { formatNumber } from '../../../lib/format';
import { useBlocksNeeded } from '../api/compute-blocks-needed';
import { usePowerCurve, type PlannerQuestion } from '../api/compute-power';
import { CvPicker, type PickedCv } from './cv-picker';
import { initialPlannerForm, plannerQuestionFrom, type PlannerForm } from './planner-form';
import { blocksForMinimumDf, errorDfPerSite, MIN_ERROR_DF, plannerWarnings } from './planner-warnings';

// Plotly loads with the chart, only once there is a curve to draw.
const PowerCurve = lazy(() => import('./power-curve'));

const percent = (value: number) => `${formatNumber(value * 100, 0)}%`;

/** The block counts the curve shows: from 2 to a little past the recommendation and the 12-df point. */
function curveBlocks(treatments: number, recommended: number | null): number[] {
  const last = recommended === null ? 20 : Math.min(40, Math.max(10, recommended + 4, blocksForMinimumDf(treatments) + 2));
  return Array.from({ length: last - 1 }, (_, index) => index + 2);
}

/** Planner: before a trial, how many blocks per site it takes to detect a given difference with a given power. */
export function PlannerPage({ trials = [] }: { trials?: TrialSummary[] }) {
  const [form, setForm] = useState<PlannerForm>(initialPlannerForm);
  const [cvSource, setCvSource] = useState<PickedCv | null>(null);
  const [asked, setAsked] = useState<{ question: PlannerQuestion; targetPower: number } | null>(null);
  const [formError, setFormError] = useState<unknown>(null);
  const set = (key: keyof PlannerForm) => (text: string) => setForm((all) => ({ ...all, [key]: text }));

  const needed = useBlocksNeeded(asked?.question ?? null, asked?.targetPower ?? 0);
  const recommended = needed.data?.blocks ?? null;
  const settled = asked !== null && !needed.isPending;
  const blocks = settled ? curveBlocks(asked.question.treatments, recommended) : [];
  const curve = usePowerCurve(settled ? asked.question : null, blocks);
  const curveDone = curve.length > 0 && curve.every((q) => q.isSuccess);
  const curveError = curve.find((q) => q.isError)?.error;
  const points = curveDone ? curve.map((q) => ({ blocks: q.data!.blocks, power: q.data!.power })) : [];
  const error = formError ?? needed.error;

  function submit(event: FormEvent) {
    event.preventDefault();
    const read = plannerQuestionFrom(form);
    if ('error' in read) {
      setFormError(read.error);
      return;
    }
    setFormError(null);
    setAsked(read);
  }

  const question = asked?.question;
  const warnings = question && recommended !== null ? plannerWarnings(question.treatments, recommended) : [];

  return (
    <section className="fr-planner" aria-labelledby="planner-heading">
      <H2 id="planner-heading">Planner</H2>
      <p className="fr-muted">Before a trial: how many blocks each site needs for a real difference between two treatments to show up as a significant F test. Nothing here is saved.</p>
      <div className="fr-planner__layout">
        <Card elevation={0} className="fr-planner__form">
          <form onSubmit={submit} noValidate>
            <div className="fr-form-row">
              <Field label="Treatments" field="treatments" error={error} help="Including the untreated control.">
                <NumberText id="fr-field-treatments" value={form.treatments} onChange={set('treatments')} />
              </Field>
              <Field label="Sites" field="sites" error={error} help="Gardens running the same layout.">
                <NumberText id="fr-field-sites" value={form.sites} onChange={set('sites')} />
              </Field>
            </div>
            <div className="fr-form-row">
              <Field
                label="CV"
                field="cv"
                error={error}
                help={cvSource ? `From ${cvSource.from}.` : 'Coefficient of variation from an earlier trial of the same measure.'}
              >
                <NumberText
                  id="fr-field-cv"
                  value={form.cv}
                  onChange={(text) => {
                    setCvSource(null);
                    set('cv')(text);
                  }}
                  unit="%"
                />
              </Field>
              <Field label="Difference" field="difference" error={error} help="The smallest difference between two treatments worth detecting, as % of the mean.">
                <NumberText id="fr-field-difference" value={form.difference} onChange={set('difference')} unit="%" />
              </Field>
            </div>
            {trials.length > 0 && (
              <CvPicker
                trials={trials}
                onPick={(picked) => {
                  setCvSource(picked);
                  set('cv')(String(picked.cv));
                }}
              />
            )}
            {cvSource?.caution && (
              <Callout intent="warning" compact className="fr-gap">
                {cvSource.caution}
              </Callout>
            )}
            <div className="fr-form-row">
              <Field label="Significance level" field="alpha" error={error} help="α of the F test; 0.05 is usual.">
                <NumberText id="fr-field-alpha" value={form.alpha} onChange={set('alpha')} />
              </Field>
              <Field label="Target power" field="targetPower" error={error} help="The chance of detecting the difference; 0.8 means 80%.">
                <NumberText id="fr-field-targetPower" value={form.targetPower} onChange={set('targetPower')} />
              </Field>
            </div>
            <FormErrorCallout error={error} shownFields={['treatments', 'sites', 'cv', 'difference', 'alpha', 'targetPower']} />
            <Button type="submit" intent="primary" icon="calculator" text="Work out the blocks" loading={needed.isFetching} />
          </form>
        </Card>

        <div className="fr-planner__result" aria-live="polite">
          <Card elevation={1} className="fr-result-card">
            <H3>Blocks per site</H3>
            {!asked ? (
              <p className="fr-muted">Fill in the boxes and press “Work out the blocks”.</p>
            ) : needed.isPending ? (
              <LoadingState what="the recommendation" />
            ) : needed.isError ? (
              <p className="fr-muted">No recommendation for these numbers; see the message beside the form.</p>
            ) : (
              <>
                <p className="fr-planner__answer">
                  <strong>{formatNumber(needed.data.blocks, 0)}</strong> blocks
                </p>
                <p>
                  Power {percent(needed.data.power)} with {formatNumber(needed.data.blocks, 0)} blocks at{' '}
                  {question!.sites === 1 ? 'one site' : `each of ${formatNumber(question!.sites, 0)} sites`}:{' '}
                  {formatNumber(question!.treatments * needed.data.blocks * question!.sites, 0)} plots in all, {formatNumber(errorDfPerSite(question!.treatments, needed.data.blocks), 0)} error
                  degrees of freedom per site.
                </p>
              </>
            )}
          </Card>
          {warnings.map((warning) => (
            <Callout key={warning} intent="warning" icon="warning-sign" className="fr-planner__warning">
              {warning}
            </Callout>
          ))}
        </div>
      </div>

      {settled && (
        <Card elevation={0} className="fr-planner__curve">
          <H3>Power against the number of blocks</H3>
          {curveError ? (
            <ErrorState title="The power curve could not be worked out" error={curveError} onRetry={() => curve.forEach((q) => void q.refetch())} />
          ) : !curveDone ? (
            <LoadingState what="the power at each number of blocks" />
          ) : (
            <div className="fr-planner__curve-body">
              <div className="fr-planner__chart">
                <Suspense fallback={<LoadingState what="the chart" />}>
                  <PowerCurve points={points} targetPower={asked.targetPower} recommended={recommended} />
                </Suspense>
              </div>
              <div className="fr-planner__table">
                <HTMLTable compact striped aria-label="Power at each number of blocks">
                  <thead>
                    <tr>
                      <th className="fr-num">Blocks per site</th>
                      <th className="fr-num">Power</th>
                      <th className="fr-num">Error df per site</th>
                    </tr>
                  </thead>
                  <tbody>
                    {points.map((point) => {
                      const df = errorDfPerSite(asked.question.treatments, point.blocks);
                      return (
                        <tr key={point.blocks} className={point.blocks === recommended ? 'fr-planner__chosen' : undefined}>
                          <td className="fr-num">
                            {point.blocks}
                            {point.blocks === recommended && <span className="fr-muted"> (recommended)</span>}
                          </td>
                          <td className="fr-num">{percent(point.power)}</td>
                          <td className={`fr-num${df < MIN_ERROR_DF ? ' fr-planner__low' : ''}`}>{df}</td>
                        </tr>
                      );
                    })}
                  </tbody>
                </HTMLTable>
              </div>
            </div>
          )}
        </Card>
      )}

      <Card elevation={0} className="fr-planner__note">
        <H3>What these numbers assume</H3>
        <ul>
          <li>
            Two of the treatments differ by the difference you typed and every other treatment sits at the overall mean. That is the hardest pattern to detect for a
            given difference, so a real trial with several treatments apart usually does at least this well.
          </li>
          <li>
            The test is the treatment F test of a randomized complete block analysis. Its power comes from the noncentral F distribution with t − 1 and sites × (t − 1)(b − 1)
            degrees of freedom and noncentrality sites × b × (difference ÷ CV)² ÷ 2.
          </li>
          <li>Plot-to-plot variation is normal, with the same spread (the CV) in every treatment, block and site.</li>
          <li>
            Several sites are pooled as copies of one layout that agree with each other. When sites disagree about the treatments, the combined test has fewer degrees of
            freedom and less power than shown; plan for a lost plot or site too.
          </li>
          <li>The CV is best taken from an earlier trial of the same measure, in similar soil; one trial's CV is itself only an estimate.</li>
        </ul>
      </Card>
    </section>
  );
}
