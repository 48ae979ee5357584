import { describe, expect, it } from 'vitest';
import { MODEL_IDS, type LiveModel } from '../../contracts/checkpoints';
import { MU0 } from '../../physics/constants';
import { biotSavart, loopFieldOnAxis } from '../../physics/fields/index';
import type { Vec3 } from '../../physics/vector';
import { defaultLiveModel, evaluateLiveModel, LIVE_MODELS, LiveModelError, plotLiveModel } from './index';

/** TA: the computed value rounds to the printed one at the printed number of significant figures. */
function roundsTo(value: number, printed: number, figures: number): boolean {
  return Number(value.toPrecision(figures)) === Number(printed.toPrecision(figures));
}

const card = (modelId: LiveModel['modelId'], values: Record<string, number>): LiveModel => ({
  modelId,
  inputs: Object.entries(values).map(([name, value]) => ({ name, slider: false, min: value, max: value, step: 1, value })),
  plot: null,
});

describe('LIVE_MODELS registry', () => {
  it('has a definition for every model id, with consistent inputs', () => {
    expect(Object.keys(LIVE_MODELS).sort()).toEqual([...MODEL_IDS].sort());
    for (const id of MODEL_IDS) {
      const definition = LIVE_MODELS[id];
      expect(definition.id).toBe(id);
      expect(new Set(definition.inputs.map((input) => input.name)).size).toBe(definition.inputs.length);
      for (const input of definition.inputs) {
        expect(input.min).toBeLessThan(input.max);
        expect(input.defaultValue).toBeGreaterThanOrEqual(input.min);
        expect(input.defaultValue).toBeLessThanOrEqual(input.max);
        expect(input.siFactor).toBeGreaterThan(0);
      }
      // Every default card evaluates to a finite number.
      expect(Number.isFinite(evaluateLiveModel(defaultLiveModel(id), {}).value)).toBe(true);
    }
  });
});

