import type { Measure } from '@friable/contracts';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import trial from './fixtures/trial.json';
import { mapColumns } from './map-columns';
import { readCsvFile } from './read-csv-file';
import { INTAKE_PROBLEM_CAP, validateIntake, type SitePlot } from './validate-intake';

const measures = trial.measures as Measure[];
const sitePlots = trial.sitePlots as SitePlot[];
const trialPlotLabels = new Map([
  ...sitePlots.map((plot) => [plot.label, { siteId: 1, siteName: trial.siteName }] as const),
  ...trial.otherSite.labels.map((label) => [label, { siteId: trial.otherSite.siteId, siteName: trial.otherSite.siteName }] as const),
]);

function validate(bytes: Buffer, roundMeasures: Measure[] = measures.slice(0, 3)) {
  const file = readCsvFile(bytes);
  const mapping = mapColumns(file.headers, roundMeasures);
  return validateIntake({ file, mapping, sitePlots, trialPlotLabels, roundMeasures, siteName: trial.siteName });
}
const fixture = (name: string): Buffer => readFileSync(join(__dirname, 'fixtures', name));
const messages = (problems: readonly { message: string }[]) => problems.map((problem) => problem.message);

describe('validateIntake: the template', () => {
  it('accepts the template unchanged, keeping typed text, censoring, missing values and notes', () => {
    const result = validate(fixture('template.csv'));
    expect(result.errors).toEqual([]);
    expect(result.warnings).toEqual([]);
    expect(result.values).toHaveLength(18);
    expect(result.values.filter((value) => value.plotLabel === 'HL-B1-P02')).toEqual([
      { plotId: 102, plotLabel: 'HL-B1-P02', measureId: 1, measureCode: 'DRAIN', valueText: '600', censored: true, missingReason: null, blank: false, notes: 'standing water at the cut-off', row: 3 },
      { plotId: 102, plotLabel: 'HL-B1-P02', measureId: 2, measureCode: 'CRUMB', valueText: '2', censored: false, missingReason: null, blank: false, notes: 'standing water at the cut-off', row: 3 },
      { plotId: 102, plotLabel: 'HL-B1-P02', measureId: 3, measureCode: 'WORMS', valueText: '4', censored: false, missingReason: null, blank: false, notes: 'standing water at the cut-off', row: 3 },
    ]);
    const drainOf = (label: string) => result.values.find((value) => value.plotLabel === label && value.measureCode === 'DRAIN');
    expect(drainOf('HL-B2-P02')).toMatchObject({ valueText: null, blank: false });
    const crumbOfLast = result.values.find((value) => value.plotLabel === 'HL-B2-P03' && value.measureCode === 'CRUMB');
    expect(crumbOfLast).toMatchObject({ valueText: null, blank: true, row: 7 });
  });

  it('accepts BOM, CRLF and the decimal comma with ; and keeps the typed decimals', () => {
    expect(validate(fixture('bom-crlf.csv')).values.map((value) => value.valueText)).toEqual(['412', '12.50']);
    const semicolon = validate(fixture('semicolon-decimal-comma.csv'), measures.slice(3, 5));
    expect(semicolon.errors).toEqual([]);
    expect(semicolon.values.map((value) => [value.measureCode, value.valueText])).toEqual([
      ['BD', '1.32'], ['PEN', '2.25'], ['BD', '1.18'], ['PEN', null], ['BD', null], ['PEN', '1.5'],
    ]);
    expect(semicolon.values[2]!.notes).toBe('compacted; path nearby');
  });

  it('converts a minutes column to the measure’s seconds, censoring included', () => {
    const result = validate(fixture('minutes-header.csv'), measures.slice(0, 1));
    expect(result.values.map((value) => [value.valueText, value.censored])).toEqual([['435', false], ['600', true]]);
    expect(messages(result.errors)).toEqual(['Row 4, drain time (min): 660 s (11 min) is above the 600 s cut-off: write >600 if the plot had not drained.']);
  });

  it('refuses NA without a reason, naming the row, the column and where the reason goes', () => {
    const withoutColumn = validate(Buffer.from('plot label,drain time (s)\nHL-B1-P01,NA\nHL-B1-P02,\n'), measures.slice(0, 1));
    expect(messages(withoutColumn.errors)).toEqual(['Row 2, drain time (s): drain time is NA (missing) without a reason: add a “missing reason” column saying why (for example “bed flooded”).']);
    const emptyReason = validate(Buffer.from('plot label,drain time (s),why missing\nHL-B1-P01,n/a,\nHL-B1-P02,-,tipped over\n'), measures.slice(0, 1));
    expect(messages(emptyReason.errors)).toEqual(['Row 2, drain time (s): drain time is NA (missing) without a reason: write why in the why missing column (for example “bed flooded”).']);
  });

  it('attaches the reason column to missing values only', () => {
    const csv = 'plot label,drain time (s),earthworms (count),reason\nHL-B1-P01,NA,4,ring knocked over\n';
    const result = validate(Buffer.from(csv), measures.slice(0, 3));
    expect(result.values.map((value) => [value.measureCode, value.missingReason])).toEqual([['DRAIN', 'ring knocked over'], ['WORMS', null]]);
  });
});

