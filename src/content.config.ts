// Astro content collections: one collection, read from content/ by the handbook loader.
import { defineCollection } from 'astro:content';
import { correlationLoader } from './loaders/correlationLoader.ts';
import { correlationEntrySchema } from './schema/index.ts';

export const collections = {
  correlations: defineCollection({ loader: correlationLoader(), schema: correlationEntrySchema }),
};
