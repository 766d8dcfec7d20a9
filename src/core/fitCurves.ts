/**
 * The floating-point fits of several orders of one dataset, for pictures only (the previews of the orders a page
 * does not publish): for each order the same numbers, bit for bit, as fitCurve (one solveFit per order), from one
 * Householder QR of the design of the highest order instead of one QR per order.
 *
 * Why the numbers are the same, not merely close: solveFit factors the column-equilibrated design of order m,
 * A_m·D_m⁻¹, with ml-matrix's Householder QR. Its columns (the powers of t times √w, each divided by its own 2-norm)
 * are the leading columns of the highest order's equilibrated design, computed by the same expressions. Householder
 * QR works column by column from the left: the reflector of column k and the entries of R in column k depend only on
 * columns 0…k. So the first p reflectors and the leading p×p block of R of the big factorisation are exactly those of
 * the order-m factorisation, and applying them (ml-matrix's `solve`, restricted to the first p reflectors, with the
 * same loops in the same order) gives the same solution, the same refinement step and the same residuals; the SVD of
 * the same p×p R (ml-matrix) gives the same rank test and covariance. test/core/fitCurves.test.ts compares every field
 * with fitCurve on random and reference data for exact equality.
 *
 * With pass-through points the fits are not nested (each order has its own null space), and each order is fitted by
 * fitCurve. An order fitCurve refuses (FitError or a rank-deficient factor) is null.
 *
 * Cost: O(n·P²) for one QR of P = M + 1 columns plus O(n·p) per order, against O(n·p²) and a Q factor per order.
 *
 * @example fitCurves({ x: [0, 1, 2, 3], y: [1, 3, 5, 7] }, {}, [1, 2]).map((fit) => fit?.order) // => [1, 2]
 */
import { Matrix, QrDecomposition, SingularValueDecomposition } from 'ml-matrix';
import { designRow } from './designMatrix.ts';
import { rowTimes, scratchMatrix, solveLeading, type QrStorage } from './qrSolve.ts';
import { domainMapFor, toUnit } from './domain.ts';
import { curveFitOf, fitCurve } from './fitCurve.ts';
import { uncertaintyProfile } from './stats/localUncertainty.ts';
import { fittedSpaceWeights, transformData } from './transforms.ts';
import { validateFitInput, type ValidatedOptions } from './validateFitInput.ts';
import type { CurveFit, FitData, FitOptions } from './types.ts';


function validated(data: FitData, options: FitOptions): ValidatedOptions | null {
  try {
    return validateFitInput(data, options);
  } catch {
    return null;
  }
}

/**
 * fitCurve for each of `orders` (null where fitCurve throws), from one factorisation when there are no constraints.
 * Inputs are not modified.
 */
