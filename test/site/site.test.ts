/**
 * The built site: `astro build` once into a temporary directory, then every correlation's page and downloads are
 * checked against the data, and (when Chromium is installed) the chart is drawn in a real browser.
 *
 * The build reads a copy of the project's content/ in a temporary folder, with one more correlation added (a test
 * fixture) and a handbook settings file of its own (title, organisation, address, base path, notice): so adding a
 * correlation to content/ keeps these checks green, and the settings are shown to reach the built site.
 *
 * Expected coefficients come from an independent exact computation: Python's fractions module solves the normal
 * equations of the same points (the inputs as the decimals JavaScript prints for them, the certifier's convention)
 * by plain Gauss–Jordan elimination, and the nearest doubles must match the downloads to the last bit (JSON numbers
 * and CSV fields are shortest round-trip text). The printed check values are recomputed in Python from the printed
 * decimals.
 */
import { execFileSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { cp, mkdir, mkdtemp, readFile, readdir, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CAUTIONS, cautionsFor, fittedSpaceWeights, forwardX, forwardY, lastPrintedPlace } from '../../src/core/index.ts';
import { pythonExactLeastSquares } from '../helpers/pythonExact.ts';
import { fitDataset, fitHandbook, readHandbook, type LoadedCorrelation } from '../../src/load/index.ts';
import { buildSite, projectRoot } from './buildSite.ts';
import { checkHandbookJson } from './handbookJsonChecks.ts';
import { describeChart } from './chartChecks.ts';
import { describeListings } from './listingChecks.ts';
import { describeNumbers } from './numberChecks.ts';
import { describeEvaluator } from './evaluatorChecks.ts';
import { describeScales } from './scaleChecks.ts';
import { describeReading } from './readingChecks.ts';
import { serveDirectory } from './staticServer.ts';
import { CHROMIUM, launchChromium } from '../helpers/chromium.ts';


/** The settings file written into the copied content: every field set, none of them the default. */
const SETTINGS = {
  title: 'Thermal Fluids Handbook (test)',
  organisation: 'Example Thermal Group',
  url: 'https://handbook.example.org',
  basePath: '/thermal/handbook/',
  notice: 'Test notice: for the site test only.',
};
const SETTINGS_YAML = `# Written by test/site/site.test.ts\n${Object.entries(SETTINGS).map(([key, value]) => `${key}: "${value}"`).join('\n')}\n`;
/** Folder name of the correlation the test adds to the copied content. */
const ADDED = 'added-test-liquid';
const BASE = SETTINGS.basePath;

let workDir = '';
let siteRoot = '';
let outDir = '';
let projectCount = 0;
let correlations: LoadedCorrelation[] = [];

beforeAll(async () => {
  workDir = await mkdtemp(path.join(tmpdir(), 'correlary-site-'));
  const content = path.join(workDir, 'content');
  await cp(path.join(projectRoot, 'content'), content, { recursive: true });
  projectCount = (await readHandbook(content)).datasets.length;
  await cp(path.join(projectRoot, 'test/fixtures/content/valid/liquid-a'), path.join(content, ADDED), { recursive: true });
  await writeFile(path.join(content, 'handbook.yaml'), SETTINGS_YAML);
  const handbook = await readHandbook(content);
  expect(handbook.diagnostics).toEqual([]);
  correlations = handbook.datasets.map((dataset) => dataset.correlation).filter((item): item is LoadedCorrelation => item !== undefined);
  // Served from siteRoot, the site sits under the base path as it would on a static host.
  siteRoot = path.join(workDir, 'site');
  outDir = path.join(siteRoot, ...BASE.split('/').filter(Boolean));
  await mkdir(outDir, { recursive: true });
  await buildSite({ content, outDir });
}, 180_000);

afterAll(async () => {
  if (workDir) await rm(workDir, { recursive: true, force: true });
});

/** Astro's text escaping, for looking up page text. */
function escapeHtml(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;').replace(/'/g, '&#39;');
}

function escapeRegExp(text: string): string {
  return text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}

function unitSuffix(unit: string): string {
  return unit === '1' ? '' : ` ${unit}`;
}

/** Exact least squares in Python for the loaded points and options, with the order the site published. */
const pythonCache = new Map<string, number[]>();
function pythonCoefficients(correlation: LoadedCorrelation, order: number): number[] {
  const key = `${correlation.slug}:${order}`;
  if (!pythonCache.has(key)) pythonCache.set(key, solveInPython(correlation, order));
  return pythonCache.get(key)!;
}

function solveInPython(correlation: LoadedCorrelation, order: number): number[] {
  const settings = correlation.meta.fit;
  const x = correlation.used.map((point) => point.x);
  const y = correlation.used.map((point) => point.y);
  const weights = settings.weights === 'uncertainty' ? fittedSpaceWeights(y, correlation.used.map((point) => point.uncertainty ?? NaN), settings.transform.y) : undefined;
  const [solution] = pythonExactLeastSquares([
    {
      u: x.map((value) => String(forwardX(settings.transform.x, value))),
      v: y.map((value) => String(forwardY(settings.transform.y, value))),
      ...(weights ? { w: weights.map(String) } : {}),
      order,
      intercept: settings.intercept,
      constraints: settings.passThrough.map((point) => [String(forwardX(settings.transform.x, point.x)), String(forwardY(settings.transform.y, point.y))] as const),
    },
  ]);
  return solution!.nearest;
}

