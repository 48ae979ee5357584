import { describeDimension, dimensionFromVector } from '../physics/units/dimensions';
import { parseUnit } from '../physics/units/unit-parser';
import type { Dimension } from '../physics/units/types';

/** The unit a numeric question asks in, read by the engine: its display text, factor to SI and dimension. */
export type AskedUnit = { ok: true; display: string; factor: number; dimension: Dimension } | { ok: false; message: string };

/** Reads the asked unit; an empty one asks for a plain number. */
export function readAskedUnit(askedUnit: string): AskedUnit {
  const text = askedUnit.trim();
  if (text === '') return { ok: true, display: '', factor: 1, dimension: 'dimensionless' };
  const unit = parseUnit(text);
  if (!unit.ok) return { ok: false, message: unit.error.message };
  return { ok: true, display: unit.display, factor: unit.factor, dimension: dimensionFromVector(unit.dims) };
}

/** A number to 4 significant figures without trailing zeros; powers of ten outside 0.001 … 999 999. */
export function formatNumber(value: number): string {
  if (value === 0) return '0';
  const rounded = Number(value.toPrecision(4));
  const size = Math.abs(rounded);
  if (size >= 1e-3 && size < 1e6) return String(rounded);
  const [mantissa = '', exponent = '0'] = rounded.toExponential().split('e');
  return `${mantissa}e${Number(exponent)}`;
}

/** An SI value written in the asked unit: 6.283e-5 in µT → "62.83 µT". */
export function formatInUnit(siValue: number, unit: { display: string; factor: number }): string {
  const number = formatNumber(siValue / unit.factor);
  return unit.display === '' ? number : `${number} ${unit.display}`;
}

/** "a length", "a magnetic field (T)", "a plain number (no unit)": how messages name a dimension. */
export function dimensionPhrase(dimension: Dimension, withSymbol: boolean): string {
  if (dimension === 'dimensionless' || dimension === 'count') return withSymbol ? 'a plain number (no unit)' : 'a plain number';
  const info = describeDimension(dimension);
  const article = /^[aeiou]/i.test(info.name) ? 'an' : 'a';
  return withSymbol && info.symbol !== '' ? `${article} ${info.name} (${info.symbol})` : `${article} ${info.name}`;
}
