/**
 * Checks of a built site's handbook.json: valid against the handbook.schema.json published beside it (checked
 * with ajv, an independent JSON Schema validator), one entry per fitted correlation, page urls and download paths
 * that exist in the output, and each correlation's numbers identical to what `correlary fit <folder> --json`
 * prints for the same folder (the same data and options).
 */
import { existsSync } from 'node:fs';
import { readFile } from 'node:fs/promises';
import path from 'node:path';
import { Ajv2020 } from 'ajv/dist/2020.js';
import { expect } from 'vitest';
import { runCli } from '../helpers/runCli.ts';

interface HandbookJson {
  formatVersion: number;
  generator: { name: string; version: string };
  handbook: { url: string; basePath: string; title: string };
  cautions: string[];
  correlations: Record<string, unknown>[];
}

/** Reads and checks outDir/handbook.json; returns it for further checks. */
export async function checkHandbookJson(outDir: string, content: string, base: string, slugs: readonly string[]): Promise<HandbookJson> {
  const schema = JSON.parse(await readFile(path.join(outDir, 'handbook.schema.json'), 'utf8'));
  const json = JSON.parse(await readFile(path.join(outDir, 'handbook.json'), 'utf8')) as HandbookJson;
  const ajv = new Ajv2020({ allErrors: true, strict: true, allowUnionTypes: true, validateFormats: false });
  const validate = ajv.compile(schema);
  expect(validate(json), JSON.stringify(validate.errors, null, 2)).toBe(true);

  const manifest = JSON.parse(await readFile(path.join(path.dirname(new URL(import.meta.url).pathname), '..', '..', 'package.json'), 'utf8'));
  expect(json.formatVersion).toBe(1);
  expect(json.generator).toEqual({ name: 'correlary', version: manifest.version });
  expect(json.handbook.basePath).toBe(base);
  expect(json.correlations.map((item) => item['slug'])).toEqual([...slugs].sort());

  const inSite = (sitePath: string) => path.join(outDir, ...sitePath.slice(base.length).split('/').filter(Boolean));
  for (const item of json.correlations) {
    const slug = String(item['slug']);
    expect(item['url']).toBe(`${base}correlations/${slug}/`);
    expect(existsSync(path.join(inSite(String(item['url'])), 'index.html')), `${slug}: page`).toBe(true);
    for (const [kind, file] of Object.entries(item['downloads'] as Record<string, string>)) {
      expect(existsSync(inSite(file)), `${slug}: download ${kind} at ${file}`).toBe(true);
    }
    const order = item['order'] as number;
    expect((item['coefficients'] as number[]).length).toBe(order + 1);
    expect((item['standardErrors'] as unknown[]).length).toBe(order + 1);
    expect((item['mapped'] as { coefficients: number[] }).coefficients.length).toBe(order + 1);

    // The same folder through the command line: every number equal to the last bit (JSON round-trips doubles).
    const { code, stdout, stderr } = await runCli(['fit', path.join(content, slug), '--json']);
    expect(code, stderr).toBe(0);
    const cli = JSON.parse(stdout) as Record<string, unknown>;
    for (const key of ['order', 'coefficients', 'standardErrors', 'mapped', 'transforms', 'range', 'residualStdDev', 'n', 'checkValues', 'cautions', 'property', 'variable', 'material', 'title', 'status', 'temperatureScales']) {
      expect(item[key], `${slug}: ${key}`).toEqual(cli[key]);
    }
    (item['coefficients'] as number[]).forEach((value, k) => expect(Object.is(value, (cli['coefficients'] as number[])[k]), `${slug} a${k}`).toBe(true));
  }
  return json;
}
