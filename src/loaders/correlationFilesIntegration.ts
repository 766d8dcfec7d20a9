/**
 * Astro integration for the per-correlation files (src/loaders/correlationFiles.ts): in a build, links (or copies)
 * the files the content loader wrote into the output when the pages are done; under `astro dev`, serves them through one
 * route (src/routes/correlationFile.ts) computed on request from the same functions.
 */
import { fileURLToPath } from 'node:url';
import type { AstroIntegration } from 'astro';
import { copyCorrelationFiles, filesWorkerSource } from './correlationFiles.ts';
import { fitWorkerSource } from '../load/fitPool.ts';
import { sourcesVersion } from '../load/fitCodeVersion.ts';
import { workerBundles } from '../load/workerBundle.ts';
import { coreBundleSource } from './coreBundleIntegration.ts';
import { beginFiles, filesWritten } from './pendingFiles.ts';
import { correlationFilesFolder } from './correlationFilesFolder.ts';

/** @example defineConfig({ integrations: [correlationFilesIntegration()] }) */
export function correlationFilesIntegration(): AstroIntegration {
  let folder = '';
  return {
    name: 'correlary-correlation-files',
    hooks: {
      'astro:config:setup': ({ command, config, injectRoute }) => {
        // From the project root, not from this file: it runs from a bundle in node_modules/.cache (configModules.mjs).
        if (command === 'dev') injectRoute({ pattern: '/correlations/[slug]/[file]', entrypoint: fileURLToPath(new URL('src/routes/correlationFile.ts', config.root)) });
        // A build fits and writes files in worker threads run from bundles of their code, and its server build
        // takes the core as a bundle (coreBundleIntegration.ts): have esbuild make any missing bundle now, all in
        // one run (they share most of their sources), in its own process, while Astro starts up, rather than when
        // the loader needs it.
        if (command === 'build') {
          const root = fileURLToPath(config.root);
          const folder = fileURLToPath(new URL('correlary-worker/', config.cacheDir));
          void workerBundles([fitWorkerSource(root), filesWorkerSource(root), coreBundleSource(root)], sourcesVersion(root), folder);
        }
      },
      // The downloads the loader prepared start being written once Astro has synced the content and saved its store
      // (see pendingFiles.ts): the build starts after that. They are written while Astro bundles the code and
      // renders; each correlation page waits for its own folder (it reads the page parts written there).
      'astro:build:start': () => {
        beginFiles();
      },
      'astro:config:done': ({ config }) => {
        folder = correlationFilesFolder(config.cacheDir);
      },
      'astro:build:done': async ({ dir, logger }) => {
        await filesWritten();
        // Hard links to the cache's files (no bytes copied); copies where the output is on another file system.
        const { copied } = await copyCorrelationFiles(folder, fileURLToPath(dir));
        if (copied > 0) logger.info(`copied ${copied} correlation files into the output (hard links were not possible there)`);
      },
    },
  };
}
