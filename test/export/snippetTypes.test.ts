/**
 * The TypeScript declarations published beside each JavaScript snippet, checked by the TypeScript compiler itself
 * (`tsc --noEmit --strict`, from node_modules): a consumer file that imports two correlations' modules by their
 * published file names type-checks under both module resolutions a project is likely to use (nodenext, bundler),
 * and each wrong call fails with the compiler's error for it. File names are the site's (snippetFiles), so a
 * declaration file that the compiler would not pair with its module (e.g. `.d.ts` beside `.mjs`) fails here.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { correlationRecord, javascriptSnippet, javascriptTypes, snippetSource } from '../../src/export/index.ts';
import { snippetFiles } from '../../src/components/lib/entrySnippets.ts';
import { fitHandbook } from '../../src/load/index.ts';

const require = createRequire(import.meta.url);
const tsc = path.join(path.dirname(require.resolve('typescript/package.json')), 'bin', 'tsc');
const directory = mkdtempSync(path.join(tmpdir(), 'correlary-dts-'));
/** Module specifiers ('./name.mjs') of the two correlations written. */
const modules: string[] = [];

function compile(files: string[], resolution: 'nodenext' | 'bundler'): { code: number; output: string } {
  const module = resolution === 'nodenext' ? 'nodenext' : 'esnext';
  const args = [tsc, '--noEmit', '--strict', '--target', 'es2022', '--module', module, '--moduleResolution', resolution, ...files];
  try {
    return { code: 0, output: execFileSync(process.execPath, args, { cwd: directory, encoding: 'utf8' }) };
  } catch (error) {
    const failed = error as { status: number; stdout: string };
    return { code: failed.status, output: failed.stdout };
  }
}

beforeAll(async () => {
  const handbook = await fitHandbook('content');
  const fitted = handbook.datasets.filter((item) => item.dataset.correlation !== undefined && item.fitted?.fit !== undefined);
  // A transformed fit and an untransformed one.
  const picks = [fitted.find((item) => item.fitted!.fit!.transformY === 'log'), fitted.find((item) => item.fitted!.fit!.transformY === 'identity')];
  for (const pick of picks) {
    if (pick === undefined) continue;
    const loaded = pick.dataset.correlation!;
    const fit = pick.fitted!.fit!;
    const source = snippetSource(fit, correlationRecord({ slug: loaded.slug, meta: loaded.meta, range: loaded.range, excluded: loaded.excluded, fit, selection: pick.fitted!.selection ?? null }));
    const files = snippetFiles(loaded.slug);
    writeFileSync(path.join(directory, files['javascript']!), javascriptSnippet(source));
    writeFileSync(path.join(directory, files['typescript']!), javascriptTypes(source));
    modules.push(`./${files['javascript']!}`);
  }
}, 60_000);

afterAll(() => rmSync(directory, { recursive: true, force: true }));

describe('javascriptTypes', () => {
  it('a consumer of two correlations type-checks with tsc --strict under nodenext and bundler resolution', () => {
    expect(modules).toHaveLength(2);
    const consumer = modules
      .map((specifier, i) => `import * as c${i} from '${specifier}';
const y${i}: number = c${i}.evaluate((c${i}.X_MIN + c${i}.X_MAX) / 2);
const [low${i}, high${i}]: [number, number] = c${i}.predictionInterval(c${i}.X_MAX);
export const spread${i}: number = high${i} - low${i} + y${i};`)
      .join('\n');
    writeFileSync(path.join(directory, 'consumer.ts'), consumer);
    for (const resolution of ['nodenext', 'bundler'] as const) {
      const result = compile(['consumer.ts'], resolution);
      expect(result, resolution).toEqual({ code: 0, output: '' });
    }
  });

  it('wrong calls fail: a string for x, a string result, a missing argument, a function the module does not export', () => {
    // The compiler's error codes (TypeScript diagnostics): TS2345 argument type, TS2322 assignment type,
    // TS2554 argument count, TS2305/TS2724 no such export.
    const wrong: Record<string, string> = {
      'wrong-argument.ts': `import { evaluate } from '${modules[0]}';\nexport const y = evaluate('300');\n`,
      'wrong-result.ts': `import { evaluate } from '${modules[0]}';\nexport const y: string = evaluate(300);\n`,
      'wrong-count.ts': `import { predictionInterval } from '${modules[1]}';\nexport const pi = predictionInterval();\n`,
      'wrong-export.ts': `import { evaluateAt } from '${modules[1]}';\nexport const y = evaluateAt(300);\n`,
    };
    for (const [file, text] of Object.entries(wrong)) writeFileSync(path.join(directory, file), text);
    const result = compile(Object.keys(wrong), 'nodenext');
    expect(result.code).not.toBe(0);
    expect(result.output).toMatch(/wrong-argument\.ts\(2,\d+\): error TS2345/);
    expect(result.output).toMatch(/wrong-result\.ts\(2,\d+\): error TS2322/);
    expect(result.output).toMatch(/wrong-count\.ts\(2,\d+\): error TS2554/);
    expect(result.output).toMatch(/wrong-export\.ts\(1,\d+\): error TS(2305|2724)/);
    expect(result.output.match(/error TS/g)).toHaveLength(4);
  });
});
