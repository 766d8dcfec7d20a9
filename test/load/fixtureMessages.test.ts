/**
 * One fixture folder per problem under test/fixtures/content/<case>/; each test pins the exact messages that
 * readHandbook reports for it (paths shown relative to the case folder).
 */
import { describe, expect, it } from 'vitest';
import { formatDiagnostic, readHandbook } from '../../src/load/index.ts';

const FIXTURES = 'test/fixtures/content';

async function messagesFor(fixtureCase: string): Promise<string[]> {
  const directory = `${FIXTURES}/${fixtureCase}`;
  const handbook = await readHandbook(directory);
  return [...handbook.diagnostics, ...handbook.datasets.flatMap((dataset) => dataset.diagnostics)]
    .map(formatDiagnostic)
    .map((message) => message.replaceAll(`${directory}/`, ''));
}

const CASES: [string, string[]][] = [
  ['bad-values', [
    "liquid-a/correlation.yaml:17:11: 'source.method' is 'measurd'; expected one of: measured, table, derived; did you mean 'measured'?",
    "liquid-a/correlation.yaml:18:9: 'source.date' must be a date written as YYYY-MM-DD",
    "liquid-a/correlation.yaml:24:13: 'fit.maxOrder' must be a number, not a string",
    "liquid-a/correlation.yaml:26:8: 'fit.transform.x' is 'logarithm'; expected one of: identity, reciprocal, log",
  ]],
  ['bom-crlf', [
  ]],
  ['constant-x', [
    "liquid-a/data.csv:1: every point has x = 300; a correlation needs at least two different x values",
    "liquid-a/data.csv:3: warning: x = 300 repeats line 2 with a different y, and there is no uncertainty column; set data.replicates: true if these are replicate measurements, or add an uncertainty column",
  ]],
  ['constraint-outside-range', [
    "liquid-a/correlation.yaml:25:10: pass-through point x = 273.15 is outside the validity range 280 to 350",
  ]],
  ['csv-malformed', [
    "liquid-a/data.csv:3: malformed CSV: a quote opened on this line is never closed; a field holding a quote or comma must be quoted, with inner quotes doubled (\"\")",
  ]],
  ['data-escape', [
    "liquid-a/correlation.yaml:21:9: data file '../shared.csv' is outside the correlation folder; keep the data file inside the folder and name it relative to it, e.g. data.csv",
  ]],
  ['data-symlink', [
    "liquid-a/correlation.yaml:21:3: data file 'data.csv' is a symbolic link to a file outside the correlation folder; copy the data into the folder instead of linking to it",
  ]],
  ['decimal-comma', [
    "liquid-a/data.csv:4:5: decimal comma in '1925,1' (column 'cp'); use '.' as the decimal point",
    "liquid-a/data.csv:5: row has 3 fields but the header has 2; a decimal comma? write 1.5, not 1,5; text holding a comma must be quoted",
  ]],
  ['duplicate-slugs', [
    "liquid-a/correlation.yaml:3: slug 'liquid-a-cp' is also used by liquid-a-second-source/correlation.yaml; set a different slug: in one of them",
    "liquid-a-second-source/correlation.yaml:3: slug 'liquid-a-cp' is also used by liquid-a/correlation.yaml; set a different slug: in one of them",
  ]],
  ['duplicate-x', [
    "liquid-a/data.csv:10: warning: x = 300 repeats line 4 with a different y, and there is no uncertainty column; set data.replicates: true if these are replicate measurements, or add an uncertainty column",
  ]],
  ['empty-cell', [
    "liquid-a/data.csv:5:5: empty cell in column 'cp'; every row needs a value here; leave a row out with fit.exclude or a # comment line",
  ]],
  ['exclusion-unmatched', [
    "liquid-a/correlation.yaml:25:12: fit.exclude[0].row is 12 but the data file has 8 rows",
    "liquid-a/correlation.yaml:27:10: no data row has x = 305; x must equal the value in the data file exactly; or exclude by row",
  ]],
  ['fixed-order-no-reason', [
    "liquid-a/correlation.yaml:24:10: 'fit.order' is a fixed order but 'fit.reason' does not say why",
  ]],
  ['header-missing', [
    "liquid-a/data.csv:1:1: no header row: the first row holds numbers; add a first line naming the columns, e.g. T,cp",
  ]],
  ['header-wrong', [
    "liquid-a/data.csv:1:1: header has no column 'cp' (named by data.y in the metadata); did you mean 'c_p'?",
    "liquid-a/data.csv:1:3: warning: column 'c_p' is not named in the metadata and is ignored",
  ]],
  ['log-nonpositive', [
    "liquid-a/data.csv:3:5: y = -3.5 is not positive, but fit.transform.y is 'log'; leave the row out with fit.exclude, or choose another transform",
    "liquid-a/data.csv:7:5: y = 0 is not positive, but fit.transform.y is 'log'; leave the row out with fit.exclude, or choose another transform",
  ]],
  ['metadata-missing', [
    "liquid-a/correlation.yaml: file not found; every correlation folder needs one; found 'meta.yml'; the metadata file must be named correlation.yaml",
  ]],
  ['metadata-symlink', [
    "liquid-a/correlation.yaml: metadata file is a symbolic link to a file outside the correlation folder; copy the metadata into the folder instead of linking to it",
  ]],
  ['missing-key', [
    "liquid-a/correlation.yaml:1:1: missing required key 'title'",
    "liquid-a/correlation.yaml:14:1: missing required key 'preparedBy' in 'source'",
  ]],
  ['non-finite', [
    "liquid-a/data.csv:5:5: 'NaN' in column 'cp' is not a finite number; remove the row or turn it into a # comment line",
    "liquid-a/data.csv:7:1: 'Infinity' in column 'T' is not a finite number; remove the row or turn it into a # comment line",
  ]],
  ['non-numeric', [
    "liquid-a/data.csv:5:5: non-numeric value 'abc' in column 'cp'",
  ]],
  ['range-widened', [
    "liquid-a/correlation.yaml:25:10: fit.range.min 250 is outside the x range of the data (280 to 350); the validity range can be narrowed, never widened",
  ]],
  ['semicolon', [
    "liquid-a/data.csv:1:1: fields are separated by semicolons and numbers use decimal commas, but Correlary reads only comma-separated files with '.' decimals; export the file as CSV with ',' between fields and '.' as the decimal point",
  ]],
  ['several-files', [
    "liquid-a/correlation.yaml:13:3: unknown key 'nam' in 'material'; did you mean 'name'?",
    "liquid-a/data.csv:5: row has 3 fields but the header has 2; a decimal comma? write 1.5, not 1,5; text holding a comma must be quoted",
    "liquid-a/data.csv:8:5: non-numeric value 'n/a' in column 'cp'",
  ]],
  ['too-few-points', [
    "liquid-a/data.csv:1: only 2 points are left to fit; a correlation needs at least 3",
  ]],
  ['unit-missing', [
    "liquid-a/correlation.yaml:4:1: missing required key 'unit' in 'property'; write unit: \"1\" for a dimensionless quantity",
    "liquid-a/correlation.yaml:10:9: 'variable.unit' must not be empty; write unit: \"1\" for a dimensionless quantity",
  ]],
  ['unknown-key', [
    "liquid-a/correlation.yaml:4:1: unknown key 'tagz'; did you mean 'tags'?",
    "liquid-a/correlation.yaml:8:3: unknown key 'unti' in 'property'; did you mean 'unit'?",
  ]],
  ['valid', [
  ]],
  ['yaml-syntax', [
    "liquid-a/correlation.yaml:11:3: YAML syntax error: key 'symbol' appears twice in the same block",
  ]],
  // A "billion laughs" file: nested aliases refused at the first alias, before any expansion (yaml maxAliasCount).
  ['yaml-aliases', [
    "liquid-a/correlation.yaml:26:9: YAML aliases (*name) expand to too much data: more than 100 copies; write the values out instead of repeating anchors",
  ]],
  ['order-too-high', [
    "liquid-a/correlation.yaml:24:10: order 9 needs at least 11 points, but 8 are used",
  ]],
  // Every problem of two folders from one run: schema errors (a misspelt enum value, a string for a number, an
  // unknown key, an impossible date) do not hide the rule across fields (fixed order without a reason) nor the checks
  // of the data against the metadata (exclusion past the end, widened range, pass-through outside the range, ln of
  // a negative y, ln of a negative x in a file that also has a non-numeric cell). Expected list written by hand
  // from the fixture files (line and column of each offending value).
  ['many-mistakes', [
    "liquid-a/correlation.yaml:17:11: 'source.method' is 'measurd'; expected one of: measured, table, derived; did you mean 'measured'?",
    "liquid-a/correlation.yaml:24:10: 'fit.order' is a fixed order but 'fit.reason' does not say why",
    "liquid-a/correlation.yaml:25:13: 'fit.maxOrder' must be a number, not a string",
    "liquid-a/correlation.yaml:29:12: fit.exclude[0].row is 12 but the data file has 8 rows",
    "liquid-a/correlation.yaml:32:10: fit.range.max 400 is outside the x range of the data (280 to 350); the validity range can be narrowed, never widened",
    "liquid-a/correlation.yaml:34:10: pass-through point x = 270 is outside the validity range 280 to 400",
    "liquid-a/correlation.yaml:37:1: unknown key 'tagz'; did you mean 'tags'?",
    "liquid-a/data.csv:5:5: y = -1938.2 is not positive, but fit.transform.y is 'log'; leave the row out with fit.exclude, or choose another transform",
    "liquid-b/correlation.yaml:17:9: 'source.date' must be a date written as YYYY-MM-DD",
    "liquid-b/correlation.yaml:26:12: fit.exclude[0].row is 9 but the data file has 4 rows",
    "liquid-b/data.csv:3:5: non-numeric value 'n/a' in column 'cp'",
    "liquid-b/data.csv:4:1: x = -300 is not positive, but fit.transform.x is 'log'; leave the row out with fit.exclude, or choose another transform",
  ]],
  ['settings-bad', [
    "handbook.yaml:3:1: unknown key 'titel'; did you mean 'title'?",
    "handbook.yaml:5:6: 'url' must be an absolute http:// or https:// address with no query, fragment or password, e.g. https://handbook.example.org",
    "handbook.yaml:6:11: 'basePath' must start with \"/\", e.g. /handbook/",
    "handbook.yaml:7:9: 'notice' must not be empty",
  ]],
  ['settings-misnamed', [
    "handbook.yml: warning: is not read; handbook settings are read from 'handbook.yaml'; rename it to handbook.yaml",
  ]],
  ['reciprocal-across-zero', [
    "liquid-a/correlation.yaml:25:8: fit.transform.x is 'reciprocal' but the x range -40 to 100 contains x = 0, where 1/x is infinite; fit x without a transform, or split the data at the singular point",
  ]],
  ['reciprocal-zero', [
    "liquid-a/data.csv:2:1: x = 0 has no reciprocal, but fit.transform.x is 'reciprocal'; leave the row out with fit.exclude, or choose another transform",
  ]],
];

describe('readHandbook(fixture) reports each problem with file, line and column', () => {
  it.each(CASES)('readHandbook(%s)', async (fixtureCase, expected) => {
    expect(await messagesFor(fixtureCase)).toEqual(expected);
  });
});
