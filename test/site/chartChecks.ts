/**
 * The fit chart in Debian's Chromium (playwright-core), run from site.test.ts on the site it builds:
 * - the "as fitted" switch of a transformed fit (ln p against 1/T in the demo): the axis titles change to the
 *   fitted coordinates and back, and what is drawn — points, fitted curve and residuals — sits where an
 *   independent computation puts it: Python's decimal module (40 digits) evaluates u = 1/x (or ln x, or x),
 *   v = ln y (or y) and the residual v − Σ aₖ uᵏ from the data as read and the full-precision coefficients of the
 *   page's coefficients.json. Drawn positions are read back through the axes' own tick marks (value ↔ pixel), so
 *   nothing of the chart's code is reused to check it;
 * - the hover read-out stays inside the plot near every edge and corner, on a wide and a narrow screen, and gives
 *   the units of x and y.
 */
import { execFileSync } from 'node:child_process';
import { readFile } from 'node:fs/promises';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Locator, Page } from 'playwright-core';
import type { LoadedCorrelation } from '../../src/load/index.ts';
import { serveDirectory } from './staticServer.ts';
import { CHROMIUM, launchChromium } from '../helpers/chromium.ts';


export interface ChartContext {
  readonly siteRoot: string;
  readonly outDir: string;
  readonly base: string;
  readonly correlations: readonly LoadedCorrelation[];
}

/**
 * Pixel ↔ value of one axis, from its first and last tick (a d3 axis writes ticks as translate(…) and a label;
 * d3-axis 3 shifts every tick by half a pixel on screens with devicePixelRatio ≤ 1, for crisp lines).
 */
async function axisOf(axis: Locator, vertical: boolean): Promise<{ value: (pixel: number) => number }> {
  const { ticks, offset } = await axis.evaluate((node) => ({
    ticks: [...node.querySelectorAll('g.tick')].map((tick) => ({ transform: tick.getAttribute('transform') ?? '', label: tick.textContent ?? '' })),
    offset: window.devicePixelRatio > 1 ? 0 : 0.5,
  }));
  const parsed = ticks.map((tick) => {
    const [, a, b] = /translate\(([-\d.e]+),\s*([-\d.e]+)\)/.exec(tick.transform)!;
    return { pixel: Number(vertical ? b : a) - offset, value: Number(tick.label.replace('\u2212', '-')) };
  });
  expect(parsed.length).toBeGreaterThanOrEqual(2);
  const first = parsed[0]!;
  const last = parsed[parsed.length - 1]!;
  const slope = (last.value - first.value) / (last.pixel - first.pixel);
  return { value: (pixel) => first.value + (pixel - first.pixel) * slope };
}

/** Axis titles (the text elements drawn by the chart, not the tick labels) of one of the chart's two plots. */
function titles(svg: Locator): Promise<string[]> {
  return svg.locator('g.axes > text').allTextContents();
}

/** u, v, residuals and the curve at given u, in Python's decimal arithmetic (40 digits). */
function pythonFittedSpace(input: { transformX: string; transformY: string; coefficients: number[]; x: number[]; y: number[]; curveU: number[] }): { u: number[]; v: number[]; residual: number[]; curveV: number[] } {
  const script = `
import json, sys
from decimal import Decimal as D, getcontext
getcontext().prec = 40
data = json.loads(sys.stdin.read())
a = [D(c) for c in data["coefficients"]]
def U(x):
    x = D(x)
    return 1 / x if data["transformX"] == "reciprocal" else (x.ln() if data["transformX"] == "log" else x)
def V(y):
    y = D(y)
    return y.ln() if data["transformY"] == "log" else y
def P(u):
    return sum(c * u ** k for k, c in enumerate(a))
u = [U(x) for x in data["x"]]
v = [V(y) for y in data["y"]]
print(json.dumps({"u": [float(t) for t in u], "v": [float(t) for t in v], "residual": [float(vi - P(ui)) for ui, vi in zip(u, v)], "curveV": [float(P(D(t))) for t in data["curveU"]]}))`;
  const stdin = JSON.stringify({ ...input, coefficients: input.coefficients.map(String), x: input.x.map(String), y: input.y.map(String), curveU: input.curveU.map(String) });
  return JSON.parse(execFileSync('python3', ['-c', script], { input: stdin, encoding: 'utf8' }));
}

