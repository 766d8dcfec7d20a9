/**
 * handbook.json joined from pieces (handbookJsonBytes, handbookEntryText, handbookEntryFile): the bytes must be
 * exactly `${JSON.stringify(handbookJson(…), null, 2)}\n` (JSON.stringify over the whole export is the outside
 * reference, the way the route wrote it before). Checked on every correlation of the demo handbook, the heads made
 * from the coefficients.json download as a files worker does, and on random JSON records (fast-check) with strings
 * holding line ends, quotes, separators and non-ASCII text, and empty and nested arrays and objects.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { correlationDownloads } from '../../src/components/lib/correlationDownloads.ts';
import { correlationFiles } from '../../src/components/lib/correlationFiles.ts';
import { entryRecord } from '../../src/components/lib/entryRecord.ts';
import { handbookEntryFile, handbookEntryIdentity } from '../../src/components/lib/handbookEntryFile.ts';
import { handbookEntryHead, handbookEntryTail } from '../../src/components/lib/handbookEntryText.ts';
import { handbookJsonBytes } from '../../src/components/lib/handbookJsonBytes.ts';
import { identityOf } from '../../src/components/lib/identityOf.ts';
import { handbookJson, type HandbookIdentity } from '../../src/export/index.ts';
import type { CorrelationEntry } from '../../src/schema/index.ts';
import { demoEntriesForSuite } from '../helpers/demoEntries.ts';

const settings = { title: 'Test "handbook" <x>', organisation: 'Org ≤ & co', notice: 'Line one\nline two', url: 'https://handbook.example.org' };
const base = '/hb/';
const top = (correlations: Parameters<typeof handbookJson>[0]['correlations']) =>
  handbookJson({ generator: { name: 'correlary', version: '0.0.0' }, handbook: { title: settings.title, organisation: settings.organisation, url: 'https://handbook.example.org/hb/', basePath: base, notice: settings.notice }, correlations });

const entries = demoEntriesForSuite('handbook-json');

describe('handbookJsonBytes', () => {
  it('joins the demo handbook from the files a files worker writes into the bytes of JSON.stringify over the whole export', () => {
    expect(entries().length).toBeGreaterThan(10);
    const identity = (entry: CorrelationEntry): HandbookIdentity => identityOf(entry.slug, settings as never, base, undefined);
    const expected = `${JSON.stringify(
      top(entries().map((entry) => ({ record: entryRecord(entry, identity(entry)), url: `${base}correlations/${entry.slug}/`, downloads: correlationDownloads(entry, base) }))),
      null,
      2,
    )}\n`;
    const pieces = entries().map((entry) => {
      const coefficients = correlationFiles(entry, identity(entry)).find((file) => file.file === 'coefficients.json')!.text;
      const written = Buffer.from(handbookEntryFile(coefficients, identity(entry)));
      const line = written.indexOf(10);
      // The identity line is what the route compares with the identity it would give the record.
      expect(written.toString('utf8', 0, line)).toBe(handbookEntryIdentity(identity(entry)));
      return [written.subarray(line + 1), handbookEntryTail(`${base}correlations/${entry.slug}/`, correlationDownloads(entry, base))] as const;
    });
    expect(Buffer.from(handbookJsonBytes(JSON.stringify(top([]), null, 2), pieces)).toString('utf8')).toBe(expected);
  });

  it('gives the bytes of JSON.stringify for random records, heads as text or bytes, and for no correlation', () => {
    const text = fc.string({ unit: fc.constantFrom('a', 'Z', ' ', '\n', '\r', '"', '\\', '\u2028', '≤', '−', '😀', '{', '}', '[', ']', ',', ':') });
    const value = fc.letrec((tie) => ({
      leaf: fc.oneof(text, fc.double({ noNaN: true, noDefaultInfinity: true }), fc.boolean(), fc.constant(null)),
      node: fc.oneof({ depthSize: 'small' }, tie('leaf'), fc.array(tie('node'), { maxLength: 3 }), fc.dictionary(text, tie('node'), { maxKeys: 3 })),
    })).node;
    const record = fc.dictionary(fc.string({ minLength: 1 }).filter((key) => key !== 'url' && key !== 'downloads' && key !== '__proto__'), value, { minKeys: 1, maxKeys: 5 });
    const item = fc.record({ record: record, url: text, downloads: fc.dictionary(fc.string().filter((key) => key !== '__proto__'), text, { maxKeys: 4 }), bytes: fc.boolean() });
    fc.assert(
      fc.property(fc.array(item, { maxLength: 4 }), (items) => {
        const expected = `${JSON.stringify(top(items.map(({ record, url, downloads }) => ({ record: record as never, url, downloads }))), null, 2)}\n`;
        const pieces = items.map(({ record, url, downloads, bytes }) => {
          const head = handbookEntryHead(JSON.stringify(record, null, 2));
          return [bytes ? Buffer.from(head) : head, handbookEntryTail(url, downloads)] as const;
        });
        expect(Buffer.from(handbookJsonBytes(JSON.stringify(top([]), null, 2), pieces)).toString('utf8')).toBe(expected);
      }),
      { numRuns: 300 },
    );
  });
});
