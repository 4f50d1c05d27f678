import { StatsInputError } from './errors';
import type { ModelMatrix } from './model-matrix';
import { weightedCrossProduct } from './model-matrix';
import type { CovarianceDerivative, CovarianceStructure } from './reml/covariance-structure';
import type { FixedEffectsDesign, RemlProblem, RemlSums } from './reml/reml-problem';
import { inverseOfPositiveDefinite, multiply } from './reml/symmetric-matrix';
import { factorSymmetric } from './symmetric-factor';

/** The data of a repeated-measures REML problem: plots followed over rounds. */
export interface RepeatedRemlData {
  readonly y: Float64Array;
  /** Fixed effects as a sparse model matrix of full column rank (aliased columns already left out). */
  readonly matrix: ModelMatrix;
  /** Plot of each observation (codes 0 … G − 1); within a plot, observations in time order. */
  readonly plotOf: Int32Array;
  /** Same key ⇔ same V_g for a given θ (the plot's rounds): plots sharing it are evaluated once. */
  readonly patternOf: (rows: Int32Array) => string;
  readonly structure: CovarianceStructure;
}

/** Plots that share a pattern, and how their cross-products are kept. */
interface Pattern {
  readonly size: number;
  readonly representative: Int32Array;
  readonly count: number;
  /** S_ii and, for i < j, U_ij = S_ij + S_ji and Δ_ij = S_ij − S_ji (m × m each), S_ij = Σ_g a_gi a_gj'. */
  readonly tensor: { readonly diagonal: Float64Array[]; readonly sum: Float64Array[]; readonly difference: Float64Array[] } | null;
  /** Few plots: their rows, accumulated directly. */
  readonly groups: readonly Int32Array[];
  /** Every plot of the pattern (responseInformation reads them one by one). */
  readonly allGroups: readonly Int32Array[];
}

/** Plots in a pattern from which the summed cross-product tensor pays (its cost does not grow with plots). */
const TENSOR_THRESHOLD = 24;

function denseDerivative(derivative: CovarianceDerivative, size: number): Float64Array | null {
  switch (derivative.kind) {
    case 'zero':
      return null;
    case 'dense':
      return derivative.matrix;
    case 'identity': {
      const out = new Float64Array(size * size);
      for (let i = 0; i < size; i++) out[i * size + i] = derivative.scale;
      return out;
    }
    case 'indicator': {
      const out = new Float64Array(size * size);
      for (let i = 0; i < size; i++) {
        for (let j = 0; j < size; j++) {
          if (derivative.codes[i]! >= 0 && derivative.codes[i] === derivative.codes[j]) out[i * size + j] = derivative.scale;
        }
      }
      return out;
    }
  }
}

/**
 * REML problem for plots followed over rounds, y ~ N(Xβ, V(θ)) with V block-diagonal by plot, built for the
 * REML core (`fitReml`, Kenward–Roger). It gives the same sums as `denseRemlProblem`, faster for many plots:
 * plots with the same rounds share V_g(θ), so V_g⁻¹ and the pattern matrices V⁻¹D_kV⁻¹ … are formed once per
 * pattern, and each sum A'MA over the pattern's plots (A = [X | y]) is read off a cross-product tensor
 * Σ_g a_gi a_gj' accumulated once from the sparse rows of X. Cost per evaluation: O(rounds² · (p + 1)²) per
 * pattern, whatever the number of plots.
 * Reference: Searle, Casella & McCulloch (1992), Variance Components, §6.3; the REML core's README (sums).
 * @throws StatsInputError when the lengths differ or X'X is singular.
 * @example fitReml(repeatedRemlProblem({ y, matrix, plotOf, patternOf, structure: continuousAr1(days) }));
 */
