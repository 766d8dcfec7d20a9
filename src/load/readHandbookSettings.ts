/**
 * Read and validate the handbook's settings file (`handbook.yaml` at the content root), reporting every problem as
 * `path:line:column: problem; hint` like the correlation files. A missing file is not a problem: every setting has
 * a default. Nothing is ever written back.
 */
import { readdir, stat } from 'node:fs/promises';
import path from 'node:path';
import { LineCounter, parseDocument } from 'yaml';
import { HANDBOOK_SETTINGS_FILE, handbookSettingsSchema, type HandbookSettings } from '../schema/index.ts';
import { error, sortDiagnostics, warning, type Diagnostic } from './diagnostic.ts';
import { METADATA_FILE_LIMIT_BYTES } from './limits.ts';
import { readText } from './readText.ts';
import { keyPosition, valuePosition } from './yamlPositions.ts';
import { issueToProblems } from './zodMessages.ts';

export interface HandbookSettingsResult {
  /** The validated settings (defaults filled in), or undefined when the file has errors. */
  readonly settings: HandbookSettings | undefined;
  /** Path of the settings file as shown in messages (whether or not it exists). */
  readonly file: string;
  /** True when the file exists. */
  readonly found: boolean;
  readonly diagnostics: readonly Diagnostic[];
}

/**
 * Read `<directory>/handbook.yaml`.
 * @param directory the content directory, as it should appear in messages
 * @example (await readHandbookSettings('content')).settings?.title // => "Correlary handbook" without a settings file
 */
export async function readHandbookSettings(directory: string): Promise<HandbookSettingsResult> {
  const file = path.join(directory, HANDBOOK_SETTINGS_FILE);
  const defaults = handbookSettingsSchema.parse({});
  const exists = await stat(file).then(() => true, () => false);
  if (!exists) {
    // A settings file under a near name would be silently ignored: say so instead.
    const near = (await readdir(directory).catch(() => [] as string[])).filter((name) => /^handbook\.(yml|json|yaml\.txt)$/i.test(name) || /^Handbook\.yaml$/.test(name));
    const diagnostics = near.map((name) =>
      warning(path.join(directory, name), { line: 0 }, `is not read; handbook settings are read from '${HANDBOOK_SETTINGS_FILE}'`, `rename it to ${HANDBOOK_SETTINGS_FILE}`),
    );
    return { settings: defaults, file, found: false, diagnostics };
  }

  const read = await readText(file, file, METADATA_FILE_LIMIT_BYTES);
  if (!read.ok) return { settings: undefined, file, found: true, diagnostics: [read.diagnostic] };
  const lineCounter = new LineCounter();
  const document = parseDocument(read.text, { lineCounter, prettyErrors: false, uniqueKeys: true });
  const diagnostics: Diagnostic[] = [];
  for (const problem of document.errors) {
    const { line, col } = lineCounter.linePos(problem.pos[0]);
    const first = (problem.message.split('\n')[0] ?? problem.message).replace(/ at line \d+, column \d+:?$/, '').replace(/\.$/, '');
    diagnostics.push(error(file, { line, column: col }, `YAML syntax error: ${first}`));
  }
  if (diagnostics.length > 0) return { settings: undefined, file, found: true, diagnostics };

  const raw: unknown = document.toJS() ?? {};
  if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) {
    diagnostics.push(error(file, { line: 1, column: 1 }, 'handbook settings must be a block of keys such as title, organisation, url, basePath', 'see content/README.md, "Handbook settings"'));
    return { settings: undefined, file, found: true, diagnostics };
  }
  const parsed = handbookSettingsSchema.safeParse(raw);
  if (parsed.success) return { settings: parsed.data, file, found: true, diagnostics };
  for (const issue of parsed.error.issues) {
    for (const problem of issueToProblems(handbookSettingsSchema, issue)) {
      const position = problem.atKey ? keyPosition(document, lineCounter, problem.path) : valuePosition(document, lineCounter, problem.path);
      diagnostics.push(error(file, position, problem.message, problem.hint));
    }
  }
  return { settings: undefined, file, found: true, diagnostics: sortDiagnostics(diagnostics) };
}
