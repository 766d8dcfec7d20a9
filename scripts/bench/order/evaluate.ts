/**
 * Evaluate every criterion on one simulated data set: nested fits from one QR (the same fast path selectOrder
 * uses), out-of-sample RMSE of every order against the truth on 401 evenly spaced points over [min x, max x],
 * and the order each criterion picks (order 0 when isFlat says the data are flat, as in selectOrder).
 */
import {
  candidateTable,
  fitNestedOrders,
  isFlat,
  maxCandidateOrder,
  type CandidateTable,
  type OrderCriterion,
} from '../../../src/core/order/index.ts';
import type { DataSet } from './scenarios.ts';

export const OOS_POINTS = 401;

export interface Evaluation {
  /** Highest candidate order M. */
  readonly maxCandidate: number;
  /** OOS RMSE of orders 0..M (index = order). */
  readonly oosRmse: readonly number[];
  /** Lowest OOS RMSE order among 1..M (ties within 1e-9 relative go low). */
  readonly oracleOrder: number;
  /** The same among orders keeping at least 2 residual degrees of freedom. */
  readonly guardedOracleOrder: number;
  /** Chosen order per criterion, in the order of the criteria list. */
  readonly chosen: readonly number[];
  readonly flat: boolean;
}

/** Evaluate the polynomial with mapped coefficients at t by Horner's rule. */
function horner(coefficients: readonly number[], t: number): number {
  let value = 0;
  for (let k = coefficients.length - 1; k >= 0; k--) value = value * t + coefficients[k]!;
  return value;
}

/** The candidate table with S_r and PRESS divided by σ², i.e. the χ² table of a fit with stated σ. */
function chiSquareTable(table: CandidateTable, sigma: number): CandidateTable {
  const scale = 1 / (sigma * sigma);
  return {
    ...table,
    totalSumOfSquares: table.totalSumOfSquares * scale,
    uncertaintyGiven: true,
    fits: table.fits.map((fit) => ({ ...fit, residualSumOfSquares: fit.residualSumOfSquares * scale, press: fit.press * scale })),
  };
}

export function evaluateDataSet(data: DataSet, criteria: readonly OrderCriterion[]): Evaluation {
  const n = data.x.length;
  const distinct = new Set(data.x).size;
  const maxCandidate = maxCandidateOrder(n, distinct);
  const nested = fitNestedOrders(data.x, data.y, { maxOrder: maxCandidate });
  const table = candidateTable(nested, { maxCandidate, uncertaintyGiven: false });

  const { center, halfWidth } = nested.map;
  const truthValues = new Float64Array(OOS_POINTS);
  const grid = new Float64Array(OOS_POINTS);
  for (let j = 0; j < OOS_POINTS; j++) {
    const t = -1 + (2 * j) / (OOS_POINTS - 1);
    grid[j] = t;
    truthValues[j] = data.truth(center + halfWidth * t);
  }
  const oosRmse = nested.fits.map((fit) => {
    let sum = 0;
    for (let j = 0; j < OOS_POINTS; j++) {
      const error = horner(fit.mappedCoefficients, grid[j]!) - truthValues[j]!;
      sum += error * error;
    }
    return Math.sqrt(sum / OOS_POINTS);
  });
  let oracleOrder = 1;
  for (let order = 2; order <= maxCandidate; order++) {
    if (oosRmse[order]! < oosRmse[oracleOrder]! * (1 - 1e-9)) oracleOrder = order;
  }

  let guardedOracleOrder = 1;
  for (let order = 2; order <= Math.min(maxCandidate, n - 3); order++) {
    if (oosRmse[order]! < oosRmse[guardedOracleOrder]! * (1 - 1e-9)) guardedOracleOrder = order;
  }

  const flat = isFlat(table);
  const chiTable = data.sigma !== null && data.sigma > 0 ? chiSquareTable(table, data.sigma) : null;
  const chosen = criteria.map((criterion) => {
    if (flat) return 0;
    if (criterion.requiresUncertainty) return chiTable ? criterion.choose(chiTable) : -1;
    return criterion.choose(table);
  });
  return { maxCandidate, oosRmse, oracleOrder, guardedOracleOrder, chosen, flat };
}
