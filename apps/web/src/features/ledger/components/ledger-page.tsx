import { Button, Callout } from '@blueprintjs/core';
import type { Measure, Observation, Plot, TrialDetail } from '@friable/contracts';
import { useMemo, useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { ConfirmButton } from '../../../components/confirm-button';
import { RoundPicker, SitePicker } from '../../../components/site-round-pickers';
import { EmptyState, ErrorState, LoadingState } from '../../../components/states';
import { formatNumber } from '../../../lib/format';
import { personLocale } from '../../../lib/person-locale';
import { readValueText } from '../../../lib/value-reading';
import { writeNumber } from '../../../lib/number-reading';
import { useObservations } from '../../../lib/api/get-observations';
import { useSitePlots } from '../../../lib/api/get-site-plots';
import { useTrialStatusChange } from '../hooks/use-trial-status-change';
import { useCellSave } from '../hooks/use-cell-save';
import { CellPanel } from './cell-panel';
import { ConflictDialog } from './conflict-dialog';
import { HistoryDrawer } from './history-drawer';
import { valueAccess } from '../../../lib/value-access';
import { cellKey, ledgerModel } from './ledger-cells';
import { LedgerGrid } from './ledger-grid';
import { LedgerLegend } from './ledger-legend';
import { measureHeading } from '../../../lib/measure-heading';
import { PhotoDialog } from './photo-dialog';
import { StatusConflict } from './status-conflict';
import { UnlockButton } from './unlock-dialog';

/** Ledger: per site and round, every plot's values in an editable grid, with history, photos and the trial lock. */
export function LedgerPage({ trial }: { trial: TrialDetail }) {
  const [params, setParams] = useSearchParams();
  const rounds = useMemo(() => [...trial.rounds].sort((a, b) => a.dayOffset - b.dayOffset), [trial.rounds]);
  const mySite = trial.sites.find((s) => trial.mySiteIds.includes(s.id));
  const site = trial.sites.find((s) => s.id === Number(params.get('site'))) ?? mySite ?? trial.sites[0];
  const round = rounds.find((r) => r.id === Number(params.get('round'))) ?? rounds[0];
  const plots = useSitePlots(trial.id, site?.randomizedAt ? site.id : undefined);
  const observations = useObservations(trial.id, site?.randomizedAt ? site.id : undefined, round?.id);
  const access = valueAccess(trial, site?.id);
  const cells = useCellSave(trial.id, site?.id ?? 0, round?.id ?? 0);
  const lock = useTrialStatusChange(trial);
  const [focused, setFocused] = useState<{ plot: Plot; measure: Measure } | null>(null);
  const [historyOf, setHistoryOf] = useState<Observation | null>(null);
  const [photoOf, setPhotoOf] = useState<Plot | null>(null);

  if (!site) return <EmptyState title="No sites yet" description="Once the investigator adds and randomizes a site, its values are kept here." />;
  if (!round) return <EmptyState title="No assessment rounds yet" description="The protocol needs at least one round before values can be kept." />;
  const measures = trial.measures.filter((m) => round.measureIds.includes(m.id));
  const model = ledgerModel(plots.data ?? [], observations.data ?? [], measures);
  const investigator = trial.myRoles.includes('investigator');

  function pick(next: { site?: number; round?: number }) {
    setParams({ site: String(next.site ?? site!.id), round: String(next.round ?? round!.id) }, { replace: true });
    setFocused(null);
  }

  function edit(plot: Plot, measure: Measure, text: string, extra: { missingReason?: string | null; notes?: string | null } = {}) {
    const seen = model.values.get(cellKey(plot.id, measure.id));
    const target = { plotId: plot.id, plotLabel: plot.label, measureId: measure.id, measureName: measureHeading(measure), seen };
    // A decimal comma reaches the server as a point; a number that could be read two ways is asked about, not sent.
    const reading = readValueText(text, personLocale());
    if (reading.kind === 'ambiguous') {
      const sign = reading.censored ? '>' : '';
      const locale = personLocale();
      const thousands = `${sign}${reading.thousands.decimalText}`;
      const decimal = `${sign}${writeNumber(reading.decimal.decimalText, locale)}`;
      cells.refuse(target, text, `“${text.trim()}” could mean ${thousands} or ${decimal}: type the one you mean.`);
      return;
    }
    void cells.saveCell(target, {
      value: reading.kind === 'value' ? reading.text : text,
      missingReason: extra.missingReason ?? seen?.missingReason ?? null,
      notes: extra.notes ?? seen?.notes ?? null,
    });
  }

  const refusedCells = [...cells.refusals.entries()];
  const focusedKey = focused ? cellKey(focused.plot.id, focused.measure.id) : null;

  return (
    <div className="fr-ledger">
      <div className="fr-ledger__bar">
        <SitePicker trial={trial} value={site.id} onChange={(siteId) => pick({ site: siteId })} />
        <RoundPicker rounds={rounds} value={round.id} onChange={(roundId) => pick({ round: roundId ?? undefined })} />
        {investigator && trial.status === 'active' && (
          <ConfirmButton
            text="Lock the trial"
            confirmText="Lock"
            intent="warning"
            loading={lock.mutation.isPending}
            question="Lock the trial for analysis? Nobody can change its protocol or values until you unlock it."
            onConfirm={() => lock.send({ status: 'locked' })}
          />
        )}
        {investigator && trial.status === 'locked' && <UnlockButton trial={trial} />}
      </div>
      {lock.mutation.error && (
        <Callout intent="danger" compact role="alert">
          {lock.mutation.error.message}
        </Callout>
      )}
      <StatusConflict conflict={lock.conflict} onKeepMine={lock.keepMine} onTakeStored={lock.takeStored} />
      {access.reason && (
        <Callout intent={trial.status === 'locked' ? 'warning' : 'none'} icon={trial.status === 'locked' ? 'lock' : 'eye-open'} className="fr-readonly-notice" compact>
          {access.reason}
        </Callout>
      )}

      {!site.randomizedAt ? (
        <Callout icon="random" intent="primary">
          {site.name} is not randomized yet; its plots, and so its values, come once it is.
        </Callout>
      ) : plots.isPending || observations.isPending ? (
        <LoadingState what="the Ledger" />
      ) : plots.isError || observations.isError ? (
        <ErrorState
          title="The Ledger could not be loaded"
          error={plots.error ?? observations.error}
          onRetry={() => {
            void plots.refetch();
            void observations.refetch();
          }}
        />
      ) : (
        <>
          <p className="fr-muted fr-small">
            {site.name} · {round.label} · {formatNumber(observations.data.length, 0)} of {formatNumber(model.rows.length * model.columns.length, 0)} values recorded.
            {access.canEdit && ' Double-click a cell (or press Enter) to type, Enter to save; choose a cell to see its notes and history.'}
          </p>
          <LedgerLegend />
          <LedgerGrid
            rows={model.rows}
            columns={model.columns}
            values={model.values}
            refusals={cells.refusals}
            savingKey={cells.savingKey}
            editable={access.canEdit}
            onEdit={(plot, measure, text) => edit(plot, measure, text)}
            onFocus={(plot, measure) => setFocused(plot && measure ? { plot, measure } : null)}
            onPhoto={setPhotoOf}
          />
          {refusedCells.length > 0 && (
            <Callout intent="danger" icon="error" role="alert" className="fr-gap" title="Not saved">
              <ul>
                {refusedCells.map(([key, refusal]) => {
                  const [plotId, measureId] = key.split(':').map(Number);
                  const plot = model.rows.find((p) => p.id === plotId);
                  const measure = model.columns.find((m) => m.id === measureId);
                  return (
                    <li key={key}>
                      {plot?.label} · {measure ? measureHeading(measure) : ''}: “{refusal.text}” — {refusal.message}
                      {refusal.warning && plot && measure && (
                        <Button
                          size="small"
                          className="fr-ledger-keep"
                          text="Keep this unusual value"
                          onClick={() =>
                            void cells.keepUnusual(
                              { plotId: plot.id, plotLabel: plot.label, measureId: measure.id, measureName: measureHeading(measure), seen: model.values.get(key) },
                              refusal,
                            )
                          }
                        />
                      )}
                    </li>
                  );
                })}
              </ul>
            </Callout>
          )}
          {focused && focusedKey && (
            <CellPanel
              key={`${focusedKey}:${model.values.get(focusedKey)?.version ?? 0}`}
              plot={focused.plot}
              measure={focused.measure}
              observation={model.values.get(focusedKey)}
              refusal={cells.refusals.get(focusedKey)}
              editable={access.canEdit}
              saving={cells.savingKey === focusedKey}
              onSave={({ value, missingReason, notes }) => edit(focused.plot, focused.measure, value, { missingReason, notes })}
              onHistory={setHistoryOf}
            />
          )}
        </>
      )}
      <ConflictDialog conflict={cells.conflict} onKeepMine={cells.keepMine} onTakeCurrent={cells.takeCurrent} />
      <HistoryDrawer
        trialId={trial.id}
        observationId={historyOf?.id ?? null}
        title={historyOf ? `History of ${historyOf.plotLabel} · ${historyOf.measureCode}` : 'History'}
        onClose={() => setHistoryOf(null)}
      />
      <PhotoDialog trialId={trial.id} roundId={round.id} roundLabel={round.label} plot={photoOf} canEdit={access.canEdit} onClose={() => setPhotoOf(null)} />
    </div>
  );
}
