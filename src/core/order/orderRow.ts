/**
 * One row of the published order table: every statistic a reviewer needs to check the choice of order.
 *
 * Definitions (p coefficients, n points, S_r the residual sum of squares, weighted when uncertainties are given):
 *   residualVariance s² = S_r/(n − p)          adjustedRSquared = 1 − s²/(S_t/(n − 1))
 *   aicc = n ln(S_r/n) + n(n + p)/(n − p − 2)  bic = n ln(S_r/n) + p ln n
 *   press = Σ (r_i/(1 − h_ii))²                 looRmse = √(PRESS/n)
 *   fToNext, pToNext: extra-sum-of-squares F test of adding order m + 1 (F(1, n − p − 1))
 *   chiSquare = weighted S_r, chiSquareP = P(χ²(n − p) ≥ chiSquare), only with stated uncertainties.
 * Undefined values are null, so the row survives JSON.stringify unchanged.
 *
 * @example
 * orderRows(nested, true)[2] // => { order: 2, parameters: 3, residualSumOfSquares: …, pToNext: 0.38, … }
 */
import { chiSquareUpperP } from '../distributions.ts';
import { aiccOf } from './aiccCriterion.ts';
import { bicOf } from './bicCriterion.ts';
import { extraSumOfSquaresF, extraSumOfSquaresP } from './extraSumOfSquaresF.ts';
import type { NestedFits } from './nestedFits.ts';

export interface OrderRow {
  readonly order: number;
  readonly parameters: number;
  readonly degreesOfFreedom: number;
  /** True when an automatic criterion could choose this order. */
  readonly candidate: boolean;
  readonly residualSumOfSquares: number;
  readonly residualVariance: number | null;
  readonly residualStdDev: number | null;
  readonly rSquared: number | null;
  readonly adjustedRSquared: number | null;
  readonly aicc: number | null;
  readonly bic: number;
  readonly press: number;
  readonly looRmse: number;
  /** F statistic and p-value for going to order + 1; null for the last row. */
  readonly fToNext: number | null;
  readonly pToNext: number | null;
  readonly chiSquare: number | null;
  readonly reducedChiSquare: number | null;
  readonly chiSquareP: number | null;
  /** Coefficients of ascending powers of t = (u − center)/halfWidth. */
  readonly mappedCoefficients: readonly number[];
}

function finiteOrNull(value: number): number | null {
  return Number.isFinite(value) ? value : null;
}

/**
 * Build the order table from nested fits.
 * @param candidate which orders an automatic criterion may choose
 * @example orderRows(nested, (order) => order >= 1).map((row) => row.order) // => [0, 1, 2, …]
 */
export function orderRows(nested: NestedFits, candidate: (order: number) => boolean): OrderRow[] {
  const n = nested.n;
  const totalDof = nested.intercept ? n - 1 : n;
  return nested.fits.map((fit, index) => {
    const dof = fit.degreesOfFreedom;
    const variance = dof > 0 ? fit.residualSumOfSquares / dof : Number.NaN;
    const next = nested.fits[index + 1];
    const test = next ? extraSumOfSquaresF(fit, next) : null;
    const rSquared = nested.totalSumOfSquares > 0 ? 1 - fit.residualSumOfSquares / nested.totalSumOfSquares : Number.NaN;
    const adjusted = nested.totalSumOfSquares > 0 ? 1 - variance / (nested.totalSumOfSquares / totalDof) : Number.NaN;
    return {
      order: fit.order,
      parameters: fit.parameters,
      degreesOfFreedom: dof,
      candidate: candidate(fit.order),
      residualSumOfSquares: fit.residualSumOfSquares,
      residualVariance: finiteOrNull(variance),
      residualStdDev: finiteOrNull(Math.sqrt(variance)),
      rSquared: finiteOrNull(rSquared),
      adjustedRSquared: finiteOrNull(adjusted),
      aicc: finiteOrNull(aiccOf(n, fit)),
      bic: bicOf(n, fit),
      press: fit.press,
      looRmse: Math.sqrt(fit.press / n),
      fToNext: test && test.denominatorDof > 0 ? test.statistic : null,
      pToNext: test && test.denominatorDof > 0 ? extraSumOfSquaresP(test) : null,
      chiSquare: nested.weighted ? fit.residualSumOfSquares : null,
      reducedChiSquare: nested.weighted && dof > 0 ? fit.residualSumOfSquares / dof : null,
      chiSquareP: nested.weighted && dof > 0 ? chiSquareUpperP(fit.residualSumOfSquares, dof) : null,
      mappedCoefficients: fit.mappedCoefficients,
    };
  });
}
