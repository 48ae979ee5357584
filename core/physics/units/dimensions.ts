/**
 * Named physical dimensions over mathjs's base-dimension vectors (MASS, LENGTH, TIME, CURRENT, TEMPERATURE,
 * LUMINOUS_INTENSITY, AMOUNT_OF_SUBSTANCE, ANGLE, BIT), with the words messages use.
 */
import { PhysicsError } from './errors.ts';
import { math } from './math.ts';
import type { Dimension } from './types.ts';
import { parseUnit } from './unit-parser.ts';

/** How a message talks about a dimension: { name: 'magnetic field', unitName: 'tesla', symbol: 'T' }. */
export interface DimensionInfo {
  name: string;
  unitName: string;
  symbol: string;
}

// [id, words, SI unit name, symbol, unit text mathjs reads for the vector ('' = dimensionless)]
const NAMED: ReadonlyArray<readonly [Dimension, string, string, string, string]> = [
  ['dimensionless', 'pure number', 'no unit', '', ''],
  ['magnetic-field', 'magnetic field', 'tesla', 'T', 'T'],
  ['length', 'length', 'metre', 'm', 'm'],
  ['mass', 'mass', 'kilogram', 'kg', 'kg'],
  ['time', 'time', 'second', 's', 's'],
  ['current', 'electric current', 'ampere', 'A', 'A'],
  ['temperature', 'temperature', 'kelvin', 'K', 'K'],
  ['amount-of-substance', 'amount of substance', 'mole', 'mol', 'mol'],
  ['luminous-intensity', 'luminous intensity', 'candela', 'cd', 'cd'],
  ['angle', 'angle', 'radian', 'rad', 'rad'],
  ['voltage', 'voltage', 'volt', 'V', 'V'],
  ['resistance', 'resistance', 'ohm', 'Ω', 'ohm'],
  ['force', 'force', 'newton', 'N', 'N'],
  ['energy', 'energy', 'joule', 'J', 'J'],
  ['power', 'power', 'watt', 'W', 'W'],
  ['charge', 'electric charge', 'coulomb', 'C', 'C'],
  ['magnetic-flux', 'magnetic flux', 'weber', 'Wb', 'Wb'],
  ['frequency', 'frequency', 'hertz', 'Hz', 'Hz'],
  ['pressure', 'pressure', 'pascal', 'Pa', 'Pa'],
  ['capacitance', 'capacitance', 'farad', 'F', 'F'],
  ['inductance', 'inductance', 'henry', 'H', 'H'],
  ['area', 'area', 'square metre', 'm^2', 'm^2'],
  ['volume', 'volume', 'cubic metre', 'm^3', 'm^3'],
  ['speed', 'speed', 'metre per second', 'm/s', 'm/s'],
  ['acceleration', 'acceleration', 'metre per second squared', 'm/s^2', 'm/s^2'],
  ['angular-speed', 'angular speed', 'radian per second', 'rad/s', 'rad/s'],
  ['density', 'density', 'kilogram per cubic metre', 'kg/m^3', 'kg/m^3'],
  ['magnetic-moment', 'magnetic moment', 'ampere square metre', 'A m^2', 'A m^2'],
  ['magnetic-field-strength', 'magnetic field strength', 'ampere per metre', 'A/m', 'A/m'],
  ['permeability', 'permeability', 'newton per ampere squared', 'N/A^2', 'N/A^2'],
];

/** A count (number of turns) is a pure number; it has words of its own but no vector of its own. */
const COUNT_INFO: DimensionInfo = { name: 'number (a count)', unitName: 'no unit', symbol: '' };

const BASE_SYMBOLS = ['kg', 'm', 's', 'A', 'K', 'cd', 'mol', 'rad', 'b'];
const BASE_COUNT = math.Unit.BASE_DIMENSIONS.length;

const byKey = new Map<string, Dimension>();
const byId = new Map<Dimension, { info: DimensionInfo; dims: readonly number[] }>();
for (const [id, name, unitName, symbol, unitText] of NAMED) {
  const dims = unitText === '' ? new Array<number>(BASE_COUNT).fill(0) : math.unit(unitText).dimensions;
  byKey.set(dims.join(','), id);
  byId.set(id, { info: { name, unitName, symbol }, dims });
}

/** SI base units for any vector: 'kg m^2 s^-3 A^-1' (readable back by parseQuantity). */
export function baseUnitText(dims: readonly number[]): string {
  const parts: string[] = [];
  dims.forEach((power, k) => {
    if (power === 0) return;
    const symbol = BASE_SYMBOLS[k] ?? math.Unit.BASE_DIMENSIONS[k] ?? '?';
    parts.push(power === 1 ? symbol : `${symbol}^${Number(power.toPrecision(12))}`);
  });
  return parts.join(' ');
}

/** The dimension id of a vector: a named one ('magnetic-field') or its SI base units ('kg m s^-1'). */
export function dimensionFromVector(dims: readonly number[]): Dimension {
  return byKey.get(dims.join(',')) ?? baseUnitText(dims);
}

/** The SI unit to show for a vector: the named unit's symbol (T, N, Wb) or its base units. */
export function siUnitFor(dims: readonly number[]): string {
  const id = byKey.get(dims.join(','));
  return id === undefined ? baseUnitText(dims) : (byId.get(id)?.info.symbol ?? baseUnitText(dims));
}

/** The base-dimension vector of a named dimension, or undefined for an unnamed one. */
export function dimensionVector(dim: Dimension): readonly number[] | undefined {
  if (dim === 'count') return byId.get('dimensionless')?.dims;
  return byId.get(dim)?.dims;
}

/** Words for a dimension in messages: describeDimension('magnetic-field') → { name: 'magnetic field', unitName: 'tesla', symbol: 'T' }. */
export function describeDimension(dim: Dimension): DimensionInfo {
  if (dim === 'count') return COUNT_INFO;
  const named = byId.get(dim);
  if (named) return named.info;
  return { name: `quantity measured in ${dim}`, unitName: dim, symbol: dim };
}

/** The dimension of a unit text ('mT' → 'magnetic-field', 'N/(A m)' → 'magnetic-field'); throws PhysicsError 'unknown-unit'. */
export function dimensionOf(unit: string): Dimension {
  const parsed = parseUnit(unit);
  if (!parsed.ok) throw new PhysicsError(parsed.error.code, parsed.error.message);
  return dimensionFromVector(parsed.dims);
}
