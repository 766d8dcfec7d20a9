/**
 * Parse and validate a correlation's metadata file, reporting every problem with its line and column.
 */
import { LineCounter, isAlias, parseDocument, visit, type Document } from 'yaml';
import {
  correlationMetaSchema,
  dataColumnsSchema,
  fitOptionRules,
  metaRules,
  type CorrelationMeta,
  type DataColumns,
  type FitSettings,
} from '../schema/index.ts';
import { lenientFitSettings } from './lenientFitSettings.ts';
import { error, warning, type Diagnostic, type Position } from './diagnostic.ts';
import { keyPosition, valuePosition } from './yamlPositions.ts';
import { issueToProblems, keyName } from './zodMessages.ts';

/** Result of reading the metadata text: what could be validated, plus positions for later messages. */
export interface MetadataResult {
  /** The validated metadata, when it has no problems. */
  readonly meta: CorrelationMeta | undefined;
  /** The data block alone, when it validates even though other keys do not (so the CSV can still be checked). */
  readonly dataColumns: DataColumns | undefined;
  /**
   * The fit block as far as it is valid (lenientFitSettings), when the metadata has errors: the data are still
   * checked against it, so that one run reports every problem. Undefined when the metadata is valid (use meta.fit).
   */
  readonly partialFit: FitSettings | undefined;
  readonly diagnostics: Diagnostic[];
  /** Position of a value (or, when absent, its nearest ancestor key) in the metadata file. */
  readonly valueAt: (path: readonly (string | number)[]) => Position;
}

/** First line of a YAML parser message, without its own "at line …" suffix. */
function yamlMessage(message: string): string {
  const first = message.split('\n')[0] ?? message;
  return first.replace(/ at line \d+, column \d+:?$/, '').replace(/\.$/, '');
}

/**
 * Most alias expansions a metadata file may make (the yaml library's `maxAliasCount`): enough for any real reuse
 * of an anchor, and it stops a file of nested aliases (a "billion laughs") from exhausting memory.
 */
const MAX_ALIAS_COUNT = 100;

/** Line and column of the first alias in the document. */
function firstAliasPosition(document: Document, lineCounter: LineCounter): Position {
  let offset = 0;
  visit(document, {
    Alias(_key, node) {
      if (isAlias(node) && node.range) offset = node.range[0];
      return visit.BREAK;
    },
  });
  const { line, col } = lineCounter.linePos(offset);
  return { line, column: col };
}

/**
 * Parse YAML text (BOM already removed) and validate it against the metadata schema.
 * @param displayPath path printed in messages
 */
export function readMetadata(text: string, displayPath: string): MetadataResult {
  const lineCounter = new LineCounter();
  const document: Document = parseDocument(text, { lineCounter, prettyErrors: false, uniqueKeys: true });
  const valueAt = (path: readonly (string | number)[]): Position => valuePosition(document, lineCounter, path);
  const diagnostics: Diagnostic[] = [];

  for (const problem of [...document.errors, ...document.warnings]) {
    const { line, col } = lineCounter.linePos(problem.pos[0]);
    const isError = problem.name === 'YAMLParseError';
    const make = isError ? error : warning;
    let message = yamlMessage(problem.message);
    if (problem.code === 'DUPLICATE_KEY') {
      const key = /^\s*([^:#]+?)\s*:/.exec(text.slice(problem.pos[0]))?.[1];
      if (key !== undefined) message = `key '${key}' appears twice in the same block`;
    }
    diagnostics.push(make(displayPath, { line, column: col }, `YAML ${isError ? 'syntax error' : 'warning'}: ${message}`));
  }
  if (document.errors.length > 0) return { meta: undefined, dataColumns: undefined, partialFit: undefined, diagnostics, valueAt };

  // Template placeholders must not reach a published page: the first one is an error, the count says how many.
  const placeholderLines = text
    .split(/\r\n|\n|\r/)
    .map((line, index) => (/\bTODO\b/.test(line.replace(/#.*$/, '')) ? index + 1 : 0))
    .filter((line) => line > 0);
  if (placeholderLines.length > 0) {
    const count = placeholderLines.length;
    diagnostics.push(
      error(displayPath, { line: placeholderLines[0]! }, `metadata still holds ${count} TODO placeholder${count === 1 ? '' : 's'}, the first on this line`, 'replace every TODO value'),
    );
  }

  let raw: unknown;
  try {
    raw = document.toJS({ maxAliasCount: MAX_ALIAS_COUNT });
  } catch (caught) {
    // yaml throws a ReferenceError when aliases expand past maxAliasCount (a "billion laughs" file).
    if (!(caught instanceof ReferenceError)) throw caught;
    diagnostics.push(
      error(displayPath, firstAliasPosition(document, lineCounter), `YAML aliases (*name) expand to too much data: more than ${MAX_ALIAS_COUNT} copies`, 'write the values out instead of repeating anchors'),
    );
    return { meta: undefined, dataColumns: undefined, partialFit: undefined, diagnostics, valueAt };
  }
  if (raw === null || typeof raw !== 'object' || Array.isArray(raw)) {
    diagnostics.push(
      error(displayPath, { line: 1, column: 1 }, 'metadata must be a block of keys such as title, property, variable', "run 'correlary new <slug>' for a commented template"),
    );
    return { meta: undefined, dataColumns: undefined, partialFit: undefined, diagnostics, valueAt };
  }

  const parsed = correlationMetaSchema.safeParse(raw);
  if (parsed.success) return { meta: parsed.data, dataColumns: parsed.data.data, partialFit: undefined, diagnostics, valueAt };

  const problems = parsed.error.issues.flatMap((issue) => issueToProblems(correlationMetaSchema, issue));
  // zod skips a block's rules across fields when one of its fields is wrong: run them on the valid fields, so a
  // fixed order without a reason is reported in the same run as a misspelt key (each problem once).
  const rawFit = (raw as Record<string, unknown>)['fit'];
  const partialFit = lenientFitSettings(rawFit);
  const dataBlock = dataColumnsSchema.safeParse((raw as Record<string, unknown>)['data']);
  const ruleProblems = [
    ...fitOptionRules(partialFit).map((problem) => ({ ...problem, path: ['fit', ...problem.path] })),
    ...(dataBlock.success ? metaRules({ fit: partialFit, data: dataBlock.data }) : []),
  ];
  const reported = new Set(problems.map((problem) => `${keyName(problem.path)}|${problem.message}`));
  for (const rule of ruleProblems) {
    const message = `'${keyName(rule.path)}' ${rule.message}`;
    const key = `${keyName(rule.path)}|${message}`;
    if (reported.has(key)) continue;
    reported.add(key);
    problems.push({ path: rule.path, atKey: false, message });
  }
  // A misspelt required key gives "unknown key 'nam'" and "missing required key 'name'": keep only the first.
  const typoTargets = new Set(problems.filter((problem) => problem.typoOf !== undefined).map((problem) => problem.typoOf));
  for (const problem of problems) {
    if (problem.missing !== undefined && typoTargets.has(problem.missing)) continue;
    const position = problem.atKey ? keyPosition(document, lineCounter, problem.path) : valueAt(problem.path);
    diagnostics.push(error(displayPath, position, problem.message, problem.hint));
  }
  return { meta: undefined, dataColumns: dataBlock.success ? dataBlock.data : undefined, partialFit, diagnostics, valueAt };
}
