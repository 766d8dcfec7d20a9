/**
 * A folder's fit cache record (src/load/fitCache.ts): the fit, the previews of the orders not published
 * (computed here once per dataset, not on every page render) and every data row.
 */
import { orderPreviews } from '../render/orderPreviews.ts';
import type { CachedFit } from './fitCache.ts';
import type { DatasetFit } from './fitDataset.ts';
import type { LoadedCorrelation } from './types.ts';

/** @example cacheRecord(correlation, fitDataset(correlation)).previews?.published // => 3 */
export function cacheRecord(correlation: LoadedCorrelation, fitted: DatasetFit): CachedFit {
  const previews = fitted.fit === undefined ? null : orderPreviews({ settings: correlation.meta.fit, used: correlation.used, range: correlation.range }, fitted.fit, fitted.selection);
  return { fit: fitted.fit, selection: fitted.selection, diagnostics: fitted.diagnostics, points: correlation.points, previews };
}
