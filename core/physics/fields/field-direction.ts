import type { Vec3 } from '../vector';
import { requirePositive, requireVec3 } from './field-error';

/** Direction along a coordinate axis. */
export type AxisDirection = '+x' | '-x' | '+y' | '-y' | '+z' | '-z';
/** Direction on a page showing the xy-plane seen from +z (x to the right, y up, z towards the reader). */
export type PageDirection = 'out' | 'into' | 'up' | 'down' | 'right' | 'left';

export interface FieldDirectionOptions {
  /** Magnitudes below this (T) count as 'zero'. Default 1e-12 T (1 pT, far below any classroom field). */
  threshold?: number;
  /** 'axes' (default) names '+x'…'-z'; 'page' names 'right', 'up', 'out' and their opposites. */
  view?: 'axes' | 'page';
}

export interface FieldDirection<D extends string> {
  /** The dominant component's direction, or 'zero' when |B| is below the threshold. */
  direction: D | 'zero';
  /** |dominant component| / |B|, from 1/sqrt(3) (diagonal) to 1 (along an axis); 0 for 'zero'. */
  share: number;
}

/** Default 'zero' threshold, in T. */
export const FIELD_ZERO_THRESHOLD = 1e-12;

const AXES: readonly [AxisDirection, AxisDirection][] = [
  ['+x', '-x'],
  ['+y', '-y'],
  ['+z', '-z'],
];
const PAGE: Record<AxisDirection, PageDirection> = {
  '+x': 'right',
  '-x': 'left',
  '+y': 'up',
  '-y': 'down',
  '+z': 'out',
  '-z': 'into',
};

/**
 * The coordinate direction a field mostly points along: the component of largest magnitude (ties
 * go to x, then y, then z) and its share of |B|. With { view: 'page' } the xy-plane is the page
 * seen from +z: +z is 'out' of the page, −z 'into', +y 'up', +x 'right'.
 */
export function fieldDirection(field: Readonly<Vec3>, options: FieldDirectionOptions & { view: 'page' }): FieldDirection<PageDirection>;
export function fieldDirection(field: Readonly<Vec3>, options?: FieldDirectionOptions & { view?: 'axes' }): FieldDirection<AxisDirection>;
export function fieldDirection(field: Readonly<Vec3>, options: FieldDirectionOptions = {}): FieldDirection<AxisDirection | PageDirection> {
  const b = requireVec3('field', field, 'T');
  const threshold = requirePositive('threshold', options.threshold ?? FIELD_ZERO_THRESHOLD, 'T');
  const magnitude = Math.hypot(b[0], b[1], b[2]);
  if (magnitude < threshold) return { direction: 'zero', share: 0 };
  let axis = 0;
  for (let i = 1; i < 3; i += 1) {
    if (Math.abs(b[i] as number) > Math.abs(b[axis] as number)) axis = i;
  }
  const component = b[axis] as number;
  const pair = AXES[axis] as [AxisDirection, AxisDirection];
  const direction = component > 0 ? pair[0] : pair[1];
  return {
    direction: options.view === 'page' ? PAGE[direction] : direction,
    share: Math.abs(component) / magnitude,
  };
}
