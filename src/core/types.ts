/**
 * Plain, JSON-serialisable types shared by the numerical core and its callers.
 *
 * Symbols used throughout the core:
 *   n  number of points used in the fit        m  polynomial order (degree)
 *   p  number of fitted coefficients           x  independent variable as the user gives it
 *   u  fitted-space independent variable, after the x transform (u = x, 1/x or ln x)
 *   t  mapped variable t = (u − center) / halfWidth, on [−1, 1] over the data
 *   v  fitted-space response, after the y transform (v = y or ln y)
 *   w  weight of a point, 1/σ² when a standard uncertainty σ is given
 */

/** Transform applied to x before fitting. */
export type TransformX = 'identity' | 'reciprocal' | 'log';
/** Transform applied to y before fitting. */
export type TransformY = 'identity' | 'log';

/** Data for one fit. Arrays are not modified. */
export interface FitData {
  readonly x: readonly number[];
  readonly y: readonly number[];
  /** Per-point standard uncertainty of y, in y's units; gives a weighted fit with w = 1/σ². */
  readonly uncertainty?: readonly number[] | undefined;
}

/** A point the fitted curve must pass through exactly (in the user's x and y). */
export interface PointConstraint {
  readonly x: number;
  readonly y: number;
}

export interface FitOptions {
  /** Polynomial order m ≥ 0. */
  readonly order: number;
  /** Fit an intercept a₀ (default true). Without it a₀ is fixed at 0 in the fitted space. */
  readonly intercept?: boolean;
  readonly transformX?: TransformX;
  readonly transformY?: TransformY;
  /** Equality constraints: the curve passes through these points. */
  readonly constraints?: readonly PointConstraint[];
  /**
   * Published validity range in the user's x; default the x range of the data. It may narrow that range, never
   * widen it. The range guard, the check values and the digit count all use it.
   */
  readonly range?: { readonly min: number; readonly max: number };
  /** Confidence level for intervals and bands, in (0, 1); default 0.95. */
  readonly confidence?: number;
  /**
   * 'stated': the per-point σ are taken as known (χ² mode): coefficient uncertainties and bands use them unscaled.
   * 'scatter' (default): scaled by the residual scatter.
   */
  readonly uncertaintyScale?: 'stated' | 'scatter';
  /**
   * The uncertainty model the metadata states, for a weighted fit: a relative standard uncertainty (0.01 for 1 %)
   * of y. When given, the local uncertainty at x is relative·|ŷ(x)| instead of σ interpolated between points.
   */
  readonly uncertaintyModel?: { readonly relative: number } | undefined;
  /**
   * Exact rational certification of the coefficients and their statistics (default 'auto'). Without transforms
   * the inputs are the decimals the user wrote; under a transform, the transformed values as computed (the
   * transform's own rounding, half an ulp, is then part of the data). 'off' keeps the floating-point solution.
   */
  readonly exact?: 'auto' | 'off';
  /**
   * The temperature scale x is measured in, when x is a temperature (K, °C or °F). With an untransformed x the fit
   * then carries the polynomial re-expressed in every scale (temperatureScales); otherwise it is ignored.
   */
  readonly temperatureScale?: TemperatureScale | undefined;
}

/** A temperature scale x may be measured in. */
export type TemperatureScale = 'K' | '°C' | '°F';

/** The fitted polynomial expressed in one temperature scale (see temperature/temperatureScales.ts). */
export interface TemperatureScaleForm {
  readonly scale: TemperatureScale;
  /** True for the scale the data were fitted in. */
  readonly native: boolean;
  /** Validity range in this scale (the native range converted exactly, rounded once). */
  readonly range: { readonly min: number; readonly max: number };
  /** Ascending power-basis coefficients in x of this scale: exact substitution of the certified ones, rounded once. */
  readonly coefficients: readonly number[];
  readonly significantDigits: readonly number[];
  readonly printedCoefficients: readonly string[];
  /** Standard errors of the coefficients in this scale (floating-point transform of the covariance). */
  readonly standardErrors: readonly number[];
  readonly checkValues: readonly CheckValue[];
  readonly printedCheckValues: readonly PrintedCheckValue[];
  /** The mapped form's centre and half-width in this scale (its coefficients are the native ones). */
  readonly mapped: { readonly center: number; readonly halfWidth: number };
  /**
   * Largest deviation of the printed coefficients, evaluated by Horner's rule in double precision, from the certified
   * fit over the range, in units of the digits rule's tolerance (1 % of the uncertainty of a new observation).
   */
  readonly printedDeviation: number;
  /** Whether the printed form in this scale is published (always for the native scale). */
  readonly shown: boolean;
  /** Why it is not shown, or null. */
  readonly reason: string | null;
}

