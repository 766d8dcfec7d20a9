/**
 * The page's evaluator and the snippets' copy buttons in Debian's Chromium (playwright-core), on the site that
 * site.test.ts builds.
 *
 * Evaluator: values are typed into the form and the answer (the full-precision numbers the result carries in its
 * data attributes, and its text) is compared with an independent computation in python3: the correlation's
 * downloaded Python snippet, run for real (evaluate, prediction_interval inside the range), and, from the
 * snippet's published coefficients and covariance, y and both intervals recomputed with Python's fractions module
 * (exact Horner sum and exact φᵀΣφ from the double t, then one square root and the back-transform in floating point).
 * Outside the range it must refuse and repeat the caution; with "Evaluate outside the validity range" ticked it
 * must show the value under a visible extrapolation warning.
 *
 * Copy buttons: each snippet's button puts exactly the text of the downloaded snippet file on the clipboard.
 */
import { execFileSync } from 'node:child_process';
import { readFile } from 'node:fs/promises';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import type { LoadedCorrelation } from '../../src/load/index.ts';
import { serveDirectory } from './staticServer.ts';
import { CHROMIUM, launchChromium } from '../helpers/chromium.ts';
import { relativeError } from '../helpers/publishedCorrelations.ts';


export interface EvaluatorContext {
  readonly siteRoot: string;
  readonly outDir: string;
  readonly base: string;
  readonly correlations: readonly LoadedCorrelation[];
}

interface PythonAnswer {
  readonly x: number;
  /** From the snippet's own functions (null outside the range, where they refuse). */
  readonly snippet: { y: number; pi: [number, number] } | null;
  /** From fractions. */
  readonly y: number;
  readonly ci: [number, number];
  readonly pi: [number, number];
}

/** y, intervals at each x from the downloaded Python snippet and from fractions (see the file comment). */
function pythonAnswers(snippetFile: string, transformX: string, transformY: string, xs: readonly number[]): PythonAnswer[] {
  const script = `
import importlib.util, json, math, sys
from fractions import Fraction as F
spec = importlib.util.spec_from_file_location("snippet", sys.argv[1])
m = importlib.util.module_from_spec(spec)
spec.loader.exec_module(m)
out = []
for x in json.loads(sys.argv[2]):
    u = 1.0 / x if "${transformX}" == "reciprocal" else (math.log(x) if "${transformX}" == "log" else x)
    t = F((u - m.CENTER) / m.HALF_WIDTH)
    v = F(0)
    for b in reversed(m.B):
        v = v * t + F(b)
    phi = [t ** k for k in range(len(m.B))]
    var_fit = sum(phi[j] * F(m.COVARIANCE[j][k]) * phi[k] for j in range(len(m.B)) for k in range(len(m.B)))
    ci = m.QUANTILE * math.sqrt(max(0.0, float(var_fit)))
    pi = m.QUANTILE * math.sqrt(max(0.0, float(var_fit)) + m._noise_sd(x) ** 2)
    back = math.exp if "${transformY}" == "log" else (lambda value: value)
    vf = float(v)
    inside = m.X_MIN <= x <= m.X_MAX
    out.append({"x": x, "y": back(vf), "ci": [back(vf - ci), back(vf + ci)], "pi": [back(vf - pi), back(vf + pi)],
                "snippet": {"y": m.evaluate(x), "pi": list(m.prediction_interval(x))} if inside else None})
print(json.dumps(out))
`;
  return JSON.parse(execFileSync('python3', ['-c', script, snippetFile, JSON.stringify(xs)], { encoding: 'utf8' })) as PythonAnswer[];
}

