#!/usr/bin/env node
/**
 * bench:startup — wall time of `correlary fit` on a 7-point file, as an installed package runs it (compiled
 * JavaScript from lib/, no TypeScript transpiler), against the repository's source path through tsx. Target for
 * the compiled path: under 0.4 s on the development machine. The compiled package is mirrored into a temporary
 * folder (bin/, lib/, package.json, node_modules linked to the repository's), so that bin/correlary.mjs takes the
 * installed path. Prints figures only; nothing here asserts a time.
 *
 * Run: npm run bench:startup [-- --runs 10]
 */
import { execFileSync } from 'node:child_process';
import { cp, mkdir, mkdtemp, rm, symlink, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const repository = fileURLToPath(new URL('../..', import.meta.url));
const runsFlag = process.argv.indexOf('--runs');
const runs = runsFlag > 0 ? Number(process.argv[runsFlag + 1]) : 10;

const scratch = await mkdtemp(path.join(tmpdir(), 'correlary-startup-'));
try {
  const installed = path.join(scratch, 'correlary');
  await mkdir(installed);
  execFileSync(process.execPath, [path.join(repository, 'scripts', 'build-cli.mjs'), '--outdir', path.join(installed, 'lib')], { stdio: 'inherit' });
  await cp(path.join(repository, 'bin'), path.join(installed, 'bin'), { recursive: true });
  await cp(path.join(repository, 'package.json'), path.join(installed, 'package.json'));
  await symlink(path.join(repository, 'node_modules'), path.join(installed, 'node_modules'));
  // Seven points of an invented, gently curved property against temperature.
  const csv = path.join(scratch, 'seven.csv');
  await writeFile(csv, 'T,y\n300,1.102\n350,1.297\n400,1.521\n450,1.694\n500,1.931\n550,2.102\n600,2.338\n');

  const time = (bin, args) => {
    const times = [];
    for (let run = 0; run < runs; run++) {
      const start = process.hrtime.bigint();
      execFileSync(process.execPath, [bin, ...args], { cwd: scratch, stdio: 'ignore' });
      times.push(Number(process.hrtime.bigint() - start) / 1e9);
    }
    times.sort((a, b) => a - b);
    return { median: times[Math.floor(times.length / 2)], min: times[0] };
  };
  const node = time('-e', ['0']);
  const compiledFit = time(path.join(installed, 'bin', 'correlary.mjs'), ['fit', csv]);
  const compiledNew = time(path.join(installed, 'bin', 'correlary.mjs'), ['--help']);
  const sourceFit = time(path.join(repository, 'bin', 'correlary.mjs'), ['fit', csv]);
  const row = (label, figures) => console.log(`${label.padEnd(52)} ${figures.median.toFixed(3)} s median, ${figures.min.toFixed(3)} s best`);
  console.log(`start-up over ${runs} runs each (wall time, one process per run):`);
  row('node -e 0 (Node itself)', node);
  row('correlary --help, compiled (installed package)', compiledNew);
  row('correlary fit seven.csv, compiled (installed package)', compiledFit);
  row('correlary fit seven.csv, sources through tsx (repository)', sourceFit);
  console.log(`target: correlary fit on a 7-point file under 0.4 s (compiled): ${compiledFit.median < 0.4 ? 'met' : 'not met'} (median)`);
} finally {
  await rm(scratch, { recursive: true, force: true });
}
