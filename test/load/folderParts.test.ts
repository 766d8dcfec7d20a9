/**
 * folderParts: the build's own parts of a correlation's folder in one file. Checked against the bytes written
 * (round trip) and against the file cut short, which must count as absent so that the folder is written again
 * (common practice for a file that marks work complete).
 */
import { mkdtempSync, rmSync, truncateSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { partsDigest, partsFileBytes, readPart } from '../../src/loaders/folderParts.ts';

const folder = mkdtempSync(path.join(tmpdir(), 'correlary-parts-'));
afterAll(() => rmSync(folder, { recursive: true, force: true }));

describe('partsFileBytes() / readPart() / partsDigest()', () => {
  it('gives back each part byte for byte, including text outside ASCII, and the digest', () => {
    const parts = [
      { file: '.page.json', text: '{"title":"Dichte ρ in kg/m³ — 20 °C"}' },
      { file: '.empty', text: '' },
      { file: '.page-html.txt', text: '<tr><td>1.5e-3</td></tr>\n<tr><td>−2</td></tr>\n' },
    ];
    const file = path.join(folder, 'round-trip');
    writeFileSync(file, partsFileBytes('d1', parts));
    for (const part of parts) expect(readPart(file, part.file)?.toString('utf8')).toBe(part.text);
    expect(readPart(file, '.missing')).toBeUndefined();
    expect(partsDigest(file)).toBe('d1');
  });

  it('a file cut short, or one that is not a parts file, counts as absent', () => {
    const file = path.join(folder, 'cut');
    const bytes = partsFileBytes('d2', [{ file: '.a', text: 'x'.repeat(100) }]);
    writeFileSync(file, bytes);
    expect(partsDigest(file)).toBe('d2');
    truncateSync(file, bytes.length - 1);
    expect(partsDigest(file)).toBeUndefined();
    expect(readPart(file, '.a')).toBeUndefined();
    writeFileSync(file, 'digest-of-an-older-layout');
    expect(partsDigest(file)).toBeUndefined();
    expect(partsDigest(path.join(folder, 'absent'))).toBeUndefined();
  });

  it('reads a header longer than its first read', () => {
    const parts = Array.from({ length: 300 }, (_, at) => ({ file: `.part-${at}-${'n'.repeat(20)}`, text: `value ${at}` }));
    const file = path.join(folder, 'long-header');
    writeFileSync(file, partsFileBytes('d3', parts));
    expect(partsDigest(file)).toBe('d3');
    expect(readPart(file, parts[299]!.file)?.toString()).toBe('value 299');
  });
});
