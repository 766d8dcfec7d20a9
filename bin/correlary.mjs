#!/usr/bin/env node
// Entry point for `npx correlary`. The CLI is written in TypeScript; tsx loads it without a build step.
import { register } from 'tsx/esm/api';

register();
const { main } = await import('../src/cli/main.ts');
process.exitCode = await main(process.argv.slice(2));
