import type { Measure } from '@friable/contracts';
import { MEASURE_UNITS } from '@friable/field';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import trial from './fixtures/trial.json';
import { mapColumns, templateHeader } from './map-columns';
import { readCsvFile } from './read-csv-file';

const measures = trial.measures as Measure[];
const roundMeasures = measures.slice(0, 3);

describe('mapColumns', () => {
  it('maps the template’s headers unchanged', () => {
    const headers = ['plot label', 'block', 'treatment code', ...roundMeasures.map(templateHeader), 'notes'];
    expect(headers.slice(3, 6)).toEqual(['drain time (s)', 'crumb score (score)', 'earthworms (count)']);
    const mapping = mapColumns(headers, roundMeasures);
    expect(mapping).toMatchObject({ plotLabel: 0, block: 1, treatment: 2, notes: 6, missingReason: null, unmapped: [], problems: [] });
    expect(mapping.measures).toEqual([
      { measureId: 1, measureCode: 'DRAIN', index: 3, header: 'drain time (s)', headerUnitId: null, factor: null, problems: [] },
      { measureId: 2, measureCode: 'CRUMB', index: 4, header: 'crumb score (score)', headerUnitId: null, factor: null, problems: [] },
      { measureId: 3, measureCode: 'WORMS', index: 5, header: 'earthworms (count)', headerUnitId: null, factor: null, problems: [] },
    ]);
  });

  it('reads a column named after a measure and “note” as the notes of that measure alone, by name, code or template header', () => {
    const headers = ['plot label', 'drain time (s)', 'crumb score (score)', 'drain time note', 'CRUMB notes', 'earthworms (count) comments', 'notes'];
    const mapping = mapColumns(headers, roundMeasures);
    expect(mapping.problems).toEqual([]);
    expect(mapping.notes).toBe(6);
    expect(mapping.measureNotes).toEqual([
      { measureId: 1, index: 3, header: 'drain time note' },
      { measureId: 2, index: 4, header: 'CRUMB notes' },
      { measureId: 3, index: 5, header: 'earthworms (count) comments' },
    ]);
    expect(mapping.choices).toMatchObject({ 'drain time note': 'notes:DRAIN', 'CRUMB notes': 'notes:CRUMB' });
    // The same choice given by the person (or remembered) maps a header of their own; two columns for one measure's notes are refused.
    expect(mapColumns(['plot label', 'drain time (s)', 'remarks on drainage'], roundMeasures, { 'remarks on drainage': 'notes:DRAIN' }).measureNotes).toEqual([{ measureId: 1, index: 2, header: 'remarks on drainage' }]);
    expect(mapColumns(['plot label', 'drain time (s)', 'DRAIN note', 'drain time notes'], roundMeasures).problems.map((p) => p.message)).toEqual([
      'Columns "DRAIN note" and "drain time notes" both give the notes of drain time: remove one or map it to nothing.',
    ]);
    expect(mapColumns(['plot label', 'drain time (s)', 'x'], roundMeasures, { x: 'notes:NOPE' }).problems.map((p) => p.message)).toEqual([
      'Column "x" is mapped to the notes of "NOPE", which is not a measure of this round.',
    ]);
  });

  it('reads the unit of every measure unit Friable knows, by id or symbol, without converting', () => {
    for (const unit of MEASURE_UNITS) {
      const measure = { ...measures[0]!, unit: unit.id, name: 'reading' };
      for (const header of [templateHeader(measure), `reading (${unit.symbol})`]) {
        expect(mapColumns(['plot label', header], [measure]).measures[0], header).toMatchObject({ factor: null, problems: [] });
      }
    }
  });

  it('accepts a template written the way the plot plan writes it (papaparse, CRLF, every measure unit)', () => {
    const fields = ['plot label', 'block', 'treatment code', ...measures.map(templateHeader), 'notes'];
    const csv = `${Papa.unparse({ fields, data: [['HL-B1-P01', '1', 'CTRL', '', '', '', '', '', '']] }, { newline: '\r\n' })}\r\n`;
    const file = readCsvFile(Buffer.from(csv));
    const mapping = mapColumns(file.headers, measures);
    expect(file.headers[6]).toBe('penetration resistance (kgf/cm2)');
    expect(mapping.problems).toEqual([]);
    expect(mapping.measures.map((column) => [column.measureCode, column.factor])).toEqual([
      ['DRAIN', null], ['CRUMB', null], ['WORMS', null], ['PEN', null], ['BD', null],
    ]);
  });

  it('accepts codes, other cases and spacing, brackets, and the other spellings of the plot label', () => {
    const mapping = mapColumns(['Plot', 'drainage', 'Crumb_Score', 'worms [count]', 'Reason', 'Comments', 'drain'], roundMeasures);
    expect(mapping.plotLabel).toBe(0);
    expect(mapping.missingReason).toBe(4);
    expect(mapping.notes).toBe(5);
    expect(mapping.measures.map((column) => column.measureCode)).toEqual(['CRUMB', 'WORMS', 'DRAIN']);
    expect(mapping.unmapped).toEqual(['drainage']);
    expect(mapColumns(['label', 'DRAIN'], roundMeasures).measures[0]!.measureCode).toBe('DRAIN');
    expect(mapColumns(['  PLOT   LABEL ', 'DRAIN (s)'], roundMeasures).plotLabel).toBe(0);
  });

  it('maps a measure whose own name holds brackets, as the protocol now allows, by its template header', () => {
    const bracketed = { ...measures[0]!, name: 'drain time (second pour)' };
    const header = templateHeader(bracketed);
    expect(header).toBe('drain time (second pour) (s)');
    const mapping = mapColumns(['plot label', header], [bracketed]);
    expect(mapping.problems).toEqual([]);
    expect(mapping.measures[0]).toMatchObject({ measureCode: 'DRAIN', headerUnitId: null, factor: null, problems: [] });
  });

  it('converts a known unit of the same kind', () => {
    const mapping = mapColumns(['plot label', 'drain time (min)'], roundMeasures);
    expect(mapping.measures[0]).toMatchObject({ headerUnitId: 'min', factor: '60', problems: [] });
    expect(mapping.problems).toEqual([]);
  });

  it('names the column whose unit it does not know or cannot convert', () => {
    const mapping = mapColumns(['plot label', 'drain time (fortnights)', 'earthworms (kg)', 'crumb score'], roundMeasures);
    expect(mapping.problems).toEqual([
      {
        row: null,
        column: 'drain time (fortnights)',
        message: 'Column "drain time (fortnights)": Friable does not know the unit "fortnights". Give drain time in s or another time unit.',
      },
      {
        row: null,
        column: 'earthworms (kg)',
        message: 'Column "earthworms (kg)": kg is a mass unit, but earthworms is a count in count.',
      },
    ]);
    expect(mapping.measures.map((column) => column.problems.length)).toEqual([1, 1, 0]);
  });

  it('requires a plot label column', () => {
    const mapping = mapColumns(['name', 'drain time (s)'], roundMeasures);
    expect(mapping.plotLabel).toBeNull();
    expect(mapping.problems[0]).toEqual({
      row: null,
      column: null,
      message: 'The file has no plot label column: the first column of the template is called "plot label".',
    });
  });

  it('requires at least one measure column, naming the expected headers', () => {
    expect(mapColumns(['plot label', 'notes'], roundMeasures).problems).toEqual([
      {
        row: null,
        column: null,
        message: 'No column holds a measure of this round. Expected columns such as: drain time (s), crumb score (score), earthworms (count).',
      },
    ]);
  });

  it('refuses two columns for one measure or one role', () => {
    const mapping = mapColumns(['plot label', 'drain time (s)', 'DRAIN', 'plot'], roundMeasures);
    expect(mapping.problems.map((problem) => problem.message)).toEqual([
      'Columns "drain time (s)" and "DRAIN" both give drain time: remove one or map it to nothing.',
      'Columns "plot label" and "plot" both give the plot label: remove one or map it to nothing.',
    ]);
    expect(mapping.measures).toHaveLength(1);
  });

  it('lets overrides map a column to a role or measure code, or ignore it', () => {
    const mapping = mapColumns(['id', 'DT (min)', 'drain time (s)', 'worm count'], roundMeasures, {
      id: 'plotLabel',
      'DT (min)': 'drain',
      'drain time (s)': null,
      'worm count': 'WORMS',
    });
    expect(mapping.plotLabel).toBe(0);
    expect(mapping.measures).toMatchObject([
      { measureCode: 'DRAIN', index: 1, headerUnitId: 'min', factor: '60' },
      { measureCode: 'WORMS', index: 3, headerUnitId: null },
    ]);
    expect(mapping.unmapped).toEqual(['drain time (s)']);
    expect(mapColumns(['plot label', 'x'], roundMeasures, { x: 'NOPE' }).problems.map((problem) => problem.message)).toContain(
      'Column "x" is mapped to "NOPE", which is not a measure of this round.',
    );
  });

  it('treats a whole header that is the measure’s name as having no unit', () => {
    const water = { ...measures[4]!, id: 9, code: 'W2', name: 'water (second pour)', unit: 'mL' };
    expect(mapColumns(['plot label', 'water (second pour)'], [water]).measures[0]).toMatchObject({ measureId: 9, headerUnitId: null, problems: [] });
    expect(mapColumns(['plot label', 'water (second pour) (L)'], [water]).measures[0]).toMatchObject({ headerUnitId: 'L', factor: '1000' });
  });

  it('ignores columns without a header', () => {
    expect(mapColumns(['plot label', '', 'drain time (s)'], roundMeasures)).toMatchObject({ unmapped: [], problems: [] });
  });
});
