/**
 * Browser-only chart of one correlation: data, fitted curve, confidence and prediction bands, and a residual plot.
 * It draws only what the page embedded at build time (src/components/lib/chartData.ts); no fitting or statistics
 * happen here. d3 modules are imported one by one (d3-scale, d3-shape, d3-axis, d3-selection).
 */
import { axisBottom, axisLeft } from 'd3-axis';
import { scaleLinear, type ScaleLinear } from 'd3-scale';
import { pointer, select, type Selection } from 'd3-selection';
import { area, line } from 'd3-shape';

/** The embedded data; mirrors ChartData in src/components/lib/chartData.ts. */
export interface FitChartData {
  readonly xLabel: string;
  readonly yLabel: string;
  readonly residualLabel: string;
  readonly confidence: number;
  readonly range: { readonly min: number; readonly max: number };
  readonly points: readonly { readonly row: number; readonly x: number; readonly y: number; readonly residual: number; readonly bar?: readonly [number, number] }[];
  readonly excluded: readonly { readonly row: number; readonly x: number; readonly y: number; readonly reason: string }[];
  readonly curve: readonly (readonly (number | null)[])[];
  readonly residualBands: readonly (readonly (number | null)[])[];
}

type Row = readonly (number | null)[];
type Svg = Selection<SVGSVGElement, unknown, null, undefined>;

const WIDTH = 760;
const MAIN_HEIGHT = 340;
const RESIDUAL_HEIGHT = 150;
const MARGIN = { top: 12, right: 20, bottom: 44, left: 72 };

const COLORS = {
  prediction: '#dce8f3',
  confidence: '#a9c6e0',
  curve: '#1f5a8a',
  point: '#1d232a',
  excluded: '#b83232',
  zero: '#8a939c',
};

/** Finite values of a list (null and NaN dropped). */
function finite(values: readonly (number | null | undefined)[]): number[] {
  return values.filter((value): value is number => typeof value === 'number' && Number.isFinite(value));
}

/** [min, max] padded by 5 % so that points do not sit on the frame. */
function paddedExtent(values: readonly number[]): [number, number] {
  let low = Math.min(...values);
  let high = Math.max(...values);
  if (!(low < high)) {
    const half = low === 0 ? 1 : Math.abs(low) * 0.05;
    low -= half;
    high += half;
  }
  const pad = (high - low) * 0.05;
  return [low - pad, high + pad];
}

/** Short number text for the tooltip. */
function short(value: number): string {
  return Number.isFinite(value) ? String(Number(value.toPrecision(6))) : '—';
}

function frame(container: HTMLElement, height: number, label: string): Svg {
  return select(container)
    .append('svg')
    .attr('viewBox', `0 0 ${WIDTH} ${height}`)
    .attr('role', 'img')
    .attr('aria-label', label);
}

function drawAxes(svg: Svg, x: ScaleLinear<number, number>, y: ScaleLinear<number, number>, height: number, xLabel: string, yLabel: string, yTicks = 6): void {
  svg
    .append('g')
    .attr('transform', `translate(0,${height - MARGIN.bottom})`)
    .call(axisBottom(x).ticks(8));
  svg.append('g').attr('transform', `translate(${MARGIN.left},0)`).call(axisLeft(y).ticks(yTicks));
  svg
    .append('text')
    .attr('x', (MARGIN.left + WIDTH - MARGIN.right) / 2)
    .attr('y', height - 8)
    .attr('text-anchor', 'middle')
    .attr('font-size', 12)
    .text(xLabel);
  svg
    .append('text')
    .attr('transform', `translate(14,${(MARGIN.top + height - MARGIN.bottom) / 2}) rotate(-90)`)
    .attr('text-anchor', 'middle')
    .attr('font-size', 12)
    .text(yLabel);
}

function band(x: ScaleLinear<number, number>, y: ScaleLinear<number, number>, low: number, high: number) {
  return area<Row>()
    .defined((row) => row[low] != null && row[high] != null)
    .x((row) => x(row[0]!))
    .y0((row) => y(row[low]!))
    .y1((row) => y(row[high]!));
}

