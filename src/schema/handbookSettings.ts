/**
 * The handbook's own settings, `content/handbook.yaml` at the root of the content directory (beside the correlation
 * folders, never inside one). Every key is optional; without the file the handbook is called "Correlary handbook"
 * and is built for http://localhost:4321/. Field list and meaning: every key below carries its documentation in
 * JSDoc and `.describe()`; content/README.md lists them for users.
 */
import { z } from 'zod';

/** Name of the settings file at the content root. */
export const HANDBOOK_SETTINGS_FILE = 'handbook.yaml';

/** Title used when the settings file gives none. */
export const DEFAULT_HANDBOOK_TITLE = 'Correlary handbook';

/** Site URL used when the settings file gives none: the local preview server. */
export const DEFAULT_SITE_URL = 'http://localhost:4321';

/** Characters allowed in one segment of the base path: letters, digits and - . _ ~ (no spaces, no encoding). */
const BASE_SEGMENT = /^[A-Za-z0-9._~-]+$/;

/** The base path: "/" or "/segment/…/", each segment plain URL characters and not "." or "..". */
export const basePathSchema = z
  .string()
  .trim()
  .refine((value) => value.startsWith('/'), 'must start with "/", e.g. /handbook/')
  .refine(
    (value) => value.split('/').filter((segment) => segment !== '').every((segment) => BASE_SEGMENT.test(segment) && segment !== '.' && segment !== '..'),
    'may hold only letters, digits and - . _ ~ between the slashes, e.g. /thermal/handbook/',
  )
  .describe('Path the site is served under, e.g. / or /handbook/');

/** The site URL: absolute http or https, with no query or fragment. */
export const siteUrlSchema = z
  .string()
  .trim()
  .refine((value) => {
    try {
      const url = new URL(value);
      return (url.protocol === 'http:' || url.protocol === 'https:') && url.search === '' && url.hash === '' && url.username === '' && url.password === '';
    } catch {
      return false;
    }
  }, 'must be an absolute http:// or https:// address with no query, fragment or password, e.g. https://handbook.example.org')
  .describe('Address the site is published at, without the base path');

/** The settings file. Unknown keys are errors, so a misspelt key is never silently ignored. */
export const handbookSettingsSchema = z
  .object({
    /** Name of the handbook, shown in the page header and in every page title. Defaults to "Correlary handbook". */
    title: z.string().trim().min(1, 'must not be empty').max(120, 'must be at most 120 characters').default(DEFAULT_HANDBOOK_TITLE).describe('Name of the handbook'),
    /** Who publishes it, e.g. "Thermal Design Group". Shown in the header and the footer. Optional. */
    organisation: z.string().trim().min(1, 'must not be empty').max(200, 'must be at most 200 characters').optional().describe('Publishing organisation'),
    /**
     * Address the built site is published at, e.g. https://handbook.example.org, without the base path. Used for
     * absolute links and the canonical address of every page. Defaults to http://localhost:4321 (the preview).
     */
    url: siteUrlSchema.default(DEFAULT_SITE_URL),
    /** Path under that address, e.g. /handbook/ when the site lives at https://example.org/handbook/. Defaults to /. */
    basePath: basePathSchema.default('/'),
    /** A short notice printed on every page above the cautions, e.g. a distribution restriction. Optional. */
    notice: z.string().trim().min(1, 'must not be empty').max(1000, 'must be at most 1000 characters').optional().describe('Notice printed on every page'),
  })
  .strict();

export type HandbookSettings = z.output<typeof handbookSettingsSchema>;
