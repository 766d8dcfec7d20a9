/**
 * Review status wherever a correlation is listed besides the catalogue (checked in site.test.ts; its search
 * results are rows of that same table): each property page lists its correlations with a worded status badge, and
 * the rows of correlations whose approval does not hold (draft, in review, withdrawn, unbound or lapsed approval)
 * are set apart like the catalogue's. Whether an approval holds comes from `correlary check`'s own reading
 * (fitHandbook), the words from the status each correlation.yaml states (content/README.md, review.status).
 */
import { readFile, readdir } from 'node:fs/promises';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { fitHandbook, type LoadedCorrelation } from '../../src/load/index.ts';

export interface ListingContext {
  readonly outDir: string;
  readonly content: string;
  readonly correlations: readonly LoadedCorrelation[];
}

export function describeListings(context: () => ListingContext): void {
  describe('review status on the property pages', () => {
    it('every property page row carries a worded status badge, and rows whose approval does not hold are set apart', async () => {
      const { outDir, content, correlations } = context();
      const checked = await fitHandbook(content);
      const holds = (slug: string) => checked.datasets.find((dataset) => dataset.dataset.slug === slug)!.review!.approval.state === 'holds';
      const folders = (await readdir(path.join(outDir, 'properties'), { withFileTypes: true })).filter((entry) => entry.isDirectory());
      let rows = 0;
      let setApart = 0;
      for (const folder of folders) {
        const html = await readFile(path.join(outDir, 'properties', folder.name, 'index.html'), 'utf8');
        // One table per pair of units on the page.
        const tables = [...html.matchAll(/<table class="property-table"[\s\S]*?<\/table>/g)].map((match) => match[0]).join('');
        for (const [, attributes, body] of tables.matchAll(/<tr([^>]*data-slug="[^"]+"[^>]*)>([\s\S]*?)<\/tr>/g)) {
          const slug = /data-slug="([^"]+)"/.exec(attributes!)![1]!;
          const correlation = correlations.find((item) => item.slug === slug)!;
          expect(correlation, `${folder.name}: ${slug}`).toBeDefined();
          expect(body, `${folder.name}: ${slug}`).toContain(`data-status="${correlation.meta.review.status}"`);
          expect(body, `${folder.name}: ${slug}`).toMatch(holds(slug) ? /<\/span> Approved<\/span>/ : /<\/span> [^<]*not approved|do not use[^<]*<\/span>/);
          expect(/class="[^"]*not-approved/.test(attributes!), `${folder.name}: ${slug} set apart`).toBe(!holds(slug));
          rows++;
          if (!holds(slug)) setApart++;
        }
      }
      // Every correlation with a fit is listed on its property's page, once.
      expect(rows).toBe(checked.datasets.filter((dataset) => dataset.fitted?.fit !== undefined).length);
      expect(setApart).toBeGreaterThan(0);
    });
  });
}