/** Draw the fit and residual plots of `data` into `container` (cleared first). */
export function drawFitChart(container: HTMLElement, data: FitChartData): void {
  container.replaceChildren();
  const xs = [data.range.min, data.range.max, ...data.points.map((point) => point.x), ...data.excluded.map((point) => point.x)];
  const x = scaleLinear()
    .domain(paddedExtent(finite(xs)))
    .range([MARGIN.left, WIDTH - MARGIN.right]);
  const ys = finite([
    ...data.points.map((point) => point.y),
    ...data.points.flatMap((point) => point.bar ?? []),
    ...data.excluded.map((point) => point.y),
    ...data.curve.flatMap((row) => row.slice(1)),
  ]);
  const y = scaleLinear()
    .domain(paddedExtent(ys))
    .nice()
    .range([MAIN_HEIGHT - MARGIN.bottom, MARGIN.top]);

  const level = Math.round(data.confidence * 100);
  const main = frame(container, MAIN_HEIGHT, `Data and fitted curve with ${level} % confidence and prediction bands`);
  main.append('path').attr('d', band(x, y, 4, 5)(data.curve) ?? '').attr('fill', COLORS.prediction);
  main.append('path').attr('d', band(x, y, 2, 3)(data.curve) ?? '').attr('fill', COLORS.confidence);
  drawAxes(main, x, y, MAIN_HEIGHT, data.xLabel, data.yLabel);
  const curve = line<Row>()
    .defined((row) => row[1] != null)
    .x((row) => x(row[0]!))
    .y((row) => y(row[1]!));
  main.append('path').attr('d', curve(data.curve) ?? '').attr('fill', 'none').attr('stroke', COLORS.curve).attr('stroke-width', 2);
  main
    .append('g')
    .selectAll('line')
    .data(data.points.filter((point) => point.bar !== undefined))
    .join('line')
    .attr('x1', (point) => x(point.x))
    .attr('x2', (point) => x(point.x))
    .attr('y1', (point) => y(point.bar![0]))
    .attr('y2', (point) => y(point.bar![1]))
    .attr('stroke', COLORS.point)
    .attr('stroke-width', 1);
  main
    .append('g')
    .selectAll('circle')
    .data(data.points)
    .join('circle')
    .attr('cx', (point) => x(point.x))
    .attr('cy', (point) => y(point.y))
    .attr('r', 3)
    .attr('fill', COLORS.point);
  main
    .append('g')
    .selectAll('circle')
    .data(data.excluded)
    .join('circle')
    .attr('cx', (point) => x(point.x))
    .attr('cy', (point) => y(point.y))
    .attr('r', 4.5)
    .attr('fill', 'none')
    .attr('stroke', COLORS.excluded)
    .attr('stroke-width', 1.5);

  const residuals = finite(data.points.map((point) => point.residual));
  const bandValues = finite(data.residualBands.flatMap((row) => row.slice(1)));
  const limit = Math.max(...residuals.map(Math.abs), ...bandValues.map(Math.abs), Number.MIN_VALUE) * 1.1;
  const r = scaleLinear()
    .domain([-limit, limit])
    .nice()
    .range([RESIDUAL_HEIGHT - MARGIN.bottom, MARGIN.top]);
  const lower = frame(container, RESIDUAL_HEIGHT, 'Residuals against x, with the bands drawn about the curve');
  lower.append('path').attr('d', band(x, r, 3, 4)(data.residualBands) ?? '').attr('fill', COLORS.prediction);
  lower.append('path').attr('d', band(x, r, 1, 2)(data.residualBands) ?? '').attr('fill', COLORS.confidence);
  drawAxes(lower, x, r, RESIDUAL_HEIGHT, data.xLabel, 'residual', 4);
  lower
    .append('line')
    .attr('x1', MARGIN.left)
    .attr('x2', WIDTH - MARGIN.right)
    .attr('y1', r(0))
    .attr('y2', r(0))
    .attr('stroke', COLORS.zero)
    .attr('stroke-dasharray', '4 3');
  lower
    .append('g')
    .selectAll('circle')
    .data(data.points.filter((point) => Number.isFinite(point.residual)))
    .join('circle')
    .attr('cx', (point) => x(point.x))
    .attr('cy', (point) => r(point.residual))
    .attr('r', 3)
    .attr('fill', COLORS.point);
  lower.append('title').text(data.residualLabel);

  addTooltip(container, main, x, y, data);
}

