import { StatsInputError } from './errors';
import type { LinearEstimate, LinearModelFit, ModelFactor, ModelTerm, SequentialTermRow } from './linear-model';

// As fitLinearModel's 1e-7 on a column's norm, but on its square and with room for the rounding of the normal
// equations (an exactly aliased column of counts keeps about 1e-13 of its squared norm, a real one far more).
const ALIAS_TOLERANCE_SQUARED = 1e-9;
const ESTIMABILITY_TOLERANCE = 1e-8;

/**
 * The largest absorbed fit the engine attempts: at most 1,200 columns besides the absorbed groups (the dense
 * normal equations of the remaining terms, about 35 MB; their factoring takes about a second) and 2·10⁹ operations for their outer products.
 */
export const ABSORBED_LIMITS = Object.freeze({ columns: 1200, work: 2e9 });

interface Grouping {
  /** Group of each observation (codes 0..count−1). */
  readonly codes: Int32Array;
  readonly count: number;
}

interface TermCells {
  /** Cell of each observation (0..count−1, in sorted cell order). */
  readonly codes: Int32Array;
  readonly count: number;
  /** Cell of a grid point (a level code per factor of the model), or undefined when the data have no such cell. */
  cellOf(point: readonly number[]): number | undefined;
}

/**
 * The distinct cells of a term (its factors' level combinations present in the data), numbered in sorted cell order:
 * a cell's mixed-radix number (first factor most significant) orders cells as sorting their codes would.
 */
function termCells(factors: readonly ModelFactor[], term: ModelTerm, n: number): TermCells {
  const radices = term.factors.map((f) => factors[f]!.levels.length);
  const size = radices.reduce((product, radix) => product * radix, 1);
  if (size > 2 ** 26) throw new Error(`term ${term.name} has too many possible cells to absorb (${size})`);
  const keyAt = (i: number) => term.factors.reduce((key, f, k) => key * radices[k]! + factors[f]!.codes[i]!, 0);
  const number = new Int32Array(size).fill(-1);
  const keys = new Int32Array(n);
  for (let i = 0; i < n; i++) {
    keys[i] = keyAt(i);
    number[keys[i]!] = 0;
  }
  let count = 0;
  for (let key = 0; key < size; key++) if (number[key] === 0) number[key] = count++;
  const codes = new Int32Array(n);
  for (let i = 0; i < n; i++) codes[i] = number[keys[i]!]!;
  const cellOf = (point: readonly number[]) => {
    let key = 0;
    for (let k = 0; k < radices.length; k++) {
      const code = point[term.factors[k]!];
      if (code === undefined || code < 0 || code >= radices[k]!) return undefined;
      key = key * radices[k]! + code;
    }
    const cell = number[key]!;
    return cell < 0 ? undefined : cell;
  };
  return { codes, count, cellOf };
}

/** Each group's columns and how many of its rows fall in each (compressed rows: group g owns start[g]..start[g+1]). */
interface GroupColumns {
  readonly start: Int32Array;
  readonly columns: Int32Array;
  readonly counts: Float64Array;
}

function groupColumns(groups: Grouping, rowColumns: Int32Array, m: number, p: number): GroupColumns {
  const n = groups.codes.length;
  const rowStart = new Int32Array(groups.count + 1);
  for (let i = 0; i < n; i++) rowStart[groups.codes[i]! + 1]!++;
  for (let g = 0; g < groups.count; g++) rowStart[g + 1]! += rowStart[g]!;
  const next = rowStart.slice(0, groups.count);
  const rowsInOrder = new Int32Array(n);
  for (let i = 0; i < n; i++) rowsInOrder[next[groups.codes[i]!]!++] = i;
  const scratch = new Float64Array(p);
  const touched: number[] = [];
  const start = new Int32Array(groups.count + 1);
  const columns: number[] = [];
  const counts: number[] = [];
  for (let g = 0; g < groups.count; g++) {
    for (let r = rowStart[g]!; r < rowStart[g + 1]!; r++) {
      const i = rowsInOrder[r]!;
      for (let t = 0; t < m; t++) {
        const column = rowColumns[i * m + t]!;
        if (scratch[column] === 0) touched.push(column);
        scratch[column]!++;
      }
    }
    for (const column of touched) {
      columns.push(column);
      counts.push(scratch[column]!);
      scratch[column] = 0;
    }
    touched.length = 0;
    start[g + 1] = columns.length;
  }
  return { start, columns: Int32Array.from(columns), counts: Float64Array.from(counts) };
}

