/**
 * The temperature-scale switch of a correlation page (src/client/temperatureScale.ts), in Debian's Chromium:
 * without scripts the page shows the fitted scale only (the static HTML has no switch); with scripts, choosing
 * another scale changes the equation and the coefficient table to that scale's published form (handbook.json's
 * temperatureScales), exposes the choice as data-scale on the article and a `correlary:scale` event, and keeps the
 * two switches in step; going back restores the page. The coefficients the table shows are then evaluated in
 * Python's fractions at that scale's check points and must reproduce its printed check values within their
 * tolerance (an independent evaluation of what the reader sees). The page's evaluator follows the chosen scale: a
 * value typed in K at a K check point gives that check value, and x beyond the K range is refused. Run from
 * site.test.ts on the site it builds.
 */
import { execFileSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { readFile } from 'node:fs/promises';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { serveDirectory } from './staticServer.ts';
import { CHROMIUM, launchChromium } from '../helpers/chromium.ts';


export interface ScaleContext {
  readonly siteRoot: string;
  readonly outDir: string;
  readonly base: string;
}

interface ScaleForm {
  scale: string;
  native: boolean;
  shown: boolean;
  printedCoefficients: string[];
  significantDigits: number[];
  mapped: { center: number; halfWidth: number };
  printedCheckValues: { x: number; y: string; tolerance: number }[];
  checkValues: { x: number; y: number }[];
  equation: string;
  range: { min: number; max: number };
}

export function describeScales(context: () => ScaleContext): void {
  describe('the temperature-scale switch (test/site/scaleChecks.ts)', () => {
    it('static pages show the fitted scale and carry the other scales\' forms; pages without a temperature carry none', async () => {
      const { outDir } = context();
      const json = JSON.parse(await readFile(path.join(outDir, 'handbook.json'), 'utf8')) as { correlations: { slug: string; temperatureScales: { native: string } | null }[] };
      const withScales = json.correlations.filter((item) => item.temperatureScales !== null);
      expect(withScales.length).toBeGreaterThanOrEqual(11);
      for (const item of json.correlations) {
        const html = await readFile(path.join(outDir, 'correlations', item.slug, 'index.html'), 'utf8');
        expect(html.includes('data-temperature-scales'), item.slug).toBe(item.temperatureScales !== null);
        expect(html).not.toContain('class="scale-switch"');
      }
    });

    it.skipIf(!existsSync(CHROMIUM))('switching the scale changes the equation and the coefficient table to the published form in that scale, and back', async () => {
      const { siteRoot, outDir, base } = context();
      const json = JSON.parse(await readFile(path.join(outDir, 'handbook.json'), 'utf8')) as { correlations: { slug: string; temperatureScales: { native: string; scales: ScaleForm[] } | null }[] };
      const target = json.correlations.find((item) => item.temperatureScales?.native === '°C' && item.temperatureScales.scales.every((form) => form.shown))!;
      expect(target, 'a correlation fitted in °C').toBeDefined();
      const kelvin = target.temperatureScales!.scales.find((form) => form.scale === 'K')!;
      const server = await serveDirectory(siteRoot);
      const browser = await launchChromium();
      try {
        const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
        const errors: string[] = [];
        page.on('pageerror', (error) => errors.push(String(error)));
        await page.goto(`${server.url}${base}correlations/${target.slug}/`, { waitUntil: 'networkidle' });
        await page.locator('fieldset.scale-switch').first().waitFor({ timeout: 10_000 });
        expect(await page.locator('fieldset.scale-switch').count()).toBe(2);
        expect(await page.locator('article.correlation').getAttribute('data-scale')).toBe('°C');
        const cells = () => page.locator('table.coefficients tbody tr').evaluateAll((rows) => rows.map((row) => [...(row as HTMLTableRowElement).cells].map((cell) => cell.textContent ?? '')));
        const before = await cells();
        const plainBefore = await page.locator('.equation-plain-row[data-form="printed"] code').textContent();
        await page.evaluate(() => {
          document.addEventListener('correlary:scale', (event) => ((window as unknown as { scaleEvents: unknown[] }).scaleEvents ??= []).push((event as CustomEvent).detail));
        });

        await page.locator('fieldset.scale-switch').first().getByLabel('K', { exact: true }).check();
        expect(await page.locator('article.correlation').getAttribute('data-scale')).toBe('K');
        expect(await page.evaluate(() => (window as unknown as { scaleEvents: unknown[] }).scaleEvents)).toEqual([{ scale: 'K', native: '°C' }]);
        expect(await page.locator('.equation[data-plain]').isVisible()).toBe(false);
        // The full-precision plain form is the fitted scale's; it is not shown beside another scale's equation.
        expect(await page.locator('.equation-plain-row[data-form="full"]').isVisible()).toBe(false);
        const scaled = page.locator('.equation-scaled');
        expect(await scaled.isVisible()).toBe(true);
        const after = await cells();
        expect(after.map((row) => row[1])).toEqual(kelvin.printedCoefficients);
        expect(after.map((row) => Number(row[2]))).toEqual(kelvin.significantDigits);
        expect(after).not.toEqual(before);
        // Each end of an interval is printed to the decimal place of the printed coefficient of this scale, no finer
        // (issue 12; the same rule as the native table, test/site/numberChecks.ts).
        after.forEach((row, k) => {
          if (row[4] === '—' || row[4] === undefined) return;
          const place = Math.floor(Math.log10(Math.abs(Number(row[1])))) - kelvin.significantDigits[k]! + 1;
          for (const end of row[4].split(' to ')) {
            const [mantissa, exponent] = end.split(/e/i);
            expect(Number(exponent ?? 0) - (mantissa!.split('.')[1]?.length ?? 0), `a${k}: ${row[4]}`).toBeGreaterThanOrEqual(place);
          }
        });
        const plainAfter = await page.locator('.equation-plain-row[data-form="printed"] code').textContent();
        expect(plainAfter).not.toBe(plainBefore);
        expect(plainAfter).toBe(kelvin.equation);
        expect(await scaled.textContent()).toContain(plainAfter!);
        expect(await page.locator('[data-mapped-center]').textContent()).toBe(String(kelvin.mapped.center));
        // The other switch follows.
        expect(await page.locator('fieldset.scale-switch').nth(1).getByLabel('K', { exact: true }).isChecked()).toBe(true);

        // Independent check of what the reader now sees: the table's K coefficients, evaluated exactly in Python,
        // reproduce the K printed check values of handbook.json within their tolerance.
        const printedValues = JSON.parse(
          execFileSync('python3', ['-c', 'import json, sys\nfrom fractions import Fraction as F\njob = json.load(sys.stdin)\nprint(json.dumps([float(sum(F(a) * F(x) ** k for k, a in enumerate(job["a"]))) for x in job["x"]]))'], {
            input: JSON.stringify({ a: after.map((row) => row[1]), x: kelvin.printedCheckValues.map((check) => String(check.x)) }),
            encoding: 'utf8',
          }),
        ) as number[];
        kelvin.printedCheckValues.forEach((check, i) => expect(Math.abs(printedValues[i]! - Number(check.y)), `K check at ${check.x}`).toBeLessThanOrEqual(check.tolerance));

        // The evaluator follows: x is read in K, its range is K's, and y at a K check point is that check value.
        const check = kelvin.checkValues[2]!;
        await page.locator('#evaluator-x').fill(String(check.x));
        await page.getByRole('button', { name: 'Evaluate', exact: true }).click();
        const values = page.locator('#evaluator-result .evaluator-values');
        await values.waitFor({ timeout: 5_000 });
        expect(Math.abs(Number(await values.getAttribute('data-y')) - check.y) / Math.abs(check.y), `evaluator at ${check.x} K`).toBeLessThan(1e-12);
        expect(await page.locator('#evaluator-range').textContent()).toContain(`${kelvin.range.min} to ${kelvin.range.max} K`);
        await page.locator('#evaluator-x').fill(String(kelvin.range.max + 1));
        await page.getByRole('button', { name: 'Evaluate', exact: true }).click();
        await page.locator('#evaluator-result .evaluator-refused').waitFor({ timeout: 5_000 });

                await page.locator('fieldset.scale-switch').nth(1).getByLabel('°C (fitted)').check();
        expect(await page.locator('article.correlation').getAttribute('data-scale')).toBe('°C');
        expect(await cells()).toEqual(before);
        expect(await page.locator('.equation-plain-row[data-form="printed"] code').textContent()).toBe(plainBefore);
        expect(await page.locator('.equation[data-plain]').isVisible()).toBe(true);
        expect(await page.locator('.equation-plain-row[data-form="full"]').isVisible()).toBe(true);
        expect(await page.locator('.equation-scaled').isVisible()).toBe(false);
        expect(errors).toEqual([]);
      } finally {
        await browser.close();
        await server.close();
      }
    });
  });
}
