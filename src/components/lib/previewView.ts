/**
 * What a page's "other orders" section (OrderPreview.astro) shows of the previews besides their JSON: the published
 * order's statistics, which orders have a preview, and whether (and at how many points) their residuals are
 * sampled. Built with the downloads in a build (pageParts.ts), so the page need not read the full fit record.
 */
import type { OrderPreviews } from './entryView.ts';

export interface PreviewView {
  readonly statistics: OrderPreviews['statistics'];
  readonly orders: readonly number[];
  readonly sampled: boolean;
  readonly residualPoints: number;
}

/** @example previewView(previews)?.orders // => [1, 3, 4] */
export function previewView(previews: OrderPreviews | null): PreviewView | null {
  if (previews === null) return null;
  return { statistics: previews.statistics, orders: previews.previews.map((preview) => preview.order), sampled: previews.sampled, residualPoints: previews.residualX.length };
}
