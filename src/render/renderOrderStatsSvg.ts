/**
 * The selection statistics against order, as small static SVG panels (s, AICc, BIC, leave-one-out RMSE and, when
 * weighted, χ²/dof), with the published order ringed. Each point carries `data-order` so that the browser can
 * make it a control for previewing that order; without scripts the picture still reads. Positive spread-out
 * statistics (s, LOO RMSE, χ²/dof) use a log axis, AICc and BIC a linear one. O(orders × panels).
 */
import { scaleLinear, scaleLog, type ScaleContinuousNumeric } from 'd3-scale';
import { CHART_COLORS } from './chartLayout.ts';
import { svgLinePath as linePath } from './svgPaths.ts';
import { paddedExtent } from './chartScales.ts';
import { escapeXml } from './escapeXml.ts';
import { roundForChart } from './roundForChart.ts';
import { c } from './svgAxes.ts';

export interface OrderStatPanel {
  /** Panel title, e.g. "s" or "AICc". */
  readonly title: string;
  /** Log axis for positive statistics spanning decades. */
  readonly log: boolean;
  /** [order, value or null] for each order in the table. */
  readonly values: readonly (readonly [number, number | null])[];
}

const PANEL = { width: 190, height: 130, left: 46, right: 10, top: 22, bottom: 26 } as const;

/** Three significant digits: String(Number(value.toPrecision(3))), through roundForChart's arithmetic. */
function short(value: number): string {
  return String(roundForChart(value, 3) ?? Number(value.toPrecision(3)));
}

/**
 * @example renderOrderStatsSvg([{ title: 's', log: true, values: [[1, 0.5], [2, 0.05]] }], 2).includes('data-order="2"') // => true
 */
export function renderOrderStatsSvg(panels: readonly OrderStatPanel[], published: number, title = 'Selection statistics against order'): string {
  const width = PANEL.width * panels.length;
  const parts = panels.map((panel, index) => {
    const finite = panel.values.filter((v): v is readonly [number, number] => v[1] !== null && Number.isFinite(v[1]) && (!panel.log || v[1] > 0));
    const orders = panel.values.map((v) => v[0]);
    const x = scaleLinear()
      .domain([Math.min(...orders) - 0.5, Math.max(...orders) + 0.5])
      .range([PANEL.left, PANEL.width - PANEL.right]);
    const values = finite.map((v) => v[1]);
    const y: ScaleContinuousNumeric<number, number> = panel.log && values.length > 0
      ? scaleLog().domain([Math.min(...values) / 1.5, Math.max(...values) * 1.5]).range([PANEL.height - PANEL.bottom, PANEL.top])
      : scaleLinear().domain(paddedExtent(values)).nice().range([PANEL.height - PANEL.bottom, PANEL.top]);
    const path = linePath(finite, x, y, 1);
    // Log axes: the powers of ten inside the domain, or else the smallest and largest value; linear: about 4 ticks.
    const decades = panel.log ? y.ticks().filter((t) => Math.abs(Math.log10(t) - Math.round(Math.log10(t))) < 1e-9) : [];
    const ticks = panel.log ? (decades.length >= 2 ? decades : values.length > 0 ? [Math.min(...values), Math.max(...values)] : []) : y.ticks(4);
    const format = panel.log ? short : y.tickFormat(4);
    const axis = [
      `<path d="M${PANEL.left},${PANEL.top}V${PANEL.height - PANEL.bottom}H${PANEL.width - PANEL.right}" fill="none" stroke="currentColor"/>`,
      `<g text-anchor="end">${ticks.map((t) => `<text x="${PANEL.left - 4}" y="${y(t).toFixed(1)}" dy="0.32em">${escapeXml(format(t))}</text>`).join('')}</g>`,
      `<g text-anchor="middle">${orders.map((o) => `<text x="${x(o).toFixed(1)}" y="${PANEL.height - PANEL.bottom + 13}">${o}</text>`).join('')}`,
      `<text x="${c((PANEL.left + PANEL.width - PANEL.right) / 2)}" y="13" font-size="12" font-weight="600">${escapeXml(panel.title)}</text></g>`,
    ].join('');
    const points = finite
      .map(([order, value]) => {
        // The published point is filled; the others are open rings (fill and stroke set once on the group).
        const chosen = order === published;
        return `<g class="order-point${chosen ? ' published' : ''}" data-order="${order}"><title>order ${order}: ${short(value)}</title>` +
          `<circle cx="${x(order).toFixed(1)}" cy="${y(value).toFixed(1)}" r="${chosen ? 6 : 4.5}"${chosen ? ` fill="${CHART_COLORS.curve}"` : ''}/></g>`;
      })
      .join('');
    return `<g transform="translate(${index * PANEL.width},0)" font-size="9">${axis}<path d="${path}" fill="none" stroke="${CHART_COLORS.zero}"/><g fill="#fff" stroke="${CHART_COLORS.curve}" stroke-width="1.5">${points}</g></g>`;
  });
  return `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${width} ${PANEL.height}" width="${width}" height="${PANEL.height}" role="img" aria-label="${escapeXml(title)}" font-family="system-ui, sans-serif" color="#1d232a">${parts.join('')}</svg>`;
}
