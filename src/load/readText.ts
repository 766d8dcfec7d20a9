/**
 * Read a user's text file without changing it: size limit first, then UTF-8 decoding with the BOM removed.
 * A BOM and CRLF line ends are accepted as they are; nothing is ever written back.
 */
import type { Stats } from 'node:fs';
import { readFileSync } from 'node:fs';
import { stat } from 'node:fs/promises';
import { error, type Diagnostic } from './diagnostic.ts';
import { formatBytes } from './limits.ts';

/** `bytes` is the file as read (what the folder records are keyed by, src/load/folderRecord.ts). */
export type ReadTextResult = { ok: true; text: string; bytes: Buffer } | { ok: false; diagnostic: Diagnostic };

/**
 * Read `absolutePath` as UTF-8 text when it is at most `limitBytes` long; `displayPath` names it in messages.
 * `known` are the file's stats when the caller has them (resolveDataFile), so that they are not asked for again.
 */
export async function readText(absolutePath: string, displayPath: string, limitBytes: number, known?: Stats): Promise<ReadTextResult> {
  const info = known ?? (await stat(absolutePath));
  if (!info.isFile()) {
    return { ok: false, diagnostic: error(displayPath, { line: 0 }, 'is not a regular file') };
  }
  if (info.size > limitBytes) {
    return {
      ok: false,
      diagnostic: error(
        displayPath,
        { line: 0 },
        `file is ${info.size} bytes, over the ${formatBytes(limitBytes)} limit`,
        'split the data or thin it before adding it to the handbook',
      ),
    };
  }
  // Decoded as readFile(path, 'utf8') decodes (the same UTF-8 decoder), keeping the bytes.
  // Read synchronously: a file within the size limit is read in one call, at a fraction of the CPU of the
  // promise-based read's four round trips (open, stat, read, close); the stat above keeps a wait between folders.
  const bytes = readFileSync(absolutePath);
  const text = bytes.toString('utf8');
  return { ok: true, text: text.charCodeAt(0) === 0xfeff ? text.slice(1) : text, bytes };
}
