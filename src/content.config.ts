// Astro content collections, read from the content directory (`content`, or the one CORRELARY_CONTENT names):
// the correlations, and the handbook's settings file as a one-entry collection. The loaders and schemas are those
// astro.config.mjs has loaded already, as one bundle (src/loaders/configModules.mjs says why).
import { defineCollection } from 'astro:content';
import { configModules } from './loaders/configModules.mjs';

const { contentDirectory, correlationEntrySchema, correlationLoader, handbookSettingsLoader, handbookSettingsSchema } = await configModules();
const directory = contentDirectory();

export const collections = {
  correlations: defineCollection({ loader: correlationLoader({ directory }), schema: correlationEntrySchema }),
  handbook: defineCollection({ loader: handbookSettingsLoader({ directory }), schema: handbookSettingsSchema }),
};
