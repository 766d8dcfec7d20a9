/**
 * The demo handbook's review trail: it shows every review state (draft, in review, approved and holding, approval
 * lapsed, unbound approval, withdrawn with its replacement), its own `check` passes without --strict, and a copy
 * with every y value nudged by 0.1 % fails `check --strict`, naming every approval that lapsed.
 */
import { cp, mkdtemp, readFile, readdir, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { generateDemo } from '../../../scripts/demo/generate.ts';
import { fitHandbook } from '../../../src/load/index.ts';
import { runCli } from '../../helpers/runCli.ts';

let demo = '';
const temporary: string[] = [];
beforeAll(async () => {
  demo = await mkdtemp(path.join(tmpdir(), 'correlary-demo-review-'));
  temporary.push(demo);
  await generateDemo(demo);
}, 60_000);
afterAll(async () => {
  for (const directory of temporary) await rm(directory, { recursive: true, force: true });
});

describe('the demo review trail', () => {
  it('the demo shows every review state, and a withdrawn correlation names an existing replacement', async () => {
    const handbook = await fitHandbook(demo);
    const states = new Map<string, string[]>();
    for (const { dataset, review } of handbook.datasets) {
      const status = dataset.correlation!.meta.review.status;
      const state = status === 'approved' ? `approved:${review!.approval.state}` : status;
      states.set(state, [...(states.get(state) ?? []), dataset.slug]);
    }
    expect([...states.keys()].sort()).toEqual(['approved:holds', 'approved:lapsed', 'approved:unbound', 'draft', 'in-review', 'withdrawn']);
    expect(states.get('approved:lapsed')).toEqual(['velmarine-ht40-specific-heat']);
    const withdrawn = handbook.datasets.find((item) => item.dataset.slug === states.get('withdrawn')![0])!;
    const replacedBy = withdrawn.dataset.correlation!.meta.review.replacedBy;
    expect(handbook.datasets.some((item) => item.dataset.slug === replacedBy)).toBe(true);
  });

  it('correlary check on the demo passes without --strict, warning only of the lapsed and the unbound approval', async () => {
    const result = await runCli(['check', demo]);
    expect(result.code).toBe(0);
    const warnings = result.stdout.split('\n').filter((line) => line.includes(': warning: '));
    expect(warnings).toHaveLength(2);
    expect(warnings[0]).toContain('marrowlite-p6-conductivity/correlation.yaml:39:3: warning: unbound approval');
    expect(warnings[1]).toContain('velmarine-ht40-specific-heat/correlation.yaml');
    expect(warnings[1]).toContain('warning: approval lapsed (data changed, result changed)');
  });

  it('correlary check --strict on a copy with every y nudged by 0.1 % fails, naming every bound approval as lapsed', async () => {
    const nudged = await mkdtemp(path.join(tmpdir(), 'correlary-demo-nudged-'));
    temporary.push(nudged);
    await cp(demo, nudged, { recursive: true });
    const handbook = await fitHandbook(nudged);
    for (const { dataset } of handbook.datasets) {
      const correlation = dataset.correlation!;
      // No demo data file holds a quoted field (checked here), so splitting on commas reads every row.
      const text = await readFile(correlation.dataPath, 'utf8');
      expect(text.includes('"'), correlation.dataPath).toBe(false);
      const lines = text.split('\n');
      const headerIndex = lines.findIndex((line) => line !== '' && !line.startsWith('#'));
      const column = lines[headerIndex]!.split(',').indexOf(correlation.meta.data.y);
      const changed = lines.map((line, index) =>
        index <= headerIndex || line === '' || line.startsWith('#')
          ? line
          : line.split(',').map((cell, cellIndex) => (cellIndex === column ? String(Number((Number(cell) * 1.001).toPrecision(12))) : cell)).join(','),
      );
      await writeFile(correlation.dataPath, changed.join('\n'));
    }
    const bound = handbook.datasets.filter((item) => item.dataset.correlation!.meta.review.fingerprint !== undefined).map((item) => item.dataset.slug);
    expect(bound.length).toBeGreaterThanOrEqual(5);
    const strict = await runCli(['check', nudged, '--strict']);
    expect(strict.code).toBe(1);
    for (const slug of bound) {
      expect(strict.stdout, slug).toMatch(new RegExp(`${slug}/correlation\\.yaml:\\d+:\\d+: warning: approval lapsed \\(data changed, result changed\\)`));
    }
    expect(strict.stdout).toMatch(/--strict: the \d+ warnings above fail the check/);
    expect((await readdir(nudged)).length).toBe((await readdir(demo)).length);
  });
});
