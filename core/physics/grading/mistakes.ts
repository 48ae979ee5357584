/**
 * Mistake detection: re-work the expected value with one slip applied and see whether the answer matches it.
 * A slip is reported only when the answer is within tolerance of the slipped value (it is never called when the
 * answer is within tolerance of the correct one). Ties go in this order (issue 3): distractor, sign, turns,
 * radius-diameter, prefix, power-of-ten, factor (2, then π, then 2π).
 */
import { parseQuantity } from '../units/parse-quantity';
import type { ParsedQuantity, VariableValues } from '../units/types';
import type { CompiledSpec } from './compile-spec';
import { mistakeFeedback } from './feedback';
import { withinTolerance } from './tolerance';
import type { MistakeKind } from './types';

export interface DetectedMistake {
  kind: MistakeKind;
  feedback: string;
}

// Built once: the slips that scale the result.
const PREFIX_FACTORS = [1e3, 1e-3, 1e6, 1e-6, 1e9, 1e-9];
const POWER_FACTORS: number[] = [];
for (let k = 1; k <= 9; k++) POWER_FACTORS.push(10 ** k, 1 / 10 ** k);
const FACTORS: { kind: 'factor-2' | 'factor-pi' | 'factor-2pi'; factor: number }[] = [
  { kind: 'factor-2', factor: 2 },
  { kind: 'factor-2', factor: 0.5 },
  { kind: 'factor-pi', factor: Math.PI },
  { kind: 'factor-pi', factor: 1 / Math.PI },
  { kind: 'factor-2pi', factor: 2 * Math.PI },
  { kind: 'factor-2pi', factor: 1 / (2 * Math.PI) },
];

// A drawn value read once ('4.5 cm' → 4.5 and 'cm'); bounded, as values repeat across a class's answers.
const readCache = new Map<string, { magnitude: number; unit: string } | null>();

function read(text: string): { magnitude: number; unit: string } | null {
  let hit = readCache.get(text);
  if (hit === undefined) {
    const q = parseQuantity(text);
    hit = q.ok ? { magnitude: q.magnitude, unit: q.unit } : null;
    if (readCache.size >= 5000) readCache.clear();
    readCache.set(text, hit);
  }
  return hit;
}

/** A variable's value scaled (a → 2a) or replaced (N → 1), in the form the formula takes. */
function changed(value: number | string | undefined, scale: number | null, replace?: number): number | string | null {
  if (value === undefined) return null;
  if (replace !== undefined) return replace;
  if (typeof value === 'number') return value * scale!;
  const q = read(value);
  if (!q) return null;
  return q.unit === '' ? q.magnitude * scale! : `${q.magnitude * scale!} ${q.unit}`;
}

interface Slipping {
  answer: ParsedQuantity;
  expected: number;
  compiled: CompiledSpec;
  values: VariableValues | undefined;
}

/** Whether the answer is within tolerance of a slipped value; the absolute slack scales with the slip. */
function matches(s: Slipping, target: number): boolean {
  if (!Number.isFinite(target)) return false;
  const absScale = s.expected !== 0 ? Math.abs(target / s.expected) : 1;
  return withinTolerance(s.answer, target, s.compiled.tolerance, s.compiled.rule, absScale) !== false;
}

/** The formula re-worked with one variable changed; null when there is no formula or the value cannot be used. */
function rework(s: Slipping, name: string, scale: number | null, replace?: number): number | null {
  const { formula } = s.compiled;
  if (!formula || !s.values) return null;
  const value = changed(s.values[name], scale, replace);
  if (value === null) return null;
  // A plain copy, not an object spread: spreads are slow on this path.
  const slipped: VariableValues = {};
  for (const key in s.values) slipped[key] = s.values[key]!;
  slipped[name] = value;
  const result = formula.evaluate(slipped);
  return result.ok ? result.value : null;
}

const RADIUS_CHANGES = [
  [2, 'doubled'],
  [0.5, 'halved'],
] as const;

/** The first slip, in tie order, whose re-worked value the answer matches; null when none does. */
export function detectMistake(
  answer: ParsedQuantity,
  expected: number,
  compiled: CompiledSpec,
  values: VariableValues | undefined,
): DetectedMistake | null {
  const s: Slipping = { answer, expected, compiled, values };
  for (const d of compiled.distractors) {
    const result = d.formula.evaluate(values ?? {});
    if (result.ok && result.dimension === answer.dimension && matches(s, result.value)) {
      return { kind: `distractor:${d.id}`, feedback: d.feedback };
    }
  }
  if (expected === 0) return null; // every scaling slip of 0 is 0, and 0 is the correct answer
  if (matches(s, -expected)) return { kind: 'sign', feedback: mistakeFeedback('sign') };
  for (const name of compiled.turnsVariables) {
    if (values?.[name] === 1) continue; // one turn: the slip changes nothing
    const v = rework(s, name, null, 1);
    if (v !== null && matches(s, v)) return { kind: 'turns', feedback: mistakeFeedback('turns', { variable: name }) };
  }
  for (const name of compiled.radiusVariables) {
    for (const [scale, change] of RADIUS_CHANGES) {
      const v = rework(s, name, scale);
      if (v !== null && matches(s, v))
        return { kind: 'radius-diameter', feedback: mistakeFeedback('radius-diameter', { variable: name, change }) };
    }
  }
  if (answer.prefixed) {
    for (const f of PREFIX_FACTORS) {
      if (matches(s, expected * f)) return { kind: 'prefix', feedback: mistakeFeedback('prefix', { unit: answer.unit }) };
    }
  }
  for (const f of POWER_FACTORS) {
    if (matches(s, expected * f)) return { kind: 'power-of-ten', feedback: mistakeFeedback('power-of-ten') };
  }
  for (const { kind, factor } of FACTORS) {
    if (matches(s, expected * factor)) return { kind, feedback: mistakeFeedback(kind) };
  }
  return null;
}
