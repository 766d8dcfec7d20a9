// Astro configuration for the handbook site. No numerics live here: fitting happens in src/core,
// called from the content loader at build time.
import { defineConfig } from 'astro/config';

export default defineConfig({
  site: 'http://localhost:4321',
  trailingSlash: 'ignore',
  build: { format: 'directory' },
});