/** Sums and counts of y per group. */
function groupMoments(y: Float64Array, grouping: Grouping): { means: Float64Array; counts: Float64Array } {
  const sums = new Float64Array(grouping.count);
  const counts = new Float64Array(grouping.count);
  for (let i = 0; i < y.length; i++) {
    sums[grouping.codes[i]!]! += y[i]!;
    counts[grouping.codes[i]!]!++;
  }
  const means = sums.map((sum, g) => sum / counts[g]!);
  return { means, counts };
}

/**
 * Sequential sums of squares of nested grouping terms (each refining the one before): the term's groups'
 * weighted squared deviations from their parent group's mean.
 */
function nestedRows(y: Float64Array, groupings: readonly Grouping[], terms: readonly ModelTerm[]): SequentialTermRow[] {
  const overall: Grouping = { codes: new Int32Array(y.length), count: 1 };
  const chain = [overall, ...groupings];
  return groupings.map((grouping, index) => {
    const parent = chain[index]!;
    const parentOf = new Int32Array(grouping.count).fill(-1);
    for (let i = 0; i < y.length; i++) {
      const known = parentOf[grouping.codes[i]!]!;
      if (known === -1) parentOf[grouping.codes[i]!] = parent.codes[i]!;
      else if (known !== parent.codes[i]) throw new Error(`absorbed terms must be nested: ${terms[index]!.name} is not within the term before it`);
    }
    const own = groupMoments(y, grouping);
    const parents = groupMoments(y, parent);
    let ss = 0;
    for (let g = 0; g < grouping.count; g++) ss += own.counts[g]! * (own.means[g]! - parents.means[parentOf[g]!]!) ** 2;
    return Object.freeze({ term: terms[index]!.name, df: grouping.count - parent.count, ss });
  });
}

/**
 * Least-squares linear model whose leading terms — nested groupings such as blocks, or sites then blocks within
 * sites — are absorbed (swept out by group means) instead of entering the design matrix.
 *
 * The groups' effects are eliminated in closed form and only the remaining terms' normal equations are formed:
 * C = X'X − Σ_g s_g s_g'/k_g and X̃'y = X'y − Σ_g s_g ȳ_g, where s_g counts the rows of group g in each column
 * and k_g is the group's size (the reduced normal equations of a block design). They are factored in term order
 * by Cholesky, dropping aliased columns as `fitLinearModel` does, so the sequential sums of squares, residuals,
 * estimates and their variances equal those of `fitLinearModel` with the leading terms first (R's
 * `anova(lm(y ~ block + treatment))`, emmeans' least-squares means). The work grows with the plots and the
 * squared number of remaining columns, not with the number of blocks: a 10⁶-plot RCBD of 10,000 blocks with
 * plots missing is fitted in seconds, where its 10,100-column design matrix would not fit in memory.
 *
 * Reference: Searle (1971), Linear Models, §7.1 (absorbing a factor; the reduced normal equations);
 * John & Williams (1995), Cyclic and Computer Generated Designs, 2nd ed., §1.2 (the information matrix C).
 * @param leading how many of the first terms are absorbed; each must be a grouping within the one before.
 * @throws StatsInputError when the lengths differ or the remaining terms exceed ABSORBED_LIMITS (said in words).
 * @example
 *   const fit = fitAbsorbedLinearModel(y, [block, treatment], [{ name: 'block', factors: [0] }, { name: 'treatment', factors: [1] }], 1);
 *   fit.rows; // the same rows as fitLinearModel on the same data
 */
