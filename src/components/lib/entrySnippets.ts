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
  type HandbookIdentity,
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
 * @param handbook the handbook identity the snippets' headers carry (handbookIdentity.ts)
 * @throws Error when the entry has no fit
 */
export function entrySnippets(entry: CorrelationEntry, handbook?: HandbookIdentity): EntrySnippet[] {
  const fit = fitOf(entry);
  if (fit === null) throw new Error(`entrySnippets requires a fit; ${entry.slug} has none`);
  const source = snippetSource(fit, entryRecord(entry, handbook), `Correlary ${version}`);
  const files = snippetFiles(entry.slug);
  return [
    { kind: 'python', label: 'Python', file: files['python']!, contentType: 'text/x-python', text: pythonSnippet(source) },
    { kind: 'javascript', label: 'JavaScript', file: files['javascript']!, contentType: 'text/javascript', text: javascriptSnippet(source) },
    { kind: 'typescript', label: 'TypeScript declarations', file: files['typescript']!, contentType: 'text/plain', text: javascriptTypes(source) },
    { kind: 'c', label: 'C99', file: files['c']!, contentType: 'text/x-c', text: cSnippet(source) },
    { kind: 'spreadsheet', label: 'Spreadsheet formula', file: files['spreadsheet']!, contentType: 'text/plain', text: spreadsheetSnippet(source) },
  ];
}
