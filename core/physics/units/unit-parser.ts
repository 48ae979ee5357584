/**
 * Reads a unit text ('µT', 'N/(A m)', 'Wb/m²', '°') with its own tokenizer and grammar; mathjs is asked only
 * whether each single unit name exists (never to parse or define anything from user input).
 */
import { fail } from './errors.ts';
import { math } from './math.ts';
import type { Failure } from './types.ts';
import { isSuperscript, normaliseCharacters, plainSuperscripts } from './unit-text.ts';

/** A unit text reduced to a factor to SI and a vector of mathjs base-dimension exponents. */
export interface UnitParse {
  ok: true;
  /** Normalised for display: 'µT', 'N/(A m)', 'Wb/m^2'; '' for none. */
  display: string;
  /** Multiply a magnitude in this unit by factor to get SI. */
  factor: number;
  /** k when factor is exactly 10^k (lets callers scale decimal strings without rounding noise), else null. */
  pow10: number | null;
  dims: readonly number[];
  /** Whether any unit in it carries an SI prefix. */
  prefixed: boolean;
}

type Token = { kind: 'name' | 'num' | 'op'; text: string };
type Partial = { factor: number; pow10: number | null; dims: number[]; prefixed: boolean };

const BASE_COUNT = math.Unit.BASE_DIMENSIONS.length;
const MAX_UNIT_TEXT = 60;
const CACHE_LIMIT = 5000;
const cache = new Map<string, UnitParse | Failure>();

function exactPow10(x: number): number | null {
  if (!(x > 0)) return null;
  const k = Math.round(Math.log10(x));
  return Number(`1e${k}`) === x ? k : null;
}

function unknown(text: string): Failure {
  return fail(
    'unknown-unit',
    `"${text}" is not a unit we know. Check the spelling and the capital letters (T for tesla, mT for millitesla).`,
  );
}

function tokenize(raw: string): Token[] | null {
  const text = normaliseCharacters(raw)
    .replace(/[°º]\s*([CF])\b/g, 'deg$1')
    .replace(/º/g, '°')
    .replace(/[×]/g, '*')
    .replace(/\*\*/g, '^');
  const tokens: Token[] = [];
  let i = 0;
  while (i < text.length) {
    const ch = text[i] as string;
    if (ch === ' ') {
      i++;
    } else if (ch === '°') {
      tokens.push({ kind: 'name', text: '°' });
      i++;
    } else if (/[A-Za-zµΩ]/.test(ch)) {
      let j = i;
      while (j < text.length && /[A-Za-zµΩ]/.test(text[j] as string)) j++;
      tokens.push({ kind: 'name', text: text.slice(i, j) });
      // 'm2' and 'm²' are common shorthands for m^2.
      if (j < text.length && (/[0-9]/.test(text[j] as string) || isSuperscript(text[j]))) tokens.push({ kind: 'op', text: '^' });
      i = j;
    } else if (/[0-9]/.test(ch) || isSuperscript(ch) || ((ch === '-' || ch === '+') && /[0-9]/.test(text[i + 1] ?? ''))) {
      let j = i + 1;
      while (j < text.length && (/[0-9.]/.test(text[j] as string) || isSuperscript(text[j]))) j++;
      tokens.push({ kind: 'num', text: plainSuperscripts(text.slice(i, j)) });
      i = j;
    } else if ('/*^()'.includes(ch)) {
      tokens.push({ kind: 'op', text: ch });
      i++;
    } else {
      return null;
    }
  }
  return tokens;
}

function lookupAtom(name: string): Partial & { shown: string } {
  const mathName = name === '°' ? 'deg' : name.replace(/µ/g, 'u').replace(/Ω/g, 'ohm');
  if (!/^[A-Za-z]+$/.test(mathName) || !math.Unit.isValuelessUnit(mathName)) throw new AtomError(name);
  const component = math.unit(mathName).units[0];
  if (!component) throw new AtomError(name);
  // mathjs types the prefix as a string; at run time it is the prefix object.
  const prefix = component.prefix as unknown as { name: string; value: number };
  const { unit } = component;
  if (unit.offset !== 0) throw new AtomError(name, 'Temperatures with an offset (°C, °F) cannot be used here: use K.');
  const p10a = exactPow10(prefix.value);
  const p10b = exactPow10(unit.value);
  const shown = prefix.name === 'u' ? `µ${unit.name}` : name.replace(/^ohm$/, 'Ω');
  return {
    factor: prefix.value * unit.value,
    pow10: p10a === null || p10b === null ? null : p10a + p10b,
    dims: [...unit.dimensions],
    prefixed: prefix.name !== '',
    shown,
  };
}

