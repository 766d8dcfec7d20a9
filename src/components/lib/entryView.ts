/**
 * Typed views of one stored entry of the `correlations` collection. The entry keeps the fit and the order
 * selection as plain records (src/schema/correlationEntry.ts); they are the core's PolynomialFit and
 * OrderSelection, so the pages read them through these casts in one place.
 */
import { plainSymbol, type PolynomialFit } from '../../core/index.ts';
import { INVENTED_NOTICE } from '../../export/index.ts';
import type { OrderSelection } from '../../core/index.ts';
import type { CorrelationEntry, DataPoint } from '../../schema/index.ts';
import { isStoredFitReference, storedFit, storedFitSummary, storedPoints, storedPreviews, storedSelection } from '../../load/storedFit.ts';
import { orderPreviews, type OrderPreviews } from '../../render/index.ts';

export type { CorrelationEntry, DataPoint, PolynomialFit, OrderSelection, OrderPreviews };
export { INVENTED_NOTICE, plainSymbol };

/**
 * The entry's fit, or null when the core refused the data. The content store holds a reference to the fit cache
 * (src/load/storedFit.ts) so that it stays small; an entry holding the fit itself (tests) is read as it is.
 */
export function fitOf(entry: CorrelationEntry): PolynomialFit | null {
  if (entry.fit === null) return null;
  return isStoredFitReference(entry.fit) ? (storedFit(entry.fit) ?? null) : (entry.fit as unknown as PolynomialFit);
}

/**
 * The entry's fit for a page, a list, an overlay or an export (none of which shows per-point statistics): as fitOf,
 * but read from the fit cache's summary (src/load/storedFit.ts storedFitSummary), kept for the build. Its per-point
 * statistics are read only if asked for.
 */
export function fitSummaryOf(entry: CorrelationEntry): PolynomialFit | null {
  if (entry.fit === null) return null;
  return isStoredFitReference(entry.fit) ? (storedFitSummary(entry.fit) ?? null) : (entry.fit as unknown as PolynomialFit);
}

/** The entry's order selection, or null. */
export function selectionOf(entry: CorrelationEntry): OrderSelection | null {
  if (entry.orderSelection === null) return null;
  return isStoredFitReference(entry.orderSelection) ? (storedSelection(entry.orderSelection) ?? null) : (entry.orderSelection as unknown as OrderSelection);
}

/** Every data row of the entry, in file order (the store keeps them in the fit cache; test entries hold them). */
export function pointsOf(entry: CorrelationEntry): readonly DataPoint[] {
  return isStoredFitReference(entry.points) ? storedPoints(entry.points) : entry.points;
}

/** The points used in the fit, in file order: the same order as the fit's per-point diagnostics. */
export function usedPoints(entry: CorrelationEntry): DataPoint[] {
  const excludedRows = new Set(entry.excluded.map((point) => point.row));
  return pointsOf(entry).filter((point) => !excludedRows.has(point.row));
}

/**
 * Previews of the orders not published (src/render/orderPreviews.ts): computed once when the dataset was fitted
 * and kept in the fit cache; computed here for an entry that holds its fit itself (tests).
 */
export function previewsOf(entry: CorrelationEntry, fit: PolynomialFit, selection: OrderSelection | null): OrderPreviews | null {
  if (isStoredFitReference(entry.fit)) return storedPreviews(entry.fit);
  return orderPreviews({ settings: entry.meta.fit, used: usedPoints(entry), range: entry.range }, fit, selection);
}

/** Unit suffix for text: "" for a dimensionless quantity (unit "1"), else " unit". */
export function unitSuffix(unit: string): string {
  return unit === '1' ? '' : ` ${unit}`;
}

const GREEK: Record<string, string> = {
  alpha: 'α', beta: 'β', gamma: 'γ', delta: 'δ', epsilon: 'ϵ', varepsilon: 'ε', zeta: 'ζ', eta: 'η', theta: 'θ',
  vartheta: 'ϑ', kappa: 'κ', lambda: 'λ', mu: 'μ', nu: 'ν', xi: 'ξ', pi: 'π', rho: 'ρ', sigma: 'σ', tau: 'τ',
  phi: 'ϕ', varphi: 'φ', chi: 'χ', psi: 'ψ', omega: 'ω', Gamma: 'Γ', Delta: 'Δ', Theta: 'Θ', Lambda: 'Λ',
  Xi: 'Ξ', Pi: 'Π', Sigma: 'Σ', Phi: 'Φ', Psi: 'Ψ', Omega: 'Ω',
};

/**
 * A TeX symbol as text for chart labels: Greek commands become Greek letters, other commands lose their backslash.
 * @example labelSymbol('\\varepsilon_{th}') // => "ε_th"
 */
export function labelSymbol(tex: string): string {
  const greek = tex.replace(/\\([A-Za-z]+)/g, (whole, name: string) => GREEK[name] ?? whole);
  return plainSymbol(greek.replace(/([Α-Ωα-ωϵϑϕ])\s+(?=[_^'])/g, '$1'));
}

/** "253.15 K ≤ T ≤ 373.15 K", with the symbol as plain text. */
export function rangeText(entry: CorrelationEntry): string {
  const unit = unitSuffix(entry.meta.variable.unit);
  return `${entry.range.min}${unit} ≤ ${plainSymbol(entry.meta.variable.symbol)} ≤ ${entry.range.max}${unit}`;
}

/** The notice without its "Invented data: " lead, for pages that set the lead in bold. */
export const INVENTED_NOTICE_BODY = INVENTED_NOTICE.replace(/^Invented data: (.)/, (_, first: string) => first.toUpperCase());

/** First letter upper-case, for names that start a sentence. @example capitalize('density') // => "Density" */
export function capitalize(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

/** Review status as words. */
export const REVIEW_LABELS: Record<string, string> = {
  draft: 'Draft',
  'in-review': 'In review',
  approved: 'Approved',
  withdrawn: 'Withdrawn',
};
