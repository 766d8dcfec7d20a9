/** Page script of the FitChart component: draws the fit charts of the page (mountFitCharts.ts). */
import { mountFitCharts } from '../mountFitCharts.ts';

void mountFitCharts();
