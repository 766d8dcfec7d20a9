/**
 * The code snippets of every demo correlation, run for real: python3 (standard library), node, gcc (-std=c99
 * -pedantic -Werror) and a spreadsheet formula engine (HyperFormula, which parses and evaluates spreadsheet
 * formula syntax, with x in a named cell). Each is evaluated at the correlation's check values, whose y the
 * export computes by exact rational evaluation of the certified coefficients (an independent reference for the
 * snippets' double-precision Horner evaluation), and just outside the validity range, where it must refuse.
 * The Python and JavaScript prediction intervals are compared with the core's bands() at the same x.
 * The table of worst relative errors (language × correlation) is printed.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { HyperFormula } from 'hyperformula';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { applyMap, bands, fromDouble, scaleConversion, toNumber, type PolynomialFit } from '../../src/core/index.ts';
import {
  cSnippet,
  javascriptSnippet,
  pythonSnippet,
  snippetIdentifier,
  spreadsheetFormula,
  SPREADSHEET_X_NAME,
  type CorrelationRecord,
} from '../../src/export/index.ts';
import { publishedCorrelations, relativeError } from '../helpers/publishedCorrelations.ts';

/** One scale of a temperature correlation: its check values (exact evaluation of the re-expressed certified
 * coefficients, independent of the snippets' mapped-form evaluation) and two x just outside its range. */
interface ScaleCase {
  readonly scale: 'K' | '°C' | '°F';
  readonly native: boolean;
  readonly xs: number[];
  readonly ys: number[];
  readonly outside: [number, number];
}

interface Case {
  readonly name: string;
  readonly scales: ScaleCase[];
  readonly record: CorrelationRecord;
  readonly fit: PolynomialFit;
  readonly xs: number[];
  readonly outside: [number, number];
}

const directory = mkdtempSync(path.join(tmpdir(), 'correlary-snippets-'));
const cases: Case[] = [];
/** language → slug → worst relative error at the check values. */
const worst: Record<string, Record<string, number>> = {};


function record(language: string, item: Case, values: readonly number[]): number {
  const errors = item.record.checkValues.map((check, i) => relativeError(values[i]!, check.y!));
  const max = Math.max(...errors);
  (worst[language] ??= {})[item.record.slug] = max;
  return max;
}

beforeAll(async () => {
  for (const { fit, record: rec, source } of await publishedCorrelations('content')) {
    const name = snippetIdentifier(rec.slug);
    writeFileSync(path.join(directory, `${name}.py`), pythonSnippet(source));
    writeFileSync(path.join(directory, `${name}.mjs`), javascriptSnippet(source));
    writeFileSync(path.join(directory, `${name}.h`), cSnippet(source));
    const span = fit.range.max - fit.range.min;
    const scales = (rec.temperatureScales?.scales ?? []).map((form) => {
      const width = form.range.max! - form.range.min!;
      return {
        scale: form.scale,
        native: form.native,
        xs: form.checkValues.map((check) => check.x!),
        ys: form.checkValues.map((check) => check.y!),
        outside: [form.range.min! - width * 1e-9, form.range.max! + width * 1e-9] as [number, number],
      };
    });
    cases.push({ name, scales, record: rec, fit, xs: rec.checkValues.map((check) => check.x!), outside: [fit.range.min - span * 1e-9, fit.range.max + span * 1e-9] });
  }
});

/** language → "slug scale" → worst relative error at that scale's check values. */
const worstInScale: Record<string, Record<string, number>> = {};

function recordScale(language: string, item: Case, scale: ScaleCase, values: readonly number[]): number {
  const max = Math.max(...scale.ys.map((y, i) => relativeError(values[i]!, y)));
  (worstInScale[language] ??= {})[`${item.record.slug} ${scale.scale}`] = max;
  return max;
}

/** The cases with temperature scales, as [name, [[scale, xs, outside], …]] for the drivers. */
function scaleJobs() {
  return cases.filter((item) => item.scales.length > 0).map((item) => [item.name, item.scales.map((scale) => [scale.scale, scale.xs, scale.outside])]);
}

