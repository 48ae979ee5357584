import type { EngineError, Failure } from './types.ts';

/** A typed error for bad teacher configuration (a variable spec, an unknown unit in code); carries an EngineError code. */
export class PhysicsError extends Error implements EngineError {
  readonly code: string;

  constructor(code: string, message: string) {
    super(message);
    this.name = 'PhysicsError';
    this.code = code;
  }
}

/** Builds the `{ ok: false, error }` shape every engine function returns for bad input. */
export function fail(code: string, message: string): Failure {
  return { ok: false, error: { code, message } };
}
