/**
 * Reading and reviewing the built handbook in Debian's Chromium (playwright-core): search, filters in the URL,
 * zoom and reset, the property page, the order preview, no console errors, and an axe-core accessibility check.
 * Run from site.test.ts on the site it builds (one build for both: concurrent builds of one package share Astro's
 * staging folder). Every expected value is derived from the correlations as the loader read them (which material
 * to search for, which filter narrows, which property has several sources), so the checks hold for any content
 * with one property of several correlations and one material of several.
 */
import { mkdir } from 'node:fs/promises';
import { createRequire } from 'node:module';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import type { LoadedCorrelation } from '../../src/load/index.ts';
import { propertyKey } from '../../src/components/lib/propertyKey.ts';
import { serveDirectory } from './staticServer.ts';
import { CHROMIUM, launchChromium } from '../helpers/chromium.ts';

const require = createRequire(import.meta.url);
/** Screenshots for a person to look at; kept in the OS temp folder, never in the repository. */
export const SCREENSHOTS = path.join(process.env['TMPDIR'] ?? '/tmp', 'correlary-screenshots');

/** What the site test hands over: the served root, the base path and the correlations it built. */
export interface ReadingContext {
  readonly siteRoot: string;
  readonly base: string;
  readonly correlations: readonly LoadedCorrelation[];
}

let BASE = '/';
let correlations: readonly LoadedCorrelation[] = [];
let browser: Browser | undefined;
let server: { url: string; close: () => Promise<void> } | undefined;

/** A page that records console errors, failed requests and uncaught exceptions. */
async function open(url: string, waitUntil: 'load' | 'networkidle' = 'networkidle'): Promise<{ page: Page; errors: string[] }> {
  const page = await browser!.newPage({ viewport: { width: 1280, height: 900 } });
  const errors: string[] = [];
  page.on('pageerror', (error) => errors.push(String(error)));
  page.on('console', (message) => {
    if (message.type() === 'error') errors.push(message.text());
  });
  page.on('response', (response) => {
    if (response.status() >= 400) errors.push(`HTTP ${response.status()} ${response.url()}`);
  });
  await page.goto(`${server!.url}${BASE}${url.replace(/^\//, '')}`, { waitUntil });
  return { page, errors };
}

async function catalogueReady(page: Page): Promise<void> {
  await page.locator('[data-catalogue-controls][data-ready="true"]').waitFor({ state: 'attached', timeout: 10_000 });
}

async function visibleSlugs(page: Page): Promise<string[]> {
  return page.locator('[data-catalogue-table] tbody tr:not([hidden])').evaluateAll((rows) => rows.map((row) => (row as HTMLElement).dataset['slug'] ?? ''));
}

/** Materials with their correlations' slugs, fewest first. */
function materials(): [string, string[]][] {
  const map = new Map<string, string[]>();
  for (const c of correlations) map.set(c.meta.material.name, [...(map.get(c.meta.material.name) ?? []), c.slug]);
  return [...map.entries()].sort((a, b) => a[1].length - b[1].length || a[0].localeCompare(b[0]));
}

/** The property key with the most correlations. */
function busiestProperty(): [string, LoadedCorrelation[]] {
  const map = new Map<string, LoadedCorrelation[]>();
  for (const c of correlations) map.set(propertyKey(c.meta.property), [...(map.get(propertyKey(c.meta.property)) ?? []), c]);
  return [...map.entries()].sort((a, b) => b[1].length - a[1].length || a[0].localeCompare(b[0]))[0]!;
}

