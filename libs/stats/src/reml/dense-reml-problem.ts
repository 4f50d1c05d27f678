import { StatsInputError } from '../errors';
import { applyDerivative, traceWithDerivative, type CovarianceDerivative, type CovarianceStructure, type GroupCovarianceBlock } from './covariance-structure';
import { checkedOrdinaryLeastSquares, groupSizes, type FixedEffectsDesign, type RemlProblem, type RemlSums } from './reml-problem';
import { inverseOfPositiveDefinite, multiply, transposeMultiply } from './symmetric-matrix';

/** The data of a REML problem with a block-diagonal V. */
export interface DenseRemlData {
  readonly y: Float64Array;
  readonly design: FixedEffectsDesign;
  /** Independent group of each observation, codes 0 … G − 1 (sites, blocks, plots followed over time). */
  readonly groupOf: Int32Array;
  readonly structure: CovarianceStructure;
}

interface Accumulator {
  logDetV: number;
  quadratic: Float64Array;
  traces: Float64Array;
  firstForms: Float64Array[];
  traceProducts: Float64Array;
  secondForms: Float64Array[];
  hessianTraces: Float64Array;
  hessianForms: (Float64Array | null)[];
}

/** A derivative as Z·Z'·scale with Z an incidence (identity: one level per observation). */
interface Factored {
  readonly codes: Int32Array;
  readonly levels: number;
  readonly scale: number;
}

function factored(derivative: CovarianceDerivative, size: number): Factored | null {
  if (derivative.kind === 'indicator') return derivative;
  if (derivative.kind === 'identity') return { codes: Int32Array.from({ length: size }, (_, i) => i), levels: size, scale: derivative.scale };
  if (derivative.kind === 'zero') return { codes: new Int32Array(size).fill(-1), levels: 0, scale: 0 };
  return null;
}

/** Z'M: the level sums of M's rows (levels × columns). */
function levelSums(f: Factored, matrix: Float64Array, size: number, columns: number): Float64Array {
  const out = new Float64Array(f.levels * columns);
  for (let i = 0; i < size; i++) {
    const level = f.codes[i]!;
    if (level < 0) continue;
    for (let j = 0; j < columns; j++) out[level * columns + j]! += matrix[i * columns + j]!;
  }
  return out;
}

/** Z_k' W Z_l (levels_k × levels_l). */
function crossLevelSums(fk: Factored, fl: Factored, inverse: Float64Array, size: number): Float64Array {
  const out = new Float64Array(fk.levels * fl.levels);
  for (let i = 0; i < size; i++) {
    const a = fk.codes[i]!;
    if (a < 0) continue;
    for (let j = 0; j < size; j++) {
      const b = fl.codes[j]!;
      if (b >= 0) out[a * fl.levels + b]! += inverse[i * size + j]!;
    }
  }
  return out;
}

/**
 * The largest dense REML problem the engine attempts: Σ_g (n_g³ + n_g²·m) ≤ 3·10⁸ operations per evaluation
 * (a fit takes ten to twenty), e.g. 20 sites of 100 plots or 3,000 blocks of 24. Beyond it the answer says
 * so in words rather than running for minutes.
 */
export const REML_WORK_LIMIT = 3e8;

function checkRemlSize(groups: readonly Int32Array[], m: number): void {
  let work = 0;
  for (const rows of groups) work += rows.length ** 3 + rows.length ** 2 * m;
  if (work <= REML_WORK_LIMIT) return;
  const plots = groups.reduce((sum, rows) => sum + rows.length, 0);
  const largest = groups.reduce((most, rows) => Math.max(most, rows.length), 0);
  throw new StatsInputError(
    'layout too large for a mixed model',
    `the mixed-model (REML) fit of these ${plots.toLocaleString('en')} plots in ${groups.length.toLocaleString('en')} independent groups of up to ${largest} plots needs about ${(work / 1e6).toFixed(0)} million operations a step; the engine's limit is ${REML_WORK_LIMIT / 1e6} million (for example 20 sites of 100 plots, or 3,000 blocks of 24). Complete layouts (every plot present) get the classical analysis at any size`,
  );
}

