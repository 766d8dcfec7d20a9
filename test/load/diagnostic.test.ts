import { describe, expect, it } from 'vitest';
import { error, formatDiagnostic, oneLine } from '../../src/load/diagnostic.ts';

// Expected strings written by hand from the escaping rule in src/load/diagnostic.ts.
describe('oneLine', () => {
  it('oneLine(text) escapes line breaks, tabs and other control characters', () => {
    expect(oneLine("non-numeric value '\r\n,'")).toBe("non-numeric value '\\r\\n,'");
    expect(oneLine('a\tb\u0000c\u007f')).toBe('a\\tb\\u0000c\\u007f');
    expect(oneLine('plain ü text')).toBe('plain ü text');
  });

  it('formatDiagnostic(error(…)) stays on one line when the message quotes a cell with a line break', () => {
    const line = formatDiagnostic(error('liquid-a/data.csv', { line: 3, column: 1 }, "non-numeric value '\n,' in column 'T'", 'hint\nmore'));
    expect(line).toBe("liquid-a/data.csv:3:1: non-numeric value '\\n,' in column 'T'; hint\\nmore");
    expect(line.includes('\n')).toBe(false);
  });
});
