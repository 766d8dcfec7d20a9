/**
 * Numbers on the built correlation pages, read from the HTML and compared with the page's own download
 * (coefficients.json, full precision):
 * - R² and adjusted R² (statistics table, order table, order comparison) print the decimals that tell them apart
 *   from 1: two significant digits of 1 − R², at least three decimals (the rule of issue 12; the expected count
 *   is worked out here from the full-precision value, by hand: d = max(3, 1 − ⌊log₁₀(1 − R²)⌋)), correctly
 *   rounded;
 * - each end of a coefficient's interval is printed to the decimal place of the printed coefficient (no finer,
 *   and correctly rounded there);
 * - the order table's caption states the orders its rows mark as candidates, and the row of order 0 (the mean)
 *   says what the caption says about it. The candidate range is also recomputed from the documented rule
 *   (content/README.md `fit.maxOrder`; orders 1 to min(maxOrder, n − 2, distinct x − 1) for a fit with an
 *   intercept and no pass-through point).
 * Run from site.test.ts on the site it builds.
 */
import { readFile } from 'node:fs/promises';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import type { LoadedCorrelation } from '../../src/load/index.ts';

export interface NumberContext {
  /** The built site's output folder (the one holding correlations/). */
  readonly outDir: string;
  readonly correlations: readonly LoadedCorrelation[];
}

