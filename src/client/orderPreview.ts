/**
 * Preview another order on the page's chart: its curve, prediction band and residuals beside the published fit,
 * and its statistics beside the published ones. Chosen by a button, a point of the statistics plot or a row of
 * the order table (mouse, or Enter/Space on the focused control); "Back to the published order" clears it.
 * Everything shown was computed at build time (src/render/orderPreviews.ts, stored with the fit by the loader).
 */
import type { OrderPreviewData } from './fitChart.ts';
import { chartsReady } from './mountFitCharts.ts';

/** The build-time previews (src/render/orderPreviews.ts, stored with the fit by the loader): x shared, values per order. */
interface Previews {
  readonly published: number;
  readonly grid: readonly number[];
  readonly residualX: readonly number[];
  readonly previews: readonly {
    readonly order: number;
    readonly curve: readonly (readonly [number | null, number | null, number | null])[];
    readonly residuals: readonly (number | null)[];
    /** Printed at build time with the order table's rules. */
    readonly statistics: Record<string, string>;
  }[];
}

/** The chart's preview layer for one order: rows [x, fit, low, high] and [x, residual]. */
function previewData(data: Previews, order: number): (OrderPreviewData & { statistics: Record<string, string> }) | null {
  const preview = data.previews.find((p) => p.order === order);
  if (preview === undefined) return null;
  return {
    order,
    curve: preview.curve.map((row, i) => [data.grid[i]!, row[0], row[1], row[2]] as const),
    residuals: preview.residuals.flatMap((r, i) => (r === null ? [] : [[data.residualX[i]!, r] as const])),
    statistics: preview.statistics,
  };
}

function text(value: string | undefined): string {
  return value ?? '—';
}

/** Make every control that names an order a keyboard-usable button for it. */
function asButton(element: Element, label: string, onChoose: () => void): void {
  element.setAttribute('role', 'button');
  element.setAttribute('tabindex', '0');
  element.setAttribute('aria-label', label);
  element.addEventListener('click', onChoose);
  element.addEventListener('keydown', (event) => {
    const key = (event as KeyboardEvent).key;
    if (key === 'Enter' || key === ' ') {
      event.preventDefault();
      onChoose();
    }
  });
}

export async function mountOrderPreview(root: Document = document): Promise<void> {
  const panel = root.querySelector<HTMLElement>('[data-order-preview]');
  const source = panel?.querySelector('script[data-order-previews]');
  if (!panel || !source?.textContent) return;
  const data = JSON.parse(source.textContent) as Previews;
  const charts = await chartsReady;
  const mounted = charts[0];
  if (mounted === undefined) return;
  const { chart, zoom } = mounted;
  const buttons = [...panel.querySelectorAll<HTMLButtonElement>('[data-preview-order]')];
  const back = panel.querySelector<HTMLButtonElement>('[data-preview-back]')!;
  const caption = panel.querySelector<HTMLElement>('[data-compare-caption]')!;
  const head = panel.querySelector<HTMLElement>('[data-compare-head]')!;
  const originalCaption = caption.textContent ?? '';

  function choose(order: number): void {
    const preview = order === data.published ? null : previewData(data, order);
    chart.preview = preview;
    chart.rescale();
    zoom.reset();
    chart.redraw();
    for (const button of buttons) button.setAttribute('aria-pressed', String(Number(button.dataset['previewOrder']) === (preview?.order ?? data.published)));
    back.disabled = preview === null;
    for (const point of panel!.querySelectorAll('.order-point')) point.classList.toggle('previewed', preview !== null && Number(point.getAttribute('data-order')) === preview.order);
    for (const row of root.querySelectorAll<HTMLTableRowElement>('table.orders tr[data-order]')) row.classList.toggle('previewed', preview !== null && Number(row.dataset['order']) === preview.order);
    head.textContent = preview ? `order ${preview.order} (preview)` : 'previewed order';
    caption.textContent = preview ? `Order ${preview.order} (previewed, dashed on the chart) beside the published order ${data.published}.` : originalCaption;
    for (const row of panel!.querySelectorAll<HTMLTableRowElement>('tr[data-stat]')) {
      row.querySelector('[data-compare-value]')!.textContent = preview ? text(preview.statistics[row.dataset['stat']!]) : '—';
    }
  }

  for (const button of buttons) button.addEventListener('click', () => choose(Number(button.dataset['previewOrder'])));
  back.addEventListener('click', () => choose(data.published));
  const known = new Set([data.published, ...data.previews.map((p) => p.order)]);
  // The statistics picture becomes a group of controls (an img's children would be hidden from assistive technology).
  panel.querySelector('.order-stats svg')?.setAttribute('role', 'group');
  for (const point of panel.querySelectorAll<SVGGElement>('.order-point')) {
    const order = Number(point.getAttribute('data-order'));
    if (known.has(order)) asButton(point, `Preview order ${order}`, () => choose(order));
  }
  for (const row of root.querySelectorAll<HTMLTableRowElement>('table.orders tr[data-order]')) {
    const order = Number(row.dataset['order']);
    if (!known.has(order)) continue;
    const button = root.createElement('button');
    button.type = 'button';
    button.className = 'row-preview';
    button.textContent = 'preview';
    button.setAttribute('aria-label', `Preview order ${order} on the chart`);
    const show = () => {
      choose(order);
      chart.container.scrollIntoView({ block: 'nearest' });
    };
    button.addEventListener('click', (event) => {
      event.stopPropagation();
      show();
    });
    row.cells[0]?.append(' ', button);
    row.addEventListener('click', show);
  }
  panel.querySelector<HTMLElement>('[data-order-choice]')!.hidden = false;
  panel.dataset['ready'] = 'true';
}
