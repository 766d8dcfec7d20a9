/**
 * Everything astro.config.mjs and src/content.config.ts use from Correlary's sources: the settings reader, the
 * schemas they check with, the integrations and the content loaders. astro.config.mjs loads this door as one
 * bundle made by esbuild (src/loaders/configModules.mjs), which Node imports as plain JavaScript, instead of
 * through Vite's module runner, which transforms each of the ~170 TypeScript files the loaders reach one at a time,
 * once for the configuration and once more for the content configuration (about 1.5 s of CPU on every build,
 * whatever the number of correlations). Nothing here runs in the pages: they are bundled by Astro as before.
 */
export { basePathSchema, siteUrlSchema, correlationEntrySchema, handbookSettingsSchema } from '../schema/index.ts';
export { contentDirectory } from '../load/contentDirectory.ts';
export { formatDiagnostic } from '../load/diagnostic.ts';
export { readHandbookSettings } from '../load/readHandbookSettings.ts';
export { correlationFilesIntegration } from './correlationFilesIntegration.ts';
export { dataStoreIntegration } from './dataStoreIntegration.ts';
export { coreBundleIntegration } from './coreBundleIntegration.ts';
export { clientScriptsIntegration } from './clientScriptsIntegration.ts';
export { attributeEscapingIntegration } from './attributeEscapingIntegration.ts';
export { correlationLoader } from './correlationLoader.ts';
export { handbookSettingsLoader } from './handbookSettingsLoader.ts';
