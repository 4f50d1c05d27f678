import { describe, expect, it } from 'vitest';
import { looksLikeFormula, neutraliseFormula } from './neutralise-formula';

describe('neutraliseFormula', () => {
  it('puts an apostrophe before text a spreadsheet would run (OWASP, CSV Injection)', () => {
    expect(neutraliseFormula('=HYPERLINK("http://example.invalid")')).toBe('\'=HYPERLINK("http://example.invalid")');
    expect(neutraliseFormula('+1')).toBe("'+1");
    expect(neutraliseFormula('-x')).toBe("'-x");
    expect(neutraliseFormula('@mention')).toBe("'@mention");
    expect(neutraliseFormula('\t=1')).toBe("'\t=1");
  });

  it('leaves other text alone', () => {
    expect(neutraliseFormula('dry crust, 2 = 3')).toBe('dry crust, 2 = 3');
    expect(neutraliseFormula('')).toBe('');
  });
});

describe('looksLikeFormula', () => {
  it('tells formula-looking cells apart', () => {
    expect(looksLikeFormula(' =A1')).toBe(true);
    expect(looksLikeFormula('A1')).toBe(false);
  });
});
