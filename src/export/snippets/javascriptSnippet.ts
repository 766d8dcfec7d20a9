/**
 * The JavaScript ES module of a correlation: `evaluate(x)` and `predictionInterval(x)`, both throwing RangeError
 * outside the validity range, with JSDoc types, and its TypeScript declaration file. Where x is a temperature both
 * take an options object `{ scale: 'K' | '°C' | '°F' }` (default the scale of the fit). Every constant is one line of
 * JSON (the page's evaluator reads them back). Same evaluation as
 * pythonSnippet.ts.
 *
 * @example javascriptSnippet(source).includes('export function evaluate(x)') // => true
 */
import { scaleHeaderLines, snippetScales } from './snippetScales.ts';
import { headerLines, literal } from './snippetText.ts';
import type { SnippetSource } from './snippetSource.ts';

const list = (values: readonly number[]) => `[${values.map(literal).join(', ')}]`;

export function javascriptSnippet(source: SnippetSource): string {
  const r = source.record;
  const m = r.mapped;
  const u = r.transforms.x === 'identity' ? 'x' : r.transforms.x === 'reciprocal' ? '1 / x' : 'Math.log(x)';
  const back = r.transforms.y === 'log' ? 'Math.exp' : '';
  const scales = snippetScales(r);
  const native = scales?.find((entry) => entry.native)?.scale;
  const scaleTable =
    scales === null
      ? ''
      : `export const NATIVE_SCALE = "${native}";
/** scale: [xMin, xMax, center, halfWidth] in that scale */
export const SCALES = {${scales.map((entry) => `"${entry.scale}": ${list([entry.min, entry.max, entry.center, entry.halfWidth])}`).join(', ')}};
`;
  const mappedFunction =
    scales === null
      ? `/** @param {number} x @returns {number} */
function mapped(x) {
  if (typeof x !== 'number' || Number.isNaN(x)) throw new RangeError('x must be a number');
  if (x < X_MIN || x > X_MAX) throw new RangeError(\`x = \${x} is outside the validity range [\${X_MIN}, \${X_MAX}]; the correlation is valid only inside it\`);
  return (${u} - CENTER) / HALF_WIDTH;
}`
      : `/** @param {number} x @param {{ scale?: string } | undefined} options @returns {number} */
function mapped(x, options) {
  if (typeof x !== 'number' || Number.isNaN(x)) throw new RangeError('x must be a number');
  const scale = options?.scale ?? NATIVE_SCALE;
  if (!Object.hasOwn(SCALES, scale)) throw new TypeError(\`scale must be one of \${Object.keys(SCALES)}, got \${scale}\`);
  const [xMin, xMax, center, halfWidth] = SCALES[scale];
  if (x < xMin || x > xMax) throw new RangeError(\`x = \${x} \${scale} is outside the validity range [\${xMin}, \${xMax}] \${scale}; the correlation is valid only inside it\`);
  return (x - center) / halfWidth;
}`;
  const param = scales === null ? 'x' : 'x, options';
  const paramDoc = scales === null ? '' : `\n * @param {{ scale?: 'K' | '°C' | '°F' }} [options] the scale of x (default NATIVE_SCALE)`;
  const nativeX = scales === null ? 'x' : 'CENTER + HALF_WIDTH * t';
  return `${[...headerLines(source, 'JavaScript ES module'), ...scaleHeaderLines(r, "evaluate(x, { scale: '°F' })")].map((line) => `// ${line}`.trimEnd()).join('\n')}

export const X_MIN = ${literal(r.range.min)};
export const X_MAX = ${literal(r.range.max)};
const CENTER = ${literal(m.center!)};
const HALF_WIDTH = ${literal(m.halfWidth!)};
/** Mapped coefficients b_0..b_m and their covariance. */
const B = ${list(m.coefficients.map((value) => value ?? 0))};
const COVARIANCE = [
  ${m.covariance.map((row) => list(row.map((value) => value ?? 0))).join(',\n  ')}
];
const QUANTILE = ${Number.isFinite(source.quantile) ? literal(source.quantile) : 'NaN'};
const NOISE_X = ${list(source.profileX)};
const NOISE_SD = ${list(source.profileSd)};
${scaleTable}
${mappedFunction}

/** @param {number} t @returns {number} */
function horner(t) {
  let v = 0;
  for (let k = B.length - 1; k >= 0; k--) v = v * t + B[k];
  return v;
}

/**
 * y at x; throws RangeError outside the validity range.
 * @param {number} x${paramDoc}
 * @returns {number}
 */
export function evaluate(${param}) {
  return ${back}(horner(mapped(${param})));
}

/** @param {number} x @returns {number} */
function noiseSd(x) {
  if (x <= NOISE_X[0]) return NOISE_SD[0];
  for (let i = 1; i < NOISE_X.length; i++) {
    if (x <= NOISE_X[i]) return NOISE_SD[i - 1] + ((x - NOISE_X[i - 1]) / (NOISE_X[i] - NOISE_X[i - 1])) * (NOISE_SD[i] - NOISE_SD[i - 1]);
  }
  return NOISE_SD[NOISE_SD.length - 1];
}

/**
 * The 95 % prediction interval of a new observation at x; throws RangeError outside the validity range.
 * @param {number} x${paramDoc}
 * @returns {[number, number]}
 */
export function predictionInterval(${param}) {
  const t = mapped(${param});
  let varFit = 0;
  for (let j = 0; j < B.length; j++) for (let k = 0; k < B.length; k++) varFit += t ** j * COVARIANCE[j][k] * t ** k;
  const half = QUANTILE * Math.sqrt(Math.max(0, varFit) + noiseSd(${nativeX}) ** 2);
  const v = horner(t);
  return [${back}(v - half), ${back}(v + half)];
}
`;
}

/** The TypeScript declarations of the module above. */
export function javascriptTypes(source: SnippetSource): string {
  const scales = snippetScales(source.record);
  if (scales !== null) return temperatureTypes(source);
  return `${headerLines(source, 'TypeScript declarations').map((line) => `// ${line}`.trimEnd()).join('\n')}

/** Lower end of the validity range of x. */
export declare const X_MIN: number;
/** Upper end of the validity range of x. */
export declare const X_MAX: number;
/** y at x; throws RangeError outside the validity range. */
export declare function evaluate(x: number): number;
/** The 95 % prediction interval [low, high] of a new observation at x; throws RangeError outside the range. */
export declare function predictionInterval(x: number): [number, number];
`;
}

/** The declarations of a module whose x is a temperature: the scale option. */
function temperatureTypes(source: SnippetSource): string {
  return `${headerLines(source, 'TypeScript declarations').map((line) => `// ${line}`.trimEnd()).join('\n')}

export type Scale = 'K' | '°C' | '°F';
/** The scale of the fit, the default. */
export declare const NATIVE_SCALE: Scale;
/** Per scale: [xMin, xMax, center, halfWidth]. */
export declare const SCALES: Readonly<Record<Scale, readonly [number, number, number, number]>>;
/** Validity range of x in NATIVE_SCALE. */
export declare const X_MIN: number;
export declare const X_MAX: number;
/** y at x (in options.scale, default NATIVE_SCALE); RangeError outside the validity range, TypeError for an unknown scale. */
export declare function evaluate(x: number, options?: { scale?: Scale }): number;
/** The 95 % prediction interval [low, high] of a new observation at x; RangeError outside the range. */
export declare function predictionInterval(x: number, options?: { scale?: Scale }): [number, number];
`;
}
