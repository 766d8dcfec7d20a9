/**
 * The rows of a page's tables built as HTML ahead of the page (pageHtml.ts and its row functions). Checked against
 * outside references: htmlText against Astro's own escapeHTML (html-escaper's escape), with which it escapes every text expression
 * with (astro/dist/runtime/server/escape.js), on random text; every row function's HTML, parsed with parse5 (the
 * HTML5 parsing algorithm browsers use) inside its table, gives rows whose cells hold the texts the components
 * print, on every correlation of the demo handbook and on rows carrying hostile notes and units (payloads: common
 * practice, OWASP XSS filter evasion cheat sheet, written from memory), which stay text.
 */
import fc from 'fast-check';
import { escapeHTML } from 'astro/runtime/server/escape.js';
import { parseFragment, type DefaultTreeAdapterMap } from 'parse5';
import { describe, expect, it } from 'vitest';
import { checkValueRowsHtml } from '../../src/components/lib/checkValueRowsHtml.ts';
import { dataTableView } from '../../src/components/lib/dataRows.ts';
import { fitOf, selectionOf } from '../../src/components/lib/entryView.ts';
import { formatExact, formatNumber } from '../../src/components/lib/formatNumber.ts';
import { htmlText } from '../../src/components/lib/htmlText.ts';
import { pageHtml, pageHtmlText, readPageHtml } from '../../src/components/lib/pageHtml.ts';
import { statisticsRowsHtml } from '../../src/components/lib/statisticsRowsHtml.ts';
import { dataRowsHtml } from '../../src/components/lib/dataRowsHtml.ts';
import { demoEntriesForSuite } from '../helpers/demoEntries.ts';

type Node = DefaultTreeAdapterMap['node'];
type Element = DefaultTreeAdapterMap['element'];

const PAYLOADS = [`<script>alert("x")</script>`, `"><img src=x onerror=alert('x')>`, `</td></tr></tbody><b>x</b>`, `&amp; &lt; ' "`];

/** The rows of `html` inside a table body: each row's class and its cells' texts; also every element's tag. */
function rowsOf(html: string): { rows: { className: string | undefined; cells: string[] }[]; tags: string[] } {
  const table = parseFragment(`<table><tbody>${html}</tbody></table>`) as unknown as Element;
  const tags: string[] = [];
  const textOf = (node: Node): string => ('value' in node && node.nodeName === '#text' ? node.value : 'childNodes' in node ? node.childNodes.map(textOf).join('') : '');
  const rows: { className: string | undefined; cells: string[] }[] = [];
  const walk = (node: Node) => {
    if (!('tagName' in node)) return;
    tags.push(node.tagName);
    if (node.tagName === 'tr') rows.push({ className: node.attrs.find((a) => a.name === 'class')?.value, cells: node.childNodes.filter((c): c is Element => 'tagName' in c && c.tagName === 'td').map(textOf) });
    node.childNodes.forEach(walk);
  };
  (table as unknown as { childNodes: Node[] }).childNodes.forEach(walk);
  return { rows, tags };
}

const entries = demoEntriesForSuite('page-html');

describe('htmlText', () => {
  it('htmlText(text) is Astro escapeHTML(text), as Astro escapes an expression, on random text', () => {
    const text = fc.string({ unit: fc.constantFrom('a', ' ', '&', '<', '>', "'", '"', ';', '#', '≤', '😀', '\n') });
    fc.assert(fc.property(text, (value) => {
        expect(htmlText(value)).toBe(escapeHTML(value));
      }), { numRuns: 500 });
  });
});

