/**
 * The fingerprint of a correlation: a short, stable hash of what a reviewer approves, so that an approval can be
 * bound to it and lapse on any change. Recipe version `fp1` (documented in content/README.md, "Fingerprint"):
 *
 *   fp1-<data>-<options>-<result>
 *
 * Each component is the first 16 hexadecimal digits of the SHA-256 of a canonical text (UTF-8, one item per line,
 * each line ending in "\n", the first line naming the recipe and the component). Numbers are written as the
 * decimals they print as (ECMAScript `String(number)`: the shortest decimal that reads back to the same double), so
 * `1.50`, `1.5` and `15e-1` in a file are the same value; the file's layout (spaces, line ends, comment lines,
 * column order, quoting, row order) never enters. Transformed values (ln x, 1/x) are never hashed: only the user's
 * decimals, so the data and options components are the same on every machine.
 *
 * Keeping three components lets a lapsed approval say what changed: data, options or result.
 * Cost: O(n log n) for the sort of the points.
 */
import { createHash } from 'node:crypto';
import { DEFAULT_CRITERION, printedCoefficients, type PolynomialFit } from '../../core/index.ts';
import type { DataPoint } from '../../schema/index.ts';
import type { LoadedCorrelation } from '../types.ts';

/** Current recipe version; a different version in an approval makes it lapse with reason "recipe". */
export const FINGERPRINT_RECIPE = 'fp1';

/** The three components a fingerprint is made of. */
export type FingerprintComponent = 'data' | 'options' | 'result';
export const FINGERPRINT_COMPONENTS: readonly FingerprintComponent[] = ['data', 'options', 'result'];

export interface Fingerprint {
  /** `fp1-<data>-<options>-<result>`. */
  readonly text: string;
  readonly recipe: string;
  readonly parts: Readonly<Record<FingerprintComponent, string>>;
}

/** A number as the decimal it prints as. @example decimal(1.50) // => "1.5" */
function decimal(value: number): string {
  return Object.is(value, -0) ? '0' : String(value);
}

/** A free text as a JSON string literal, so that spaces and line ends inside it are unambiguous. */
function quoted(text: string): string {
  return JSON.stringify(text);
}

function pointLine(kind: string, point: DataPoint): string {
  const uncertainty = point.uncertainty === undefined ? '' : ` u=${decimal(point.uncertainty)}`;
  return `${kind} x=${decimal(point.x)} y=${decimal(point.y)}${uncertainty}`;
}

/** Lines sorted by code unit order, which does not depend on the locale. */
function sorted(lines: readonly string[]): string[] {
  return [...lines].sort((a, b) => (a < b ? -1 : a > b ? 1 : 0));
}

/**
 * The canonical texts that are hashed, one per component (exposed so that tests and reviewers can read them).
 * @example canonicalTexts(correlation, fit).data // => "correlary fp1 data\npoint x=253.15 y=2979.7\n…"
 */
export function canonicalTexts(correlation: Pick<LoadedCorrelation, 'meta' | 'used' | 'excluded'>, fit: PolynomialFit): Record<FingerprintComponent, string> {
  const { meta } = correlation;
  const settings = meta.fit;
  const data = [
    ...sorted(correlation.used.map((point) => pointLine('point', point))),
    ...sorted(correlation.excluded.map((point) => `${pointLine('excluded', point)} reason=${quoted(point.reason)}`)),
  ];
  const fixed = typeof settings.order === 'number';
  const options = [
    `x.unit=${quoted(meta.variable.unit)}`,
    `y.unit=${quoted(meta.property.unit)}`,
    `transform.x=${settings.transform.x}`,
    `transform.y=${settings.transform.y}`,
    `intercept=${String(settings.intercept)}`,
    `weights=${settings.weights}`,
    fixed ? `order=${String(settings.order)}` : 'order=auto',
    ...(fixed ? [] : [`criterion=${settings.criterion ?? DEFAULT_CRITERION}`, `maxOrder=${String(settings.maxOrder)}`]),
    `range.min=${settings.range?.min === undefined ? 'data' : decimal(settings.range.min)}`,
    `range.max=${settings.range?.max === undefined ? 'data' : decimal(settings.range.max)}`,
    ...sorted(settings.passThrough.map((point) => `passThrough x=${decimal(point.x)} y=${decimal(point.y)}`)),
    ...sorted(settings.exclude.map((rule) => (rule.row === undefined ? `exclude x=${decimal(rule.x ?? NaN)}` : `exclude row=${String(rule.row)}`))),
  ];
  const result = [
    `order=${String(fit.order)}`,
    `range=${decimal(fit.range.min)}..${decimal(fit.range.max)}`,
    ...printedCoefficients(fit).map((text, k) => `a${k}=${text}`),
  ];
  const text = (component: FingerprintComponent, lines: readonly string[]) =>
    [`correlary ${FINGERPRINT_RECIPE} ${component}`, ...lines].map((line) => `${line}\n`).join('');
  return { data: text('data', data), options: text('options', options), result: text('result', result) };
}

/** First 16 hex digits of the SHA-256 of a UTF-8 text. */
function shortHash(text: string): string {
  return createHash('sha256').update(text, 'utf8').digest('hex').slice(0, 16);
}

/**
 * The fingerprint of a loaded, fitted correlation.
 * @example fingerprint(correlation, fit).text // => "fp1-5c0e…-a91d…-03be…"
 */
export function fingerprint(correlation: Pick<LoadedCorrelation, 'meta' | 'used' | 'excluded'>, fit: PolynomialFit): Fingerprint {
  const texts = canonicalTexts(correlation, fit);
  const parts = { data: shortHash(texts.data), options: shortHash(texts.options), result: shortHash(texts.result) };
  return { text: `${FINGERPRINT_RECIPE}-${parts.data}-${parts.options}-${parts.result}`, recipe: FINGERPRINT_RECIPE, parts };
}

/**
 * Split a fingerprint text into its recipe and components, or undefined when it is not one.
 * @example parseFingerprint('fp1-aaaaaaaaaaaaaaaa-bbbbbbbbbbbbbbbb-cccccccccccccccc')?.parts.options // => "bbbbbbbbbbbbbbbb"
 */
export function parseFingerprint(text: string): Fingerprint | undefined {
  const match = /^(fp[1-9]\d*)-([0-9a-f]{16})-([0-9a-f]{16})-([0-9a-f]{16})$/.exec(text);
  if (match === null) return undefined;
  return { text, recipe: match[1]!, parts: { data: match[2]!, options: match[3]!, result: match[4]! } };
}
