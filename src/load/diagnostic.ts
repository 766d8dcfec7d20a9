/**
 * User-facing messages: one problem in one file, printed as `path:line:column: problem; hint`.
 * Warnings print `warning: ` before the problem. When no line applies (a missing folder file), the line is 0 and
 * the message prints as `path: problem`.
 */
import type { Diagnostic } from '../schema/index.ts';

export type { Diagnostic };

/** Where in a file a problem sits. */
export interface Position {
  readonly line: number;
  readonly column?: number | undefined;
}

/** Build an error diagnostic. */
export function error(file: string, position: Position, message: string, hint?: string): Diagnostic {
  return make('error', file, position, message, hint);
}

/** Build a warning diagnostic. */
export function warning(file: string, position: Position, message: string, hint?: string): Diagnostic {
  return make('warning', file, position, message, hint);
}

function make(
  severity: Diagnostic['severity'],
  file: string,
  position: Position,
  message: string,
  hint: string | undefined,
): Diagnostic {
  const diagnostic: Diagnostic = { severity, file, line: position.line, message: oneLine(message) };
  if (position.column !== undefined) diagnostic.column = position.column;
  if (hint !== undefined) diagnostic.hint = oneLine(hint);
  return diagnostic;
}

const CONTROL_ESCAPES: Record<string, string> = { '\n': '\\n', '\r': '\\r', '\t': '\\t' };

/**
 * A message quotes what the user wrote, and a quoted CSV cell may hold line breaks or other control characters:
 * they are shown escaped (`\r\n`, `\u0000`) so that every problem stays on one line of the report.
 * @example oneLine("non-numeric value '\r\n,'") // => "non-numeric value '\\r\\n,'"
 */
export function oneLine(text: string): string {
  return text.replace(/[\u0000-\u001f\u007f]/g, (character) => CONTROL_ESCAPES[character] ?? `\\u${character.charCodeAt(0).toString(16).padStart(4, '0')}`);
}

/**
 * Format one diagnostic as a single line.
 * @example formatDiagnostic(error('content/a/data.csv', { line: 4, column: 5 }, "empty cell in column 'cp'"))
 * // => "content/a/data.csv:4:5: empty cell in column 'cp'"
 */
export function formatDiagnostic(diagnostic: Diagnostic): string {
  let where = diagnostic.file;
  if (diagnostic.line > 0) {
    where += `:${diagnostic.line}`;
    if (diagnostic.column !== undefined) where += `:${diagnostic.column}`;
  }
  const severity = diagnostic.severity === 'warning' ? 'warning: ' : '';
  const hint = diagnostic.hint === undefined ? '' : `; ${diagnostic.hint}`;
  return `${where}: ${severity}${diagnostic.message}${hint}`;
}

/** Sort by file, then line, then column, keeping the original order for ties. */
export function sortDiagnostics(diagnostics: readonly Diagnostic[]): Diagnostic[] {
  return diagnostics
    .map((diagnostic, index) => ({ diagnostic, index }))
    .sort(
      (a, b) =>
        (a.diagnostic.file < b.diagnostic.file ? -1 : a.diagnostic.file > b.diagnostic.file ? 1 : 0) ||
        a.diagnostic.line - b.diagnostic.line ||
        (a.diagnostic.column ?? 0) - (b.diagnostic.column ?? 0) ||
        a.index - b.index,
    )
    .map((entry) => entry.diagnostic);
}

/** True when any diagnostic is an error. */
export function hasErrors(diagnostics: readonly Diagnostic[]): boolean {
  return diagnostics.some((diagnostic) => diagnostic.severity === 'error');
}