/** The fitted polynomial in every temperature scale: the native one first. */
export interface TemperatureScales {
  readonly native: TemperatureScale;
  readonly scales: readonly TemperatureScaleForm[];
}

/** Affine map from the fitted-space variable u to t = (u − center) / halfWidth. */
export interface DomainMap {
  readonly center: number;
  readonly halfWidth: number;
}

/**
 * One full-precision check value: y at x from the certified coefficients (exact evaluation, rounded once), for
 * implementations that use the full downloaded coefficients; tolerance bounds the error of a correct
 * double-precision implementation at x.
 */
export interface CheckValue {
  readonly x: number;
  readonly y: number;
  readonly tolerance?: number;
}

/**
 * One printed check value: y at x from the PRINTED coefficients, as text with the digits a correct copy reproduces.
 * A correct copy of the printed equation agrees with y within ± tolerance (one unit in y's last digit); a copy with
 * any single coefficient's last digit changed by ±1 misses at least one printed check value by more than that.
 */
export interface PrintedCheckValue {
  readonly x: number;
  readonly y: string;
  readonly tolerance: number;
}

/** Residual statistics of one fit, in the fitted space unless the name says otherwise. */
export interface FitStatistics {
  readonly n: number;
  /** Number of fitted (free) coefficients after constraints. */
  readonly parameters: number;
  readonly degreesOfFreedom: number;
  /** Residual sum of squares S_r (weighted when weights are given). */
  readonly residualSumOfSquares: number;
  /** s = √(S_r / dof); NaN when dof = 0. */
  readonly residualStdDev: number;
  readonly residualVariance: number;
  /** Centred R² = 1 − S_r/S_t; uncentred 1 − S_r/Σv² for a fit without intercept. */
  readonly rSquared: number;
  readonly rSquaredCentred: boolean;
  readonly adjustedRSquared: number;
  /** √(S_r / n). */
  readonly rmse: number;
  readonly maxAbsResidual: number;
  /** max |r_i / v_i| over points with v_i ≠ 0. */
  readonly maxRelResidual: number;
  /** Same two, measured in the user's y units (differs from the above only under a y transform). */
  readonly maxAbsResidualOriginal: number;
  readonly maxRelResidualOriginal: number;
  readonly press: number;
  /** √(PRESS / n). */
  readonly looRmse: number;
  readonly aicc: number;
  readonly bic: number;
  /** 2-norm condition number of the design matrix in the raw power basis of u, and in the mapped basis of t. */
  readonly conditionRaw: number;
  readonly conditionMapped: number;
  /** Reduced χ² = S_r / dof when per-point uncertainties are given (weighted S_r), else null. */
  readonly reducedChiSquare: number | null;
  readonly chiSquareP: number | null;
}

/** Pure-error lack-of-fit F-test, possible when some x values repeat. */
export interface LackOfFitTest {
  readonly pureErrorSumOfSquares: number;
  readonly pureErrorDof: number;
  readonly lackOfFitSumOfSquares: number;
  readonly lackOfFitDof: number;
  readonly f: number;
  readonly p: number;
}

/** Wald–Wolfowitz runs test on the signs of the residuals ordered by x. */
export interface RunsTest {
  readonly runs: number;
  readonly positive: number;
  readonly negative: number;
  readonly expectedRuns: number;
  readonly z: number;
  /** Two-sided p from the normal approximation. */
  readonly p: number;
}

/** Per-point diagnostics, in the order of the input points. */
export interface PointDiagnostics {
  readonly x: readonly number[];
  readonly y: readonly number[];
  readonly fitted: readonly number[];
  /** Residuals in the fitted space (v − v̂). */
  readonly residuals: readonly number[];
  /** Residuals in the user's y units (y − ŷ). */
  readonly residualsOriginal: readonly number[];
  readonly leverage: readonly number[];
  /**
   * Externally studentized residuals (weighted: in units of each point's own σ, scaled by the scatter); in χ² mode
   * (σ known) the standardized residual √w_i·r_i/√(1 − h_ii).
   */
  readonly studentized: readonly number[];
  readonly cooksDistance: readonly number[];
}

