// Why the REML core inverts its covariance blocks with its own Cholesky instead of ml-matrix's: times both on
// the block sizes REML meets (a block of 20 plots, a site of 96, a site of 300). Run after `npx tsc -b libs/stats`:
//   node libs/stats/bench/bench-matrix.mjs
import { createRequire } from 'node:module';

const require = createRequire(import.meta.url);
const { CholeskyDecomposition, Matrix } = require('ml-matrix');
const { inverseOfPositiveDefinite } = require('../dist/reml/symmetric-matrix.js');

function mlMatrixInverse(values, n) {
  const rows = Array.from({ length: n }, (_, i) => Array.from(values.subarray(i * n, (i + 1) * n)));
  const cholesky = new CholeskyDecomposition(new Matrix(rows));
  return cholesky.solve(Matrix.eye(n));
}

const rows = [];
for (const n of [20, 96, 300]) {
  const a = new Float64Array(n * n);
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) a[i * n + j] = (i === j ? n : 0) + 1 / (1 + Math.abs(i - j));
  const repeats = n >= 300 ? 5 : 200;
  const time = (run) => {
    run();
    const start = performance.now();
    for (let r = 0; r < repeats; r++) run();
    return (performance.now() - start) / repeats;
  };
  const ml = time(() => mlMatrixInverse(a, n));
  const own = time(() => inverseOfPositiveDefinite(a, n));
  const check = mlMatrixInverse(a, n);
  const mine = inverseOfPositiveDefinite(a, n).inverse;
  let difference = 0;
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) difference = Math.max(difference, Math.abs(check.get(i, j) - mine[i * n + j]));
  rows.push({ size: n, 'ml-matrix ms': Number(ml.toFixed(3)), 'own Cholesky ms': Number(own.toFixed(3)), ratio: Number((ml / own).toFixed(1)), 'max |difference|': difference });
}
console.table(rows);
