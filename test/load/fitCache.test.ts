/**
 * The fit cache: a cached result equals a fresh fitDataset of the same folder (the independent computation here is
 * fitHandbook without a cache), a changed point, option or code version gets a new key, and non-finite numbers
 * and −0 survive the JSON files.
 */
import { cp, mkdtemp, readFile, readdir, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { fitHandbook } from '../../src/load/index.ts';
import { fitCacheKey, fromCacheJson, readCachedFit, readCachedSummary, toCacheJson, writeCachedFit } from '../../src/load/fitCache.ts';
import { cacheRecord } from '../../src/load/cacheRecord.ts';
import { previewsJson, rememberPreviewsJson } from '../../src/load/previewsJson.ts';
import { fitDataset } from '../../src/load/fitDataset.ts';
import { fitPolynomial } from '../../src/core/index.ts';
import { orderPreviews } from '../../src/render/index.ts';
import { fitCodeVersion } from '../../src/load/fitCodeVersion.ts';

let root = '';
beforeAll(async () => {
  root = await mkdtemp(path.join(tmpdir(), 'correlary-fit-cache-'));
  // Two demo folders: one weighted (χ² criterion), one with a transform.
  for (const slug of ['brindlewick-bw3-conductivity', 'quillane-vapour-pressure']) {
    await cp(path.join('content', slug), path.join(root, 'content', slug), { recursive: true });
  }
});
afterAll(async () => {
  if (root) await rm(root, { recursive: true, force: true });
});

/** The fits without their cache keys, for comparing with a run that had none. */
function fitsOf(handbook: Awaited<ReturnType<typeof fitHandbook>>) {
  return handbook.datasets.map(({ fitted }) => (fitted === undefined ? undefined : { fit: fitted.fit, selection: fitted.selection, diagnostics: fitted.diagnostics }));
}

describe('fit cache', () => {
  it('toCacheJson/fromCacheJson keep NaN, ±Infinity and −0', () => {
    const back = fromCacheJson(toCacheJson({ a: [NaN, Infinity, -Infinity, -0, 0, 1.5], b: { $other: 1 } })) as { a: number[] };
    expect(back).toEqual({ a: [NaN, Infinity, -Infinity, -0, 0, 1.5], b: { $other: 1 } });
    expect(Object.is(back.a[3], -0)).toBe(true);
  });

  it('fromCacheJson reads ±Infinity and −0 without NaN, and a tag-like text inside a string stays text', () => {
    // Expected values written by hand; JSON.stringify escapes the quotes of the string, so it is no tag.
    const value = { a: [Infinity, -Infinity, -0, 2], note: '{"$number":"Infinity"}', nested: { b: [[-0, Infinity]] } };
    const back = fromCacheJson(toCacheJson(value)) as typeof value;
    expect(back).toEqual(value);
    expect(Object.is(back.a[2], -0)).toBe(true);
    expect(Object.is(back.nested.b[0]![0], -0)).toBe(true);
    expect(back.note).toBe('{"$number":"Infinity"}');
    expect(fromCacheJson(toCacheJson([Infinity, NaN, -0]))).toEqual([Infinity, NaN, -0]);
  });

  it('toCacheJson writes exactly the text of JSON.stringify with a replacer that tags NaN, ±Infinity and −0, for any value', () => {
    // The reference: the tagging rule written out here independently (the file format of fit cache records).
    const reference = (value: unknown) =>
      JSON.stringify(value, (_key, item: unknown) =>
        typeof item === 'number' && (!Number.isFinite(item) || Object.is(item, -0)) ? { $number: Object.is(item, -0) ? '-0' : String(item) } : item,
      );
    const special = fc.constantFrom(NaN, Infinity, -Infinity, -0, 0, 1e-320, 1.5);
    const leaf = fc.oneof(fc.double(), special, fc.string(), fc.boolean(), fc.constant(null), fc.constant(undefined));
    const value = fc.letrec((tie) => ({
      node: fc.oneof({ depthSize: 'small' }, leaf, fc.array(tie('node')), fc.dictionary(fc.string(), tie('node'))),
    })).node;
    fc.assert(
      fc.property(value, (item) => {
        expect(toCacheJson(item)).toBe(reference(item));
      }),
      { numRuns: 500, seed: 10 },
    );
    // Objects JSON.stringify treats specially: a toJSON method, typed arrays, boxed numbers, getters.
    const withGetter = Object.defineProperty({}, 'lazy', { enumerable: true, get: () => [NaN, 2] });
    for (const item of [{ toJSON: () => NaN }, new Float64Array([1, NaN, -0]), new Float64Array([1, 2]), [Object(NaN)], withGetter, { a: [[[{ b: -0 }]]] }]) {
      expect(toCacheJson(item)).toBe(reference(item));
    }
  });

  it('fitHandbook with a cache: the first run fits and writes, the second reads back the same results', async () => {
    const content = path.join(root, 'content');
    const fitCache = { directory: path.join(root, 'cache'), version: 'test-1' };
    const fresh = await fitHandbook(content);
    const first = await fitHandbook(content, { fitCache });
    const second = await fitHandbook(content, { fitCache });
    expect(first.cachedFits).toBe(0);
    expect(second.cachedFits).toBe(2);
    // One file per dataset (its summary on the first line).
    expect((await readdir(fitCache.directory)).sort()).toEqual(second.datasets.map((item) => `${item.fitted!.cacheKey}.json`).sort());
    expect(fitsOf(first)).toEqual(fitsOf(fresh));
    expect(fitsOf(second)).toEqual(fitsOf(fresh));
    expect(second.diagnostics).toEqual(fresh.diagnostics);
    expect(second.datasets.map((item) => item.review)).toEqual(fresh.datasets.map((item) => item.review));
  });

  it('a cache hit reads only the summary, which holds the order table: the per-point statistics come from the full record when first asked for', async () => {
    const content = path.join(root, 'content');
    const fitCache = { directory: path.join(root, 'cache-summary'), version: 'test-1' };
    const fresh = await fitHandbook(content);
    await fitHandbook(content, { fitCache });
    const hit = await fitHandbook(content, { fitCache });
    const key = hit.datasets[0]!.fitted!.cacheKey!;
    const fullText = await readFile(path.join(fitCache.directory, `${key}.json`), 'utf8');
    const summaryText = fullText.slice(0, fullText.indexOf('\n'));
    // The summary holds no per-point statistics, no data rows and no previews, but the order table (pages and
    // exports show it), and is a small part of the record.
    const summary = fromCacheJson(summaryText) as { fit: Record<string, unknown>; selection: Record<string, unknown> };
    expect('points' in summary.fit).toBe(false);
    expect('points' in summary).toBe(false);
    expect('previews' in summary).toBe(false);
    expect(summary.selection['orders']).toEqual(fresh.datasets[0]!.fitted!.selection!.orders);
    // With the rest of the record damaged, a hit still gives the fingerprint's inputs (order, printed coefficients)…
    await writeFile(path.join(fitCache.directory, `${key}.json`), `${summaryText}\n{ damaged`);
    try {
      const again = await fitHandbook(content, { fitCache });
      const fitted = again.datasets[0]!.fitted!;
      expect(again.cachedFits).toBe(2);
      expect(fitted.fit!.order).toBe(fresh.datasets[0]!.fitted!.fit!.order);
      expect(fitted.fit!.printedCoefficients).toEqual(fresh.datasets[0]!.fitted!.fit!.printedCoefficients);
      expect(again.datasets[0]!.review).toEqual(fresh.datasets[0]!.review);
      // …and only asking for the per-point statistics reads the record (here: fails, naming it).
      expect(() => fitted.fit!.points).toThrow(/requires the cached fit .* it is missing/);
    } finally {
      await writeFile(path.join(fitCache.directory, `${key}.json`), fullText);
    }
    // With the record back, the lazily read arrays equal a fresh fit's.
    const restored = await fitHandbook(content, { fitCache });
    expect(fitsOf(restored)).toEqual(fitsOf(fresh));
  });

  it('a cache record carries every data row and the previews of the other orders, the same as drawn from full fits of those orders', async () => {
    const content = path.join(root, 'content');
    const fitCache = { directory: path.join(root, 'cache-record'), version: 'test-1' };
    const handbook = await fitHandbook(content, { fitCache });
    for (const { dataset, fitted } of handbook.datasets) {
      const correlation = dataset.correlation!;
      const record = readCachedFit(fitCache.directory, fitted!.cacheKey!)!;
      expect(record.points).toEqual(correlation.points);
      expect(record.previews).not.toBeNull();
      // Independent of fitCurve: each previewed order refitted by fitPolynomial (exact off), evaluated on the same grid.
      const settings = correlation.meta.fit;
      const used = correlation.used;
      const expected = orderPreviews({ settings, used, range: correlation.range }, fitted!.fit!, fitted!.selection);
      expect(record.previews).toEqual(expected);
      for (const preview of record.previews!.previews) {
        const full = fitPolynomial(
          { x: used.map((p) => p.x), y: used.map((p) => p.y), uncertainty: settings.weights === 'uncertainty' ? used.map((p) => p.uncertainty ?? NaN) : undefined },
          { order: preview.order, intercept: settings.intercept, transformX: settings.transform.x, transformY: settings.transform.y, constraints: settings.passThrough.map((p) => ({ x: p.x, y: p.y })), range: correlation.range, exact: 'off', ...(settings.criterion === 'chiSquare' ? { uncertaintyScale: 'stated' as const } : {}) },
        );
        // The residual sample always ends at the last point used; residuals are drawn to 3 significant digits.
        const last = record.previews!.residualX.length - 1;
        expect(record.previews!.residualX[last]).toBe(used[used.length - 1]!.x);
        expect(preview.residuals[last]).toBe(Number(full.points.residualsOriginal[used.length - 1]!.toPrecision(3)));
      }
    }
  });

  it('readCachedFit gives back the record writeCachedFit wrote: every value, NaN, ±Infinity and −0 included, keys in order', async () => {
    // The reference is the record itself, made afresh (fitDataset, cacheRecord), and the text the cache's JSON
    // (toCacheJson, the format of records before format 4) writes of it: the read-back record must give the same text.
    const content = path.join(root, 'content');
    const handbook = await fitHandbook(content);
    const directory = path.join(root, 'cache-round-trip');
    let special = 0;
    for (const { dataset } of handbook.datasets) {
      const correlation = dataset.correlation!;
      const record = cacheRecord(correlation, fitDataset(correlation));
      // A record with non-finite numbers and −0 in its per-point arrays and rows, as a degenerate fit may have.
      const odd = { ...record, fit: { ...record.fit!, points: { ...record.fit!.points, studentized: record.fit!.points.studentized.map((value, i) => [NaN, Infinity, -Infinity, -0][i % 4] ?? value) } } };
      for (const [key, written] of [['a'.repeat(64), record], ['b'.repeat(64), odd]] as const) {
        writeCachedFit(directory, key, written);
        const back = readCachedFit(directory, key)!;
        expect(back).toEqual(written);
        expect(toCacheJson(back)).toBe(toCacheJson(written));
        special += back.fit!.points.studentized.filter((value) => !Number.isFinite(value) || Object.is(value, -0)).length;
        // The previews' JSON a page embeds: what JSON.stringify writes of them, taken from the record's line.
        expect(previewsJson(back.previews!)).toBe(JSON.stringify(written.previews));
      }
    }
    expect(special).toBeGreaterThan(8);
  });

  it('previewsJson gives JSON.stringify\'s text of the previews read from a record, also when they hold −0 (not remembered then)', async () => {
    const content = path.join(root, 'content');
    const correlation = (await fitHandbook(content)).datasets[0]!.dataset.correlation!;
    const record = cacheRecord(correlation, fitDataset(correlation));
    // −0 in the grid: the record's line tags it, and JSON.stringify writes 0 (the page's JSON is JSON.stringify's).
    const withZero = { ...record, previews: { ...record.previews!, grid: [-0, ...record.previews!.grid.slice(1)] } };
    const directory = path.join(root, 'cache-previews-json');
    writeCachedFit(directory, 'a'.repeat(64), withZero);
    const back = readCachedFit(directory, 'a'.repeat(64))!;
    expect(Object.is(back.previews!.grid[0], -0)).toBe(true);
    expect(previewsJson(back.previews!)).toBe(JSON.stringify(withZero.previews));
    expect(previewsJson(back.previews!)).toContain('"grid":[0,');
    // A remembered text is what previewsJson gives for that object (and only for it).
    const object = { published: 2 };
    rememberPreviewsJson(object, '{"published":2}');
    expect(previewsJson(object)).toBe('{"published":2}');
    expect(previewsJson({ published: 3 })).toBe('{"published":3}');
  });

  it('readCachedSummary reads a summary line of any length (longer than its buffer), and nothing from a file without one', async () => {
    const content = path.join(root, 'content');
    const correlation = (await fitHandbook(content)).datasets[0]!.dataset.correlation!;
    const record = cacheRecord(correlation, fitDataset(correlation));
    const directory = path.join(root, 'cache-long-summary');
    // A message of 300 000 characters, some of them outside ASCII (UTF-8 of two and four bytes).
    const message = 'λ≤𝑥 '.repeat(60_000);
    const long = { ...record, diagnostics: [...record.diagnostics, { severity: 'warning' as const, file: 'x.csv', line: 1, column: 1, message }] };
    for (const [key, written] of [['c'.repeat(64), long], ['d'.repeat(64), record], ['e'.repeat(64), long]] as const) {
      writeCachedFit(directory, key, written);
      const summary = readCachedSummary(directory, key)!;
      expect(summary.diagnostics).toEqual(written.diagnostics);
      expect(summary.selection).toEqual(written.selection);
      expect(summary.fit!.printedCoefficients).toEqual(written.fit!.printedCoefficients);
    }
    await writeFile(path.join(directory, `${'f'.repeat(64)}.json`), '{"no line break"');
    expect(readCachedSummary(directory, 'f'.repeat(64))).toBeUndefined();
    expect(readCachedSummary(directory, '0'.repeat(64))).toBeUndefined();
  });

  it('fitCacheKey changes with a data value, a fit option and the code version, and only then', async () => {
    const content = path.join(root, 'content');
    const before = (await fitHandbook(content)).datasets[0]!.dataset.correlation!;
    expect(fitCacheKey(before, 'v1')).toBe(fitCacheKey(before, 'v1'));
    expect(fitCacheKey(before, 'v2')).not.toBe(fitCacheKey(before, 'v1'));
    const changedPoint = { ...before, used: before.used.map((point, i) => (i === 0 ? { ...point, y: point.y + 1e-12 } : point)) };
    expect(fitCacheKey(changedPoint, 'v1')).not.toBe(fitCacheKey(before, 'v1'));
    const changedOption = { ...before, meta: { ...before.meta, fit: { ...before.meta.fit, maxOrder: 3 } } };
    expect(fitCacheKey(changedOption, 'v1')).not.toBe(fitCacheKey(before, 'v1'));
    // A data file edited on disk gives a new key for that folder only.
    const csvPath = path.join(content, 'brindlewick-bw3-conductivity', 'data.csv');
    const csv = await readFile(csvPath, 'utf8');
    await writeFile(csvPath, csv.replace(/\n300,14\.147,/, '\n300,14.148,'));
    const fitCache = { directory: path.join(root, 'cache-edit'), version: 'test-1' };
    await fitHandbook(content, { fitCache });
    await writeFile(csvPath, csv);
    const after = await fitHandbook(content, { fitCache });
    expect(after.cachedFits).toBe(1);
  });

  it('fitCodeVersion depends on the core sources (a 64-digit hex digest, stable between calls)', () => {
    expect(fitCodeVersion('.')).toMatch(/^[0-9a-f]{64}$/);
    expect(fitCodeVersion('.')).toBe(fitCodeVersion('.'));
    expect(fitCodeVersion(root)).not.toBe(fitCodeVersion('.'));
  });
});
