import { Button, Callout, ProgressBar, Tag } from '@blueprintjs/core';
import type { AssessmentRound, Measure, Observation, Plot, Site, TrialDetail } from '@friable/contracts';
import { findUnit } from '@friable/field';
import { useQueries, useQueryClient } from '@tanstack/react-query';
import { useEffect, useMemo, useRef } from 'react';
import { useSearchParams } from 'react-router-dom';
import { SafetyCautions } from '../../../components/safety-cautions';
import { RoundPicker, SitePicker } from '../../../components/site-round-pickers';
import { EmptyState, ErrorState, LoadingState } from '../../../components/states';
import { formatNumber } from '../../../lib/format';
import { measureHeading } from '../../../lib/measure-heading';
import { cellText } from '../../../lib/observation-text';
import { useLevelAmounts } from '../../../lib/api/get-level-amounts';
import { observationsQueryOptions, useObservations } from '../../../lib/api/get-observations';
import { plotLevelAmountText } from '../../../lib/level-amount-text';
import { useSitePlots } from '../../../lib/api/get-site-plots';
import { onServiceWorkerControl } from '../../../lib/service-worker';
import { valueAccess } from '../../../lib/value-access';
import { useDrainTimers } from '../hooks/use-drain-timers';
import { useFieldQueue } from '../hooks/use-field-queue';
import { useSender } from '../hooks/use-sender';
import { queueValue, type QueuedValue } from '../queue/field-queue';
import { timerKey, type DrainTimer } from '../timers/drain-timer';
import { drainTimerStore } from '../timers/drain-timer-store';
import { MeasureEntry, type MeasureCommit } from './measure-entry';
import { PlotPhoto } from './plot-photo';
import { QueueProblems, QueueStatus } from './queue-panel';
import { RunningTimers } from './running-timers';
import { previousRoundFor, startIndex, walkOrder } from './walk-order';

const cellKey = (plotId: number, measureId: number) => `${plotId}:${measureId}`;

/** The site to walk: the one in the address, else the person's own, else the first randomized one. */
function chooseSite(trial: TrialDetail, requested: string | null): Site | undefined {
  const byId = (id: number) => trial.sites.find((s) => s.id === id);
  return (requested ? byId(Number(requested)) : undefined) ?? trial.mySiteIds.map(byId).find(Boolean) ?? trial.sites.find((s) => s.randomizedAt) ?? trial.sites[0];
}

/** The round to walk: the one in the address, else the first one due today or later, else the last. */
function chooseRound(rounds: AssessmentRound[], requested: string | null): AssessmentRound | undefined {
  const today = new Date().toISOString().slice(0, 10);
  return rounds.find((r) => r.id === Number(requested)) ?? rounds.find((r) => r.dueDate !== null && r.dueDate >= today) ?? rounds[rounds.length - 1];
}

/**
 * Round walk: one site and round on a phone, plot by plot in field order — big boxes for the
 * round's measures with last round's value beside them, notes, a photo, drain timers that run on
 * while the person walks on, and a queue that keeps every entry on the phone until it is sent.
 */
export function WalkPage({ trial }: { trial: TrialDetail }) {
  const [params, setParams] = useSearchParams();
  const queryClient = useQueryClient();
  // Once the offline helper runs, what the walk shows is loaded again through it, so it is kept for a walk without signal.
  useEffect(() => onServiceWorkerControl(() => void queryClient.invalidateQueries()), [queryClient]);
  const rounds = useMemo(() => [...trial.rounds].sort((a, b) => a.dayOffset - b.dayOffset), [trial.rounds]);
  const site = chooseSite(trial, params.get('site'));
  const round = chooseRound(rounds, params.get('round'));
  if (!site) return <EmptyState title="No sites yet" description="Once the investigator adds and randomizes a site, it can be walked here." />;
  if (!round) return <EmptyState title="No assessment rounds yet" description="The protocol needs a round before values can be recorded." />;
  return <SiteRoundWalk key={`${site.id}:${round.id}`} trial={trial} site={site} round={round} rounds={rounds} params={params} setParams={setParams} />;
}

