/**
 * The temperature-scale switch of a correlation page: the equation and the coefficient table in K, °C or °F.
 *
 * The page is rendered in the scale of the fit (that is what a reader without scripts sees). It carries, in a
 * `<script type="application/json" data-temperature-scales>` element, the other scales' published forms: the
 * exactly re-expressed, certified coefficients as printed, their digits and standard errors, the range and the
 * mapped form's centre and half-width, or the reason a form is not shown (src/components/Equation.astro). This
 * module only swaps text in; it computes nothing but the coefficient intervals (a ± q·SE, the quantile q is on the
 * page too).
 *
 * For other behaviours on the page (the evaluator) the selected scale is exposed as `data-scale` on the
 * `article.correlation` element and announced as a `correlary:scale` CustomEvent on the document,
 * detail `{ scale, native }`.
 *
 * @example mountTemperatureScale() // adds "Scale: K | °C | °F" radio buttons above the equation and the table
 */
import { formatInterval, formatNumber } from '../core/browser.ts';

/** One scale's published form on the page (keys kept short: every page has a size budget). */
interface ScaleData {
  /** scale */
  s: string;
  /** validity range [min, max] */
  r: [number, number];
  /** mapped centre and half-width */
  c: number;
  h: number;
  /** printed coefficients, digits and standard errors (absent when the form is not shown) */
  a?: string[];
  d?: number[];
  e?: number[];
  /** why the form is not shown */
  n?: string;
}

interface PageData {
  /** native scale, plain symbols of x and of the left-hand side, interval quantile */
  n: string;
  x: string;
  y: string;
  q: number;
  o: ScaleData[];
}

/** The plain-text equation "y = a0 + a1*T + a2*T^2", as the page's plain form prints it. */
export function plainEquation(lhs: string, x: string, printed: readonly string[]): string {
  const terms = printed.map((text, k) => {
    const negative = text.startsWith('-');
    const body = `${negative ? text.slice(1) : text}${k === 0 ? '' : k === 1 ? `*${x}` : `*${x}^${k}`}`;
    return k === 0 ? `${negative ? '-' : ''}${body}` : ` ${negative ? '-' : '+'} ${body}`;
  });
  return `${lhs} = ${terms.join('')}`;
}

export function mountTemperatureScale(root: Document = document): void {
  const source = root.querySelector('script[data-temperature-scales]');
  const article = root.querySelector<HTMLElement>('article.correlation');
  if (source === null || article === null) return;
  const data = JSON.parse(source.textContent ?? '') as PageData;
  const katex = root.querySelector<HTMLElement>('.equation[data-plain]');
  const printedRow = root.querySelector<HTMLElement>('.equation-plain-row[data-form="printed"]');
  const fullRow = root.querySelector<HTMLElement>('.equation-plain-row[data-form="full"]');
  const rows = [...root.querySelectorAll<HTMLTableRowElement>('table.coefficients tbody tr')];
  const centre = root.querySelector('[data-mapped-center]');
  const halfWidth = root.querySelector('[data-mapped-half-width]');
  const original = {
    plain: printedRow?.querySelector('code')?.textContent ?? '',
    cells: rows.map((row) => [...row.cells].map((cell) => cell.textContent ?? '')),
    centre: centre?.textContent ?? '',
    halfWidth: halfWidth?.textContent ?? '',
  };
  const scaled = root.createElement('p');
  scaled.className = 'equation equation-scaled mono';
  scaled.hidden = true;
  katex?.after(scaled);
  const notes: HTMLElement[] = [];
  const scales = [data.n, ...data.o.map((entry) => entry.s)];

  const show = (scale: string) => {
    const entry = data.o.find((item) => item.s === scale);
    const native = entry === undefined;
    article.dataset['scale'] = scale;
    if (katex) katex.hidden = !native;
    scaled.hidden = native;
    if (fullRow) fullRow.hidden = !native;
    let plain = original.plain;
    if (entry) {
      const range = `${data.x} in ${scale}, valid for ${entry.r[0]} to ${entry.r[1]} ${scale}`;
      plain = entry.a ? plainEquation(data.y, data.x, entry.a) : '';
      scaled.textContent = entry.a ? `${plain}   (${range})` : `The power form in ${scale} is not shown: ${entry.n} (${range}.)`;
    }
    if (printedRow) {
      printedRow.hidden = plain === '';
      printedRow.querySelector('code')!.textContent = plain;
      printedRow.querySelector('button')?.setAttribute('data-copy-text', plain);
    }
    rows.forEach((row, k) => {
      const cells = [...row.cells];
      const text = (i: number, value: string) => {
        if (cells[i]) cells[i]!.textContent = value;
      };
      if (native || !entry.a) {
        original.cells[k]!.forEach((value, i) => text(i, native ? value : i === 0 ? value : '—'));
        return;
      }
      const a = Number(entry.a[k]);
      const digits = entry.d![k]!;
      const error = entry.e![k]!;
      text(1, entry.a[k]!);
      text(2, String(digits));
      // The same rules as the native table (CoefficientTable.astro): 3 digits of the standard error, each end of
      // the interval to the decimal place of the printed coefficient.
      text(3, formatNumber(error, 3));
      text(4, formatInterval([a - data.q * error, a + data.q * error], a, digits));
    });
    if (centre) centre.textContent = entry ? String(entry.c) : original.centre;
    if (halfWidth) halfWidth.textContent = entry ? String(entry.h) : original.halfWidth;
    for (const note of notes) note.textContent = native ? '' : ` (${data.x} in ${scale})`;
    for (const input of root.querySelectorAll<HTMLInputElement>('input[data-scale-choice]')) input.checked = input.value === scale;
    root.dispatchEvent(new CustomEvent('correlary:scale', { detail: { scale, native: data.n } }));
  };

  // One switch above the equation and one above the coefficient table; they stay in step.
  const places = [katex, root.querySelector('table.coefficients')?.closest('.table-wrap') ?? null];
  places.forEach((place, i) => {
    if (place === null) return;
    const group = root.createElement('fieldset');
    group.className = 'scale-switch';
    group.innerHTML = `<legend>Temperature scale of ${data.x}</legend>`;
    for (const scale of scales) {
      const label = root.createElement('label');
      const input = root.createElement('input');
      Object.assign(input, { type: 'radio', name: `scale-${i}`, value: scale, checked: scale === data.n });
      input.dataset['scaleChoice'] = '';
      input.addEventListener('change', () => show(scale));
      label.append(input, ` ${scale}${scale === data.n ? ' (fitted)' : ''}`);
      group.append(label);
    }
    place.before(group);
  });
  const caption = root.querySelector('table.coefficients caption');
  if (caption) notes.push(caption.appendChild(root.createElement('span')));
  article.dataset['scale'] = data.n;
}
