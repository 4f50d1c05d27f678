import { jStat } from 'jstat';
import { requirePositiveInteger, requireText } from './checks';
import { DESIGN_RULES, requireFactorCount, requireTrialDesign, type AppliedUnit, type TrialDesign } from './trial-designs';

/** A factor as the guardrails need it: its name and how many levels it has. */
export interface StratumFactor {
  readonly name: string;
  readonly levels: number;
}

export interface StrataInput {
  readonly design: TrialDesign;
  /** One-factor designs (and factorials described by their combinations): the number of treatments. */
  readonly treatments?: number;
  /** Factorial and split designs: the factors in order (a split plot's whole-plot factor first). */
  readonly factors?: readonly StratumFactor[];
  /** Blocks at the site (replicates for a completely randomized design). */
  readonly blocks: number;
}

/** One error stratum of a design: the error line of the ANOVA that some terms are tested against. */
export interface ErrorStratum {
  /** The unit whose variation this error measures. */
  readonly unit: AppliedUnit;
  /** How the table names it: 'Error', 'Whole-plot error', 'Sub-plot error', 'Sub-sub-plot error'. */
  readonly name: string;
  readonly errorDf: number;
  /** How the degrees of freedom were counted, in words: '(2 blocks − 1) × (2 levels of Amendment − 1)'. */
  readonly arithmetic: string;
  /** Terms tested against it: factor names joined by ':' (as the analysis names them), or 'treatment'. */
  readonly terms: readonly string[];
  /** Numerator df of the first term (the main effect of the stratum). */
  readonly firstTermDf: number;
  /** The F the first term must exceed at p = 0.05; null with no error df. */
  readonly criticalF: number | null;
}

const FUNCTION_NAME = 'errorStrata';
const STRATUM_NAMES: Readonly<Record<AppliedUnit, string>> = { plot: 'Error', 'whole plot': 'Whole-plot error', 'sub plot': 'Sub-plot error', 'sub-sub plot': 'Sub-sub-plot error' };

/** Every interaction of the factors up to all of them, in the order main effects, two-way, three-way…: A, B, C, A:B, A:C, B:C, A:B:C. */
export function factorialTerms(names: readonly string[]): readonly string[] {
  const subsets: number[][] = [];
  const grow = (start: number, chosen: number[]) => {
    for (let index = start; index < names.length; index += 1) {
      const next = [...chosen, index];
      subsets.push(next);
      grow(index + 1, next);
    }
  };
  grow(0, []);
  subsets.sort((a, b) => a.length - b.length || a.reduce((d, v, i) => d || v - b[i]!, 0));
  return subsets.map((subset) => subset.map((index) => names[index]).join(':'));
}

/** The central F quantile at 0.95 (jStat's inverse of the regularized incomplete beta). */
export function criticalFAt05(numeratorDf: number, errorDf: number): number | null {
  return errorDf > 0 && numeratorDf > 0 ? jStat.centralF.inv(0.95, numeratorDf, errorDf) : null;
}

function stratum(unit: AppliedUnit, errorDf: number, arithmetic: string, terms: readonly string[], firstTermDf: number): ErrorStratum {
  return Object.freeze({ unit, name: STRATUM_NAMES[unit], errorDf, arithmetic, terms: Object.freeze([...terms]), firstTermDf, criticalF: criticalFAt05(firstTermDf, errorDf) });
}

function checkFactors(design: TrialDesign, factors: readonly StratumFactor[] | undefined): readonly StratumFactor[] {
  requireFactorCount(FUNCTION_NAME, design, factors).forEach((factor, index) => {
    requireText(FUNCTION_NAME, `factors[${index}].name`, factor?.name);
    requirePositiveInteger(FUNCTION_NAME, `factors[${index}].levels`, factor.levels);
  });
  return factors!;
}

const levelsOf = (factor: StratumFactor) => `${factor.levels} levels of ${factor.name}`;

/** A split plot's strata: the whole plot tests the first factor, each lower stratum its factor and every interaction with the factors above. */
function splitStrata(factors: readonly StratumFactor[], blocks: number): ErrorStratum[] {
  const units: AppliedUnit[] = ['whole plot', 'sub plot', 'sub-sub plot'];
  const names = factors.map((factor) => factor.name);
  return factors.map((factor, index) => {
    const above = factors.slice(0, index);
    const unitsAbove = above.reduce((product, f) => product * f.levels, 1);
    const errorDf = unitsAbove * (blocks - 1) * (factor.levels - 1);
    const arithmetic = [...above.map((f) => `${f.levels} levels of ${f.name}`), `(${blocks} blocks − 1)`, `(${levelsOf(factor)} − 1)`].join(' × ');
    const terms = factorialTerms(names.slice(0, index + 1)).filter((term) => term.split(':').includes(factor.name));
    return stratum(units[index]!, errorDf, arithmetic, terms, factor.levels - 1);
  });
}

/**
 * Error strata — each error line of a design's ANOVA at one site, its degrees of freedom and the
 * terms tested against it.
 *
 * Purpose: the guardrails shown before a trial starts. A completely randomized design has one
 * error with t(r − 1) df, a blocked one (t − 1)(r − 1), t being the treatments or factor
 * combinations. A split plot in r blocks with a whole-plot levels and b sub-plot levels has a
 * whole-plot error (r − 1)(a − 1), which tests the whole-plot factor, and a sub-plot error
 * a(r − 1)(b − 1), which tests the sub-plot factor and the interaction; a split-split plot adds the
 * sub-sub-plot error ab(r − 1)(c − 1) for the third factor and its interactions.
 * Reference: Gomez & Gomez (1984), Statistical Procedures for Agricultural Research, 2nd ed.,
 * Table 3.8 (split plot) and Table 3.13 (split-split plot); Cochran & Cox (1957), §7.
 * Throws: RangeError naming the field for an unknown design, blocks or treatments below 1, or a
 * number of factors the design does not take.
 * Example: `errorStrata({ design: 'split-plot', factors: [{ name: 'Amendment', levels: 2 }, { name: 'Mulch', levels: 3 }], blocks: 2 }).map((s) => [s.name, s.errorDf])`
 * → [['Whole-plot error', 1], ['Sub-plot error', 4]]
 */
export function errorStrata(input: StrataInput): readonly ErrorStratum[] {
  const design = requireTrialDesign(FUNCTION_NAME, input.design);
  const blocks = requirePositiveInteger(FUNCTION_NAME, 'blocks', input.blocks);
  const rule = DESIGN_RULES[design];
  if (rule.split) return Object.freeze(splitStrata(checkFactors(design, input.factors), blocks));
  const factors = rule.maxFactors > 0 && input.factors !== undefined ? checkFactors(design, input.factors) : null;
  const treatments = factors ? factors.reduce((product, f) => product * f.levels, 1) : requirePositiveInteger(FUNCTION_NAME, 'treatments', input.treatments);
  const terms = factors ? factorialTerms(factors.map((f) => f.name)) : ['treatment'];
  const firstTermDf = factors ? factors[0]!.levels - 1 : treatments - 1;
  const count = factors ? `${treatments} combinations` : `${treatments} treatments`;
  if (!rule.blocked) return Object.freeze([stratum('plot', treatments * (blocks - 1), `${count} × (${blocks} replicates − 1)`, terms, firstTermDf)]);
  return Object.freeze([stratum('plot', (treatments - 1) * (blocks - 1), `(${count} − 1) × (${blocks} blocks − 1)`, terms, firstTermDf)]);
}
