/**
 * drawVariables: stable per-student numbers. Each variable gets its own stream, seeded with the cyrb53 string
 * hash of `${seed}|${name}` and drawn with mulberry32 (both small well-known public-domain generators), so adding a
 * variable does not change the others' values.
 */
import { PhysicsError } from './errors.ts';
import type { VariableSpec, VariableValues } from './types.ts';
import { parseUnit } from './unit-parser.ts';

const MAX_GRID_POINTS = 1e9;

/** cyrb53 (bryc, public domain): a fast 53-bit string hash. */
export function cyrb53(text: string, seed = 0): number {
  let h1 = 0xdeadbeef ^ seed;
  let h2 = 0x41c6ce57 ^ seed;
  for (let i = 0; i < text.length; i++) {
    const ch = text.charCodeAt(i);
    h1 = Math.imul(h1 ^ ch, 2654435761);
    h2 = Math.imul(h2 ^ ch, 1597334677);
  }
  h1 = Math.imul(h1 ^ (h1 >>> 16), 2246822507) ^ Math.imul(h2 ^ (h2 >>> 13), 3266489909);
  h2 = Math.imul(h2 ^ (h2 >>> 16), 2246822507) ^ Math.imul(h1 ^ (h1 >>> 13), 3266489909);
  return 4294967296 * (2097151 & h2) + (h1 >>> 0);
}

/** mulberry32 (Tommy Ettinger, public domain): returns a generator of floats in [0, 1). */
export function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Decimal places a number is written with: 0.5 → 1, 2.5e-7 → 8, 3 → 0. */
function decimalsOf(x: number): number {
  const [mantissa = '', exp = '0'] = String(x).toLowerCase().split('e');
  const frac = mantissa.split('.')[1]?.length ?? 0;
  return Math.max(0, frac - Number(exp));
}

function invalid(spec: VariableSpec, code: string, why: string): PhysicsError {
  return new PhysicsError(code, `Variable "${spec.name}": ${why}`);
}

function check(spec: VariableSpec, seen: Set<string>): string | undefined {
  if (!/^[A-Za-z][A-Za-z0-9_]*$/.test(spec.name)) {
    throw invalid(spec, 'invalid-name', 'a name starts with a letter and has only letters, digits and _.');
  }
  if (seen.has(spec.name)) throw invalid(spec, 'duplicate-variable', 'this name is declared twice.');
  seen.add(spec.name);
  if (!Number.isFinite(spec.min) || !Number.isFinite(spec.max)) {
    throw invalid(spec, 'invalid-range', 'the smallest and largest values must be numbers.');
  }
  if (spec.min > spec.max)
    throw invalid(spec, 'invalid-range', `the smallest value (${spec.min}) is larger than the largest (${spec.max}).`);
  if (!Number.isFinite(spec.step) || spec.step <= 0) throw invalid(spec, 'invalid-step', 'the step must be a number greater than 0.');
  if ((spec.max - spec.min) / spec.step > MAX_GRID_POINTS) {
    throw invalid(spec, 'invalid-step', 'the step is too small for this range (more than a billion values).');
  }
  if (spec.unit === undefined || spec.unit.trim() === '') return undefined;
  const unit = parseUnit(spec.unit);
  if (!unit.ok) throw invalid(spec, 'unknown-unit', unit.error.message);
  return unit.display;
}

/**
 * Draws each variable on its grid min, min + step, … ≤ max, deterministically for a seed (a student id, say), and
 * formats it as the student sees it: '4.5 cm', or a plain number for a count. Throws PhysicsError ('invalid-name',
 * 'duplicate-variable', 'invalid-range', 'invalid-step', 'unknown-unit') for a bad spec.
 */
export function drawVariables(variables: VariableSpec[], seed: string | number): VariableValues {
  const seen = new Set<string>();
  const units = variables.map((spec) => check(spec, seen));
  const values: VariableValues = {};
  variables.forEach((spec, index) => {
    const random = mulberry32(cyrb53(`${String(seed)}|${spec.name}`));
    // A little slack so that 0.1-style steps still reach max despite binary rounding.
    const points = Math.floor((spec.max - spec.min) / spec.step + 1e-9) + 1;
    const k = Math.min(points - 1, Math.floor(random() * points));
    const decimals = Math.min(20, Math.max(decimalsOf(spec.step), decimalsOf(spec.min)));
    const value = Number((spec.min + k * spec.step).toFixed(decimals));
    const unit = units[index];
    values[spec.name] = unit === undefined ? value : `${String(value)} ${unit}`;
  });
  return values;
}
