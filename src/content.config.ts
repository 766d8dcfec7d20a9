// Astro content collections, read from the content directory (`content`, or the one CORRELARY_CONTENT names):
// the correlations, and the handbook's settings file as a one-entry collection. The loaders and schemas are those
// astro.config.mjs has loaded already, as one bundle (src/loaders/configModules.mjs says why). defineCollection
// comes from Astro's package export `astro/content/config`, the function `astro:content` wraps (with a check for
// live collections, which this file has none of): `astro:content` would have Vite's runner transform ~50 files of
// Astro's content runtime for it (about 0.3 s of CPU per build).
import { defineCollection } from 'astro/content/config';
import { configModules } from './loaders/configModules.mjs';

const { contentDirectory, correlationEntrySchema, correlationLoader, handbookSettingsLoader, handbookSettingsSchema } = await configModules();
const directory = contentDirectory();

export const collections = {
  correlations: defineCollection({ loader: correlationLoader({ directory }), schema: correlationEntrySchema }),
  handbook: defineCollection({ loader: handbookSettingsLoader({ directory }), schema: handbookSettingsSchema }),
};
