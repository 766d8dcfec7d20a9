/**
 * Corvane-12, an invented glycol-type coolant: specific heat from two sources, density, viscosity.
 */
import { linspace, significant } from '../random.ts';
import { INVENTED_NOTICE, TEAM, type DemoDataset } from '../scenario.ts';

const material = { name: 'Corvane-12 coolant (invented)', phase: 'liquid', pressure: '101.325 kPa', grade: 'lot C12-07' };
const specificHeat = { name: 'specific heat capacity', symbol: 'c_p', unit: 'J/(kg·K)' };
const temperatureK = { name: 'temperature', symbol: 'T', unit: 'K' };

/** Invented truth for the coolant's specific heat, J/(kg·K), T in kelvin. */
const cpTruth = (kelvin: number): number => 3050 + 3.1 * (kelvin - 273.15) + 0.0042 * (kelvin - 273.15) ** 2;

export const corvaneSpecificHeat: DemoDataset = {
  slug: 'corvane-12-specific-heat',
  meta: {
    title: 'Specific heat of Corvane-12 coolant, liquid (in-house DSC)',
    invented: true,
    property: specificHeat,
    variable: temperatureK,
    material,
    source: {
      citation: `${TEAM}, test report TDG-R-0412 (fictitious), differential scanning calorimetry, 25 steps`,
      method: 'measured',
      date: '2026-03-04',
      preparedBy: 'I. Okonkwo-Lind (fictitious)',
      notes: INVENTED_NOTICE,
    },
    uncertainty: { statement: '±0.4 % of reading (k = 2), as stated by the invented test report', relative: 0.002 },
    data: { x: 'T_K', y: 'cp' },
    tags: ['coolant', 'Corvane-12', 'specific heat', 'two sources'],
    review: { status: 'approved', reviewer: 'R. Castellane (fictitious)', date: '2026-03-20' },
  },
  rows: (random) => [
    ['T_K', 'cp'],
    ...linspace(253.15, 373.15, 25).map((kelvin) => [kelvin.toFixed(2), random.normal(cpTruth(kelvin), 4).toFixed(1)]),
  ],
};

export const corvaneSpecificHeatSupplier: DemoDataset = {
  slug: 'corvane-12-specific-heat-supplier',
  meta: {
    title: 'Specific heat of Corvane-12 coolant, liquid (supplier table)',
    invented: true,
    property: specificHeat,
    variable: temperatureK,
    material: { ...material, grade: 'all lots, supplier typical values' },
    source: {
      citation: 'Corvane-12 product data sheet, table 3, issue D (fictitious supplier document)',
      method: 'table',
      date: '2025-11-18',
      preparedBy: 'I. Okonkwo-Lind (fictitious)',
      notes: `${INVENTED_NOTICE} Values are printed to four significant digits, so rounding is the only scatter.`,
    },
    data: { x: 'T_K', y: 'cp' },
    fit: { criterion: 'aicc' },
    tags: ['coolant', 'Corvane-12', 'specific heat', 'two sources'],
    review: {
      status: 'withdrawn',
      reviewer: 'R. Castellane (fictitious)',
      notes: 'Compared with the in-house DSC series during review (invented review note).',
      withdrawnReason: 'Superseded: the in-house DSC measurements cover the same range with a stated uncertainty, and the printed table gives none (invented reason).',
      withdrawnDate: '2026-03-21',
      replacedBy: 'corvane-12-specific-heat',
    },
  },
  comments: ['Read from the (fictitious) supplier table; values rounded to 4 significant digits there.'],
  rows: () => [
    ['T_K', 'cp'],
    ...linspace(253.15, 373.15, 13).map((kelvin) => [kelvin.toFixed(2), significant(1.006 * cpTruth(kelvin) - 4, 4)]),
  ],
};

export const corvaneDensity: DemoDataset = {
  slug: 'corvane-12-density',
  meta: {
    title: 'Density of Corvane-12 coolant, liquid',
    invented: true,
    property: { name: 'density', symbol: '\\rho', unit: 'kg/m³' },
    variable: { name: 'temperature', symbol: 't', unit: '°C' },
    material,
    source: {
      citation: `${TEAM}, oscillating-tube densimeter log TDG-L-0088 (fictitious)`,
      method: 'measured',
      date: '2026-02-11',
      preparedBy: 'M. Ivarsdóttir (fictitious)',
      notes: INVENTED_NOTICE,
    },
    uncertainty: { statement: '±0.3 kg/m³ (k = 2)' },
    data: { x: 't_C', y: 'rho' },
    tags: ['coolant', 'Corvane-12', 'density'],
    review: { status: 'approved', reviewer: 'R. Castellane (fictitious)', date: '2026-02-25' },
  },
  rows: (random) => [
    ['t_C', 'rho'],
    ...linspace(-20, 100, 18).map((celsius) => [celsius.toFixed(1), random.normal(1068 - 0.52 * celsius - 0.0018 * celsius ** 2, 0.15).toFixed(2)]),
  ],
};

export const corvaneViscosity: DemoDataset = {
  slug: 'corvane-12-viscosity',
  meta: {
    title: 'Dynamic viscosity of Corvane-12 coolant, liquid',
    invented: true,
    property: { name: 'dynamic viscosity', symbol: '\\mu', unit: 'mPa·s' },
    variable: temperatureK,
    material,
    source: {
      citation: `${TEAM}, rotational viscometer series TDG-V-0031 (fictitious)`,
      method: 'measured',
      date: '2026-02-18',
      preparedBy: 'M. Ivarsdóttir (fictitious)',
      notes: `${INVENTED_NOTICE} The invented truth is Arrhenius-like, so ln μ is fitted against 1/T.`,
    },
    uncertainty: { statement: '±2 % of reading (k = 2)', relative: 0.01 },
    data: { x: 'T_K', y: 'mu' },
    fit: { transform: { x: 'reciprocal', y: 'log' }, maxOrder: 4 },
    tags: ['coolant', 'Corvane-12', 'viscosity', 'transform'],
    review: { status: 'draft' },
  },
  rows: (random) => [
    ['T_K', 'mu'],
    ...linspace(258.15, 368.15, 20).map((kelvin) => {
      const truth = Math.exp(-5.4 + 1890 / kelvin + 65000 / kelvin ** 2);
      return [kelvin.toFixed(2), significant(truth * (1 + random.normal(0, 0.01)), 4)];
    }),
  ],
};
