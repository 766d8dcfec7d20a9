/**
 * `/correlations/<slug>/plot.svg`: the fit and residual plots as a static SVG (src/render/renderFitSvg.ts), shown
 * on the page when scripts do not run and when printing.
 */
import type { APIRoute, GetStaticPaths } from 'astro';
import { chartData } from '../../../components/lib/chartData.ts';
import { correlationPaths } from '../../../components/lib/correlationPaths.ts';
import { fitOf, type CorrelationEntry } from '../../../components/lib/entryView.ts';
import { renderFitSvg } from '../../../render/index.ts';

export const getStaticPaths = (() => correlationPaths({ fittedOnly: true })) satisfies GetStaticPaths;

export const GET: APIRoute<{ entry: CorrelationEntry }> = ({ props }) => {
  const { entry } = props;
  const svg = renderFitSvg(chartData(entry, fitOf(entry)!), { title: `${entry.meta.title}: data, fitted curve and bands; residuals below` });
  return new Response(svg, { headers: { 'Content-Type': 'image/svg+xml; charset=utf-8' } });
};
