/**
 * The rows of the catalogue's table (src/pages/index.astro) as one string of HTML: the same bytes as the page's
 * row template with its InventedBadge and StatusBadge components (each run of whitespace between tags one space),
 * texts escaped as Astro escapes an expression (htmlText.ts) and attributes as it writes them (htmlAttribute.ts),
 * instead of a thousand rows of template expressions and two thousand component renders on the thread that renders
 * the pages.
 */
import { fitSummaryOf, unitSuffix, type CorrelationEntry } from './entryView.ts';
import { htmlAttribute } from './htmlAttribute.ts';
import { htmlText } from './htmlText.ts';
import { propertyKey } from './propertyKey.ts';
import { statusBadgeView } from './statusBadgeView.ts';

/** InventedBadge.astro. */
const INVENTED_BADGE = '<span class="badge badge-invented" title="Made-up demonstration numbers; describes no real substance">invented data</span>';

/** StatusBadge.astro for an entry's status, review trail and replacement. */
function statusBadge(status: string, approval: CorrelationEntry['reviewTrail'], replacedBy: string | undefined): string {
  const view = statusBadgeView(status, undefined, approval, replacedBy);
  return (
    `<span${htmlAttribute('class', `badge status-badge status-${view.kind} status-${view.slug}`)}${htmlAttribute('data-status', status)}${htmlAttribute('data-approval', approval?.approval)}${htmlAttribute('title', view.title)}>` +
    `<span class="status-mark" aria-hidden="true">${htmlText(view.mark)}</span> ${htmlText(view.text)}</span>`
  );
}

/**
 * @param entries the catalogue's entries, in its order
 * @param base the site's base path, ending in '/'
 * @example catalogueRowsHtml(entries, '/').startsWith('<tr') // => true
 */
export function catalogueRowsHtml(entries: readonly CorrelationEntry[], base: string): string {
  let html = '';
  for (const entry of entries) {
    const fit = fitSummaryOf(entry);
    const unit = htmlText(unitSuffix(entry.meta.variable.unit));
    const status = entry.meta.review.status;
    const property = propertyKey(entry.meta.property);
    html +=
      `<tr${htmlAttribute('class', entry.reviewTrail.approval === 'holds' ? undefined : `not-approved ${status}`)}${htmlAttribute('data-slug', entry.slug)}${htmlAttribute('data-property', property)}` +
      `${htmlAttribute('data-material', entry.meta.material.name)}${htmlAttribute('data-status', status)}${htmlAttribute('data-tags', JSON.stringify(entry.meta.tags))}>` +
      ` <td><a${htmlAttribute('href', `${base}correlations/${entry.slug}/`)}>${htmlText(entry.meta.title)}</a>${entry.meta.invented ? ` ${INVENTED_BADGE}` : ''}</td>` +
      ` <td>${htmlText(entry.meta.material.name)}</td>` +
      ` <td><a${htmlAttribute('href', `${base}properties/${property}/`)}>${htmlText(entry.meta.property.name)}</a> (${htmlText(entry.meta.property.unit)})</td>` +
      ` <td class="num"${htmlAttribute('data-value', entry.range.min)}>${entry.range.min}${unit} to ${entry.range.max}${unit}</td>` +
      ` <td class="num"${htmlAttribute('data-value', fit ? fit.statistics.n : -1)}>${fit ? fit.statistics.n : '—'}</td>` +
      ` <td class="num"${htmlAttribute('data-value', fit ? fit.order : -1)}>${fit ? fit.order : '—'}</td>` +
      ` <td>${statusBadge(status, entry.reviewTrail, entry.meta.review.replacedBy)}</td> </tr>`;
  }
  return html;
}
