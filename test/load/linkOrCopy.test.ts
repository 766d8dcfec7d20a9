/**
 * linkOrCopy and copyCorrelationFiles: the output gets hard links to the cache's files, or copies where linking
 * fails, and a later build that rewrites the cache never changes a file already in an earlier output.
 * Expected link counts and inode equality are POSIX hard-link semantics (common practice: link(2), stat(2)).
 */
import { mkdirSync, mkdtempSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { linkOrCopy } from '../../src/loaders/linkOrCopy.ts';
import { copyCorrelationFiles } from '../../src/loaders/correlationFiles.ts';
import { PARTS_FILE, partsFileBytes } from '../../src/loaders/folderParts.ts';

const made: string[] = [];
function folder(prefix: string, base = tmpdir()): string {
  const dir = mkdtempSync(path.join(base, prefix));
  made.push(dir);
  return dir;
}
afterEach(() => {
  for (const dir of made.splice(0)) rmSync(dir, { recursive: true, force: true });
});

/** A cache folder as writeCorrelationFiles leaves it: <slug>/ files, a parts file, the manifest. */
function cacheWith(files: Record<string, Record<string, string>>): string {
  const cache = folder('correlary-link-cache-');
  for (const [slug, byName] of Object.entries(files)) {
    mkdirSync(path.join(cache, slug));
    for (const [name, text] of Object.entries(byName)) writeFileSync(path.join(cache, slug, name), text);
    writeFileSync(path.join(cache, slug, PARTS_FILE), partsFileBytes('digest', [{ file: '.page.json', text: '{}' }]));
  }
  writeFileSync(path.join(cache, 'manifest.json'), JSON.stringify({ slugs: Object.keys(files).sort() }));
  return cache;
}

const cannotLink = (code: string) => async () => {
  throw Object.assign(new Error(`${code}: cannot link`), { code });
};

describe('linkOrCopy()', () => {
  it('links on the same file system: the target is the same inode, with two links', async () => {
    const cache = cacheWith({ a: { 'plot.svg': '<svg/>' } });
    const out = folder('correlary-link-out-');
    const target = path.join(out, 'plot.svg');
    expect(await linkOrCopy(path.join(cache, 'a', 'plot.svg'), target)).toBe('linked');
    expect(statSync(target).ino).toBe(statSync(path.join(cache, 'a', 'plot.svg')).ino);
    expect(statSync(target).nlink).toBe(2);
  });

  it('copies when the link fails with EXDEV (another device) or EPERM (no hard links), replacing an existing target', async () => {
    const cache = cacheWith({ a: { 'data.csv': 'x,y\n1,2\n' } });
    const out = folder('correlary-link-out-');
    const target = path.join(out, 'data.csv');
    writeFileSync(target, 'old bytes');
    for (const code of ['EXDEV', 'EPERM']) {
      expect(await linkOrCopy(path.join(cache, 'a', 'data.csv'), target, { link: cannotLink(code) })).toBe('copied');
      expect(readFileSync(target, 'utf8')).toBe('x,y\n1,2\n');
      expect(statSync(target).ino).not.toBe(statSync(path.join(cache, 'a', 'data.csv')).ino);
    }
  });

  it('copies across real devices when the machine has a separate tmpfs (/dev/shm)', async (context) => {
    let shm: string;
    try {
      shm = folder('correlary-link-shm-', '/dev/shm');
    } catch {
      return context.skip();
    }
    const cache = cacheWith({ a: { 'x.py': 'print(1)\n' } });
    if (statSync(shm).dev === statSync(cache).dev) return context.skip();
    const target = path.join(shm, 'x.py');
    expect(await linkOrCopy(path.join(cache, 'a', 'x.py'), target)).toBe('copied');
    expect(readFileSync(target, 'utf8')).toBe('print(1)\n');
  });

  it('replaces an existing target rather than writing into it (it may be linked to another file)', async () => {
    const cache = cacheWith({ a: { 'new.txt': 'new', 'old.txt': 'old' } });
    const out = folder('correlary-link-out-');
    const target = path.join(out, 'f.txt');
    await linkOrCopy(path.join(cache, 'a', 'old.txt'), target);
    expect(await linkOrCopy(path.join(cache, 'a', 'new.txt'), target)).toBe('linked');
    expect(readFileSync(target, 'utf8')).toBe('new');
    expect(readFileSync(path.join(cache, 'a', 'old.txt'), 'utf8')).toBe('old');
    expect(await linkOrCopy(path.join(cache, 'a', 'new.txt'), target, { copy: true })).toBe('copied');
    expect(readFileSync(path.join(cache, 'a', 'new.txt'), 'utf8')).toBe('new');
  });

  it('passes on an error that is not about linking (a missing source)', async () => {
    const out = folder('correlary-link-out-');
    await expect(linkOrCopy(path.join(out, 'missing'), path.join(out, 'target'))).rejects.toMatchObject({ code: 'ENOENT' });
  });
});

describe('copyCorrelationFiles()', () => {
  const files = { a: { 'coefficients.json': '{"a":1}\n', 'plot.svg': '<svg>a</svg>' }, b: { 'data.csv': 'x\n1\n' } };

  it('links every file but the parts file into correlations/<slug>/', async () => {
    const cache = cacheWith(files);
    const out = folder('correlary-link-out-');
    expect(await copyCorrelationFiles(cache, out)).toEqual({ files: 3, copied: 0 });
    expect(statSync(path.join(out, 'correlations', 'a', 'plot.svg')).ino).toBe(statSync(path.join(cache, 'a', 'plot.svg')).ino);
    expect(() => statSync(path.join(out, 'correlations', 'a', PARTS_FILE))).toThrow();
  });

  it('copies every file when linking fails, with the same bytes', async () => {
    const cache = cacheWith(files);
    const out = folder('correlary-link-out-');
    let tries = 0;
    const failing = async () => {
      tries++;
      throw Object.assign(new Error('EXDEV'), { code: 'EXDEV' });
    };
    expect(await copyCorrelationFiles(cache, out, failing)).toEqual({ files: 3, copied: 3 });
    // After the first folder fails to link, the next is copied without trying.
    expect(tries).toBe(2);
    expect(readFileSync(path.join(out, 'correlations', 'b', 'data.csv'), 'utf8')).toBe('x\n1\n');
    expect(statSync(path.join(out, 'correlations', 'b', 'data.csv')).nlink).toBe(1);
  });
});
