import { HTMLSelect } from '@blueprintjs/core';
import { RATE_UNIT_IDS, type RateUnitId } from '@friable/contracts';
import { rateUnitLabels } from '../lib/format';

/** The rate units in words; with `noneText`, an empty first choice for "no rate" (a level or treatment with nothing applied). */
export function RateUnitSelect<T extends RateUnitId | ''>({ id, value, onChange, noneText }: { id: string; value: T; onChange: (unit: T) => void; noneText?: string }) {
  return (
    <HTMLSelect id={id} value={value} onChange={(e) => onChange(e.target.value as T)} fill>
      {noneText !== undefined && <option value="">{noneText}</option>}
      {RATE_UNIT_IDS.map((unit) => (
        <option key={unit} value={unit}>
          {rateUnitLabels[unit]}
        </option>
      ))}
    </HTMLSelect>
  );
}