function groupRows(groupOf: Int32Array): Int32Array[] {
  const counts = groupSizes(groupOf);
  const rows = Array.from(counts, (count) => new Int32Array(count));
  const filled = new Int32Array(counts.length);
  groupOf.forEach((g, i) => (rows[g]![filled[g]!++] = i));
  return rows.filter((r) => r.length > 0);
}

function addSecondOrder(block: GroupCovarianceBlock, inverse: Float64Array, t: Float64Array, size: number, m: number, parameterCount: number, into: Accumulator): void {
  const factors = block.derivatives.map((d) => factored(d, size));
  if (factors.every((f) => f !== null)) {
    // Every derivative is Z Z'·scale: work with level sums (Z_k'T and Z_k'WZ_l), never with n_g × n_g products.
    const sums = factors.map((f) => levelSums(f!, t, size, m));
    for (let k = 0; k < parameterCount; k++) {
      for (let l = k; l < parameterCount; l++) {
        const fk = factors[k]!;
        const fl = factors[l]!;
        if (fk.scale === 0 || fl.scale === 0) continue;
        const cross = crossLevelSums(fk, fl, inverse, size);
        let squares = 0;
        for (const value of cross) squares += value * value;
        into.traceProducts[k * parameterCount + l]! += fk.scale * fl.scale * squares;
        const right = multiply(cross, fk.levels, fl.levels, sums[l]!, m);
        const form = transposeMultiply(sums[k]!, fk.levels, m, right, m);
        const target = into.secondForms[k * parameterCount + l]!;
        for (let i = 0; i < m * m; i++) target[i]! += fk.scale * fl.scale * form[i]!;
      }
    }
    return;
  }
  const applied = block.derivatives.map((d) => applyDerivative(d, t, size, m));
  const solved = applied.map((s) => multiply(inverse, size, size, s, m));
  const products = block.derivatives.map((d) => applyDerivative(d, inverse, size, size));
  for (let k = 0; k < parameterCount; k++) {
    for (let l = k; l < parameterCount; l++) {
      let trace = 0;
      const hk = products[k]!;
      const hl = products[l]!;
      for (let i = 0; i < size; i++) for (let j = 0; j < size; j++) trace += hk[i * size + j]! * hl[j * size + i]!;
      into.traceProducts[k * parameterCount + l]! += trace;
      transposeMultiply(applied[k]!, size, m, solved[l]!, m, into.secondForms[k * parameterCount + l]);
    }
  }
}

function addHessianTerms(block: GroupCovarianceBlock, inverse: Float64Array, t: Float64Array, size: number, m: number, parameterCount: number, into: Accumulator): void {
  if (!block.secondDerivative) return;
  for (let k = 0; k < parameterCount; k++) {
    for (let l = k; l < parameterCount; l++) {
      const second = block.secondDerivative(k, l);
      if (!second || second.kind === 'zero') continue;
      into.hessianTraces[k * parameterCount + l]! += traceWithDerivative(inverse, second, size);
      const index = k * parameterCount + l;
      into.hessianForms[index] ??= new Float64Array(m * m);
      transposeMultiply(t, size, m, applyDerivative(second, t, size, m), m, into.hessianForms[index]!);
    }
  }
}

function transposeInto(source: Float64Array, m: number): Float64Array {
  const out = new Float64Array(m * m);
  for (let i = 0; i < m; i++) for (let j = 0; j < m; j++) out[j * m + i] = source[i * m + j]!;
  return out;
}

function finish(accumulator: Accumulator, order: 0 | 1 | 2, parameterCount: number, m: number, linear: boolean): RemlSums {
  if (order === 0) return { logDetV: accumulator.logDetV, quadratic: accumulator.quadratic };
  if (order === 1) return { logDetV: accumulator.logDetV, quadratic: accumulator.quadratic, traces: accumulator.traces, firstForms: accumulator.firstForms };
  const K = parameterCount;
  for (let k = 0; k < K; k++) {
    for (let l = 0; l < k; l++) {
      accumulator.traceProducts[k * K + l] = accumulator.traceProducts[l * K + k]!;
      accumulator.secondForms[k * K + l] = transposeInto(accumulator.secondForms[l * K + k]!, m);
      if (!linear) {
        accumulator.hessianTraces[k * K + l] = accumulator.hessianTraces[l * K + k]!;
        accumulator.hessianForms[k * K + l] = accumulator.hessianForms[l * K + k] ?? null;
      }
    }
  }
  return {
    logDetV: accumulator.logDetV,
    quadratic: accumulator.quadratic,
    traces: accumulator.traces,
    firstForms: accumulator.firstForms,
    traceProducts: accumulator.traceProducts,
    secondForms: accumulator.secondForms,
    ...(linear ? {} : { hessianTraces: accumulator.hessianTraces, hessianForms: accumulator.hessianForms }),
  };
}

