/**
 * correlationRecord and coefficientsCsv: the one serialiser behind `correlary fit --json`, the downloads and
 * handbook.json. Field names are a public interface (pinned here); non-finite numbers become null; the CSV carries
 * the record's numbers as shortest round-trip text.
 */
import { describe, expect, it } from 'vitest';
import { coefficientsCsv, correlationRecord, jsonNumbers, type CorrelationSource } from '../../src/export/index.ts';
import { fitDataset, readDataset } from '../../src/load/index.ts';

async function source(folder = 'test/fixtures/content/valid/liquid-a'): Promise<CorrelationSource> {
  const read = await readDataset(folder);
  const correlation = read.correlation;
  if (correlation === undefined) throw new Error('fixture must load');
  const fitted = fitDataset(correlation);
  if (fitted.fit === undefined) throw new Error('fixture must fit');
  return { slug: correlation.slug, meta: correlation.meta, range: correlation.range, excluded: correlation.excluded, fit: fitted.fit, selection: fitted.selection ?? null };
}

describe('jsonNumbers', () => {
  it('jsonNumbers replaces NaN and ±Infinity by null at any depth and leaves finite numbers alone', () => {
    const input = Object.freeze({ s: NaN, n: 3, row: Object.freeze([1, Infinity, -Infinity, -0.5]), nested: Object.freeze({ p: null, q: 'x' }) });
    expect(jsonNumbers(input)).toEqual({ s: null, n: 3, row: [1, null, null, -0.5], nested: { p: null, q: 'x' } });
  });
});

describe('correlationRecord', () => {
  it('correlationRecord keeps its documented field names (a public interface)', async () => {
    const record = correlationRecord(await source());
    // The field list of src/export/correlationRecord.ts; adding a field is fine, renaming or dropping one is not.
    for (const key of ['recordVersion', 'slug', 'title', 'status', 'invented', 'notice', 'cautions', 'property', 'variable', 'material', 'range', 'transforms', 'symbols', 'intercept', 'weighted', 'order', 'coefficients', 'printedCoefficients', 'significantDigits', 'standardErrors', 'confidence', 'confidenceIntervals', 'equation', 'equationTex', 'mapped', 'passThrough', 'checkValues', 'residualStdDev', 'statisticUnit', 'rSquared', 'n', 'degreesOfFreedom', 'statistics', 'orderSelection', 'provenance', 'method', 'warnings']) {
      expect(record, key).toHaveProperty(key);
    }
    expect(Object.keys(record.mapped)).toEqual(['center', 'halfWidth', 'coefficients', 'covariance']);
    expect(record.coefficients).toHaveLength(record.order! + 1);
    expect(record.cautions.join(' ')).toMatch(/qualified engineer/);
  });

  it('correlationRecord is plain JSON: a JSON round trip changes nothing, and no number is NaN or infinite', async () => {
    const record = correlationRecord(await source());
    expect(JSON.parse(JSON.stringify(record))).toEqual(record);
  });

  it('correlationRecord prints the reason once and names the statistic unit', async () => {
    const record = correlationRecord(await source());
    expect(record.statisticUnit).toBe(record.property.unit);
    expect(record.orderSelection?.reason).toMatch(/^Order \d/);
  });
});

describe('coefficientsCsv', () => {
  it('coefficientsCsv carries the record: cautions first, then one row per coefficient that parses back to the same double', async () => {
    const record = correlationRecord(await source());
    const lines = coefficientsCsv(record).trimEnd().split('\n');
    const table = lines.filter((line) => !line.startsWith('#'));
    expect(lines[0]).toMatch(/^# (INVENTED DATA|CAUTION)/);
    expect(table[0]).toBe('k,coefficient,significant_digits,rounded,standard_error,ci95_low,ci95_high');
    table.slice(1).forEach((line, k) => {
      const fields = line.split(',');
      expect(Object.is(Number(fields[1]), record.coefficients[k])).toBe(true);
      expect(fields[3]).toBe(record.printedCoefficients[k]);
    });
  });
});