afterAll(() => {
  const scaleLanguages = Object.keys(worstInScale);
  if (scaleLanguages.length > 0) {
    const lines = [`correlation | scale | ${scaleLanguages.join(' | ')}`, `--- | --- | ${scaleLanguages.map(() => '---:').join(' | ')}`];
    for (const item of cases) {
      for (const scale of item.scales) {
        const key = `${item.record.slug} ${scale.scale}`;
        lines.push(`${item.record.slug} | ${scale.scale}${scale.native ? ' (native)' : ''} | ${scaleLanguages.map((language) => (worstInScale[language]?.[key] ?? NaN).toExponential(1)).join(' | ')}`);
      }
    }
    console.log(`worst relative error at each temperature scale's check values:\n${lines.join('\n')}`);
  }
  const languages = Object.keys(worst);
  if (languages.length > 0) {
    const lines = [`correlation | ${languages.join(' | ')}`, `--- | ${languages.map(() => '---:').join(' | ')}`];
    for (const item of cases) lines.push(`${item.record.slug} | ${languages.map((language) => (worst[language]?.[item.record.slug] ?? NaN).toExponential(1)).join(' | ')}`);
    console.log(`worst relative error at the check values:\n${lines.join('\n')}`);
  }
  rmSync(directory, { recursive: true, force: true });
});

