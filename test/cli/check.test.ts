/**
 * `correlary check` lists every problem of a folder in one run (issue 12, "Done when": a fixture with at least five
 * different mistakes gets all of them from one check). The fixture test/fixtures/content/many-mistakes holds
 * ten kinds of mistake in two correlations, placed by hand (each line below was read off the fixture's files:
 * the misspelt enum value, the fixed order without a reason, the string where a number belongs, exclusions past the
 * end of the data, the widened range, the pass-through point outside it, the unknown key, a bad date, a
 * non-numeric cell and values the log transform cannot take). Schema errors do not hide the checks against the
 * data: the exclusion rows and the range are checked in the same run.
 */
import { describe, expect, it } from 'vitest';
import { runCli } from '../helpers/runCli.ts';

const FOLDER = 'test/fixtures/content/many-mistakes';

/** [file:line:column, the kind of mistake (a distinctive part of the message)]. */
const EXPECTED: readonly (readonly [string, string])[] = [
  ['liquid-a/correlation.yaml:17:11', "'source.method' is 'measurd'"],
  ['liquid-a/correlation.yaml:24:10', "'fit.reason' does not say why"],
  ['liquid-a/correlation.yaml:25:13', "'fit.maxOrder' must be a number"],
  ['liquid-a/correlation.yaml:29:12', 'fit.exclude[0].row is 12 but the data file has 8 rows'],
  ['liquid-a/correlation.yaml:32:10', 'fit.range.max 400 is outside the x range of the data'],
  ['liquid-a/correlation.yaml:34:10', 'pass-through point x = 270 is outside the validity range'],
  ['liquid-a/correlation.yaml:37:1', "unknown key 'tagz'"],
  ['liquid-a/data.csv:5:5', "y = -1938.2 is not positive, but fit.transform.y is 'log'"],
  ['liquid-b/correlation.yaml:17:9', "'source.date' must be a date"],
  ['liquid-b/correlation.yaml:26:12', 'fit.exclude[0].row is 9 but the data file has 4 rows'],
  ['liquid-b/data.csv:3:5', "non-numeric value 'n/a' in column 'cp'"],
  ['liquid-b/data.csv:4:1', "x = -300 is not positive, but fit.transform.x is 'log'"],
];

describe('correlary check', () => {
  it('correlary check many-mistakes reports all twelve problems, of ten kinds, in one run', async () => {
    const result = await runCli(['check', FOLDER]);
    expect(result.code).toBe(1);
    const printed = `${result.stdout}\n${result.stderr}`;
    const lines = printed.split('\n').filter((line) => line.startsWith(`${FOLDER}/`));
    expect(lines).toHaveLength(EXPECTED.length);
    EXPECTED.forEach(([where, what], i) => {
      expect(lines[i]!.startsWith(`${FOLDER}/${where}: `), lines[i]).toBe(true);
      expect(lines[i], where).toContain(what);
    });
    expect(printed).toContain(`checked 2 correlations in ${FOLDER}: 12 errors, 0 warnings`);
  });
});