/**
 * REML problem with a block-diagonal covariance: y ~ N(Xβ, V(θ)), V = diag(V_1 … V_G) over independent
 * groups, each V_g and its derivatives supplied by `structure`. Each evaluation inverts every V_g once
 * (Cholesky, ml-matrix) and accumulates the sums of `RemlSums` group by group; derivatives that are random
 * intercepts (Z Z') are handled through level sums, so they cost O(n_g²) per pair of parameters rather than
 * O(n_g³). Suited to groups of up to a few hundred observations (a site, a block, a plot over rounds).
 * Reference: Searle, Casella & McCulloch (1992), Variance Components, §6.3 (REML) and §6.5 (its derivatives);
 * Gilmour, Thompson & Cullis (1995), Biometrics 51:1440 (average information).
 * @throws StatsInputError when lengths differ, a group code is negative, or X'X is singular.
 * @example
 *   const problem = denseRemlProblem({ y, design, groupOf: blockCodes, structure: varianceComponentsStructure(...) });
 *   fitReml(problem).theta; // [block variance, residual variance]
 */
export function denseRemlProblem(data: DenseRemlData): RemlProblem {
  const { y, design, groupOf, structure } = data;
  const ols = checkedOrdinaryLeastSquares(y, design, groupOf);
  const n = y.length;
  const p = design.columns;
  const m = p + 1;
  const response = ols.residuals;
  const groups = groupRows(groupOf);
  checkRemlSize(groups, m);
  const parameterCount = structure.parameters.length;
  const augmented = groups.map((rows) => {
    const values = new Float64Array(rows.length * m);
    rows.forEach((row, i) => {
      const offset = design.rowOf[row]! * p;
      for (let j = 0; j < p; j++) values[i * m + j] = design.rows[offset + j]!;
      values[i * m + p] = response[row]!;
    });
    return values;
  });

  // The last order-1 evaluation's V_g⁻¹, log|V_g| and V_g⁻¹A_g, which responseInformation, the order-2 sums at the
  // optimum and solve() at the same θ reuse instead of inverting every V_g again.
  type Kept = { theta: Float64Array; inverses: Float64Array[]; logDeterminants: number[]; solved: Float64Array[]; blocks: GroupCovarianceBlock[] };
  let kept: Kept | null = null;
  const keptAt = (theta: Float64Array): Kept | null => (kept !== null && kept.theta.length === theta.length && kept.theta.every((value, k) => value === theta[k]) ? kept : null);
  const evaluate = (theta: Float64Array, order: 0 | 1 | 2): RemlSums => {
    const K = parameterCount;
    const reuse = order === 0 ? null : keptAt(theta);
    const keep: Kept | null = order === 1 && !reuse ? { theta: Float64Array.from(theta), inverses: [], logDeterminants: [], solved: [], blocks: [] } : null;
    if (!reuse) kept = null;
    const accumulator: Accumulator = {
      logDetV: 0,
      quadratic: new Float64Array(m * m),
      traces: new Float64Array(K),
      firstForms: Array.from({ length: order >= 1 ? K : 0 }, () => new Float64Array(m * m)),
      traceProducts: new Float64Array(K * K),
      secondForms: Array.from({ length: order >= 2 ? K * K : 0 }, () => new Float64Array(m * m)),
      hessianTraces: new Float64Array(K * K),
      hessianForms: new Array<Float64Array | null>(K * K).fill(null),
    };
    for (let g = 0; g < groups.length; g++) {
      const rows = groups[g]!;
      const size = rows.length;
      const block = reuse ? reuse.blocks[g]! : structure.block(g, rows, theta);
      const inverted = reuse ? { inverse: reuse.inverses[g]!, logDeterminant: reuse.logDeterminants[g]! } : inverseOfPositiveDefinite(block.covariance, size);
      if (!inverted) return { logDetV: Number.NaN, quadratic: accumulator.quadratic.fill(Number.NaN) };
      accumulator.logDetV += inverted.logDeterminant;
      const a = augmented[g]!;
      const t = reuse ? reuse.solved[g]! : multiply(inverted.inverse, size, size, a, m);
      transposeMultiply(a, size, m, t, m, accumulator.quadratic);
      if (order === 0) continue;
      if (keep) {
        keep.inverses.push(inverted.inverse);
        keep.logDeterminants.push(inverted.logDeterminant);
        keep.solved.push(t);
        keep.blocks.push(block);
      }
      block.derivatives.forEach((derivative, k) => {
        accumulator.traces[k]! += traceWithDerivative(inverted.inverse, derivative, size);
        if (derivative.kind === 'zero') return;
        if (derivative.kind === 'indicator') {
          // T'ZZ'T·scale = (Z'T)'(Z'T)·scale: levels × m² instead of n_g × m².
          const sums = levelSums(derivative, t, size, m);
          const form = accumulator.firstForms[k]!;
          const scaled = derivative.scale === 1 ? sums : sums.map((value) => value * derivative.scale);
          transposeMultiply(sums, derivative.levels, m, scaled, m, form);
          return;
        }
        transposeMultiply(t, size, m, applyDerivative(derivative, t, size, m), m, accumulator.firstForms[k]);
      });
      if (order === 2) {
        addSecondOrder(block, inverted.inverse, t, size, m, K, accumulator);
        if (!structure.linear) addHessianTerms(block, inverted.inverse, t, size, m, K, accumulator);
      }
    }
    if (keep) kept = keep;
    return finish(accumulator, order, K, m, structure.linear);
  };

  const responseInformation = (theta: Float64Array, v: Float64Array): Float64Array => {
    const K = parameterCount;
    const same = keptAt(theta) !== null;
    const out = new Float64Array(K * K);
    for (let g = 0; g < groups.length; g++) {
      const rows = groups[g]!;
      const size = rows.length;
      let inverse: Float64Array;
      let t: Float64Array;
      let block: GroupCovarianceBlock;
      if (same) {
        inverse = kept!.inverses[g]!;
        t = kept!.solved[g]!;
        block = kept!.blocks[g]!;
      } else {
        block = structure.block(g, rows, theta);
        const inverted = inverseOfPositiveDefinite(block.covariance, size);
        if (!inverted) return out.fill(Number.NaN);
        inverse = inverted.inverse;
        t = multiply(inverse, size, size, augmented[g]!, m);
      }
      const u = multiply(t, size, m, v, 1);
      const applied = block.derivatives.map((d) => applyDerivative(d, u, size, 1));
      const solved = applied.map((w) => multiply(inverse, size, size, w, 1));
      for (let k = 0; k < K; k++) {
        for (let l = k; l < K; l++) {
          let sum = 0;
          const wk = applied[k]!;
          const sl = solved[l]!;
          for (let i = 0; i < size; i++) sum += wk[i]! * sl[i]!;
          out[k * K + l]! += sum;
        }
      }
    }
    for (let k = 0; k < K; k++) for (let l = 0; l < k; l++) out[k * K + l] = out[l * K + k]!;
    return out;
  };

  const solve = (theta: Float64Array, vector: Float64Array): Float64Array => {
    const out = new Float64Array(n);
    const reuse = keptAt(theta);
    groups.forEach((rows, g) => {
      const inverted = reuse ? { inverse: reuse.inverses[g]! } : inverseOfPositiveDefinite(structure.block(g, rows, theta).covariance, rows.length);
      if (!inverted) throw new StatsInputError('covariance not positive definite', 'the fitted covariance matrix of a group is singular');
      const local = Float64Array.from(rows, (row) => vector[row]!);
      const solved = multiply(inverted.inverse, rows.length, rows.length, local, 1);
      rows.forEach((row, i) => (out[row] = solved[i]!));
    });
    return out;
  };

  return Object.freeze({
    observations: n,
    fixedColumns: p,
    parameters: structure.parameters,
    linear: structure.linear,
    olsCoefficients: ols.coefficients,
    olsResidualVariance: ols.residualVariance,
    start: () => structure.start(ols.residualVariance),
    evaluate,
    responseInformation,
    solve,
  });
}
