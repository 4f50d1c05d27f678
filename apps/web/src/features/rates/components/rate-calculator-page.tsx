import { Callout, Card, H2, H3, HTMLSelect, Radio, RadioGroup } from '@blueprintjs/core';
import type { RateBasis } from '@friable/contracts';
import { useMemo, useState } from 'react';
import { Field } from '../../../components/field-errors';
import { NumberText } from '../../../components/number-text';
import { SafetyCautions } from '../../../components/safety-cautions';
import { formatAmount, formatArea, formatNumber, isVolumeRateUnit, parseNumberInput } from '../../../lib/format';
import { RateUnitSelect } from '../../../components/rate-unit-select';
import { useServerDose } from '../api/compute-dose';
import { useDebouncedValue } from '../hooks/use-debounced-value';
import { doseRequestFrom, initialDoseForm, localDose, type AreaUnit, type DiameterUnit, type DoseFormState, type GeometryMode, type LengthUnit } from './dose-form-state';

const lengthUnits = [
  { value: 'm', label: 'm' },
  { value: 'ft', label: 'ft' },
];
const diameterUnits = [
  { value: 'cm', label: 'cm' },
  { value: 'in', label: 'in' },
];
const areaUnits = [
  { value: 'm2', label: 'm²' },
  { value: 'ft2', label: 'ft²' },
];

type Amounts = { grams: number | null; kilograms: number | null; pounds: number | null; litres: number | null; gallons: number | null };

const scaled = (amounts: Amounts, factor: number): Amounts => ({
  grams: amounts.grams === null ? null : amounts.grams * factor,
  kilograms: amounts.kilograms === null ? null : amounts.kilograms * factor,
  pounds: amounts.pounds === null ? null : amounts.pounds * factor,
  litres: amounts.litres === null ? null : amounts.litres * factor,
  gallons: amounts.gallons === null ? null : amounts.gallons * factor,
});

/** "55.2 g (0.122 lb)", "2.84 kg (6.26 lb)", "14.4 L (3.8 gal)". */
function amountLine(amounts: Amounts): string {
  return [
    amounts.grams !== null ? `${amounts.grams < 1000 ? formatAmount(amounts.grams, 'g') : formatAmount(amounts.kilograms, 'kg')} (${formatAmount(amounts.pounds, 'lb')})` : null,
    amounts.litres !== null ? `${formatAmount(amounts.litres, 'L')} (${formatAmount(amounts.gallons, 'gal')})` : null,
  ]
    .filter(Boolean)
    .join(' · ');
}

