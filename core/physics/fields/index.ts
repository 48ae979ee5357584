/** Magnetic field models: SI in and out, vectors as [x, y, z]; see each module for its conventions. */
export { biotSavart } from './biot-savart';
export { circulation } from './circulation';
export { dipoleFieldOnAxis } from './dipole-field';
export { completeElliptic, ellipticE, ellipticK, type CompleteElliptic } from './elliptic';
export { FieldPointError, type FieldErrorCode } from './field-error';
export {
  FIELD_ZERO_THRESHOLD,
  fieldDirection,
  type AxisDirection,
  type FieldDirection,
  type FieldDirectionOptions,
  type PageDirection,
} from './field-direction';
export { helmholtzFieldOnAxis, loopField, loopFieldOnAxis, type LoopInput } from './loop-field';
export { needleDeflection } from './needle-deflection';
export { solenoidFieldOnAxis } from './solenoid-field';
export { wireField } from './wire-field';
