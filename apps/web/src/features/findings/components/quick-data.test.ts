import { describe, expect, it } from 'vitest';
import { guessColumnRoles, guessDesign, missingColumns, quickObservations, readQuickTable, typedDecimals } from './quick-data';

// Montgomery's hardness-testing tips (RCBD, 4 tips × 4 coupons), datasets/reference/STATISTICS.md B.1.
const hardness = `tip,coupon,hardness
1,1,9.3
1,2,9.4
2,1,9.4
2,2,9.3`;

describe('quick analysis data', () => {
  it('reads a pasted table and guesses the roles and design from the headings', () => {
    const table = readQuickTable(hardness);
    expect(table.problem).toBeNull();
    expect(table.headers).toEqual(['tip', 'coupon', 'hardness']);
    const roles = guessColumnRoles(table);
    expect(roles).toEqual(['treatment', 'block', 'value']);
    expect(guessDesign(roles)).toBe('rcbd');
    const observations = quickObservations(table, roles, 'rcbd');
    expect(observations[0]).toEqual({ treatment: '1', block: '1', value: '9.3' });
    expect(typedDecimals(observations)).toBe(1);
  });

  it('takes two factor columns for a factorial and a site column for a combined analysis', () => {
    const factorial = readQuickTable('density;spacing;block;yield\nd1;s4;B1;2.4\nd2;s4;B1;2.6');
    const roles = guessColumnRoles(factorial);
    expect(roles).toEqual(['factorA', 'factorB', 'block', 'value']);
    expect(guessDesign(roles)).toBe('factorial-rcbd');
    expect(quickObservations(factorial, roles, 'factorial-rcbd')[1]).toEqual({ factors: { density: 'd2', spacing: 's4' }, block: 'B1', value: '2.6' });
    expect(guessDesign(guessColumnRoles(readQuickTable('site,block,treatment,value\nN,1,A,3')))).toBe('multisite-rcbd');
  });

  it('names what is missing or malformed', () => {
    expect(readQuickTable('').problem).toMatch(/nothing to read/);
    expect(readQuickTable('a,b\n1,2,3').problem).toBe('Row 2 has 3 cells but the heading row has 2.');
    expect(missingColumns('rcbd', ['treatment', 'value'])).toEqual(['Block']);
  });
});
