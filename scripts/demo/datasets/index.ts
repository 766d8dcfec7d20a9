/**
 * Every demo correlation, in the order they are written.
 */
import type { DemoDataset } from '../scenario.ts';
import { brindlewickConductivity, brindlewickThermalStrain } from './brindlewick.ts';
import { corvaneDensity, corvaneSpecificHeat, corvaneSpecificHeatSupplier, corvaneViscosity } from './corvane.ts';
import { marrowliteConductivity, ostrelSurfaceTension } from './others.ts';
import { quillaneLatentHeat, quillaneLiquidDensity, quillaneVapourPressure } from './quillane.ts';
import { velmarineDensity, velmarineSpecificHeat } from './velmarine.ts';

export const DEMO_DATASETS: readonly DemoDataset[] = [
  corvaneSpecificHeat,
  corvaneSpecificHeatSupplier,
  corvaneDensity,
  corvaneViscosity,
  quillaneVapourPressure,
  quillaneLiquidDensity,
  quillaneLatentHeat,
  brindlewickThermalStrain,
  brindlewickConductivity,
  velmarineSpecificHeat,
  velmarineDensity,
  marrowliteConductivity,
  ostrelSurfaceTension,
];
