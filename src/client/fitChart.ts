/**
 * Browser-only chart of one correlation: data, fitted curve, confidence and prediction bands, and a residual plot.
 * It draws only what the page embedded at build time (src/render/buildChartData.ts); no fitting or statistics
 * happen here. Scales and path data come from src/render, as in the server-side SVG, so both pictures agree.
 * The chart can be redrawn with other scales (zoom), with a previewed order beside the published one, and, for a
 * transformed fit, in the coordinates where it was fitted (render/fittedChartData.ts); the behaviours live in their
 * own modules (chartZoom, chartHover, orderPreview, chartCoordinates) and call `redraw` or `rescale`.
 */
import { axisBottom, axisLeft } from 'd3-axis';
import type { ScaleLinear } from 'd3-scale';
import { select, type Selection } from 'd3-selection';
import { CHART_COLORS, CHART_LAYOUT } from '../render/chartLayout.ts';
import { bandPath, linePath } from '../render/chartPaths.ts';
import { chartScales, type ChartScales } from '../render/chartScales.ts';
import type { FitChartData, PointRow } from '../render/chartTypes.ts';
import { fittedChartData, fittedPreview } from '../render/fittedChartData.ts';
import { residualBandRows } from '../render/residualBandRows.ts';

export type { FitChartData } from '../render/chartTypes.ts';

type Svg = Selection<SVGSVGElement, unknown, null, undefined>;
type Group = Selection<SVGGElement, unknown, null, undefined>;
type Scale = ScaleLinear<number, number>;

/** Another order drawn beside the published one: its curve with prediction band, and its residuals. */
export interface OrderPreviewData {
  readonly order: number;
  /** [x, fit, prediction low, prediction high] on a coarse grid. */
  readonly curve: readonly (readonly [number, number | null, number | null, number | null])[];
  /** [x, residual] of (a sample of) the points. */
  readonly residuals: readonly (readonly [number, number])[];
}

/** 'measured': y against x as the data were given; 'fitted': v against u, where a transformed fit was made. */
export type ChartCoordinates = 'measured' | 'fitted';

export interface FitChart {
  /** The data drawn now: `measured`, or `fitted` when the chart shows the fitted coordinates. */
  readonly data: FitChartData;
  /** The page's chart data, in the user's x and y. */
  readonly measured: FitChartData;
  /** The same in the fitted coordinates of a transformed fit; null for an untransformed one. */
  readonly fitted: FitChartData | null;
  coordinates: ChartCoordinates;
  readonly container: HTMLElement;
  readonly main: Svg;
  readonly lower: Svg;
  /** Scales with nothing zoomed (including the preview, when one is shown). */
  base: ChartScales;
  /** Scales now drawn. */
  view: ChartScales;
  /** A previewed order, in the user's x and y (drawn in the coordinates shown). */
  preview: OrderPreviewData | null;
  /** Redraw every mark with `view` and `preview`. */
  redraw(): void;
  /** New base scales for the data and preview now shown (nothing zoomed), then redraw. */
  rescale(): void;
  /** Listeners called after each redraw (e.g. the hover read-out hides its marker). */
  readonly listeners: (() => void)[];
}

const { width: WIDTH, mainHeight: MAIN_HEIGHT, residualHeight: RESIDUAL_HEIGHT, margin: MARGIN } = CHART_LAYOUT;
let clipCounter = 0;

function frame(container: HTMLElement, height: number, label: string): Svg {
  return select(container).append('svg').attr('viewBox', `0 0 ${WIDTH} ${height}`).attr('role', 'img').attr('aria-label', label);
}

/** A group clipped to the plotting area, so that zoomed marks do not spill over the axes. */
function clippedGroup(svg: Svg, height: number): Group {
  const id = `fit-clip-${++clipCounter}`;
  svg
    .append('clipPath')
    .attr('id', id)
    .append('rect')
    .attr('x', MARGIN.left)
    .attr('y', MARGIN.top)
    .attr('width', WIDTH - MARGIN.left - MARGIN.right)
    .attr('height', height - MARGIN.top - MARGIN.bottom);
  return svg.append('g').attr('clip-path', `url(#${id})`);
}

function drawAxes(group: Group, x: Scale, y: Scale, height: number, xLabel: string, yLabel: string, yTicks: number): void {
  group.selectAll('*').remove();
  group.append('g').attr('transform', `translate(0,${height - MARGIN.bottom})`).call(axisBottom(x).ticks(8));
  group.append('g').attr('transform', `translate(${MARGIN.left},0)`).call(axisLeft(y).ticks(yTicks));
  group
    .append('text')
    .attr('x', (MARGIN.left + WIDTH - MARGIN.right) / 2)
    .attr('y', height - 8)
    .attr('text-anchor', 'middle')
    .attr('font-size', 12)
    .attr('fill', 'currentColor')
    .text(xLabel);
  group
    .append('text')
    .attr('transform', `translate(14,${(MARGIN.top + height - MARGIN.bottom) / 2}) rotate(-90)`)
    .attr('text-anchor', 'middle')
    .attr('font-size', 12)
    .attr('fill', 'currentColor')
    .text(yLabel);
}

function setPath(group: Group, className: string, d: string, attributes: Record<string, string | number>): void {
  let path = group.select<SVGPathElement>(`path.${className}`);
  if (path.empty()) {
    path = group.append('path').attr('class', className);
    for (const [name, value] of Object.entries(attributes)) path.attr(name, value);
  }
  path.attr('d', d);
}

