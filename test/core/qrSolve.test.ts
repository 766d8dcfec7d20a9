/**
 * The QR solve, product and orthogonal factor on plain arrays, and the factorisation in place (src/core/qrSolve.ts),
 * against ml-matrix's own QrDecomposition (solve, orthogonalMatrix, on a copy of its input) and Matrix.mmul, which
 * they replace in solveLeastSquares, fitCurves and fitNestedOrders: the same numbers bit for bit (not merely close),
 * on random tall matrices with columns of very different sizes, including NIST StRD designs.
 */
import { Matrix, QrDecomposition } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { orthogonalRows, rowTimes, scratchMatrix, solveLeading, type QrStorage } from '../../src/core/qrSolve.ts';
import { createRandom } from '../../scripts/demo/random.ts';
import { nistDatasets } from '../helpers/nist.ts';

function randomProblem(random: () => number): { rows: number[][]; b: number[] } {
  const n = 3 + Math.floor(random() * 60);
  const p = 1 + Math.floor(random() * Math.min(n, 9));
  const rows = Array.from({ length: n }, () => Array.from({ length: p }, (_, j) => (random() - 0.5) * 10 ** (j - 3 + Math.floor(random() * 4))));
  return { rows, b: Array.from({ length: n }, () => (random() - 0.5) * 1e3) };
}

function check(rows: number[][], b: number[]): void {
  const p = rows[0]!.length;
  const qr = new QrDecomposition(new Matrix(rows));
  if (!qr.isFullRank()) return;
  const { QR, Rdiag } = qr as unknown as QrStorage;
  const factors = QR.to2DArray();
  // The whole solve, and the solve of the leading columns (ml-matrix's solve of the first k columns' own QR).
  expect(solveLeading(factors, Rdiag, p, b)).toEqual(qr.solve(Matrix.columnVector(b)).to1DArray());
  const k = Math.max(1, p - 2);
  const leading = new QrDecomposition(new Matrix(rows.map((row) => row.slice(0, k))));
  expect(solveLeading(factors, Rdiag, k, b)).toEqual(leading.solve(Matrix.columnVector(b)).to1DArray());
  expect(orthogonalRows(factors, p)).toEqual(qr.orthogonalMatrix.to2DArray());
  // Factored in place (no copy of the input): the same factors.
  const inPlace = new QrDecomposition(scratchMatrix(rows, p)) as unknown as QrStorage;
  expect(inPlace.QR.to2DArray()).toEqual(factors);
  expect([...inPlace.Rdiag]).toEqual([...Rdiag]);
  const vector = b.slice(0, p);
  expect(rows.map((row) => rowTimes(row, vector, p))).toEqual(new Matrix(rows).mmul(Matrix.columnVector(vector)).to1DArray());
}

describe('solveLeading and rowTimes', () => {
  it('equal ml-matrix QrDecomposition.solve and mmul bit for bit on 300 random tall matrices', () => {
    const random = createRandom(20261202);
    for (let trial = 0; trial < 300; trial++) {
      const { rows, b } = randomProblem(random.uniform);
      check(rows, b);
    }
  });

  for (const name of ['Norris', 'Pontius', 'Wampler4']) {
    const dataset = nistDatasets[name];
    if (dataset === undefined) continue;
    it(`equal ml-matrix on the power design of ${name} (NIST StRD)`, () => {
      const rows = dataset.data.x.map((x) => Array.from({ length: 6 }, (_, k) => x ** k));
      check(rows, [...dataset.data.y]);
    });
  }
});
