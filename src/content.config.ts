// Astro content collections, read from the content directory (`content`, or the one CORRELARY_CONTENT names):
// the correlations, and the handbook's settings file as a one-entry collection.
import { defineCollection } from 'astro:content';
import { contentDirectory } from './load/contentDirectory.ts';
import { correlationLoader } from './loaders/correlationLoader.ts';
import { handbookSettingsLoader } from './loaders/handbookSettingsLoader.ts';
import { correlationEntrySchema, handbookSettingsSchema } from './schema/index.ts';

const directory = contentDirectory();

export const collections = {
  correlations: defineCollection({ loader: correlationLoader({ directory }), schema: correlationEntrySchema }),
  handbook: defineCollection({ loader: handbookSettingsLoader({ directory }), schema: handbookSettingsSchema }),
};
