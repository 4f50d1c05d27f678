import { invalidInput } from './checks';

export interface CombinationLevel {
  readonly code: string;
  readonly name: string;
}

export interface FactorCombination<L extends CombinationLevel> {
  /** The level codes joined without a separator: `W5` for Woodchip (W) × 5 cm (5). */
  readonly code: string;
  /** The level names joined by ` × `: `Woodchip × 5 cm`. */
  readonly name: string;
  /** One level per factor, in the factors' order. */
  readonly levels: readonly L[];
}

/**
 * Factor combinations — every combination of the levels of 2 to 4 crossed factors.
 *
 * Purpose: the treatments of a factorial or split-plot trial are the combinations of its factor
 * levels. The first factor is outermost (its level changes slowest), so the order matches the
 * order in which people write a factorial table and R's `expand.grid` with its arguments reversed.
 * A combination's code joins the level codes (`G1` × `M0` → `G1M0`); the caller checks that the
 * joined codes stay distinct.
 * Reference: Cochran & Cox (1957), Experimental Designs, 2nd ed., ch. 5 (factorial experiments).
 * Throws: RangeError when there are no factors or a factor has no levels.
 * Example: `factorCombinations([[{code:'W',name:'Woodchip'},{code:'S',name:'Straw'}], [{code:'0',name:'None'},{code:'5',name:'5 cm'}]]).map((c) => c.code)`
 * → ['W0', 'W5', 'S0', 'S5']
 */
export function factorCombinations<L extends CombinationLevel>(factors: readonly (readonly L[])[]): readonly FactorCombination<L>[] {
  if (!Array.isArray(factors) || factors.length === 0) throw invalidInput('factorCombinations', 'factors', 'a list of at least 1 factor', factors);
  factors.forEach((levels, index) => {
    if (!Array.isArray(levels) || levels.length === 0) throw invalidInput('factorCombinations', `factors[${index}]`, 'a list of at least 1 level', levels);
  });
  let partial: L[][] = [[]];
  for (const levels of factors) partial = partial.flatMap((prefix) => levels.map((level: L) => [...prefix, level]));
  return Object.freeze(
    partial.map((levels) =>
      Object.freeze({ code: levels.map((l) => l.code).join(''), name: levels.map((l) => l.name).join(' × '), levels: Object.freeze(levels) }),
    ),
  );
}
