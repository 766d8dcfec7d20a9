/**
 * createProgress: a status line rewritten in place on a terminal, nothing at all elsewhere (CI logs get only the
 * command's summary). Expected escape sequences: carriage return and ECMA-48 "erase line" (CSI 2 K), from memory.
 */
import { describe, expect, it } from 'vitest';
import { createProgress } from '../../src/cli/progress.ts';
import { runCli } from '../helpers/runCli.ts';

function fakeStream(isTTY: boolean) {
  const written: string[] = [];
  const stream = { isTTY, columns: 60, write: (text: string) => (written.push(text), true) } as unknown as NodeJS.WriteStream;
  return { stream, written };
}

describe('createProgress', () => {
  it('createProgress(terminal) rewrites one line with the count and the elapsed time, at most ten times a second, and clears it', () => {
    let clock = 0;
    const { stream, written } = fakeStream(true);
    const progress = createProgress(stream, () => clock);
    progress.update('read and fitted 1 of 3 correlations');
    clock = 50;
    progress.update('read and fitted 2 of 3 correlations'); // within 100 ms: skipped
    clock = 1500;
    progress.update('read and fitted 3 of 3 correlations');
    progress.done();
    expect(written).toEqual([
      '\r\x1b[2Kread and fitted 1 of 3 correlations · 0.0 s',
      '\r\x1b[2Kread and fitted 3 of 3 correlations · 1.5 s',
      '\r\x1b[2K',
    ]);
  });

  it('createProgress(not a terminal) writes nothing', () => {
    const { stream, written } = fakeStream(false);
    const progress = createProgress(stream);
    progress.update('read and fitted 1 of 3 correlations');
    progress.done();
    expect(written).toEqual([]);
  });

  it('correlary check through a pipe prints no progress line, only its messages and summary', async () => {
    const result = await runCli(['check', 'test/fixtures/content/valid']);
    expect(result.code).toBe(0);
    expect(result.stderr).toBe('');
    expect(result.stdout).not.toContain('\r');
    expect(result.stdout.trimEnd().split('\n').at(-1)).toMatch(/^checked 1 correlation in test\/fixtures\/content\/valid: 0 errors, \d+ warnings?$/);
  });
});
