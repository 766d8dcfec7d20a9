/**
 * The plain JSON record of one fitted correlation: the single serialiser behind `correlary fit --json`, the
 * coefficients.json and coefficients.csv downloads and handbook.json. Pure (no I/O, no Astro): it reads the
 * metadata, the validity range, the left-out points, the fit and the order selection, and returns plain data in
 * which every non-finite number is null (see jsonNumbers.ts for the rule).
 *
 * Field names are a public interface (README "Exports"); add fields, never rename or drop them. Fields:
 *   recordVersion        1
 *   slug, title          identity of the correlation
 *   handbook             {title, organisation, notice, url}: the handbook the record was published in (its
 *                        handbook.yaml settings) and the absolute address of the correlation's page; null when the
 *                        record does not come from a built handbook (correlary fit)
 *   status               review status: draft | in-review | approved | withdrawn
 *   fingerprint          fingerprint of the data, options and result (content/README.md, "Fingerprint recipe"), or
 *                        null when the record does not come from a handbook folder (correlary fit)
 *   approval             {state, holds, label, lapseReasons, reviewer, date, fingerprint, replacedBy} or null:
 *                        state holds | lapsed | unbound | withdrawn | none; holds is true only when the recorded
 *                        fingerprint equals the current one; fingerprint here is the one approved
 *   invented, notice     invented demonstration data, and the notice that says so (null otherwise)
 *   cautions             the cautions, the first naming the validity range
 *   property, variable   {name, symbol (TeX), unit} of y and x
 *   material             {name, phase?, pressure?, grade?, conditions?}
 *   range                {min, max, unit}: the validity range in x
 *   transforms           {x, y, u, v}: transforms and the fitted variables as text (u = "1/T", v = "ln(p)")
 *   symbols              {x, y}: the symbols as plain text ("T", "p_sat")
 *   intercept, weighted  model options
 *   order                polynomial order m
 *   coefficients         a_0..a_m at full precision: v = Σ a_k u^k (ascending powers of the transformed x)
 *   printedCoefficients  the same rounded to significantDigits, as printed in the equation (text)
 *   significantDigits    digits printed per coefficient
 *   standardErrors       standard error of each a_k (null for a coefficient fixed at 0)
 *   confidence           level of the intervals and bands (0.95)
 *   confidenceIntervals  [low, high] per a_k
 *   equation, equationTex  the printed equation as plain text and TeX
 *   mapped               {center, halfWidth, coefficients, covariance}: v = Σ b_k t^k, t = (u − center)/halfWidth;
 *                        center and halfWidth are short decimals
 *   passThrough          [{x, y}] points the curve passes through exactly
 *   checkValues          [{x, y, tolerance}] y from the full-precision coefficients (exact evaluation, rounded
 *                        once); tolerance bounds a correct double-precision implementation's error
 *   printedCheckValues   [{x, y (text), tolerance}] y from the printed coefficients, to the digits a correct copy
 *                        reproduces; a ±1 change in the last digit of any printed coefficient misses one by more
 *                        than its tolerance
 *   uncertaintyScale     'stated' (χ² mode: standard errors and bands from the stated σ, unscaled) or 'scatter'
 *                        (scaled by the residual scatter)
 *   residualStdDev       s, in statisticUnit
 *   statisticUnit        what s and RMSE are measured in: y's unit, "in ln y" or "weighted, in units of σ"
 *   rSquared, n, degreesOfFreedom
 *   statistics           every residual statistic of the fit (src/core/types.ts FitStatistics)
 *   orderSelection       {criterion, reason, rule, orders} or null
 *   provenance           {source, uncertainty, review, excluded}
 *   method               {solver, refinement, rank}
 *   warnings             warnings of the order selection and the fit
 *   temperatureScales    null unless x is a temperature (unit K, °C or °F) and untransformed; then
 *                        {native, scales: [{scale, native, shown, reason, range {min, max, unit}, coefficients,
 *                        printedCoefficients, significantDigits, standardErrors, equation, mapped {center, halfWidth},
 *                        checkValues, printedCheckValues, printedDeviation}]}: the polynomial in every scale, native
 *                        first, by exact substitution of the certified coefficients (src/core/temperature/); shown is
 *                        false (and reason says why) where the printed form would not reproduce the fit within 1 %
 *                        of the uncertainty of a new observation; the mapped coefficients are the same in every scale
 *
 * @example correlationRecord(source).coefficients // => [13.88923908187224, -2422.7009638645936, -145306.4927312025]
 */
import {
  cautionsFor,
  equationPlain,
  equationTex,
  plainSymbol,
  printedCoefficients,
  statisticUnit,
  transformedXText,
  transformedYText,
  type OrderSelection,
  type PolynomialFit,
} from '../core/index.ts';
import type { CorrelationMeta, ExcludedPoint, StoredReviewTrail } from '../schema/index.ts';
import { approvalLabel } from './approvalLabel.ts';
import { INVENTED_NOTICE } from './inventedNotice.ts';
import { jsonNumbers, type Jsonified } from './jsonNumbers.ts';

/** What a record is built from: a loaded correlation (or a stored entry) with its fit. */
export interface CorrelationSource {
  readonly slug: string;
  readonly meta: CorrelationMeta;
  readonly range: { readonly min: number; readonly max: number };
  readonly excluded: readonly ExcludedPoint[];
  readonly fit: PolynomialFit;
  readonly selection: OrderSelection | null;
  /** Fingerprint and approval state, for a correlation of a handbook. */
  readonly reviewTrail?: StoredReviewTrail | undefined;
  /** The handbook it is published in, for the site's downloads and snippets. */
  readonly handbook?: HandbookIdentity | undefined;
}

