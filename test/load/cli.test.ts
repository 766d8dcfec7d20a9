/**
 * `correlary check` and `correlary new` through their exported run functions, with console output captured.
 */
import { cp, mkdtemp, readFile, readdir, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { runCheck } from '../../src/cli/check.ts';
import { runNew } from '../../src/cli/new.ts';

const FIXTURES = 'test/fixtures/content';
let printed: string[] = [];
const temporary: string[] = [];

beforeEach(() => {
  printed = [];
  vi.spyOn(console, 'log').mockImplementation((...parts: unknown[]) => {
    printed.push(...parts.map(String).join(' ').split('\n'));
  });
});
afterEach(() => vi.restoreAllMocks());
afterAll(async () => {
  for (const directory of temporary) await rm(directory, { recursive: true, force: true });
});

async function scratch(): Promise<string> {
  const directory = await mkdtemp(path.join(tmpdir(), 'correlary-cli-'));
  temporary.push(directory);
  return directory;
}

describe('runCheck(args)', () => {
  it('runCheck does not fit a folder whose name is not a valid slug, and counts that error in its summary', async () => {
    const directory = await scratch();
    await cp(`${FIXTURES}/valid/liquid-a`, path.join(directory, 'Liquid_A'), { recursive: true });
    expect(await runCheck([directory])).toBe(1);
    expect(printed).toEqual([
      `${path.join(directory, 'Liquid_A')}: folder name 'Liquid_A' is not a valid slug; use lower-case letters and digits joined by single hyphens, or set slug: in the metadata`,
      'Liquid_A: not fitted, 1 error',
      `checked 1 correlation in ${directory}: 1 error, 0 warnings`,
    ]);
  });

  it('runCheck([valid]) prints one summary line per correlation and exits 0', async () => {
    expect(await runCheck([`${FIXTURES}/valid`])).toBe(0);
    expect(printed).toEqual([
      'liquid-a: n = 8, order 2 (lowestJustified), s = 0.09862 J/(kg·K), R² = 0.999994',
      `checked 1 correlation in ${FIXTURES}/valid: 0 errors, 0 warnings`,
    ]);
  });

  it('runCheck prints s with no unit for a dimensionless property (unit "1")', async () => {
    const directory = await scratch();
    await cp(`${FIXTURES}/valid/liquid-a`, path.join(directory, 'liquid-a'), { recursive: true });
    const metadata = path.join(directory, 'liquid-a', 'correlation.yaml');
    const text = await readFile(metadata, 'utf8');
    expect(text).toContain('unit: J/(kg·K)');
    await writeFile(metadata, text.replace('unit: J/(kg·K)', 'unit: "1"'));
    expect(await runCheck([directory])).toBe(0);
    // Same data as the valid fixture above, so the same s; only the unit after it goes.
    expect(printed[0]).toBe('liquid-a: n = 8, order 2 (lowestJustified), s = 0.09862, R² = 0.999994');
  });

  it('runCheck([duplicate-x]) prints the warning and still exits 0', async () => {
    expect(await runCheck([`${FIXTURES}/duplicate-x`])).toBe(0);
    expect(printed[0]).toMatch(/^test\/fixtures\/content\/duplicate-x\/liquid-a\/data.csv:10: warning: x = 300 repeats line 4/);
    expect(printed.at(-1)).toBe(`checked 1 correlation in ${FIXTURES}/duplicate-x: 0 errors, 1 warning`);
  });

  it('runCheck([several-files]) prints every problem in both files, one per line, and exits 1', async () => {
    expect(await runCheck([`${FIXTURES}/several-files`])).toBe(1);
    const prefix = `${FIXTURES}/several-files/liquid-a`;
    expect(printed).toEqual([
      `${prefix}/correlation.yaml:13:3: unknown key 'nam' in 'material'; did you mean 'name'?`,
      `${prefix}/data.csv:5: row has 3 fields but the header has 2; a decimal comma? write 1.5, not 1,5; text holding a comma must be quoted`,
      `${prefix}/data.csv:8:5: non-numeric value 'n/a' in column 'cp'`,
      'liquid-a: not fitted, 3 errors',
      `checked 1 correlation in ${FIXTURES}/several-files: 3 errors, 0 warnings`,
    ]);
  });

  it('runCheck([missing]) is a usage error', async () => {
    await expect(runCheck(['no/such/dir'])).rejects.toThrow("check requires a directory; 'no/such/dir' is not one");
    await expect(runCheck(['a', 'b'])).rejects.toThrow('check takes one directory, got 2');
  });
});

describe('runNew(args)', () => {
  it('runNew([slug, --dir]) writes a commented template that check then rejects until data are added', async () => {
    const directory = await scratch();
    expect(await runNew(['coolant-x-density', '--dir', directory])).toBe(0);
    expect((await readdir(path.join(directory, 'coolant-x-density'))).sort()).toEqual(['correlation.yaml', 'data.csv']);
    const metadata = await readFile(path.join(directory, 'coolant-x-density', 'correlation.yaml'), 'utf8');
    expect(metadata).toMatch(/^# Correlation metadata for 'coolant-x-density'/);
    printed = [];
    expect(await runCheck([directory])).toBe(1);
    expect(printed.slice(0, -2)).toEqual([
      `${directory}/coolant-x-density/correlation.yaml:4: metadata still holds 8 TODO placeholders, the first on this line; replace every TODO value`,
      `${directory}/coolant-x-density/data.csv:2: only 0 points are left to fit; a correlation needs at least 3`,
    ]);
  });

  it('runNew([existing]) refuses and leaves the existing files untouched', async () => {
    const directory = await scratch();
    await runNew(['coolant-x-density', '--dir', directory]);
    const file = path.join(directory, 'coolant-x-density', 'data.csv');
    await writeFile(file, 'T,rho\n300,1000\n');
    await expect(runNew(['coolant-x-density', '--dir', directory])).rejects.toThrow(
      `${path.join(directory, 'coolant-x-density')} already exists; nothing was changed`,
    );
    expect(await readFile(file, 'utf8')).toBe('T,rho\n300,1000\n');
  });

  it('runNew([bad slug]) is a usage error', async () => {
    await expect(runNew(['Coolant X'])).rejects.toThrow("slug 'Coolant X' must be lower-case letters and digits joined by single hyphens");
    await expect(runNew([])).rejects.toThrow('new takes one slug');
  });
});