function SiteRoundWalk({
  trial,
  site,
  round,
  rounds,
  params,
  setParams,
}: {
  trial: TrialDetail;
  site: Site;
  round: AssessmentRound;
  rounds: AssessmentRound[];
  params: URLSearchParams;
  setParams: ReturnType<typeof useSearchParams>[1];
}) {
  const plots = useSitePlots(trial.id, site.randomizedAt ? site.id : undefined);
  // Factorials and split plots: each level's amount per unit it goes on, as the Sheets print it.
  const levelAmounts = useLevelAmounts(trial.id, trial.factors.length > 0);
  const observations = useObservations(trial.id, site.randomizedAt ? site.id : undefined, round.id);
  const measures = useMemo(() => trial.measures.filter((m) => round.measureIds.includes(m.id)).sort((a, b) => a.position - b.position), [trial.measures, round]);
  const previousRounds = useMemo(() => new Map(measures.map((m) => [m.id, previousRoundFor(rounds, round, m.id)])), [measures, rounds, round]);
  const previousIds = [...new Set([...previousRounds.values()].filter(Boolean).map((r) => r!.id))];
  const previous = useQueries({
    queries: previousIds.map((id) => ({ ...observationsQueryOptions(trial.id, site.id, id), enabled: Boolean(site.randomizedAt) })),
  });
  const queue = useFieldQueue(trial.id, round.id);
  const sender = useSender(trial.id, queue.waiting);
  const access = valueAccess(trial, site.id);

  const ordered = useMemo(() => walkOrder(plots.data ?? []), [plots.data]);
  const index = startIndex(ordered, params.get('plot'));
  const plot: Plot | undefined = ordered[index];

  const stored = useMemo(() => new Map((observations.data ?? []).map((o) => [cellKey(o.plotId, o.measureId), o])), [observations.data]);
  const before = useMemo(() => {
    const map = new Map<string, Observation>();
    previous.forEach((query, i) => {
      for (const o of query.data ?? []) map.set(`${previousIds[i]}:${cellKey(o.plotId, o.measureId)}`, o);
    });
    return map;
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [previous.map((q) => q.dataUpdatedAt).join(','), previousIds.join(',')]);
  const queued = useMemo(() => new Map(queue.values.map((v) => [cellKey(v.plotId, v.measureId), v])), [queue.values]);

  function record(target: { plotId: number; plotLabel: string }, measure: Measure, commit: MeasureCommit) {
    const seenObservation = stored.get(cellKey(target.plotId, measure.id));
    void queueValue({
      trialId: trial.id,
      siteId: site.id,
      roundId: round.id,
      plotId: target.plotId,
      plotLabel: target.plotLabel,
      measureId: measure.id,
      measureName: measureHeading(measure),
      ...commit,
      seen: { observationId: seenObservation?.id ?? null, version: seenObservation?.version ?? 0, text: cellText(seenObservation) },
    });
  }

  // A timer that finishes (stopped, or at its cut-off even while the phone slept) records its value once.
  const timers = useDrainTimers(trial.id, round.id, (timer, state) => {
    const measure = trial.measures.find((m) => m.id === timer.measureId);
    if (!measure || timer.siteId !== site.id) return;
    const current = queued.get(cellKey(timer.plotId, measure.id)) ?? undefined;
    const seen = stored.get(cellKey(timer.plotId, measure.id));
    record(timer, measure, { value: state.valueText, notes: current?.notes ?? seen?.notes ?? null, missingReason: null });
  });

  function go(to: number) {
    const next = ordered[Math.max(0, Math.min(ordered.length - 1, to))];
    if (!next) return;
    const query = new URLSearchParams(params);
    query.set('site', String(site.id));
    query.set('round', String(round.id));
    query.set('plot', String(next.id));
    setParams(query, { replace: true });
    window.scrollTo({ top: 0 });
  }

  function pick(next: { site?: number; round?: number }) {
    setParams({ site: String(next.site ?? site.id), round: String(next.round ?? round.id) }, { replace: true });
  }

  function startTimer(target: Plot, measure: Measure) {
    drainTimerStore.start({
      key: timerKey(trial.id, round.id, target.id, measure.id),
      trialId: trial.id,
      siteId: site.id,
      roundId: round.id,
      plotId: target.id,
      plotLabel: target.label,
      measureId: measure.id,
      startedAt: Date.now(),
      cutoff: measure.cutoff ?? 0,
      unitSeconds: findUnit(measure.unit)?.toBase ?? 1,
      decimals: measure.decimals,
    });
  }

  const swipe = useRef<{ x: number; y: number } | null>(null);
  const complete = ordered.filter((p) => measures.every((m) => stored.has(cellKey(p.id, m.id)) || queued.has(cellKey(p.id, m.id)))).length;

  return (
    <div className="fr-walk">
      <div className="fr-walk__pickers">
        <SitePicker trial={trial} value={site.id} onChange={(siteId) => pick({ site: siteId })} />
        <RoundPicker rounds={rounds} value={round.id} onChange={(roundId) => pick({ round: roundId ?? undefined })} />
      </div>
      <QueueStatus waiting={queue.waiting} needYou={queue.values.filter((v) => v.state !== 'waiting').length + queue.photos.filter((p) => p.state === 'refused').length} sender={sender} />
      <QueueProblems values={queue.values} photos={queue.photos} onSettled={() => void sender.send()} />
      <RunningTimers
        timers={timers.timers}
        now={timers.now}
        onStop={(timer: DrainTimer) => drainTimerStore.stop(timer.key, Date.now())}
        onOpen={(timer: DrainTimer) => go(ordered.findIndex((p) => p.id === timer.plotId))}
      />
      {access.reason && (
        <Callout icon="eye-open" compact className="fr-readonly-notice">
          {access.reason}
        </Callout>
      )}
      {!site.randomizedAt ? (
        <Callout icon="random" intent="primary">
          {site.name} is not randomized yet; its plots come once it is.
        </Callout>
      ) : plots.isPending || observations.isPending ? (
        <LoadingState what="the plots" />
      ) : plots.isError || observations.isError ? (
        <ErrorState
          title="The plots could not be loaded"
          error={plots.error ?? observations.error}
          onRetry={() => {
            void plots.refetch();
            void observations.refetch();
          }}
        />
      ) : !plot ? (
        <EmptyState title="No plots" description={`${site.name} has no plots yet.`} />
      ) : (
        <article
          className="fr-walk-plot"
          aria-label={`Plot ${plot.label}`}
          onTouchStart={(event) => {
            swipe.current = { x: event.touches[0].clientX, y: event.touches[0].clientY };
          }}
          onTouchEnd={(event) => {
            const start = swipe.current;
            swipe.current = null;
            if (!start) return;
            const dx = event.changedTouches[0].clientX - start.x;
            const dy = event.changedTouches[0].clientY - start.y;
            // A clear sideways stroke turns the page; scrolling up and down does not.
            if (Math.abs(dx) > 70 && Math.abs(dx) > 2 * Math.abs(dy)) go(index + (dx < 0 ? 1 : -1));
          }}
        >
          <header className="fr-walk-plot__head">
            <div className="fr-walk-plot__progress">
              <strong>
                {formatNumber(index + 1, 0)} of {formatNumber(ordered.length, 0)} plots
              </strong>
              <span className="fr-muted fr-small">
                {formatNumber(complete, 0)} of {formatNumber(ordered.length, 0)} have every value
              </span>
              <ProgressBar value={(index + 1) / ordered.length} stripes={false} intent="success" />
            </div>
            <h3 className="fr-walk-plot__label">{plot.label}</h3>
            <div className="fr-walk-plot__where">
              <Tag large minimal>
                Block {plot.block}
              </Tag>
              <Tag large>{plot.treatmentCode}</Tag>
              {plot.wholePlotLabel && (
                <Tag large minimal>
                  Whole plot {plot.wholePlotLabel}
                </Tag>
              )}
            </div>
            {trial.factors.length > 0 && levelAmounts.data && (
              <p className="fr-walk-plot__amounts">
                <span className="fr-muted">Goes on this plot:</span> {plotLevelAmountText(trial, site, levelAmounts.data, plot)}
              </p>
            )}
          </header>
          <WalkNavigation index={index} count={ordered.length} onGo={go} />
          {measures.map((measure) => {
            const key = cellKey(plot.id, measure.id);
            const previousRound = previousRounds.get(measure.id);
            const entry: QueuedValue | undefined = queued.get(key);
            return (
              <MeasureEntry
                key={`${plot.id}:${measure.id}`}
                measure={measure}
                stored={stored.get(key)}
                queued={entry}
                previous={previousRound ? before.get(`${previousRound.id}:${key}`) : undefined}
                previousLabel={previousRound ? `${previousRound.label}:` : undefined}
                timer={timers.timers.find((t) => t.key === timerKey(trial.id, round.id, plot.id, measure.id))}
                now={timers.now}
                disabled={!access.canEdit}
                onCommit={(commit) => record({ plotId: plot.id, plotLabel: plot.label }, measure, commit)}
                onStartTimer={() => startTimer(plot, measure)}
                onStopTimer={() => drainTimerStore.stop(timerKey(trial.id, round.id, plot.id, measure.id), Date.now())}
              />
            );
          })}
          {access.canEdit && <PlotPhoto trialId={trial.id} siteId={site.id} roundId={round.id} plot={plot} queued={queue.photos.find((p) => p.plotId === plot.id)} />}
          <WalkNavigation index={index} count={ordered.length} onGo={go} />
          {trial.factors.length > 0 && levelAmounts.data && <SafetyCautions />}
        </article>
      )}
    </div>
  );
}

function WalkNavigation({ index, count, onGo }: { index: number; count: number; onGo: (to: number) => void }) {
  return (
    <nav className="fr-walk-nav" aria-label="Plots">
      <Button large className="fr-touch" icon="arrow-left" text="Previous" disabled={index === 0} onClick={() => onGo(index - 1)} />
      <Button large className="fr-touch" intent="primary" rightIcon="arrow-right" text="Next" disabled={index >= count - 1} onClick={() => onGo(index + 1)} />
    </nav>
  );
}