describe('code snippets of every demo correlation, run for real', () => {
  it('the demo handbook gives snippets to test', () => {
    expect(cases.length).toBeGreaterThanOrEqual(13);
  });

  it('every snippet carries the title, the validity range, the check values and the cautions as comments', () => {
    for (const item of cases) {
      for (const extension of ['py', 'mjs', 'h']) {
        const text = readFileSync(path.join(directory, `${item.name}.${extension}`), 'utf8');
        expect(text, `${item.name}.${extension}`).toContain(item.record.title);
        expect(text).toContain(`${item.record.range.min} <= x <= ${item.record.range.max}`);
        for (const check of item.record.checkValues) expect(text).toContain(`${check.x} -> ${check.y}`);
        for (const caution of item.record.cautions) expect(text, `${item.name}.${extension}`).toContain(caution);
      }
    }
  });

  it('pythonSnippet: python3 reproduces the check values to 1e-12 relative, raises ValueError just outside, and gives the prediction interval of bands()', () => {
    const driver = `import importlib.util, json, sys
out = {}
for name, xs, outside in json.loads(sys.argv[1]):
    spec = importlib.util.spec_from_file_location(name, "${directory}/" + name + ".py")
    module = importlib.util.module_from_spec(spec)
    spec.loader.exec_module(module)
    refused = []
    for x in outside:
        try:
            module.evaluate(x)
            refused.append(False)
        except ValueError:
            refused.append(True)
    out[name] = {"y": [repr(module.evaluate(x)) for x in xs], "pi": [list(map(repr, module.prediction_interval(x))) for x in xs], "refused": refused}
print(json.dumps(out))
`;
    const stdout = execFileSync('python3', ['-c', driver, JSON.stringify(cases.map((item) => [item.name, item.xs, item.outside]))], { encoding: 'utf8' });
    const results = JSON.parse(stdout) as Record<string, { y: string[]; pi: string[][]; refused: boolean[] }>;
    for (const item of cases) {
      const result = results[item.name]!;
      expect(record('Python', item, result.y.map(Number)), item.name).toBeLessThanOrEqual(1e-12);
      expect(result.refused, item.name).toEqual([true, true]);
      const expected = bands(item.fit, item.xs);
      result.pi.forEach(([low, high], i) => {
        expect(relativeError(Number(low), expected[i]!.predictionLow), `${item.name} PI low`).toBeLessThan(1e-9);
        expect(relativeError(Number(high), expected[i]!.predictionHigh), `${item.name} PI high`).toBeLessThan(1e-9);
      });
    }
  });

  it('javascriptSnippet: node reproduces the check values to 1e-12 relative, throws RangeError just outside, and gives the prediction interval of bands()', () => {
    const driver = `const out = {};
for (const [name, xs, outside] of JSON.parse(process.argv[1])) {
  const module = await import(${JSON.stringify(`${directory}/`)} + name + '.mjs');
  const refused = outside.map((x) => { try { module.evaluate(x); return false; } catch (error) { return error instanceof RangeError; } });
  out[name] = { y: xs.map((x) => module.evaluate(x)), pi: xs.map((x) => module.predictionInterval(x)), refused };
}
console.log(JSON.stringify(out));`;
    const stdout = execFileSync(process.execPath, ['--input-type=module', '-e', driver, JSON.stringify(cases.map((item) => [item.name, item.xs, item.outside]))], { encoding: 'utf8' });
    const results = JSON.parse(stdout) as Record<string, { y: number[]; pi: number[][]; refused: boolean[] }>;
    for (const item of cases) {
      const result = results[item.name]!;
      expect(record('JavaScript', item, result.y), item.name).toBeLessThanOrEqual(1e-12);
      expect(result.refused, item.name).toEqual([true, true]);
      const expected = bands(item.fit, item.xs);
      result.pi.forEach(([low, high], i) => {
        expect(relativeError(low!, expected[i]!.predictionLow), `${item.name} PI low`).toBeLessThan(1e-9);
        expect(relativeError(high!, expected[i]!.predictionHigh), `${item.name} PI high`).toBeLessThan(1e-9);
      });
    }
  });

  it('cSnippet: gcc -std=c99 -pedantic -Werror compiles every header; the program reproduces the check values to 1e-12 relative and returns non-zero just outside', () => {
    const calls = cases.flatMap((item) => [
      ...item.xs.map((x) => `  if (${item.name}_evaluate(${x}, &y) != 0) {\n    return 3;\n  }\n  printf("%s %.17g\\n", "${item.name}", y);`),
      ...item.outside.map((x) => `  printf("%s refused %d\\n", "${item.name}", ${item.name}_evaluate(${x}, &y) != 0);`),
    ]);
    const program = `#include <stdio.h>\n${cases.map((item) => `#include "${item.name}.h"`).join('\n')}\nint main(void) {\n  double y = 0.0;\n${calls.join('\n')}\n  return 0;\n}\n`;
    writeFileSync(path.join(directory, 'main.c'), program);
    const binary = path.join(directory, 'main');
    execFileSync('gcc', ['-std=c99', '-pedantic', '-Wall', '-Wextra', '-Werror', '-Wno-unused-function', '-Wno-unused-const-variable', '-o', binary, path.join(directory, 'main.c'), '-lm']);
    const lines = execFileSync(binary, { encoding: 'utf8' }).trim().split('\n');
    for (const item of cases) {
      const mine = lines.filter((line) => line.startsWith(`${item.name} `)).map((line) => line.split(' '));
      const values = mine.filter((parts) => parts[1] !== 'refused').map((parts) => Number(parts[1]));
      expect(record('C', item, values), item.name).toBeLessThanOrEqual(1e-12);
      expect(mine.filter((parts) => parts[1] === 'refused').map((parts) => parts[2]), item.name).toEqual(['1', '1']);
    }
  });

  it('spreadsheetFormula: a formula engine evaluates the one-cell formula with x in a named cell to 1e-12 relative and returns #N/A just outside', () => {
    // smartRounding off: the engine would otherwise round displayed results to 14 significant digits.
    const engine = HyperFormula.buildEmpty({ licenseKey: 'gpl-v3', smartRounding: false });
    const sheetName = engine.addSheet('Sheet1');
    const sheet = engine.getSheetId(sheetName)!;
    engine.addNamedExpression(SPREADSHEET_X_NAME, '=Sheet1!$A$1');
    for (const item of cases) {
      const formula = spreadsheetFormula(item.record);
      const at = (x: number) => {
        engine.setCellContents({ sheet, row: 0, col: 0 }, [[x, formula]]);
        return engine.getCellValue({ sheet, row: 0, col: 1 });
      };
      const values = item.xs.map((x) => at(x));
      expect(values.every((value) => typeof value === 'number'), `${item.name}: ${JSON.stringify(values)}`).toBe(true);
      expect(record('spreadsheet', item, values as number[]), item.name).toBeLessThanOrEqual(1e-12);
      for (const x of item.outside) expect((at(x) as { type?: string }).type, `${item.name} at ${x}`).toBe('NA');
    }
    engine.destroy();
  });

  it('every temperature correlation gives snippets that take the scale of x: python3, node, gcc and the formula engine reproduce each scale\'s check values to 1e-12 relative and refuse just outside that scale\'s range', () => {
    const jobs = scaleJobs();
    expect(jobs.length).toBeGreaterThanOrEqual(11);
    const byName = new Map(cases.map((item) => [item.name, item]));

    // Python: evaluate(x, scale=…), prediction_interval(x, scale=…).
    const python = `import importlib.util, json, sys
out = {}
for name, scales in json.loads(sys.argv[1]):
    spec = importlib.util.spec_from_file_location(name, "${directory}/" + name + ".py")
    module = importlib.util.module_from_spec(spec)
    spec.loader.exec_module(module)
    for scale, xs, outside in scales:
        refused = []
        for x in outside:
            try:
                module.evaluate(x, scale=scale)
                refused.append(False)
            except ValueError:
                refused.append(True)
        out[name + " " + scale] = {"y": [repr(module.evaluate(x, scale=scale)) for x in xs], "pi": [list(map(repr, module.prediction_interval(x, scale=scale))) for x in xs], "refused": refused}
    try:
        module.evaluate(module.X_MIN, scale="R")
        out[name + " unknown"] = False
    except ValueError:
        out[name + " unknown"] = True
print(json.dumps(out))
`;
    const fromPython = JSON.parse(execFileSync('python3', ['-c', python, JSON.stringify(jobs)], { encoding: 'utf8' })) as Record<string, { y: string[]; pi: string[][]; refused: boolean[] } | boolean>;

    // JavaScript: evaluate(x, { scale }), predictionInterval(x, { scale }).
    const javascript = `const out = {};
for (const [name, scales] of JSON.parse(process.argv[1])) {
  const module = await import(${JSON.stringify(`${directory}/`)} + name + '.mjs');
  for (const [scale, xs, outside] of scales) {
    const refused = outside.map((x) => { try { module.evaluate(x, { scale }); return false; } catch (error) { return error instanceof RangeError; } });
    out[name + ' ' + scale] = { y: xs.map((x) => module.evaluate(x, { scale })), pi: xs.map((x) => module.predictionInterval(x, { scale })), refused };
  }
  try { module.evaluate(module.X_MIN, { scale: 'R' }); out[name + ' unknown'] = false; } catch (error) { out[name + ' unknown'] = error instanceof TypeError; }
  out[name + ' default'] = module.evaluate(module.X_MIN) === module.evaluate(module.X_MIN, { scale: module.NATIVE_SCALE });
}
console.log(JSON.stringify(out));`;
    const fromNode = JSON.parse(execFileSync(process.execPath, ['--input-type=module', '-e', javascript, JSON.stringify(jobs)], { encoding: 'utf8' })) as Record<string, { y: number[]; pi: number[][]; refused: boolean[] } | boolean>;

    // C: <name>_evaluate_in(x, <NAME>_KELVIN | _CELSIUS | _FAHRENHEIT, &y).
    const constant = { K: 'KELVIN', '°C': 'CELSIUS', '°F': 'FAHRENHEIT' } as const;
    const calls = jobs.flatMap(([name]) => {
      const item = byName.get(name as string)!;
      return [
        ...item.scales.flatMap((scale) => [
          ...scale.xs.map((x) => `  if (${name}_evaluate_in(${x}, ${(name as string).toUpperCase()}_${constant[scale.scale]}, &y) != 0) {\n    return 3;\n  }\n  printf("%s %s %.17g\\n", "${name}", "${constant[scale.scale]}", y);`),
          ...scale.outside.map((x) => `  printf("%s %s refused %d\\n", "${name}", "${constant[scale.scale]}", ${name}_evaluate_in(${x}, ${(name as string).toUpperCase()}_${constant[scale.scale]}, &y));`),
        ]),
        `  printf("%s unknown %d\\n", "${name}", ${name}_evaluate_in(${item.record.range.min}, 7, &y));`,
      ];
    });
    const program = `#include <stdio.h>\n${jobs.map(([name]) => `#include "${name}.h"`).join('\n')}\nint main(void) {\n  double y = 0.0;\n${calls.join('\n')}\n  return 0;\n}\n`;
    writeFileSync(path.join(directory, 'scales.c'), program);
    const binary = path.join(directory, 'scales');
    execFileSync('gcc', ['-std=c99', '-pedantic', '-Wall', '-Wextra', '-Werror', '-Wno-unused-function', '-Wno-unused-const-variable', '-o', binary, path.join(directory, 'scales.c'), '-lm']);
    const cLines = execFileSync(binary, { encoding: 'utf8' }).trim().split('\n').map((line) => line.split(' '));

    // Spreadsheet: the formula for each scale, x in the named cell.
    const engine = HyperFormula.buildEmpty({ licenseKey: 'gpl-v3', smartRounding: false });
    const sheet = engine.getSheetId(engine.addSheet('Sheet1'))!;
    engine.addNamedExpression(SPREADSHEET_X_NAME, '=Sheet1!$A$1');

    for (const [name] of jobs) {
      const item = byName.get(name as string)!;
      const native = item.record.temperatureScales!.native;
      for (const scale of item.scales) {
        const key = `${name} ${scale.scale}`;
        const py = fromPython[key] as { y: string[]; pi: string[][]; refused: boolean[] };
        expect(recordScale('Python', item, scale, py.y.map(Number)), key).toBeLessThanOrEqual(1e-12);
        expect(py.refused, key).toEqual([true, true]);
        const js = fromNode[key] as { y: number[]; pi: number[][]; refused: boolean[] };
        expect(recordScale('JavaScript', item, scale, js.y), key).toBeLessThanOrEqual(1e-12);
        expect(js.refused, key).toEqual([true, true]);
        // The prediction interval at x in this scale is the core's bands() at the same temperature in the native scale
        // (converted exactly, rounded once).
        const nativeXs = scale.xs.map((x) => toNumber(applyMap(scaleConversion(scale.scale, native), fromDouble(x))));
        const expected = bands(item.fit, nativeXs.map((x) => Math.min(item.fit.range.max, Math.max(item.fit.range.min, x))));
        expected.forEach((band, i) => {
          expect(relativeError(Number(py.pi[i]![0]), band.predictionLow), `${key} Python PI`).toBeLessThan(1e-9);
          expect(relativeError(js.pi[i]![1]!, band.predictionHigh), `${key} JavaScript PI`).toBeLessThan(1e-9);
        });
        const mine = cLines.filter((parts) => parts[0] === name && parts[1] === constant[scale.scale]);
        expect(recordScale('C', item, scale, mine.filter((parts) => parts[2] !== 'refused').map((parts) => Number(parts[2]))), key).toBeLessThanOrEqual(1e-12);
        expect(mine.filter((parts) => parts[2] === 'refused').map((parts) => parts[3]), key).toEqual(['1', '1']);
        const formula = spreadsheetFormula(item.record, SPREADSHEET_X_NAME, scale.scale);
        const at = (x: number) => {
          engine.setCellContents({ sheet, row: 0, col: 0 }, [[x, formula]]);
          return engine.getCellValue({ sheet, row: 0, col: 1 });
        };
        const values = scale.xs.map(at);
        expect(values.every((value) => typeof value === 'number'), `${key}: ${JSON.stringify(values)}`).toBe(true);
        expect(recordScale('spreadsheet', item, scale, values as number[]), key).toBeLessThanOrEqual(1e-12);
        for (const x of scale.outside) expect((at(x) as { type?: string }).type, `${key} at ${x}`).toBe('NA');
      }
      expect(fromPython[`${name} unknown`], `${name}: Python refuses an unknown scale`).toBe(true);
      expect(fromNode[`${name} unknown`], `${name}: JavaScript refuses an unknown scale`).toBe(true);
      expect(fromNode[`${name} default`], `${name}: the default scale is the native one`).toBe(true);
      expect(cLines.find((parts) => parts[0] === name && parts[1] === 'unknown')?.[2], `${name}: C refuses an unknown scale`).toBe('3');
    }
    engine.destroy();
  });
});