export function repeatedRemlProblem(data: RepeatedRemlData): RemlProblem {
  const { y, matrix, plotOf, structure } = data;
  const n = y.length;
  const p = matrix.columnCount;
  const m = p + 1;
  if (matrix.rowCount !== n || plotOf.length !== n) throw new StatsInputError('unequal lengths', `${n} values, ${matrix.rowCount} design rows and ${plotOf.length} plot codes`);
  if (n <= p) throw new StatsInputError('too few observations', `${n} values cannot estimate ${p} fixed effects and a covariance`);

  // Ordinary least squares from the sparse normal equations: the start, and the response the sums use.
  const ones = new Float64Array(n).fill(1);
  const { crossProduct, vector } = weightedCrossProduct(matrix, ones, y);
  const normal = factorSymmetric(crossProduct, p, 1e-10);
  if (normal.rank < p) throw new StatsInputError('singular design', 'the fixed effects are not all estimable from these plots (an empty treatment × round cell?)');
  const olsCoefficients = normal.solve(vector);
  const residual = new Float64Array(n);
  let rss = 0;
  for (let i = 0; i < n; i++) {
    let fitted = 0;
    for (let k = matrix.rowStart[i]!; k < matrix.rowStart[i + 1]!; k++) fitted += matrix.values[k]! * olsCoefficients[matrix.columnIndex[k]!]!;
    residual[i] = y[i]! - fitted;
    rss += residual[i]! * residual[i]!;
  }
  const olsResidualVariance = rss / (n - p);

  // Sparse rows of A = [X | r]: the model matrix's entries, then the response in column p.
  const rowColumns = (row: number) => {
    const start = matrix.rowStart[row]!;
    const end = matrix.rowStart[row + 1]!;
    const columns = new Int32Array(end - start + 1);
    const values = new Float64Array(end - start + 1);
    columns.set(matrix.columnIndex.subarray(start, end));
    values.set(matrix.values.subarray(start, end));
    columns[end - start] = p;
    values[end - start] = residual[row]!;
    return { columns, values };
  };
  const groupRows = new Map<number, number[]>();
  plotOf.forEach((g, i) => {
    const list = groupRows.get(g);
    if (list) list.push(i);
    else groupRows.set(g, [i]);
  });
  const byPattern = new Map<string, Int32Array[]>();
  for (const rows of groupRows.values()) {
    const typed = Int32Array.from(rows);
    const key = data.patternOf(typed);
    const list = byPattern.get(key);
    if (list) list.push(typed);
    else byPattern.set(key, [typed]);
  }
  const patterns: Pattern[] = [...byPattern.values()].map((groups) => {
    const size = groups[0]!.length;
    if (groups.length < TENSOR_THRESHOLD) return { size, representative: groups[0]!, count: groups.length, tensor: null, groups, allGroups: groups };
    // S_ii, U_ij = S_ij + S_ji and Δ_ij = S_ij − S_ji accumulated straight from the sparse rows.
    const diagonal = Array.from({ length: size }, () => new Float64Array(m * m));
    const pairCount = (size * (size - 1)) / 2;
    const sum = Array.from({ length: pairCount }, () => new Float64Array(m * m));
    const difference = Array.from({ length: pairCount }, () => new Float64Array(m * m));
    for (const rows of groups) {
      const entries = Array.from(rows, rowColumns);
      let pair = 0;
      for (let i = 0; i < size; i++) {
        const a = entries[i]!;
        const d = diagonal[i]!;
        for (let u = 0; u < a.columns.length; u++) {
          const offset = a.columns[u]! * m;
          const av = a.values[u]!;
          for (let v = 0; v < a.columns.length; v++) d[offset + a.columns[v]!]! += av * a.values[v]!;
        }
        for (let j = i + 1; j < size; j++, pair++) {
          const b = entries[j]!;
          const us = sum[pair]!;
          const ds = difference[pair]!;
          for (let u = 0; u < a.columns.length; u++) {
            const cu = a.columns[u]!;
            const av = a.values[u]!;
            for (let v = 0; v < b.columns.length; v++) {
              const cv = b.columns[v]!;
              const x = av * b.values[v]!;
              us[cu * m + cv]! += x;
              us[cv * m + cu]! += x;
              ds[cu * m + cv]! += x;
              ds[cv * m + cu]! -= x;
            }
          }
        }
      }
    }
    return { size, representative: groups[0]!, count: groups.length, tensor: { diagonal, sum, difference }, groups: [], allGroups: groups };
  });

  /** into += Σ_g A_g' M A_g over a pattern's plots, M (size × size) symmetric or not. */
  const addForm = (pattern: Pattern, mat: Float64Array, symmetric: boolean, into: Float64Array) => {
    const size = pattern.size;
    if (pattern.tensor) {
      const { diagonal, sum, difference } = pattern.tensor;
      for (let i = 0; i < size; i++) {
        const w = mat[i * size + i]!;
        if (w === 0) continue;
        const s = diagonal[i]!;
        for (let k = 0; k < m * m; k++) into[k]! += w * s[k]!;
      }
      let pair = 0;
      for (let i = 0; i < size; i++) {
        for (let j = i + 1; j < size; j++, pair++) {
          const half = 0.5 * (mat[i * size + j]! + mat[j * size + i]!);
          if (half !== 0) {
            const u = sum[pair]!;
            for (let k = 0; k < m * m; k++) into[k]! += half * u[k]!;
          }
          if (symmetric) continue;
          const skew = 0.5 * (mat[i * size + j]! - mat[j * size + i]!);
          if (skew !== 0) {
            const d = difference[pair]!;
            for (let k = 0; k < m * m; k++) into[k]! += skew * d[k]!;
          }
        }
      }
      return;
    }
    for (const rows of pattern.groups) {
      const entries = Array.from(rows, rowColumns);
      for (let i = 0; i < size; i++) {
        const a = entries[i]!;
        for (let j = 0; j < size; j++) {
          const w = mat[i * size + j]!;
          if (w === 0) continue;
          const b = entries[j]!;
          for (let u = 0; u < a.columns.length; u++) {
            const offset = a.columns[u]! * m;
            const av = w * a.values[u]!;
            for (let v = 0; v < b.columns.length; v++) into[offset + b.columns[v]!]! += av * b.values[v]!;
          }
        }
      }
    }
  };

  const K = structure.parameters.length;
  const evaluate = (theta: Float64Array, order: 0 | 1 | 2): RemlSums => {
    let logDetV = 0;
    const quadratic = new Float64Array(m * m);
    const traces = new Float64Array(K);
    const firstForms = Array.from({ length: order >= 1 ? K : 0 }, () => new Float64Array(m * m));
    const traceProducts = new Float64Array(K * K);
    const secondForms: Float64Array[] = Array.from({ length: order >= 2 ? K * K : 0 }, () => new Float64Array(m * m));
    const hessianTraces = new Float64Array(K * K);
    const hessianForms: (Float64Array | null)[] = new Array(K * K).fill(null);
    for (const [patternIndex, pattern] of patterns.entries()) {
      const size = pattern.size;
      // Group ids: patterns here, then plots in solve(), so a structure's per-group cache never mixes them.
      const block = structure.block(patternIndex, pattern.representative, theta);
      const inverted = inverseOfPositiveDefinite(block.covariance, size);
      if (!inverted) return { logDetV: Number.NaN, quadratic: quadratic.fill(Number.NaN) };
      const w = inverted.inverse;
      logDetV += pattern.count * inverted.logDeterminant;
      addForm(pattern, w, true, quadratic);
      if (order === 0) continue;
      const derivatives = block.derivatives.map((d) => denseDerivative(d, size));
      const wd = derivatives.map((d) => (d ? multiply(w, size, size, d, size) : null));
      wd.forEach((product, k) => {
        if (!product) return;
        let trace = 0;
        for (let i = 0; i < size; i++) trace += product[i * size + i]!;
        traces[k]! += pattern.count * trace;
        addForm(pattern, multiply(product, size, size, w, size), true, firstForms[k]!);
      });
      if (order === 1) continue;
      for (let k = 0; k < K; k++) {
        for (let l = k; l < K; l++) {
          const a = wd[k];
          const b = wd[l];
          if (!a || !b) continue;
          const product = multiply(a, size, size, b, size);
          let trace = 0;
          for (let i = 0; i < size; i++) trace += product[i * size + i]!;
          traceProducts[k * K + l]! += pattern.count * trace;
          addForm(pattern, multiply(product, size, size, w, size), k === l, secondForms[k * K + l]!);
        }
      }
      if (structure.linear || !block.secondDerivative) continue;
      for (let k = 0; k < K; k++) {
        for (let l = k; l < K; l++) {
          const second = block.secondDerivative(k, l);
          const dense = second ? denseDerivative(second, size) : null;
          if (!dense) continue;
          const product = multiply(w, size, size, dense, size);
          let trace = 0;
          for (let i = 0; i < size; i++) trace += product[i * size + i]!;
          hessianTraces[k * K + l]! += pattern.count * trace;
          hessianForms[k * K + l] ??= new Float64Array(m * m);
          addForm(pattern, multiply(product, size, size, w, size), true, hessianForms[k * K + l]!);
        }
      }
    }
    if (order === 0) return { logDetV, quadratic };
    if (order === 1) return { logDetV, quadratic, traces, firstForms };
    for (let k = 0; k < K; k++) {
      for (let l = 0; l < k; l++) {
        traceProducts[k * K + l] = traceProducts[l * K + k]!;
        const upper = secondForms[l * K + k]!;
        const lower = secondForms[k * K + l]!;
        for (let i = 0; i < m; i++) for (let j = 0; j < m; j++) lower[j * m + i] = upper[i * m + j]!;
        hessianTraces[k * K + l] = hessianTraces[l * K + k]!;
        hessianForms[k * K + l] = hessianForms[l * K + k] ?? null;
      }
    }
    return {
      logDetV,
      quadratic,
      traces,
      firstForms,
      traceProducts,
      secondForms,
      ...(structure.linear ? {} : { hessianTraces, hessianForms }),
    };
  };

  // Σ_g w_gk'V_g⁻¹w_gl with w_gk = D_k V_g⁻¹ A_g v: plot by plot, on the pattern's V_g⁻¹ and derivatives.
  const responseInformation = (theta: Float64Array, v: Float64Array): Float64Array => {
    const out = new Float64Array(K * K);
    for (const [patternIndex, pattern] of patterns.entries()) {
      const size = pattern.size;
      const block = structure.block(patternIndex, pattern.representative, theta);
      const inverted = inverseOfPositiveDefinite(block.covariance, size);
      if (!inverted) return out.fill(Number.NaN);
      const w = inverted.inverse;
      const derivatives = block.derivatives.map((d) => denseDerivative(d, size));
      const plots = pattern.tensor ? pattern.allGroups : pattern.groups;
      const av = new Float64Array(size);
      const applied = derivatives.map(() => new Float64Array(size));
      const solved = derivatives.map(() => new Float64Array(size));
      for (const rows of plots) {
        for (let i = 0; i < size; i++) {
          const row = rows[i]!;
          let sum = residual[row]! * v[p]!;
          for (let e = matrix.rowStart[row]!; e < matrix.rowStart[row + 1]!; e++) sum += matrix.values[e]! * v[matrix.columnIndex[e]!]!;
          av[i] = sum;
        }
        const u = multiply(w, size, size, av, 1);
        derivatives.forEach((d, k) => {
          const target = applied[k]!;
          target.fill(0);
          if (d) for (let i = 0; i < size; i++) for (let j = 0; j < size; j++) target[i]! += d[i * size + j]! * u[j]!;
          const into = solved[k]!;
          into.fill(0);
          for (let i = 0; i < size; i++) for (let j = 0; j < size; j++) into[i]! += w[i * size + j]! * target[j]!;
        });
        for (let k = 0; k < K; k++) {
          for (let l = k; l < K; l++) {
            let sum = 0;
            for (let i = 0; i < size; i++) sum += applied[k]![i]! * solved[l]![i]!;
            out[k * K + l]! += sum;
          }
        }
      }
    }
    for (let k = 0; k < K; k++) for (let l = 0; l < k; l++) out[k * K + l] = out[l * K + k]!;
    return out;
  };

  const solve = (theta: Float64Array, vectorIn: Float64Array): Float64Array => {
    const out = new Float64Array(n);
    let plot = 0;
    for (const rows of groupRows.values()) {
      const typed = Int32Array.from(rows);
      const block = structure.block(patterns.length + plot++, typed, theta);
      const inverted = inverseOfPositiveDefinite(block.covariance, typed.length);
      if (!inverted) throw new StatsInputError('covariance not positive definite', 'the fitted covariance matrix of a plot is singular');
      const local = Float64Array.from(typed, (row) => vectorIn[row]!);
      const solved = multiply(inverted.inverse, typed.length, typed.length, local, 1);
      typed.forEach((row, i) => (out[row] = solved[i]!));
    }
    return out;
  };

  return Object.freeze({
    observations: n,
    fixedColumns: p,
    parameters: structure.parameters,
    linear: structure.linear,
    olsCoefficients,
    olsResidualVariance,
    start: () => structure.start(olsResidualVariance),
    evaluate,
    responseInformation,
    solve,
  });
}

/**
 * The distinct-row design of a sparse model matrix, for the parts of the REML core that read X itself.
 * @throws never.
 * @example designOfMatrix(matrix).columns; // matrix.columnCount
 */
export function designOfMatrix(matrix: ModelMatrix): FixedEffectsDesign {
  const p = matrix.columnCount;
  const rows = new Float64Array(matrix.rowCount * p);
  for (let i = 0; i < matrix.rowCount; i++) {
    for (let k = matrix.rowStart[i]!; k < matrix.rowStart[i + 1]!; k++) rows[i * p + matrix.columnIndex[k]!] = matrix.values[k]!;
  }
  return Object.freeze({ columns: p, rows, rowOf: Int32Array.from({ length: matrix.rowCount }, (_, i) => i), columnNames: matrix.columnNames });
}
