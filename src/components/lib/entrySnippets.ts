/**
 * The code snippets of one stored entry (src/export/snippets): kind, file name and text, for the page's code
 * section, the download routes and handbook.json's `downloads`.
 */
import { version } from '../../../package.json';
import {
  cSnippet,
  javascriptSnippet,
  javascriptTypes,
  pythonSnippet,
  snippetIdentifier,
  snippetSource,
  spreadsheetSnippet,
  type CorrelationRecord,
  type HandbookIdentity,
  type SnippetSource,
} from '../../export/index.ts';
import { entryRecord } from './entryRecord.ts';
import { fitOf, type CorrelationEntry } from './entryView.ts';

export interface EntrySnippet {
  /** Kind in handbook.json's downloads: python, javascript, typescript, c, spreadsheet. */
  readonly kind: string;
  readonly label: string;
  readonly file: string;
  readonly contentType: string;
  readonly text: string;
}

/** File names only (cheap): kind → file. */
export function snippetFiles(slug: string): Record<string, string> {
  const name = snippetIdentifier(slug);
  return { python: `${name}.py`, javascript: `${name}.mjs`, typescript: `${name}.d.mts`, c: `${name}.h`, spreadsheet: `${name}.formula.txt` };
}

/**
 * Every snippet of a slug without its text (cheap), in the order of entrySnippets.
 * @example snippetKinds('water-cp')[0] // => { kind: 'python', label: 'Python', file: 'water_cp.py', contentType: 'text/x-python' }
 */
export function snippetKinds(slug: string): Omit<EntrySnippet, 'text'>[] {
  const files = snippetFiles(slug);
  return [
    { kind: 'python', label: 'Python', file: files['python']!, contentType: 'text/x-python' },
    { kind: 'javascript', label: 'JavaScript', file: files['javascript']!, contentType: 'text/javascript' },
    { kind: 'typescript', label: 'TypeScript declarations', file: files['typescript']!, contentType: 'text/plain' },
    { kind: 'c', label: 'C99', file: files['c']!, contentType: 'text/x-c' },
    { kind: 'spreadsheet', label: 'Spreadsheet formula', file: files['spreadsheet']!, contentType: 'text/plain' },
  ];
}

/**
 * @param handbook the handbook identity the snippets' headers carry (handbookIdentity.ts)
 * @param record entryRecord(entry, handbook) when the caller has it already (correlationFiles), so that it is not
 *   built twice
 * @throws Error when the entry has no fit
 */
export function entrySnippets(entry: CorrelationEntry, handbook?: HandbookIdentity, record?: CorrelationRecord): EntrySnippet[] {
  const fit = fitOf(entry);
  if (fit === null) throw new Error(`entrySnippets requires a fit; ${entry.slug} has none`);
  const source = snippetSource(fit, record ?? entryRecord(entry, handbook), `Correlary ${version}`);
  const texts: Record<string, (source: SnippetSource) => string> = {
    python: pythonSnippet,
    javascript: javascriptSnippet,
    typescript: javascriptTypes,
    c: cSnippet,
    spreadsheet: spreadsheetSnippet,
  };
  return snippetKinds(entry.slug).map((kind) => ({ ...kind, text: texts[kind.kind]!(source) }));
}
