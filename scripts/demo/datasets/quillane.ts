/**
 * Quillane, an invented low-boiling working fluid: vapour pressure, saturated-liquid density, and a latent heat
 * derived from those two (the "computed from another correlation" case).
 */
import { linspace, significant } from '../random.ts';
import { INVENTED_NOTICE, TEAM, type DemoDataset } from '../scenario.ts';

const material = { name: 'Quillane working fluid (invented)', phase: 'saturation', pressure: 'saturation', grade: '99.5 % (invented purity)' };
const temperatureK = { name: 'temperature', symbol: 'T', unit: 'K' };
/** Invented critical temperature of Quillane, K. */
const CRITICAL_K = 374;

/** Invented Antoine-like vapour pressure, kPa. */
const vapourPressure = (kelvin: number): number => Math.exp(14.2 - 2650 / (kelvin - 35));
/** Invented saturated-liquid density, kg/m³. */
const liquidDensity = (kelvin: number): number => 510 + 1580 * (1 - kelvin / CRITICAL_K) ** 0.36;

export const quillaneVapourPressure: DemoDataset = {
  slug: 'quillane-vapour-pressure',
  meta: {
    title: 'Vapour pressure of Quillane working fluid',
    invented: true,
    property: { name: 'vapour pressure', symbol: 'p_\\sigma', unit: 'kPa' },
    variable: temperatureK,
    material: { ...material, phase: 'liquid–vapour equilibrium' },
    source: {
      citation: `${TEAM}, static-cell vapour-pressure campaign TDG-P-0207 (fictitious)`,
      method: 'measured',
      date: '2026-01-27',
      preparedBy: 'A. Feldhaus-Mbeki (fictitious)',
      notes: `${INVENTED_NOTICE} Pressures span more than two decades, so ln p is fitted against 1/T.`,
    },
    uncertainty: { statement: '±1 % of reading (k = 2)', relative: 0.005 },
    data: { x: 'T_K', y: 'p_kPa' },
    fit: { transform: { x: 'reciprocal', y: 'log' }, maxOrder: 5 },
    tags: ['working fluid', 'Quillane', 'vapour pressure', 'transform'],
    review: { status: 'approved', reviewer: 'R. Castellane (fictitious)', date: '2026-02-09' },
  },
  rows: (random) => [
    ['T_K', 'p_kPa'],
    ...linspace(220, 340, 30).map((kelvin) => [kelvin.toFixed(2), significant(vapourPressure(kelvin) * (1 + random.normal(0, 0.005)), 5)]),
  ],
};

export const quillaneLiquidDensity: DemoDataset = {
  slug: 'quillane-liquid-density',
  meta: {
    title: 'Saturated-liquid density of Quillane working fluid',
    invented: true,
    property: { name: 'saturated-liquid density', symbol: "\\rho'", unit: 'kg/m³' },
    variable: temperatureK,
    material: { ...material, phase: 'saturated liquid' },
    source: {
      citation: `${TEAM}, vibrating-tube series on the saturation line TDG-L-0121 (fictitious)`,
      method: 'measured',
      date: '2026-01-30',
      preparedBy: 'A. Feldhaus-Mbeki (fictitious)',
      notes: INVENTED_NOTICE,
    },
    uncertainty: { statement: '±1.5 kg/m³ (k = 2)' },
    data: { x: 'T_K', y: 'rho_l' },
    fit: { range: { max: 335 } },
    tags: ['working fluid', 'Quillane', 'density'],
    review: { status: 'in-review' },
  },
  comments: ['Near the invented critical point (374 K) the curve steepens; the validity range stops at 335 K.'],
  rows: (random) => [
    ['T_K', 'rho_l'],
    ...linspace(220, 340, 25).map((kelvin) => [kelvin.toFixed(1), random.normal(liquidDensity(kelvin), 0.75).toFixed(2)]),
  ],
};

export const quillaneLatentHeat: DemoDataset = {
  slug: 'quillane-latent-heat',
  meta: {
    title: 'Latent heat of vaporisation of Quillane working fluid (computed)',
    invented: true,
    property: { name: 'specific enthalpy of vaporisation', symbol: '\\Delta h_{lv}', unit: 'kJ/kg' },
    variable: temperatureK,
    material: { ...material, phase: 'liquid–vapour equilibrium' },
    source: {
      citation: `${TEAM}, calculation note TDG-C-0015 (fictitious)`,
      method: 'derived',
      derivedFrom: 'quillane-vapour-pressure and quillane-liquid-density, through the Clausius–Clapeyron relation with an ideal-gas vapour',
      date: '2026-02-12',
      preparedBy: 'A. Feldhaus-Mbeki (fictitious)',
      notes: `${INVENTED_NOTICE} Computed values are printed to four significant digits.`,
    },
    data: { x: 'T_K', y: 'dh_lv' },
    tags: ['working fluid', 'Quillane', 'latent heat', 'derived'],
    review: { status: 'draft' },
  },
  rows: () => [
    ['T_K', 'dh_lv'],
    ...linspace(220, 330, 12).map((kelvin) => [kelvin.toFixed(0), significant(265 * (1 - kelvin / CRITICAL_K) ** 0.38 + 18, 4)]),
  ],
};