describe('pageHtml', () => {
  it('every demo correlation: each table body parses to its rows, with the texts the components print', () => {
    expect(entries().length).toBeGreaterThan(10);
    for (const entry of entries()) {
      const fit = fitOf(entry)!;
      const html = pageHtml(entry);
      const view = dataTableView(entry, fit);
      const data = rowsOf(html.dataRows);
      expect(data.rows.length, entry.slug).toBe(view.rows.length);
      data.rows.forEach((row, i) => {
        const source = view.rows[i]!;
        expect(row.className, entry.slug).toBe(source.flagged ? 'flagged' : undefined);
        expect(row.cells, entry.slug).toEqual([
          String(source.point.row),
          formatExact(source.point.x),
          formatExact(source.point.y),
          ...(view.hasUncertainty ? [formatExact(source.point.uncertainty)] : []),
          ...[source.residual, source.studentized, source.leverage, source.cook].map((value) => formatNumber(value, 3)),
          ...(view.hasNote ? [source.point.note ?? ''] : []),
        ]);
      });
      const coefficients = rowsOf(html.coefficientRows).rows;
      expect(coefficients.map((row) => row.cells[1]), entry.slug).toEqual([...fit.printedCoefficients]);
      expect(rowsOf(html.mappedRows).rows.map((row) => row.cells), entry.slug).toEqual(fit.mapped.coefficients.map((b, k) => [String(k), formatExact(b)]));
      expect(rowsOf(html.checkValueRows).rows.map((row) => [row.cells[0], row.cells[1], row.cells[3]]), entry.slug).toEqual(
        fit.checkValues.map((check, i) => [formatExact(check.x), fit.printedCheckValues[i]?.y ?? '—', formatExact(check.y)]),
      );
      const statistics = rowsOf(html.statisticsRows).rows;
      expect(statistics[0]!.cells, entry.slug).toEqual(['n (points used)', String(fit.statistics.n), '']);
      const selection = selectionOf(entry);
      if (selection) {
        const orders = rowsOf(html.orderRows!).rows;
        expect(orders.map((row) => row.cells[0]), entry.slug).toEqual(selection.orders.map((row) => `${row.order}${row.order === fit.order ? ' (chosen)' : ''}`));
        expect(orders.filter((row) => row.className === 'chosen').length, entry.slug).toBe(1);
        expect(orders.every((row) => row.cells.length === (selection.weighted ? 13 : 11)), entry.slug).toBe(true);
      }
    }
  });

  it('hostile notes and units stay text: no element beyond the table rows, and the text comes back whole', () => {
    const entry = entries().find((item) => dataTableView(item, fitOf(item)!).hasNote)!;
    const fit = fitOf(entry)!;
    const view = dataTableView(entry, fit);
    for (const payload of PAYLOADS) {
      const hostile = { ...view, rows: view.rows.map((row) => ({ ...row, point: { ...row.point, note: payload } })) };
      const data = rowsOf(dataRowsHtml(hostile));
      expect(new Set(data.tags)).toEqual(new Set(['table', 'tbody', 'tr', 'td']));
      expect(data.rows.every((row) => row.cells.at(-1) === payload)).toBe(true);
      const statistics = rowsOf(statisticsRowsHtml(fit, payload));
      expect(new Set(statistics.tags)).toEqual(new Set(['table', 'tbody', 'tr', 'td']));
      expect(statistics.rows.some((row) => row.cells[0] === `largest |residual| (${payload})`)).toBe(true);
    }
  });

  it('readPageHtml(pageHtmlText(html)) gives the pieces back, on the demo and on random text; anything else is refused', () => {
    for (const entry of entries()) {
      const html = pageHtml(entry);
      expect(readPageHtml(pageHtmlText(html)), entry.slug).toEqual(html);
    }
    const piece = fc.string({ unit: fc.constantFrom('a', '\n', '"', '[', ']', '😀', '≤', '<') });
    const html = fc.record({ dataRows: piece, coefficientRows: piece, mappedRows: piece, checkValueRows: piece, statisticsRows: piece, orderRows: fc.option(piece, { nil: null }) });
    fc.assert(
      fc.property(html, (value) => {
        expect(readPageHtml(pageHtmlText(value))).toEqual(value);
        // Through the file's bytes, as the page reads it.
        expect(readPageHtml(Buffer.from(pageHtmlText(value)).toString('utf8'))).toEqual(value);
      }),
      { numRuns: 300 },
    );
    const text = pageHtmlText(pageHtml(entries()[0]!));
    expect(readPageHtml(text.slice(0, -1))).toBeUndefined();
    expect(readPageHtml(`${text}x`)).toBeUndefined();
    expect(readPageHtml('not a header')).toBeUndefined();
  });

  it('checkValueRowsHtml writes a missing printed check value as a dash', () => {
    const html = checkValueRowsHtml({ checkValues: [{ x: 1, y: 2 }], printedCheckValues: [] });
    expect(rowsOf(html).rows[0]!.cells).toEqual(['1', '—', '—', '2', '—']);
  });
});
