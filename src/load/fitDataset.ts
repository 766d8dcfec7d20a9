/**
 * Fit a validated correlation: choose the order (or take the fixed one), then fit it with the pass-through
 * constraints. Core failures become file messages: a FitError naming a point points at that point's data line.
 */
import { FitError, fitPolynomial, selectOrder, temperatureScaleOf, type FitData, type OrderSelection, type PolynomialFit } from '../core/index.ts';
import { error, warning, type Diagnostic } from './diagnostic.ts';
import type { LoadedCorrelation } from './types.ts';

export interface DatasetFit {
  /** The fit, or undefined when the core refused the data. */
  readonly fit: PolynomialFit | undefined;
  /** The order table and the reason for the chosen order. */
  readonly selection: OrderSelection | undefined;
  /** Errors (the fit failed) and warnings from the order selector and the fit. */
  readonly diagnostics: readonly Diagnostic[];
  /** Key of this result in the fit cache, when it went through one (src/load/fitCache.ts). */
  readonly cacheKey?: string;
  /**
   * Whether `fit` and `selection` are defined, when that is known without reading them: an unchanged folder's fit
   * is read from the fit cache only when something asks for it (src/load/fitHandbook.ts).
   */
  readonly outcome?: { readonly fit: boolean; readonly selection: boolean };
}

/** Turn a FitError into a message at the data line of its point, or at fit.order in the metadata. */
function fitErrorDiagnostic(correlation: LoadedCorrelation, caught: FitError): Diagnostic {
  const point = caught.pointIndex === undefined ? undefined : correlation.used[caught.pointIndex];
  if (point !== undefined) {
    return error(correlation.dataPath, { line: point.line }, `cannot fit this point: ${caught.message}`);
  }
  return error(correlation.metadataPath, correlation.orderPosition, `cannot fit: ${caught.message}`);
}

/**
 * Fit one loaded correlation.
 * @example fitDataset(loaded).fit?.order // => 3
 */
export function fitDataset(correlation: LoadedCorrelation): DatasetFit {
  const fitSettings = correlation.meta.fit;
  const data: FitData = {
    x: correlation.used.map((point) => point.x),
    y: correlation.used.map((point) => point.y),
    uncertainty: fitSettings.weights === 'uncertainty' ? correlation.used.map((point) => point.uncertainty ?? NaN) : undefined,
  };
  const common = {
    intercept: fitSettings.intercept,
    transformX: fitSettings.transform.x,
    transformY: fitSettings.transform.y,
  };
  const constraints = fitSettings.passThrough.map((point) => ({ x: point.x, y: point.y }));
  const diagnostics: Diagnostic[] = [];
  let selection: OrderSelection | undefined;
  let fit: PolynomialFit | undefined;
  try {
    selection = selectOrder(data, {
      ...common,
      maxOrder: fitSettings.maxOrder,
      ...(fitSettings.criterion === undefined ? {} : { criterion: fitSettings.criterion }),
      ...(typeof fitSettings.order === 'number' ? { fixedOrder: fitSettings.order, reason: fitSettings.reason ?? '' } : {}),
      constraints,
    });
    fit = fitPolynomial(data, {
      ...common,
      order: selection.order,
      constraints,
      range: correlation.range,
      // χ² mode: the stated uncertainties are taken as known, so coefficient uncertainties and bands are not rescaled.
      uncertaintyScale: fitSettings.criterion === 'chiSquare' ? 'stated' : 'scatter',
      // A relative uncertainty stated in the metadata is the model of the local uncertainty of a weighted fit.
      ...(fitSettings.weights === 'uncertainty' && correlation.meta.uncertainty?.relative !== undefined ? { uncertaintyModel: { relative: correlation.meta.uncertainty.relative } } : {}),
      // x in K, °C or °F: the fit also carries its polynomial in the other two scales (exact substitution).
      temperatureScale: temperatureScaleOf(correlation.meta.variable.unit) ?? undefined,
    });
  } catch (caught) {
    if (caught instanceof FitError) diagnostics.push(fitErrorDiagnostic(correlation, caught));
    else {
      // Not the data's fault: say so, and let the other correlations be checked.
      const message = caught instanceof Error ? caught.message : String(caught);
      diagnostics.push(error(correlation.metadataPath, correlation.orderPosition, `internal error while fitting: ${message}`));
    }
  }
  const coreWarnings = [...(selection?.warnings ?? []), ...(fit?.warnings ?? [])];
  for (const text of coreWarnings) {
    diagnostics.push(warning(correlation.metadataPath, correlation.orderPosition, text.replace(/\.$/, '')));
  }
  return { fit, selection, diagnostics };
}
