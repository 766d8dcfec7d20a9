import type { CandidateTable } from '../../../src/core/order/index.ts';

/**
 * A hand-made candidate table: residual sums of squares (and PRESS) by order from 0, with an intercept,
 * so p = m + 1 and dof = n − m − 1. Values in the tests are chosen so the expected choice can be worked out by hand.
 */
export function handTable(
  n: number,
  residualSums: readonly number[],
  options: { press?: readonly number[]; maxCandidate?: number; uncertaintyGiven?: boolean } = {},
): CandidateTable {
  return {
    n,
    intercept: true,
    totalSumOfSquares: residualSums[0]!,
    fits: residualSums.map((residualSumOfSquares, order) => ({
      order,
      parameters: order + 1,
      degreesOfFreedom: n - order - 1,
      residualSumOfSquares,
      press: options.press?.[order] ?? residualSumOfSquares * 2,
    })),
    minCandidate: 1,
    maxCandidate: options.maxCandidate ?? residualSums.length - 1,
    uncertaintyGiven: options.uncertaintyGiven ?? false,
  };
}