/** Register the evaluator and copy-button checks; `context` is called once the site is built. */
export function describeEvaluator(context: () => EvaluatorContext): void {
  describe(`the evaluator and the snippet copy buttons in Chromium (${CHROMIUM})`, () => {
    let given: EvaluatorContext;
    let browser: Browser | undefined;
    let server: { url: string; close: () => Promise<void> } | undefined;

    beforeAll(async () => {
      given = context();
      server = await serveDirectory(given.siteRoot);
      browser = await launchChromium();
    }, 60_000);

    afterAll(async () => {
      await browser?.close();
      await server?.close();
    });

    async function open(target: LoadedCorrelation, browserContext?: BrowserContext): Promise<{ page: Page; errors: string[] }> {
      const page = await (browserContext ?? browser!).newPage({ viewport: { width: 1280, height: 900 } });
      const errors: string[] = [];
      page.on('pageerror', (error) => errors.push(String(error)));
      page.on('console', (message) => {
        if (message.type() === 'error') errors.push(message.text());
      });
      await page.goto(`${server!.url}${given.base}correlations/${target.slug}/`, { waitUntil: 'networkidle' });
      return { page, errors };
    }

    async function evaluate(page: Page, x: string): Promise<void> {
      await page.locator('#evaluator-x').fill(x);
      await page.getByRole('button', { name: 'Evaluate', exact: true }).click();
    }

    /** The full-precision numbers of the shown value. */
    async function shown(page: Page): Promise<{ x: number; y: number; ci: [number, number]; pi: [number, number]; text: string }> {
      const values = page.locator('#evaluator-result .evaluator-values');
      await values.waitFor({ state: 'visible', timeout: 5_000 });
      const data = await values.evaluate((node) => ({ ...(node as HTMLElement).dataset }));
      return {
        x: Number(data['x']),
        y: Number(data['y']),
        ci: [Number(data['confidenceLow']), Number(data['confidenceHigh'])],
        pi: [Number(data['predictionLow']), Number(data['predictionHigh'])],
        text: (await values.textContent()) ?? '',
      };
    }

    // Transformed (ln p against 1/T) and plain fits: the evaluator must apply the transforms.
    const targets = () => {
      const transformed = given.correlations.find((c) => c.meta.fit.transform.x === 'reciprocal' && c.meta.fit.transform.y === 'log');
      const plain = given.correlations.find((c) => c.meta.fit.transform.x === 'identity' && c.meta.fit.transform.y === 'identity' && c.meta.fit.weights !== 'uncertainty');
      const weighted = given.correlations.find((c) => c.meta.fit.weights === 'uncertainty');
      return [transformed, plain, weighted].filter((c): c is LoadedCorrelation => c !== undefined);
    };

    it('typed x gives y and both 95 % intervals as the Python snippet and an exact fractions computation give them; units and the live region are there', async () => {
      expect(targets().length).toBeGreaterThanOrEqual(2);
      let worst = 0;
      for (const target of targets()) {
        const { min, max } = target.range;
        const xs = [min, min + (max - min) * 0.3183, (min + max) / 2, max];
        const snippetFile = path.join(given.outDir, 'correlations', target.slug, `${target.slug.replace(/-/g, '_')}.py`);
        const expected = pythonAnswers(snippetFile, target.meta.fit.transform.x, target.meta.fit.transform.y, xs);
        const { page, errors } = await open(target);
        const input = page.getByLabel(new RegExp(`^${target.meta.variable.name}`));
        expect(await input.getAttribute('id')).toBe('evaluator-x');
        expect(await page.locator('#evaluator-result').getAttribute('aria-live')).toBe('polite');
        for (const [i, x] of xs.entries()) {
          await evaluate(page, String(x));
          await page.locator(`#evaluator-result .evaluator-values[data-x="${x}"]`).waitFor({ timeout: 5_000 });
          const answer = await shown(page);
          const reference = expected[i]!;
          const errorsAtX = [
            relativeError(answer.y, reference.y),
            ...answer.ci.map((value, k) => relativeError(value, reference.ci[k]!)),
            ...answer.pi.map((value, k) => relativeError(value, reference.pi[k]!)),
            relativeError(answer.y, reference.snippet!.y),
            ...answer.pi.map((value, k) => relativeError(value, reference.snippet!.pi[k]!)),
          ];
          worst = Math.max(worst, ...errorsAtX);
          expect(Math.max(...errorsAtX), `${target.slug} at ${x}: ${JSON.stringify({ answer, reference })}`).toBeLessThanOrEqual(1e-12);
          expect(answer.ci[0]).toBeLessThan(answer.y);
          expect(answer.pi[0]).toBeLessThan(answer.ci[0]);
          const unit = target.meta.property.unit === '1' ? '' : ` ${target.meta.property.unit}`;
          expect(answer.text).toContain(`95 % confidence interval of the correlation:`);
          expect(answer.text).toContain(`95 % prediction interval for a new measurement:`);
          expect(answer.text).toMatch(new RegExp(`${target.meta.property.name} = \\S+${unit.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')} at`));
          expect(await page.locator('.evaluator-warning').count()).toBe(0);
        }
        expect(errors).toEqual([]);
        await page.close();
      }
      console.log(`evaluator in Chromium vs python3 (snippet and fractions): worst relative difference ${worst.toExponential(1)}`);
    });

    it('outside the range it refuses and repeats the caution; "Evaluate outside the validity range" shows the value under a warning that stays beside it', async () => {
      const target = targets()[0]!;
      const { min, max } = target.range;
      const x = max + (max - min) * 0.05;
      const { page, errors } = await open(target);
      await evaluate(page, String(x));
      const refused = page.locator('#evaluator-result .evaluator-refused');
      await refused.waitFor({ state: 'visible', timeout: 5_000 });
      const text = (await refused.textContent()) ?? '';
      expect(text).toContain(`is outside the validity range ${min}`);
      expect(text).toContain('(the fitted range); outside it the correlation is an extrapolation and may be badly wrong.');
      expect(text).toContain('Not for design use without checking against the applicable codes and standards');
      expect(await page.locator('#evaluator-result .evaluator-values').count()).toBe(0);

      await page.getByLabel('Evaluate outside the validity range').check();
      const warning = page.locator('#evaluator-result .evaluator-warning');
      await warning.waitFor({ state: 'visible', timeout: 5_000 });
      expect(await warning.textContent()).toMatch(/^EXTRAPOLATION — NOT VALID\./);
      const answer = await shown(page);
      expect(answer.x).toBe(x);
      const [reference] = pythonAnswers(path.join(given.outDir, 'correlations', target.slug, `${target.slug.replace(/-/g, '_')}.py`), target.meta.fit.transform.x, target.meta.fit.transform.y, [x]);
      expect(relativeError(answer.y, reference!.y), `${target.slug} at ${x}`).toBeLessThanOrEqual(1e-12);
      expect(reference!.snippet).toBeNull();
      // The warning and the value are in the same result region, both visible, the warning first.
      const [warningBox, valueBox] = [await warning.boundingBox(), await page.locator('#evaluator-result .evaluator-values').boundingBox()];
      expect(warningBox!.y).toBeLessThan(valueBox!.y);
      expect(valueBox!.y - (warningBox!.y + warningBox!.height)).toBeLessThan(100);
      // Unticking refuses again.
      await page.getByLabel('Evaluate outside the validity range').uncheck();
      await refused.waitFor({ state: 'visible', timeout: 5_000 });
      expect(await page.locator('#evaluator-result .evaluator-warning').count()).toBe(0);
      expect(errors).toEqual([]);
      await page.close();
    });

    it('each snippet copy button puts exactly the downloaded snippet file on the clipboard', async () => {
      const target = targets()[0]!;
      const browserContext = await browser!.newContext({ viewport: { width: 1280, height: 900 } });
      await browserContext.grantPermissions(['clipboard-read', 'clipboard-write'], { origin: server!.url });
      const { page, errors } = await open(target, browserContext);
      const sections = page.locator('.code-snippets details');
      // Python, JavaScript, C and the spreadsheet formula at least (the TypeScript declarations may be a download only).
      const count = await sections.count();
      expect(count).toBe(4);
      expect(await page.locator('.code-snippets a[download][href$=".d.mts"]').count()).toBe(1);
      for (let i = 0; i < count; i++) {
        const details = sections.nth(i);
        const file = (await details.locator('summary code').textContent())!;
        await details.locator('summary').click();
        const button = details.getByRole('button', { name: 'Copy' });
        await button.click();
        await details.getByRole('button', { name: 'Copied' }).waitFor({ timeout: 5_000 });
        const copied = await page.evaluate(() => navigator.clipboard.readText());
        const downloaded = await readFile(path.join(given.outDir, 'correlations', target.slug, file), 'utf8');
        expect(copied, file).toBe(downloaded);
        // The download link on the page points at that file.
        expect(await details.locator('a[download]').first().getAttribute('href')).toBe(`${given.base}correlations/${target.slug}/${file}`);
      }
      expect(errors).toEqual([]);
      await browserContext.close();
    });
  });
}
