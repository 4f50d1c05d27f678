import { describe, expect, it } from 'vitest';
import { criticalFAt05, errorStrata, factorialTerms } from './design-strata';

const summary = (strata: ReturnType<typeof errorStrata>) => strata.map((s) => [s.name, s.errorDf, s.terms.join(' ')]);

describe('errorStrata (degrees of freedom as R\'s aov with Error() strata gives them)', () => {
  it('split plot, 4 blocks × 3 whole-plot × 4 sub-plot levels: whole-plot error 6, sub-plot error 27', () => {
    // R 4.x: d <- expand.grid(block=factor(1:4), A=factor(1:3), B=factor(1:4)); d$y <- rnorm(48)
    // summary(aov(y ~ A*B + Error(block/A), data=d)) → Error: block:A Residuals 6; Error: Within Residuals 27.
    const strata = errorStrata({ design: 'split-plot', factors: [{ name: 'A', levels: 3 }, { name: 'B', levels: 4 }], blocks: 4 });
    expect(summary(strata)).toEqual([
      ['Whole-plot error', 6, 'A'],
      ['Sub-plot error', 27, 'B A:B'],
    ]);
    expect(strata[0]!.arithmetic).toBe('(4 blocks − 1) × (3 levels of A − 1)');
    expect(strata[1]!.arithmetic).toBe('3 levels of A × (4 blocks − 1) × (4 levels of B − 1)');
  });

  it('split plot in 2 blocks with 2 whole-plot levels: 1 df of whole-plot error', () => {
    // R: expand.grid(block=factor(1:2), A=factor(1:2), B=factor(1:3)); aov(y ~ A*B + Error(block/A))
    // → Error: block:A Residuals 1; Error: Within Residuals 4.
    const strata = errorStrata({ design: 'split-plot', factors: [{ name: 'Amendment', levels: 2 }, { name: 'Mulch', levels: 3 }], blocks: 2 });
    expect(summary(strata)).toEqual([
      ['Whole-plot error', 1, 'Amendment'],
      ['Sub-plot error', 4, 'Mulch Amendment:Mulch'],
    ]);
    // R: qf(0.95, 1, 1) = 161.447638798; qf(0.95, 2, 4) = 6.944271910 (tolerance 1e-6 relative).
    expect(strata[0]!.criticalF).toBeCloseTo(161.447638798, 3);
    expect(strata[1]!.criticalF).toBeCloseTo(6.94427191, 5);
  });

  it('split-split plot, 3 blocks × 2 × 3 × 2 levels: errors 2, 8 and 12', () => {
    // R: expand.grid(block=factor(1:3), A=factor(1:2), B=factor(1:3), C=factor(1:2));
    // summary(aov(y ~ A*B*C + Error(block/A/B))) → block:A 2; block:A:B 8; Within 12, C, A:C, B:C, A:B:C tested there.
    const strata = errorStrata({
      design: 'split-split-plot',
      factors: [{ name: 'A', levels: 2 }, { name: 'B', levels: 3 }, { name: 'C', levels: 2 }],
      blocks: 3,
    });
    expect(summary(strata)).toEqual([
      ['Whole-plot error', 2, 'A'],
      ['Sub-plot error', 8, 'B A:B'],
      ['Sub-sub-plot error', 12, 'C A:C B:C A:B:C'],
    ]);
    expect(strata.map((s) => s.unit)).toEqual(['whole plot', 'sub plot', 'sub-sub plot']);
  });

  it('one error for completely randomized, block and factorial designs: t(r − 1) or (t − 1)(r − 1)', () => {
    // Cochran & Cox (1957) §4 and §5: error df of a CRD t(r−1), of an RCBD (t−1)(r−1).
    expect(summary(errorStrata({ design: 'crd', treatments: 4, blocks: 4 }))).toEqual([['Error', 12, 'treatment']]);
    expect(summary(errorStrata({ design: 'rcbd', treatments: 5, blocks: 4 }))).toEqual([['Error', 12, 'treatment']]);
    const three = [{ name: 'N', levels: 2 }, { name: 'P', levels: 2 }, { name: 'K', levels: 2 }];
    // R: npk without its confounding, expand.grid(block=1:6, N, P, K): aov(y ~ block + N*P*K) residual df (8−1)(6−1) = 35.
    expect(summary(errorStrata({ design: 'factorial-rcbd', factors: three, blocks: 6 }))).toEqual([['Error', 35, 'N P K N:P N:K P:K N:P:K']]);
    expect(summary(errorStrata({ design: 'factorial-crd', factors: three, blocks: 3 }))).toEqual([['Error', 16, 'N P K N:P N:K P:K N:P:K']]);
    expect(errorStrata({ design: 'factorial-rcbd', factors: three, blocks: 6 })[0]!.arithmetic).toBe('(8 combinations − 1) × (6 blocks − 1)');
  });

  it('refuses factors the design does not take, naming the field', () => {
    expect(() => errorStrata({ design: 'split-plot', factors: [{ name: 'A', levels: 2 }], blocks: 4 })).toThrow(/errorStrata: factors must be a list of exactly 2 factors/);
    expect(() => errorStrata({ design: 'split-plot', blocks: 4 })).toThrow(/factors/);
    expect(() => errorStrata({ design: 'rcbd', blocks: 4 })).toThrow(/errorStrata: treatments must be a whole number/);
    expect(() => errorStrata({ design: 'rcbd', treatments: 3, blocks: 0 })).toThrow(/blocks/);
    expect(() => errorStrata({ design: 'split-plot', factors: [{ name: 'A', levels: 2 }, { name: '', levels: 2 }], blocks: 4 })).toThrow(/factors\[1\]\.name/);
  });
});

describe('factorialTerms and criticalFAt05', () => {
  it('lists main effects, then two-way, three-way and four-way interactions in factor order (R\'s term order)', () => {
    // R: attr(terms(y ~ A*B*C*D), "term.labels")
    expect(factorialTerms(['A', 'B', 'C', 'D'])).toEqual([
      'A', 'B', 'C', 'D', 'A:B', 'A:C', 'A:D', 'B:C', 'B:D', 'C:D', 'A:B:C', 'A:B:D', 'A:C:D', 'B:C:D', 'A:B:C:D',
    ]);
  });

  it('gives R\'s qf(0.95, df1, df2) (tolerance 1e-6 relative)', () => {
    // R: qf(0.95, c(1, 2, 3, 1), c(2, 2, 3, 12)) = 18.512820513 19.000000000 9.276628153 4.747225347
    expect(criticalFAt05(1, 2)).toBeCloseTo(18.512820513, 5);
    expect(criticalFAt05(2, 2)).toBeCloseTo(19, 5);
    expect(criticalFAt05(3, 3)).toBeCloseTo(9.276628153, 5);
    expect(criticalFAt05(1, 12)).toBeCloseTo(4.747225347, 5);
    expect(criticalFAt05(1, 0)).toBeNull();
  });
});
