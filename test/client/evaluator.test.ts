/**
 * The page's evaluator against the code snippets: for every demo correlation, the numbers the evaluator reads back
 * from the JavaScript snippet's text (evaluatorModel.ts) are the snippets' published model bit for bit, and its y
 * and prediction interval (core's publishedEstimate) agree with the JavaScript snippet run for real in node, an
 * independent evaluation of the same numbers. Then the evaluator's answers: refusal with the caution outside the
 * range, the extrapolation warning, a request for a number.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { publishedEstimate, type PublishedModel } from '../../src/core/index.ts';
import { javascriptSnippet, snippetIdentifier, snippetModel, type CorrelationRecord } from '../../src/export/index.ts';
import { publishedCorrelations, relativeError } from '../helpers/publishedCorrelations.ts';
import { publishedModelOf, snippetConstants, type EvaluatorSubject } from '../../src/client/evaluatorModel.ts';
import { evaluatorResult } from '../../src/client/evaluatorResult.ts';

interface Case {
  readonly name: string;
  readonly record: CorrelationRecord;
  readonly snippet: string;
  readonly model: PublishedModel;
  readonly xs: number[];
}

const directory = mkdtempSync(path.join(tmpdir(), 'correlary-evaluator-'));
const cases: Case[] = [];


beforeAll(async () => {
  for (const { fit, record, source } of await publishedCorrelations('content')) {
    const snippet = javascriptSnippet(source);
    const name = snippetIdentifier(record.slug);
    writeFileSync(path.join(directory, `${name}.mjs`), snippet);
    // The ends, the check values and nine interior points (between data, where the noise profile interpolates).
    const { min, max } = fit.range;
    const xs = [min, max, ...record.checkValues.map((check) => check.x!), ...Array.from({ length: 9 }, (_, i) => min + ((max - min) * (i + 0.37)) / 9)];
    cases.push({ name, record, snippet, model: snippetModel(source), xs });
  }
}, 60_000);

afterAll(() => rmSync(directory, { recursive: true, force: true }));

describe('evaluatorModel', () => {
  it('snippetConstants reads numbers, lists, matrices with a trailing comma and NaN', () => {
    // Computed by hand from the text.
    expect(snippetConstants('export const X_MIN = 220.0;\nconst B = [1.5, -2e-7];\nconst C = [\n  [1, 2],\n  [3, 4],\n];\nconst QUANTILE = NaN;')).toEqual({
      X_MIN: 220,
      B: [1.5, -2e-7],
      C: [
        [1, 2],
        [3, 4],
      ],
      QUANTILE: NaN,
    });
  });

  it('publishedModelOf(javascriptSnippet) gives the published model of every demo correlation bit for bit', () => {
    expect(cases.length).toBeGreaterThanOrEqual(10);
    for (const item of cases) {
      const read = publishedModelOf(item.snippet, item.record.transforms.x, item.record.transforms.y);
      // toEqual compares numbers with Object.is: the same doubles, NaN included.
      expect(read, item.name).toEqual(item.model);
    }
  });

  it('publishedModelOf names a missing constant', () => {
    expect(() => publishedModelOf('const B = [1];', 'identity', 'identity')).toThrow('evaluatorModel requires the snippet constant COVARIANCE as a matrix');
  });
});

describe('publishedEstimate on the snippet numbers', () => {
  it('agrees with the JavaScript snippet run in node: y and the prediction interval to 1e-13 relative', () => {
    const driver = `const out = {};
for (const [name, xs] of JSON.parse(process.argv[1])) {
  const module = await import(${JSON.stringify(`${directory}/`)} + name + '.mjs');
  out[name] = { y: xs.map((x) => module.evaluate(x)), pi: xs.map((x) => module.predictionInterval(x)) };
}
console.log(JSON.stringify(out));`;
    const stdout = execFileSync(process.execPath, ['--input-type=module', '-e', driver, JSON.stringify(cases.map((item) => [item.name, item.xs]))], { encoding: 'utf8' });
    const results = JSON.parse(stdout) as Record<string, { y: number[]; pi: (number | null)[][] }>;
    let worst = 0;
    for (const item of cases) {
      const result = results[item.name]!;
      item.xs.forEach((x, i) => {
        const estimate = publishedEstimate(item.model, x);
        const errors = [relativeError(estimate.y, result.y[i]!)];
        // JSON writes NaN as null (a fit without residual degrees of freedom has no interval).
        const [low, high] = result.pi[i]!;
        if (low === null) expect(estimate.predictionLow, `${item.name} at ${x}`).toBeNaN();
        else errors.push(relativeError(estimate.predictionLow, low!), relativeError(estimate.predictionHigh, high!));
        worst = Math.max(worst, ...errors);
        expect(Math.max(...errors), `${item.name} at ${x}`).toBeLessThanOrEqual(1e-13);
      });
    }
    console.log(`evaluator vs JavaScript snippet: worst relative difference ${worst.toExponential(1)} over ${cases.length} correlations`);
  });
});

describe('evaluatorResult', () => {
  const subjectOf = (item: Case): EvaluatorSubject => ({ model: item.model, xName: 'temperature', xUnit: 'K', yName: 'property', yUnit: 'kPa' });

  it('evaluatorResult inside the range gives y, both intervals with units, and the full-precision y', () => {
    const item = cases.find((candidate) => Number.isFinite(candidate.model.quantile))!;
    const x = item.record.checkValues[1]!.x!;
    const answer = evaluatorResult(subjectOf(item), ` ${x} `, false);
    if (answer.kind !== 'value') throw new Error(`expected a value, got ${answer.kind}`);
    expect(answer.warning).toBeNull();
    expect(answer.estimate.y).toBe(publishedEstimate(item.model, x).y);
    expect(answer.estimate.confidenceLow).toBeLessThan(answer.estimate.y);
    expect(answer.estimate.predictionLow).toBeLessThan(answer.estimate.confidenceLow);
    expect(answer.lines[0]).toMatch(new RegExp(`^property = \\S+ kPa at temperature = ${x} K$`));
    expect(answer.lines[1]).toMatch(/^95 % confidence interval of the correlation: \S+ to \S+ kPa$/);
    expect(answer.lines[2]).toMatch(/^95 % prediction interval for a new measurement: \S+ to \S+ kPa$/);
    expect(answer.lines[3]).toBe(`Full precision: ${String(answer.estimate.y)}`);
  });

  it('evaluatorResult outside the range refuses with the caution; with extrapolation it warns beside the value', () => {
    for (const item of cases) {
      const { min, max } = item.model;
      for (const x of [min - (max - min) * 0.01, max + (max - min) * 0.01]) {
        const refused = evaluatorResult(subjectOf(item), String(x), false);
        expect(refused.kind, `${item.name} at ${x}`).toBe('refused');
        if (refused.kind !== 'refused') continue;
        expect(refused.message).toContain(`temperature = ${x} K is outside the validity range ${min} K to ${max} K`);
        expect(refused.cautions[0]).toContain(`Valid only for ${min} K ≤ temperature ≤ ${max} K (the fitted range)`);
        expect(refused.cautions[1]).toContain('Not for design use');
        const extrapolated = evaluatorResult(subjectOf(item), String(x), true);
        if (extrapolated.kind !== 'value') throw new Error(`expected a value, got ${extrapolated.kind}`);
        expect(extrapolated.warning).toMatch(/^EXTRAPOLATION — NOT VALID\. temperature = \S+ K is outside the validity range/);
        expect(extrapolated.estimate.extrapolated).toBe(true);
        expect(extrapolated.estimate.y).toBe(publishedEstimate(item.model, x, { extrapolate: true }).y);
      }
      // The ends themselves are inside.
      expect(evaluatorResult(subjectOf(item), String(min), false).kind).toBe('value');
      expect(evaluatorResult(subjectOf(item), String(max), false).kind).toBe('value');
    }
  });

  it('evaluatorResult asks for a number when the text is not one', () => {
    const item = cases[0]!;
    for (const text of ['abc', '1,5', '', '3 K', '--2']) {
      const answer = evaluatorResult(subjectOf(item), text, false);
      expect(answer.kind, text).toBe('invalid');
      if (answer.kind === 'invalid') expect(answer.message).toBe(`Enter temperature as a number in K, e.g. ${item.model.min}.`);
    }
    // A typographic minus sign is read as a minus.
    expect(evaluatorResult(subjectOf(item), `\u2212${Math.abs(item.model.min)}`, true).kind).toBe('value');
  });
});
