/**
 * The history section of every correlation page, for a whole content folder at once: the commits that changed
 * each correlation (date, subject, whether the published coefficients changed) and, for a lapsed approval, what
 * changed since the approved version. Two git processes for the whole folder (gitLog.ts), whatever the number of
 * correlations; past versions are fitted at most once per distinct pair of file versions, and a version equal to
 * the working tree reuses today's fit. Without git, or outside a repository, every history says why it is not
 * available; that is never an error.
 */
import { createHash } from 'node:crypto';
import { readFile } from 'node:fs/promises';
import path from 'node:path';
import type { FittedDataset } from '../fitHandbook.ts';
import { correlationAtVersion, type FittedVersion } from './correlationAtVersion.ts';
import { gitLog, readBlobs } from './gitLog.ts';
import { whatChanged, type WhatChanged } from './whatChanged.ts';

/** Versions of one correlation examined, newest first (older commits are counted, not shown). */
export const HISTORY_VERSIONS = 20;

export interface HistoryRow {
  /** Abbreviated commit hash (12 hex digits). */
  readonly commit: string;
  /** Commit date, YYYY-MM-DD. */
  readonly date: string;
  readonly subject: string;
  /**
   * `added` (first version), `changed` or `unchanged` (the printed coefficients or order compared with the
   * version before), `removed` (the folder was deleted), or `unknown` (a version that does not validate or fit).
   */
  readonly coefficients: 'added' | 'changed' | 'unchanged' | 'removed' | 'unknown';
  /** Fingerprint of this version, when it could be fitted. */
  readonly fingerprint: string | null;
}

export type SinceApproval =
  | { readonly found: true; readonly commit: string; readonly date: string; readonly changes: WhatChanged }
  | { readonly found: false };

export type CorrelationHistory =
  | { readonly available: false; readonly reason: string }
  | {
      readonly available: true;
      readonly rows: readonly HistoryRow[];
      /** Older commits not examined. */
      readonly older: number;
      /** The files on disk differ from the last committed version (or were never committed). */
      readonly uncommitted: boolean;
      /** For a lapsed approval: what changed since the version whose fingerprint was approved. */
      readonly sinceApproval: SinceApproval | null;
    };

/** Git's id of a file's contents (SHA-1 of "blob <size>\0" and the bytes), to compare the working tree with commits. */
function blobId(bytes: Buffer): string {
  return createHash('sha1').update(`blob ${bytes.length}\0`).update(bytes).digest('hex');
}

interface Snapshot {
  readonly hash: string;
  readonly date: string;
  readonly subject: string;
  /** Files of the folder at this commit: path inside the folder → blob id. Empty when the folder was removed. */
  readonly files: ReadonlyMap<string, string>;
}

/**
 * @param directory the content folder (as given to fitHandbook)
 * @example (await handbookHistory('content', handbook.datasets)).get('corvane-12-density')?.available // => true in a clone
 */
