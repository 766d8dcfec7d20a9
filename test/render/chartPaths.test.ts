/**
 * bandPath and linePath (the browser's) and svgBandPath and svgLinePath (the build's SVG documents) against
 * d3-shape's area() and line() with digits(2), the linear curve and the same defined() test (d3-shape is the outside
 * reference: the paths were drawn by it before they were written out): the same text for random rows with nulls
 * (breaks, one-point pieces, empty input), on a linear and a log scale.
 */
import { scaleLinear, scaleLog } from 'd3-scale';
import { area, line } from 'd3-shape';
import { describe, expect, it } from 'vitest';
import { bandPath, linePath } from '../../src/render/chartPaths.ts';
import { svgBandPath, svgLinePath } from '../../src/render/svgPaths.ts';

type Row = readonly (number | null)[];

function d3Band(rows: readonly Row[], x: (v: number) => number, y: (v: number) => number, low: number, high: number): string {
  return area<Row>().digits(2).defined((row) => row[low] != null && row[high] != null).x((row) => x(row[0]!)).y0((row) => y(row[low]!)).y1((row) => y(row[high]!))(rows) ?? '';
}

function d3Line(rows: readonly Row[], x: (v: number) => number, y: (v: number) => number, column: number): string {
  return line<Row>().digits(2).defined((row) => row[column] != null).x((row) => x(row[0]!)).y((row) => y(row[column]!))(rows) ?? '';
}

/** A seeded generator (mulberry32, common practice) so that a failure can be replayed. */
function random(seed: number): () => number {
  let a = seed;
  return () => {
    a = (a + 0x6d2b79f5) | 0;
    let t = Math.imul(a ^ (a >>> 15), 1 | a);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

describe('chart paths', () => {
  it('bandPath and linePath give d3-shape\'s text for random rows with nulls, on linear and log scales', () => {
    const next = random(7);
    const x = scaleLinear().domain([0, 100]).range([72, 740]);
    const linear = scaleLinear().domain([-5, 5]).range([328, 12]);
    const log = scaleLog().domain([0.01, 100]).range([328, 12]);
    let compared = 0;
    for (let trial = 0; trial < 400; trial++) {
      const n = Math.floor(next() * 12);
      const gapRate = trial % 3 === 0 ? 0 : next() * 0.6;
      const rows: Row[] = Array.from({ length: n }, (_, i) => [
        i * 7.3 + next(),
        ...Array.from({ length: 5 }, () => (next() < gapRate ? null : trial % 2 ? 0.01 + next() * 99 : (next() - 0.5) * 12)),
      ]);
      const y = trial % 2 ? log : linear;
      for (const [low, high] of [[2, 3], [4, 5], [1, 2]] as const) {
        expect(bandPath(rows, x, y, low, high)).toBe(d3Band(rows, x, y, low, high));
        expect(svgBandPath(rows, x, y, low, high)).toBe(d3Band(rows, x, y, low, high));
        compared++;
      }
      for (const column of [1, 3]) {
        expect(linePath(rows, x, y, column)).toBe(d3Line(rows, x, y, column));
        expect(svgLinePath(rows, x, y, column)).toBe(d3Line(rows, x, y, column));
        compared++;
      }
    }
    expect(compared).toBe(2000);
  });

  it('linePath closes a one-point piece with Z and gives "" for no rows, as d3-shape does', () => {
    const x = scaleLinear().domain([0, 1]).range([0, 100]);
    expect(linePath([[0.5, 0.25]], x, x, 1)).toBe('M50,25Z');
    expect(linePath([], x, x, 1)).toBe('');
    expect(bandPath([[0.5, 0.25, 0.75]], x, x, 1, 2)).toBe('M50,75L50,25Z');
    expect(svgLinePath([[0.5, 0.25]], x, x, 1)).toBe('M50,25Z');
    expect(svgLinePath([], x, x, 1)).toBe('');
    expect(svgBandPath([[0.5, 0.25, 0.75]], x, x, 1, 2)).toBe('M50,75L50,25Z');
  });

  it('svgBandPath and svgLinePath give the same text as bandPath and linePath over pixels far outside the frame', () => {
    const next = random(11);
    const x = scaleLinear().domain([0, 1]).range([72, 740]);
    for (let trial = 0; trial < 300; trial++) {
      // Values up to ±10^(trial mod 16) data units: coordinates from hundredths of a pixel to beyond 10^13 pixels.
      const spread = 10 ** (trial % 16);
      const rows: Row[] = Array.from({ length: 1 + Math.floor(next() * 30) }, () => [next(), ...Array.from({ length: 3 }, () => (next() < 0.1 ? null : (next() - 0.5) * spread))]);
      expect(svgBandPath(rows, x, x, 1, 2)).toBe(bandPath(rows, x, x, 1, 2));
      expect(svgLinePath(rows, x, x, 3)).toBe(linePath(rows, x, x, 3));
    }
  });
});