export function fitAbsorbedLinearModel(y: Float64Array, factors: readonly ModelFactor[], terms: readonly ModelTerm[], leading: number): LinearModelFit {
  const n = y.length;
  if (n === 0) throw new StatsInputError('too few observations', 'a linear model needs at least one observation');
  for (const factor of factors) {
    if (factor.codes.length !== n) throw new StatsInputError('unequal lengths', `factor ${factor.name} has ${factor.codes.length} codes for ${n} values`);
  }
  const leadingCells = terms.slice(0, leading).map((term) => termCells(factors, term, n));
  const groupings: Grouping[] = leadingCells;
  const groups = groupings[groupings.length - 1]!;
  const groupCells = leadingCells[leadingCells.length - 1]!;
  const rows: SequentialTermRow[] = nestedRows(y, groupings, terms);
  const { means: groupMeans, counts: groupSizes } = groupMoments(y, groups);

  // Remaining terms: one indicator column per cell present, numbered after the previous terms' columns.
  const restTerms = terms.slice(leading);
  const restCells = restTerms.map((term) => termCells(factors, term, n));
  const offsets: number[] = [];
  let p = 0;
  for (const cells of restCells) {
    offsets.push(p);
    p += cells.count;
  }
  const columnTerm = new Int32Array(p);
  restCells.forEach((cells, t) => columnTerm.fill(t, offsets[t]!, offsets[t]! + cells.count));
  const m = restTerms.length;
  const rowColumns = new Int32Array(n * m);
  for (let i = 0; i < n; i++) for (let t = 0; t < m; t++) rowColumns[i * m + t] = offsets[t]! + restCells[t]!.codes[i]!;

  const sparse = groupColumns(groups, rowColumns, m, p);
  let outerWork = 0;
  for (let g = 0; g < groups.count; g++) {
    const size = sparse.start[g + 1]! - sparse.start[g]!;
    outerWork += size * size + size * p;
  }
  if (p > ABSORBED_LIMITS.columns || outerWork > ABSORBED_LIMITS.work) {
    throw new StatsInputError(
      'layout too large for least squares',
      `this unbalanced layout of ${n.toLocaleString('en')} plots needs ${p.toLocaleString('en')} columns for its treatments and their interactions beside its ${groups.count.toLocaleString('en')} blocks; the engine fits at most ${ABSORBED_LIMITS.columns.toLocaleString('en')}. Complete layouts (every plot present) are analysed at any size: fill or leave out the incomplete blocks, or analyse the sites one by one`,
    );
  }

  // Reduced normal equations.
  const normal = new Float64Array(p * p);
  const reducedY = new Float64Array(p);
  const columnNorms = new Float64Array(p);
  for (let i = 0; i < n; i++) {
    for (let a = 0; a < m; a++) {
      const ca = rowColumns[i * m + a]!;
      reducedY[ca]! += y[i]!;
      for (let b = 0; b < m; b++) normal[ca * p + rowColumns[i * m + b]!]! += 1;
    }
  }
  for (let j = 0; j < p; j++) columnNorms[j] = normal[j * p + j]!;
  const { start, columns: sparseColumns, counts: sparseCounts } = sparse;
  for (let g = 0; g < groups.count; g++) {
    const size = groupSizes[g]!;
    for (let a = start[g]!; a < start[g + 1]!; a++) {
      reducedY[sparseColumns[a]!]! -= sparseCounts[a]! * groupMeans[g]!;
      const row = sparseColumns[a]! * p;
      const scaled = sparseCounts[a]! / size;
      for (let b = start[g]!; b < start[g + 1]!; b++) normal[row + sparseColumns[b]!]! -= scaled * sparseCounts[b]!;
    }
  }

  // Cholesky in column order; a column left with (almost) none of its squared norm is aliased with earlier ones.
  const lower = new Float64Array(p * p);
  const kept: number[] = [];
  const aliased: number[] = [];
  for (let j = 0; j < p; j++) {
    for (const k of kept) {
      let sum = normal[j * p + k]!;
      for (const earlier of kept) {
        if (earlier === k) break;
        sum -= lower[j * p + earlier]! * lower[k * p + earlier]!;
      }
      lower[j * p + k] = sum / lower[k * p + k]!;
    }
    let diagonal = normal[j * p + j]!;
    for (const k of kept) diagonal -= lower[j * p + k]! ** 2;
    if (diagonal <= ALIAS_TOLERANCE_SQUARED * columnNorms[j]!) aliased.push(j);
    else {
      lower[j * p + j] = Math.sqrt(diagonal);
      kept.push(j);
    }
  }
  const rank = kept.length;
  // Work in the kept columns: L (rank × rank, lower), z = L⁻¹ X̃'y, β = L'⁻¹ z.
  const l = new Float64Array(rank * rank);
  kept.forEach((row, r) => kept.forEach((column, c) => (l[r * rank + c] = c <= r ? lower[row * p + column]! : 0)));
  const forward = (b: Float64Array): Float64Array => {
    const z = new Float64Array(rank);
    for (let r = 0; r < rank; r++) {
      let sum = b[r]!;
      for (let c = 0; c < r; c++) sum -= l[r * rank + c]! * z[c]!;
      z[r] = sum / l[r * rank + r]!;
    }
    return z;
  };
  const backward = (b: Float64Array): Float64Array => {
    const x = Float64Array.from(b);
    for (let r = rank - 1; r >= 0; r--) {
      x[r] = x[r]! / l[r * rank + r]!;
      for (let c = 0; c < r; c++) x[c]! -= l[r * rank + c]! * x[r]!;
    }
    return x;
  };
  const effects = forward(Float64Array.from(kept, (j) => reducedY[j]!));
  const restRows = restTerms.map((term, t) => {
    let df = 0;
    let ss = 0;
    kept.forEach((column, position) => {
      if (columnTerm[column] === t) {
        df++;
        ss += effects[position]! ** 2;
      }
    });
    return Object.freeze({ term: term.name, df, ss });
  });
  const keptCoefficients = backward(effects);
  const coefficients = new Float64Array(p);
  kept.forEach((column, position) => (coefficients[column] = keptCoefficients[position]!));

  // (C_KK)⁻¹ in the kept columns, for variances and leverages.
  const inverse = new Float64Array(rank * rank);
  for (let c = 0; c < rank; c++) {
    const unit = new Float64Array(rank);
    unit[c] = 1;
    const column = backward(forward(unit));
    for (let r = 0; r < rank; r++) inverse[r * rank + c] = column[r]!;
  }
  const position = new Int32Array(p).fill(-1);
  kept.forEach((column, k) => (position[column] = k));
  // An aliased column a is C_KK w_a = C_Ka in the kept columns: w_a = L'⁻¹ (its row of L).
  const aliasWeights = aliased.map((a) => ({ column: a, weights: backward(Float64Array.from(kept, (k) => lower[a * p + k]!)) }));

  // Fitted values: the group mean plus the row's centred columns times β.
  const groupShift = new Float64Array(groups.count);
  for (let g = 0; g < groups.count; g++) {
    let sum = 0;
    for (let a = start[g]!; a < start[g + 1]!; a++) sum += sparseCounts[a]! * coefficients[sparseColumns[a]!]!;
    groupShift[g] = sum / groupSizes[g]!;
  }
  const fitted = new Float64Array(n);
  const residuals = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let value = groupMeans[groups.codes[i]!]! - groupShift[groups.codes[i]!]!;
    for (let t = 0; t < m; t++) value += coefficients[rowColumns[i * m + t]!]!;
    fitted[i] = value;
    residuals[i] = y[i]! - value;
  }

  // From the residuals themselves, not as within-group SS less the explained SS: the difference of two large sums
  // loses the digits of a small residual SS.
  let residualSs = 0;
  for (let i = 0; i < n; i++) residualSs += residuals[i]! ** 2;

  // Leverage: 1/k_g + (x_i − m_g)' C⁻ (x_i − m_g), with m_g the group's mean row.
  const leverage = new Float64Array(n);
  const groupU: Float64Array[] = [];
  const groupQuadratic = new Float64Array(groups.count);
  for (let g = 0; g < groups.count; g++) {
    const u = new Float64Array(rank);
    for (let a = start[g]!; a < start[g + 1]!; a++) {
      const k = position[sparseColumns[a]!]!;
      if (k < 0) continue;
      const weight = sparseCounts[a]! / groupSizes[g]!;
      for (let r = 0; r < rank; r++) u[r]! += inverse[r * rank + k]! * weight;
    }
    let quadratic = 0;
    for (let a = start[g]!; a < start[g + 1]!; a++) {
      const k = position[sparseColumns[a]!]!;
      if (k >= 0) quadratic += (sparseCounts[a]! / groupSizes[g]!) * u[k]!;
    }
    groupU.push(u);
    groupQuadratic[g] = quadratic;
  }
  for (let i = 0; i < n; i++) {
    const g = groups.codes[i]!;
    let value = 1 / groupSizes[g]! + groupQuadratic[g]!;
    for (let a = 0; a < m; a++) {
      const ka = position[rowColumns[i * m + a]!]!;
      if (ka < 0) continue;
      value -= 2 * groupU[g]![ka]!;
      for (let b = 0; b < m; b++) {
        const kb = position[rowColumns[i * m + b]!]!;
        if (kb >= 0) value += inverse[ka * rank + kb]!;
      }
    }
    leverage[i] = value;
  }

  // Contrasts hold one weight per group, then one per remaining column; a cell absent from the data is NaN.
  const contrastVector = (points: readonly (readonly number[])[], weights: readonly number[]): Float64Array => {
    const contrast = new Float64Array(groups.count + p);
    points.forEach((point, index) => {
      const weight = weights[index]!;
      const group = groupCells.cellOf(point);
      if (group === undefined) contrast[0] = Number.NaN;
      else contrast[group]! += weight;
      restCells.forEach((cells, t) => {
        const cell = cells.cellOf(point);
        if (cell === undefined) contrast[0] = Number.NaN;
        else contrast[groups.count + offsets[t]! + cell]! += weight;
      });
    });
    return contrast;
  };
  // The remaining-column part after eliminating the groups: g = l_rest − Σ_g (l_g / k_g) s_g, checked estimable.
  const reduced = new WeakMap<Float64Array, { kept: Float64Array; groupPart: number; groupVariance: number }>();
  const reduce = (contrast: Float64Array, label: string) => {
    const known = reduced.get(contrast);
    if (known) return known;
    const notEstimable = () => new StatsInputError('not estimable', `${label} cannot be estimated from these data (a cell it needs is empty)`);
    if (contrast.some(Number.isNaN)) throw notEstimable();
    const rest = Float64Array.from(contrast.subarray(groups.count));
    let groupPart = 0;
    let groupVariance = 0;
    for (let g = 0; g < groups.count; g++) {
      const weight = contrast[g]!;
      if (weight === 0) continue;
      groupPart += weight * groupMeans[g]!;
      groupVariance += (weight * weight) / groupSizes[g]!;
      const scaled = weight / groupSizes[g]!;
      for (let a = start[g]!; a < start[g + 1]!; a++) rest[sparseColumns[a]!]! -= scaled * sparseCounts[a]!;
    }
    const keptPart = Float64Array.from(kept, (column) => rest[column]!);
    let scale = 0;
    for (const value of contrast) scale = Math.max(scale, Math.abs(value));
    for (const alias of aliasWeights) {
      let implied = 0;
      for (let k = 0; k < rank; k++) implied += keptPart[k]! * alias.weights[k]!;
      if (Math.abs(implied - rest[alias.column]!) > ESTIMABILITY_TOLERANCE * Math.max(1, scale)) throw notEstimable();
    }
    const entry = { kept: keptPart, groupPart, groupVariance };
    reduced.set(contrast, entry);
    return entry;
  };
  const quadratic = (first: Float64Array, second: Float64Array): number => {
    let sum = 0;
    for (let r = 0; r < rank; r++) {
      if (first[r] === 0) continue;
      let row = 0;
      for (let c = 0; c < rank; c++) row += inverse[r * rank + c]! * second[c]!;
      sum += first[r]! * row;
    }
    return sum;
  };

  return Object.freeze({
    rows: Object.freeze([...rows, ...restRows]),
    rank: groups.count + rank,
    residualDf: n - groups.count - rank,
    residualSs,
    fitted,
    residuals,
    leverage,
    contrastVector,
    estimate(contrast: Float64Array, label: string): LinearEstimate {
      const { kept: keptPart, groupPart, groupVariance } = reduce(contrast, label);
      let value = groupPart;
      for (let k = 0; k < rank; k++) value += keptPart[k]! * keptCoefficients[k]!;
      return Object.freeze({ value, varianceFactor: groupVariance + quadratic(keptPart, keptPart) });
    },
    covarianceFactor(first: Float64Array, second: Float64Array): number {
      const a = reduce(first, 'contrast');
      const b = reduce(second, 'contrast');
      let groupCovariance = 0;
      for (let g = 0; g < groups.count; g++) if (first[g] !== 0 && second[g] !== 0) groupCovariance += (first[g]! * second[g]!) / groupSizes[g]!;
      return groupCovariance + quadratic(a.kept, b.kept);
    },
  });
}
