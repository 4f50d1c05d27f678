import { HTMLSelect } from '@blueprintjs/core';
import { RATE_UNIT_IDS, type RateUnitId } from '@friable/contracts';
import { rateUnitLabels } from '../lib/format';

/** The units a rate may be given in (g/m², lb/1,000 ft², t/ha…), by their labels. */
export function RateUnitSelect({ id, value, onChange }: { id: string; value: RateUnitId; onChange: (unit: RateUnitId) => void }) {
  return (
    <HTMLSelect id={id} value={value} onChange={(e) => onChange(e.target.value as RateUnitId)} fill>
      {RATE_UNIT_IDS.map((unit) => (
        <option key={unit} value={unit}>
          {rateUnitLabels[unit]}
        </option>
      ))}
    </HTMLSelect>
  );
}
