/**
 * The content store's entry for one correlation that was read and fitted: what the correlation pages, lists and
 * downloads are made from. The large parts (the fit, its order table and previews, the data rows) stay in the fit
 * cache and the entry refers to them, so that Astro's store, the module it is bundled into and every getCollection
 * copy stay small. The content loader makes every entry with this (and bench:files makes its entries the same way).
 */
import type { FittedDataset } from '../load/fitHandbook.ts';
import type { CorrelationEntry, StoredHistory } from '../schema/index.ts';

/**
 * @param fitCacheDirectory the fit cache the records are in
 * @param histories the correlations' histories from git, by slug (handbookHistory)
 * @returns the entry, or undefined for a folder that could not be read or fitted
 * @example storedEntry(handbook.datasets[0], cache.directory, histories)?.fit // => { fitCache: { directory, key } }
 */
export function storedEntry(item: FittedDataset, fitCacheDirectory: string, histories: ReadonlyMap<string, unknown>): CorrelationEntry | undefined {
  const { dataset, fitted, review } = item;
  const correlation = dataset.correlation;
  if (correlation === undefined || fitted === undefined || review === undefined) return undefined;
  const reference = fitted.cacheKey === undefined ? undefined : { fitCache: { directory: fitCacheDirectory, key: fitted.cacheKey } };
  // Known without reading the fit where the handbook pass says so (an unchanged folder's fit is read when asked for).
  const hasFit = fitted.outcome?.fit ?? fitted.fit !== undefined;
  const hasSelection = fitted.outcome?.selection ?? fitted.selection !== undefined;
  return {
    slug: correlation.slug,
    meta: correlation.meta,
    points: reference ?? [...correlation.points],
    excluded: [...correlation.excluded],
    dataRange: correlation.dataRange,
    range: correlation.range,
    warnings: [...correlation.warnings, ...fitted.diagnostics.filter((diagnostic) => diagnostic.severity === 'warning')],
    fit: !hasFit || reference === undefined ? null : reference,
    orderSelection: !hasSelection || reference === undefined ? null : reference,
    reviewTrail: {
      fingerprint: review.fingerprint?.text ?? null,
      approval: review.approval.state,
      lapseReasons: review.approval.state === 'lapsed' ? [...review.approval.reasons] : [],
    },
    history: histories.get(correlation.slug) as StoredHistory | undefined,
  };
}
