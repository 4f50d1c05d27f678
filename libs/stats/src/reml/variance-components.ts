import { StatsInputError } from '../errors';
import type { CovarianceDerivative, CovarianceStructure, GroupCovarianceBlock } from './covariance-structure';
import type { CovarianceParameter } from './reml-problem';

/** A random intercept: one level code per observation (−1 where the term does not apply). */
export interface RandomInterceptTerm {
  /** e.g. 'block', 'block:A', 'site:treatment'. */
  readonly name: string;
  readonly codes: Int32Array;
}

interface LocalCodes {
  readonly codes: Int32Array;
  readonly levels: number;
}

function localCodes(global: Int32Array, rows: Int32Array): LocalCodes {
  const map = new Map<number, number>();
  const codes = new Int32Array(rows.length);
  rows.forEach((row, i) => {
    const code = global[row]!;
    if (code < 0) {
      codes[i] = -1;
      return;
    }
    let local = map.get(code);
    if (local === undefined) {
      local = map.size;
      map.set(code, local);
    }
    codes[i] = local;
  });
  return { codes, levels: map.size };
}

function checkNested(term: RandomInterceptTerm, groupOf: Int32Array): void {
  const groupOfLevel = new Map<number, number>();
  for (let i = 0; i < groupOf.length; i++) {
    const code = term.codes[i]!;
    if (code < 0) continue;
    const seen = groupOfLevel.get(code);
    if (seen === undefined) groupOfLevel.set(code, groupOf[i]!);
    else if (seen !== groupOf[i]) {
      throw new StatsInputError('random term crosses groups', `a level of the random term ${term.name} holds observations of two independent groups`);
    }
  }
}

/**
 * Variance components: V_g = σ²_e·I + Σ_k σ²_k Z_k Z_k' for each group g, where Z_k is the incidence of the
 * group's observations on the levels of random intercept k (blocks, whole plots, sites, site × treatment).
 * Parameters, in order: one variance per term (may be estimated as exactly 0), then the residual variance
 * σ²_e. V is linear in them, which is the parametrization pbkrtest uses for Kenward–Roger.
 * Every level of a term must lie inside one group (sites random: group by site; else by block).
 * Reference: Searle, Casella & McCulloch (1992), Variance Components, ch. 6; pbkrtest's get_SigmaG (Halekoh &
 * Højsgaard 2014, J. Stat. Softw. 59(9)).
 * @throws StatsInputError when a code list has the wrong length or a term's level spans two groups.
 * @example
 *   varianceComponentsStructure([{ name: 'block:A', codes: wholePlotCodes }], blockCodes).parameters.map((p) => p.name);
 *   // ['block:A', 'residual']
 */
export function varianceComponentsStructure(terms: readonly RandomInterceptTerm[], groupOf: Int32Array, residualName = 'residual'): CovarianceStructure {
  for (const term of terms) {
    if (term.codes.length !== groupOf.length) {
      throw new StatsInputError('unequal lengths', `random term ${term.name} has ${term.codes.length} codes for ${groupOf.length} observations`);
    }
    checkNested(term, groupOf);
  }
  const parameters: CovarianceParameter[] = [
    ...terms.map((term) => Object.freeze({ name: term.name, kind: 'variance' as const, canBeZero: true })),
    Object.freeze({ name: residualName, kind: 'variance' as const, canBeZero: false }),
  ];
  const cache = new Map<number, { local: LocalCodes[]; members: Int32Array[][]; derivatives: CovarianceDerivative[] }>();
  const K = terms.length;
  return Object.freeze({
    parameters: Object.freeze(parameters),
    linear: true,
    start: (olsResidualVariance: number) => new Float64Array(K + 1).fill(olsResidualVariance / (K + 1)),
    block(group: number, rows: Int32Array, theta: Float64Array): GroupCovarianceBlock {
      let entry = cache.get(group);
      if (!entry) {
        const local = terms.map((term) => localCodes(term.codes, rows));
        const derivatives: CovarianceDerivative[] = [
          ...local.map((l) => (l.levels === 0 ? { kind: 'zero' as const } : { kind: 'indicator' as const, codes: l.codes, levels: l.levels, scale: 1 })),
          { kind: 'identity', scale: 1 },
        ];
        const members = local.map((l) => {
          const lists: number[][] = Array.from({ length: l.levels }, () => []);
          l.codes.forEach((level, i) => level >= 0 && lists[level]!.push(i));
          return lists.map((list) => Int32Array.from(list));
        });
        entry = { local, members, derivatives };
        cache.set(group, entry);
      }
      const size = rows.length;
      const covariance = new Float64Array(size * size);
      for (let i = 0; i < size; i++) covariance[i * size + i] = theta[K]!;
      entry.members.forEach((levels, k) => {
        const variance = theta[k]!;
        if (variance === 0) return;
        // Pairs within each level only: Σ (level size)² rather than n_g² per term.
        for (const members of levels) {
          for (const i of members) for (const j of members) covariance[i * size + j]! += variance;
        }
      });
      return { covariance, derivatives: entry.derivatives };
    },
  });
}
