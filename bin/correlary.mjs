#!/usr/bin/env node
// Entry point for `npx correlary`. An installed package runs the compiled JavaScript in lib/ (built from the
// TypeScript sources by scripts/build-cli.mjs when the package is packed). A clone of the repository, which has
// the command's sources in src/cli/, runs those through tsx instead, so that lib/ can never be stale there.
import { existsSync } from 'node:fs';

const sources = new URL('../src/cli/main.ts', import.meta.url);
let main;
if (existsSync(sources)) {
  const { register } = await import('tsx/esm/api');
  register();
  ({ main } = await import(sources.href));
} else {
  ({ main } = await import('../lib/cli/main.js'));
}
process.exitCode = await main(process.argv.slice(2));
