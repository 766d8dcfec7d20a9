/**
 * Size limits for files in a correlation folder. They keep a stray export (a whole logger dump, a binary saved
 * as .csv) from stalling the build; real handbook data are far smaller.
 *
 * - data file: 4 MiB, about 100 000 rows of three numbers; the largest demo file is under 100 KiB.
 * - metadata file: 256 KiB; a full metadata file is about 2 KiB.
 */
export const DATA_FILE_LIMIT_BYTES = 4 * 1024 * 1024;
export const METADATA_FILE_LIMIT_BYTES = 256 * 1024;

/** Most messages printed for one file; the rest are counted in one closing line. */
export const MESSAGES_PER_FILE = 50;

/** Fewest points a correlation can be fitted from (a straight line with one residual degree of freedom). */
export const MINIMUM_POINTS = 3;

/** Format a byte count for messages, e.g. 4194304 → "4 MiB". */
export function formatBytes(bytes: number): string {
  if (bytes >= 1024 * 1024) return `${+(bytes / (1024 * 1024)).toFixed(1)} MiB`;
  if (bytes >= 1024) return `${+(bytes / 1024).toFixed(1)} KiB`;
  return `${bytes} B`;
}