/** A fitted polynomial: everything needed to publish, evaluate and review it, as plain data. */
export interface PolynomialFit {
  readonly order: number;
  readonly intercept: boolean;
  readonly transformX: TransformX;
  readonly transformY: TransformY;
  readonly weighted: boolean;
  readonly constraints: readonly PointConstraint[];
  /** Validity range in the user's x: the data's x range, or the narrower range asked for. */
  readonly range: { readonly min: number; readonly max: number };
  /** Ascending power-basis coefficients in u (the transformed x): v = Σ a_k u^k. */
  readonly coefficients: readonly number[];
  readonly standardErrors: readonly number[];
  readonly confidenceIntervals: readonly (readonly [number, number])[];
  /** Covariance of the power-basis coefficients, (m+1)×(m+1). */
  readonly covariance: readonly (readonly number[])[];
  /** Well-conditioned form: v = Σ b_k t^k with t = (u − center)/halfWidth. */
  readonly mapped: {
    readonly map: DomainMap;
    readonly coefficients: readonly number[];
    readonly covariance: readonly (readonly number[])[];
  };
  /** Significant digits to print for each power-basis coefficient (see significantDigits and checkValues.ts). */
  readonly significantDigits: readonly number[];
  /** The power-basis coefficients as printed (each rounded to its significant digits; "0" for a fixed a₀). */
  readonly printedCoefficients: readonly string[];
  /** Full-precision check values (certified coefficients, exact evaluation). */
  readonly checkValues: readonly CheckValue[];
  /** Check values of the printed equation, with their tolerance (see checkValues.ts). */
  readonly printedCheckValues: readonly PrintedCheckValue[];
  /**
   * How coefficient uncertainties and bands are scaled: 'stated' — from the stated σ as known, unscaled (χ² mode);
   * 'scatter' — scaled by the residual scatter s² (unweighted fits, and weighted fits outside χ² mode).
   */
  readonly uncertaintyScale: 'stated' | 'scatter';
  /**
   * Stated standard uncertainty in the fitted space per distinct x (sorted; replicates combined as RMS), from which
   * the local uncertainty at any x is interpolated; null for an unweighted fit.
   */
  readonly uncertaintyProfile: { readonly x: readonly number[]; readonly sigma: readonly number[] } | null;
  /** The stated relative uncertainty model used for the local uncertainty of a weighted fit, or null. */
  readonly uncertaintyModel: { readonly relative: number } | null;
  readonly confidence: number;
  /**
   * Variance of a new observation relative to s² for an unweighted fit (1); for a weighted fit the RMS of the stated
   * σ² in the fitted space (kept for older readers; bands use the local uncertainty, see localUncertainty).
   */
  readonly predictionScale: number;
  readonly statistics: FitStatistics;
  readonly lackOfFit: LackOfFitTest | null;
  readonly runsTest: RunsTest | null;
  readonly points: PointDiagnostics;
  /** How the numbers were obtained, for the page and for reviewers. */
  readonly method: {
    readonly solver: 'householder-qr';
    /** 'exact-rational' when the reported coefficients and statistics were certified in exact arithmetic. */
    readonly refinement: 'exact-rational' | 'none';
    readonly rank: number;
  };
  readonly warnings: readonly string[];
  /** The polynomial in every temperature scale, when x is a temperature and untransformed; null otherwise. */
  readonly temperatureScales?: TemperatureScales | null;
}

/**
 * What a confidence or prediction band needs of a fit (stats/bands.ts): the mapped form, the transforms, the
 * range, the uncertainty model and s with its degrees of freedom. A PolynomialFit is one; so is a CurveFit.
 */
export type BandFit = Pick<
  PolynomialFit,
  'order' | 'transformX' | 'transformY' | 'mapped' | 'range' | 'confidence' | 'uncertaintyScale' | 'uncertaintyProfile' | 'uncertaintyModel'
> & { readonly statistics: Pick<FitStatistics, 'residualStdDev' | 'degreesOfFreedom'> };

/** The floating-point fit of one order as a picture needs it (fitCurve): its bands and its residuals, nothing certified. */
export interface CurveFit extends BandFit {
  /** y − ŷ at each point, in y's own unit, in input order. */
  readonly residualsOriginal: readonly number[];
}
