/**
 * What `correlary approve` and `correlary withdraw` share: reading their options, finding the correlation by slug
 * after the same read-validate-fit pass as `check`, refusing when `check` reports an error for it, and writing
 * the edited review block back (only that block changes; see src/load/review/editReviewBlock.ts).
 */
import { readFile, stat, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { fitHandbook, formatDiagnostic, type FittedDataset, type FittedHandbook } from '../load/index.ts';
import { editReviewBlock, ReviewEditError } from '../load/review/editReviewBlock.ts';
import { suggest } from '../load/suggest.ts';
import { isoDateSchema } from '../schema/index.ts';
import { CliError } from './cliError.ts';

export interface ReviewArgs {
  readonly slug: string;
  readonly content: string;
  readonly options: ReadonlyMap<string, string>;
}

/**
 * Parse `<slug> [--name VALUE]…`; every option takes a value, given as `--name VALUE` or `--name=VALUE`.
 * @param allowed option names without the dashes, e.g. ['by', 'date', 'content']
 */
export function parseReviewArgs(command: string, args: readonly string[], allowed: readonly string[], usage: string): ReviewArgs {
  const options = new Map<string, string>();
  const positional: string[] = [];
  for (let i = 0; i < args.length; i++) {
    const arg = args[i]!;
    if (!arg.startsWith('--')) {
      if (arg.startsWith('-')) throw new CliError(`${command} does not take option '${arg}'\n${usage}`, 2);
      positional.push(arg);
      continue;
    }
    const [name, inline] = arg.slice(2).split(/=(.*)/s, 2) as [string, string | undefined];
    if (!allowed.includes(name)) throw new CliError(`${command} does not take option '--${name}'\n${usage}`, 2);
    const value = inline ?? args[++i];
    if (value === undefined || value.trim() === '') throw new CliError(`--${name} needs a value\n${usage}`, 2);
    options.set(name, value.trim());
  }
  if (positional.length !== 1) throw new CliError(`${command} takes one slug, got ${positional.length}\n${usage}`, 2);
  return { slug: positional[0]!, content: options.get('content') ?? 'content', options };
}

/** A --date value, or today's date (UTC) when none is given. */
export function dateOption(value: string | undefined): string {
  if (value === undefined) return new Date().toISOString().slice(0, 10);
  if (!isoDateSchema.safeParse(value).success) throw new CliError(`--date '${value}' must be a date written as YYYY-MM-DD`, 2);
  return value;
}

/** Read and fit the handbook, find the correlation; print and refuse when check reports any error for it. */
export async function checkedCorrelation(command: string, args: ReviewArgs): Promise<{ handbook: FittedHandbook; found: FittedDataset }> {
  const info = await stat(args.content).catch(() => undefined);
  if (info === undefined || !info.isDirectory()) throw new CliError(`${command} requires a content directory; '${args.content}' is not one (use --content DIR)`, 2);
  const handbook = await fitHandbook(args.content);
  const found = handbook.datasets.find((dataset) => dataset.dataset.slug === args.slug);
  if (found === undefined) {
    const guess = suggest(args.slug, handbook.datasets.map((dataset) => dataset.dataset.slug));
    throw new CliError(`no correlation '${args.slug}' in ${args.content}${guess === undefined ? '' : `; did you mean '${guess}'?`}`);
  }
  const folder = path.resolve(found.dataset.folder);
  const errors = handbook.diagnostics.filter(
    (diagnostic) => diagnostic.severity === 'error' && (path.resolve(diagnostic.file) === folder || path.resolve(diagnostic.file).startsWith(folder + path.sep)),
  );
  const fitFailed = found.fitted?.fit === undefined;
  if (errors.length > 0 || fitFailed) {
    for (const problem of errors) console.error(formatDiagnostic(problem));
    const count = errors.length;
    const why = count > 0 ? `check reports ${count} error${count === 1 ? '' : 's'} for it (above)` : 'it could not be fitted';
    throw new CliError(`${command} refused for ${args.slug}: ${why}; fix ${count === 1 ? 'it' : 'them'} and run 'correlary check ${args.content}'; nothing was changed`);
  }
  return { handbook, found };
}

/** Rewrite the review block of the correlation's metadata file, changing nothing else. */
export async function writeReview(found: FittedDataset, set: Readonly<Record<string, string>>, remove: readonly string[]): Promise<string> {
  const file = found.dataset.metadataPath;
  const raw = await readFile(file, 'utf8');
  let edited: string;
  try {
    edited = editReviewBlock(raw, set, remove);
  } catch (caught) {
    if (caught instanceof ReviewEditError) throw new CliError(`${file}: ${caught.message}`);
    throw caught;
  }
  if (edited !== raw) await writeFile(file, edited, 'utf8');
  return file;
}