describe('evaluateLiveModel against published values', () => {
  // OpenStax University Physics Vol. 2, §12.2, Example "Calculating Magnetic Field Due to Three Wires":
  // I = 2 A at R = 0.01 m gives 4e-5 T (printed) = 40 µT.
  it('straight wire: 2 A at 1 cm is 40 µT', () => {
    const result = evaluateLiveModel(card('straight-wire', { I: 2, d: 1 }), {});
    expect(roundsTo(result.value, 40, 1)).toBe(true);
    expect(result.text).toBe('40 µT');
  });

  // OpenStax Vol. 2, §12.6, Example "Magnetic Field Inside a Solenoid": N = 300, L = 14.0 cm,
  // I = 0.410 A gives B = 1.10e-3 T (the long-solenoid limit: the radius here is 1 mm, ≪ L).
  it('solenoid: N = 300, L = 14 cm, I = 0.410 A is 1.10 mT at the centre', () => {
    const result = evaluateLiveModel(card('solenoid-on-axis', { N: 300, L: 14, a: 0.1, I: 0.41, z: 0 }), {});
    expect(roundsTo(result.value, 1.1, 3)).toBe(true);
    expect(result.text).toMatch(/^1\.10\d mT$/);
  });

  // OpenStax Vol. 2, §12.4, end-of-chapter problem: I = 6.0 A and B = 2.0e-4 T at the centre give
  // R = 0.019 m. Inverting: at R = mu0 I / (2B) = 1.885 cm, the centre field is 2.0e-4 T = 200 µT.
  it('coil: one turn, 6.0 A, R = mu0 I/(2B) gives 200 µT at the centre', () => {
    const radiusCm = ((MU0 * 6) / (2 * 2e-4)) * 100;
    expect(roundsTo(radiusCm / 100, 0.019, 2)).toBe(true);
    expect(roundsTo(evaluateLiveModel(card('coil-on-axis', { N: 1, a: radiusCm, I: 6, z: 0 }), {}).value, 200, 2)).toBe(true);
  });

  // REFERENCES.md, Helmholtz pair at the midpoint: B = (4/5)^(3/2) mu0 N I / R (standard result).
  it('Helmholtz pair: the midpoint field is (4/5)^(3/2) mu0 N I / R', () => {
    const value = evaluateLiveModel(card('helmholtz-on-axis', { N: 50, a: 10, I: 1, z: 0 }), {}).value;
    expect(value).toBeCloseTo(((0.7155417528 * MU0 * 50 * 1) / 0.1) * 1e6, 6);
  });

  // REFERENCES.md, dipole limit: loop field on the axis / dipole field with m = N I pi a^2 equals
  // (z^2/(z^2+R^2))^(3/2) = 0.985185 at z = 10 R (computed).
  it('dipole: agrees with the coil far away, in the published ratio', () => {
    const coil = evaluateLiveModel(card('coil-on-axis', { N: 10, a: 2, I: 1, z: 20 }), {}).value;
    const moment = 10 * 1 * Math.PI * 0.02 ** 2;
    const dipole = evaluateLiveModel(card('dipole-on-axis', { m: moment, z: 20 }), {}).value;
    expect(coil / dipole).toBeCloseTo(0.985185, 6);
  });

  // NCERT Physics Part I, class XII, ch. 5, exercise 5.20(a): N = 30, r = 12 cm, I = 0.35 A gives
  // B_coil = 5.49e-5 T (printed, truncated; check 2 s.f.); with the coil field at 45° to the meridian
  // (135° from north) and B_H = B_coil sin 45° the needle points west to east: 90°.
  it('needle deflection: the NCERT exercise points the needle east', () => {
    const coil = evaluateLiveModel(card('coil-on-axis', { N: 30, a: 12, I: 0.35, z: 0 }), {}).value;
    expect(roundsTo(coil, 55, 2)).toBe(true);
    const bh = coil * Math.SQRT1_2;
    expect(roundsTo(bh, 38.8, 2)).toBe(true);
    const needle = evaluateLiveModel(card('needle-deflection', { N: 30, a: 12, I: 0.35, BH: bh, phi: 135 }), {});
    expect(needle.value).toBeCloseTo(90, 6);
    expect(needle.text).toBe('90°');
  });

  // The tangent law tan θ = B_coil / B_H (REFERENCES.md): equal fields give 45°.
  it('needle deflection: the tangent law at 90°', () => {
    const coil = loopFieldOnAxis({ turns: 30, radius: 0.12, current: 0.35, z: 0 }) * 1e6;
    expect(evaluateLiveModel(card('needle-deflection', { N: 30, a: 12, I: 0.35, BH: coil, phi: 90 }), {}).value).toBeCloseTo(45, 6);
  });

  it('coil on its axis matches a numerical Biot–Savart sum over a 720-gon (independent method)', () => {
    const path: Vec3[] = Array.from({ length: 720 }, (_, k) => [
      0.1 * Math.cos((2 * Math.PI * k) / 720),
      0.1 * Math.sin((2 * Math.PI * k) / 720),
      0,
    ]);
    const numeric = biotSavart({ path, current: 50 * 1.5, point: [0, 0, 0.07], closed: true })[2] * 1e6;
    const value = evaluateLiveModel(card('coil-on-axis', { N: 50, a: 10, I: 1.5, z: 7 }), {}).value;
    expect(Math.abs(value - numeric) / numeric).toBeLessThan(1e-4);
  });

  it('lets slider values override the card and falls back to the model defaults', () => {
    const model: LiveModel = { modelId: 'straight-wire', inputs: [], plot: null };
    expect(evaluateLiveModel(model, {}).text).toBe('40 µT');
    expect(evaluateLiveModel(model, { d: 2 }).text).toBe('20 µT');
  });

  it('formats tiny and huge outputs with powers of ten', () => {
    expect(evaluateLiveModel(card('straight-wire', { I: 2, d: 1e7 }), {}).text).toBe('4 × 10⁻⁶ µT');
  });

  it('throws a LiveModelError with the engine’s message for a point on the conductor', () => {
    expect(() => evaluateLiveModel(card('dipole-on-axis', { m: 1, z: 0 }), {})).toThrow(LiveModelError);
    expect(() => evaluateLiveModel(card('dipole-on-axis', { m: 1, z: 0 }), {})).toThrow(/at the dipole itself/);
  });
});

describe('plotLiveModel', () => {
  it('samples the output evenly along the plot input, through the card values', () => {
    const model: LiveModel = { ...card('coil-on-axis', { N: 50, a: 10, I: 1, z: 0 }), plot: { input: 'z', from: -20, to: 20 } };
    const { x, y } = plotLiveModel(model, {}, 5);
    expect(x).toEqual([-20, -10, 0, 10, 20]);
    expect(y[2]).toBeCloseTo(evaluateLiveModel(model, {}).value, 10);
    // The axial field is even in z and largest at the centre (OpenStax Vol. 2 §12.4, B on the axis).
    expect(y[0]).toBeCloseTo(y[4] as number, 10);
    expect(y[2] as number).toBeGreaterThan(y[1] as number);
    expect(plotLiveModel(model, {}).x).toHaveLength(101);
  });

  it('leaves a gap (NaN) where the engine refuses a sample', () => {
    const model: LiveModel = { ...card('dipole-on-axis', { m: 1, z: 10 }), plot: { input: 'z', from: -10, to: 10 } };
    const { y } = plotLiveModel(model, {}, 3);
    expect(Number.isNaN(y[1])).toBe(true);
    expect(y[0]).toBeCloseTo(200, 6);
  });

  it('refuses a card without a plot or with an unknown plot input', () => {
    expect(() => plotLiveModel(card('straight-wire', {}), {})).toThrow('This card has no plot.');
    expect(() => plotLiveModel({ ...card('straight-wire', {}), plot: { input: 'q', from: 0, to: 1 } }, {})).toThrow(/“q” is not an input/);
  });
});
