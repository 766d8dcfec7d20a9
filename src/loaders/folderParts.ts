/**
 * The build's own parts of a correlation's folder (src/loaders/correlationFolder.ts), kept in one file beside the
 * downloads instead of a file each: the page parts, the page's table markup, the handbook.json record, the property
 * curve and the digest the folder was written from. They are never published (the name starts with a dot).
 *
 * Why one file: creating a file is the costly part of writing a folder. In a CPU profile of the N = 1000 cold build
 * the files worker spent 2.5 s of its 7.4 s in `open`, and `perf` put most of the kernel's time in ext4's search
 * for a free inode (find_inode_bit, recently_deleted); the five internal files were a third of those creations.
 *
 * Layout: one header line of JSON, `{"digest":"…","parts":[["name",bytes],…]}`, then the parts' bytes one after
 * another in that order. A file cut short (a build stopped while writing it) is shorter than its header says and
 * counts as absent, so its folder is written again; nothing else marks a folder complete, and it is written last.
 */
import { closeSync, fstatSync, openSync, readSync } from 'node:fs';

/** The file's name in each folder. */
export const PARTS_FILE = '.parts';

/** How many bytes are read first: the header is a few hundred bytes. */
const FIRST_READ = 4096;

interface Header {
  readonly digest: string;
  /** name → [offset from the file's start, length], in bytes */
  readonly parts: ReadonlyMap<string, readonly [number, number]>;
}

/**
 * The bytes of a parts file holding `parts` and `digest`.
 * @example partsFileBytes('ab12', [{ file: '.page.json', text: '{}' }]).toString() // => '{"digest":"ab12","parts":[[".page.json",2]]}\n{}'
 */
export function partsFileBytes(digest: string, parts: readonly { file: string; text: string }[]): Buffer {
  const bodies = parts.map((part) => Buffer.from(part.text, 'utf8'));
  const header = Buffer.from(`${JSON.stringify({ digest, parts: parts.map((part, at) => [part.file, bodies[at]!.length]) })}\n`, 'utf8');
  return Buffer.concat([header, ...bodies]);
}

/** The header of an open parts file, or undefined when it is not one or is shorter than its header says. */
function readHeader(fd: number): Header | undefined {
  const first = Buffer.allocUnsafe(FIRST_READ);
  let read = readSync(fd, first, 0, FIRST_READ, 0);
  let head = first.subarray(0, read);
  let end = head.indexOf(10);
  if (end < 0 && read === FIRST_READ) {
    // A longer header than expected (many parts, long names): read on to its end.
    const size = fstatSync(fd).size;
    const whole = Buffer.allocUnsafe(size);
    read = readSync(fd, whole, 0, size, 0);
    head = whole.subarray(0, read);
    end = head.indexOf(10);
  }
  if (end < 0) return undefined;
  let parsed: { digest?: unknown; parts?: unknown };
  try {
    parsed = JSON.parse(head.toString('utf8', 0, end)) as typeof parsed;
  } catch {
    return undefined;
  }
  if (typeof parsed.digest !== 'string' || !Array.isArray(parsed.parts)) return undefined;
  const parts = new Map<string, [number, number]>();
  let offset = end + 1;
  for (const part of parsed.parts as unknown[]) {
    if (!Array.isArray(part) || typeof part[0] !== 'string' || !Number.isSafeInteger(part[1]) || (part[1] as number) < 0) return undefined;
    parts.set(part[0], [offset, part[1] as number]);
    offset += part[1] as number;
  }
  if (fstatSync(fd).size !== offset) return undefined;
  return { digest: parsed.digest, parts };
}

/** Run `use` on the open file at `file`, or give undefined when it cannot be opened. */
function withFile<T>(file: string, use: (fd: number) => T | undefined): T | undefined {
  let fd: number;
  try {
    fd = openSync(file, 'r');
  } catch {
    return undefined;
  }
  try {
    return use(fd);
  } finally {
    closeSync(fd);
  }
}

/**
 * The digest a complete parts file was written from, or undefined (no file, cut short, or not a parts file).
 * @example partsDigest('.astro/correlary-files/water-cp/.parts') // => 'ab12…'
 */
export function partsDigest(file: string): string | undefined {
  return withFile(file, (fd) => readHeader(fd)?.digest);
}

/**
 * The bytes of one part of a complete parts file, or undefined when the file or the part is not there.
 * @example readPart('.astro/correlary-files/water-cp/.parts', '.page.json')?.length // => 88929
 */
export function readPart(file: string, name: string): Buffer | undefined {
  return withFile(file, (fd) => {
    const where = readHeader(fd)?.parts.get(name);
    if (where === undefined) return undefined;
    const [offset, length] = where;
    const bytes = Buffer.allocUnsafe(length);
    let done = 0;
    while (done < length) {
      const read = readSync(fd, bytes, done, length - done, offset + done);
      if (read === 0) return undefined;
      done += read;
    }
    return bytes;
  });
}
