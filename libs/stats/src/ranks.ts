/**
 * Mid-ranks (1-based) of values, ties sharing the mean of the ranks they span,
 * and the tie sizes: the ranking used by the Kruskal–Wallis and Friedman tests
 * (Hollander & Wolfe, Nonparametric Statistical Methods, 1973, §6.1 and §7.1).
 * @example midRanks([3, 1, 3]) // { ranks: [2.5, 1, 2.5], tieSizes: [1, 2] }
 */
export function midRanks(values: readonly number[]): { ranks: number[]; tieSizes: number[] } {
  const order = values.map((_, index) => index).sort((a, b) => values[a] - values[b]);
  const ranks = new Array<number>(values.length);
  const tieSizes: number[] = [];
  let start = 0;
  while (start < order.length) {
    let end = start;
    while (end + 1 < order.length && values[order[end + 1]] === values[order[start]]) end++;
    const shared = (start + end) / 2 + 1;
    for (let i = start; i <= end; i++) ranks[order[i]] = shared;
    tieSizes.push(end - start + 1);
    start = end + 1;
  }
  return { ranks, tieSizes };
}
