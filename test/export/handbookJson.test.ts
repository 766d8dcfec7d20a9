/**
 * handbookJson and its schema without a site build: the document made from a fixture handbook validates against
 * HANDBOOK_SCHEMA under ajv (an independent JSON Schema validator, strict mode), and documents that break the
 * schema's promises are rejected. The built site's handbook.json is checked in test/site.
 */
import { Ajv2020 } from 'ajv/dist/2020.js';
import { describe, expect, it } from 'vitest';
import { correlationRecord, handbookJson, HANDBOOK_SCHEMA, type HandbookJsonInput } from '../../src/export/index.ts';
import { fitHandbook } from '../../src/load/index.ts';

async function fixtureInput(): Promise<HandbookJsonInput> {
  const handbook = await fitHandbook('test/fixtures/content/valid');
  const correlations = handbook.datasets.flatMap(({ dataset, fitted }) => {
    const loaded = dataset.correlation;
    if (loaded === undefined || fitted?.fit === undefined) return [];
    const record = correlationRecord({ slug: loaded.slug, meta: loaded.meta, range: loaded.range, excluded: loaded.excluded, fit: fitted.fit, selection: fitted.selection ?? null });
    return [{ record, url: `/hb/correlations/${loaded.slug}/`, downloads: Object.fromEntries(['json', 'csv', 'python', 'javascript', 'c', 'spreadsheet'].map((kind) => [kind, `/hb/correlations/${loaded.slug}/${kind}`])) }];
  });
  return { generator: { name: 'correlary', version: '0.1.0' }, handbook: { title: 'Test', url: 'https://example.org/hb/', basePath: '/hb/' }, correlations };
}

function validator() {
  return new Ajv2020({ allErrors: true, strict: true, allowUnionTypes: true, validateFormats: false }).compile(HANDBOOK_SCHEMA);
}

describe('handbookJson(input)', () => {
  it('handbookJson of a fixture handbook is valid against HANDBOOK_SCHEMA and carries the record, url and downloads', async () => {
    const input = await fixtureInput();
    const json = handbookJson(input);
    const validate = validator();
    expect(validate(json), JSON.stringify(validate.errors)).toBe(true);
    expect(json.$schema).toBe('https://example.org/hb/handbook.schema.json');
    expect(json.correlations).toHaveLength(1);
    expect(json.correlations[0]!.coefficients).toEqual(input.correlations[0]!.record.coefficients);
    expect(json.correlations[0]!.url).toBe('/hb/correlations/liquid-a/');
  });

  it('carries temperatureScales where x is a temperature: three scales, native first, valid against the schema', async () => {
    const json = handbookJson(await fixtureInput());
    const scales = json.correlations[0]!.temperatureScales;
    expect(scales?.scales.map((form) => form.scale)).toEqual([scales!.native, ...['K', '°C', '°F'].filter((name) => name !== scales!.native)]);
    expect(scales?.scales[0]!.coefficients).toEqual(json.correlations[0]!.coefficients);
    const validate = validator();
    const copy = JSON.parse(JSON.stringify(json));
    copy.correlations[0].temperatureScales.scales[1].scale = 'R';
    expect(validate(copy)).toBe(false);
    copy.correlations[0].temperatureScales = null;
    expect(validate(copy), JSON.stringify(validate.errors)).toBe(true);
  });

  it('HANDBOOK_SCHEMA rejects a correlation without coefficients, with an unknown status or with a relative download path', async () => {
    const json = JSON.parse(JSON.stringify(handbookJson(await fixtureInput())));
    const validate = validator();
    const broken = [
      (doc: { correlations: Record<string, unknown>[] }) => delete doc.correlations[0]!['coefficients'],
      (doc: { correlations: Record<string, unknown>[] }) => (doc.correlations[0]!['status'] = 'accepted'),
      (doc: { correlations: Record<string, unknown>[] }) => ((doc.correlations[0]!['downloads'] as Record<string, string>)['python'] = 'snippet.py'),
      (doc: { correlations: Record<string, unknown>[] }) => ((doc.correlations[0]!['range'] as Record<string, unknown>)['min'] = '280'),
    ];
    for (const breakIt of broken) {
      const copy = JSON.parse(JSON.stringify(json));
      breakIt(copy);
      expect(validate(copy)).toBe(false);
    }
  });

  it('HANDBOOK_SCHEMA accepts properties it does not know (the extension rule)', async () => {
    const json = JSON.parse(JSON.stringify(handbookJson(await fixtureInput())));
    json.correlations[0].someFutureField = { any: 'thing' };
    json.someFutureTopLevel = 1;
    expect(validator()(json)).toBe(true);
  });
});
