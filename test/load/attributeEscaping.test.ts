/**
 * Astro 5.18 writes an attribute value that is an http(s) address with '&' unescaped (quotes included); Correlary
 * removes that exception from the installed Astro's code (src/loaders/attributeEscapingIntegration.ts). The built
 * pages are checked with such a payload in test/site/twoBuilds.test.ts (hostileContent.ts).
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { escapeEveryAttribute } from '../../src/loaders/attributeEscapingIntegration.ts';

const astroRoot = path.dirname(createRequire(import.meta.url).resolve('astro/package.json'));
const installed = readFileSync(path.join(astroRoot, 'dist', 'runtime', 'server', 'render', 'util.js'), 'utf8');

describe('escapeEveryAttribute', () => {
  it("removes the installed Astro's exception for addresses, and nothing else", () => {
    const patched = escapeEveryAttribute(installed);
    expect(patched).not.toBe(installed);
    expect(patched).not.toMatch(/value\.includes\("&"\) && isHttpUrl\(value\)/);
    // One branch made dead; the rest of the module as it was.
    const at = installed.indexOf('if (typeof value === "string" && value.includes("&") && isHttpUrl(value)) {');
    expect(patched.slice(0, at)).toBe(installed.slice(0, at));
    expect(patched.slice(at)).toBe(installed.slice(at).replace('if (typeof value === "string" && value.includes("&") && isHttpUrl(value)) {', 'if (false) {'));
  });

  it('stops the build when Astro no longer has the exception in the expected form', () => {
    expect(() => escapeEveryAttribute(installed.replace('value.includes("&") && isHttpUrl(value)', 'isHttpUrl(value) && value.includes("&")'))).toThrow(/is not the one Correlary expects/);
    expect(() => escapeEveryAttribute(`${installed}\n${installed}`)).toThrow(/is not the one Correlary expects/);
  });
});
