/**
 * Residual statistics and per-point influence diagnostics of a weighted least-squares fit.
 *
 * With e_i = √w_i·r_i the weighted residuals, h_ii the leverages, p the free parameters and dof = n − p:
 *   S_r = Σ e_i²,  s² = S_r/dof,  R² = 1 − S_r/S_t (S_t centred, or Σ w v² without intercept),
 *   adjusted R² = 1 − (S_r/dof)/(S_t/(n − 1))  (n in place of n − 1 without intercept),
 *   PRESS = Σ (e_i/(1 − h_ii))²  (leave-one-out residuals without refitting),
 *   AICc = n·ln(S_r/n) + n(n + p)/(n − p − 2),  BIC = n·ln(S_r/n) + p·ln n  (the same definitions as the order
 *   table, src/core/order; they differ from the forms with K = p + 1 parameters only by constants),
 *   externally studentized t_i = e_i / (s_(i)·√(1 − h_ii)),  s_(i)² = (S_r − e_i²/(1 − h_ii))/(dof − 1),
 *   Cook's D_i = e_i²·h_ii / (p·s²·(1 − h_ii)²).
 * References: D. A. Belsley, E. Kuh, R. E. Welsch, Regression Diagnostics, Wiley 1980; C. M. Hurvich and C.-L. Tsai,
 * Biometrika 76 (1989) 297–307 (AICc); G. Schwarz, Ann. Statist. 6 (1978) 461–464 (BIC); D. M. Allen,
 * Technometrics 16 (1974) 125–127 (PRESS).
 */

export interface ResidualSummary {
  readonly residualSumOfSquares: number;
  readonly residualVariance: number;
  readonly residualStdDev: number;
  readonly rSquared: number;
  readonly adjustedRSquared: number;
  readonly rmse: number;
  readonly press: number;
  readonly looRmse: number;
  readonly aicc: number;
  readonly bic: number;
  readonly studentized: number[];
  readonly cooksDistance: number[];
}

/**
 * Weighted total sum of squares, centred or not.
 * @example totalSumOfSquares([1, 2, 3], [1, 1, 1], true) // => 2
 */
export function totalSumOfSquares(v: readonly number[], weights: readonly number[], centred: boolean): number {
  let sumW = 0;
  let mean = 0;
  for (let i = 0; i < v.length; i++) {
    // Weighted Welford update keeps the centred sum accurate for values far from zero.
    sumW += weights[i]!;
    mean += (weights[i]! / sumW) * (v[i]! - mean);
  }
  let total = 0;
  for (let i = 0; i < v.length; i++) total += weights[i]! * (centred ? v[i]! - mean : v[i]!) ** 2;
  return total;
}

/**
 * All residual summaries. `weighted` are e_i = √w_i·r_i.
 * @example residualStatistics([1, -1, 1, -1], [0.5, 0.5, 0.5, 0.5], 2, 10, true).residualVariance // => 2
 */
export function residualStatistics(
  weighted: readonly number[],
  leverage: readonly number[],
  parameters: number,
  totalSumOfSquaresValue: number,
  centred: boolean,
): ResidualSummary {
  const n = weighted.length;
  const dof = n - parameters;
  let residualSumOfSquares = 0;
  let press = 0;
  for (let i = 0; i < n; i++) {
    const e = weighted[i]!;
    residualSumOfSquares += e * e;
    const oneMinusH = 1 - leverage[i]!;
    press += oneMinusH > 1e-12 ? (e / oneMinusH) ** 2 : Infinity;
  }
  const residualVariance = dof > 0 ? residualSumOfSquares / dof : NaN;
  const logTerm = n * Math.log(residualSumOfSquares / n);
  const studentized: number[] = [];
  const cooksDistance: number[] = [];
  for (let i = 0; i < n; i++) {
    const e = weighted[i]!;
    const h = leverage[i]!;
    const oneMinusH = 1 - h;
    const deleted = dof > 1 ? (residualSumOfSquares - (e * e) / oneMinusH) / (dof - 1) : NaN;
    studentized.push(oneMinusH > 1e-12 && deleted > 0 ? e / Math.sqrt(deleted * oneMinusH) : NaN);
    cooksDistance.push(oneMinusH > 1e-12 && residualVariance > 0 ? (e * e * h) / (parameters * residualVariance * oneMinusH ** 2) : NaN);
  }
  return {
    residualSumOfSquares,
    residualVariance,
    residualStdDev: Math.sqrt(residualVariance),
    rSquared: 1 - residualSumOfSquares / totalSumOfSquaresValue,
    adjustedRSquared: 1 - residualVariance / (totalSumOfSquaresValue / (centred ? n - 1 : n)),
    rmse: Math.sqrt(residualSumOfSquares / n),
    press,
    looRmse: Math.sqrt(press / n),
    aicc: n - parameters - 2 > 0 ? logTerm + (n * (n + parameters)) / (n - parameters - 2) : NaN,
    bic: logTerm + parameters * Math.log(n),
    studentized,
    cooksDistance,
  };
}
