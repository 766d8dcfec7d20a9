/**
 * Temperature scales and the exact affine conversions between them.
 *
 * Definitions (SI Brochure, 9th ed., §2.3.1 and common practice for the Fahrenheit scale):
 *   x_K  = x_°C + 273.15
 *   x_°F = 9/5 · x_°C + 32
 * Both constants are exact by definition, so they are held as exact decimal rationals (273.15 = 27315/100,
 * 9/5 = 1.8 = 18/10) and every conversion is an exact affine map x_to = factor·x_from + offset. A conversion from
 * °F has a factor of 5/9, whose decimal does not terminate; the rationals carry it exactly.
 *
 * Units are recognised as the content format writes them (content/README.md): `K`, `°C` (also `℃`, `degC`) and
 * `°F` (also `℉`, `degF`). Anything else is not a temperature scale (null).
 */
import { parseDecimal } from '../exact/decimal.ts';
import { add, divide, multiply, rational, subtract, type Rational } from '../exact/rational.ts';
import type { TemperatureScale } from '../types.ts';

/** The three scales in the order they are published. */
export const TEMPERATURE_SCALES: readonly TemperatureScale[] = ['K', '°C', '°F'];

/** x_to = factor·x_from + offset, exact. */
export interface AffineMap {
  readonly factor: Rational;
  readonly offset: Rational;
}

const KELVIN_OFFSET = parseDecimal('273.15');
const FAHRENHEIT_FACTOR = parseDecimal('1.8');
const FAHRENHEIT_OFFSET = parseDecimal('32');

const SPELLINGS: Readonly<Record<string, TemperatureScale>> = {
  K: 'K',
  '°C': '°C',
  '℃': '°C',
  degC: '°C',
  '°F': '°F',
  '℉': '°F',
  degF: '°F',
};

/**
 * The temperature scale a unit names, or null when the unit is not a temperature scale.
 * @example temperatureScaleOf('°C') // => '°C'
 */
export function temperatureScaleOf(unit: string): TemperatureScale | null {
  return SPELLINGS[unit.trim()] ?? null;
}

/** x_°C from x in a scale. */
function toCelsius(scale: TemperatureScale): AffineMap {
  if (scale === 'K') return { factor: rational(1n), offset: rational(-KELVIN_OFFSET.num, KELVIN_OFFSET.den) };
  if (scale === '°F') return { factor: divide(rational(1n), FAHRENHEIT_FACTOR), offset: divide(rational(-FAHRENHEIT_OFFSET.num, FAHRENHEIT_OFFSET.den), FAHRENHEIT_FACTOR) };
  return { factor: rational(1n), offset: rational(0n) };
}

/** x in a scale from x_°C. */
function fromCelsius(scale: TemperatureScale): AffineMap {
  if (scale === 'K') return { factor: rational(1n), offset: KELVIN_OFFSET };
  if (scale === '°F') return { factor: FAHRENHEIT_FACTOR, offset: FAHRENHEIT_OFFSET };
  return { factor: rational(1n), offset: rational(0n) };
}

/**
 * The exact affine map x_to = factor·x_from + offset between two scales (through °C).
 * @example scaleConversion('°C', 'K') // => { factor: 1, offset: 273.15 } (as rationals)
 */
export function scaleConversion(from: TemperatureScale, to: TemperatureScale): AffineMap {
  const first = toCelsius(from);
  const second = fromCelsius(to);
  return { factor: multiply(second.factor, first.factor), offset: add(multiply(second.factor, first.offset), second.offset) };
}

/**
 * x_from from x_to: the inverse map.
 * @example inverseMap(scaleConversion('°C', 'K')) // => { factor: 1, offset: -273.15 } (as rationals)
 */
export function inverseMap(map: AffineMap): AffineMap {
  return { factor: divide(rational(1n), map.factor), offset: divide(subtract(rational(0n), map.offset), map.factor) };
}

/**
 * Apply an affine map to an exact value.
 * @example applyMap(scaleConversion('°C', '°F'), rational(100n)) // => 212 (as a rational)
 */
export function applyMap(map: AffineMap, value: Rational): Rational {
  return add(multiply(map.factor, value), map.offset);
}