describe('validateIntake: every class of bad input, all reported by row and column', () => {
  it('lists every problem of the error file, none skipped', () => {
    const result = validate(fixture('every-error.csv'));
    expect(result.errors).toEqual([
      { row: 2, column: 'drain time (s)', message: 'Row 2, drain time (s): "abc" is not a number.' },
      { row: 3, column: 'plot label', message: 'Row 3, plot label: there is no plot HL-B9-P09 in this trial; check the label against the plot plan.' },
      { row: 4, column: 'plot label', message: 'Row 4, plot label: plot QH-B1-P03 belongs to Quarry Hill Garden, not Hollow Lane.' },
      { row: 5, column: 'drain time (s)', message: 'Row 5, drain time (s): -5 s is impossible for drain time, which must be 0 to 86400 s.' },
      { row: 6, column: 'crumb score (score)', message: 'Row 6, crumb score (score): 7 is not on the scale: crumb score is scored on the 1 to 5 scale.' },
      { row: 7, column: 'plot label', message: 'Row 7, plot label: plot HL-B1-P01 is also on row 2; each plot may appear once in a file.' },
      { row: 8, column: 'treatment code', message: 'Row 8, treatment code: plot HL-B2-P03 is treatment GYP in the plot plan, not CTRL.' },
      { row: 9, column: 'block', message: 'Row 9, block: plot HL-B2-P01 is in block 2 in the plot plan, not 1.' },
      { row: 10, column: 'drain time (s)', message: 'Row 10, drain time (s): 650 s is above the 600 s cut-off: write >600 if the plot had not drained.' },
      { row: 10, column: 'earthworms (count)', message: 'Row 10, earthworms (count): 2.5 is not a count: earthworms must be a whole number, 0 or more.' },
      { row: 11, column: 'plot label', message: 'Row 11, plot label: the plot label is empty.' },
    ]);
  });

  it('reports a formula in a value column as an error and keeps one in the notes as text', () => {
    const result = validate(fixture('formula-cell.csv'), measures.slice(0, 1));
    expect(messages(result.errors)).toEqual([
      'Row 2, drain time (s): "=A1*60" looks like a spreadsheet formula; not a number.',
      'Row 4, drain time (s): -12 s is impossible for drain time, which must be 0 to 86400 s.',
    ]);
    expect(result.values.map((value) => value.notes)).toEqual(['=HYPERLINK("http://example.invalid")']);
  });

  it('reports the mapping’s problems: a missing plot label column, units it cannot use', () => {
    expect(validate(fixture('no-plot-column.csv')).errors[0]!.message).toBe(
      'The file has no plot label column: the first column of the template is called "plot label".',
    );
    const units = validate(fixture('bad-units.csv'));
    expect(units.errors.map((problem) => problem.column)).toEqual(['drain time (fortnights)', 'earthworms (kg)']);
    expect(units.values.map((value) => value.measureCode)).toEqual(['CRUMB']);
  });

  it('warns, apart from the errors, about the usual range, round measures without a column and columns it does not read', () => {
    const csv = 'plot label,earthworms (count),soil temperature\nHL-B1-P01,72,14\n';
    const result = validate(Buffer.from(csv), measures.slice(0, 3));
    expect(result.errors).toEqual([]);
    expect(messages(result.warnings)).toEqual([
      'The file has no column for drain time (the template calls it "drain time (s)"), so no drain time values are read from it.',
      'The file has no column for crumb score (the template calls it "crumb score (score)"), so no crumb score values are read from it.',
      'Column "soil temperature" is not a measure of this round and is not read.',
      'Row 2, earthworms (count): 72 is outside the usual range of earthworms (0 to 50): check it, then accept the warning to keep it.',
    ]);
  });

  it('matches plot labels without regard to case and spaces, and accepts block as B2', () => {
    const result = validate(Buffer.from('plot label,block,treatment code,earthworms (count)\n hl-b2-p03 ,B2,gyp,3\n'));
    expect(result.errors).toEqual([]);
    expect(result.values[0]).toMatchObject({ plotId: 106, plotLabel: 'HL-B2-P03' });
    expect(messages(validate(Buffer.from('plot label,earthworms (count)\nqh-b1-p01,3\n')).errors)).toEqual([
      'Row 2, plot label: plot qh-b1-p01 belongs to Quarry Hill Garden, not Hollow Lane.',
    ]);
    expect(messages(validate(Buffer.from('plot label,block,earthworms (count)\nHL-B2-P03,two,3\n')).errors)).toEqual([
      'Row 2, block: "two" is not a block number.',
    ]);
  });

  it('names the first row of a plot that appears three times', () => {
    const csv = 'plot label,earthworms (count)\nHL-B1-P01,1\nHL-B1-P01,2\nHL-B1-P01,3\n';
    expect(messages(validate(Buffer.from(csv)).errors)).toEqual([
      'Row 3, plot label: plot HL-B1-P01 is also on row 2; each plot may appear once in a file.',
      'Row 4, plot label: plot HL-B1-P01 is also on row 2; each plot may appear once in a file.',
    ]);
  });

  it('stops the list at 500 problems with a line saying how many more', () => {
    const rows = Array.from({ length: 700 }, (_, index) => `HL-X-${index},1`).join('\n');
    const result = validate(Buffer.from(`plot label,earthworms (count)\n${rows}\n`));
    expect(result.errors).toHaveLength(INTAKE_PROBLEM_CAP + 1);
    expect(result.errors[0]!.row).toBe(2);
    expect(result.errors[INTAKE_PROBLEM_CAP]).toEqual({ row: null, column: null, message: '…and 200 more like these.' });
  });
});
