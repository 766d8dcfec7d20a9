/**
 * The common interface of the order-selection criteria, and the table they read.
 *
 * A criterion sees only summary numbers of the nested fits (S_r, PRESS, χ² per order), so the same criterion
 * runs on a real data set (through selectOrder) and on 99,000 simulated ones (in the benchmark). Each
 * criterion lives in its own file with its formula and reference; `choose` is the fast decision and
 * `explain` writes the one-sentence reason a reviewer can check against the order table.
 */
import { formatNumber, formatP } from '../format/formatNumber.ts';

/** Names of the built-in criteria. */
export type CriterionName =
  | 'lowestJustified'
  | 'residualVariance'
  | 'adjustedRSquared'
  | 'aicc'
  | 'bic'
  | 'press'
  | 'sequentialF'
  | 'allHigherF'
  | 'chiSquare';

/** The numbers of one fitted order that criteria use. Sums are weighted when uncertainties are given. */
export interface OrderSummary {
  readonly order: number;
  /** Number of coefficients p. */
  readonly parameters: number;
  /** n − p. */
  readonly degreesOfFreedom: number;
  readonly residualSumOfSquares: number;
  readonly press: number;
}

/** What a criterion reads: every fitted order, and the range it may choose from. */
export interface CandidateTable {
  readonly n: number;
  readonly intercept: boolean;
  /** Centred (intercept) or uncentred total sum of squares. */
  readonly totalSumOfSquares: number;
  /** Fitted orders, ascending and consecutive (order 0 first when there is an intercept). */
  readonly fits: readonly OrderSummary[];
  /** Lowest order a criterion may choose (1, or 0 for flat data / a one-coefficient model). */
  readonly minCandidate: number;
  /** Highest order a criterion may choose. */
  readonly maxCandidate: number;
  /** True when S_r is a χ² statistic, i.e. residuals are weighted by 1/σ² from stated uncertainties. */
  readonly uncertaintyGiven: boolean;
}

/** A pluggable order-selection rule. */
export interface OrderCriterion {
  readonly name: CriterionName;
  /** Short label for tables. */
  readonly label: string;
  /** The rule in one sentence. */
  readonly rule: string;
  /** True when the rule needs stated uncertainties (the χ² test). */
  readonly requiresUncertainty: boolean;
  /** The chosen order, between table.minCandidate and table.maxCandidate. */
  choose(table: CandidateTable): number;
  /** One plain sentence giving the numbers behind choosing `order`. */
  explain(table: CandidateTable, order: number): string;
}

/**
 * The fitted order `order` in a candidate table.
 * @throws Error when the order was not fitted
 * @example
 * fitOfOrder(table, 2).residualSumOfSquares // => S_r of the quadratic
 */
export function fitOfOrder(table: CandidateTable, order: number): OrderSummary {
  const first = table.fits[0];
  const fit = first ? table.fits[order - first.order] : undefined;
  if (!fit || fit.order !== order) throw new Error(`fitOfOrder requires a fitted order, got ${order}`);
  return fit;
}

/**
 * Residual variance s² = S_r / (n − p); NaN with no residual degrees of freedom.
 * @example residualVarianceOf({ residualSumOfSquares: 6, degreesOfFreedom: 3, … }) // => 2
 */
export function residualVarianceOf(fit: OrderSummary): number {
  return fit.degreesOfFreedom > 0 ? fit.residualSumOfSquares / fit.degreesOfFreedom : Number.NaN;
}

/** A number in a reason sentence: three significant digits (the shared rule of format/formatNumber.ts). @example reasonNumber(0.012345) // => "0.0123" */
export function reasonNumber(value: number): string {
  return formatNumber(value, 3);
}

export { formatP };

/**
 * "p = 0.38" or "p < 0.0001", for reason sentences.
 * @example pText(0.38123) // => "p = 0.38"
 */
export function pText(p: number): string {
  return p < 1e-4 ? 'p < 0.0001' : `p = ${formatP(p)}`;
}
