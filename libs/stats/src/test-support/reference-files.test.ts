import { describe, expect, it } from 'vitest';
import { MissingReferenceDataError, readReferenceCsv, referencePath } from './reference-files';

describe('reference datasets', () => {
  it('are read from the repository', () => {
    expect(referencePath('data/PlantGrowth.csv')).toMatch(/datasets[\\/]reference[\\/]data[\\/]PlantGrowth\.csv$/);
    // R's PlantGrowth: 30 plants, the first control weighing 4.17 (R 4.2.2, datasets::PlantGrowth[1, ]).
    const rows = readReferenceCsv('data/PlantGrowth.csv');
    expect(rows).toHaveLength(30);
    expect(rows[0]).toEqual({ weight: '4.17', group: 'ctrl' });
  });

  it('fail loudly, naming the file, when one is missing', () => {
    expect(() => readReferenceCsv('data/not-in-the-repository.csv')).toThrow(MissingReferenceDataError);
    expect(() => referencePath('nist-anova/Missing.dat')).toThrow(/reference dataset .*nist-anova[\\/]Missing\.dat is missing.*datasets\/reference/);
  });
});
