import { randomInt } from 'node:crypto';
import { LIMITS } from '@core/limits';

// No I, O, 0 or 1: a code read off a projector must not be ambiguous.
const ALPHABET = 'ABCDEFGHJKLMNPQRSTUVWXYZ23456789';

/** A random class join code, e.g. K7QM2XPA. */
export function newJoinCode(): string {
  return Array.from({ length: LIMITS.joinCodeLength }, () => ALPHABET[randomInt(ALPHABET.length)]).join('');
}
