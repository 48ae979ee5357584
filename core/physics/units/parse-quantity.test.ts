import fc from 'fast-check';
import { unit as referenceUnit } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { parseQuantity } from './parse-quantity.ts';
import type { ParseOptions, ParsedQuantity } from './types.ts';

function ok(text: string, options?: ParseOptions): ParsedQuantity {
  const result = parseQuantity(text, options);
  if (!result.ok) throw new Error(`${text}: ${result.error.code} ${result.error.message}`);
  return result;
}

function relClose(actual: number, expected: number, rel = 1e-12): void {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rel * Math.abs(expected));
}

describe('parseQuantity: forms students type (issue 3), all 63 µT = 6.3e-5 T', () => {
  it.each([
    '6.3e-5 T',
    '6.3E-5T',
    '6.3 × 10^-5 T',
    '6.3x10^-5 T',
    '6.3*10^-5 T',
    '6.3 × 10⁻⁵ T',
    '6.3×10⁻⁵T',
    '6.3 · 10^-5 T',
    '6.3⋅10^-5 T',
    '6.3 x 10^(-5) T',
    '6.3e−5 T',
    '63 µT',
    '63 μT',
    '63 uT',
    '0.063 mT',
    '0.63 G',
    '630 mG',
    '0.63 gauss',
    '  63 µT  ',
    '\t63\u00a0µT ',
  ])('%s', (text) => {
    const q = ok(text);
    relClose(q.value, 6.3e-5);
    expect(q.dimension).toBe('magnetic-field');
  });

  it('gives exact values for decimal prefixes (no rounding noise)', () => {
    expect(ok('63 µT').value).toBe(6.3e-5);
    expect(ok('0.063 mT').value).toBe(6.3e-5);
    expect(ok('630 mG').value).toBe(6.3e-5);
  });

  it('reads the Unicode minus for a negative number', () => {
    expect(ok('−6.3e-5 T').value).toBe(-6.3e-5);
  });

  it('normalises the unit as written and reports prefixes', () => {
    expect(ok('63 uT')).toMatchObject({ unit: 'µT', magnitude: 63, prefixed: true });
    expect(ok('63 μT').unit).toBe('µT');
    expect(ok('0.63 G')).toMatchObject({ unit: 'G', magnitude: 0.63, prefixed: false });
    expect(ok('6.3 × 10^-5 T')).toMatchObject({ unit: 'T', magnitude: 6.3e-5, prefixed: false });
    expect(ok('2 Wb/m²').unit).toBe('Wb/m^2');
  });

  it('reads degrees as deg and °, in radians (SI Brochure 9th ed., Table 8: 1° = pi/180 rad)', () => {
    relClose(ok('45 deg').value, Math.PI / 4);
    relClose(ok('45°').value, Math.PI / 4);
    expect(ok('45°').dimension).toBe('angle');
  });

  it('reduces compound units to their dimension', () => {
    expect(ok('2 N/(A m)')).toMatchObject({ value: 2, dimension: 'magnetic-field' });
    expect(ok('2 Wb/m^2')).toMatchObject({ value: 2, dimension: 'magnetic-field' });
    expect(ok('1.26e-6 T m/A').dimension).toBe('permeability');
    expect(ok('3 kg·m/s²').dimension).toBe('force');
    expect(ok('5 m s⁻¹').dimension).toBe('speed');
  });

  it('reads a bare number as dimensionless', () => {
    expect(ok('30')).toMatchObject({ value: 30, unit: '', dimension: 'dimensionless' });
  });
});

describe('SI prefixes (BIPM, The International System of Units (SI Brochure), 9th edition, 2019, Table 7)', () => {
  it.each([
    ['1 pT', 1e-12],
    ['1 nT', 1e-9],
    ['1 µT', 1e-6],
    ['1 mT', 1e-3],
    ['1 cm', 1e-2],
    ['1 kA', 1e3],
    ['1 MV', 1e6],
    ['1 GHz', 1e9],
    ['1 T', 1], // the tesla is the coherent SI unit of magnetic flux density, T = Wb/m^2 (SI Brochure 9th ed., Table 4)
    ['1 Wb/m^2', 1],
    ['1 G', 1e-4], // gauss: BIPM SI Brochure 8th ed. (2006), Table 9; NIST SP 811, Table 10
    ['1 mG', 1e-7],
  ])('%s = %s in SI', (text, si) => {
    relClose(ok(text).value, si);
  });

  it('agrees with mathjs conversions (a general reference library) for common units', () => {
    for (const [text, magnitude, unit] of [
      ['12 mA', 12, 'mA'],
      ['3.5 cm', 3.5, 'cm'],
      ['250 ms', 250, 'ms'],
      ['4.2 kohm', 4.2, 'kohm'],
      ['30 deg', 30, 'deg'],
      ['2 inch', 2, 'inch'],
    ] as const) {
      relClose(ok(text).value, referenceUnit(magnitude, unit).toSI().toNumber());
    }
  });
});

