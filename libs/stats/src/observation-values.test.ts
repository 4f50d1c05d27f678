import { describe, expect, it } from 'vitest';
import { analyseCensoredTimes } from './censored-times';
import { analyseTrial } from './analyse-trial';
import { boundedValue, leaveOutMissing, MAX_VALUE_MAGNITUDE } from './observation-values';
import { analyseRepeatedMeasures } from './repeated-measures';

// Invented values (no expected numbers are read from a source here): every check compares two analyses of
// the same data, or that an input is refused in words naming where it stood.
const treatments = ['Bark', 'Compost', 'None'];
const table = [
  [10.2, 11.4, 9.8, 10.9],
  [12.1, 12.9, 11.7, 12.4],
  [9.1, 9.9, 8.8, 9.6],
];
const rcbd = table.flatMap((row, t) => row.map((value, b) => ({ treatment: treatments[t]!, block: String(b + 1), value })));

describe('boundedValue', () => {
  it('passes values up to 1e150 and refuses larger ones in words, naming the observation', () => {
    expect(boundedValue(-1e150, 'row 3')).toBe(-1e150);
    expect(MAX_VALUE_MAGNITUDE ** 2 * 1e6).toBeLessThan(Number.MAX_VALUE);
    expect(() => boundedValue(1e308, 'row 3')).toThrow(/value out of range: row 3 is 1e\+308; values must lie between −1e150 and 1e150/);
    expect(() => boundedValue(Number.NaN, 'row 3')).toThrow(/value out of range: row 3 is NaN/);
  });
});

describe('leaveOutMissing', () => {
  it('leaves out nulls, counts them and names a treatment left with no values', () => {
    const missing = leaveOutMissing(
      [
        { treatment: 'a', value: null },
        { treatment: 'b', value: 2 },
        { treatment: 'a', value: null },
      ],
      (o) => o.treatment,
    );
    expect(missing.kept).toEqual([{ treatment: 'b', value: 2 }]);
    expect(missing.originalIndex).toEqual([1]);
    expect(missing.notes).toEqual(['2 missing values (null) were left out of the analysis.', 'Treatment a has no values left and is not in the analysis.']);
  });
});

describe('values at the edges, across the engine', () => {
  it('refuses 1e400 (text), 1e308, Infinity and NaN in words naming the observation, in the trial analysis', () => {
    for (const [value, pattern] of [
      ['1e400', /value out of range: observation 5 is "1e400"/],
      [1e308, /value out of range: observation 5 is 1e\+308/],
      [1e200, /value out of range: observation 5 is 1e\+200/],
      [Infinity, /non-finite value: observation 5 is Infinity/],
      [Number.NaN, /non-finite value: observation 5 is NaN/],
    ] as const) {
      const observations = rcbd.map((o, i) => (i === 5 ? { ...o, value } : o));
      expect(() => analyseTrial({ design: 'rcbd', observations })).toThrow(pattern);
      expect(() => analyseTrial({ design: 'rcbd', observations: observations.map((o, i) => (i === 1 ? { ...o, value: null } : o)) })).toThrow(pattern);
    }
    const factorial = rcbd.map(({ treatment, ...o }, i) => ({ ...o, factors: { Mulch: treatment, Rate: i % 2 ? 'high' : 'low' }, value: i === 2 ? '1e400' : o.value }));
    expect(() => analyseTrial({ design: 'factorial-rcbd', factorNames: ['Mulch', 'Rate'], observations: factorial })).toThrow(/value out of range: observation 2 is "1e400"/);
  });

  it('treats null as a plot not measured: the same analysis as without it, saying how many were left out', () => {
    const withNull = analyseTrial({ design: 'rcbd', observations: rcbd.map((o, i) => (i === 6 ? { ...o, value: null } : o)) });
    const without = analyseTrial({ design: 'rcbd', observations: rcbd.filter((_, i) => i !== 6) });
    expect(withNull.anova).toEqual(without.anova);
    expect(withNull.means).toEqual(without.means);
    expect(withNull.warnings).toEqual(['1 missing value (null) was left out of the analysis.', ...without.warnings]);
  });

  it('names a treatment whose every value is null and analyses the others', () => {
    const result = analyseTrial({ design: 'rcbd', observations: rcbd.map((o) => (o.treatment === 'None' ? { ...o, value: null } : o)) });
    expect(result.means.map((m) => m.treatment)).toEqual(['Bark', 'Compost']);
    expect(result.warnings.slice(0, 2)).toEqual(['4 missing values (null) were left out of the analysis.', 'Treatment None has no values left and is not in the analysis.']);
  });

  it('treats null as missing for censored drain times and rounds over time, and refuses a value beyond 1e150 in words', () => {
    const times = rcbd.map((o, i) => ({ ...o, value: o.value * 30, censored: i % 5 === 0 }));
    const withNull = analyseCensoredTimes({ design: 'rcbd', observations: times.map((o, i) => (i === 3 ? { ...o, value: null } : o)) });
    const without = analyseCensoredTimes({ design: 'rcbd', observations: times.filter((_, i) => i !== 3) });
    expect(withNull.logRank).toEqual(without.logRank);
    expect(withNull.timeRatios).toEqual(without.timeRatios);
    expect(withNull.warnings[0]).toBe('1 missing value (null) was left out of the analysis.');
    expect(() => analyseCensoredTimes({ design: 'rcbd', observations: times.map((o, i) => (i === 3 ? { ...o, value: 1e300 } : o)) })).toThrow(
      /value out of range: row 4 of the observations: the time is 1e\+300/,
    );

    const rounds = rcbd.flatMap((o, i) => [0, 14, 28].map((time, r) => ({ ...o, round: `day ${time}`, time, value: o.value + 0.8 * r + ((i * 7 + r * 3) % 5) * 0.3 })));
    const missingRound = analyseRepeatedMeasures({ design: 'rcbd', covariance: 'cs', observations: rounds.map((o, i) => (i === 7 ? { ...o, value: null } : o)) });
    const droppedRound = analyseRepeatedMeasures({ design: 'rcbd', covariance: 'cs', observations: rounds.filter((_, i) => i !== 7) });
    expect(missingRound.anova).toEqual(droppedRound.anova);
    expect(missingRound.warnings[0]).toBe('1 missing value (null) was left out of the analysis.');
    expect(() => analyseRepeatedMeasures({ design: 'rcbd', covariance: 'cs', observations: rounds.map((o, i) => (i === 7 ? { ...o, value: '1e400' } : o)) })).toThrow(
      /row 8 of the observations: the value/,
    );
  });
});
