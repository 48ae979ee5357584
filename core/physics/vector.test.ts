import { describe, expect, it } from 'vitest';
import { add, cross, dot, isFiniteVec3, norm, scale, sub } from './vector';

describe('vector helpers', () => {
  it('add, sub, scale, dot and norm act component by component', () => {
    // Common practice: definitions of the vector operations.
    expect(add([1, 2, 3], [4, 5, 6])).toEqual([5, 7, 9]);
    expect(sub([1, 2, 3], [4, 5, 6])).toEqual([-3, -3, -3]);
    expect(scale([1, -2, 3], 2)).toEqual([2, -4, 6]);
    expect(dot([1, 2, 3], [4, 5, 6])).toBe(32);
    expect(norm([3, 4, 12])).toBe(13);
  });

  it('cross is right-handed: x × y = z, y × z = x, z × x = y, and anti-commutes', () => {
    // Common practice: the right-handed frame.
    expect(cross([1, 0, 0], [0, 1, 0])).toEqual([0, 0, 1]);
    expect(cross([0, 1, 0], [0, 0, 1])).toEqual([1, 0, 0]);
    expect(cross([0, 0, 1], [1, 0, 0])).toEqual([0, 1, 0]);
    expect(cross([2, 3, 4], [5, 6, 7])).toEqual([-3, 6, -3]);
    expect(cross([5, 6, 7], [2, 3, 4])).toEqual([3, -6, 3]);
  });

  it('isFiniteVec3 accepts only three finite numbers', () => {
    expect(isFiniteVec3([0, 1, 2])).toBe(true);
    expect(isFiniteVec3([0, 1])).toBe(false);
    expect(isFiniteVec3([0, Number.NaN, 1])).toBe(false);
    expect(isFiniteVec3([0, Infinity, 1])).toBe(false);
    expect(isFiniteVec3('0,1,2')).toBe(false);
  });
});
