/**
 * The JSON Schema (draft 2020-12) of handbook.json, published beside it as handbook.schema.json. It documents every
 * property a reader may rely on; the record's remaining fields (statistics, order table, provenance) are described
 * in src/export/correlationRecord.ts and README "Exports".
 *
 * Extension rule: readers must ignore properties they do not know. New properties (for example the review
 * fingerprint and approval, or temperatureScales) are added without changing formatVersion; formatVersion rises
 * only when a property listed here is removed, renamed or changes meaning.
 *
 * @example HANDBOOK_SCHEMA.properties.formatVersion.const // => 1
 */
import { HANDBOOK_FORMAT_VERSION } from './handbookJson.ts';

const number = { type: 'number' } as const;
const numberOrNull = { type: ['number', 'null'] } as const;
const text = { type: 'string' } as const;
const textOrNull = { type: ['string', 'null'] } as const;
const numbers = { type: 'array', items: number } as const;

const quantity = {
  type: 'object',
  description: 'A physical quantity: name, TeX symbol and unit ("1" for a pure number).',
  required: ['name', 'symbol', 'unit'],
  properties: { name: text, symbol: text, unit: text },
} as const;

const checkValue = { type: 'object', required: ['x', 'y'], properties: { x: number, y: number, tolerance: numberOrNull } } as const;
const printedCheckValue = { type: 'object', required: ['x', 'y', 'tolerance'], properties: { x: number, y: text, tolerance: number } } as const;
const scale = { enum: ['K', '°C', '°F'] } as const;

const temperatureScaleForm = {
  type: 'object',
  description:
    'The polynomial in one temperature scale: exact substitution of the certified coefficients (x_K = x_°C + 273.15, x_°F = 9/5·x_°C + 32), each coefficient rounded once. Its mapped form has the native mapped coefficients with this centre and half-width.',
  required: ['scale', 'native', 'shown', 'reason', 'range', 'coefficients', 'printedCoefficients', 'significantDigits', 'standardErrors', 'equation', 'mapped', 'checkValues', 'printedCheckValues', 'printedDeviation'],
  properties: {
    scale,
    native: { type: 'boolean', description: 'True for the scale the data were fitted in (its fields equal the top-level ones).' },
    shown: { type: 'boolean', description: 'Whether the printed form is published: its printed coefficients, evaluated in double precision, reproduce the fit within 1 % of the uncertainty of a new observation over the range, with at most 15 significant digits.' },
    reason: { ...textOrNull, description: 'Why the printed form is not shown (use the mapped form with x converted to the native scale), or null.' },
    range: { type: 'object', required: ['min', 'max', 'unit'], properties: { min: number, max: number, unit: scale }, description: 'Validity range in this scale.' },
    coefficients: { ...numbers, description: 'Ascending power-basis coefficients in x of this scale, full precision.' },
    printedCoefficients: { type: 'array', items: text, description: 'The coefficients as printed, to significantDigits.' },
    significantDigits: { type: 'array', items: { type: 'integer', minimum: 1 }, description: 'Digits needed per coefficient by the digits rule.' },
    standardErrors: { type: 'array', items: numberOrNull, description: 'Standard errors of the coefficients in this scale.' },
    equation: { ...text, description: 'The printed equation as plain text, x in this scale.' },
    mapped: { type: 'object', required: ['center', 'halfWidth'], properties: { center: number, halfWidth: { type: 'number', exclusiveMinimum: 0 } }, description: 'Centre and half-width of the mapped variable in this scale.' },
    checkValues: { type: 'array', items: checkValue, description: 'y at check points of this scale from the full-precision coefficients (exact evaluation, rounded once).' },
    printedCheckValues: { type: 'array', items: printedCheckValue, description: 'y from the printed coefficients, to the digits a correct copy reproduces, with tolerance.' },
    printedDeviation: { ...numberOrNull, description: 'Largest deviation of the printed form in double precision from the fit, in units of 1 % of the uncertainty of a new observation (≤ 1 when shown).' },
  },
} as const;

const temperatureScales = {
  type: ['object', 'null'],
  description: 'Null unless x is a temperature (unit K, °C or °F) and is not transformed; then the polynomial in every scale, the native one first.',
  required: ['native', 'scales'],
  properties: { native: scale, scales: { type: 'array', minItems: 3, maxItems: 3, items: temperatureScaleForm } },
} as const;

