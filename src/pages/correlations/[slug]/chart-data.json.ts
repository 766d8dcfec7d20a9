/**
 * `/correlations/<slug>/chart-data.json`: the chart data of a correlation with many points, fetched by the browser
 * chart instead of being embedded in the page (see EMBED_POINT_LIMIT). Small data sets embed it and get no file.
 */
import type { APIRoute, GetStaticPaths } from 'astro';
import { EMBED_POINT_LIMIT, chartData } from '../../../components/lib/chartData.ts';
import { correlationPaths } from '../../../components/lib/correlationPaths.ts';
import { fitOf, usedPoints, type CorrelationEntry } from '../../../components/lib/entryView.ts';

export const getStaticPaths = (async () =>
  (await correlationPaths({ fittedOnly: true })).filter((path) => usedPoints(path.props.entry).length > EMBED_POINT_LIMIT)) satisfies GetStaticPaths;

export const GET: APIRoute<{ entry: CorrelationEntry }> = ({ props }) => {
  const { entry } = props;
  return new Response(JSON.stringify(chartData(entry, fitOf(entry)!)), { headers: { 'Content-Type': 'application/json' } });
};
