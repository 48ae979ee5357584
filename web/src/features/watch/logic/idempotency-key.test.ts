import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { newIdempotencyKey } from './idempotency-key';

describe('newIdempotencyKey', () => {
  it('makes a UUID the contract accepts', () => {
    expect(z.uuid().safeParse(newIdempotencyKey()).success).toBe(true);
  });

  it('makes a version 4 UUID where randomUUID is missing (a page served over plain http)', () => {
    const original = Object.getOwnPropertyDescriptor(globalThis.crypto, 'randomUUID');
    Object.defineProperty(globalThis.crypto, 'randomUUID', { value: undefined, configurable: true });
    try {
      const first = newIdempotencyKey();
      expect(z.uuid({ version: 'v4' }).safeParse(first).success).toBe(true);
      expect(newIdempotencyKey()).not.toBe(first);
    } finally {
      if (original) Object.defineProperty(globalThis.crypto, 'randomUUID', original);
      else Reflect.deleteProperty(globalThis.crypto, 'randomUUID');
    }
  });
});
