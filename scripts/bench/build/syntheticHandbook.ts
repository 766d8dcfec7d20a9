/**
 * A seeded synthetic handbook for bench:build: N correlation folders of invented data with n from 8 to 2000
 * points, true polynomial degrees 1–8, some transformed fits (ln y against 1/x), some stated per-point
 * uncertainties (weighted, some with the χ² criterion) and some pass-through points. The same seed writes the
 * same bytes. Every file says the data are synthetic and invented.
 */
import { mkdir, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { createRandom, hashString, type Random } from '../../demo/random.ts';

/** Six significant digits, as measured tables are typed. */
function typed(value: number): string {
  return String(Number(value.toPrecision(6)));
}

/** Point count: mostly small tables, some hundreds, a few up to 2000. */
function pointCount(random: Random): number {
  const u = random.uniform();
  if (u < 0.7) return 8 + Math.floor(random.uniform() * 53);
  if (u < 0.95) return 60 + Math.floor(random.uniform() * 341);
  return 400 + Math.floor(random.uniform() * 1601);
}

export interface SyntheticOptions {
  readonly count: number;
  readonly seed?: number;
}

/** One folder's files. */
export interface SyntheticDataset {
  readonly slug: string;
  readonly yaml: string;
  readonly csv: string;
}

/** The i-th synthetic dataset (pure: the same index and seed give the same text). */
export function syntheticDataset(index: number, seed = 1): SyntheticDataset {
  const random = createRandom(hashString(`bench-build-${seed}-${index}`));
  const slug = `synthetic-${String(index).padStart(5, '0')}`;
  const n = pointCount(random);
  const degree = Math.min(1 + Math.floor(random.uniform() * 8), Math.max(1, Math.floor(n / 3) - 1));
  const kind = random.uniform();
  const transformed = kind < 0.15;
  const weighted = kind >= 0.15 && kind < 0.4;
  const chiSquare = weighted && random.uniform() < 0.5;
  const passThrough = !transformed && random.uniform() < 0.1;
  const low = 200 + Math.round(random.uniform() * 100);
  const high = low + 200 + Math.round(random.uniform() * 600);
  const coefficients = Array.from({ length: degree + 1 }, (_, k) => (k === 0 ? 10 : random.normal(0, 3 / (k + 1))));
  const truth = (x: number): number => {
    const t = (2 * (x - low)) / (high - low) - 1;
    const polynomial = coefficients.reduceRight((sum, c) => sum * t + c, 0);
    return transformed ? Math.exp(polynomial / 10) : polynomial;
  };
  const noise = 0.002 * (transformed ? 1 : 10);
  const header = weighted ? 'x,y,u' : 'x,y';
  const xs = Array.from({ length: n }, (_, i) => low + ((high - low) * i) / (n - 1));
  const rows = xs.map((x) => {
    const sigma = noise * (1 + random.uniform());
    const y = truth(x) + random.normal(0, weighted ? sigma : noise);
    return weighted ? `${typed(x)},${typed(y)},${typed(sigma)}` : `${typed(x)},${typed(y)}`;
  });
  const middle = Number(typed((low + high) / 2));
  const lines = [
    '# Synthetic invented data written by scripts/bench/build for a build benchmark; not a measurement.',
    `title: Synthetic correlation ${index} (invented)`,
    'invented: true',
    'property:',
    `  name: synthetic property ${index % 7}`,
    `  symbol: ${transformed ? '\\mu' : 'c_p'}`,
    `  unit: ${transformed ? 'Pa·s' : 'J/(kg·K)'}`,
    'variable:',
    '  name: temperature',
    '  symbol: T',
    '  unit: K',
    'material:',
    `  name: Synthetic material ${index % 50} (invented)`,
    'source:',
    '  citation: Synthetic benchmark data (invented)',
    '  method: measured',
    '  date: 2026-01-01',
    '  preparedBy: bench:build (invented)',
    'data:',
    '  x: x',
    '  y: y',
    ...(weighted ? ['  uncertainty: u'] : []),
    'fit:',
    '  maxOrder: 8',
    ...(weighted ? ['  weights: uncertainty'] : []),
    ...(chiSquare ? ['  criterion: chiSquare'] : []),
    ...(transformed ? ['  transform:', '    x: reciprocal', '    y: log'] : []),
    ...(passThrough ? ['  passThrough:', `    - x: ${middle}`, `      y: ${typed(truth(middle))}`, '      reason: synthetic reference point'] : []),
    'tags:',
    '  - synthetic',
    'review:',
    '  status: draft',
  ];
  return { slug, yaml: `${lines.join('\n')}\n`, csv: `${header}\n${rows.join('\n')}\n` };
}

/** Write N synthetic folders under `directory` (which must exist). */
export async function writeSyntheticHandbook(directory: string, options: SyntheticOptions): Promise<void> {
  for (let index = 0; index < options.count; index++) {
    const dataset = syntheticDataset(index, options.seed);
    const folder = path.join(directory, dataset.slug);
    await mkdir(folder, { recursive: true });
    await writeFile(path.join(folder, 'correlation.yaml'), dataset.yaml);
    await writeFile(path.join(folder, 'data.csv'), dataset.csv);
  }
}
