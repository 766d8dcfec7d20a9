/**
 * Turn nested fits into the table the criteria read, fixing the candidate range.
 *
 * @example
 * candidateTable(fitNestedOrders(u, v, { maxOrder: 6 }), { maxCandidate: 6, uncertaintyGiven: false })
 * // => { n, intercept: true, minCandidate: 1, maxCandidate: 6, fits: [order 0 … order 6], … }
 */
import type { CandidateTable, OrderSummary } from './criterion.ts';
import type { NestedFits } from './nestedFits.ts';

export interface CandidateRange {
  readonly maxCandidate: number;
  /** Defaults to 1 (order 0 is chosen only through isFlat). */
  readonly minCandidate?: number;
  readonly uncertaintyGiven: boolean;
}

/**
 * @example candidateTable(fitNestedOrders(u, v, { maxOrder: 4 }), { maxCandidate: 4, uncertaintyGiven: false }).fits.length // => 5
 */
export function candidateTable(nested: NestedFits, range: CandidateRange): CandidateTable {
  const fits: OrderSummary[] = nested.fits.map((fit) => ({
    order: fit.order,
    parameters: fit.parameters,
    degreesOfFreedom: fit.degreesOfFreedom,
    residualSumOfSquares: fit.residualSumOfSquares,
    press: fit.press,
  }));
  return {
    n: nested.n,
    intercept: nested.intercept,
    totalSumOfSquares: nested.totalSumOfSquares,
    fits,
    minCandidate: range.minCandidate ?? 1,
    maxCandidate: range.maxCandidate,
    uncertaintyGiven: range.uncertaintyGiven,
  };
}
