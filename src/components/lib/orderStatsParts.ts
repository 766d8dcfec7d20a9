/**
 * The two heavy pieces of a page's "other orders" section (OrderPreview.astro): the static SVG of the selection
 * statistics against order (published order ringed) and the previews as JSON for the browser (`<` escaped).
 * Null when the correlation has no previews.
 */
import { renderOrderStatsSvg, type OrderStatPanel } from '../../render/index.ts';
import type { OrderPreviews, OrderSelection, PolynomialFit } from './entryView.ts';
import { previewsJson } from '../../load/previewsJson.ts';

/** @example orderStatsParts(fit, selection, previews)?.svg.startsWith('<svg') // => true */
export function orderStatsParts(fit: PolynomialFit, selection: OrderSelection | null, previews: OrderPreviews | null): { readonly svg: string; readonly json: string } | null {
  if (previews === null) return null;
  const rows = selection?.orders ?? [];
  const panels: OrderStatPanel[] = [
    { title: 's', log: true, values: rows.map((row) => [row.order, row.residualStdDev]) },
    { title: 'AICc', log: false, values: rows.map((row) => [row.order, row.aicc]) },
    { title: 'BIC', log: false, values: rows.map((row) => [row.order, row.bic]) },
    { title: 'LOO RMSE', log: true, values: rows.map((row) => [row.order, row.looRmse]) },
    ...(selection?.weighted ? [{ title: 'χ²/dof', log: true, values: rows.map((row): readonly [number, number | null] => [row.order, row.reducedChiSquare]) }] : []),
  ];
  return {
    svg: renderOrderStatsSvg(panels, fit.order, `Selection statistics against order; order ${fit.order} is published`),
    // JSON.stringify(previews), taken from the fit record's line when it was read from one (previewsJson.ts).
    json: previewsJson(previews).replace(/</g, '\\u003c'),
  };
}
