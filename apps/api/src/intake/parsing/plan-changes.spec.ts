import { describe, expect, it } from 'vitest';
import { describeStoredValue, planChanges, type ExistingValue, type IncomingValue } from './plan-changes';

const incoming = (plotId: number, valueText: string | null, extra: Partial<IncomingValue> = {}): IncomingValue => ({
  plotId,
  plotLabel: `HL-B1-P0${plotId}`,
  measureId: 1,
  measureCode: 'DRAIN',
  valueText,
  censored: false,
  missingReason: null,
  ...extra,
});
const stored = (plotId: number, valueText: string | null, extra: Partial<ExistingValue> = {}): ExistingValue => ({
  plotId,
  measureId: 1,
  valueText,
  censored: false,
  missingReason: null,
  ...extra,
});

describe('planChanges', () => {
  it('counts new, changed and unchanged values and shows before and after', () => {
    const plan = planChanges([incoming(1, '412'), incoming(2, '380'), incoming(3, '600', { censored: true })], [stored(2, '380'), stored(3, '598')]);
    expect(plan).toMatchObject({ created: 1, updated: 1, unchanged: 1 });
    expect(plan.changes.map(({ plotLabel, kind, before, after }) => [plotLabel, kind, before, after])).toEqual([
      ['HL-B1-P01', 'new', null, '412'],
      ['HL-B1-P02', 'unchanged', '380', '380'],
      ['HL-B1-P03', 'changed', '598', '>600'],
    ]);
  });

  it('compares the typed text exactly: 12.50 over 12.5 is a change', () => {
    expect(planChanges([incoming(1, '12.50')], [stored(1, '12.5')]).changes[0]).toMatchObject({ kind: 'changed', before: '12.5', after: '12.50' });
  });

  it('counts censoring, the missing reason and (when stored) the notes', () => {
    expect(planChanges([incoming(1, '600')], [stored(1, '600', { censored: true })]).updated).toBe(1);
    expect(planChanges([incoming(1, null, { missingReason: 'flooded' })], [stored(1, null)]).changes[0]).toMatchObject({
      kind: 'changed',
      before: 'NA',
      after: 'NA (flooded)',
    });
    expect(planChanges([incoming(1, '5', { notes: 'wet' })], [stored(1, '5')]).unchanged).toBe(1);
    expect(planChanges([incoming(1, '5', { notes: 'wet' })], [stored(1, '5', { notes: null })]).updated).toBe(1);
  });

  it('replaces a stored value with a blank cell unless asked to keep it', () => {
    const blank = incoming(1, null, { blank: true });
    expect(planChanges([blank], [stored(1, '412')]).changes[0]).toMatchObject({ kind: 'changed', before: '412', after: 'NA' });
    expect(planChanges([blank], [stored(1, '412')], { keepExistingWhereBlank: true }).changes[0]).toMatchObject({
      kind: 'unchanged',
      before: '412',
      after: '412',
    });
  });

  it('leaves stored values the file does not mention out of the plan', () => {
    expect(planChanges([incoming(1, '1')], [stored(2, '2')]).changes.map((change) => change.plotId)).toEqual([1]);
  });

  it('throws RangeError for a plot and measure given twice', () => {
    expect(() => planChanges([incoming(1, '1'), incoming(1, '2')], [])).toThrow(
      new RangeError('planChanges: incoming must hold each plot and measure once (got plot 1, measure 1 twice)'),
    );
  });
});

describe('describeStoredValue', () => {
  it('writes values as a person would type them', () => {
    expect(describeStoredValue({ valueText: '600', censored: true, missingReason: null })).toBe('>600');
    expect(describeStoredValue({ valueText: null, censored: false, missingReason: null })).toBe('NA');
  });
});
