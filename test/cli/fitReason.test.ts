/**
 * `correlary fit` states the reason for the order once (issue 12: it printed "Order 2, chosen by …: Order 2: going
 * higher …"). The data are invented: y = 1 + 2x + 0.3x² plus an alternating ±0.01, so the order expected is 2 (the
 * quadratic by construction; the ripple is a thousandth of the curvature over the range). What is pinned is the
 * form of the line: the order named once, then the reason.
 */
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { runCli } from '../helpers/runCli.ts';

const folders: string[] = [];
afterAll(async () => {
  for (const folder of folders) await rm(folder, { recursive: true, force: true });
});

describe('correlary fit report', () => {
  it('correlary fit names the chosen order once in the reason line, and the reason follows it', async () => {
    const folder = await mkdtemp(path.join(tmpdir(), 'correlary-reason-'));
    folders.push(folder);
    const rows = Array.from({ length: 12 }, (_, i) => `${i + 1},${1 + 2 * (i + 1) + 0.3 * (i + 1) ** 2 + (i % 2 === 0 ? 0.01 : -0.01)}`);
    const file = path.join(folder, 'quadratic.csv');
    await writeFile(file, `x,y\n${rows.join('\n')}\n`);
    const { code, stdout } = await runCli(['fit', file]);
    expect(code).toBe(0);
    const line = stdout.split('\n').find((text) => /^Order \d+, chosen by /.test(text));
    expect(line, stdout).toBeDefined();
    const order = Number(/^Order (\d+)/.exec(line!)![1]);
    expect(order).toBe(2);
    // "Order 2" opens the line and is not repeated as the start of the reason ("…: Order 2: …").
    expect(line!.match(new RegExp(`Order ${order}[,:]`, 'g'))).toHaveLength(1);
    expect(line).toMatch(/chosen by [^:]+: \S/);
  });
});
