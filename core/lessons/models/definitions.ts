import type { ModelId } from '../../contracts/checkpoints';
import {
  dipoleFieldOnAxis,
  helmholtzFieldOnAxis,
  loopFieldOnAxis,
  needleDeflection,
  solenoidFieldOnAxis,
  wireField,
} from '../../physics/fields/index';
import type { LiveModelDefinition, LiveModelInputDefinition } from './types';

/** Pulls a named SI input; the registry always supplies every input, so a miss is a programming error. */
function si(values: Readonly<Record<string, number>>, name: string): number {
  const value = values[name];
  if (value === undefined) throw new Error(`The model input ${name} is missing.`);
  return value;
}

// Shared inputs, so every coil-like model reads the same way.
const turns: LiveModelInputDefinition = {
  name: 'N',
  label: 'Number of turns',
  symbol: 'N',
  unit: '',
  siFactor: 1,
  defaultValue: 50,
  min: 1,
  max: 500,
  step: 1,
  domain: 'non-negative',
  plottable: true,
};
const radius = (defaultValue: number, label = 'Coil radius'): LiveModelInputDefinition => ({
  name: 'a',
  label,
  symbol: 'a',
  unit: 'cm',
  siFactor: 1e-2,
  defaultValue,
  min: 1,
  max: 30,
  step: 0.5,
  domain: 'positive',
  plottable: true,
});
const current = (defaultValue: number, max = 5): LiveModelInputDefinition => ({
  name: 'I',
  label: 'Current',
  symbol: 'I',
  unit: 'A',
  siFactor: 1,
  defaultValue,
  min: 0,
  max,
  step: 0.05,
  domain: 'any',
  plottable: true,
});
const axial = (min: number, max: number, defaultValue: number): LiveModelInputDefinition => ({
  name: 'z',
  label: 'Distance along the axis from the centre',
  symbol: 'z',
  unit: 'cm',
  siFactor: 1e-2,
  defaultValue,
  min,
  max,
  step: 0.5,
  domain: 'any',
  plottable: true,
});
const microtesla = { label: 'Magnetic field on the axis', symbol: 'B', unit: 'µT', siFactor: 1e-6 };

