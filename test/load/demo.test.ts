/**
 * The demo handbook: the generator reproduces the committed files byte for byte, and every demo correlation
 * validates, fits and says it is invented.
 */
import { mkdtemp, readFile, readdir, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { generateDemo } from '../../scripts/demo/generate.ts';
import { DEMO_DATASETS } from '../../scripts/demo/datasets/index.ts';
import { fitDataset, readHandbook } from '../../src/load/index.ts';

const temporary: string[] = [];
afterAll(async () => {
  for (const directory of temporary) await rm(directory, { recursive: true, force: true });
});

describe('generateDemo(directory)', () => {
  it('generateDemo(tmp) reproduces every committed demo file byte for byte', async () => {
    const directory = await mkdtemp(path.join(tmpdir(), 'correlary-demo-'));
    temporary.push(directory);
    const written = await generateDemo(directory);
    expect(written).toHaveLength(2 * DEMO_DATASETS.length);
    for (const file of written) {
      const generated = await readFile(path.join(directory, file));
      const committed = await readFile(path.join('content', file));
      expect(generated.equals(committed), file).toBe(true);
    }
  });

  it('content/ holds only the generated demo folders', async () => {
    const folders = (await readdir('content', { withFileTypes: true })).filter((entry) => entry.isDirectory()).map((entry) => entry.name);
    expect(folders.sort()).toEqual(DEMO_DATASETS.map((dataset) => dataset.slug).sort());
  });
});

describe('readHandbook(content) on the demo', () => {
  it('readHandbook(content) loads every demo correlation without errors or warnings, marked invented', async () => {
    const handbook = await readHandbook('content');
    expect(handbook.diagnostics).toEqual([]);
    expect(handbook.datasets.flatMap((dataset) => dataset.diagnostics)).toEqual([]);
    for (const dataset of handbook.datasets) {
      expect(dataset.correlation?.meta.invented, dataset.slug).toBe(true);
      expect(dataset.correlation?.meta.source.notes, dataset.slug).toMatch(/^Invented demonstration data/);
    }
  });

  it('the demo covers the cases it is meant to show', async () => {
    const handbook = await readHandbook('content');
    const loaded = handbook.datasets.map((dataset) => dataset.correlation!);
    const sizes = loaded.map((correlation) => correlation.used.length);
    expect(Math.min(...sizes)).toBe(8);
    expect(Math.max(...sizes)).toBe(2000);
    expect(loaded.some((correlation) => correlation.meta.fit.transform.y === 'log')).toBe(true);
    expect(loaded.some((correlation) => correlation.meta.fit.passThrough.length > 0)).toBe(true);
    expect(loaded.some((correlation) => correlation.meta.fit.weights === 'uncertainty')).toBe(true);
    expect(loaded.some((correlation) => correlation.excluded.length === 1)).toBe(true);
    expect(loaded.some((correlation) => new Set(correlation.used.map((point) => point.x)).size < correlation.used.length)).toBe(true);
    const cpSources = loaded.filter((correlation) => correlation.meta.material.name.startsWith('Corvane-12') && correlation.meta.property.symbol === 'c_p');
    expect(cpSources.map((correlation) => correlation.meta.source.method).sort()).toEqual(['measured', 'table']);
  });

  it('fitDataset(demo) fits every demo correlation, honouring the pass-through point', async () => {
    const handbook = await readHandbook('content');
    for (const dataset of handbook.datasets) {
      const fitted = fitDataset(dataset.correlation!);
      expect(fitted.diagnostics.filter((diagnostic) => diagnostic.severity === 'error'), dataset.slug).toEqual([]);
      expect(fitted.fit, dataset.slug).toBeDefined();
    }
    const strain = handbook.datasets.find((dataset) => dataset.slug === 'brindlewick-bw3-thermal-strain')!;
    const fit = fitDataset(strain.correlation!).fit!;
    // Horner evaluation of the power-basis coefficients at the reference temperature.
    const atReference = fit.coefficients.reduceRight((sum, coefficient) => sum * 293.15 + coefficient, 0);
    expect(Math.abs(atReference)).toBeLessThan(1e-6);
  });
});
