/**
 * Full fits for several orders at once, so a page can show every candidate order's curve, bands and diagnostics
 * without refitting in the browser. Each entry is an independent fitPolynomial result (plain JSON data); an order
 * the data cannot support is kept as a refusal with its reason instead of being dropped silently.
 *
 * Cost: one fitPolynomial per order; the exact certification can be limited to the orders that will be published
 * with full digits (`exactFor`), since the others are shown for comparison only.
 *
 * @example fitOrders({ x, y }, [1, 2, 3], { exactFor: [2] }).map((entry) => entry.order) // => [1, 2, 3]
 */
import { FitError } from './fitError.ts';
import { fitPolynomial } from './fitPolynomial.ts';
import type { FitData, FitOptions, PolynomialFit } from './types.ts';

export type OrderFit =
  | { readonly order: number; readonly fit: PolynomialFit; readonly refused: null }
  | { readonly order: number; readonly fit: null; readonly refused: { readonly code: string; readonly message: string } };

/**
 * @example fitOrders({ x: [0, 1, 2, 3, 4], y: [1, 3, 5, 7, 9] }, [1, 2]).map((o) => o.fit?.coefficients) // => [[1, 2], [1, 2, 0]]
 */
export function fitOrders(
  data: FitData,
  orders: readonly number[],
  options: Omit<FitOptions, 'order' | 'exact'> & { readonly exactFor?: readonly number[] } = {},
): OrderFit[] {
  const { exactFor, ...fitOptions } = options;
  return orders.map((order) => {
    try {
      const exact = exactFor === undefined || exactFor.includes(order) ? 'auto' : 'off';
      return { order, fit: fitPolynomial(data, { ...fitOptions, order, exact }), refused: null };
    } catch (error) {
      if (!(error instanceof FitError)) throw error;
      return { order, fit: null, refused: { code: error.code, message: error.message } };
    }
  });
}