/** Register the reading checks; `context` is called once the site is built. */
export function describeReading(context: () => ReadingContext): void {
describe(`reading the handbook in Chromium (${CHROMIUM})`, () => {
  beforeAll(async () => {
    const given = context();
    BASE = given.base;
    correlations = given.correlations;
    server = await serveDirectory(given.siteRoot);
    browser = await launchChromium();
    await mkdir(SCREENSHOTS, { recursive: true });
  }, 60_000);

  afterAll(async () => {
    await browser?.close();
    await server?.close();
  });

  it('the catalogue search finds a correlation by its material', async () => {
    const { page, errors } = await open('/');
    await catalogueReady(page);
    // The material with the fewest correlations, searched by the first word of its name.
    const [material, expected] = materials()[0]!;
    const word = material.split(/[\s(]+/)[0]!.toLowerCase();
    await page.locator('#catalogue-q').fill(word);
    await page.waitForFunction((q) => new URLSearchParams(location.search).get('q') === q, word);
    const found = await visibleSlugs(page);
    for (const slug of expected) expect(found, `${word} finds ${slug}`).toContain(slug);
    expect(found.length).toBeLessThan(correlations.length);
    // Each result shows its review status in words (issue 12: a badge wherever a correlation is listed).
    const badges = await page.locator('[data-catalogue-table] tbody tr:not([hidden]) .status-badge').allTextContents();
    expect(badges).toHaveLength(found.length);
    for (const text of badges) expect(text).toMatch(/Approved|not approved|do not use/);
    await page.screenshot({ path: path.join(SCREENSHOTS, 'catalogue-search.png'), fullPage: true });
    expect(errors).toEqual([]);
    await page.close();
  });

  it('a filter narrows the catalogue, goes into the URL and survives a reload', async () => {
    const { page, errors } = await open('/');
    await catalogueReady(page);
    const all = await visibleSlugs(page);
    expect(all).toHaveLength(correlations.length);
    const [material, slugs] = materials().filter(([, list]) => list.length > 1).at(-1)!;
    const expected = [...slugs].sort();
    expect(expected.length).toBeGreaterThan(1);
    expect(expected.length).toBeLessThan(correlations.length);
    await page.locator('#catalogue-material').selectOption(material);
    expect((await visibleSlugs(page)).sort()).toEqual(expected);
    expect(new URL(page.url()).searchParams.get('material')).toBe(material);
    // Sort by n, largest first, by keyboard: focus the header button and press Enter twice.
    const sortN = page.getByRole('button', { name: 'Sort by n' });
    await sortN.focus();
    await page.keyboard.press('Enter');
    await page.keyboard.press('Enter');
    const sizes = Object.fromEntries(correlations.map((c) => [c.slug, c.used.length]));
    const sorted = await visibleSlugs(page);
    expect(sorted.map((slug) => sizes[slug])).toEqual([...sorted.map((slug) => sizes[slug]!)].sort((a, b) => b - a));
    await page.reload({ waitUntil: 'networkidle' });
    await catalogueReady(page);
    expect(await page.locator('#catalogue-material').inputValue()).toBe(material);
    expect(await visibleSlugs(page)).toEqual(sorted);
    expect(await page.locator('[data-catalogue-count]').textContent()).toContain(`${expected.length} of ${correlations.length}`);
    await page.screenshot({ path: path.join(SCREENSHOTS, 'catalogue-filtered.png'), fullPage: true });
    expect(errors).toEqual([]);
    await page.close();
  });

  it('zoom by button and keyboard changes the axes, and reset restores them', async () => {
    const target = correlations[0]!;
    const { page, errors } = await open(`/correlations/${target.slug}/`);
    const svg = page.locator('[data-fit-chart] svg').first();
    await svg.waitFor();
    // The x axis's tick labels and positions: any zoom or pan moves them.
    const ticks = () => svg.locator('.axes g').first().locator('.tick').evaluateAll((nodes) => nodes.map((node) => `${node.textContent}@${node.getAttribute('transform')}`));
    const before = await ticks();
    await page.getByRole('button', { name: 'Zoom in' }).click();
    await page.getByRole('button', { name: 'Zoom in' }).click();
    const zoomed = await ticks();
    expect(zoomed).not.toEqual(before);
    await svg.focus();
    await page.keyboard.press('ArrowRight');
    expect(await ticks()).not.toEqual(zoomed);
    await page.screenshot({ path: path.join(SCREENSHOTS, 'chart-zoomed.png') });
    await page.getByRole('button', { name: 'Reset zoom to the whole chart' }).click();
    expect(await ticks()).toEqual(before);
    await svg.focus();
    await page.keyboard.press('+');
    expect(await ticks()).not.toEqual(before);
    await page.keyboard.press('0');
    expect(await ticks()).toEqual(before);
    expect(errors).toEqual([]);
    await page.close();
  });

  it('choosing another order draws its curve and residuals and shows its statistics; back restores the published order', async () => {
    // A correlation whose order table has at least one other order (every automatic choice with n > 4 has).
    const target = correlations.find((c) => c.used.length <= 400 && c.used.length >= 10)!;
    const { page, errors } = await open(`/correlations/${target.slug}/`);
    await page.locator('[data-order-preview][data-ready="true"]').waitFor({ timeout: 10_000 });
    const svg = page.locator('[data-fit-chart] svg').first();
    const previewCurve = () => svg.locator('path.preview-curve').getAttribute('d');
    const compare = () => page.locator('.order-compare [data-compare-value]').allTextContents();
    expect(await previewCurve()).toBe('');
    expect(new Set(await compare())).toEqual(new Set(['—']));
    const published = Number(await page.locator('[data-preview-order][aria-pressed="true"]').getAttribute('data-preview-order'));
    const other = page.locator(`[data-preview-order]:not([aria-pressed="true"]):not([disabled])`).first();
    const order = Number(await other.getAttribute('data-preview-order'));
    expect(order).not.toBe(published);
    // By keyboard: focus the button and press Enter.
    await other.focus();
    await page.keyboard.press('Enter');
    expect((await previewCurve())!.length).toBeGreaterThan(50);
    expect((await page.locator('[data-fit-chart] svg').nth(1).locator('path.preview-residuals').getAttribute('d'))!.length).toBeGreaterThan(10);
    const shown = await compare();
    expect(shown[0]).not.toBe('—');
    expect(await page.locator('[data-compare-head]').textContent()).toBe(`order ${order} (preview)`);
    // The statistics shown are the order table's for that order, printed alike (s, and R² to the digits that tell it from 1).
    const tableCells = await page.locator(`table.orders tr[data-order="${order}"] td`).allTextContents();
    expect(shown[0]).toBe(tableCells[3]);
    expect(shown[1]).toBe(tableCells[4]);
    await page.screenshot({ path: path.join(SCREENSHOTS, 'order-preview.png'), fullPage: true });
    // Click a point of the statistics plot, then a row of the order table.
    await page.locator(`.order-stats .order-point[data-order="${published}"]`).first().click();
    expect(await previewCurve()).toBe('');
    await page.locator(`table.orders tr[data-order="${order}"] .row-preview`).click();
    expect((await previewCurve())!.length).toBeGreaterThan(50);
    await page.getByRole('button', { name: 'Back to the published order' }).click();
    expect(await previewCurve()).toBe('');
    expect(new Set(await compare())).toEqual(new Set(['—']));
    expect(errors).toEqual([]);
    await page.close();
  });

  it('the property page draws every source of the property and compares those of one material', async () => {
    const [key, expected] = busiestProperty();
    expect(expected.length).toBeGreaterThan(1);
    const { page, errors } = await open(`/properties/${key}/`);
    const drawn = await page.locator('[data-overlay-chart] svg g[data-series] path').evaluateAll((paths) => paths.filter((p) => (p.getAttribute('d') ?? '').length > 50).length);
    expect(drawn).toBe(expected.length);
    for (const correlation of expected) expect(await page.locator(`.property-table a[href="${BASE}correlations/${correlation.slug}/"]`).count(), correlation.slug).toBe(1);
    // One comparison row per pair of the same material and units whose validity ranges overlap.
    let pairs = 0;
    for (let i = 0; i < expected.length; i++) {
      for (let j = i + 1; j < expected.length; j++) {
        const [a, b] = [expected[i]!, expected[j]!];
        const same = a.meta.material.name === b.meta.material.name && a.meta.property.unit === b.meta.property.unit && a.meta.variable.unit === b.meta.variable.unit;
        if (same && Math.max(a.range.min, b.range.min) < Math.min(a.range.max, b.range.max)) pairs++;
      }
    }
    expect(await page.locator('.comparison-table tbody tr').count()).toBe(pairs);
    await page.screenshot({ path: path.join(SCREENSHOTS, 'property-page.png'), fullPage: true });
    expect(errors).toEqual([]);
    await page.close();
  });

  it('printed, a correlation page keeps title, equation, range, cautions, coefficients, check values and the static plot, and drops the chrome', async () => {
    const target = correlations.find((c) => c.used.length <= 400)!;
    const { page, errors } = await open(`/correlations/${target.slug}/`);
    await page.locator('[data-fit-chart].chart-drawn').waitFor({ timeout: 10_000 });
    await page.emulateMedia({ media: 'print' });
    const shown = (selector: string) => page.locator(selector).first().evaluate((node) => getComputedStyle(node).display !== 'none' && (node as HTMLElement).offsetHeight > 0);
    for (const selector of ['h1', '.katex-display', '.range', '.caution', 'table.coefficients', '#check-values', 'img.chart-static']) expect(await shown(selector), selector).toBe(true);
    for (const selector of ['.site-nav', '.chart-toolbar', '.chart-target', '.order-choice']) expect(await shown(selector), selector).toBe(false);
    // The static plot has loaded (a broken image has no natural width).
    expect(await page.locator('img.chart-static').evaluate((img) => (img as HTMLImageElement).naturalWidth)).toBeGreaterThan(0);
    const pdf = await page.pdf({ path: path.join(SCREENSHOTS, 'correlation-page.pdf'), format: 'A4', printBackground: true });
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
    expect(errors).toEqual([]);
    await page.close();
  });

  it('no page logs a console error or fails a request', async () => {
    const urls = ['/', '/properties/', '/how-orders-are-chosen/', ...correlations.map((c) => `/correlations/${c.slug}/`)];
    const keys = [...new Set(correlations.map((c) => propertyKey(c.meta.property)))];
    urls.push(...keys.map((key) => `/properties/${key}/`));
    for (const url of urls) {
      const { page, errors } = await open(url, 'load');
      if (url.startsWith('/correlations/')) await page.locator('[data-fit-chart].chart-drawn').waitFor({ timeout: 10_000 });
      if (url === '/') await catalogueReady(page);
      expect(errors, url).toEqual([]);
      await page.close();
    }
  });

  it('axe-core finds no serious or critical violation on the catalogue, a correlation page, a property page and the order page', async () => {
    const axeSource = require.resolve('axe-core/axe.min.js');
    const urls = ['/', `/correlations/${busiestProperty()[1][0]!.slug}/`, `/properties/${busiestProperty()[0]}/`, '/how-orders-are-chosen/'];
    const report: string[] = [];
    for (const url of urls) {
      const { page } = await open(url);
      if (url.startsWith('/correlations/')) await page.locator('[data-fit-chart].chart-drawn').waitFor({ timeout: 10_000 });
      await page.addScriptTag({ path: axeSource });
      const result = await page.evaluate(async () => {
        const axe = (window as unknown as { axe: { run: (context: Document, options: object) => Promise<{ violations: { id: string; impact: string; nodes: { target: string[] }[] }[] }> } }).axe;
        return axe.run(document, { runOnly: { type: 'tag', values: ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'best-practice'] } });
      });
      for (const violation of result.violations) report.push(`${url} ${violation.impact} ${violation.id}: ${violation.nodes.slice(0, 3).map((node) => node.target.join(' ')).join(' | ')}`);
      await page.close();
    }
    console.log(`axe-core over ${urls.length} pages: ${report.length === 0 ? 'no violations' : `\n${report.join('\n')}`}`);
    expect(report.filter((line) => / (serious|critical) /.test(line))).toEqual([]);
  });
});
}