const correlation = {
  type: 'object',
  description:
    'One correlation: the export record of its fit (the same fields, with the same values, as `correlary fit --json` and the coefficients.json download) plus its page url and its downloads.',
  required: [
    'slug', 'url', 'title', 'status', 'property', 'variable', 'material', 'order', 'coefficients', 'standardErrors', 'mapped',
    'transforms', 'range', 'residualStdDev', 'n', 'checkValues', 'downloads', 'cautions', 'invented',
  ],
  properties: {
    slug: { type: 'string', pattern: '^[a-z0-9]+(-[a-z0-9]+)*$', description: 'Identifier of the correlation (its folder name).' },
    url: { type: 'string', pattern: '^/', description: 'Path of the correlation page inside the site, base path included.' },
    title: text,
    handbook: {
      type: ['object', 'null'],
      required: ['title', 'organisation', 'notice', 'url'],
      properties: { title: text, organisation: textOrNull, notice: textOrNull, url: { type: 'string', format: 'uri' } },
      description:
        "The handbook the record was published in (its settings: title, organisation, notice) and the absolute address of the correlation's page; the downloads and code snippets carry the same. Null in `correlary fit --json`.",
    },
    status: { enum: ['draft', 'in-review', 'approved', 'withdrawn'], description: 'Review status.' },
    invented: { type: 'boolean', description: 'True when the data are invented demonstration numbers.' },
    notice: { ...textOrNull, description: 'The invented-data notice, or null.' },
    cautions: { type: 'array', items: text, minItems: 2, description: 'The cautions; the first names the validity range.' },
    property: { ...quantity, description: 'The correlated property y.' },
    variable: { ...quantity, description: 'The independent variable x.' },
    material: { type: 'object', required: ['name'], properties: { name: text }, description: 'Material and conditions.' },
    order: { type: 'integer', minimum: 0, description: 'Polynomial order m.' },
    coefficients: {
      ...numbers,
      minItems: 1,
      description: 'a_0 … a_m at full precision (shortest round-trip decimals): v = Σ a_k u^k, ascending powers of the transformed x u (see transforms).',
    },
    printedCoefficients: { type: 'array', items: text, description: 'The coefficients rounded to significantDigits, as printed.' },
    significantDigits: { type: 'array', items: { type: 'integer', minimum: 1 }, description: 'Digits printed per coefficient.' },
    standardErrors: { type: 'array', items: numberOrNull, description: 'Standard error of each a_k; null for a coefficient fixed at 0.' },
    mapped: {
      type: 'object',
      description: 'Well-conditioned form for evaluation: v = Σ b_k t^k with t = (u − center)/halfWidth, t ∈ [−1, 1] over the data.',
      required: ['center', 'halfWidth', 'coefficients', 'covariance'],
      properties: {
        center: number,
        halfWidth: { type: 'number', exclusiveMinimum: 0 },
        coefficients: numbers,
        covariance: { type: 'array', items: { type: 'array', items: numberOrNull }, description: 'Covariance of the b_k.' },
      },
    },
    transforms: {
      type: 'object',
      description: 'u = x, 1/x or ln x; v = y or ln y. u and v as text.',
      required: ['x', 'y', 'u', 'v'],
      properties: { x: { enum: ['identity', 'reciprocal', 'log'] }, y: { enum: ['identity', 'log'] }, u: text, v: text },
    },
    range: {
      type: 'object',
      description: 'Validity range in x (in variable.unit); the correlation must not be used outside it.',
      required: ['min', 'max'],
      properties: { min: number, max: number, unit: text },
    },
    residualStdDev: { ...numberOrNull, description: 'Residual standard deviation s (in statisticUnit); null without residual degrees of freedom.' },
    statisticUnit: text,
    n: { type: 'integer', minimum: 1, description: 'Number of points fitted.' },
    checkValues: {
      type: 'array',
      minItems: 1,
      description: 'Values to check a copied implementation against: y at x from the full-precision coefficients.',
      items: checkValue,
    },
    temperatureScales,
    downloads: {
      type: 'object',
      description: 'Kind of download → path inside the site (base path included).',
      required: ['json', 'csv', 'python', 'javascript', 'c', 'spreadsheet'],
      properties: {
        json: { type: 'string', pattern: '^/', description: 'The export record of the correlation.' },
        csv: { type: 'string', pattern: '^/', description: 'The coefficients as CSV, with the cautions as # comment lines.' },
        data: { type: 'string', pattern: '^/', description: 'The data points with their diagnostics, as CSV.' },
        plot: { type: 'string', pattern: '^/', description: 'The fit and residual plots as a static SVG.' },
        python: { type: 'string', pattern: '^/', description: 'Python module (standard library only): evaluate(x), prediction_interval(x).' },
        javascript: { type: 'string', pattern: '^/', description: 'JavaScript ES module: evaluate(x), predictionInterval(x).' },
        typescript: { type: 'string', pattern: '^/', description: 'TypeScript declarations of the JavaScript module.' },
        c: { type: 'string', pattern: '^/', description: 'C99 header: int <slug>_evaluate(double x, double *y), 0 inside the range.' },
        spreadsheet: { type: 'string', pattern: '^/', description: 'One-cell spreadsheet formula with x in a cell named x_value, after # comment lines.' },
      },
      additionalProperties: { type: 'string', pattern: '^/' },
    },
    fingerprint: { ...textOrNull, description: 'Review fingerprint of the data, options and result (content/README.md).' },
    approval: { type: ['object', 'null'], description: 'Approval state of the review trail, or null.' },
  },
} as const;

/** The schema as a plain object (serialise it with JSON.stringify). */
export const HANDBOOK_SCHEMA = {
  $schema: 'https://json-schema.org/draft/2020-12/schema',
  title: 'Correlary handbook export (handbook.json)',
  description:
    'Every correlation of one handbook, machine-readable. Extension rule: readers must ignore properties they do not know; properties are added without changing formatVersion; formatVersion rises only when a property described here is removed, renamed or changes meaning. Every correlation is valid only inside its range and is not for design use without checking against the applicable codes and standards and the judgement of a qualified engineer.',
  type: 'object',
  required: ['formatVersion', 'generator', 'handbook', 'cautions', 'correlations'],
  properties: {
    $schema: { type: 'string', description: 'Address of this schema.' },
    formatVersion: { const: HANDBOOK_FORMAT_VERSION, description: 'Layout version of this file (see the extension rule).' },
    generator: {
      type: 'object',
      required: ['name', 'version'],
      properties: { name: { const: 'correlary' }, version: text },
      description: 'The program and version that wrote the file.',
    },
    handbook: {
      type: 'object',
      required: ['title', 'url', 'basePath'],
      properties: { title: text, organisation: textOrNull, url: { type: 'string', format: 'uri' }, basePath: { type: 'string', pattern: '^/' }, notice: textOrNull },
      description: 'The handbook: title, publisher, address (base path included) and notice.',
    },
    cautions: { type: 'array', items: text, minItems: 2, description: 'The cautions that go with every correlation.' },
    correlations: { type: 'array', items: { $ref: '#/$defs/correlation' } },
  },
  $defs: { correlation },
} as const;
