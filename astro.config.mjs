// Astro configuration for the handbook site. No numerics live here: fitting happens in src/core,
// called from the content loader at build time.
//
// The site address and base path come from the handbook's settings file (`handbook.yaml` at the content root; see
// content/README.md). `correlary build --content DIR --base PATH` and other build tools override them:
//   CORRELARY_CONTENT  content directory (default `content`), relative to this file or absolute
//   CORRELARY_SITE     site address, e.g. https://handbook.example.org (overrides `url`)
//   CORRELARY_BASE     base path, e.g. /handbook/ (overrides `basePath`)
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { defineConfig } from 'astro/config';
import { configModules } from './src/loaders/configModules.mjs';

// Correlary's TypeScript sources come as one bundle that Node imports directly (src/loaders/configModules.mjs says
// why); src/content.config.ts takes the same modules.
const { attributeEscapingIntegration, basePathSchema, clientScriptsIntegration, contentDirectory, coreBundleIntegration, correlationFilesIntegration, dataStoreIntegration, formatDiagnostic, readHandbookSettings, siteUrlSchema } =
  await configModules();

// A BASE_URL in the environment (test runners set one) would replace import.meta.env.BASE_URL in the pages and
// point every link at the wrong base path; the base path comes from the settings below, never from there.
delete process.env.BASE_URL;

const root = fileURLToPath(new URL('.', import.meta.url));
const content = path.relative(process.cwd(), path.resolve(root, contentDirectory())) || '.';
const { settings, diagnostics } = await readHandbookSettings(content);
// The problems go into the error rather than above it: Astro retries a configuration that fails under Node through
// Vite, which would print them a second time.
if (settings === undefined) throw new Error(`the handbook settings file has ${diagnostics.length} problem(s):\n${diagnostics.map(formatDiagnostic).join('\n')}`);
for (const problem of diagnostics) console.error(formatDiagnostic(problem));

/** An override from the environment, checked like the settings file would be. */
function override(name, schema) {
  const value = process.env[name]?.trim();
  if (!value) return undefined;
  const parsed = schema.safeParse(value);
  if (!parsed.success) throw new Error(`${name}=${value}: ${parsed.error.issues[0]?.message ?? 'is not valid'}`);
  return parsed.data;
}

export default defineConfig({
  site: override('CORRELARY_SITE', siteUrlSchema) ?? settings.url,
  base: override('CORRELARY_BASE', basePathSchema) ?? settings.basePath,
  trailingSlash: 'ignore',
  // Two pages in flight: one renders while the other's HTML is written (the rendering thread otherwise waits on
  // each write; same files, N = 1000 bench: rendering 6.1 → 5.0 s back to back).
  build: { format: 'directory', concurrency: 2 },
  // Each correlation's downloads are written once by the content loader and linked in when the build is done; the
  // content store is bundled as one JSON string rather than a large literal (src/loaders/dataStoreIntegration.ts); the
  // server build takes the numerical core as one ready bundle (src/loaders/coreBundleIntegration.ts); the browser
  // scripts are bundled by esbuild while the build starts, so Astro has no client build (clientScriptsIntegration.ts).
  // Astro writes http(s) addresses with '&' in attributes unescaped; every value is escaped here
  // (attributeEscapingIntegration.ts).
  integrations: [correlationFilesIntegration(), dataStoreIntegration(), coreBundleIntegration(), clientScriptsIntegration(), attributeEscapingIntegration()],
});
