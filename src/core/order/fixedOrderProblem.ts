/**
 * The one rule for an order fixed by the author (content `fit.order`, `correlary fit --order`), shared by the
 * content check and the order selector so they cannot disagree:
 *   - the order is a whole number from the lowest possible (0 with an intercept, 1 without) to the content
 *     format's limit (ORDER_LIMIT = 12);
 *   - at least one coefficient is left free after the pass-through points (p − q ≥ 1, p = order + 1 with an
 *     intercept, order without);
 *   - at least one residual degree of freedom remains (n ≥ p − q + 1);
 *   - there are at least order + 1 different x values.
 * Returns the problem as a message (without file or line), or null when the order can be fitted.
 */

/** Highest polynomial order accepted anywhere (the content format's limit, src/schema/fitOptions.ts ORDER_LIMIT). */
export const ORDER_LIMIT = 12;

export interface FixedOrderCase {
  readonly order: number;
  readonly intercept: boolean;
  /** Number of pass-through points. */
  readonly constraints: number;
  /** Number of points used. */
  readonly n: number;
  /** Number of different x values among them. */
  readonly distinct: number;
}

/**
 * @example fixedOrderProblem({ order: 9, intercept: true, constraints: 0, n: 8, distinct: 8 })
 * // => "order 9 needs at least 11 points, but 8 are used"
 * @example fixedOrderProblem({ order: 2, intercept: true, constraints: 0, n: 8, distinct: 8 }) // => null
 */
export function fixedOrderProblem(value: FixedOrderCase): string | null {
  const { order, intercept, constraints, n, distinct } = value;
  const lowest = intercept ? 0 : 1;
  if (!Number.isInteger(order) || order < lowest || order > ORDER_LIMIT) {
    return `order ${order} is not allowed; a fixed order is a whole number from ${lowest} to ${ORDER_LIMIT}${intercept ? '' : ' without an intercept'}`;
  }
  const free = (intercept ? order + 1 : order) - constraints;
  if (free < 1) return `order ${order} leaves no free coefficient after ${constraints} pass-through point${constraints === 1 ? '' : 's'}`;
  if (n <= free) return `order ${order} needs at least ${free + 1} points, but ${n} ${n === 1 ? 'is' : 'are'} used`;
  if (distinct <= order) return `order ${order} needs at least ${order + 1} different x values, but the data have ${distinct}`;
  return null;
}
