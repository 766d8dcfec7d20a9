/**
 * The export record (src/export) of one stored entry: the pages' downloads go through the same serialiser as
 * `correlary fit --json` and handbook.json.
 */
import { correlationRecord, type CorrelationRecord, type HandbookIdentity } from '../../export/index.ts';
import { fitSummaryOf, selectionOf, type CorrelationEntry } from './entryView.ts';

/**
 * @param handbook the handbook identity the downloads carry (handbookIdentity.ts)
 * @throws Error when the entry has no fit (downloads exist only for fitted entries)
 */
export function entryRecord(entry: CorrelationEntry, handbook?: HandbookIdentity): CorrelationRecord {
  // The record has no per-point statistics: the summary serves (src/load/storedFit.ts).
  const fit = fitSummaryOf(entry);
  if (fit === null) throw new Error(`entryRecord requires a fit; ${entry.slug} has none`);
  return correlationRecord({ slug: entry.slug, meta: entry.meta, range: entry.range, excluded: entry.excluded, fit, selection: selectionOf(entry), reviewTrail: entry.reviewTrail, handbook });
}