/** Text of an HTML fragment: tags dropped, the few entities Astro writes decoded. */
function textOf(html: string): string {
  return html
    .replace(/<[^>]*>/g, '')
    .replace(/&lt;/g, '<')
    .replace(/&gt;/g, '>')
    .replace(/&quot;/g, '"')
    .replace(/&#39;/g, "'")
    .replace(/&amp;/g, '&')
    .trim();
}

/** The first table whose class list holds `className`: its caption text and its body rows as cell texts. */
export function tableOf(html: string, className: string): { caption: string; rows: { attributes: string; cells: string[] }[] } | null {
  const match = new RegExp(`<table[^>]*class="[^"]*\\b${className}\\b[^"]*"[^>]*>([\\s\\S]*?)</table>`).exec(html);
  if (match === null) return null;
  const caption = textOf(/<caption[^>]*>([\s\S]*?)<\/caption>/.exec(match[1]!)?.[1] ?? '');
  const body = /<tbody[^>]*>([\s\S]*?)<\/tbody>/.exec(match[1]!)?.[1] ?? '';
  const rows = [...body.matchAll(/<tr([^>]*)>([\s\S]*?)<\/tr>/g)].map((row) => ({
    attributes: row[1]!,
    cells: [...row[2]!.matchAll(/<t[dh][^>]*>([\s\S]*?)<\/t[dh]>/g)].map((cell) => textOf(cell[1]!)),
  }));
  return { caption, rows };
}

/** Decimals after the point of a plain decimal text. @example decimals("0.99913") // => 5 */
function decimals(text: string): number {
  const dot = text.indexOf('.');
  return dot < 0 ? 0 : text.length - dot - 1;
}

/** The decimal place (power of ten) of the last digit written in a number text such as "-2422.701" or "1.5e-7". */
function writtenPlace(text: string): number {
  const [mantissa, exponent] = text.replace('−', '-').split(/e/i);
  return Number(exponent ?? 0) - decimals(mantissa!);
}

/** Check one printed R² against its full-precision value. */
function expectRSquared(printed: string, value: number, where: string): void {
  const gap = 1 - value;
  // Two significant digits of 1 − R² sit at decimal 1 − ⌊log₁₀ gap⌋ (gap 7.2e-6: decimals 7); at least three.
  const expected = gap > 0 ? Math.max(3, 1 - Math.floor(Math.log10(gap))) : 0;
  if (gap <= 0) {
    expect(printed, where).toBe('1');
    return;
  }
  expect(decimals(printed), `${where}: ${printed} for R² = ${value}`).toBe(Math.min(15, expected));
  // Correctly rounded at that place (a relative slack of 1e-9 for the double arithmetic of this check).
  expect(Math.abs(Number(printed) - value), `${where}: ${printed} for R² = ${value}`).toBeLessThanOrEqual(0.5 * 10 ** -decimals(printed) * (1 + 1e-9));
  expect(Number(printed), `${where}: ${printed} must not read as 1`).toBeLessThan(1);
}

export function describeNumbers(context: () => NumberContext): void {
  async function pageAndRecord(slug: string): Promise<{ html: string; record: Record<string, any> }> {
    const folder = path.join(context().outDir, 'correlations', slug);
    const html = await readFile(path.join(folder, 'index.html'), 'utf8');
    const record = JSON.parse(await readFile(path.join(folder, 'coefficients.json'), 'utf8')) as Record<string, any>;
    return { html, record };
  }

  describe('numbers printed on the correlation pages', () => {
    it('R² and adjusted R² to the digits that tell them apart from 1 (statistics table, order table, order comparison)', async () => {
      let checked = 0;
      for (const correlation of context().correlations) {
        const { html, record } = await pageAndRecord(correlation.slug);
        const statistics = tableOf(html, 'statistics');
        expect(statistics, correlation.slug).not.toBeNull();
        const cell = (name: RegExp) => statistics!.rows.find((row) => name.test(row.cells[0]!))?.cells[1];
        expectRSquared(cell(/^R²/)!, record.statistics.rSquared, `${correlation.slug} statistics R²`);
        expectRSquared(cell(/^adjusted R²/)!, record.statistics.adjustedRSquared, `${correlation.slug} statistics adjusted R²`);
        checked += 2;
        const orders = tableOf(html, 'orders');
        if (orders !== null) {
          const header = /<table[^>]*class="[^"]*\borders\b[\s\S]*?<thead[^>]*>([\s\S]*?)<\/thead>/.exec(html)![1]!;
          const names = [...header.matchAll(/<th[^>]*>([\s\S]*?)<\/th>/g)].map((th) => textOf(th[1]!));
          const r2 = names.indexOf('R²');
          const adjusted = names.indexOf('adj. R²');
          for (const row of orders.rows) {
            const order = Number(/data-order="(\d+)"/.exec(row.attributes)![1]);
            const full = record.orderSelection.orders.find((item: { order: number }) => item.order === order);
            expectRSquared(row.cells[r2]!, full.rSquared, `${correlation.slug} order ${order} R²`);
            expectRSquared(row.cells[adjusted]!, full.adjustedRSquared, `${correlation.slug} order ${order} adjusted R²`);
            checked += 2;
          }
        }
        const compare = /<tr data-stat="rSquared">([\s\S]*?)<\/tr>/.exec(html);
        if (compare !== null) {
          const published = [...compare[1]!.matchAll(/<td[^>]*>([\s\S]*?)<\/td>/g)][0]![1]!;
          expectRSquared(textOf(published), record.statistics.rSquared, `${correlation.slug} order comparison R²`);
        }
      }
      expect(checked).toBeGreaterThan(20);
    });

    it('each end of a coefficient interval to the decimal place of the printed coefficient', async () => {
      for (const correlation of context().correlations) {
        const { html, record } = await pageAndRecord(correlation.slug);
        const table = tableOf(html, 'coefficients');
        expect(table, correlation.slug).not.toBeNull();
        table!.rows.forEach((row, k) => {
          const [, printed, , , interval] = row.cells;
          if (interval === '—') return; // a coefficient fixed at 0
          // The printed coefficient's last digit, from its value and its significant digits (trailing zeros may be
          // dropped in the text, so the written place can be coarser than the true one).
          const value = Number(printed!.replace('−', '-'));
          const place = Math.floor(Math.log10(Math.abs(value))) - record.significantDigits[k] + 1;
          const ends = interval!.split(' to ');
          expect(ends, `${correlation.slug} a${k}: ${interval}`).toHaveLength(2);
          ends.forEach((end, side) => {
            const where = `${correlation.slug} a${k} (${printed}, last digit at 10^${place}): interval end ${end}`;
            expect(writtenPlace(end), where).toBeGreaterThanOrEqual(place);
            const full = record.confidenceIntervals[k][side] as number;
            expect(Math.abs(Number(end.replace('−', '-')) - full), where).toBeLessThanOrEqual(0.5 * 10 ** place * (1 + 1e-9));
          });
        });
      }
    });

    it('the order table: the caption states exactly the orders marked as candidates, and the order-0 row agrees with it', async () => {
      let withMean = 0;
      for (const correlation of context().correlations) {
        const { html } = await pageAndRecord(correlation.slug);
        const table = tableOf(html, 'orders');
        if (table === null) continue;
        const rows = table.rows.map((row) => ({ order: Number(/data-order="(\d+)"/.exec(row.attributes)![1]), candidate: row.cells[2]! }));
        const marked = rows.filter((row) => row.candidate === 'yes').map((row) => row.order);
        const range = /candidates: orders (\d+) to (\d+)/.exec(table.caption);
        const only = /the only candidate is order (\d+)/.exec(table.caption);
        const stated = range ? Array.from({ length: Number(range[2]) - Number(range[1]) + 1 }, (_, i) => Number(range[1]) + i) : only ? [Number(only[1])] : [];
        expect(marked, `${correlation.slug}: ${table.caption}`).toEqual(stated);
        const settings = correlation.meta.fit;
        if (settings.intercept && settings.passThrough.length === 0 && settings.order === 'auto') {
          const n = correlation.used.length;
          const distinct = new Set(correlation.used.map((point) => point.x)).size;
          const highest = Math.min(settings.maxOrder ?? 10, n - 2, distinct - 1);
          expect(stated, `${correlation.slug}: documented candidate range`).toEqual(Array.from({ length: highest }, (_, i) => i + 1));
        }
        const mean = rows.find((row) => row.order === 0);
        if (mean !== undefined) {
          withMean++;
          expect(mean.candidate, correlation.slug).toBe('if flat');
          expect(table.caption, correlation.slug).toContain('order 0, the mean, only if the data are flat');
          expect(table.caption).not.toMatch(/candidates: orders 0/);
        } else {
          expect(table.caption, correlation.slug).not.toContain('order 0');
        }
      }
      expect(withMean).toBeGreaterThan(0);
    });
  });
}