/** Rate calculator: a rate as printed on a bag or in a protocol becomes the amount to weigh out for each plot. */
export function RateCalculatorPage() {
  const [form, setForm] = useState<DoseFormState>(initialDoseForm);
  const set = <K extends keyof DoseFormState>(key: K) => (value: DoseFormState[K]) => setForm((all) => ({ ...all, [key]: value }));
  const { request, missing } = useMemo(() => doseRequestFrom(form), [form]);
  const settled = useDebouncedValue(request);
  const server = useServerDose(settled);
  const local = useMemo(() => (request ? localDose(request) : null), [request]);
  const serverIsCurrent = server.data !== undefined && !server.isPlaceholderData && JSON.stringify(settled) === JSON.stringify(request);
  const volume = isVolumeRateUnit(form.unit);
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
        <Card elevation={0} className="fr-rates__form">
          <H3>Rate</H3>
          <div className="fr-form-row">
            <Field label="Rate" field="rate" error={error}>
              <NumberText id="fr-field-rate" value={form.rate} onChange={set('rate')} />
            </Field>
            <Field label="Unit" field="unit" error={error}>
              <RateUnitSelect id="fr-field-unit" value={form.unit} onChange={set('unit')} />
            </Field>
          </div>
          <Field label="Material" field="materialKind" error={error} help="Gypsum rates are compared with common garden rates.">
            <HTMLSelect id="fr-field-materialKind" value={form.materialKind} onChange={(e) => set('materialKind')(e.target.value as 'gypsum' | 'other')} fill>
              <option value="gypsum">Gypsum</option>
              <option value="other">Other material</option>
            </HTMLSelect>
          </Field>
          <Field label="Basis" field="basis" error={error}>
            <RadioGroup selectedValue={form.basis} onChange={(e) => set('basis')(e.currentTarget.value as RateBasis)}>
              <Radio value="area" label="Per area: spread over the surface" />
              <Radio value="concentration" label="Concentration: mixed through a container, matching a field rate worked in to a depth" />
            </RadioGroup>
          </Field>
          {form.basis === 'concentration' && (
            <div className="fr-form-row">
              <Field label="Incorporation depth" field="depthCm" error={error} help="How deep the field rate is mixed in.">
                <NumberText id="fr-field-depthCm" value={form.depthCm} onChange={set('depthCm')} unit="cm" />
              </Field>
              <Field label="Soil volume" field="soilVolumeL" error={error} help="Soil in one container.">
                <NumberText id="fr-field-soilVolumeL" value={form.soilVolumeL} onChange={set('soilVolumeL')} unit="L" />
              </Field>
            </div>
          )}
          <H3>Plot or container</H3>
          <Field label="Size given as" field="geometry" error={error}>
            <RadioGroup inline selectedValue={form.geometry} onChange={(e) => set('geometry')(e.currentTarget.value as GeometryMode)}>
              <Radio value="rectangle" label="Length × width" />
              <Radio value="round" label="Round (inside diameter)" />
              <Radio value="area" label="Known area" />
            </RadioGroup>
          </Field>
          {form.geometry === 'rectangle' && (
            <div className="fr-form-row">
              <Field label="Length" field="lengthM" error={error}>
                <NumberText
                  id="fr-field-lengthM"
                  value={form.length}
                  onChange={set('length')}
                  unitChoice={{ label: 'Length unit', value: form.lengthUnit, options: lengthUnits, onChange: (unit) => set('lengthUnit')(unit as LengthUnit) }}
                />
              </Field>
              <Field label="Width" field="widthM" error={error}>
                <NumberText
                  id="fr-field-widthM"
                  value={form.width}
                  onChange={set('width')}
                  unitChoice={{ label: 'Width unit', value: form.lengthUnit, options: lengthUnits, onChange: (unit) => set('lengthUnit')(unit as LengthUnit) }}
                />
              </Field>
            </div>
          )}
          {form.geometry === 'round' && (
            <Field label="Inside diameter" field="diameterCm" error={error} help="Inside the pot, at the soil surface.">
              <NumberText
                id="fr-field-diameterCm"
                value={form.diameter}
                onChange={set('diameter')}
                unitChoice={{ label: 'Diameter unit', value: form.diameterUnit, options: diameterUnits, onChange: (unit) => set('diameterUnit')(unit as DiameterUnit) }}
              />
            </Field>
          )}
          {form.geometry === 'area' && (
            <Field label="Surface area" field="areaM2" error={error}>
              <NumberText
                id="fr-field-areaM2"
                value={form.area}
                onChange={set('area')}
                unitChoice={{ label: 'Area unit', value: form.areaUnit, options: areaUnits, onChange: (unit) => set('areaUnit')(unit as AreaUnit) }}
              />
            </Field>
          )}
          {!volume && (
            <>
              <H3>Product</H3>
              <div className="fr-form-row">
                <Field label="Purity (optional)" field="purity" error={error} help="When the rate is for the active material only.">
                  <NumberText id="fr-field-purity" value={form.purityPercent} onChange={set('purityPercent')} unit="% active" />
                </Field>
                <Field label="Water share (optional)" field="moistureFraction" error={error} help="When the rate is for dry matter.">
                  <NumberText id="fr-field-moistureFraction" value={form.moisturePercent} onChange={set('moisturePercent')} unit="% water" />
                </Field>
              </div>
            </>
          )}
          <H3>How many</H3>
          <div className="fr-form-row">
            <Field label="Plots" field="plots" error={error} help="Plots or containers that get this rate.">
              <NumberText id="fr-field-plots" value={form.plots} onChange={set('plots')} />
            </Field>
          </div>
        </Card>

        <div className="fr-rates__result" aria-live="polite">
          <Card elevation={1} className="fr-result-card">
            <H3>Amount per plot</H3>
            {problem || !answer ? (
              <p className="fr-muted">{problem ?? 'Working it out…'}</p>
            ) : (
              <>
                <p className="fr-result-card__area">
                  For {formatArea(answer.areaM2)} of surface{form.basis === 'concentration' ? ', mixed through the soil' : ''}
                </p>
                <dl className="fr-result">
                  {answer.grams !== null && (
                    <>
                      <div>
                        <dt>grams</dt>
                        <dd>{formatAmount(answer.grams, 'g')}</dd>
                      </div>
                      <div>
                        <dt>kilograms</dt>
                        <dd>{formatAmount(answer.kilograms, 'kg')}</dd>
                      </div>
                      <div>
                        <dt>ounces</dt>
                        <dd>{formatAmount(answer.ounces, 'oz')}</dd>
                      </div>
                      <div>
                        <dt>pounds</dt>
                        <dd>{formatAmount(answer.pounds, 'lb')}</dd>
                      </div>
                    </>
                  )}
                  {answer.litres !== null && (
                    <>
                      <div>
                        <dt>litres</dt>
                        <dd>{formatAmount(answer.litres, 'L')}</dd>
                      </div>
                      <div>
                        <dt>US gallons</dt>
                        <dd>{formatAmount(answer.gallons, 'gal')}</dd>
                      </div>
                    </>
                  )}
                </dl>
                {net && plots !== null && (
                  <table className="fr-totals" aria-label="Amount for all plots">
                    <tbody>
                      <tr>
                        <th scope="row">For all {formatNumber(plots, 0)} plots</th>
                        <td>{amountLine(net)}</td>
                      </tr>
                      <tr className="fr-totals__allowance">
                        <th scope="row">
                          <label htmlFor="fr-field-marginPercent">Allowance for spills and weighing</label>
                          <NumberText id="fr-field-marginPercent" value={form.marginPercent} onChange={set('marginPercent')} unit="%" ariaLabel="Allowance" />
                        </th>
                        <td>+ {amountLine(scaled(net, allowancePercent / 100))}</td>
                      </tr>
                      <tr className="fr-totals__sum">
                        <th scope="row">To weigh out in all</th>
                        <td>
                          <strong>{amountLine(scaled(net, 1 + allowancePercent / 100))}</strong>
                        </td>
                      </tr>
                    </tbody>
                  </table>
                )}
                {answer.warnings.length > 0 && (
                  <Callout intent="warning" icon="warning-sign" compact title="Check this rate" className="fr-gap">
                    <ul>
                      {answer.warnings.map((w) => (
                        <li key={w}>{w}</li>
                      ))}
                    </ul>
                  </Callout>
                )}
                <p className="fr-muted fr-small">{serverIsCurrent ? 'Checked with Friable’s server.' : 'Worked out in your browser; checking with the server…'}</p>
              </>
            )}
          </Card>
          <SafetyCautions />
        </div>
      </div>
    </section>
  );
}
