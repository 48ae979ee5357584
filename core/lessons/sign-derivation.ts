import type { SignChoiceSet, SignGeometry } from '../contracts/checkpoints';
import { FIELD_ZERO_THRESHOLD, FieldPointError, fieldDirection, loopField, wireField } from '../physics/fields/index';
import { cross, norm, scale, sub, type Vec3 } from '../physics/vector';

export type SignDerivation = { ok: true; choice: string; field: [number, number, number]; share: number } | { ok: false; message: string };

/** Below this share of |B| the field must have a clearly dominant direction to be asked about (issue 5). */
export const DOMINANT_SHARE = 0.9;
/** A component this small relative to |B| is zero: symmetry zeros come out exact or at rounding level. */
const ZERO_COMPONENT = 1e-9;
/** A non-zero component under this share of |B| is too small to judge its sign (common practice). */
const SMALL_COMPONENT = 0.1;
/** The derivation runs the engine with this current (A); only the direction is used. */
const CURRENT = 1;

const AXIS_INDEX = { x: 0, y: 1, z: 2 } as const;
type Axis = keyof typeof AXIS_INDEX;

/**
 * The engine's loops lie in the xy-plane. For a loop about `axis`, the cyclic order starting after
 * it (x → y, z, x; y → z, x, y) is a right-handed local frame whose third axis is the loop's axis.
 */
const LOCAL_FRAME: Record<Axis, readonly [number, number, number]> = { z: [0, 1, 2], x: [1, 2, 0], y: [2, 0, 1] };

function toLocal(v: Readonly<Vec3>, axis: Axis): Vec3 {
  const [i, j, k] = LOCAL_FRAME[axis];
  return [v[i] as number, v[j] as number, v[k] as number];
}

function fromLocal(v: Readonly<Vec3>, axis: Axis): Vec3 {
  const out: Vec3 = [0, 0, 0];
  LOCAL_FRAME[axis].forEach((global, local) => (out[global] = v[local] as number));
  return out;
}

function unitAxis(axis: Axis, sign: 1 | -1): Vec3 {
  const u: Vec3 = [0, 0, 0];
  u[AXIS_INDEX[axis]] = sign;
  return u;
}

/**
 * B (T) of the described conductor at its field point for a 1 A current. A loop's "anticlockwise
 * seen from the +axis side" is the engine's positive current; a wire's field is μ0I/(2πd) in the
 * direction û × r̂ (û along the current, r from the wire to the point). Throws FieldPointError.
 */
export function signGeometryField(geometry: SignGeometry): Vec3 {
  const { conductor, point } = geometry;
  if (conductor.shape === 'loop') {
    const local = toLocal(sub(point, conductor.center), conductor.axis);
    const current = conductor.current === 'anticlockwise' ? CURRENT : -CURRENT;
    return fromLocal(loopField({ turns: 1, current, radius: conductor.radius, point: local }), conductor.axis);
  }
  const along = unitAxis(conductor.axis, conductor.current === '+' ? 1 : -1);
  const offset = sub(point, conductor.through);
  // The part of the offset across the wire.
  offset[AXIS_INDEX[conductor.axis]] = 0;
  const distance = norm(offset);
  if (distance === 0) {
    throw new FieldPointError(
      'on-conductor',
      `The point (${point.join(', ')}) m is on the wire itself, where a thin-wire model has no finite field.`,
    );
  }
  const magnitude = wireField({ current: CURRENT, distance });
  return scale(cross(along, offset), magnitude / distance);
}

/** 71 %, and 0.4 % rather than a misleading 0 % for a small share. */
const percent = (share: number) => (share < 0.01 ? `${Number((share * 100).toPrecision(1))} %` : `${Math.round(share * 100)} %`);

/**
 * The correct choice of a "check your sign" checkpoint for a described geometry, derived with the
 * right-hand rule by the engine: the field direction (axis set), into/out of the page (page set,
 * the xy-plane seen from +z) or the sign of one component (sign set). Refused, with a message,
 * when the point is on the conductor, the field there is zero, it has no clearly dominant
 * direction (share under 0.9), it lies in the page for the page set, or the set is rotation.
 */
export function deriveSignAnswer(geometry: SignGeometry, choiceSet: SignChoiceSet): SignDerivation {
  if (choiceSet === 'rotation') {
    return {
      ok: false,
      message:
        'The engine derives a field direction at a point, not a sense of rotation. Set the answer by hand for clockwise/anticlockwise.',
    };
  }
  let field: Vec3;
  try {
    field = signGeometryField(geometry);
  } catch (error) {
    if (error instanceof FieldPointError) {
      const lead = error.code === 'on-conductor' ? 'The field point is on the conductor' : 'The set-up cannot be computed';
      return { ok: false, message: `${lead}. ${error.message}` };
    }
    throw error;
  }
  const axes = fieldDirection(field);
  if (axes.direction === 'zero') {
    return {
      ok: false,
      message: `The field is zero at that point (below ${FIELD_ZERO_THRESHOLD} T for a 1 A current), so there is no direction to ask about. Move the point closer to the conductor or set the answer by hand.`,
    };
  }
  if (axes.share < DOMINANT_SHARE) {
    return {
      ok: false,
      message: `The field there has no clearly dominant direction (largest component ${percent(axes.share)} of the field). Move the point or set the answer by hand.`,
    };
  }
  if (choiceSet === 'axis') return { ok: true, choice: axes.direction, field, share: axes.share };
  if (choiceSet === 'page') {
    const page = fieldDirection(field, { view: 'page' });
    if (page.direction === 'into' || page.direction === 'out') return { ok: true, choice: page.direction, field, share: page.share };
    return {
      ok: false,
      message: `The field there lies in the page (along ${axes.direction}), not into or out of it. Use the axis choices or move the point.`,
    };
  }
  const component = field[AXIS_INDEX[geometry.component]];
  const share = Math.abs(component) / norm(field);
  if (share <= ZERO_COMPONENT) return { ok: true, choice: '0', field, share: axes.share };
  if (share < SMALL_COMPONENT) {
    return {
      ok: false,
      message: `The ${geometry.component} component there is small but not zero (${percent(share)} of the field), too small to judge its sign. Ask about another component or move the point.`,
    };
  }
  return { ok: true, choice: component > 0 ? '+' : '-', field, share: axes.share };
}
