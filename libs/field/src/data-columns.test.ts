import { describe, expect, it } from 'vitest';
import { DATA_COLUMNS, dataColumnOfHeader, normaliseHeader } from './data-columns';

describe('data columns', () => {
  it('matches headers whatever their case, spacing, underscores and hyphens', () => {
    expect(normaliseHeader('  Plot_Label ')).toBe('plot label');
    expect(dataColumnOfHeader('Treatment-Code')?.role).toBe('treatment');
    expect(dataColumnOfHeader('REP')?.role).toBe('block');
    expect(dataColumnOfHeader('why missing')?.role).toBe('missingReason');
    expect(dataColumnOfHeader('drain time (s)')).toBeUndefined();
  });

  it('reads every template header back as its own column, and no spelling belongs to two columns', () => {
    for (const column of DATA_COLUMNS) expect(dataColumnOfHeader(column.header)?.role).toBe(column.role);
    const spellings = DATA_COLUMNS.flatMap((column) => column.spellings);
    expect(new Set(spellings).size).toBe(spellings.length);
  });
});
