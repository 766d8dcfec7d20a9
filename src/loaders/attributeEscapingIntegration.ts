/**
 * Astro integration that makes Astro escape every attribute value. Astro 5.18 writes an attribute value that is an
 * http(s) address containing '&' without escaping it (astro/dist/runtime/server/render/util.js, addAttribute: so
 * that '&' in a query stays '&'), quotes included: a title, name or unit from the content such as
 * `https://x.example/?a&b="><img src=x onerror=…>` parses as such an address and would close the attribute and add
 * an element to the page. This removes that exception from Astro's code as the server build (and `astro dev`)
 * loads it, so such values are escaped like any other ('&' as `&#38;`, '"' as `&#34;`; a browser reads the same
 * address back). When Astro's code no longer has the exception in the form expected, the build stops rather than
 * publish pages that may be unsafe.
 */
import type { AstroIntegration } from 'astro';

/** Astro's module that writes attributes, as Vite names it (a path, perhaps with a query). */
const ATTRIBUTE_MODULE = /[\\/]astro[\\/]dist[\\/]runtime[\\/]server[\\/]render[\\/]util\.js(?:\?.*)?$/;
/** The exception, exactly as Astro 5.18 writes it. */
const UNESCAPED_URL = 'if (typeof value === "string" && value.includes("&") && isHttpUrl(value)) {';

/**
 * Astro's attribute code without the exception for addresses.
 * @throws Error when the code does not hold the exception exactly once (Astro changed: check it by hand)
 * @example escapeEveryAttribute(code).includes('isHttpUrl(value)) {') // => false
 */
export function escapeEveryAttribute(code: string): string {
  const at = code.indexOf(UNESCAPED_URL);
  if (at < 0 || code.indexOf(UNESCAPED_URL, at + 1) >= 0) {
    throw new Error(
      "Astro's attribute code (astro/dist/runtime/server/render/util.js) is not the one Correlary expects: it writes http(s) addresses with '&' unescaped in Astro 5.18, and Correlary removes that exception (src/loaders/attributeEscapingIntegration.ts). Check the installed Astro and update that file",
    );
  }
  // Same length of code, the branch never taken: every value goes through the escaping below it.
  return `${code.slice(0, at)}if (false) {${code.slice(at + UNESCAPED_URL.length)}`;
}

/** @example defineConfig({ integrations: [attributeEscapingIntegration()] }) */
export function attributeEscapingIntegration(): AstroIntegration {
  return {
    name: 'correlary-attribute-escaping',
    hooks: {
      'astro:config:setup': ({ updateConfig }) => {
        updateConfig({
          vite: {
            plugins: [
              {
                name: 'correlary-attribute-escaping',
                transform(code: string, id: string) {
                  if (!ATTRIBUTE_MODULE.test(id)) return null;
                  return { code: escapeEveryAttribute(code), map: null };
                },
              },
            ],
          },
        });
      },
    },
  };
}
