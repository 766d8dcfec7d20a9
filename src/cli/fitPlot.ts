/**
 * `correlary fit … --plot FILE.svg`: the static picture of the fit (data, fitted curve with 95 % confidence and
 * prediction bands, residuals below), drawn by the same server-side renderer as the pages' no-script picture
 * (src/render/renderFitSvg.ts). No browser is needed.
 */
import { writeFile } from 'node:fs/promises';
import path from 'node:path';
import { cautionsFor, type PolynomialFit } from '../core/index.ts';
import type { LoadedCorrelation } from '../load/index.ts';
import { buildChartData, renderFitSvg } from '../render/index.ts';
import { CliError } from './cliError.ts';

function label(name: string, symbol: string, unit: string): string {
  const plain = symbol.replace(/[{}\\]/g, '');
  return `${name}${plain ? `, ${plain}` : ''}${unit && unit !== '1' ? ` (${unit})` : ''}`;
}

/** The SVG text of the plot. */
export function fitPlotSvg(correlation: LoadedCorrelation, fit: PolynomialFit): string {
  const { variable, property } = correlation.meta;
  const data = buildChartData({
    fit,
    points: correlation.used,
    excluded: correlation.excluded,
    xLabel: label(variable.name, variable.symbol, variable.unit),
    yLabel: label(property.name, property.symbol, property.unit),
    residualLabel: `y − ŷ${property.unit && property.unit !== '1' ? ` (${property.unit})` : ''}`,
    range: correlation.range,
  });
  // The cautions travel with the file as its description (the picture itself has no room for them).
  const unit = variable.unit === '1' ? '' : variable.unit;
  const cautions = cautionsFor(correlation.range, unit, variable.name).join(' ');
  return renderFitSvg(data, { title: `${correlation.meta.title}: data, fitted curve and bands; residuals below`, description: `Cautions: ${cautions}` });
}

/** Write the plot to `file` (must end in .svg and must not be one of the inputs). */
export async function writeFitPlot(file: string, inputs: readonly string[], correlation: LoadedCorrelation, fit: PolynomialFit): Promise<void> {
  if (!file.toLowerCase().endsWith('.svg')) throw new CliError(`--plot needs a file name ending in .svg, got '${file}'`, 2);
  if (inputs.some((input) => path.resolve(input) === path.resolve(file))) throw new CliError(`--plot '${file}' would overwrite an input file`, 2);
  await writeFile(file, fitPlotSvg(correlation, fit));
}
