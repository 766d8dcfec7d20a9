/**
 * Brindlewick BW-3, an invented structural alloy: thermal strain with a pass-through point at the reference
 * temperature, and thermal conductivity with per-point uncertainties.
 */
import { linspace, significant } from '../random.ts';
import { INVENTED_NOTICE, TEAM, type DemoDataset } from '../scenario.ts';

const material = { name: 'Brindlewick BW-3 alloy (invented)', phase: 'solid', grade: 'plate, solution-annealed (invented condition)' };
const temperatureK = { name: 'temperature', symbol: 'T', unit: 'K' };
const REFERENCE_K = 293.15;

export const brindlewickThermalStrain: DemoDataset = {
  slug: 'brindlewick-bw3-thermal-strain',
  meta: {
    title: 'Thermal strain of Brindlewick BW-3 alloy, relative to 20 °C',
    invented: true,
    property: { name: 'thermal strain', symbol: '\\varepsilon_{th}', unit: 'µm/m' },
    variable: temperatureK,
    material,
    source: {
      citation: `${TEAM}, push-rod dilatometer runs TDG-D-0054 (fictitious)`,
      method: 'measured',
      date: '2026-02-02',
      preparedBy: 'I. Okonkwo-Lind (fictitious)',
      notes: INVENTED_NOTICE,
    },
    uncertainty: { statement: '±6 µm/m (k = 2)' },
    data: { x: 'T_K', y: 'strain' },
    fit: {
      passThrough: [{ x: REFERENCE_K, y: 0, reason: 'thermal strain is defined as zero at the reference temperature 293.15 K (20 °C)' }],
    },
    tags: ['alloy', 'Brindlewick BW-3', 'thermal expansion', 'constraint'],
    review: { status: 'approved', reviewer: 'R. Castellane (fictitious)', date: '2026-02-20' },
  },
  rows: (random) => [
    ['T_K', 'strain'],
    ...linspace(200, 800, 41).map((kelvin) => {
      const rise = kelvin - REFERENCE_K;
      return [kelvin.toFixed(1), random.normal(11.8 * rise + 0.003 * rise ** 2 - 1.1e-6 * rise ** 3, 3).toFixed(1)];
    }),
  ],
};

export const brindlewickConductivity: DemoDataset = {
  slug: 'brindlewick-bw3-conductivity',
  meta: {
    title: 'Thermal conductivity of Brindlewick BW-3 alloy',
    invented: true,
    property: { name: 'thermal conductivity', symbol: '\\lambda', unit: 'W/(m·K)' },
    variable: temperatureK,
    material,
    source: {
      citation: `${TEAM}, laser-flash diffusivity with measured c_p and density, report TDG-R-0433 (fictitious)`,
      method: 'measured',
      date: '2026-03-09',
      preparedBy: 'M. Ivarsdóttir (fictitious)',
      notes: `${INVENTED_NOTICE} Each point carries its own standard uncertainty, larger at high temperature.`,
    },
    uncertainty: { statement: 'per point, in column u_k (k = 1)' },
    data: { x: 'T_K', y: 'k', uncertainty: 'u_k', note: 'note' },
    fit: { weights: 'uncertainty', criterion: 'chiSquare' },
    tags: ['alloy', 'Brindlewick BW-3', 'thermal conductivity', 'weighted'],
    review: { status: 'in-review', reviewer: 'R. Castellane (fictitious)' },
  },
  rows: (random) => [
    ['T_K', 'k', 'u_k', 'note'],
    ...linspace(300, 900, 25).map((kelvin, index) => {
      const truth = 14.1 + 0.0152 * (kelvin - 300) - 4e-6 * (kelvin - 300) ** 2;
      const relative = 0.012 + 0.012 * ((kelvin - 300) / 600);
      const sigma = truth * relative;
      const note = index === 0 ? 'first specimen' : index === 13 ? 'second specimen from here on' : '';
      return [kelvin.toFixed(0), random.normal(truth, sigma).toFixed(3), significant(sigma, 2), note];
    }),
  ],
};
