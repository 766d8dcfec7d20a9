/**
 * readCsv: the quote-free path (csv-parse without its per-record info objects, each record's line found by walking
 * the file's lines) gives exactly what csv-parse's own line numbers give (`lineInfo: true`, the reference here),
 * on random comma-separated text with blank lines, comments, spaces, tabs, no-break spaces, quotes and every kind
 * of line end, and on the content fixtures' data files.
 */
import { readFileSync, readdirSync } from 'node:fs';
import path from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { readCsv } from '../../src/load/readCsv.ts';

const FIXTURES = path.join('test', 'fixtures', 'content');
/** Cell texts, separators and the characters csv-parse treats specially. */
const CELLS = ['1', '2.5', '-3e-2', 'x', 'y', 'T', '', ' ', '\t', '\u00a0', '#', '# note', '"', '"a,b"', 'a"b', ';'];
const LINE_ENDS = ['\n', '\r\n', '\r'];
const settings = { numRuns: Number(process.env.FUZZ_RUNS ?? 300), seed: Number(process.env.FUZZ_SEED ?? 20261202), endOnFailure: true } as const;

/** A file: lines of cells joined by commas, each line ended by `ends` (one kind, or each its own). */
const csvText = fc
  .tuple(
    fc.array(fc.array(fc.array(fc.constantFrom(...CELLS), { minLength: 1, maxLength: 2 }), { minLength: 1, maxLength: 4 }), { maxLength: 12 }),
    fc.oneof(fc.constantFrom(...LINE_ENDS).map((end) => () => end), fc.array(fc.constantFrom(...LINE_ENDS), { minLength: 1 }).map((ends) => (i: number) => ends[i % ends.length]!)),
    fc.boolean(),
  )
  .map(([lines, end, last]) => lines.map((cells, i) => `${cells.map((parts) => parts.join('')).join(',')}${i < lines.length - 1 || last ? end(i) : ''}`).join(''));

describe('readCsv', () => {
  it('readCsv(text) gives what readCsv(text, path, { lineInfo: true }) gives on random files', () => {
    fc.assert(
      fc.property(csvText, (text) => {
        expect(readCsv(text, 'data.csv')).toStrictEqual(readCsv(text, 'data.csv', { lineInfo: true }));
      }),
      settings,
    );
  });

  it('readCsv(text) gives what readCsv(text, path, { lineInfo: true }) gives on every fixture data file and on blank lines, comments and CRLF', () => {
    const texts: string[] = [
      'x,y\n1,2\n\n  \n# comment\n  # indented comment\n3, 4 \n\t5\t,6\n',
      '# Source: invented\r\nT,cp\r\n\r\n300,1.5\r\n# mid\r\n310 , 1.6\r\n',
      'x,y\n1,2,3\n4\n',
    ];
    for (const fixture of readdirSync(FIXTURES)) {
      for (const folder of readdirSync(path.join(FIXTURES, fixture))) {
        let names: string[] = [];
        try {
          names = readdirSync(path.join(FIXTURES, fixture, folder)).filter((name) => name.endsWith('.csv'));
        } catch {
          continue; // a loose file
        }
        for (const name of names) {
          try {
            texts.push(readFileSync(path.join(FIXTURES, fixture, folder, name), 'utf8').replace(/^\uFEFF/, ''));
          } catch {
            // a link to a missing file (a fixture of that)
          }
        }
      }
    }
    expect(texts.length).toBeGreaterThan(30);
    for (const text of texts) expect(readCsv(text, 'data.csv')).toStrictEqual(readCsv(text, 'data.csv', { lineInfo: true }));
  });
});