/** Draw the fit and residual plots of `data` into `container` (cleared first) and return the chart. */
export function drawFitChart(container: HTMLElement, data: FitChartData): FitChart {
  container.replaceChildren();
  container.style.position = 'relative';
  const level = Math.round(data.confidence * 100);
  const main = frame(container, MAIN_HEIGHT, `Data and fitted curve with ${level} % confidence and prediction bands`);
  const mainMarks = clippedGroup(main, MAIN_HEIGHT);
  const mainAxes = main.append('g').attr('class', 'axes');
  const lower = frame(container, RESIDUAL_HEIGHT, `Residuals against ${data.xLabel}, with the bands drawn about the curve`);
  const lowerMarks = clippedGroup(lower, RESIDUAL_HEIGHT);
  const lowerAxes = lower.append('g').attr('class', 'axes');
  const fitted = fittedChartData(data);
  let derivedFor: FitChartData | null = null;
  let residualRows = residualBandRows(data.curve);
  let barred: PointRow[] = [];
  /** The preview as drawn: mapped into the fitted coordinates when those are shown. */
  const drawnPreview = (): OrderPreviewData | null => (chart.preview && chart.coordinates === 'fitted' ? fittedPreview(chart.preview, data) : chart.preview);
  const base = chartScales(data);

  const chart: FitChart = {
    get data() {
      return chart.coordinates === 'fitted' && fitted !== null ? fitted : data;
    },
    measured: data,
    fitted,
    coordinates: 'measured',
    container,
    main,
    lower,
    base,
    view: base,
    preview: null,
    listeners: [],
    rescale() {
      const preview = drawnPreview();
      chart.base = chartScales(chart.data, preview ? { curve: preview.curve, residuals: preview.residuals.map((r) => r[1]) } : {});
      chart.view = chart.base;
      chart.redraw();
    },
    redraw() {
      const { x, y, residual } = chart.view;
      const data = chart.data;
      if (derivedFor !== data) {
        derivedFor = data;
        residualRows = residualBandRows(data.curve);
        barred = data.points.filter((point) => point.length === 6) as PointRow[];
      }
      const preview = drawnPreview();
      setPath(mainMarks, 'band-prediction', bandPath(data.curve, x, y, 4, 5), { fill: CHART_COLORS.prediction });
      setPath(mainMarks, 'band-confidence', bandPath(data.curve, x, y, 2, 3), { fill: CHART_COLORS.confidence });
      setPath(mainMarks, 'preview-band', preview ? bandPath(preview.curve, x, y, 2, 3) : '', { fill: CHART_COLORS.previewBand, 'fill-opacity': 0.55 });
      setPath(mainMarks, 'curve', linePath(data.curve, x, y, 1), { fill: 'none', stroke: CHART_COLORS.curve, 'stroke-width': 2 });
      setPath(mainMarks, 'preview-curve', preview ? linePath(preview.curve, x, y, 1) : '', { fill: 'none', stroke: CHART_COLORS.preview, 'stroke-width': 2, 'stroke-dasharray': '7 4' });
      mainMarks
        .selectAll('g.bars')
        .data([0])
        .join('g')
        .attr('class', 'bars')
        .selectAll('line')
        .data(barred)
        .join('line')
        .attr('x1', (p) => x(p[1]))
        .attr('x2', (p) => x(p[1]))
        .attr('y1', (p) => y(p[4]!))
        .attr('y2', (p) => y(p[5]!))
        .attr('stroke', CHART_COLORS.point);
      mainMarks
        .selectAll('g.points')
        .data([0])
        .join('g')
        .attr('class', 'points')
        .selectAll('circle')
        .data(data.points as PointRow[])
        .join('circle')
        .attr('cx', (p) => x(p[1]))
        .attr('cy', (p) => y(p[2]))
        .attr('r', 3)
        .attr('fill', CHART_COLORS.point);
      mainMarks
        .selectAll('g.excluded')
        .data([0])
        .join('g')
        .attr('class', 'excluded')
        .selectAll('circle')
        .data(data.excluded)
        .join('circle')
        .attr('cx', (p) => x(p.x))
        .attr('cy', (p) => y(p.y))
        .attr('r', 4.5)
        .attr('fill', 'none')
        .attr('stroke', CHART_COLORS.excluded)
        .attr('stroke-width', 1.5);
      drawAxes(mainAxes, x, y, MAIN_HEIGHT, data.xLabel, data.yLabel, 6);

      setPath(lowerMarks, 'band-prediction', bandPath(residualRows, x, residual, 3, 4), { fill: CHART_COLORS.prediction });
      setPath(lowerMarks, 'band-confidence', bandPath(residualRows, x, residual, 1, 2), { fill: CHART_COLORS.confidence });
      const zero = residual(0);
      setPath(lowerMarks, 'zero', `M${MARGIN.left},${zero}H${WIDTH - MARGIN.right}`, { stroke: CHART_COLORS.zero, 'stroke-dasharray': '4 3' });
      lowerMarks
        .selectAll('g.points')
        .data([0])
        .join('g')
        .attr('class', 'points')
        .selectAll('circle')
        .data(data.points.filter((p) => Number.isFinite(p[3])) as PointRow[])
        .join('circle')
        .attr('cx', (p) => x(p[1]))
        .attr('cy', (p) => residual(p[3]))
        .attr('r', 3)
        .attr('fill', CHART_COLORS.point);
      // The previewed order's residuals: small open squares, one path.
      const squares = preview ? preview.residuals.map(([px, r]) => `M${x(px) - 3},${residual(r) - 3}h6v6h-6z`).join('') : '';
      setPath(lowerMarks, 'preview-residuals', squares, { fill: 'none', stroke: CHART_COLORS.preview, 'stroke-width': 1.2 });
      drawAxes(lowerAxes, x, residual, RESIDUAL_HEIGHT, data.xLabel, data.residualLabel, 4);
      for (const listener of chart.listeners) listener();
    },
  };
  chart.redraw();
  return chart;
}
