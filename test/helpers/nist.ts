/**
 * Access to the NIST StRD linear least-squares fixtures (test/fixtures/nist-strd, copied from NIST's public-domain
 * Statistical Reference Datasets; see SOURCE.md there).
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

export const NIST_DIR = fileURLToPath(new URL('../fixtures/nist-strd/', import.meta.url));

interface CertifiedNumber {
  readonly text: string;
  readonly value: number | null;
}

export interface NistDataset {
  readonly file: string;
  readonly model: { readonly degree: number; readonly intercept: boolean; readonly kind: string };
  readonly observations: number;
  readonly certified: {
    readonly parameters: readonly { readonly name: string; readonly estimate: CertifiedNumber; readonly standardDeviation: CertifiedNumber }[];
    readonly residualStandardDeviation: CertifiedNumber;
    readonly rSquared: CertifiedNumber;
  };
  readonly data: { readonly x: readonly number[]; readonly y: readonly number[] };
}

export const nistDatasets: Record<string, NistDataset> = JSON.parse(readFileSync(`${NIST_DIR}certified.json`, 'utf8')).datasets;

/** The data block of a NIST .dat file (columns y x after the `Data:` line) as a CSV text with header "y,x". */
export function nistDatToCsv(name: string): string {
  const text = readFileSync(`${NIST_DIR}${nistDatasets[name]!.file}`, 'utf8');
  const lines = text.split('\n');
  const start = lines.findIndex((line) => /^Data:\s+y\s+x\s*$/.test(line.trim()));
  const rows = lines
    .slice(start + 1)
    .map((line) => line.trim().split(/\s+/))
    .filter((cells) => cells.length === 2 && cells.every((cell) => cell !== ''));
  return `y,x\n${rows.map(([y, x]) => `${y},${x}`).join('\n')}\n`;
}

/** Power of x that NIST's parameter name Bk multiplies. */
export function powerOf(name: string): number {
  return Number(name.slice(1));
}
