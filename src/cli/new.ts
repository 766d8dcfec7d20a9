/**
 * `correlary new <slug> [--dir content]`: create `<dir>/<slug>/` with a commented correlation.yaml and a data.csv
 * holding only a header. Refuses when the folder exists; never overwrites or edits a file.
 */
import { mkdir, stat, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { SLUG_PATTERN, METADATA_FILE } from '../schema/index.ts';
import { dataTemplate, metadataTemplate } from '../load/template.ts';
import { CliError } from './cliError.ts';

const USAGE = 'usage: correlary new <slug> [--dir content]';

function parseArgs(args: readonly string[]): { slug: string; directory: string } {
  let directory = 'content';
  const positional: string[] = [];
  for (let i = 0; i < args.length; i++) {
    const arg = args[i]!;
    if (arg === '--dir') {
      const value = args[++i];
      if (value === undefined) throw new CliError(`--dir needs a directory\n${USAGE}`, 2);
      directory = value;
    } else if (arg.startsWith('--dir=')) {
      directory = arg.slice('--dir='.length);
    } else if (arg.startsWith('-')) {
      throw new CliError(`new does not take option '${arg}'\n${USAGE}`, 2);
    } else {
      positional.push(arg);
    }
  }
  if (positional.length !== 1) throw new CliError(`new takes one slug\n${USAGE}`, 2);
  return { slug: positional[0]!, directory };
}

export async function runNew(args: string[]): Promise<number> {
  if (args.includes('-h') || args.includes('--help')) {
    console.log(USAGE);
    return 0;
  }
  const { slug, directory } = parseArgs(args);
  if (!SLUG_PATTERN.test(slug)) {
    throw new CliError(`slug '${slug}' must be lower-case letters and digits joined by single hyphens, e.g. corvane-specific-heat`, 2);
  }
  const folder = path.join(directory, slug);
  if (await stat(folder).then(() => true, () => false)) {
    throw new CliError(`${folder} already exists; nothing was changed`);
  }
  await mkdir(directory, { recursive: true });
  // Not recursive: fails if another process created the folder in the meantime.
  await mkdir(folder);
  const today = new Date().toISOString().slice(0, 10);
  const files: [string, string][] = [
    [METADATA_FILE, metadataTemplate(slug, today)],
    ['data.csv', dataTemplate()],
  ];
  for (const [name, text] of files) {
    await writeFile(path.join(folder, name), text, { flag: 'wx' });
    console.log(`created ${path.join(folder, name)}`);
  }
  console.log(`next: fill in ${path.join(folder, METADATA_FILE)}, add points to ${path.join(folder, 'data.csv')}, then run correlary check ${directory}`);
  return 0;
}
