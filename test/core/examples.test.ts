/**
 * The `@example` lines of the core's doc comments are correct: every example of the form `expr // => literal` whose
 * expression uses only the core's public door and literals is evaluated here and compared with its stated result
 * (numbers by relative error 1e-12; bigint as written). Examples that name a value from elsewhere (`fit`, `table`)
 * or state their result in words are skipped; the test requires that most examples are checked, so it can fail
 * when examples drift from the code.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import * as core from '../../src/core/index.ts';
import { designMatrix } from '../../src/core/designMatrix.ts';
import { conditionNumber, solveLeastSquares } from '../../src/core/leastSquares.ts';
import { residualStatistics, totalSumOfSquares } from '../../src/core/stats/residualStatistics.ts';
import { lackOfFit } from '../../src/core/stats/lackOfFit.ts';
import { validateFitInput } from '../../src/core/validateFitInput.ts';

const root = fileURLToPath(new URL('../../src/core', import.meta.url));
const scope: Record<string, unknown> = { ...core, designMatrix, conditionNumber, solveLeastSquares, residualStatistics, totalSumOfSquares, lackOfFit, validateFitInput };

function files(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    return statSync(path).isDirectory() ? files(path) : name.endsWith('.ts') ? [path] : [];
  });
}

function examples(): { where: string; expression: string; expected: string }[] {
  const found: { where: string; expression: string; expected: string }[] = [];
  for (const file of files(root)) {
    const text = readFileSync(file, 'utf8');
    for (const match of text.matchAll(/@example\s+(.+?)\s+\/\/ => (.+?)(?:\s*\*\/)?$/gm)) {
      const expression = match[1]!.replace(/^\*\s*/, '').trim();
      const expected = match[2]!.trim();
      // Elided arguments or results ("…") are illustrations, not checkable literals.
      if (expression.includes('…') || expected.includes('…')) continue;
      found.push({ where: relative(root, file), expression, expected });
    }
  }
  return found;
}

function evaluate(source: string): unknown {
  return new Function(...Object.keys(scope), `"use strict"; return (${source});`)(...Object.values(scope));
}

function same(actual: unknown, expected: unknown): boolean {
  if (typeof expected === 'number' && typeof actual === 'number') {
    return Object.is(actual, expected) || Math.abs(actual - expected) <= 1e-12 * Math.max(Math.abs(expected), 1e-300);
  }
  if (Array.isArray(expected)) return Array.isArray(actual) && actual.length === expected.length && expected.every((value, i) => same(actual[i], value));
  if (expected !== null && typeof expected === 'object') {
    if (actual === null || typeof actual !== 'object') return false;
    const keys = Object.keys(expected);
    return keys.every((key) => same((actual as Record<string, unknown>)[key], (expected as Record<string, unknown>)[key]));
  }
  return Object.is(actual, expected);
}

describe('core @example lines', () => {
  it('every literal @example of src/core gives the result it states', () => {
    const failures: string[] = [];
    let checked = 0;
    const all = examples();
    for (const { where, expression, expected } of all) {
      let expectedValue: unknown;
      try {
        expectedValue = evaluate(expected);
      } catch {
        continue; // the result is stated in words or names something outside the core
      }
      let actual: unknown;
      try {
        actual = evaluate(expression);
      } catch (error) {
        if (error instanceof ReferenceError) continue; // names a value that is not a literal (fit, table, …)
        failures.push(`${where}: ${expression} threw ${(error as Error).message}`);
        continue;
      }
      checked++;
      if (!same(actual, expectedValue)) failures.push(`${where}: ${expression} gives ${JSON.stringify(actual, (_, v) => (typeof v === 'bigint' ? `${v}n` : v))}, the comment says ${expected}`);
    }
    expect(failures).toEqual([]);
    expect(checked).toBeGreaterThanOrEqual(40);
  });
});
