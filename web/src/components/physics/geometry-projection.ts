import type { SignGeometry } from '@core/contracts';

type Vec3 = [number, number, number];
export type Point2 = [number, number];

const AXIS_INDEX = { x: 0, y: 1, z: 2 } as const;
/** A right-handed pair (e1, e2) spanning a loop's plane, so (e1, e2, axis) is right-handed. */
const PLANE: Record<'x' | 'y' | 'z', [number, number]> = { z: [0, 1], x: [1, 2], y: [2, 0] };
/** Oblique projection: z (towards the reader) is drawn down and to the left at this fraction. */
const DEPTH = 0.4;

/** Screen coordinates (y down) of a 3-D point: x right, y up, z drawn obliquely. */
export function project([x, y, z]: Readonly<Vec3>): Point2 {
  return [x - DEPTH * z * Math.SQRT1_2, -(y - DEPTH * z * Math.SQRT1_2)];
}

export type DiagramShapes = {
  /** The conductor as a screen polyline (the loop closed, the wire a segment). */
  conductor: Point2[];
  closed: boolean;
  /** Where the current arrow sits and which way (screen) it points. */
  arrow: { at: Point2; towards: Point2 };
  point: Point2;
  origin: Point2;
  /** The size of the drawing in metres, for the axes' length. */
  extent: number;
};

/** The conductor, its current arrow and the field point in screen units (metres, y down). */
export function diagramShapes(geometry: SignGeometry): DiagramShapes {
  const { conductor, point } = geometry;
  const spread = Math.max(...point.map(Math.abs), conductor.shape === 'loop' ? conductor.radius : 0, 1e-3);
  if (conductor.shape === 'loop') {
    const [i, j] = PLANE[conductor.axis];
    const at = (t: number): Vec3 => {
      const p: Vec3 = [...conductor.center];
      p[i] = (p[i] as number) + conductor.radius * Math.cos(t);
      p[j] = (p[j] as number) + conductor.radius * Math.sin(t);
      return p;
    };
    const samples = Array.from({ length: 48 }, (_, k) => project(at((2 * Math.PI * k) / 48)));
    // Increasing t runs anticlockwise seen from +axis; the arrow sits at t = −π/2 (nearest the reader's bottom).
    const sense = conductor.current === 'anticlockwise' ? 1 : -1;
    const t0 = -Math.PI / 2;
    return {
      conductor: samples,
      closed: true,
      arrow: { at: project(at(t0)), towards: project(at(t0 + sense * 0.3)) },
      point: project(point),
      origin: project([0, 0, 0]),
      extent: spread + Math.max(...conductor.center.map(Math.abs)),
    };
  }
  const length = 1.6 * Math.max(spread, ...conductor.through.map(Math.abs));
  const along = (s: number): Vec3 => {
    const p: Vec3 = [...conductor.through];
    p[AXIS_INDEX[conductor.axis]] += s;
    return p;
  };
  const sense = conductor.current === '+' ? 1 : -1;
  return {
    conductor: [project(along(-length)), project(along(length))],
    closed: false,
    arrow: { at: project(along(length * 0.45 * sense)), towards: project(along(length * 0.7 * sense)) },
    point: project(point),
    origin: project([0, 0, 0]),
    extent: length,
  };
}

const cm = (metres: number) => `${Number((metres * 100).toPrecision(3))}`;
const at = (p: readonly number[]) => `(${p.map(cm).join(', ')}) cm`;

/** The set-up in words, for screen readers; it never says which way the field points. */
export function describeGeometry(geometry: SignGeometry): string {
  const { conductor, point } = geometry;
  const where = `Field point P at ${at(point)}.`;
  if (conductor.shape === 'loop') {
    const plane = { x: 'yz', y: 'zx', z: 'xy' }[conductor.axis];
    return `A circular loop of radius ${cm(conductor.radius)} cm in the ${plane} plane, centred at ${at(conductor.center)}, its current ${conductor.current} seen from the +${conductor.axis} side. ${where}`;
  }
  return `A long straight wire along the ${conductor.axis} axis through ${at(conductor.through)}, its current flowing towards ${conductor.current}${conductor.axis}. ${where}`;
}
