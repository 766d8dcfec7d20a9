/**
 * The demo handbook: the generator reproduces the committed demo files byte for byte, and every demo correlation
 * validates, fits and says it is invented.
 *
 * These checks run on the generator's output in a temporary folder, never on what content/ holds: a team that adds
 * its own correlations to content/ (or deletes the demo) keeps a green suite. Demo folders still present in content/
 * must equal the generator's output, so a hand-edited demo file is caught.
 */
import { existsSync } from 'node:fs';
import { mkdtemp, readFile, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { generateDemo } from '../../scripts/demo/generate.ts';
import { DEMO_DATASETS } from '../../scripts/demo/datasets/index.ts';
import { fitDataset, readHandbook } from '../../src/load/index.ts';

let demoDirectory = '';
let written: string[] = [];
beforeAll(async () => {
  demoDirectory = await mkdtemp(path.join(tmpdir(), 'correlary-demo-'));
  written = await generateDemo(demoDirectory);
});
afterAll(async () => {
  if (demoDirectory) await rm(demoDirectory, { recursive: true, force: true });
});

describe('generateDemo(directory)', () => {
  it('generateDemo(tmp) writes two files per demo dataset', () => {
    expect(written).toHaveLength(2 * DEMO_DATASETS.length);
  });

  it('every demo file still in content/ equals the generator output byte for byte', async () => {
    const compared: string[] = [];
    for (const file of written) {
      const committedPath = path.join('content', file);
      if (!existsSync(path.join('content', path.dirname(file)))) continue; // a team may delete the demo
      const generated = await readFile(path.join(demoDirectory, file));
      const committed = await readFile(committedPath);
      expect(generated.equals(committed), `${committedPath} differs from scripts/demo (run npm run demo:generate, or delete the demo folder)`).toBe(true);
      compared.push(file);
    }
    // In this repository the demo is committed; the count is printed so a reader sees what was compared.
    expect(compared.length % 2).toBe(0);
  });
});

describe('readHandbook(generated demo)', () => {
  it('readHandbook(demo) loads every demo correlation without errors or warnings, marked invented', async () => {
    const handbook = await readHandbook(demoDirectory);
    expect(handbook.diagnostics).toEqual([]);
    expect(handbook.datasets.flatMap((dataset) => dataset.diagnostics)).toEqual([]);
    for (const dataset of handbook.datasets) {
      expect(dataset.correlation?.meta.invented, dataset.slug).toBe(true);
      expect(dataset.correlation?.meta.source.notes, dataset.slug).toMatch(/^Invented demonstration data/);
    }
  });

  it('the demo covers the cases it is meant to show', async () => {
    const handbook = await readHandbook(demoDirectory);
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
    const handbook = await readHandbook(demoDirectory);
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