describe('decimal commas', () => {
  it('reads the comma as the decimal sign in a comma locale', () => {
    expect(ok('0,063 mT', { locale: 'fr-FR' }).value).toBe(6.3e-5);
    expect(ok('6,3e-5 T', { locale: 'de-DE' }).value).toBe(6.3e-5);
    expect(ok('6,30 µT', { locale: 'de-DE' }).sigFigs).toEqual({ min: 3, max: 3 });
  });

  it('never reads a thousands separator', () => {
    for (const text of ['1.000,5 T', '1,000.5 T']) {
      expect(parseQuantity(text, { locale: 'de-DE' })).toMatchObject({ ok: false, error: { code: 'not-a-number' } });
    }
    expect(parseQuantity('6 300 T', { locale: 'fr-FR' })).toMatchObject({ ok: false, error: { code: 'not-a-number' } });
  });

  it('rejects a comma in a point locale with a message about the decimal sign', () => {
    const result = parseQuantity('0,063 mT', { locale: 'en-GB' });
    expect(result).toMatchObject({ ok: false, error: { code: 'not-a-number' } });
    expect(!result.ok && result.error.message).toMatch(/point for the decimal sign/);
  });
});

describe('significant figures (OpenStax University Physics Vol. 1, 1.6; trailing zeros rule per issue 3)', () => {
  it.each([
    ['6.3e-5 T', 2, 2],
    ['63 µT', 2, 2],
    ['0.063 mT', 2, 2],
    ['0.0630 mT', 3, 3],
    ['6300', 2, 4],
    ['6300.', 4, 4],
    ['6.300e3', 4, 4],
    ['6300e3', 2, 4],
    ['1005', 4, 4],
    ['100', 1, 3],
    ['0.010 T', 2, 2],
    ['0', 1, 1],
  ])('%s has %i to %i figures', (text, min, max) => {
    expect(ok(text).sigFigs).toEqual({ min, max });
  });
});

describe('errors a student can read', () => {
  it.each([
    ['', 'empty'],
    ['   ', 'empty'],
    ['abc', 'not-a-number'],
    ['T', 'not-a-number'],
    ['6.3 x 10 T', 'not-a-number'],
    ['1e400 T', 'not-a-number'],
    ['63 xyz', 'unknown-unit'],
    ['63 µ', 'unknown-unit'],
    ['63 °C', 'unknown-unit'],
    ['63 T)', 'unknown-unit'],
  ])('%j → %s', (text, code) => {
    const result = parseQuantity(text);
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.error.code).toBe(code);
      expect(result.error.message.length).toBeGreaterThan(15);
    }
  });

  it('suggests T (tesla) for a lowercase t when a magnetic field is asked', () => {
    const result = parseQuantity('63 t', { expected: 'magnetic-field' });
    expect(result).toMatchObject({ ok: false, error: { code: 'unknown-unit' } });
    expect(!result.ok && result.error.message).toMatch(/did you mean T \(tesla\)\?/);
    const milli = parseQuantity('0.063 mt', { expected: 'magnetic-field' });
    expect(!milli.ok && milli.error.message).toMatch(/did you mean mT \(millitesla\)\?/);
    // Without a field question, t is the tonne (mathjs: 1 t = 1000 kg).
    expect(ok('2 t')).toMatchObject({ value: 2000, dimension: 'mass' });
  });

  it('says what the question asks for when a unit is unknown', () => {
    const result = parseQuantity('63 tesler', { expected: 'magnetic-field' });
    expect(!result.ok && result.error.message).toMatch(/magnetic field, in tesla \(T\)/);
  });
});

describe('properties (fast-check)', () => {
  const prefixes = [
    ['p', 1e-12],
    ['n', 1e-9],
    ['µ', 1e-6],
    ['u', 1e-6],
    ['m', 1e-3],
    ['', 1],
    ['k', 1e3],
    ['M', 1e6],
  ] as const;

  it('round trips: a value written with a random prefix parses back to the same SI value', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-9, max: 1e9, noNaN: true }),
        fc.constantFrom(...prefixes),
        fc.constantFrom('T', 'A', 'm', 'V'),
        fc.boolean(),
        (si, [prefix, factor], base, negative) => {
          const signed = negative ? -si : si;
          const text = `${String(signed / factor)} ${prefix}${base}`;
          relClose(ok(text).value, signed);
        },
      ),
    );
  });

  it('prefix invariance: the same field in T, mT, µT and G parses to the same SI value', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 999_999 }), fc.integer({ min: -9, max: -2 }), (digits, power) => {
        const tesla = Number(`${digits}e${power}`);
        const forms = [`${digits}e${power} T`, `${digits}e${power + 3} mT`, `${digits}e${power + 6} µT`, `${digits}e${power + 4} G`];
        for (const form of forms) relClose(ok(form).value, tesla);
      }),
    );
  });
});
