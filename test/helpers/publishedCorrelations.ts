/**
 * Every fitted correlation of a handbook folder with its export record and snippet source, built as the site and
 * the downloads build them (fitHandbook → correlationRecord → snippetSource), for the tests that run the snippets.
 * @example for (const { fit, record, source } of await publishedCorrelations('content')) pythonSnippet(source);
 */
import type { PolynomialFit } from '../../src/core/index.ts';
import { correlationRecord, snippetSource, type CorrelationRecord } from '../../src/export/index.ts';
import { fitHandbook } from '../../src/load/index.ts';

export interface PublishedCorrelation {
  readonly fit: PolynomialFit;
  readonly record: CorrelationRecord;
  readonly source: ReturnType<typeof snippetSource>;
}

export async function publishedCorrelations(directory: string): Promise<PublishedCorrelation[]> {
  const handbook = await fitHandbook(directory);
  const published: PublishedCorrelation[] = [];
  for (const { dataset, fitted } of handbook.datasets) {
    const loaded = dataset.correlation;
    if (loaded === undefined || fitted?.fit === undefined) continue;
    const fit = fitted.fit;
    const record = correlationRecord({ slug: loaded.slug, meta: loaded.meta, range: loaded.range, excluded: loaded.excluded, fit, selection: fitted.selection ?? null });
    published.push({ fit, record, source: snippetSource(fit, record) });
  }
  return published;
}

/** |value − reference| / |reference|, or |value| when the reference is 0. @example relativeError(1.1, 1) // => about 0.1 */
export function relativeError(value: number, reference: number): number {
  return reference === 0 ? Math.abs(value) : Math.abs(value - reference) / Math.abs(reference);
}
