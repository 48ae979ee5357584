import { describe, expect, it } from 'vitest';
import { describeDimension, dimensionFromVector, dimensionOf, siUnitFor } from './dimensions.ts';
import { PhysicsError } from './errors.ts';
import { math } from './math.ts';

describe('dimensions', () => {
  // Derived units and their base-unit expressions: BIPM, The International System of Units (SI Brochure),
  // 9th edition, 2019, Table 4 (tesla = Wb/m^2 = N/(A m), ohm, weber, hertz …); gauss: NIST SP 811, Table 10.
  it.each([
    ['T', 'magnetic-field'],
    ['mT', 'magnetic-field'],
    ['G', 'magnetic-field'],
    ['N/(A m)', 'magnetic-field'],
    ['Wb/m^2', 'magnetic-field'],
    ['T m/A', 'permeability'],
    ['cm', 'length'],
    ['mA', 'current'],
    ['ms', 'time'],
    ['g', 'mass'],
    ['kV', 'voltage'],
    ['kohm', 'resistance'],
    ['Ω', 'resistance'],
    ['N', 'force'],
    ['J', 'energy'],
    ['N m', 'energy'],
    ['W', 'power'],
    ['C', 'charge'],
    ['Wb', 'magnetic-flux'],
    ['Hz', 'frequency'],
    ['1/s', 'frequency'],
    ['deg', 'angle'],
    ['°', 'angle'],
    ['A m^2', 'magnetic-moment'],
    ['', 'dimensionless'],
  ])('%s is a %s', (unit, dim) => {
    expect(dimensionOf(unit)).toBe(dim);
  });

  it('describes dimensions for messages', () => {
    expect(describeDimension('magnetic-field')).toEqual({ name: 'magnetic field', unitName: 'tesla', symbol: 'T' });
    expect(describeDimension('length')).toEqual({ name: 'length', unitName: 'metre', symbol: 'm' });
    expect(describeDimension('count').symbol).toBe('');
    expect(describeDimension('kg m s^-1')).toEqual({ name: 'quantity measured in kg m s^-1', unitName: 'kg m s^-1', symbol: 'kg m s^-1' });
  });

  it('names an unnamed vector by its SI base units, and gives named ones their symbol', () => {
    const momentum = math.unit('kg m/s').dimensions;
    expect(dimensionFromVector(momentum)).toBe('kg m s^-1');
    expect(siUnitFor(momentum)).toBe('kg m s^-1');
    expect(siUnitFor(math.unit('N/(A m)').dimensions)).toBe('T');
  });

  it('throws a typed error for an unknown unit', () => {
    expect(() => dimensionOf('furlongz')).toThrow(PhysicsError);
    try {
      dimensionOf('furlongz');
    } catch (error) {
      expect((error as PhysicsError).code).toBe('unknown-unit');
    }
  });
});
