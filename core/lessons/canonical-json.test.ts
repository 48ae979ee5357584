import { describe, expect, it } from 'vitest';
import { canonicalJson } from './canonical-json';

describe('canonicalJson', () => {
  it('sorts keys at every level and writes no spaces', () => {
    expect(canonicalJson({ b: 1, a: { d: [3, { z: 1, y: 2 }], c: 'x' } })).toBe('{"a":{"c":"x","d":[3,{"y":2,"z":1}]},"b":1}');
  });

  it('gives the same text for objects built in different orders', () => {
    expect(canonicalJson({ title: 't', tags: ['a'] })).toBe(canonicalJson({ tags: ['a'], title: 't' }));
  });

  it('follows JSON.stringify for undefined, non-finite numbers and toJSON', () => {
    expect(canonicalJson({ a: undefined, b: [undefined, Number.NaN], c: new Date(0) })).toBe(
      '{"b":[null,null],"c":"1970-01-01T00:00:00.000Z"}',
    );
    expect(canonicalJson(undefined)).toBe('null');
  });

  it('escapes strings as JSON does', () => {
    expect(canonicalJson({ 'k"': 'line\n"quoted"' })).toBe('{"k\\"":"line\\n\\"quoted\\""}');
  });
});