export function describeChart(context: () => ChartContext): void {
  let browser: Browser | undefined;
  let server: { url: string; close: () => Promise<void> } | undefined;

  beforeAll(async () => {
    server = await serveDirectory(context().siteRoot);
    browser = await launchChromium();
  }, 60_000);

  afterAll(async () => {
    await browser?.close();
    await server?.close();
  });

  async function open(slug: string, width = 1280): Promise<{ page: Page; errors: string[] }> {
    const page = await browser!.newPage({ viewport: { width, height: 900 } });
    const errors: string[] = [];
    page.on('pageerror', (error) => errors.push(String(error)));
    page.on('console', (message) => {
      if (message.type() === 'error') errors.push(message.text());
    });
    await page.goto(`${server!.url}${context().base}correlations/${slug}/`, { waitUntil: 'networkidle' });
    await page.locator('[data-fit-chart] svg').first().waitFor({ timeout: 10_000 });
    return { page, errors };
  }

  it('a transformed fit switches to its fitted coordinates: axis titles, points, curve and residuals where Python puts them', async () => {
    const { correlations, outDir } = context();
    const target =
      correlations.find((c) => c.meta.fit.transform.x === 'reciprocal' && c.meta.fit.transform.y === 'log') ??
      correlations.find((c) => c.meta.fit.transform.x !== 'identity' || c.meta.fit.transform.y !== 'identity');
    expect(target, 'the built handbook has a transformed fit (the demo has ln p against 1/T)').toBeDefined();
    const plain = correlations.find((c) => c.meta.fit.transform.x === 'identity' && c.meta.fit.transform.y === 'identity')!;
    const record = JSON.parse(await readFile(path.join(outDir, 'correlations', target!.slug, 'coefficients.json'), 'utf8'));
    const { variable, property } = target!.meta;
    const { page, errors } = await open(target!.slug);
    const svgs = page.locator('[data-fit-chart] svg');
    const [main, lower] = [svgs.nth(0), svgs.nth(1)];
    await main.scrollIntoViewIfNeeded();
    const measuredTitles = await titles(main);
    expect(measuredTitles.join(' | ')).toContain(`(${variable.unit})`);

    await page.locator('[data-fitted-coordinates]').check();
    const xSymbol = variable.symbol.replace(/\\/g, '');
    const mainTitles = (await titles(main)).join(' | ');
    const lowerTitles = (await titles(lower)).join(' | ');
    // The titles name the fitted coordinates, e.g. "1/T (1/K)" and "ln(p_σ / kPa)".
    if (target!.meta.fit.transform.x === 'reciprocal') expect(mainTitles).toContain(`1/${xSymbol} (1/${variable.unit})`);
    if (target!.meta.fit.transform.y === 'log') {
      expect(mainTitles).toMatch(new RegExp(`ln\\([^)]* / ${property.unit.replace(/[.*+?^${}()|[\]\\/]/g, '\\$&')}\\)`));
      expect(lowerTitles).toContain('ln y − ln ŷ');
    }
    expect(mainTitles).not.toBe(measuredTitles.join(' | '));

    // Positions drawn, read back through the axes' ticks.
    const [xAxis, yAxis] = [main.locator('g.axes > g').nth(0), main.locator('g.axes > g').nth(1)];
    const u = await axisOf(xAxis, false);
    const v = await axisOf(yAxis, true);
    const r = await axisOf(lower.locator('g.axes > g').nth(1), true);
    const ru = await axisOf(lower.locator('g.axes > g').nth(0), false);
    const circles = (locator: Locator) => locator.locator('g.points circle').evaluateAll((nodes) => nodes.map((node) => [Number(node.getAttribute('cx')), Number(node.getAttribute('cy'))] as const));
    const drawnPoints = (await circles(main)).map(([cx, cy]) => [u.value(cx), v.value(cy)]);
    const drawnResiduals = (await circles(lower)).map(([cx, cy]) => [ru.value(cx), r.value(cy)]);
    const curveD = (await main.locator('path.curve').getAttribute('d'))!;
    const vertices = [...curveD.matchAll(/[ML]([-\d.e]+),([-\d.e]+)/g)].map((m) => [u.value(Number(m[1])), Number(m[2])] as const);
    expect(vertices.length).toBeGreaterThan(50);

    const python = pythonFittedSpace({
      transformX: target!.meta.fit.transform.x,
      transformY: target!.meta.fit.transform.y,
      coefficients: record.coefficients,
      x: target!.used.map((point) => point.x),
      y: target!.used.map((point) => point.y),
      curveU: vertices.map(([cu]) => cu),
    });
    expect(drawnPoints).toHaveLength(target!.used.length);
    expect(drawnResiduals).toHaveLength(target!.used.length);
    const uSpan = Math.max(...python.u) - Math.min(...python.u);
    const vSpan = Math.max(...python.v) - Math.min(...python.v);
    const rSpan = Math.max(...python.residual.map(Math.abs));
    drawnPoints.forEach(([du, dv], i) => {
      expect(Math.abs(du! - python.u[i]!), `point ${i} u`).toBeLessThan(1e-6 * uSpan);
      expect(Math.abs(dv! - python.v[i]!), `point ${i} v`).toBeLessThan(1e-6 * vSpan);
    });
    // The residuals drawn are the fitted-space residuals v − Σ aₖ uᵏ (to a millionth of the largest).
    drawnResiduals.forEach(([du, dr], i) => {
      expect(Math.abs(du! - python.u[i]!), `residual ${i} u`).toBeLessThan(1e-6 * uSpan);
      expect(Math.abs(dr! - python.residual[i]!), `residual ${i}: drawn ${dr}, Python ${python.residual[i]}`).toBeLessThan(1e-4 * rSpan);
    });
    // The curve is the polynomial in u: each vertex within 0.05 px of Σ aₖ uᵏ (the path is written to 0.01 px).
    const unitsPerPixel = Math.abs(v.value(1) - v.value(0));
    vertices.forEach(([, py], i) => {
      expect(Math.abs(v.value(py) - python.curveV[i]!) / unitsPerPixel, `curve vertex ${i}`).toBeLessThan(0.05);
    });

    // And back to the measured coordinates.
    await page.locator('[data-fitted-coordinates]').uncheck();
    expect(await titles(main)).toEqual(measuredTitles);
    expect(errors).toEqual([]);
    await page.close();

    // An untransformed fit has nothing to switch.
    const other = await open(plain.slug);
    expect(await other.page.locator('[data-fitted-coordinates]').count()).toBe(0);
    await other.page.close();
  });

  it('the hover read-out stays inside the plot near every edge, on a wide and a narrow screen, and gives the units of x and y', async () => {
    const { correlations } = context();
    const target = correlations.find((c) => c.meta.variable.unit !== '1' && c.meta.property.unit !== '1' && c.used.length <= 400)!;
    const { variable, property } = target.meta;
    for (const width of [1280, 420]) {
      const { page, errors } = await open(target.slug, width);
      const main = page.locator('[data-fit-chart] svg').first();
      await main.scrollIntoViewIfNeeded();
      const box = (await main.boundingBox())!;
      const scale = box.width / 760; // the chart's viewBox width (src/render/chartLayout.ts)
      const tooltip = page.locator('.chart-tooltip');
      // Just inside the plotting area (margins 72 left, 20 right, 12 top, 44 bottom of 760 × 340): corners and edges.
      const spots = [[737, 293], [737, 15], [75, 293], [75, 15], [737, 150], [400, 293], [400, 15]] as const;
      for (const [sx, sy] of spots) {
        await page.mouse.move(box.x + sx * scale, box.y + sy * scale);
        await tooltip.waitFor({ state: 'visible', timeout: 5_000 });
        const tip = (await tooltip.boundingBox())!;
        const where = `${width} px screen, pointer at (${sx}, ${sy}): tooltip ${JSON.stringify(tip)} in chart ${JSON.stringify(box)}`;
        expect(tip.x, where).toBeGreaterThanOrEqual(box.x - 0.5);
        expect(tip.y, where).toBeGreaterThanOrEqual(box.y - 0.5);
        expect(tip.x + tip.width, where).toBeLessThanOrEqual(box.x + box.width + 0.5);
        expect(tip.y + tip.height, where).toBeLessThanOrEqual(box.y + box.height + 0.5);
        const text = (await tooltip.textContent())!;
        expect(text, where).toContain(` ${variable.unit}`);
        expect(text, where).toContain(` ${property.unit}`);
      }
      // On a data point: its row, x and y with their units, and the residual in the unit of y.
      const point = main.locator('g.points circle').first();
      const pointBox = (await point.boundingBox())!;
      await page.mouse.move(pointBox.x + pointBox.width / 2, pointBox.y + pointBox.height / 2);
      await expect.poll(() => tooltip.textContent()).toMatch(new RegExp(`^row \\d+\\n.* = [-\\d.e]+ ${variable.unit.replace(/[.*+?^${}()|[\]\\/]/g, '\\$&')}\\n.* = [-\\d.e]+ ${property.unit.replace(/[.*+?^${}()|[\]\\/]/g, '\\$&')}\\nresidual [-\\d.e]+ `));
      expect(errors).toEqual([]);
      await page.close();
    }
  });
}
