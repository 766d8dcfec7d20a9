/**
 * The `fit` block as far as it is valid: every field that parses on its own keeps its value, every other field
 * takes its default, and of the `exclude` and `passThrough` lists every entry that parses is kept. Used only to
 * check the data against the metadata when the metadata has errors elsewhere, so that one `correlary check` run
 * lists every problem; such a correlation is never fitted or published.
 */
import { exclusionSchema, fitOptionsFieldsSchema, passThroughSchema, type FitSettings } from '../schema/index.ts';
import type { z } from 'zod';

/**
 * @example lenientFitSettings({ order: 3, maxOrder: 'five' }).order // => 3 (maxOrder falls back to its default, 10)
 */
export function lenientFitSettings(raw: unknown): FitSettings {
  const block = raw !== null && typeof raw === 'object' && !Array.isArray(raw) ? (raw as Record<string, unknown>) : {};
  const shape = fitOptionsFieldsSchema.shape as Record<string, z.ZodTypeAny>;
  const settings: Record<string, unknown> = {};
  for (const [key, schema] of Object.entries(shape)) {
    const parsed = schema.safeParse(block[key]);
    settings[key] = parsed.success ? parsed.data : schema.safeParse(undefined).data;
  }
  const entries = (value: unknown, element: z.ZodTypeAny): unknown[] =>
    Array.isArray(value) ? value.flatMap((item) => {
      const parsed = element.safeParse(item);
      return parsed.success ? [parsed.data] : [];
    }) : [];
  settings['exclude'] = entries(block['exclude'], exclusionSchema);
  settings['passThrough'] = entries(block['passThrough'], passThroughSchema);
  return settings as FitSettings;
}