/** Every model an equation card can run, by id (the ids are MODEL_IDS in the contracts). */
export const LIVE_MODELS: Record<ModelId, LiveModelDefinition> = {
  'coil-on-axis': {
    id: 'coil-on-axis',
    label: 'Flat coil, on its axis',
    latex: 'B = \\frac{\\mu_0 N I a^2}{2\\left(a^2 + z^2\\right)^{3/2}}',
    inputs: [turns, radius(10), current(1), axial(-30, 30, 0)],
    output: microtesla,
    compute: (v) => loopFieldOnAxis({ turns: si(v, 'N'), radius: si(v, 'a'), current: si(v, 'I'), z: si(v, 'z') }),
  },
  'helmholtz-on-axis': {
    id: 'helmholtz-on-axis',
    label: 'Helmholtz pair, on the common axis',
    latex:
      'B = \\frac{\\mu_0 N I a^2}{2\\left(a^2 + (z - a/2)^2\\right)^{3/2}} + \\frac{\\mu_0 N I a^2}{2\\left(a^2 + (z + a/2)^2\\right)^{3/2}}',
    inputs: [turns, radius(10, 'Coil radius (and spacing)'), current(1), axial(-30, 30, 0)],
    output: microtesla,
    compute: (v) => helmholtzFieldOnAxis({ turns: si(v, 'N'), radius: si(v, 'a'), current: si(v, 'I'), z: si(v, 'z') }),
  },
  'solenoid-on-axis': {
    id: 'solenoid-on-axis',
    label: 'Solenoid, on its axis',
    latex:
      'B = \\frac{\\mu_0 N I}{2L}\\left[\\frac{z + L/2}{\\sqrt{(z + L/2)^2 + a^2}} - \\frac{z - L/2}{\\sqrt{(z - L/2)^2 + a^2}}\\right]',
    inputs: [
      { ...turns, defaultValue: 300, max: 2000 },
      {
        name: 'L',
        label: 'Solenoid length',
        symbol: 'L',
        unit: 'cm',
        siFactor: 1e-2,
        defaultValue: 14,
        min: 1,
        max: 50,
        step: 0.5,
        domain: 'positive',
        plottable: true,
      },
      { ...radius(1, 'Solenoid radius'), min: 0.1, max: 10, step: 0.1 },
      current(0.41, 3),
      axial(-30, 30, 0),
    ],
    output: { ...microtesla, unit: 'mT', siFactor: 1e-3 },
    compute: (v) => solenoidFieldOnAxis({ turns: si(v, 'N'), length: si(v, 'L'), radius: si(v, 'a'), current: si(v, 'I'), z: si(v, 'z') }),
  },
  'straight-wire': {
    id: 'straight-wire',
    label: 'Long straight wire',
    latex: 'B = \\frac{\\mu_0 I}{2\\pi d}',
    inputs: [
      current(2, 20),
      {
        name: 'd',
        label: 'Distance from the wire',
        symbol: 'd',
        unit: 'cm',
        siFactor: 1e-2,
        defaultValue: 1,
        min: 0.5,
        max: 20,
        step: 0.5,
        domain: 'positive',
        plottable: true,
      },
    ],
    output: { ...microtesla, label: 'Magnetic field' },
    compute: (v) => wireField({ current: si(v, 'I'), distance: si(v, 'd') }),
  },
  'dipole-on-axis': {
    id: 'dipole-on-axis',
    label: 'Magnetic dipole, on its axis (far field)',
    latex: 'B = \\frac{\\mu_0}{4\\pi}\\,\\frac{2m}{|z|^3}',
    inputs: [
      {
        name: 'm',
        label: 'Magnetic moment',
        symbol: 'm',
        unit: 'A m²',
        siFactor: 1,
        defaultValue: 1,
        min: 0.1,
        max: 10,
        step: 0.1,
        domain: 'any',
        plottable: true,
      },
      { ...axial(5, 50, 10), label: 'Distance along the axis from the dipole' },
    ],
    output: microtesla,
    compute: (v) => dipoleFieldOnAxis({ moment: si(v, 'm'), z: si(v, 'z') }),
  },
  'needle-deflection': {
    id: 'needle-deflection',
    label: 'Compass needle at a coil’s centre',
    latex: '\\tan\\theta = \\frac{B_c \\sin\\varphi}{B_H + B_c \\cos\\varphi}, \\quad B_c = \\frac{\\mu_0 N I}{2a}',
    inputs: [
      { ...turns, defaultValue: 30 },
      radius(12),
      current(0.35, 3),
      {
        name: 'BH',
        label: 'Earth’s horizontal field',
        symbol: 'B_H',
        unit: 'µT',
        siFactor: 1e-6,
        defaultValue: 20,
        min: 5,
        max: 60,
        step: 0.5,
        domain: 'non-negative',
        plottable: true,
      },
      {
        name: 'phi',
        label: 'Direction of the coil’s field from magnetic north',
        symbol: '\\varphi',
        unit: '°',
        siFactor: 1,
        defaultValue: 90,
        min: 0,
        max: 180,
        step: 1,
        domain: 'any',
        plottable: true,
      },
    ],
    output: { label: 'Needle deflection from north', symbol: '\\theta', unit: '°', siFactor: 1 },
    compute: (v) =>
      needleDeflection({
        coilField: loopFieldOnAxis({ turns: si(v, 'N'), radius: si(v, 'a'), current: si(v, 'I'), z: 0 }),
        earthHorizontalField: si(v, 'BH'),
        angle: si(v, 'phi'),
      }),
  },
};
