import { useId } from 'react';
import type { SignGeometry } from '@core/contracts';
import { cn } from '@/lib/cn';
import { describeGeometry, diagramShapes, project, type Point2 } from './geometry-projection';

type GeometryDiagramProps = { geometry: SignGeometry; className?: string };

const AXES = [
  { label: 'x', to: [1, 0, 0] },
  { label: 'y', to: [0, 1, 0] },
  { label: 'z', to: [0, 0, 1] },
] as const;

const path = (points: Point2[], closed: boolean) =>
  points.map(([x, y], i) => `${i === 0 ? 'M' : 'L'}${x.toFixed(4)} ${y.toFixed(4)}`).join(' ') + (closed ? ' Z' : '');

/**
 * A small drawing of a sign check's set-up: the axes (z drawn obliquely, towards the reader), the
 * loop or wire with an arrow for its current, and the field point P. It never shows the field,
 * so it can sit beside the question without giving the answer away.
 */
export function GeometryDiagram({ geometry, className }: GeometryDiagramProps) {
  const rawId = useId();
  const id = rawId.replace(/[^A-Za-z0-9_-]/g, '');
  const shapes = diagramShapes(geometry);
  const axisLength = shapes.extent * 1.2;
  const axes = AXES.map((axis) => ({
    label: axis.label,
    end: project([axis.to[0] * axisLength, axis.to[1] * axisLength, axis.to[2] * axisLength]),
  }));
  const all = [...shapes.conductor, shapes.point, shapes.origin, ...axes.map((axis) => axis.end)];
  const xs = all.map((p) => p[0]);
  const ys = all.map((p) => p[1]);
  const span = Math.max(Math.max(...xs) - Math.min(...xs), Math.max(...ys) - Math.min(...ys), 1e-6);
  const pad = span * 0.15;
  const viewBox = [
    Math.min(...xs) - pad,
    Math.min(...ys) - pad,
    Math.max(...xs) - Math.min(...xs) + 2 * pad,
    Math.max(...ys) - Math.min(...ys) + 2 * pad,
  ];
  // Strokes and text scale with the drawing so they read the same at any size.
  const unit = span / 100;
  const description = describeGeometry(geometry);
  return (
    <svg
      role="img"
      aria-labelledby={`${id}-title ${id}-desc`}
      viewBox={viewBox.map((n) => n.toFixed(4)).join(' ')}
      className={cn('h-auto w-full max-w-xs rounded-md border border-line bg-surface', className)}
    >
      <title id={`${id}-title`}>
        {geometry.conductor.shape === 'loop' ? 'Current loop and field point' : 'Straight wire and field point'}
      </title>
      <desc id={`${id}-desc`}>{description}</desc>
      <defs>
        <marker id={`${id}-head`} viewBox="0 0 10 10" refX="5" refY="5" markerWidth="5" markerHeight="5" orient="auto-start-reverse">
          <path d="M0 0 L10 5 L0 10 Z" className="fill-current" />
        </marker>
      </defs>
      <g className="text-ink-muted" stroke="currentColor" strokeWidth={unit * 0.8}>
        {axes.map((axis) => (
          <g key={axis.label}>
            <line x1={shapes.origin[0]} y1={shapes.origin[1]} x2={axis.end[0]} y2={axis.end[1]} markerEnd={`url(#${id}-head)`} />
            <text x={axis.end[0] + unit * 3} y={axis.end[1] - unit * 3} fontSize={unit * 9} stroke="none" className="fill-current">
              {axis.label}
            </text>
          </g>
        ))}
      </g>
      <g className="text-copper" stroke="currentColor" fill="none" strokeWidth={unit * 2}>
        <path d={path(shapes.conductor, shapes.closed)} />
        <line
          x1={shapes.arrow.at[0]}
          y1={shapes.arrow.at[1]}
          x2={shapes.arrow.towards[0]}
          y2={shapes.arrow.towards[1]}
          strokeWidth={unit * 2.5}
          markerEnd={`url(#${id}-head)`}
        />
        <text
          x={shapes.arrow.towards[0] + unit * 3}
          y={shapes.arrow.towards[1] + unit * 10}
          fontSize={unit * 10}
          stroke="none"
          className="fill-current"
        >
          I
        </text>
      </g>
      <g className="text-teal">
        <circle cx={shapes.point[0]} cy={shapes.point[1]} r={unit * 3} className="fill-current" />
        <text x={shapes.point[0] + unit * 4} y={shapes.point[1] - unit * 4} fontSize={unit * 10} className="fill-current font-bold">
          P
        </text>
      </g>
    </svg>
  );
}
