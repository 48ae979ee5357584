/**
 * Grading benchmark (a script, not a test): `npm run bench:grading`.
 * Grades 100,000 mixed answers — quantities in various prefixes and notations, wrong units, slips, garbage,
 * formula specs with per-student drawn variables — and prints as its last line
 * `grading: <answers per second> answers/s, p99 <microseconds> us`.
 * Answer texts and students' drawn values are prepared before timing, as the API has them stored.
 */
import { performance } from 'node:perf_hooks';
import { gradeNumeric } from '../../core/physics/grading/grade-numeric';
import type { GradeContext, NumericSpec } from '../../core/physics/grading/types';
import { drawVariables } from '../../core/physics/units/draw-variables';
import { parseQuantity } from '../../core/physics/units/parse-quantity';
import type { VariableSpec, VariableValues } from '../../core/physics/units/types';

const TOTAL = 100_000;
const WARM_UP = 5_000;
const STUDENTS = 300;
const MU0 = 1.25663706212e-6; // CODATA 2018 (NIST), only to write answers

// Deterministic pseudo-random numbers (mulberry32) so every run grades the same answers.
let state = 0x5eed;
function random(): number {
  state = (state + 0x6d2b79f5) | 0;
  let t = state;
  t = Math.imul(t ^ (t >>> 15), t | 1);
  t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
  return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
}
const pick = <T>(items: readonly T[]): T => items[Math.floor(random() * items.length)]!;

const coilVariables: VariableSpec[] = [
  { name: 'N', min: 20, max: 60, step: 1, role: 'turns' },
  { name: 'I', min: 0.5, max: 2.5, step: 0.1, unit: 'A' },
  { name: 'a', min: 3, max: 9, step: 0.5, unit: 'cm', role: 'radius' },
];
const coilSpec: NumericSpec = {
  expected: 'mu0*N*I/(2*a)',
  variables: coilVariables,
  sigFigs: { min: 2, max: 4 },
  distractors: [{ id: 'no-mu0-2', formula: 'mu0*N*I/a', feedback: 'Check the formula for the field at the centre of a coil.' }],
};
const wireSpec: NumericSpec = {
  expected: 'mu0*I/(2*pi*d)',
  variables: [
    { name: 'I', min: 1, max: 10, step: 0.5, unit: 'A' },
    { name: 'd', min: 1, max: 5, step: 0.1, unit: 'cm', role: 'radius' },
  ],
};
const fixedSpecs: { spec: NumericSpec; value: number }[] = [
  { spec: { expected: '62.8 uT' }, value: 62.8e-6 },
  { spec: { expected: '1.10e-3 T', tolerance: { relative: 0.01 } }, value: 1.1e-3 },
  { spec: { expected: '4e-5 T', tolerance: { absolute: '1 uT' } }, value: 4e-5 },
  { spec: { expected: '0.01049 T', sigFigs: { min: 2, max: 3 } }, value: 0.01049 },
];

function si(value: number | string | undefined): number {
  if (typeof value === 'number') return value;
  const q = parseQuantity(String(value));
  if (!q.ok) throw new Error(`bench: cannot read drawn value ${String(value)}`);
  return q.value;
}

const coilValues: VariableValues[] = [];
const wireValues: VariableValues[] = [];
for (let s = 0; s < STUDENTS; s++) {
  coilValues.push(drawVariables(coilVariables, `student-${s}`));
  wireValues.push(drawVariables(wireSpec.variables!, `student-${s}`));
}

const UNITS: readonly [string, number][] = [
  ['T', 1],
  ['mT', 1e-3],
  ['µT', 1e-6],
  ['μT', 1e-6],
  ['uT', 1e-6],
  ['G', 1e-4],
  ['mG', 1e-7],
  ['nT', 1e-9],
];

/** The value written as a student might type it. */
function write(value: number): string {
  const style = random();
  if (style < 0.15) {
    const exp = Math.floor(Math.log10(Math.abs(value)));
    const m = (value / 10 ** exp).toPrecision(3);
    return pick([`${m}e${exp} T`, `${m}E${exp}T`, `${m} × 10^${exp} T`, `${m}x10^${exp} T`, `${m}*10^${exp} T`]);
  }
  const [unit, scale] = pick(UNITS);
  return `${Number((value / scale).toPrecision(pick([2, 3, 3, 4])))} ${unit}`;
}

interface Case {
  spec: NumericSpec;
  text: string;
  context: GradeContext;
}

function makeCase(): Case {
  const kind = random();
  let spec: NumericSpec;
  let value: number;
  let context: GradeContext = {};
  let radiusScale = 1;
  let turnsOne = false;
  const slip = random();
  if (slip > 0.85 && slip < 0.9) radiusScale = 2;
  if (slip >= 0.9 && slip < 0.93) turnsOne = true;
  if (kind < 0.45) {
    const s = Math.floor(random() * STUDENTS);
    const v = coilValues[s]!;
    spec = coilSpec;
    context = { values: v };
    value = (MU0 * (turnsOne ? 1 : si(v.N)) * si(v.I)) / (2 * si(v.a) * radiusScale);
  } else if (kind < 0.65) {
    const s = Math.floor(random() * STUDENTS);
    const v = wireValues[s]!;
    spec = wireSpec;
    context = { values: v };
    value = (MU0 * si(v.I)) / (2 * Math.PI * si(v.d) * radiusScale);
  } else {
    const f = pick(fixedSpecs);
    spec = f.spec;
    value = f.value;
  }
  if (slip < 0.55) return { spec, text: write(value), context };
  if (slip < 0.6) return { spec, text: write(-value), context };
  if (slip < 0.65) return { spec, text: write(value * pick([1e3, 1e-3, 10, 0.1, 1e6])), context };
  if (slip < 0.72) return { spec, text: write(value * pick([2, 0.5, Math.PI, 1 / Math.PI, 2 * Math.PI])), context };
  if (slip < 0.77) return { spec, text: `${(value * 1e6).toPrecision(2)} ${pick(['m', 'A', 'N', 's', 'kg'])}`, context };
  if (slip < 0.8) return { spec, text: pick(['', '  ', 'abc', '63 furlongs', '6.3.1 T', '63', 'twelve T']), context };
  if (slip < 0.85) return { spec, text: write(value * (1 + (random() - 0.5) * 0.5)), context };
  return { spec, text: write(value), context };
}

const cases: Case[] = [];
for (let i = 0; i < TOTAL; i++) cases.push(makeCase());

for (let i = 0; i < WARM_UP; i++) {
  const c = cases[i]!;
  gradeNumeric(c.spec, c.text, c.context);
}

const durations = new Float64Array(TOTAL);
const tally = new Map<string, number>();
const started = performance.now();
for (let i = 0; i < TOTAL; i++) {
  const c = cases[i]!;
  const t0 = performance.now();
  const grade = gradeNumeric(c.spec, c.text, c.context);
  durations[i] = performance.now() - t0;
  const label = grade.correct ? 'correct' : (grade.error?.code ?? grade.mistake ?? 'wrong');
  tally.set(label, (tally.get(label) ?? 0) + 1);
}
const elapsedMs = performance.now() - started;

durations.sort();
const p99Us = durations[Math.floor(TOTAL * 0.99)]! * 1000;
const perSecond = Math.round(TOTAL / (elapsedMs / 1000));
const mix = [...tally.entries()].sort((x, y) => y[1] - x[1]).map(([k, n]) => `${k} ${n}`);
console.log(`mix: ${mix.join(', ')}`);
console.log(`grading: ${perSecond} answers/s, p99 ${p99Us.toFixed(1)} us`);
