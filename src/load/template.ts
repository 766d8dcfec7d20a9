/**
 * The commented template `correlary new` writes. Every key is shown; optional ones are commented out.
 * The data file holds only a header, so `correlary check` fails until real points are added.
 */

/** Metadata template for a new correlation folder. */
export function metadataTemplate(slug: string, today: string): string {
  return `# Correlation metadata for '${slug}'. Every key is documented in src/schema/ (JSDoc and .describe()).
# Replace each TODO, then run: npx correlary check

title: TODO title, e.g. Specific heat of <material>, liquid
# slug: ${slug}            # URL slug; defaults to the folder name
invented: false           # true only for invented demonstration data

property:                 # the correlated quantity (y)
  name: TODO property name
  symbol: TODO            # TeX without dollar signs, e.g. c_p
  unit: TODO              # plain text, e.g. J/(kg·K); "1" when dimensionless
variable:                 # the independent variable (x)
  name: temperature
  symbol: T
  unit: K

material:
  name: TODO material or substance
  # phase: liquid
  # pressure: 101.325 kPa
  # grade: TODO grade, batch or purity
  # conditions: TODO anything else a reader must know

source:
  citation: TODO full citation or internal reference
  method: measured        # measured | table | derived
  # derivedFrom: TODO     # required when method is derived
  date: ${today}
  preparedBy: TODO your name
  # notes: TODO

# uncertainty:            # stated uncertainty of the data, if the source gives one
#   statement: ±1 % (k = 2)
#   relative: 0.005       # relative standard uncertainty as a fraction

data:
  file: data.csv          # inside this folder
  x: T                    # header names in data.csv
  y: TODO
  # uncertainty: u        # per-point standard uncertainty of y, same unit as y
  # note: note            # free-text note column
  # replicates: false     # true when repeated x values are deliberate replicates

fit:
  order: auto             # auto, or a whole number with a reason
  # criterion: lowestJustified
  # reason: TODO why the order is fixed
  # maxOrder: 10
  # intercept: true
  # transform: { x: identity, y: identity }   # x: identity | reciprocal | log; y: identity | log
  # weights: none         # none | uncertainty
  # passThrough:
  #   - { x: 293.15, y: 0, reason: TODO why the curve must pass here }
  # exclude:
  #   - { row: 7, reason: TODO why the point is left out }
  # range: { min: 280, max: 360 }             # narrows the validity range; never widens it

tags: []

review:
  status: draft           # draft | in-review | approved | withdrawn
  # reviewer: TODO
  # date: YYYY-MM-DD
`;
}

/** Data template: a comment line and the header only. */
export function dataTemplate(): string {
  return `# One row per point; '#' starts a comment line. Columns are named in correlation.yaml (data.x, data.y).
T,TODO
`;
}