/** y of the printed equation at x, evaluated by Python from the printed decimals (exact for the polynomial part). */
function pythonPrintedValues(printed: readonly string[], transformX: string, transformY: string, xs: readonly number[]): number[] {
  const script = `
import json, math, sys
from fractions import Fraction as F
a = [F(t) for t in ${JSON.stringify(printed)}]
out = []
for x in ${JSON.stringify(xs.map(String))}:
    u = 1 / F(x) if "${transformX}" == "reciprocal" else (F(repr(math.log(float(x)))) if "${transformX}" == "log" else F(x))
    v = sum(c * u ** k for k, c in enumerate(a))
    out.append(math.exp(float(v)) if "${transformY}" == "log" else float(v))
print(json.dumps(out))`;
  return JSON.parse(execFileSync('python3', ['-c', script], { encoding: 'utf8' })) as number[];
}

function page(slug: string): Promise<string> {
  return readFile(path.join(outDir, 'correlations', slug, 'index.html'), 'utf8');
}

describe('astro build of the demo handbook', () => {
  it('the copied handbook has every correlation of content/ plus the added one', () => {
    expect(projectCount).toBeGreaterThan(0);
    expect(correlations.length).toBe(projectCount + 1);
    expect(correlations.map((correlation) => correlation.slug)).toContain(ADDED);
  });

  it('the settings file sets the title, organisation, notice, address and base path of every page', async () => {
    const pages = [path.join(outDir, 'index.html'), path.join(outDir, 'how-orders-are-chosen', 'index.html'), ...correlations.map((correlation) => path.join(outDir, 'correlations', correlation.slug, 'index.html'))];
    for (const file of pages) {
      const html = await readFile(file, 'utf8');
      const relative = path.relative(outDir, path.dirname(file));
      const own = relative === '' ? BASE : `${BASE}${relative.split(path.sep).join('/')}/`;
      expect(html, file).toMatch(new RegExp(`<title>(.* · )?${escapeRegExp(escapeHtml(SETTINGS.title))}</title>`));
      expect(html, file).toContain(`<a class="site-title" href="${BASE}">${escapeHtml(SETTINGS.title)}</a>`);
      expect(html, file).toContain(escapeHtml(SETTINGS.organisation));
      expect(html, file).toContain(escapeHtml(SETTINGS.notice));
      expect(html, file).toContain(`<link rel="canonical" href="${SETTINGS.url}${own}">`);
      expect(html, file).not.toContain('Correlary handbook');
      // Every site-internal link and asset lives under the base path.
      for (const [, href] of html.matchAll(/(?:href|src)="(\/[^"]*)"/g)) expect(href!.startsWith(BASE), `${file}: ${href}`).toBe(true);
    }
    const index = await readFile(path.join(outDir, 'index.html'), 'utf8');
    expect(index).toContain(`<title>${escapeHtml(SETTINGS.title)}</title>`);
    const added = correlations.find((correlation) => correlation.slug === ADDED)!;
    expect(await page(ADDED)).toContain(`<title>${escapeHtml(added.meta.title)} · ${escapeHtml(SETTINGS.title)}</title>`);
  });

  it('index.html lists every correlation, links its page and badges invented data', async () => {
    const html = await readFile(path.join(outDir, 'index.html'), 'utf8');
    for (const correlation of correlations) {
      expect(html, correlation.slug).toContain(`href="${BASE}correlations/${correlation.slug}/"`);
      expect(html).toContain(escapeHtml(correlation.meta.title));
    }
    const invented = correlations.filter((correlation) => correlation.meta.invented).length;
    expect(html.match(/class="badge badge-invented"/g)?.length ?? 0).toBe(invented);
    for (const caution of CAUTIONS) expect(html).toContain(escapeHtml(caution));
  });

  it('index.html and every page show the review status as a worded badge; unapproved rows are set apart', async () => {
    // The words come from the review status each correlation.yaml states (content/README.md, review.status) and,
    // for an approved one, from whether 'correlary check' (fitHandbook) finds its approval holding.
    const words: Record<string, string> = { approved: 'Approved', draft: 'Draft · not approved', 'in-review': 'In review · not approved', withdrawn: 'Withdrawn · do not use' };
    const checked = await fitHandbook(path.join(workDir, 'content'));
    const approvalOf = (slug: string) => checked.datasets.find((dataset) => dataset.dataset.slug === slug)!.review!.approval.state;
    const expected = (correlation: LoadedCorrelation): RegExp => {
      const review = correlation.meta.review;
      const state = approvalOf(correlation.slug);
      if (state === 'unbound') return /<\/span> Unbound approval · not approved<\/span>/;
      if (state === 'lapsed') return /<\/span> Approval lapsed \([a-z, ]+\) · not approved<\/span>/;
      if (review.status === 'withdrawn' && review.replacedBy) return new RegExp(`</span> Withdrawn · do not use · replaced by ${review.replacedBy}</span>`);
      return new RegExp(`</span> ${words[review.status]}</span>`);
    };
    const html = await readFile(path.join(outDir, 'index.html'), 'utf8');
    const rows = [...html.matchAll(new RegExp(`<tr(?: class="([^"]*)")?(?: data-[a-z]+="[^"]*")*>\\s*<td><a href="${escapeRegExp(BASE)}correlations/([^/]+)/">(.*?)</tr>`, 'gs'))];
    expect(rows.length).toBe(correlations.length);
    for (const [, rowClass, slug, row] of rows) {
      const correlation = correlations.find((item) => item.slug === slug)!;
      expect(row, slug).toContain(`data-status="${correlation.meta.review.status}"`);
      expect(row, slug).toMatch(expected(correlation));
      expect((rowClass ?? '').includes('not-approved'), `${slug} row set apart`).toBe(approvalOf(slug!) !== 'holds');
    }
    for (const correlation of correlations) {
      const text = await page(correlation.slug);
      const status = correlation.meta.review.status;
      expect(text.match(new RegExp(`data-status="${status}"`, 'g'))?.length, `${correlation.slug}: lede and provenance`).toBe(2);
      expect(text, correlation.slug).toMatch(expected(correlation));
    }
  });

  it('every correlation page carries the cautions, KaTeX output, the validity range and (when invented) the banner', async () => {
    for (const correlation of correlations) {
      const html = await page(correlation.slug);
      for (const caution of CAUTIONS) expect(html, `${correlation.slug}: caution`).toContain(escapeHtml(caution));
      expect(html, `${correlation.slug}: katex`).toContain('class="katex"');
      expect(html, `${correlation.slug}: katex display`).toContain('class="katex-display"');
      const unit = escapeHtml(unitSuffix(correlation.meta.variable.unit));
      expect(html, `${correlation.slug}: range`).toContain(`<span class="range-text">${correlation.range.min}${unit}</span>`);
      expect(html, `${correlation.slug}: range`).toContain(`<span class="range-text">${correlation.range.max}${unit}</span>`);
      expect(html.includes('class="invented-banner"'), `${correlation.slug}: banner`).toBe(correlation.meta.invented);
      expect(html, `${correlation.slug}: no raw NaN or null in a cell`).not.toMatch(/>\s*(NaN|null|undefined)\s*</);
      expect(html, `${correlation.slug}: chosen order highlighted`).toContain('<tr class="chosen"');
      for (const excluded of correlation.excluded) expect(html, `${correlation.slug}: excluded reason`).toContain(escapeHtml(excluded.reason));
    }
  });

  it('each page carries compact chart data (embedded, or linked above 400 points): 120 grid points from range.min to range.max, and every point', async () => {
    for (const correlation of correlations) {
      const html = await page(correlation.slug);
      const match = /<script type="application\/json">(.*?)<\/script>/s.exec(html);
      let text: string;
      if (correlation.used.length <= 400) {
        expect(match, correlation.slug).not.toBeNull();
        text = match![1]!;
      } else {
        expect(match, correlation.slug).toBeNull();
        expect(html).toContain(`data-chart-href="${BASE}correlations/${correlation.slug}/chart-data.json"`);
        text = await readFile(path.join(outDir, 'correlations', correlation.slug, 'chart-data.json'), 'utf8');
      }
      const data = JSON.parse(text) as { curve: number[][]; points: number[][]; excluded: unknown[] };
      expect(data.curve).toHaveLength(120);
      expect(data.curve[0]![0]).toBe(correlation.range.min);
      expect(data.curve.at(-1)![0]).toBe(correlation.range.max);
      expect(data.points).toHaveLength(correlation.used.length);
      expect(data.points.map((point) => point[0])).toEqual(correlation.used.map((point) => point.row));
      expect(data.excluded).toHaveLength(correlation.excluded.length);
      // Compact: computed values are rounded to 6 significant digits (data values stay as written, all short here);
      // a 17-digit double would show 10 or more.
      const long = (text.match(/\d+\.?\d*(?:e[-+]?\d+)?/g) ?? []).filter((token) => token.replace(/e.*$/, '').replace('.', '').replace(/^0+/, '').length >= 10);
      expect(long, `${correlation.slug}: long numbers`).toEqual([]);
      // The static picture for readers without scripts, from the shared renderer.
      expect(html).toContain(`src="${BASE}correlations/${correlation.slug}/plot.svg"`);
      const svg = await readFile(path.join(outDir, 'correlations', correlation.slug, 'plot.svg'), 'utf8');
      expect(svg.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
      expect(svg.match(/h0/g)?.length ?? 0, `${correlation.slug}: a dot per point in both panels`).toBe(2 * correlation.used.length);
    }
  });

  it('every correlation page stays under 100 KB of HTML, the 2000-point one included, and data.csv holds every row', async () => {
    const big = correlations.reduce((a, b) => (b.points.length > a.points.length ? b : a));
    expect(big.points.length).toBeGreaterThanOrEqual(2000);
    for (const correlation of correlations) {
      const bytes = Buffer.byteLength(await page(correlation.slug));
      expect(bytes, `${correlation.slug}: ${bytes} bytes`).toBeLessThan(100_000);
      const csv = await readFile(path.join(outDir, 'correlations', correlation.slug, 'data.csv'), 'utf8');
      const lines = csv.trimEnd().split('\n');
      const unit = correlation.meta.variable.unit === '1' ? '' : correlation.meta.variable.unit;
      for (const caution of cautionsFor(correlation.range, unit, correlation.meta.variable.name)) expect(lines).toContain(`# CAUTION: ${caution}`);
      const table = lines.filter((line) => !line.startsWith('#'));
      expect(table[0]).toBe('row,line,x,y,uncertainty,used,residual,studentized,leverage,cooks_distance,excluded_reason,note');
      expect(table).toHaveLength(correlation.points.length + 1);
      // x and y as read from the data file, row by row.
      table.slice(1).forEach((line, i) => {
        const fields = line.split(',');
        expect(Number(fields[2]), `${correlation.slug} row ${i + 1}`).toBe(correlation.points[i]!.x);
        expect(Number(fields[3]), `${correlation.slug} row ${i + 1}`).toBe(correlation.points[i]!.y);
      });
    }
    // The big page lists its first 50 rows, and says where the rest are.
    const html = await page(big.slug);
    expect(html).toContain(`href="${BASE}correlations/${big.slug}/data.csv"`);
    expect(html).toContain(`Rows 1–50 and every flagged row`);
  });

  it('the order page names every criterion in words, with no internal benchmark labels', async () => {
    const html = await readFile(path.join(outDir, 'how-orders-are-chosen', 'index.html'), 'utf8');
    // Labels the benchmark script uses internally (scripts/bench/order/criteriaUnderTest.ts) must not reach the page.
    expect(html).not.toMatch(/x oracle|8g rule|rule 8|<td[^>]*>\d+ (?:s²|adj|AICc|BIC|LOOCV|sequential|lowest|χ²)/);
    expect(html).toMatch(/<td[^>]*>best order in hindsight \(out-of-sample\)<\/td>/);
  });

  it('the order page sets the F statistic in KaTeX like every other formula', async () => {
    const html = await readFile(path.join(outDir, 'how-orders-are-chosen', 'index.html'), 'utf8');
    expect(html).toContain('class="katex-display"');
    expect(html).not.toContain('<code>F = [');
  });

  it('coefficients.json: cautions, range, notice, coefficients equal to an exact Python solve to the last bit, printed check values from the printed decimals', async () => {
    for (const correlation of correlations) {
      const text = await readFile(path.join(outDir, 'correlations', correlation.slug, 'coefficients.json'), 'utf8');
      const json = JSON.parse(text);
      const unit = correlation.meta.variable.unit === '1' ? '' : correlation.meta.variable.unit;
      expect(json.cautions).toEqual(cautionsFor(correlation.range, unit, correlation.meta.variable.name));
      expect(json.cautions).toContain(CAUTIONS[1]);
      expect(json.range).toEqual({ ...correlation.range, unit: correlation.meta.variable.unit });
      expect(json.invented).toBe(correlation.meta.invented);
      if (correlation.meta.invented) expect(json.notice).toMatch(/^Invented data: /);
      // The published order is the one the loader chose.
      expect(json.order).toBe(fitDataset(correlation).fit?.order);
      const expected = pythonCoefficients(correlation, json.order);
      const published = json.coefficients as number[];
      expect(published.length).toBe(expected.length);
      published.forEach((value, k) => expect(Object.is(value, expected[k]), `${correlation.slug} a${k}: ${value} vs ${expected[k]}`).toBe(true));
      const checks = json.printedCheckValues as { x: number; y: string; tolerance: number }[];
      expect(checks.length).toBe(7);
      const python = pythonPrintedValues(json.printedCoefficients, json.transforms.x, json.transforms.y, checks.map((check) => check.x));
      checks.forEach((check, i) => expect(Math.abs(python[i]! - Number(check.y)), `${correlation.slug} printed check at x = ${check.x}`).toBeLessThanOrEqual(check.tolerance));
      expect(json.mapped.center.toString().length).toBeLessThanOrEqual(10);
      expect(typeof json.equation).toBe('string');
      expect(json.provenance.source.citation).toBe(correlation.meta.source.citation);
    }
  });

  it('the vapour-pressure page: its printed check values match its printed equation and catch a one-digit change of any coefficient (Python)', async () => {
    const slug = 'quillane-vapour-pressure';
    if (!correlations.some((correlation) => correlation.slug === slug)) return;
    const json = JSON.parse(await readFile(path.join(outDir, 'correlations', slug, 'coefficients.json'), 'utf8'));
    const checks = json.printedCheckValues as { x: number; y: string; tolerance: number }[];
    const html = await page(slug);
    for (const check of checks) expect(html).toContain(check.y);
    const xs = checks.map((check) => check.x);
    const printed = json.printedCoefficients as string[];
    const miss = (values: number[]) => values.some((value, i) => Math.abs(value - Number(checks[i]!.y)) > checks[i]!.tolerance);
    expect(miss(pythonPrintedValues(printed, json.transforms.x, json.transforms.y, xs))).toBe(false);
    printed.forEach((text, k) => {
      for (const sign of [1, -1]) {
        // ±1 in the last printed digit, done on the decimal text: 13.88924 → 13.88925 / 13.88923.
        const place = lastPrintedPlace(text);
        const digits = text.replace(/e.*$/i, '').replace('.', '');
        const changed = `${BigInt(digits) + BigInt(sign)}e${place}`;
        const wrong = printed.map((entry, j) => (j === k ? changed : entry));
        expect(miss(pythonPrintedValues(wrong, json.transforms.x, json.transforms.y, xs)), `a${k} = ${text} → ${changed}`).toBe(true);
      }
    });
  });

  it('coefficients.csv: cautions as # comment lines, then a header and full-precision coefficients', async () => {
    for (const correlation of correlations) {
      const text = await readFile(path.join(outDir, 'correlations', correlation.slug, 'coefficients.csv'), 'utf8');
      const lines = text.trimEnd().split('\n');
      const comments = lines.filter((line) => line.startsWith('#'));
      const table = lines.filter((line) => !line.startsWith('#'));
      expect(lines.slice(0, comments.length).every((line) => line.startsWith('#')), 'comments come first').toBe(true);
      const unit = correlation.meta.variable.unit === '1' ? '' : correlation.meta.variable.unit;
      for (const caution of cautionsFor(correlation.range, unit, correlation.meta.variable.name)) expect(comments).toContain(`# CAUTION: ${caution}`);
      expect(comments.some((line) => line.startsWith('# INVENTED DATA:'))).toBe(correlation.meta.invented);
      expect(table[0]).toBe('k,coefficient,significant_digits,rounded,standard_error,ci95_low,ci95_high');
      const json = JSON.parse(await readFile(path.join(outDir, 'correlations', correlation.slug, 'coefficients.json'), 'utf8'));
      const expected = pythonCoefficients(correlation, json.order);
      const values = table.slice(1).map((line) => Number(line.split(',')[1]));
      expect(values.length).toBe(expected.length);
      values.forEach((value, k) => expect(Object.is(value, expected[k]), `${correlation.slug} a${k}`).toBe(true));
    }
  });
});

describe('handbook.json', () => {
  it('handbook.json is valid against handbook.schema.json and equals correlary fit --json for every correlation', async () => {
    const json = await checkHandbookJson(outDir, path.join(workDir, 'content'), BASE, correlations.map((correlation) => correlation.slug));
    expect(json.handbook.url).toBe(`${SETTINGS.url}${BASE}`);
    expect(json.handbook.title).toBe(SETTINGS.title);
    expect(json.cautions).toEqual(CAUTIONS);
  });

  it("the handbook's own settings reach every export: handbook.json, coefficients.json and .csv, data.csv, plot.svg and each code snippet's header", async () => {
    // SETTINGS is the handbook.yaml this test wrote into the copied content; every expected text is built from it.
    const site = `${SETTINGS.url}${BASE}`;
    const json = JSON.parse(await readFile(path.join(outDir, 'handbook.json'), 'utf8'));
    expect(json.handbook).toEqual({ title: SETTINGS.title, organisation: SETTINGS.organisation, url: site, basePath: BASE, notice: SETTINGS.notice });
    for (const correlation of correlations) {
      const folder = path.join(outDir, 'correlations', correlation.slug);
      const identity = { title: SETTINGS.title, organisation: SETTINGS.organisation, notice: SETTINGS.notice, url: `${site}correlations/${correlation.slug}/` };
      expect(JSON.parse(await readFile(path.join(folder, 'coefficients.json'), 'utf8')).handbook, correlation.slug).toEqual(identity);
      const entry = json.correlations.find((item: { slug: string }) => item.slug === correlation.slug);
      expect(entry.handbook, correlation.slug).toEqual(identity);
      const line = `Handbook: ${SETTINGS.title}, published by ${SETTINGS.organisation}; page: ${identity.url}`;
      for (const file of ['coefficients.csv', 'data.csv']) {
        const lines = (await readFile(path.join(folder, file), 'utf8')).split('\n');
        expect(lines, `${correlation.slug}/${file}`).toContain(`# ${line}`);
        expect(lines, `${correlation.slug}/${file}`).toContain(`# Handbook notice: ${SETTINGS.notice}`);
      }
      // The plot download: the cautions and the handbook in its description.
      const svg = await readFile(path.join(folder, 'plot.svg'), 'utf8');
      const description = svg.match(/<desc>([^<]*)<\/desc>/)?.[1] ?? '';
      expect(description, `${correlation.slug}/plot.svg`).toContain(line);
      expect(description, `${correlation.slug}/plot.svg`).toContain(`Handbook notice: ${SETTINGS.notice}`);
      const unit = correlation.meta.variable.unit === '1' ? '' : correlation.meta.variable.unit;
      for (const caution of cautionsFor(correlation.range, unit, correlation.meta.variable.name)) expect(description, `${correlation.slug}/plot.svg`).toContain(caution);
      for (const kind of ['python', 'javascript', 'typescript', 'c', 'spreadsheet']) {
        const download = entry.downloads[kind] as string;
        const text = await readFile(path.join(outDir, ...download.slice(BASE.length).split('/')), 'utf8');
        expect(text, `${correlation.slug} ${kind}`).toContain(line);
        expect(text, `${correlation.slug} ${kind}`).toContain(`Handbook notice: ${SETTINGS.notice}`);
      }
    }
  });
});

describe('the browser only draws', () => {
  it('handbook.json carries each fingerprint and approval as check computes them; handbook-approved.json lists only approvals that hold', async () => {
    // The expected states come from fitHandbook (what 'correlary check' reports) on the same copied content.
    const checked = await fitHandbook(path.join(workDir, 'content'));
    const all = JSON.parse(await readFile(path.join(outDir, 'handbook.json'), 'utf8'));
    const approved = JSON.parse(await readFile(path.join(outDir, 'handbook-approved.json'), 'utf8'));
    const holding: string[] = [];
    for (const { dataset, review } of checked.datasets) {
      const item = all.correlations.find((entry: { slug: string }) => entry.slug === dataset.slug);
      expect(item.fingerprint, dataset.slug).toBe(review!.fingerprint!.text);
      expect(item.approval.state, dataset.slug).toBe(review!.approval.state);
      expect(item.approval.holds, dataset.slug).toBe(review!.approval.state === 'holds');
      if (review!.approval.state === 'holds') holding.push(dataset.slug);
    }
    expect(approved.formatVersion).toBe(all.formatVersion);
    expect(approved.cautions).toEqual(all.cautions);
    expect(approved.correlations.map((entry: { slug: string }) => entry.slug)).toEqual(holding.sort());
    for (const entry of approved.correlations) expect(entry.approval.holds).toBe(true);
  });

  it('every page has a history section, which says history is not available outside a git repository', async () => {
    for (const correlation of correlations) {
      const html = await page(correlation.slug);
      expect(html, correlation.slug).toContain('<h2 id="history">History</h2>');
      expect(html, correlation.slug).toContain('History is not available: the content folder is not in a git repository.');
      expect(html, correlation.slug).toMatch(/<dt>Fingerprint now<\/dt><dd><span class="fingerprint">fp1-[0-9a-f]{16}-[0-9a-f]{16}-[0-9a-f]{16}<\/span>/);
    }
  });

  it("src/client imports only d3-axis, d3-scale, d3-selection, d3-shape, d3-zoom, minisearch, the shared renderer, the core's browser door and its own files", async () => {
    const directory = path.join(projectRoot, 'src', 'client');
    const offenders: string[] = [];
    // Every file under src/client, the page entries of src/client/entries/ included.
    const names = (await readdir(directory, { recursive: true })).filter((name) => name.endsWith('.ts'));
    expect(names).toContain(path.join('entries', 'fitChart.ts'));
    for (const name of names) {
      const file = path.join(directory, name);
      const text = await readFile(file, 'utf8');
      for (const match of text.matchAll(/(?:import|export)[^'"]*?from\s*['"]([^'"]+)['"]|import\(\s*['"]([^'"]+)['"]\s*\)/g)) {
        const spec = (match[1] ?? match[2])!;
        const target = spec.startsWith('.') ? path.resolve(path.dirname(file), spec) : undefined;
        const allowed =
          target === undefined
            ? ['d3-axis', 'd3-scale', 'd3-selection', 'd3-shape', 'd3-zoom', 'minisearch'].includes(spec)
            : target.startsWith(`${directory}${path.sep}`) || target.startsWith(`${path.join(projectRoot, 'src', 'render')}${path.sep}`) || target === path.join(projectRoot, 'src', 'core', 'browser.ts');
        if (!allowed) offenders.push(`${name} imports ${spec}`);
      }
    }
    expect(offenders).toEqual([]);
  });

  it('the evaluator is built by script only: no page carries a form that cannot work without scripts, and each carries what it reads', async () => {
    for (const correlation of correlations) {
      const html = await page(correlation.slug);
      expect(html, correlation.slug).not.toContain('evaluator-x');
      const { transform } = correlation.meta.fit;
      expect(html, correlation.slug).toContain(`data-evaluator data-transform-x="${transform.x}" data-transform-y="${transform.y}"`);
      expect(html, correlation.slug).toContain('<code id="snippet-javascript"');
    }
  });

  // The browser scripts are bundled by Correlary itself (src/loaders/clientScriptsIntegration.ts), not by Astro's client build.
  it('every page loads its browser scripts from the output under the base path, each once, and a correlation page all four', async () => {
    const pages = (await readdir(outDir, { recursive: true })).filter((name) => name.endsWith('.html'));
    const correlationScripts = new Set<string>();
    for (const name of pages) {
      const html = await readFile(path.join(outDir, name), 'utf8');
      const sources = [...html.matchAll(/<script type="module" src="([^"]+)"><\/script>/g)].map((match) => match[1]!);
      expect(new Set(sources).size, name).toBe(sources.length);
      for (const source of sources) {
        expect(source, name).toMatch(new RegExp(`^${escapeRegExp(BASE)}_astro/[A-Za-z]+\\.[A-Z0-9]{8}\\.js$`));
        expect(existsSync(path.join(outDir, source.slice(BASE.length))), `${name}: ${source}`).toBe(true);
        if (name.startsWith(`correlations${path.sep}`)) correlationScripts.add(source.replace(/^.*\/_astro\/([A-Za-z]+)\..*$/, '$1'));
      }
    }
    expect([...correlationScripts].sort()).toEqual(['codeSnippets', 'equation', 'fitChart', 'orderPreview']);
    expect(await readFile(path.join(outDir, 'index.html'), 'utf8')).toMatch(/<script type="module" src="[^"]*\/_astro\/catalogue\.[A-Z0-9]{8}\.js"><\/script>/);
  });

  it('the built browser scripts hold none of the numerical core', async () => {
    const assets = path.join(outDir, '_astro');
    const scripts = (await readdir(assets)).filter((name) => name.endsWith('.js'));
    expect(scripts.length).toBeGreaterThan(0);
    for (const name of scripts) {
      const text = await readFile(path.join(assets, name), 'utf8');
      // String literals of the core survive minification: the solver tag, the range guard's message of evaluateFit
      // (the browser evaluates through publishedEstimate, src/core/browser.ts) and a tag of the
      // distribution functions' incomplete-gamma code (@stdlib).
      expect(text, name).not.toContain('householder-qr');
      expect(text, name).not.toContain('outside the fitted range');
      expect(text, name).not.toContain('gammaincinv');
    }
  });
});

describe.skipIf(!existsSync(CHROMIUM))(`the chart in Chromium (${CHROMIUM}; install it with apt-get install -y chromium)`, () => {
  it('draws points, curve, bands and residuals from the embedded data, and shows a tooltip on hover', async () => {
    const server = await serveDirectory(siteRoot);
    const browser = await launchChromium();
    try {
      const target = correlations.find((correlation) => correlation.excluded.length > 0) ?? correlations[0]!;
      const browserPage = await browser.newPage({ viewport: { width: 1280, height: 900 } });
      const errors: string[] = [];
      browserPage.on('pageerror', (error) => errors.push(String(error)));
      browserPage.on('console', (message) => {
        if (message.type() === 'error') errors.push(message.text());
      });
      await browserPage.goto(`${server.url}${BASE}correlations/${target.slug}/`, { waitUntil: 'networkidle' });
      const svgs = browserPage.locator('[data-fit-chart] svg');
      await svgs.first().waitFor({ timeout: 10_000 });
      expect(await svgs.count()).toBe(2);
      const mainCircles = await svgs.nth(0).locator('g circle').count();
      expect(mainCircles).toBe(target.used.length + target.excluded.length);
      const residualCircles = await svgs.nth(1).locator('g circle').count();
      expect(residualCircles).toBe(target.used.length);
      const paths = await svgs.nth(0).locator('path.band-prediction, path.band-confidence, path.curve').evaluateAll((nodes) => nodes.map((node) => node.getAttribute('d') ?? ''));
      expect(paths.filter((d) => d.length > 100).length).toBe(3); // prediction band, confidence band, curve
      expect(await browserPage.locator('[data-fit-chart] img.chart-static').isVisible()).toBe(false);

      // Every text of both charts (tick labels, axis titles) is drawn inside its chart, also on the page whose units
      // make the longest axis titles (a rotated residual title once ran off the top of the residual panel).
      const longest = [...correlations].sort((a, b) => b.meta.property.unit.length - a.meta.property.unit.length)[0]!;
      for (const slug of [target.slug, longest.slug]) {
        if (slug !== target.slug) await browserPage.goto(`${server.url}${BASE}correlations/${slug}/`, { waitUntil: 'networkidle' });
        await svgs.first().waitFor({ timeout: 10_000 });
        const outside = await svgs.evaluateAll((nodes) =>
          nodes.flatMap((svg) => {
            const frame = svg.getBoundingClientRect();
            return [...svg.querySelectorAll('text')]
              .filter((text) => (text.textContent ?? '').trim() !== '')
              .map((text) => ({ text: text.textContent, box: text.getBoundingClientRect() }))
              .filter(({ box }) => box.top < frame.top - 0.5 || box.bottom > frame.bottom + 0.5 || box.left < frame.left - 0.5 || box.right > frame.right + 0.5)
              .map(({ text }) => text);
          }),
        );
        expect(outside, slug).toEqual([]);
      }
      if (longest.slug !== target.slug) await browserPage.goto(`${server.url}${BASE}correlations/${target.slug}/`, { waitUntil: 'networkidle' });

      const firstPoint = svgs.nth(0).locator('g circle').first();
      const box = (await firstPoint.boundingBox())!;
      await browserPage.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
      const tooltip = browserPage.locator('.chart-tooltip');
      await tooltip.waitFor({ state: 'visible', timeout: 5_000 });
      expect(await tooltip.textContent()).toMatch(/^row \d+/);
      expect(errors).toEqual([]);
    } finally {
      await browser.close();
      await server.close();
    }
  });

  it('copies the equation as plain text: the copy buttons, and a selection of the typeset equation', async () => {
    const server = await serveDirectory(siteRoot);
    const browser = await launchChromium();
    try {
      // An untransformed fit with an intercept, so the expected text is simply y = a0 + a1*x + a2*x^2 + ...
      const target = correlations.find((correlation) => correlation.meta.fit.transform.x === 'identity' && correlation.meta.fit.transform.y === 'identity' && correlation.meta.fit.intercept)!;
      const json = JSON.parse(await readFile(path.join(outDir, 'correlations', target.slug, 'coefficients.json'), 'utf8'));
      const x = target.meta.variable.symbol.replace(/[\\{}]/g, '');
      const y = target.meta.property.symbol.replace(/[\\{}]/g, '');
      // Assembled here from the download's printed coefficients and full-precision values (independently of
      // equationPlain): ASCII minus, * for products, ^ for powers.
      const assemble = (values: string[]) =>
        `${y} = ${values.map((text, k) => {
          const negative = text.startsWith('-');
          const magnitude = negative ? text.slice(1) : text;
          const power = k === 0 ? '' : k === 1 ? `*${x}` : `*${x}^${k}`;
          return `${k === 0 ? (negative ? '-' : '') : negative ? ' - ' : ' + '}${magnitude}${power}`;
        }).join('')}`;
      const printed = assemble(json.printedCoefficients as string[]);
      const full = assemble((json.coefficients as number[]).map((value) => String(value)));

      const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
      await context.grantPermissions(['clipboard-read', 'clipboard-write'], { origin: server.url });
      const browserPage = await context.newPage();
      const errors: string[] = [];
      browserPage.on('pageerror', (error) => errors.push(String(error)));
      await browserPage.goto(`${server.url}${BASE}correlations/${target.slug}/`, { waitUntil: 'networkidle' });
      const clipboard = () => browserPage.evaluate(() => navigator.clipboard.readText());

      await browserPage.locator('.equation-plain-row[data-form="printed"] button.copy-button').click();
      await browserPage.locator('.equation-plain-row[data-form="printed"] .copy-status', { hasText: 'Copied' }).waitFor({ timeout: 5_000 });
      expect(await clipboard()).toBe(printed);
      expect(printed).toMatch(/^[\x20-\x7e]+$/); // ASCII only: no U+2212 minus, no math-italic letters
      await browserPage.locator('.equation-plain-row[data-form="full"] button.copy-button').click();
      await browserPage.locator('.equation-plain-row[data-form="full"] .copy-status', { hasText: 'Copied' }).waitFor({ timeout: 5_000 });
      const copiedFull = await clipboard();
      expect(copiedFull).toBe(full);
      // Full precision: the coefficients read back from the copied text are the download's doubles, bit for bit.
      const readBack = copiedFull.split(' = ')[1]!.replace(/ ([-+]) /g, ' $1').split(' ').map((term) => Number(term.split('*')[0]));
      expect(readBack).toEqual(json.coefficients);

      // Select the typeset equation as a reader would and copy it: the clipboard gets the printed plain text once.
      await browserPage.evaluate(() => {
        const equation = document.querySelector('.equation .katex-html')!;
        const range = document.createRange();
        range.selectNodeContents(equation);
        const selection = document.getSelection()!;
        selection.removeAllRanges();
        selection.addRange(range);
      });
      await browserPage.keyboard.press('Control+C');
      await expect.poll(clipboard, { timeout: 5_000 }).toBe(printed);
      // A passage that holds the equation and text around it keeps the text and puts the plain equation inside.
      await browserPage.evaluate(() => {
        const section = document.querySelector('section[aria-labelledby="equation"]')!;
        const range = document.createRange();
        range.selectNodeContents(section);
        document.getSelection()!.removeAllRanges();
        document.getSelection()!.addRange(range);
      });
      await browserPage.keyboard.press('Control+C');
      await expect.poll(clipboard, { timeout: 5_000 }).toContain(printed);
      const passage = await clipboard();
      expect(passage).toContain('Equation');
      expect(passage).not.toContain('\u2212');
      expect(errors).toEqual([]);
      await context.close();
    } finally {
      await browser.close();
      await server.close();
    }
  });
});

describe.skipIf(!existsSync(CHROMIUM))('the fit chart: fitted coordinates and read-out (test/site/chartChecks.ts)', () => {
  describeChart(() => ({ siteRoot, outDir, base: BASE, correlations }));
});

describe.skipIf(!existsSync(CHROMIUM))('reading and reviewing (test/site/readingChecks.ts)', () => {
  describeReading(() => ({ siteRoot, base: BASE, correlations }));
});

describeNumbers(() => ({ outDir, correlations }));
describeListings(() => ({ outDir, content: path.join(workDir, 'content'), correlations }));
describe.skipIf(!existsSync(CHROMIUM))('the evaluator and the copy buttons (test/site/evaluatorChecks.ts)', () => {
  describeEvaluator(() => ({ siteRoot, outDir, base: BASE, correlations }));
});

describeScales(() => ({ siteRoot, outDir, base: BASE }));
