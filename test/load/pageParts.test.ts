/**
 * A correlation page reads what it shows of the fit record's large parts (its data table, the previews'
 * statistics, whether a point states an uncertainty) from the page parts written with its downloads, through the
 * cache's packed JSON (src/loaders/correlationFolder.ts, src/loaders/writtenDownload.ts, src/load/packedJson.ts).
 * Checked on every correlation of the demo handbook: what the page reads back is exactly what the components compute
 * from the full record in this thread (the path `astro dev` and tests take), NaN, ±Infinity and −0 included.
 */
import { describe, expect, it } from 'vitest';
import { dataTableView } from '../../src/components/lib/dataRows.ts';
import { fitOf, pointsOf, previewsOf, selectionOf } from '../../src/components/lib/entryView.ts';
import { PAGE_PARTS_FILE, pageParts, type PageParts } from '../../src/components/lib/pageParts.ts';
import { previewView } from '../../src/components/lib/previewView.ts';
import { toCacheJson } from '../../src/load/fitCache.ts';
import { fromPackedJson } from '../../src/load/packedJson.ts';
import { correlationFolderFiles } from '../../src/loaders/correlationFolder.ts';
import { identityOf } from '../../src/components/lib/identityOf.ts';
import { handbookSettingsSchema } from '../../src/schema/index.ts';
import { demoEntriesForSuite } from '../helpers/demoEntries.ts';

const entries = demoEntriesForSuite('page-parts');

describe('page parts', () => {
  it('what a page reads back from its parts equals what the components compute from the full record', () => {
    expect(entries().length).toBeGreaterThan(10);
    const settings = handbookSettingsSchema.parse({});
    for (const entry of entries()) {
      // The text the folder writer writes, read back as the page reads it.
      const text = correlationFolderFiles(entry, identityOf(entry.slug, settings, settings.basePath, settings.url)).find((file) => file.file === PAGE_PARTS_FILE)!.text;
      const read = fromPackedJson(text) as PageParts;
      const parts = pageParts(entry, read.snippets);
      const fit = fitOf(entry)!;
      const selection = selectionOf(entry);
      expect(read.dataTable, entry.slug).toEqual(dataTableView(entry, fit));
      expect(read.previews, entry.slug).toEqual(previewView(previewsOf(entry, fit, selection)));
      expect(read.uncertainty, entry.slug).toBe(pointsOf(entry).some((point) => point.uncertainty !== undefined));
      expect(read, entry.slug).toEqual(parts);
      // Bit for bit and key for key: the text the cache's JSON (cacheJson.ts) writes of both is the same.
      expect(toCacheJson(read), entry.slug).toBe(toCacheJson(parts));
    }
  });

  it('the demo exercises what the parts must carry: shortened tables, flagged rows, notes, uncertainties and previews', () => {
    const tables = entries().map((entry) => pageParts(entry, {}).dataTable);
    expect(tables.some((table) => table.rows.length < table.used)).toBe(true);
    expect(tables.some((table) => table.flagged > 0)).toBe(true);
    expect(tables.some((table) => table.hasNote)).toBe(true);
    expect(tables.some((table) => table.hasUncertainty)).toBe(true);
    expect(entries().some((entry) => pageParts(entry, {}).previews !== null)).toBe(true);
  });
});
