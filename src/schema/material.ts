/**
 * The substance or material a correlation describes, and the conditions it holds under.
 */
import { z } from 'zod';

/** What was measured and under which conditions. Only `name` is required. */
export const materialSchema = z
  .object({
    /** Substance or material name, e.g. "Corvane-12 heat-transfer liquid". Required. */
    name: z.string().trim().min(1, 'must not be empty').describe('Substance or material name'),
    /** Phase, e.g. "liquid", "vapour", "solid". Optional. */
    phase: z.string().trim().min(1, 'must not be empty').optional().describe('Phase: liquid, vapour, solid, …'),
    /** Pressure as text with its unit, e.g. "101.325 kPa" or "saturation". Optional. */
    pressure: z.string().trim().min(1, 'must not be empty').optional().describe('Pressure with unit, or "saturation"'),
    /** Grade, alloy designation, batch or purity. Optional. */
    grade: z.string().trim().min(1, 'must not be empty').optional().describe('Grade, alloy designation, batch or purity'),
    /** Any other condition a reader must know, in one or two sentences. Optional. */
    conditions: z.string().trim().min(1, 'must not be empty').optional().describe('Other conditions, in prose'),
  })
  .strict();

export type Material = z.output<typeof materialSchema>;
