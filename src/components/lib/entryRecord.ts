/**
 * The export record (src/export) of one stored entry: the pages' downloads go through the same serialiser as
 * `correlary fit --json` and handbook.json.
 */
import { correlationRecord, type CorrelationRecord } from '../../export/index.ts';
import { fitOf, selectionOf, type CorrelationEntry } from './entryView.ts';

/** @throws Error when the entry has no fit (downloads exist only for fitted entries) */
export function entryRecord(entry: CorrelationEntry): CorrelationRecord {
  const fit = fitOf(entry);
  if (fit === null) throw new Error(`entryRecord requires a fit; ${entry.slug} has none`);
  return correlationRecord({ slug: entry.slug, meta: entry.meta, range: entry.range, excluded: entry.excluded, fit, selection: selectionOf(entry), reviewTrail: entry.reviewTrail });
}