export async function handbookHistory(directory: string, datasets: readonly FittedDataset[]): Promise<Map<string, CorrelationHistory>> {
  const histories = new Map<string, CorrelationHistory>();
  const log = await gitLog(directory);
  if (!log.available) {
    for (const { dataset } of datasets) histories.set(dataset.slug, { available: false, reason: log.reason });
    return histories;
  }

  // Replay the commits oldest first, keeping each folder's files, and snapshot every folder a commit touched.
  const folderFiles = new Map<string, Map<string, string>>();
  const snapshots = new Map<string, Snapshot[]>();
  for (const commit of [...log.commits].reverse()) {
    const touched = new Set<string>();
    for (const change of commit.changes) {
      const [folder, ...rest] = change.path.split('/');
      if (rest.length === 0 || folder === undefined) continue;
      const files = folderFiles.get(folder) ?? new Map<string, string>();
      if (change.blob === undefined) files.delete(rest.join('/'));
      else files.set(rest.join('/'), change.blob);
      folderFiles.set(folder, files);
      touched.add(folder);
    }
    for (const folder of touched) {
      const list = snapshots.get(folder) ?? [];
      list.push({ hash: commit.hash, date: commit.date, subject: commit.subject, files: new Map(folderFiles.get(folder)) });
      snapshots.set(folder, list);
    }
  }

  // The versions to examine, newest first, and every blob they need, read in one go.
  const plans = datasets.map((item) => {
    const folder = path.relative(directory, item.dataset.folder).split(path.sep).join('/');
    const all = [...(snapshots.get(folder) ?? [])].reverse();
    return { item, all, examined: all.slice(0, HISTORY_VERSIONS + 1) };
  });
  const blobs = await readBlobs(directory, plans.flatMap((plan) => plan.examined.flatMap((snapshot) => [...snapshot.files.values()])));

  const fitted = new Map<string, FittedVersion | undefined>();
  for (const { item, all, examined } of plans) {
    const slug = item.dataset.slug;
    const current = item.dataset.correlation;
    // Whether there is a fit, known without reading it: an unchanged folder's fit is read from the fit cache only
    // when something asks for it (below, when the coefficients are compared with an approved version).
    const fittedNow = item.fitted;
    const hasFit = fittedNow !== undefined && (fittedNow.outcome?.fit ?? fittedNow.fit !== undefined);
    const currentFingerprint = item.review?.fingerprint;
    // Working-tree blob ids of the files the current version reads, to recognise it among the commits.
    const diskIds = new Map<string, string>();
    if (current !== undefined) {
      for (const [name, file] of [['correlation.yaml', current.metadataPath], [current.meta.data.file, current.dataPath]] as const) {
        const bytes = await readFile(file).catch(() => undefined);
        if (bytes !== undefined) diskIds.set(name, blobId(bytes));
      }
    }
    const sameAsDisk = (snapshot: Snapshot) => diskIds.size > 0 && [...diskIds].every(([name, id]) => snapshot.files.get(name) === id);
    const versionOf = (snapshot: Snapshot): FittedVersion | undefined => {
      if (snapshot.files.size === 0) return undefined;
      if (sameAsDisk(snapshot) && current !== undefined && hasFit && currentFingerprint !== undefined) {
        return {
          correlation: current,
          get fit() {
            return fittedNow!.fit!;
          },
          fingerprint: currentFingerprint,
        };
      }
      const metadataBlob = snapshot.files.get('correlation.yaml');
      const key = [...snapshot.files].map(([name, id]) => `${name}=${id}`).sort().join('\n');
      if (!fitted.has(key)) {
        const metadata = metadataBlob === undefined ? undefined : blobs.get(metadataBlob);
        const version = metadata === undefined ? undefined : correlationAtVersion(slug, metadata, (name) => {
          const id = snapshot.files.get(name);
          return id === undefined ? undefined : blobs.get(id);
        });
        fitted.set(key, version);
      }
      return fitted.get(key);
    };
    const versions = examined.map(versionOf);
    const rows: HistoryRow[] = examined.slice(0, HISTORY_VERSIONS).map((snapshot, index) => {
      const version = versions[index];
      const previous = versions[index + 1];
      const isFirst = index + 1 >= all.length;
      let coefficients: HistoryRow['coefficients'];
      if (snapshot.files.size === 0) coefficients = 'removed';
      else if (version === undefined) coefficients = 'unknown';
      else if (isFirst) coefficients = 'added';
      else if (previous === undefined) coefficients = examined[index + 1]?.files.size === 0 ? 'added' : 'unknown';
      else coefficients = previous.fingerprint.parts.result === version.fingerprint.parts.result ? 'unchanged' : 'changed';
      return { commit: snapshot.hash.slice(0, 12), date: snapshot.date, subject: snapshot.subject, coefficients, fingerprint: version?.fingerprint.text ?? null };
    });
    const newest = examined[0];
    const uncommitted = newest === undefined || !sameAsDisk(newest);

    let sinceApproval: SinceApproval | null = null;
    const approved = current?.meta.review.fingerprint;
    if (item.review?.approval.state === 'lapsed' && approved !== undefined && current !== undefined && hasFit) {
      const index = versions.findIndex((version) => version?.fingerprint.text === approved);
      const version = versions[index];
      const snapshot = examined[index];
      sinceApproval =
        version === undefined || snapshot === undefined
          ? { found: false }
          : { found: true, commit: snapshot.hash.slice(0, 12), date: snapshot.date, changes: whatChanged(version, { correlation: current, fit: fittedNow!.fit! }) };
    }
    histories.set(slug, { available: true, rows, older: Math.max(0, all.length - HISTORY_VERSIONS), uncommitted, sinceApproval });
  }
  return histories;
}
