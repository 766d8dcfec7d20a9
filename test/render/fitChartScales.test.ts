/**
 * fitChartScales(data) against chartScales(data) (the browser chart's scales, which compute the same extents from
 * lists of every value): the same domains and ranges, exactly, on random chart data with nulls, NaN, ±Infinity,
 * uncertainty bars, points left out, a single value and no value at all.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { chartScales } from '../../src/render/chartScales.ts';
import { fitChartScales } from '../../src/render/fitChartScales.ts';
import type { CurveRow, FitChartData, PointRow } from '../../src/render/chartTypes.ts';

const value = fc.oneof(
  { weight: 8, arbitrary: fc.double({ min: -1e6, max: 1e6, noNaN: true }) },
  { weight: 1, arbitrary: fc.constantFrom(Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY, 0, -0, 1e300, -1e300) },
);
const maybe = fc.oneof({ weight: 5, arbitrary: value }, { weight: 1, arbitrary: fc.constant(null) });
const curveRow = fc.tuple(value, maybe, maybe, maybe, maybe, maybe) as fc.Arbitrary<CurveRow>;
const pointRow = fc.oneof(fc.tuple(fc.nat(), value, value, value), fc.tuple(fc.nat(), value, value, value, value, value)) as fc.Arbitrary<PointRow>;
const chart: fc.Arbitrary<FitChartData> = fc.record({
  xLabel: fc.constant('x'),
  yLabel: fc.constant('y'),
  residualLabel: fc.constant('r'),
  confidence: fc.constant(0.95),
  range: fc.record({ min: value, max: value }),
  curve: fc.array(curveRow, { maxLength: 12 }),
  points: fc.array(pointRow, { maxLength: 12 }),
  excluded: fc.array(fc.record({ row: fc.nat(), x: value, y: value, reason: fc.constant('left out') }), { maxLength: 3 }),
});

describe('fitChartScales', () => {
  it('fitChartScales(data) has the domains and ranges of chartScales(data) on random chart data', () => {
    fc.assert(
      fc.property(chart, (data) => {
        const mine = fitChartScales(data);
        const theirs = chartScales(data);
        for (const axis of ['x', 'y', 'residual'] as const) {
          expect(mine[axis].domain(), axis).toEqual(theirs[axis].domain());
          expect(mine[axis].range(), axis).toEqual(theirs[axis].range());
        }
      }),
      { numRuns: 5000 },
    );
  });

  it('gives [0, 1] padded domains when nothing is finite, as chartScales does', () => {
    const empty: FitChartData = { xLabel: 'x', yLabel: 'y', residualLabel: 'r', confidence: 0.95, range: { min: Number.NaN, max: Number.NaN }, curve: [], points: [], excluded: [] };
    expect(fitChartScales(empty).x.domain()).toEqual(chartScales(empty).x.domain());
    expect(fitChartScales(empty).x.domain()).toEqual([0, 1]);
  });
});