/** Hover readout: the nearest data point within 12 px, or the curve and bands at the pointer's x. */
function addTooltip(container: HTMLElement, svg: Svg, x: ScaleLinear<number, number>, y: ScaleLinear<number, number>, data: FitChartData): void {
  container.style.position = 'relative';
  const tip = select(container).append('div').attr('class', 'chart-tooltip').style('display', 'none');
  const marker = svg.append('circle').attr('r', 4).attr('fill', COLORS.curve).style('display', 'none');
  svg
    .append('rect')
    .attr('x', MARGIN.left)
    .attr('y', MARGIN.top)
    .attr('width', WIDTH - MARGIN.left - MARGIN.right)
    .attr('height', MAIN_HEIGHT - MARGIN.top - MARGIN.bottom)
    .attr('fill', 'transparent')
    .on('pointermove', (event: PointerEvent) => {
      const [px, py] = pointer(event);
      const svgNode = svg.node()!;
      const scale = svgNode.getBoundingClientRect().width / WIDTH;
      let text = '';
      let mx = 0;
      let my = 0;
      const candidates = [
        ...data.points.map((point) => ({ ...point, label: `row ${point.row}: x = ${short(point.x)}, y = ${short(point.y)}, residual ${short(point.residual)}` })),
        ...data.excluded.map((point) => ({ ...point, label: `row ${point.row} (left out: ${point.reason}): x = ${short(point.x)}, y = ${short(point.y)}` })),
      ];
      let best = 12 / Math.max(scale, 1e-6);
      for (const point of candidates) {
        const distance = Math.hypot(x(point.x) - px, y(point.y) - py);
        if (distance < best) {
          best = distance;
          text = point.label;
          mx = x(point.x);
          my = y(point.y);
        }
      }
      if (text === '') {
        const target = x.invert(px);
        let nearest: Row | undefined;
        for (const row of data.curve) if (nearest === undefined || Math.abs(row[0]! - target) < Math.abs(nearest[0]! - target)) nearest = row;
        if (nearest === undefined || nearest[1] == null) return;
        const level = Math.round(data.confidence * 100);
        text = `x = ${short(nearest[0]!)}: fit ${short(nearest[1])}, ${level} % confidence ${short(nearest[2] ?? NaN)} to ${short(nearest[3] ?? NaN)}, prediction ${short(nearest[4] ?? NaN)} to ${short(nearest[5] ?? NaN)}`;
        mx = x(nearest[0]!);
        my = y(nearest[1]);
      }
      marker.attr('cx', mx).attr('cy', my).style('display', null);
      const left = Math.min(mx * scale + 10, svgNode.getBoundingClientRect().width - 260);
      tip.style('display', null).style('left', `${Math.max(0, left)}px`).style('top', `${my * scale + 12}px`).text(text);
    })
    .on('pointerleave', () => {
      tip.style('display', 'none');
      marker.style('display', 'none');
    });
}

/** Find every `[data-fit-chart]` figure on the page and draw it from its embedded JSON. */
export function mountFitCharts(root: ParentNode = document): void {
  for (const figure of root.querySelectorAll<HTMLElement>('[data-fit-chart]')) {
    const source = figure.querySelector('script[type="application/json"]');
    const target = figure.querySelector<HTMLElement>('.chart-target');
    if (!source?.textContent || !target) continue;
    try {
      drawFitChart(target, JSON.parse(source.textContent) as FitChartData);
      target.removeAttribute('aria-hidden');
    } catch (caught) {
      target.textContent = 'The plot could not be drawn; the numbers are in the tables below.';
      console.error(caught);
    }
  }
}
