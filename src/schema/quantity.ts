/**
 * A physical quantity as the handbook names it: the correlated property or the independent variable.
 */
import { z } from 'zod';

/**
 * Name, TeX symbol and unit of one quantity. All three are required: a correlation without units cannot be
 * reviewed. A dimensionless quantity writes `unit: "1"`.
 */
export const quantitySchema = z
  .object({
    /** Plain-language name, e.g. "specific heat capacity". Required. */
    name: z.string().trim().min(1, 'must not be empty').describe('Plain-language name of the quantity'),
    /** Symbol as TeX without dollar signs, e.g. `c_p` or `\\mu`. Required. */
    symbol: z.string().trim().min(1, 'must not be empty').describe('Symbol as TeX, without dollar signs'),
    /** Unit as plain text, e.g. `J/(kg·K)`, `K`, `°C`; `1` for a dimensionless quantity. Required. */
    unit: z
      .string()
      .trim()
      .min(1, 'must not be empty')
      .describe('Unit as plain text; write "1" for a dimensionless quantity'),
    /**
     * Optional canonical key that groups correlations of the same quantity on one page, e.g.
     * `specific-heat-capacity`. Defaults to the name in lower case with every run of other characters as one hyphen.
     */
    key: z
      .string()
      .trim()
      .regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, 'must be lower-case letters and digits joined by single hyphens, e.g. specific-heat-capacity')
      .optional()
      .describe('Canonical key grouping correlations of one quantity, e.g. specific-heat-capacity; defaults to the normalised name'),
  })
  .strict();

export type Quantity = z.output<typeof quantitySchema>;