export function fitCurves(data: FitData, options: Omit<FitOptions, 'order'>, orders: readonly number[]): (CurveFit | null)[] {
  if ((options.constraints ?? []).length > 0) {
    return orders.map((order) => {
      try {
        return fitCurve(data, { ...options, order });
      } catch {
        return null;
      }
    });
  }
  // validateFitInput's checks that depend on the order (without constraints), for each order; the others (data,
  // range, transform domain, confidence) once, with the first order that passes these.
  const n = data.x.length;
  const withIntercept = options.intercept ?? true;
  const checked = orders.map(
    (order) => Number.isInteger(order) && order >= 0 && (withIntercept || order > 0) && n >= Math.max(1, order + (withIntercept ? 1 : 0)),
  );
  const firstOrder = orders.find((_, i) => checked[i]);
  const first = firstOrder === undefined ? null : validated(data, { ...options, order: firstOrder });
  if (first === null) return orders.map(() => null);
  const { intercept, transformX, transformY, confidence, range } = first;
  const { u, v } = transformData(data.x, data.y, transformX, transformY);
  const weighted = data.uncertainty !== undefined;
  const uncertaintyScale: 'stated' | 'scatter' = weighted && options.uncertaintyScale === 'stated' ? 'stated' : 'scatter';
  const weights = data.uncertainty ? fittedSpaceWeights(data.y, data.uncertainty, transformY) : new Array<number>(n).fill(1);
  const rootWeights = weights.map(Math.sqrt);
  const distinct = new Set(intercept ? u : u.filter((value) => value !== 0)).size;
  const firstPower = intercept ? 0 : 1;
  const powersOf = (order: number) => Array.from({ length: order + 1 - firstPower }, (_, j) => j + firstPower);
  // Orders solveFit would refuse before factoring (too few distinct x; fewer points than coefficients).
  const usable = orders.map((order, i) => checked[i]! && powersOf(order).length <= distinct && powersOf(order).length <= n);
  const highest = Math.max(...orders.filter((_, i) => usable[i]));
  if (!Number.isFinite(highest)) return orders.map(() => null);

  const map = domainMapFor(u, intercept);
  const t = u.map((value) => toUnit(map, value));
  // The design of the highest order (designMatrix's entries, t^k·√w) and its column-equilibrated copy, as plain rows:
  // the factorisation gets one Matrix made from the scaled rows, and the loops below read the rows themselves.
  const highestPowers = powersOf(highest);
  const columns = highestPowers.length;
  const rows = t.map((value, i) => designRow(value, highestPowers, rootWeights[i]!));
  const norms: number[] = [];
  for (let j = 0; j < columns; j++) {
    let sum = 0;
    for (let i = 0; i < n; i++) sum += rows[i]![j]! ** 2;
    norms.push(Math.sqrt(sum) || 1);
  }
  const scaledRows = rows.map((row) => row.map((value, j) => value / norms[j]!));
  const qr = new QrDecomposition(scratchMatrix(scaledRows, columns)) as unknown as QrStorage;
  const factors = qr.QR.to2DArray();
  const target = v.map((value, i) => value * rootWeights[i]!);
  const profile = weighted ? uncertaintyProfile(data.x, weights.map((w) => 1 / Math.sqrt(w))) : null;

  return orders.map((order, index) => {
    if (!usable[index]) return null;
    const powers = powersOf(order);
    const k = powers.length;
    // solveLeastSquares: rank from the SVD of the leading block of R (ml-matrix's upperTriangularMatrix, restricted).
    const upper = new Matrix(k, k);
    for (let i = 0; i < k; i++) for (let j = 0; j < k; j++) upper.set(i, j, i < j ? factors[i]![j]! : i === j ? qr.Rdiag[i]! : 0);
    const svd = new SingularValueDecomposition(upper, { computeLeftSingularVectors: false });
    const singular = svd.diagonal;
    const largest = singular[0] ?? 0;
    const tolerance = Math.max(n, k) * Number.EPSILON * largest;
    const smallest = singular[singular.length - 1] ?? 0;
    if (k > 0 && !(smallest > tolerance)) return null;
    for (let j = 0; j < k; j++) if (qr.Rdiag[j] === 0) return null; // ml-matrix's solve refuses a zero diagonal
    let solution = solveLeading(factors, qr.Rdiag, k, target);
    // One step of iterative refinement, as solveLeastSquares: r = b − A·z, z ← z + QR⁻¹·r.
    const residual = target.map((value, i) => value - rowTimes(scaledRows[i]!, solution, k));
    const correction = solveLeading(factors, qr.Rdiag, k, residual);
    solution = solution.map((value, j) => value + correction[j]!);
    const beta = solution.map((value, j) => value / norms[j]!);
    const V = svd.rightSingularVectors;
    const unscaledZ = Array.from({ length: k }, (_, r) =>
      Array.from({ length: k }, (_, c) => {
        let sum = 0;
        for (let l = 0; l < k; l++) sum += (V.get(r, l) * V.get(c, l)) / singular[l]! ** 2;
        return sum / (norms[r]! * norms[c]!);
      }),
    );
    // solveFit after the solve: fitted values, residuals and s (residualStatistics' sums, in the same order).
    const fittedV = rows.map((row, i) => rowTimes(row, beta, k) / rootWeights[i]!);
    let residualSumOfSquares = 0;
    for (let i = 0; i < n; i++) {
      const e = (v[i]! - fittedV[i]!) * rootWeights[i]!;
      residualSumOfSquares += e * e;
    }
    const dof = n - k;
    const residualVariance = dof > 0 ? residualSumOfSquares / dof : NaN;
    const size = order + 1;
    const mappedCoefficients = new Array<number>(size).fill(0);
    const unscaledMapped = Array.from({ length: size }, () => new Array<number>(size).fill(0));
    powers.forEach((power, j) => {
      mappedCoefficients[power] = beta[j]!;
      powers.forEach((other, i) => {
        unscaledMapped[power]![other] = unscaledZ[j]![i]!;
      });
    });
    return curveFitOf(data, options, {
      order, transformX, transformY, range, confidence, uncertaintyScale, uncertaintyProfile: profile, weighted, map,
      mappedCoefficients, unscaledMapped, residualVariance, dof, fittedV,
    });
  });
}
