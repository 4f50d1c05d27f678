import { H2 } from '@blueprintjs/core';
import { useMemo } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { SafetyCautions } from '../../../components/safety-cautions';
import { isVolumeRateUnit, parseNumberInput } from '../../../lib/format';
import { useServerDose } from '../api/compute-dose';
import { useDebouncedValue } from '../hooks/use-debounced-value';
import { doseRequestFrom, initialDoseForm, localDose, type DoseFormState } from './dose-form-state';
import { RateForm } from './rate-form';
import { RateResult, scaled } from './rate-result';

/** Rate calculator: a rate as printed on a bag or in a protocol becomes the amount to weigh out for each plot. */
export function RateCalculatorPage() {
  const { control } = useForm<DoseFormState>({ defaultValues: initialDoseForm });
  // Worked out as the person types: in the browser at once, then checked with the server.
  const form = useWatch({ control }) as DoseFormState;
  const { request, missing } = useMemo(() => doseRequestFrom(form), [form]);
  const settled = useDebouncedValue(request);
  const server = useServerDose(settled);
  const local = useMemo(() => (request ? localDose(request) : null), [request]);
  const serverIsCurrent = server.data !== undefined && !server.isPlaceholderData && JSON.stringify(settled) === JSON.stringify(request);
  const plots = parseNumberInput(form.plots);
  const allowance = parseNumberInput(form.marginPercent);
  const allowancePercent = allowance !== null && Number.isFinite(allowance) && allowance >= 0 ? allowance : 0;

  const answer = serverIsCurrent ? server.data : local && !('error' in local) ? local : null;
  // The net amount for every plot, the allowance on its own line (the person sets it), then the sum.
  const net = answer && plots !== null && Number.isFinite(plots) && plots >= 1 ? scaled(answer, plots) : null;
  const error = server.isError && JSON.stringify(settled) === JSON.stringify(request) ? server.error : null;
  const problem = missing ?? (local && 'error' in local ? (error?.message ?? local.error) : null);

  return (
    <section className="fr-rates" aria-labelledby="rates-heading">
      <H2 id="rates-heading">Rate calculator</H2>
      <p className="fr-muted">A per-area rate becomes a quantity for one plot or container, in metric and US units. Nothing here is saved.</p>
      <div className="fr-rates__layout">
        <RateForm control={control} form={form} volume={isVolumeRateUnit(form.unit)} error={error} />
        <div className="fr-rates__result" aria-live="polite">
          <RateResult
            control={control}
            answer={answer ?? null}
            problem={problem}
            net={net}
            plots={plots}
            allowancePercent={allowancePercent}
            concentration={form.basis === 'concentration'}
            serverIsCurrent={serverIsCurrent}
          />
          <SafetyCautions />
        </div>
      </div>
    </section>
  );
}