class AtomError extends Error {
  constructor(
    readonly atom: string,
    readonly hint?: string,
  ) {
    super(atom);
  }
}

/** Recursive-descent reader: product := power (('/' | '*' | juxtaposition) power)*, power := primary ('^' int)?. */
class Reader {
  private i = 0;
  shown = '';
  constructor(private readonly tokens: Token[]) {}

  atEnd(): boolean {
    return this.i >= this.tokens.length;
  }

  product(): Partial {
    let acc = this.power();
    while (!this.atEnd() && this.peek() !== ')') {
      let divide = false;
      if (this.peek() === '/' || this.peek() === '*') {
        divide = this.peek() === '/';
        this.shown += divide ? '/' : ' ';
        this.i++;
      } else {
        this.shown += ' ';
      }
      acc = combine(acc, this.power(), divide ? -1 : 1);
    }
    return acc;
  }

  private power(): Partial {
    const base = this.primary();
    if (this.peek() !== '^') return base;
    this.i++;
    let paren = false;
    if (this.peek() === '(') {
      paren = true;
      this.i++;
    }
    const tok = this.tokens[this.i];
    if (!tok || tok.kind !== 'num' || !/^[+-]?\d+$/.test(tok.text)) throw new SyntaxError('exponent');
    this.i++;
    if (paren && this.tokens[this.i++]?.text !== ')') throw new SyntaxError('paren');
    const n = Number(tok.text);
    this.shown += `^${n}`;
    return combine({ factor: 1, pow10: 0, dims: new Array<number>(BASE_COUNT).fill(0), prefixed: false }, base, n);
  }

  private primary(): Partial {
    const tok = this.tokens[this.i++];
    if (tok?.kind === 'name') {
      const { shown, ...atom } = lookupAtom(tok.text);
      this.shown += shown;
      return atom;
    }
    if (tok?.kind === 'num' && tok.text === '1') {
      // '1/s': a unit numerator of one.
      this.shown += '1';
      return { factor: 1, pow10: 0, dims: new Array<number>(BASE_COUNT).fill(0), prefixed: false };
    }
    if (tok?.text === '(') {
      this.shown += '(';
      const inner = this.product();
      if (this.tokens[this.i++]?.text !== ')') throw new SyntaxError('paren');
      this.shown += ')';
      return inner;
    }
    throw new SyntaxError('unit');
  }

  private peek(): string | undefined {
    return this.tokens[this.i]?.text;
  }
}

function combine(a: Partial, b: Partial, power: number): Partial {
  return {
    factor: a.factor * b.factor ** power,
    pow10: a.pow10 === null || b.pow10 === null ? null : a.pow10 + b.pow10 * power,
    dims: a.dims.map((d, k) => d + (b.dims[k] ?? 0) * power),
    prefixed: a.prefixed || b.prefixed,
  };
}

function parseUncached(text: string): UnitParse | Failure {
  const trimmed = text.trim();
  if (trimmed === '') {
    return { ok: true, display: '', factor: 1, pow10: 0, dims: new Array<number>(BASE_COUNT).fill(0), prefixed: false };
  }
  if (trimmed.length > MAX_UNIT_TEXT) return fail('unknown-unit', 'That unit is too long. Write a short unit such as T, mT or µT.');
  const tokens = tokenize(trimmed);
  if (!tokens) return unknown(trimmed);
  const reader = new Reader(tokens);
  try {
    const result = reader.product();
    if (!reader.atEnd()) return unknown(trimmed);
    return { ok: true, display: reader.shown, ...result };
  } catch (error) {
    if (error instanceof AtomError) {
      const failure = unknown(error.atom);
      if (error.hint) failure.error.message = error.hint;
      return failure;
    }
    if (error instanceof SyntaxError) return unknown(trimmed);
    throw error;
  }
}

/** Parses a unit text once and caches the result (the grader sees the same few units many times). */
export function parseUnit(text: string): UnitParse | Failure {
  const hit = cache.get(text);
  if (hit) return hit;
  const result = parseUncached(text);
  // A bounded cache: odd inputs from many students must not grow memory without limit.
  if (cache.size >= CACHE_LIMIT) cache.clear();
  cache.set(text, result);
  return result;
}
