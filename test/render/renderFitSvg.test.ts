/**
 * The shared chart renderer: chart data from a fit, and the static SVG drawn from it. Expected positions are
 * computed here by hand from the documented layout (a linear map of the 5 %-padded data extent onto the plotting
 * area), independently of d3-scale.
 */
import { describe, expect, it } from 'vitest';
import { fitPolynomial } from '../../src/core/index.ts';
import { CHART_LAYOUT, buildChartData, renderFitSvg, residualBandRows, roundForChart, type FitChartData } from '../../src/render/index.ts';

const { width, mainHeight, margin } = CHART_LAYOUT;

/** Exact straight line y = 2 + 3x at x = 0…10 (computed by hand), plus one point left out. */
function lineChart(): FitChartData {
  const xs = Array.from({ length: 11 }, (_, i) => i);
  const ys = xs.map((x) => 2 + 3 * x + (x % 2 === 0 ? 0.01 : -0.01));
  const fit = fitPolynomial({ x: xs, y: ys }, { order: 1 });
  return buildChartData({
    fit,
    points: Object.freeze(xs.map((x, i) => ({ row: i + 1, x, y: ys[i]! }))),
    excluded: [{ row: 12, x: 5, y: 40, reason: 'a <bad> & "odd" reading' }],
    xLabel: 'x <unit>',
    yLabel: 'y',
    count: 11,
  });
}

describe('roundForChart', () => {
  it('roundForChart(value) keeps 6 significant digits and maps non-finite values to null (computed by hand)', () => {
    expect(roundForChart(0.123456789)).toBe(0.123457);
    expect(roundForChart(123456789)).toBe(123457000);
    expect(roundForChart(-1.0000004)).toBe(-1);
    expect(roundForChart(Number.NaN)).toBeNull();
    expect(roundForChart(Number.POSITIVE_INFINITY)).toBeNull();
  });
});

describe('buildChartData', () => {
  it('buildChartData({ fit, points }) samples the curve over the range with the range ends exact and the fit on y = 2 + 3x', () => {
    const data = lineChart();
    expect(data.curve).toHaveLength(11);
    expect(data.curve[0]![0]).toBe(0);
    expect(data.curve[10]![0]).toBe(10);
    // The alternating ±0.01 errors cancel in the mean and nearly in the slope: the fit is within 0.01 of 2 + 3x.
    for (const row of data.curve) expect(Math.abs(row[1]! - (2 + 3 * row[0])), `x = ${row[0]}`).toBeLessThan(0.01);
    // Bands enclose the curve: confidence inside prediction.
    for (const row of data.curve) {
      expect(row[4]!).toBeLessThan(row[2]!);
      expect(row[2]!).toBeLessThan(row[1]!);
      expect(row[1]!).toBeLessThan(row[3]!);
      expect(row[3]!).toBeLessThan(row[5]!);
    }
    expect(data.points.map((point) => point[0])).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11]);
    // Residual = y − ŷ is close to the ±0.01 put in.
    for (const point of data.points) expect(Math.abs(Math.abs(point[3]) - 0.01)).toBeLessThan(0.005);
  });

  it('residualBandRows(curve) subtracts the fit from each band', () => {
    expect(residualBandRows([[1, 10, 9, 11, 8, 12]])).toEqual([[1, -1, 1, -2, 2]]);
    expect(residualBandRows([[1, null, 9, 11, 8, 12]])).toEqual([[1, null, null, null, null]]);
  });
});

describe('renderFitSvg', () => {
  it('renderFitSvg(data) places each point where a linear map of the padded extent puts it (computed by hand)', () => {
    const data = lineChart();
    const svg = renderFitSvg(data);
    expect(svg.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
    expect(svg.endsWith('</svg>')).toBe(true);
    // x extent 0…10 padded by 5 % → −0.5…10.5 onto [left, width − right].
    const px = (x: number) => margin.left + ((x + 0.5) / 11) * (width - margin.left - margin.right);
    const dots = [...svg.matchAll(/M([\d.]+),([\d.]+)h0/g)].map((m) => [Number(m[1]), Number(m[2])]);
    expect(dots).toHaveLength(2 * 11); // upper and residual panels
    data.points.forEach((point, i) => expect(Math.abs(dots[i]![0]! - px(point[1]))).toBeLessThan(0.006));
    // y grows upwards: the first point (lowest y) is lowest on the page.
    expect(dots[0]![1]!).toBeGreaterThan(dots[10]![1]!);
    expect(dots[10]![1]!).toBeGreaterThan(margin.top - 0.01);
    expect(dots[0]![1]!).toBeLessThan(mainHeight - margin.bottom + 0.01);
  });

  it('renderFitSvg(data, { description }) writes the description, escaped, right after the title; none without it', () => {
    const svg = renderFitSvg(lineChart(), { title: 'T', description: 'Cautions: 1 < x & x ≤ 2' });
    expect(svg).toContain('<title id="fit-svg-title">T</title><desc>Cautions: 1 &lt; x &amp; x ≤ 2</desc>');
    expect(renderFitSvg(lineChart())).not.toContain('<desc>');
  });

  it('renderFitSvg(data) draws the point left out as an open ring with its reason, escaped', () => {
    const svg = renderFitSvg(lineChart());
    expect(svg.match(/<circle /g)).toHaveLength(1);
    expect(svg).toContain('row 12 left out: a &lt;bad&gt; &amp; &quot;odd&quot; reading');
    expect(svg).toContain('x &lt;unit&gt;');
    expect(svg).not.toMatch(/<bad>/);
  });

  it('renderFitSvg(data) draws the bars of stated uncertainties, bands and curve', () => {
    const base = lineChart();
    const data: FitChartData = { ...base, points: base.points.map((p) => [p[0], p[1], p[2], p[3], p[2] - 0.5, p[2] + 0.5] as const) };
    const svg = renderFitSvg(data);
    const bars = /<path d="((?:M[\d.]+,[\d.]+V[\d.]+)+)" stroke/.exec(svg);
    expect(bars).not.toBeNull();
    expect(bars![1]!.match(/V/g)).toHaveLength(11);
    expect(svg.match(/fill="#dce8f3"/g)).toHaveLength(2); // prediction band in both panels
    expect(svg.match(/stroke="#1f5a8a" stroke-width="2"/g)).toHaveLength(1); // the curve
  });
});
