/**
 * What the page's evaluator evaluates, read from what the page already carries: the full-precision numbers of the
 * JavaScript snippet shown on the page (its `const NAME = value;` lines: range, mapping, mapped coefficients,
 * covariance, quantile, noise profile; written by src/export/snippets/javascriptSnippet.ts) and, from the
 * `data-evaluator` element around it, the transforms and the names and units of x and y. So the evaluator uses
 * the very numbers the snippets carry; test/client/evaluatorModel.test.ts checks them bit for bit against the
 * export's snippetModel.
 */
import type { PublishedModel } from '../core/browser.ts';

export interface EvaluatorSubject {
  readonly model: PublishedModel;
  readonly xName: string;
  /** Unit of x as written in the metadata ('' when dimensionless). */
  readonly xUnit: string;
  readonly yName: string;
  readonly yUnit: string;
}

/**
 * The named constants of a JavaScript snippet, as numbers or arrays (NaN for `NaN`).
 * @example snippetConstants('const B = [1.5, 2];\nconst QUANTILE = NaN;') // => { B: [1.5, 2], QUANTILE: NaN }
 */
export function snippetConstants(text: string): Record<string, unknown> {
  const constants: Record<string, unknown> = {};
  for (const match of text.matchAll(/^(?:export )?const ([A-Z_]+) = ([^;]*);$/gm)) {
    const value = match[2]!.replace(/\bNaN\b/g, 'null').replace(/,(\s*)\]/g, '$1]');
    constants[match[1]!] = JSON.parse(value, (_key, item: unknown) => (item === null ? NaN : item));
  }
  return constants;
}

function numberOf(constants: Record<string, unknown>, name: string): number {
  const value = constants[name];
  if (typeof value !== 'number') throw new Error(`evaluatorModel requires the snippet constant ${name} as a number`);
  return value;
}

function listOf(constants: Record<string, unknown>, name: string): number[] {
  const value = constants[name];
  if (!Array.isArray(value) || !value.every((item) => typeof item === 'number')) throw new Error(`evaluatorModel requires the snippet constant ${name} as a list of numbers`);
  return value as number[];
}

/**
 * The published model from a snippet's text and the transforms.
 * @throws Error naming the constant that is missing or malformed
 * @example publishedModelOf(javascriptSnippetText, 'reciprocal', 'log').coefficients // => the snippet's B
 */
export function publishedModelOf(snippet: string, transformX: string, transformY: string): PublishedModel {
  const constants = snippetConstants(snippet);
  const covariance = constants['COVARIANCE'];
  if (!Array.isArray(covariance) || !covariance.every(Array.isArray)) throw new Error('evaluatorModel requires the snippet constant COVARIANCE as a matrix');
  if (!['identity', 'reciprocal', 'log'].includes(transformX) || !['identity', 'log'].includes(transformY)) {
    throw new Error(`evaluatorModel requires known transforms; got x: ${transformX}, y: ${transformY}`);
  }
  return {
    transformX: transformX as PublishedModel['transformX'],
    transformY: transformY as PublishedModel['transformY'],
    min: numberOf(constants, 'X_MIN'),
    max: numberOf(constants, 'X_MAX'),
    center: numberOf(constants, 'CENTER'),
    halfWidth: numberOf(constants, 'HALF_WIDTH'),
    coefficients: listOf(constants, 'B'),
    covariance: covariance as number[][],
    quantile: numberOf(constants, 'QUANTILE'),
    noiseX: listOf(constants, 'NOISE_X'),
    noiseSd: listOf(constants, 'NOISE_SD'),
  };
}

/**
 * The evaluator's subject from a `[data-evaluator]` element holding the JavaScript snippet (`#snippet-javascript`).
 * @throws Error when the element lacks the snippet or its data
 */
export function evaluatorSubject(element: HTMLElement): EvaluatorSubject {
  const data = element.dataset;
  const snippet = element.querySelector('#snippet-javascript')?.textContent;
  if (!snippet) throw new Error('evaluatorModel requires the JavaScript snippet on the page');
  const unit = (text: string | undefined) => (text === undefined || text === '1' ? '' : text);
  return {
    model: publishedModelOf(snippet, data['transformX'] ?? '', data['transformY'] ?? ''),
    xName: data['xName'] ?? 'x',
    xUnit: unit(data['xUnit']),
    yName: data['yName'] ?? 'y',
    yUnit: unit(data['yUnit']),
  };
}
