/**
 * Piecewise Chebyshev interpolation of a smooth function on [0, limit]: the function
 * is sampled once at the Chebyshev nodes of equal panels and then evaluated by
 * Clenshaw's recurrence (Press et al., Numerical Recipes, 3rd ed., §5.8, chebft and
 * chebev). The studentized range and Dunnett distributions integrate a costly
 * normal probability R(q·s) over s for many q; tabulating R once per number of
 * groups (or set of correlations) makes each further probability cheap.
 *
 * With 8 panels per unit and 14 nodes per panel the interpolation error for those
 * normal probabilities is below 1e-13 (checked against direct evaluation in the tests).
 *
 * @param sample the function, called panelsPerUnit · limit · order times.
 * @returns an evaluator for 0 ≤ x < limit; outside it returns NaN (callers handle the ends).
 * @throws never.
 * @example tabulateChebyshev(Math.sin, 4)(1) // 0.8414709848078965 (to about 1e-15)
 */
export function tabulateChebyshev(
  sample: (x: number) => number,
  limit: number,
  panelsPerUnit = 8,
  order = 14,
): (x: number) => number {
  const panelCount = Math.ceil(limit * panelsPerUnit);
  const coefficients = new Float64Array(panelCount * order);
  const values = new Float64Array(order);
  const halfWidth = 0.5 / panelsPerUnit;
  for (let panel = 0; panel < panelCount; panel++) {
    const centre = (panel + 0.5) / panelsPerUnit;
    for (let j = 0; j < order; j++) values[j] = sample(centre + halfWidth * Math.cos((Math.PI * (j + 0.5)) / order));
    for (let m = 0; m < order; m++) {
      let sum = 0;
      for (let j = 0; j < order; j++) sum += values[j] * Math.cos((Math.PI * m * (j + 0.5)) / order);
      coefficients[panel * order + m] = (2 / order) * sum;
    }
  }
  return (x: number): number => {
    if (!(x >= 0 && x < panelCount / panelsPerUnit)) return Number.NaN;
    const panel = Math.min(Math.floor(x * panelsPerUnit), panelCount - 1);
    const t = 2 * (x * panelsPerUnit - panel) - 1;
    const offset = panel * order;
    let next = 0;
    let current = 0;
    for (let m = order - 1; m >= 1; m--) {
      const previous = current;
      current = 2 * t * current - next + coefficients[offset + m];
      next = previous;
    }
    return t * current - next + 0.5 * coefficients[offset];
  };
}

/**
 * A small cache of tabulated functions by key, emptied when it holds `capacity` entries.
 * @example const cache = new TableCache(4); cache.get('k=3', () => tabulateChebyshev(Math.exp, 1))
 */
export class TableCache {
  private readonly tables = new Map<string, (x: number) => number>();

  constructor(private readonly capacity: number) {}

  get(key: string, build: () => (x: number) => number): (x: number) => number {
    const existing = this.tables.get(key);
    if (existing) return existing;
    if (this.tables.size >= this.capacity) this.tables.clear();
    const table = build();
    this.tables.set(key, table);
    return table;
  }
}
