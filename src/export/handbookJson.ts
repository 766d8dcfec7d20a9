/**
 * handbook.json: one machine-readable export of a whole handbook, published beside the site as
 * `<base>/handbook.json` and described by the JSON Schema `<base>/handbook.schema.json` (handbookSchema.ts).
 * Each correlation is the export record (correlationRecord.ts, the same serialiser as `correlary fit --json` and the
 * coefficients.json download) plus where it lives in the site: its page `url` and its `downloads`.
 *
 * Extension rule (also stated in the schema): readers ignore properties they do not know; new properties are
 * added without changing `formatVersion`; `formatVersion` rises only when a property is removed, renamed or
 * changes meaning. Review fields (fingerprint, approval) and re-expressed temperature scales join under that rule.
 *
 * @example handbookJson({ generator: { name: 'correlary', version: '0.1.0' }, handbook, correlations: [] }).formatVersion // => 1
 */
import { CAUTIONS } from '../core/index.ts';
import type { CorrelationRecord } from './correlationRecord.ts';

/** Version of handbook.json's layout (see the extension rule above). */
export const HANDBOOK_FORMAT_VERSION = 1;

/** Name of the file and of its schema, at the site's base path. */
export const HANDBOOK_JSON_FILE = 'handbook.json';
export const HANDBOOK_SCHEMA_FILE = 'handbook.schema.json';

/** One correlation as handbook.json carries it: its record and where it is in the site. */
export interface HandbookCorrelation {
  readonly record: CorrelationRecord;
  /** Path of the correlation's page inside the site, with the base path, e.g. /handbook/correlations/water-cp/. */
  readonly url: string;
  /** Kind of download (json, csv, …) → path inside the site, with the base path. */
  readonly downloads: Readonly<Record<string, string>>;
  /** Extra properties to merge into the correlation (e.g. temperatureScales); never overrides the record's. */
  readonly extra?: Readonly<Record<string, unknown>>;
}

export interface HandbookJsonInput {
  readonly generator: { readonly name: string; readonly version: string };
  readonly handbook: {
    readonly title: string;
    readonly organisation?: string | undefined;
    /** Absolute address of the site's root, base path included, ending in '/'. */
    readonly url: string;
    readonly basePath: string;
    readonly notice?: string | undefined;
  };
  readonly correlations: readonly HandbookCorrelation[];
}

/** handbook.json as plain data, correlations in the order given. */
export function handbookJson(input: HandbookJsonInput) {
  return {
    $schema: new URL(HANDBOOK_SCHEMA_FILE, input.handbook.url).href,
    formatVersion: HANDBOOK_FORMAT_VERSION,
    generator: { name: input.generator.name, version: input.generator.version },
    handbook: {
      title: input.handbook.title,
      organisation: input.handbook.organisation ?? null,
      url: input.handbook.url,
      basePath: input.handbook.basePath,
      notice: input.handbook.notice ?? null,
    },
    cautions: [...CAUTIONS],
    correlations: input.correlations.map((item) => ({ ...item.extra, ...item.record, url: item.url, downloads: { ...item.downloads } })),
  };
}
