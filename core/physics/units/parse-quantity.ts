/** parseQuantity: a student's answer text ('63 µT', '6.3 × 10^-5 T', '0,063 mT' in fr-FR) to an SI value. */
import { describeDimension, dimensionFromVector } from './dimensions.ts';
import { fail } from './errors.ts';
import { readNumber, usesDecimalComma } from './number-text.ts';
import type { Dimension, ParseOptions, ParseResult } from './types.ts';
import { normaliseCharacters } from './unit-text.ts';
import { parseUnit } from './unit-parser.ts';

const MAX_ANSWER = 200;
const commaLocales = new Map<string, boolean>();

function decimalComma(locale: string | undefined): boolean {
  if (!locale) return false;
  let known = commaLocales.get(locale);
  if (known === undefined) {
    known = usesDecimalComma(locale);
    if (commaLocales.size < 500) commaLocales.set(locale, known);
  }
  return known;
}

function expectedHint(expected: Dimension | undefined): string {
  if (!expected) return '';
  const { name, unitName, symbol } = describeDimension(expected);
  return symbol === '' ? ` This question asks for a ${name}.` : ` This question asks for a ${name}, in ${unitName} (${symbol}).`;
}

/** A lowercase t (tonne) where a field is asked: '63 mt' → 'mT'. Only single prefixed t-units qualify. */
function teslaTypo(unitText: string): string | null {
  const m = /^([munµμkpG]?)t$/.exec(unitText.trim());
  if (!m) return null;
  const prefix = m[1] === 'u' || m[1] === 'μ' ? 'µ' : (m[1] ?? '');
  return `${prefix}T`;
}

/**
 * Parses an answer such as '6.3e-5 T', '63 µT', '0.63 G', '6.3 × 10⁻⁵ T' or 'Wb/m^2' quantities into an SI value,
 * the unit as written (normalised), its dimension, the typed magnitude, significant figures and whether the unit
 * is prefixed. Errors: 'empty', 'not-a-number', 'unknown-unit'.
 */
export function parseQuantity(text: string, options: ParseOptions = {}): ParseResult {
  const clean = normaliseCharacters(text).trim();
  if (clean === '') return fail('empty', 'Type an answer: a number and its unit, for example 6.3e-5 T.');
  if (clean.length > MAX_ANSWER) return fail('not-a-number', 'That answer is too long. Type just a number and its unit.');
  const number = readNumber(clean, decimalComma(options.locale));
  if (!number.ok) return number;

  if (options.expected === 'magnetic-field') {
    const suggestion = teslaTypo(number.rest);
    if (suggestion) {
      return fail(
        'unknown-unit',
        `"${number.rest}" would mean tonnes, which measure mass. This question asks for a magnetic field: did you mean ${suggestion} (${suggestion === 'T' ? 'tesla' : `${describePrefix(suggestion)}tesla`})?`,
      );
    }
  }
  const unit = parseUnit(number.rest);
  if (!unit.ok) return fail(unit.error.code, unit.error.message + expectedHint(options.expected));

  const sign = number.negative ? '-' : '';
  const magnitude = Number(`${sign}${number.digits}e${number.exponent}`);
  // Scaling the decimal string by the exact power of ten avoids rounding noise (63 µT is exactly 6.3e-5).
  const value = unit.pow10 === null ? magnitude * unit.factor : Number(`${sign}${number.digits}e${number.exponent + unit.pow10}`);
  if (!Number.isFinite(magnitude) || !Number.isFinite(value)) {
    return fail('not-a-number', 'That number is too large to work with. Check the power of ten.');
  }
  return {
    ok: true,
    value: value === 0 ? 0 : value,
    unit: unit.display,
    dimension: dimensionFromVector(unit.dims),
    magnitude: magnitude === 0 ? 0 : magnitude,
    sigFigs: number.sigFigs,
    prefixed: unit.prefixed,
  };
}

function describePrefix(symbol: string): string {
  const names: Record<string, string> = { m: 'milli', µ: 'micro', n: 'nano', k: 'kilo', p: 'pico', G: 'giga' };
  return names[symbol.slice(0, -1)] ?? '';
}
