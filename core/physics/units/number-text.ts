/**
 * Reads the number at the start of an answer: '6.3e-5', '6,3' (comma locales), '6.3 × 10^-5', '6.3x10⁻⁵',
 * '6.3*10^(-5)'. Returns the decimal digits untouched so callers can scale by powers of ten without noise.
 */
import { fail } from './errors.ts';
import type { Failure } from './types.ts';
import { isSuperscript, plainSuperscripts } from './unit-text.ts';

/** The number part of an answer, split into what is needed for exact values and for significant figures. */
export interface NumberText {
  ok: true;
  negative: boolean;
  /** The digits as typed with '.' as the decimal sign ('6.30'); never empty. */
  digits: string;
  /** The power of ten written after the digits (e-5, × 10^-5); 0 when none. */
  exponent: number;
  sigFigs: { min: number; max: number };
  /** What follows the number (the unit text), trimmed. */
  rest: string;
}

const TIMES = new Set(['×', 'x', 'X', '*']);

/** Whether a BCP 47 locale writes the decimal sign as a comma (asks Intl, falls back to '.'). */
export function usesDecimalComma(locale: string | undefined): boolean {
  if (!locale) return false;
  try {
    const part = new Intl.NumberFormat(locale).formatToParts(1.5).find((p) => p.type === 'decimal');
    return part?.value === ',';
  } catch {
    return false;
  }
}

function countSigFigs(intPart: string, fracPart: string, hasPoint: boolean): { min: number; max: number } {
  const all = (intPart + fracPart).replace(/^0+/, '');
  if (all === '') {
    // A zero: '0' has one figure, '0.00' the places written after the point (common practice).
    const n = Math.max(1, hasPoint ? fracPart.length : 1);
    return { min: n, max: n };
  }
  if (hasPoint) return { min: all.length, max: all.length };
  // No decimal point: trailing zeros may or may not be significant ('6300' is 2, 3 or 4 figures).
  const trailing = all.length - all.replace(/0+$/, '').length;
  return { min: Math.max(1, all.length - trailing), max: all.length };
}

const notANumber = (message: string): Failure => fail('not-a-number', message);

/** Reads an optional '^', then a signed integer, possibly in parentheses or as superscripts. */
function readPower(text: string, start: number): { value: number; end: number } | null {
  let i = start;
  if (isSuperscript(text[i])) {
    let j = i;
    while (isSuperscript(text[j])) j++;
    const plain = plainSuperscripts(text.slice(i, j));
    return /^[+-]?\d+$/.test(plain) ? { value: Number(plain), end: j } : null;
  }
  if (text.startsWith('^', i)) i++;
  else if (text.startsWith('**', i)) i += 2;
  else return null;
  while (text[i] === ' ') i++;
  const paren = text[i] === '(';
  if (paren) i++;
  const m = /^[+-]?\d+/.exec(text.slice(i));
  if (!m) return null;
  i += m[0].length;
  if (paren) {
    if (text[i] !== ')') return null;
    i++;
  }
  return { value: Number(m[0]), end: i };
}

/** Reads the leading number of a normalised answer text (see normaliseCharacters). */
export function readNumber(text: string, decimalComma: boolean): NumberText | Failure {
  let i = 0;
  let negative = false;
  if (text[i] === '-' || text[i] === '+') {
    negative = text[i] === '-';
    i++;
  }
  const intMatch = /^\d*/.exec(text.slice(i))?.[0] ?? '';
  i += intMatch.length;
  let fracPart = '';
  let hasPoint = false;
  const sep = text[i];
  if (sep === '.' || (sep === ',' && decimalComma)) {
    hasPoint = true;
    i++;
    fracPart = /^\d*/.exec(text.slice(i))?.[0] ?? '';
    i += fracPart.length;
  } else if (sep === ',' && /\d/.test(text[i + 1] ?? '')) {
    return notANumber('Use a point for the decimal sign (6.3, not 6,3), and do not group thousands with commas.');
  }
  if (intMatch === '' && fracPart === '') {
    return notANumber('Start your answer with a number, then its unit, for example 6.3e-5 T or 63 µT.');
  }
  if ((text[i] === '.' || text[i] === ',') && /\d/.test(text[i + 1] ?? '')) {
    return notANumber('Write the number without thousands separators and with only one decimal sign, for example 6300 or 6.3e3.');
  }
  let exponent = 0;
  let j = i;
  while (text[j] === ' ') j++;
  const ch = text[j];
  const expMatch = /^[eE]([+-]?\d+)/.exec(text.slice(j));
  if (expMatch?.[1] !== undefined) {
    exponent = Number(expMatch[1]);
    i = j + expMatch[0].length;
  } else if (ch !== undefined && TIMES.has(ch)) {
    let k = j + 1;
    while (text[k] === ' ') k++;
    if (text.startsWith('10', k)) {
      const power = readPower(text, k + 2);
      if (!power) return notANumber('After the × write 10 and its power, for example 6.3 × 10^-5 T.');
      exponent = power.value;
      i = power.end;
    } else if (ch !== 'x' && ch !== 'X') {
      return notANumber('After the × write 10 and its power, for example 6.3 × 10^-5 T.');
    }
  }
  const rest = text.slice(i).trim();
  if (/^[\d.,]/.test(rest)) {
    return notANumber('Write the number in one piece (no spaces inside it), then its unit, for example 6300 T.');
  }
  const digits = `${intMatch === '' ? '0' : intMatch}${hasPoint && fracPart !== '' ? `.${fracPart}` : ''}`;
  return { ok: true, negative, digits, exponent, sigFigs: countSigFigs(intMatch, fracPart, hasPoint), rest };
}
