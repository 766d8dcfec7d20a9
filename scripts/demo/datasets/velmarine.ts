/**
 * Velmarine HT-40, an invented heat-transfer oil: specific heat with replicate runs, density with one excluded
 * outlier.
 */
import { linspace } from '../random.ts';
import { INVENTED_NOTICE, TEAM, type DemoDataset } from '../scenario.ts';

const material = { name: 'Velmarine HT-40 heat-transfer oil (invented)', phase: 'liquid', pressure: '101.325 kPa up to 150 °C, blanketed above' };
const temperatureC = { name: 'temperature', symbol: 't', unit: '°C' };
/** Data row (1 = first row after the header) of the density reading that the invented log flags. */
const OUTLIER_ROW = 9;

export const velmarineSpecificHeat: DemoDataset = {
  slug: 'velmarine-ht40-specific-heat',
  meta: {
    title: 'Specific heat of Velmarine HT-40 heat-transfer oil',
    invented: true,
    property: { name: 'specific heat capacity', symbol: 'c_p', unit: 'J/(kg·K)' },
    variable: temperatureC,
    material,
    source: {
      citation: `${TEAM}, three repeat DSC runs, report TDG-R-0398 (fictitious)`,
      method: 'measured',
      date: '2025-12-15',
      preparedBy: 'I. Okonkwo-Lind (fictitious)',
      notes: `${INVENTED_NOTICE} Each temperature was measured in three separate runs (column run).`,
    },
    uncertainty: { statement: '±1 % of reading (k = 2)', relative: 0.005 },
    data: { x: 't_C', y: 'cp', note: 'run', replicates: true },
    tags: ['heat-transfer oil', 'Velmarine HT-40', 'specific heat', 'replicates'],
    review: { status: 'approved', reviewer: 'R. Castellane (fictitious)', date: '2026-01-08' },
  },
  comments: ['Run C at 190 °C corrected from the raw file after the review: it had been typed 12 J/(kg·K) low (invented correction).'],
  // The approval was given to the file before that correction, so the demo shows it as lapsed (data changed).
  approvedRows: (rows) => rows.map((row) => (row[0] === '190' && row[2] === 'C' ? [row[0], String(Number(row[1]) - 12), row[2]] : row)),
  rows: (random) => {
    const rows: string[][] = [['t_C', 'cp', 'run']];
    for (const celsius of linspace(40, 310, 10)) {
      for (const run of ['A', 'B', 'C']) {
        const truth = 1820 + 3.55 * celsius + 0.00042 * celsius ** 2;
        rows.push([celsius.toFixed(0), random.normal(truth, 8).toFixed(0), run]);
      }
    }
    return rows;
  },
};

export const velmarineDensity: DemoDataset = {
  slug: 'velmarine-ht40-density',
  meta: {
    title: 'Density of Velmarine HT-40 heat-transfer oil',
    invented: true,
    property: { name: 'density', symbol: '\\rho', unit: 'kg/m³' },
    variable: temperatureC,
    material,
    source: {
      citation: `${TEAM}, hydrometer and pycnometer series TDG-L-0093 (fictitious)`,
      method: 'measured',
      date: '2025-12-03',
      preparedBy: 'M. Ivarsdóttir (fictitious)',
      notes: INVENTED_NOTICE,
    },
    uncertainty: { statement: '±0.6 kg/m³ (k = 2)' },
    data: { x: 't_C', y: 'rho' },
    fit: {
      exclude: [{ row: OUTLIER_ROW, reason: 'bath thermostat overshoot logged during this reading (invented log entry TDG-L-0093/17)' }],
    },
    tags: ['heat-transfer oil', 'Velmarine HT-40', 'density', 'excluded point'],
    review: { status: 'approved', reviewer: 'R. Castellane (fictitious)', date: '2026-01-08' },
  },
  rows: (random) => [
    ['t_C', 'rho'],
    ...linspace(20, 320, 16).map((celsius, index) => {
      const outlier = index + 1 === OUTLIER_ROW ? 6.5 : 0;
      return [celsius.toFixed(0), (random.normal(880 - 0.65 * celsius - 0.00021 * celsius ** 2, 0.3) + outlier).toFixed(2)];
    }),
  ],
};
