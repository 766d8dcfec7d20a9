/**
 * Two more invented materials: Marrowlite P6 (a small data set with a fixed order) and Ostrel-4 (a large logger
 * sweep of about two thousand points).
 */
import { linspace } from '../random.ts';
import { INVENTED_NOTICE, TEAM, type DemoDataset } from '../scenario.ts';

export const marrowliteConductivity: DemoDataset = {
  slug: 'marrowlite-p6-conductivity',
  bindApproval: false,
  meta: {
    title: 'Thermal conductivity of Marrowlite P6 insulation foam',
    invented: true,
    property: { name: 'thermal conductivity', symbol: '\\lambda', unit: 'W/(m·K)' },
    variable: { name: 'mean specimen temperature', symbol: 'T', unit: 'K' },
    material: { name: 'Marrowlite P6 closed-cell foam (invented)', phase: 'solid', grade: 'density class 45 (invented)', conditions: 'aged 90 days before test' },
    source: {
      citation: `${TEAM}, guarded hot-plate series TDG-H-0009 (fictitious)`,
      method: 'measured',
      date: '2025-10-21',
      preparedBy: 'A. Feldhaus-Mbeki (fictitious)',
      notes: INVENTED_NOTICE,
    },
    uncertainty: { statement: '±3 % (k = 2)', relative: 0.015 },
    data: { x: 'T_K', y: 'lambda' },
    fit: { order: 1, reason: 'eight points over 120 K; the hot-plate method is linear in this range and a higher order would fit noise' },
    tags: ['insulation', 'Marrowlite P6', 'thermal conductivity', 'small data set'],
    review: {
      status: 'approved',
      reviewer: 'R. Castellane (fictitious)',
      date: '2025-11-04',
      notes: 'Approved before approvals recorded a fingerprint: shown as an unbound approval until it is reviewed again (invented review note).',
    },
  },
  rows: (random) => [
    ['T_K', 'lambda'],
    ...linspace(233.15, 353.15, 8).map((kelvin) => [kelvin.toFixed(2), random.normal(0.0212 + 0.000031 * (kelvin - 273.15), 0.0003).toFixed(5)]),
  ],
};

export const ostrelSurfaceTension: DemoDataset = {
  slug: 'ostrel-4-surface-tension',
  meta: {
    title: 'Surface tension of Ostrel-4 cleaning solvent against air',
    invented: true,
    property: { name: 'surface tension', symbol: '\\sigma', unit: 'mN/m' },
    variable: { name: 'temperature', symbol: 't', unit: '°C' },
    material: { name: 'Ostrel-4 cleaning solvent (invented)', phase: 'liquid', pressure: '101.325 kPa', conditions: 'liquid–air interface, dry air' },
    source: {
      citation: `${TEAM}, automated bubble-pressure tensiometer, logger file TDG-T-0162 (fictitious)`,
      method: 'measured',
      date: '2026-03-12',
      preparedBy: 'M. Ivarsdóttir (fictitious)',
      notes: `${INVENTED_NOTICE} A slow temperature ramp logged about every 2.4 s, 2000 readings.`,
    },
    uncertainty: { statement: '±0.1 mN/m (k = 2)' },
    data: { x: 't_C', y: 'sigma' },
    tags: ['solvent', 'Ostrel-4', 'surface tension', 'large data set'],
    review: { status: 'draft' },
  },
  rows: (random) => [
    ['t_C', 'sigma'],
    ...linspace(5, 85, 2000).map((celsius) => {
      const logged = celsius + random.normal(0, 0.01);
      return [logged.toFixed(3), random.normal(28.4 - 0.0925 * logged + 0.00006 * logged ** 2, 0.05).toFixed(3)];
    }),
  ],
};
