/**
 * Candidate-order fits when the curve must pass through given points (equality constraints), in the same shape
 * as fitNestedOrders so that every criterion and the order table work unchanged.
 *
 * Constrained fits are not nested by columns of one QR, so each order is solved on its own by the null-space
 * method (solveLeastSquares). With q constraints an order-m fit has p = m + 1 − q free coefficients (m − q without
 * intercept) and n − p residual degrees of freedom; orders whose coefficients the constraints fix completely are
 * left out, so the table starts at the lowest order with a free coefficient. PRESS uses the leverages of the free
 * problem (the constraints are exact, so leaving a point out does not move them). The same floating-point floor
 * as fitNestedOrders is applied to S_r and PRESS.
 *
 * Reference: Å. Björck, Numerical Methods for Least Squares Problems, SIAM 1996, §5.1.
 * Cost: O(M · n · M²) for M candidate orders.
 */
import { designMatrix } from '../designMatrix.ts';
import { FitError } from '../fitError.ts';
import { solveLeastSquares } from '../leastSquares.ts';
import { totalSumOfSquares } from '../stats/residualStatistics.ts';
import { domainMapFor, toUnit } from '../domain.ts';
import { RESIDUAL_FLOOR_RELATIVE, type NestedFits, type NestedOrderFit } from './nestedFits.ts';

export interface ConstrainedFitOptions {
  readonly maxOrder: number;
  readonly intercept?: boolean;
  readonly weights?: readonly number[] | undefined;
  /** Points in the fitted space (u, v) the curve must pass through. */
  readonly constraints: readonly { readonly u: number; readonly v: number }[];
}

/**
 * Fit every order from the lowest with a free coefficient up to maxOrder under the constraints.
 * @throws FitError 'constraints-fix-all' when no order up to maxOrder has a free coefficient
 * @example fitConstrainedOrders(u, v, { maxOrder: 4, constraints: [{ u: 293.15, v: 0 }] }).fits[0].order // => 1
 */
export function fitConstrainedOrders(u: readonly number[], v: readonly number[], options: ConstrainedFitOptions): NestedFits {
  const n = u.length;
  const intercept = options.intercept ?? true;
  const q = options.constraints.length;
  const firstPower = intercept ? 0 : 1;
  // The lowest order with one free coefficient: (m + 1 − firstPower) − q ≥ 1, i.e. m ≥ q + firstPower.
  const firstOrder = q + firstPower;
  if (firstOrder > options.maxOrder) {
    throw new FitError(
      'constraints-fix-all',
      `${q} pass-through point${q === 1 ? '' : 's'} leave no free coefficient at any candidate order up to ${options.maxOrder}`,
    );
  }
  const map = domainMapFor(u, intercept);
  const rootWeights = options.weights ? options.weights.map(Math.sqrt) : new Array<number>(n).fill(1);
  const t = u.map((value) => toUnit(map, value));
  const ct = options.constraints.map((c) => toUnit(map, c.u));
  const weightedV = v.map((value, i) => value * rootWeights[i]!);
  let scale = 0;
  for (const value of weightedV) scale = Math.max(scale, Math.abs(value));
  const residualFloor = n * (RESIDUAL_FLOOR_RELATIVE * scale) ** 2;

  const fits: NestedOrderFit[] = [];
  for (let order = firstOrder; order <= options.maxOrder; order++) {
    const powers = Array.from({ length: order + 1 - firstPower }, (_, j) => j + firstPower);
    const A = designMatrix(t, powers, rootWeights);
    const C = designMatrix(ct, powers);
    const solution = solveLeastSquares(A, weightedV, { C, d: options.constraints.map((c) => c.v) });
    let sumOfSquares = 0;
    let press = 0;
    const looResiduals: number[] = [];
    const residuals: number[] = [];
    for (let i = 0; i < n; i++) {
      const e = weightedV[i]! - solution.fitted[i]!;
      sumOfSquares += e * e;
      const loo = e / (1 - solution.leverage[i]!);
      looResiduals.push(loo);
      press += loo * loo;
      residuals.push(e / rootWeights[i]!);
    }
    const mappedCoefficients = new Array<number>(order + 1).fill(0);
    powers.forEach((k, j) => (mappedCoefficients[k] = solution.beta[j]!));
    fits.push({
      order,
      parameters: solution.freeParameters,
      degreesOfFreedom: n - solution.freeParameters,
      residualSumOfSquares: Math.max(sumOfSquares, residualFloor),
      press: Math.max(press, residualFloor),
      looResiduals,
      residuals,
      mappedCoefficients,
    });
  }
  const weights = rootWeights.map((root) => root * root);
  const total = totalSumOfSquares(v, weights, intercept);
  return { n, intercept, weighted: options.weights !== undefined, map, totalSumOfSquares: total, residualFloor, fits };
}
