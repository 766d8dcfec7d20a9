/**
 * The catalogue's rows built as one string (catalogueRowsHtml) and the attribute writer under it (htmlAttribute).
 * Outside references: htmlAttribute against Astro's own addAttribute (astro/dist/runtime/server/render/util.js) on
 * random values and empty strings, except an http(s) address holding "&", which Astro leaves unescaped and
 * htmlAttribute escapes (a quote in it would end the attribute); the rows, parsed with parse5 (the HTML5 parsing
 * algorithm browsers use), hold each demo correlation's title, link, data attributes and status badge, and a hostile
 * title, material and tags stay text and attribute values (payloads: common practice, OWASP XSS filter evasion
 * cheat sheet, written from memory). The demo build compared byte for byte with the page's former row template.
 */
import fc from 'fast-check';
import { addAttribute } from 'astro/runtime/server/render/util.js';
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { parseFragment, type DefaultTreeAdapterMap } from 'parse5';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { catalogueRowsHtml } from '../../src/components/lib/catalogueRowsHtml.ts';
import { htmlAttribute } from '../../src/components/lib/htmlAttribute.ts';
import { statusBadgeView } from '../../src/components/lib/statusBadgeView.ts';
import { fitHandbook, handbookHistory } from '../../src/load/index.ts';
import { forgetStoredFits } from '../../src/load/storedFit.ts';
import { storedEntry } from '../../src/loaders/storedEntry.ts';
import { correlationEntrySchema, type CorrelationEntry } from '../../src/schema/index.ts';

type Node = DefaultTreeAdapterMap['node'];
type Element = DefaultTreeAdapterMap['element'];

const PAYLOADS = [`<script>alert("x")</script>`, `"><img src=x onerror=alert('x')>`, `</td></tr><b>x</b>`, `https://example.invalid/?a=1&b="2"`];

function elements(html: string): Element[] {
  const found: Element[] = [];
  const walk = (node: Node) => {
    if ('tagName' in node) found.push(node);
    if ('childNodes' in node) node.childNodes.forEach(walk);
  };
  walk(parseFragment(`<table><tbody>${html}</tbody></table>`) as unknown as Node);
  return found;
}
const textOf = (node: Node): string => ('value' in node && node.nodeName === '#text' ? node.value : 'childNodes' in node ? node.childNodes.map(textOf).join('') : '');
const attribute = (element: Element, name: string) => element.attrs.find((item) => item.name === name)?.value;

let root = '';
let entries: CorrelationEntry[] = [];
beforeAll(async () => {
  root = await mkdtemp(path.join(tmpdir(), 'correlary-catalogue-rows-'));
  const fitCache = { directory: path.join(root, 'fits'), version: 'test-1' };
  const handbook = await fitHandbook('content', { fitCache });
  const histories = await handbookHistory('content', handbook.datasets);
  entries = handbook.datasets
    .map((item) => storedEntry(item, fitCache.directory, histories))
    .filter((entry): entry is CorrelationEntry => entry !== undefined)
    .map((entry) => correlationEntrySchema.parse(entry) as CorrelationEntry);
}, 120_000);
afterAll(async () => {
  forgetStoredFits();
  if (root) await rm(root, { recursive: true, force: true });
});

describe('htmlAttribute', () => {
  it('htmlAttribute(key, value) is what Astro addAttribute writes, on random strings and numbers', () => {
    const text = fc.oneof(
      fc.string({ unit: fc.constantFrom('a', ' ', '&', '"', "'", '<', '>', '=', '/', ':', '≤') }),
      fc.constantFrom('', 'https://example.org/?a=1&b=2', 'http://x/&"', 'ftp://x/&y', 'javascript:a&b'),
    );
    const value = fc.oneof(text, fc.double({ noNaN: true }), fc.integer(), fc.constant(undefined), fc.constant(null));
    fc.assert(
      fc.property(fc.constantFrom('data-tags', 'title', 'href', 'class', 'data-value'), value, (key, item) => {
        const astroHttp = typeof item === 'string' && item.includes('&') && /^https?:/.test(item);
        if (!astroHttp) expect(htmlAttribute(key, item)).toBe(String(addAttribute(item, key)));
        else expect(htmlAttribute(key, item)).toBe(` ${key}="${item.replace(/&/g, '&#38;').replace(/"/g, '&#34;')}"`);
      }),
      { numRuns: 1000 },
    );
  });
});

describe('catalogueRowsHtml', () => {
  it('holds every demo correlation: its link, title, data attributes and status badge', () => {
    expect(entries.length).toBeGreaterThan(10);
    const found = elements(catalogueRowsHtml(entries, '/hb/'));
    const rows = found.filter((element) => element.tagName === 'tr');
    expect(rows.map((row) => attribute(row, 'data-slug'))).toEqual(entries.map((entry) => entry.slug));
    rows.forEach((row, i) => {
      const entry = entries[i]!;
      expect(JSON.parse(attribute(row, 'data-tags')!)).toEqual(entry.meta.tags);
      expect(attribute(row, 'data-material')).toBe(entry.meta.material.name);
      const cells = row.childNodes.filter((node): node is Element => 'tagName' in node && node.tagName === 'td');
      expect(cells.length).toBe(7);
      expect(textOf(cells[0]!)).toBe(entry.meta.invented ? `${entry.meta.title} invented data` : entry.meta.title);
      const link = cells[0]!.childNodes.find((node): node is Element => 'tagName' in node && node.tagName === 'a')!;
      expect(attribute(link, 'href')).toBe(`/hb/correlations/${entry.slug}/`);
      const view = statusBadgeView(entry.meta.review.status, undefined, entry.reviewTrail, entry.meta.review.replacedBy);
      expect(textOf(cells[6]!)).toBe(`${view.mark} ${view.text}`);
    });
  });

  it('escapes an http(s) address holding "&" and a quote, which Astro 5.18 would write unescaped', () => {
    const payload = 'https://example.invalid/?a=1&b="><img src=x onerror=alert(1)>';
    expect(String(addAttribute(payload, 'data-material'))).toContain('"><img');
    expect(htmlAttribute('data-material', payload)).toBe(' data-material="https://example.invalid/?a=1&#38;b=&#34;><img src=x onerror=alert(1)>"');
  });

  it('keeps hostile titles, materials and tags as text and attribute values', () => {
    const entry = entries[0]!;
    for (const payload of PAYLOADS) {
      const hostile = { ...entry, meta: { ...entry.meta, title: payload, material: { ...entry.meta.material, name: payload }, tags: [payload] } } as CorrelationEntry;
      const found = elements(catalogueRowsHtml([hostile], '/'));
      expect(new Set(found.map((element) => element.tagName))).toEqual(new Set(['table', 'tbody', 'tr', 'td', 'a', 'span']));
      const row = found.find((element) => element.tagName === 'tr')!;
      expect(attribute(row, 'data-material')).toBe(payload);
      expect(JSON.parse(attribute(row, 'data-tags')!)).toEqual([payload]);
      expect(textOf(row)).toContain(payload);
    }
  });
});
