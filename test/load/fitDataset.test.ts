/**
 * fitDataset(correlation): a FitError naming a point is reported at that point's line in the data file.
 */
import { describe, expect, it } from 'vitest';
import { fitDataset, formatDiagnostic, readDataset, type LoadedCorrelation } from '../../src/load/index.ts';

const FOLDER = 'test/fixtures/content/valid/liquid-a';

async function loadedValid(): Promise<LoadedCorrelation> {
  const result = await readDataset(FOLDER);
  if (result.correlation === undefined) throw new Error('fixture valid must load');
  return result.correlation;
}

describe('fitDataset(correlation)', () => {
  it('fitDataset(valid) chooses an order and fits it', async () => {
    const fitted = fitDataset(await loadedValid());
    expect(fitted.diagnostics).toEqual([]);
    expect(fitted.selection?.order).toBe(2);
    expect(fitted.fit?.order).toBe(2);
    expect(fitted.fit?.statistics.n).toBe(8);
  });

  it('fitDataset maps a FitError pointIndex to the CSV line of that point, counting only used rows', async () => {
    const valid = await loadedValid();
    // Bypass validation on purpose: a log transform with a negative y in data row 4 (line 5), after row 1 is
    // excluded, so the core's pointIndex (2) differs from the row index (3).
    const points = valid.points.map((point) => (point.row === 4 ? { ...point, y: -1 } : point));
    const broken: LoadedCorrelation = {
      ...valid,
      meta: { ...valid.meta, fit: { ...valid.meta.fit, transform: { x: 'identity', y: 'log' } } },
      points,
      used: points.filter((point) => point.row !== 1),
    };
    const fitted = fitDataset(broken);
    expect(fitted.fit).toBeUndefined();
    expect(fitted.diagnostics.map(formatDiagnostic)).toEqual([
      `${FOLDER}/data.csv:5: cannot fit this point: y = -1 is not positive, so ln y is undefined`,
    ]);
  });

  it('fitDataset reports a FitError without a point at fit.order in the metadata', async () => {
    const valid = await loadedValid();
    const broken: LoadedCorrelation = { ...valid, meta: { ...valid.meta, fit: { ...valid.meta.fit, criterion: 'chiSquare' } } };
    expect(fitDataset(broken).diagnostics.map(formatDiagnostic)).toEqual([
      `${FOLDER}/correlation.yaml:2:1: cannot fit: selectOrder requires per-point uncertainties for the chiSquare criterion`,
    ]);
  });

  it('fitDataset refuses when the pass-through points fix every candidate order completely', async () => {
    const folder = 'test/fixtures/content/constraints-fix-all/liquid-a';
    const loaded = await readDataset(folder);
    expect(loaded.diagnostics).toEqual([]);
    expect(fitDataset(loaded.correlation!).diagnostics.map(formatDiagnostic)).toEqual([
      `${folder}/correlation.yaml:24:3: cannot fit: 2 pass-through points leave no free coefficient at any candidate order up to 1`,
    ]);
  });
});
