/**
 * spreadsheetSafeText: the cell starts that spreadsheets read as formulas (=, +, -, @, tab, carriage return) are
 * from the OWASP "CSV Injection" page (common practice); numbers are left as numbers.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { spreadsheetSafeText } from '../../src/export/spreadsheetSafeText.ts';

describe('spreadsheetSafeText', () => {
  it.each([
    ['=1+1', "'=1+1"],
    ['+cmd|/C calc!A0', "'+cmd|/C calc!A0"],
    ['-2+3', "'-2+3"],
    ['@SUM(A1:A2)', "'@SUM(A1:A2)"],
    ['\t=1', "'\t=1"],
    ['\r=1', "'\r=1"],
    [' =HYPERLINK("x")', " '=HYPERLINK(\"x\")"],
    ['"=1+1"', "\"'=1+1\""],
  ])('spreadsheetSafeText(%j) puts an apostrophe before the formula start', (cell, expected) => {
    expect(spreadsheetSafeText(cell)).toBe(expected);
  });

  it.each(['-1.25e-3', '+4', '0.5', '-.5', '1E+10', 'plain text', 'a = b', '', '# comment'])('spreadsheetSafeText(%j) leaves numbers and ordinary text alone', (cell) => {
    expect(spreadsheetSafeText(cell)).toBe(cell);
  });

  it('spreadsheetSafeText(any text) never starts a formula and only ever adds one apostrophe', () => {
    fc.assert(
      fc.property(fc.string({ unit: fc.constantFrom('=', '+', '-', '@', '\t', '\r', ' ', '"', 'a', '1', '.', 'e') }), (cell) => {
        const safe = spreadsheetSafeText(cell);
        const isNumber = /^\s*[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?\s*$/.test(cell);
        if (!isNumber) expect(safe.replace(/^[ ]*"?[ ]*/, '')).not.toMatch(/^[=+\-@\t\r]/);
        expect(safe.length - cell.length).toBeLessThanOrEqual(1);
        if (safe !== cell) expect(safe.replace(/^([ ]*"?[ ]*)'/, '$1')).toBe(cell);
      }),
    );
  });
});