/** The handbook a record was published in: its settings and the absolute address of the correlation's page. */
export interface HandbookIdentity {
  readonly title: string;
  readonly organisation: string | null;
  readonly notice: string | null;
  readonly url: string;
}

/** Version of the record's layout; raised only when a field changes meaning. */
export const RECORD_VERSION = 1;

/** The temperatureScales field: every scale's form with its equation as printed, or null. */
function temperatureScalesRecord(fit: PolynomialFit, symbols: { x: string; y: string }) {
  const scales = fit.temperatureScales;
  if (scales === undefined || scales === null) return null;
  return {
    native: scales.native,
    scales: scales.scales.map((form) => ({
      scale: form.scale,
      native: form.native,
      shown: form.shown,
      reason: form.reason,
      range: { min: form.range.min, max: form.range.max, unit: form.scale },
      coefficients: form.coefficients,
      printedCoefficients: form.printedCoefficients,
      significantDigits: form.significantDigits,
      standardErrors: form.native ? fit.standardErrors.map((value, k) => (k === 0 && !fit.intercept ? NaN : value)) : form.standardErrors,
      equation: form.native ? equationPlain(fit, symbols) : equationPlain({ transformX: fit.transformX, transformY: fit.transformY, intercept: true, coefficients: form.coefficients, significantDigits: form.significantDigits }, symbols),
      mapped: form.mapped,
      checkValues: form.checkValues,
      printedCheckValues: form.printedCheckValues,
      printedDeviation: form.printedDeviation,
    })),
  };
}

/** The record as plain JSON data. */
export function correlationRecord(source: CorrelationSource) {
  const { meta, fit, selection } = source;
  const x = plainSymbol(meta.variable.symbol);
  const y = plainSymbol(meta.property.symbol);
  const xUnit = meta.variable.unit === '1' ? '' : meta.variable.unit;
  const record = {
    recordVersion: RECORD_VERSION,
    slug: source.slug,
    title: meta.title,
    handbook: source.handbook === undefined ? null : { title: source.handbook.title, organisation: source.handbook.organisation, notice: source.handbook.notice, url: source.handbook.url },
    status: meta.review.status,
    fingerprint: source.reviewTrail?.fingerprint ?? null,
    approval:
      source.reviewTrail === undefined
        ? null
        : {
            state: source.reviewTrail.approval,
            holds: source.reviewTrail.approval === 'holds',
            label: approvalLabel(meta.review, source.reviewTrail),
            lapseReasons: source.reviewTrail.lapseReasons,
            reviewer: meta.review.reviewer ?? null,
            date: meta.review.date ?? null,
            fingerprint: meta.review.fingerprint ?? null,
            replacedBy: meta.review.replacedBy ?? null,
          },
    invented: meta.invented,
    notice: meta.invented ? INVENTED_NOTICE : null,
    cautions: cautionsFor(source.range, xUnit, meta.variable.name),
    property: meta.property,
    variable: meta.variable,
    material: meta.material,
    range: { min: source.range.min, max: source.range.max, unit: meta.variable.unit },
    transforms: { x: fit.transformX, y: fit.transformY, u: transformedXText(fit.transformX, x), v: transformedYText(fit.transformY, y) },
    symbols: { x, y },
    intercept: fit.intercept,
    weighted: fit.weighted,
    order: fit.order,
    coefficients: fit.coefficients,
    printedCoefficients: fit.printedCoefficients ?? printedCoefficients(fit),
    significantDigits: fit.significantDigits,
    standardErrors: fit.standardErrors.map((value, k) => (k === 0 && !fit.intercept ? NaN : value)),
    confidence: fit.confidence,
    confidenceIntervals: fit.confidenceIntervals.map((pair, k) => (k === 0 && !fit.intercept ? [NaN, NaN] : pair)),
    equation: equationPlain(fit, { x, y }),
    equationTex: equationTex(fit, { x: meta.variable.symbol, y: meta.property.symbol }),
    mapped: {
      center: fit.mapped.map.center,
      halfWidth: fit.mapped.map.halfWidth,
      coefficients: fit.mapped.coefficients,
      covariance: fit.mapped.covariance,
    },
    passThrough: fit.constraints,
    checkValues: fit.checkValues,
    printedCheckValues: fit.printedCheckValues ?? [],
    uncertaintyScale: fit.uncertaintyScale ?? 'scatter',
    residualStdDev: fit.statistics.residualStdDev,
    statisticUnit: statisticUnit(fit, meta.property.unit),
    rSquared: fit.statistics.rSquared,
    n: fit.statistics.n,
    degreesOfFreedom: fit.statistics.degreesOfFreedom,
    statistics: fit.statistics,
    lackOfFit: fit.lackOfFit,
    runsTest: fit.runsTest,
    orderSelection: selection === null ? null : { criterion: selection.criterion, reason: selection.reason, rule: selection.rule, orders: selection.orders },
    provenance: {
      source: meta.source,
      uncertainty: meta.uncertainty ?? null,
      review: meta.review,
      excluded: source.excluded.map((point) => ({ row: point.row, x: point.x, y: point.y, reason: point.reason })),
    },
    method: fit.method,
    warnings: [...(selection?.warnings ?? []), ...fit.warnings],
    temperatureScales: temperatureScalesRecord(fit, { x, y }),
  };
  return jsonNumbers(record) as Jsonified<typeof record>;
}

/** The record's type. */
export type CorrelationRecord = ReturnType<typeof correlationRecord>;
