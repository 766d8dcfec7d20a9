/**
 * Scenario families of the order-selection benchmark, following the Setup section of
 * /work/shared/reference/order-selection-baseline.md:
 *   A  polynomial truth Σ c_k T_k(τ), τ = (x − 575)/325, + Gaussian noise σ = |c_d|/SNR, SNR ∈ {3, 10, 30}
 *   A′ the same at SNR = 1 (supplement, reported separately)
 *   B  smooth non-polynomial truth a + b·exp(−c/x) or a·√x + b, + noise σ = f·(range of truth), f ∈ {1e-2, 1e-3, 1e-4}
 *   C1 rounded table (4 significant digits, no noise), A's generator scaled by 10^U(−1, 3)
 *   C2 rounded table of B's functions scaled by 10^U(−1, 3)
 * x on 250..900, layout even (linspace) or random (sorted uniform, redrawn per replicate), n ∈ {8, 12, 22, 50, 200}.
 */
import { Random } from './random.ts';

export type Family = 'A' | 'A1' | 'B' | 'C1' | 'C2';
export const SAMPLE_SIZES = [8, 12, 22, 50, 200] as const;
export const LAYOUTS = ['even', 'random'] as const;
export const X_MIN = 250;
export const X_MAX = 900;
export const BASE_SEED = 20250611;

export interface Cell {
  readonly id: number;
  readonly family: Family;
  readonly layout: (typeof LAYOUTS)[number];
  readonly n: number;
  /** True degree (A, A1, C1) or null. */
  readonly degree: number | null;
  /** SNR (A), noise fraction f (B), or null. */
  readonly level: number | null;
  readonly shape: 'exp' | 'sqrt' | null;
}

/** One simulated data set: points, the truth function, and the stated σ for the χ² mode (null when none). */
export interface DataSet {
  readonly x: number[];
  readonly y: number[];
  readonly truth: (x: number) => number;
  readonly sigma: number | null;
}

/** All cells in the fixed loop order (A: layout → n → d → SNR; A′; B: layout → n → function → f; C: layout → n → C1 d, C2). */
export function allCells(): Cell[] {
  const cells: Cell[] = [];
  let id = 0;
  for (const layout of LAYOUTS) for (const n of SAMPLE_SIZES) for (let degree = 1; degree <= 5; degree++) for (const level of [3, 10, 30]) {
    cells.push({ id: id++, family: 'A', layout, n, degree, level, shape: null });
  }
  id = 10000;
  for (const layout of LAYOUTS) for (const n of SAMPLE_SIZES) for (let degree = 1; degree <= 5; degree++) {
    cells.push({ id: id++, family: 'A1', layout, n, degree, level: 1, shape: null });
  }
  id = 20000;
  for (const layout of LAYOUTS) for (const n of SAMPLE_SIZES) for (const shape of ['exp', 'sqrt'] as const) for (const level of [1e-2, 1e-3, 1e-4]) {
    cells.push({ id: id++, family: 'B', layout, n, degree: null, level, shape });
  }
  id = 30000;
  for (const layout of LAYOUTS) for (const n of SAMPLE_SIZES) {
    for (let degree = 1; degree <= 5; degree++) cells.push({ id: id++, family: 'C1', layout, n, degree, level: null, shape: null });
    for (const shape of ['exp', 'sqrt'] as const) cells.push({ id: id++, family: 'C2', layout, n, degree: null, level: null, shape });
  }
  return cells;
}

/** Generator for one cell; `seed` other than BASE_SEED gives fresh draws (a hold-out check of tuned rules). */
export function randomForCell(cell: Cell, seed: number = BASE_SEED): Random {
  return new Random([seed, cell.id]);
}

function layoutX(random: Random, layout: Cell['layout'], n: number): number[] {
  if (layout === 'even') return Array.from({ length: n }, (_, i) => X_MIN + ((X_MAX - X_MIN) * i) / (n - 1));
  return Array.from({ length: n }, () => random.between(X_MIN, X_MAX)).sort((a, b) => a - b);
}

/** Chebyshev coefficients of A's truth: c₀ = 1, |c_k| = 0.3^k·U(0.5, 1.5) for 1 ≤ k < d, |c_d| = 0.3^d, random signs. */
function chebyshevCoefficients(random: Random, degree: number): number[] {
  const coefficients = [1];
  for (let k = 1; k <= degree; k++) {
    const magnitude = k < degree ? 0.3 ** k * random.between(0.5, 1.5) : 0.3 ** degree;
    coefficients.push(random.sign() * magnitude);
  }
  return coefficients;
}

/** Σ c_k T_k(τ) by the three-term recurrence, τ = (x − 575)/325. */
function chebyshevTruth(coefficients: readonly number[]): (x: number) => number {
  return (x) => {
    const tau = (x - 575) / 325;
    let previous = 1;
    let current = tau;
    let sum = coefficients[0]!;
    for (let k = 1; k < coefficients.length; k++) {
      if (k > 1) {
        const next = 2 * tau * current - previous;
        previous = current;
        current = next;
      }
      sum += coefficients[k]! * current;
    }
    return sum;
  };
}

function smoothTruth(random: Random, shape: 'exp' | 'sqrt'): (x: number) => number {
  if (shape === 'exp') {
    const a = random.between(0.3, 0.6);
    const b = random.between(0.2, 0.5);
    const c = random.between(300, 1200);
    return (x) => a + b * Math.exp(-c / x);
  }
  const a = random.between(0.5, 2);
  const b = random.between(1, 20);
  return (x) => a * Math.sqrt(x) + b;
}

/** Round to 4 significant digits; returns the value and its last-digit unit q. */
function roundFourDigits(value: number): { value: number; unit: number } {
  if (value === 0) return { value: 0, unit: 0 };
  const unit = 10 ** (Math.floor(Math.log10(Math.abs(value))) - 3);
  return { value: Math.round(value / unit) * unit, unit };
}

/** Draw one data set of a cell (draw order: x layout, truth parameters, then noise). */
export function drawDataSet(cell: Cell, random: Random): DataSet {
  const x = layoutX(random, cell.layout, cell.n);
  if (cell.family === 'A' || cell.family === 'A1') {
    const coefficients = chebyshevCoefficients(random, cell.degree!);
    const truth = chebyshevTruth(coefficients);
    const sigma = Math.abs(coefficients[cell.degree!]!) / cell.level!;
    const y = x.map((xi) => truth(xi) + sigma * random.gaussian());
    return { x, y, truth, sigma };
  }
  if (cell.family === 'B') {
    const truth = smoothTruth(random, cell.shape!);
    const sigma = cell.level! * Math.abs(truth(X_MAX) - truth(X_MIN));
    const y = x.map((xi) => truth(xi) + sigma * random.gaussian());
    return { x, y, truth, sigma };
  }
  const base = 10 ** random.between(-1, 3);
  const unscaled = cell.family === 'C1' ? chebyshevTruth(chebyshevCoefficients(random, cell.degree!)) : smoothTruth(random, cell.shape!);
  const truth = (xi: number): number => base * unscaled(xi);
  const rounded = x.map((xi) => roundFourDigits(truth(xi)));
  // One stated σ for the table: the RMS of the per-entry rounding SDs q/√12 (see the baseline's rule 10).
  const sigma = Math.sqrt(rounded.reduce((sum, entry) => sum + entry.unit ** 2 / 12, 0) / rounded.length);
  return { x, y: rounded.map((entry) => entry.value), truth, sigma };
}
