import 'uplot/dist/uPlot.min.css';
import { useEffect, useMemo, useRef } from 'react';
import type uPlot from 'uplot';
import type { LiveModel } from '@core/contracts';
import { formatWithUnit, liveModelDefinition, plotLiveModel } from '@core/lessons/models';

type LiveModelPlotProps = { model: LiveModel; values: Readonly<Record<string, number>> };

const axisTitle = (label: string, unit: string) => (unit ? `${label} (${unit})` : label);

/** A LaTeX symbol as plain text for a canvas label: \\theta → θ, B_H → BH. */
const plainSymbol = (latex: string) =>
  latex
    .replace(/\\theta/g, 'θ')
    .replace(/\\varphi/g, 'φ')
    .replace(/[_{}\\]/g, '');

/** Reads a CSS colour token so the plot uses the app's palette. */
function token(name: string, fallback: string): string {
  const value = getComputedStyle(document.documentElement).getPropertyValue(name).trim();
  return value || fallback;
}

const HEIGHT = 220;

/** NaN (a sample the engine refused) becomes a gap in the curve. */
function withGaps(data: { x: number[]; y: number[] }): uPlot.AlignedData {
  return [data.x, data.y.map((y) => (Number.isFinite(y) ? y : null))];
}

function plotOptions(width: number, xTitle: string, yTitle: string, marker: { current: number | null }): uPlot.Options {
  const ink = token('--color-ink', '#1b2430');
  const line = token('--color-teal', '#0f6b6b');
  const accent = token('--color-copper', '#9a4f22');
  return {
    width: Math.max(width, 240),
    height: HEIGHT,
    legend: { show: false },
    cursor: { show: true, drag: { x: false, y: false } },
    scales: { x: { time: false } },
    axes: [
      { label: xTitle, stroke: ink },
      { label: yTitle, stroke: ink, size: 60 },
    ],
    series: [{}, { stroke: line, width: 2, spanGaps: false }],
    hooks: {
      // The marker: a dashed vertical line at the swept input's current value.
      draw: [
        (u) => {
          const at = marker.current;
          if (at === null || !Number.isFinite(at)) return;
          const x = u.valToPos(at, 'x', true);
          const ratio = window.devicePixelRatio || 1;
          const { ctx } = u;
          ctx.save();
          ctx.strokeStyle = accent;
          ctx.lineWidth = 2 * ratio;
          ctx.setLineDash([6 * ratio, 4 * ratio]);
          ctx.beginPath();
          ctx.moveTo(x, u.bbox.top);
          ctx.lineTo(x, u.bbox.top + u.bbox.height);
          ctx.stroke();
          ctx.restore();
        },
      ],
    },
  };
}

/** uPlot needs a 2-D canvas, matchMedia and ResizeObserver; without them the text summary stands alone. */
function canDrawPlot(): boolean {
  if (typeof window.matchMedia !== 'function' || typeof ResizeObserver !== 'function') return false;
  return document.createElement('canvas').getContext('2d') !== null;
}

/**
 * The model's output against one input (uPlot, canvas), as wide as its container, with labelled
 * axes and a vertical marker at the input's current value. A text summary goes with it for
 * screen readers.
 */
export function LiveModelPlot({ model, values }: LiveModelPlotProps) {
  const definition = liveModelDefinition(model);
  const plot = model.plot;
  const input = definition.inputs.find((entry) => entry.name === plot?.input);
  const data = useMemo(() => {
    const known = model.plot && liveModelDefinition(model).inputs.some((entry) => entry.name === model.plot?.input);
    return known ? plotLiveModel(model, values) : null;
  }, [model, values]);
  const holder = useRef<HTMLDivElement>(null);
  const chart = useRef<uPlot | null>(null);
  const marker = useRef<number | null>(null);
  const latest = useRef<{ x: number[]; y: number[] } | null>(null);
  const markerAt = input ? (values[input.name] ?? null) : null;

  const xTitle = input ? axisTitle(input.label, input.unit) : '';
  // The vertical axis is short: the symbol and unit there, the words in the caption.
  const yTitle = axisTitle(plainSymbol(definition.output.symbol), definition.output.unit);

  useEffect(() => {
    const element = holder.current;
    if (!element || !xTitle || !canDrawPlot()) return undefined;
    let cancelled = false;
    let cleanup: (() => void) | null = null;
    // uPlot reads matchMedia as it loads, so it is imported only where it can draw.
    void import('uplot').then(({ default: UPlot }) => {
      if (cancelled) return;
      const created = new UPlot(plotOptions(element.clientWidth, xTitle, yTitle, marker), [[], []], element);
      chart.current = created;
      if (latest.current) created.setData(withGaps(latest.current));
      const resize = new ResizeObserver(() => created.setSize({ width: Math.max(element.clientWidth, 240), height: HEIGHT }));
      resize.observe(element);
      cleanup = () => {
        resize.disconnect();
        created.destroy();
        chart.current = null;
      };
    });
    return () => {
      cancelled = true;
      cleanup?.();
    };
  }, [xTitle, yTitle]);

  // Before the data effect: a new marker position is drawn with the new data.
  useEffect(() => {
    marker.current = markerAt;
    chart.current?.redraw(false);
  }, [markerAt]);

  useEffect(() => {
    latest.current = data;
    if (chart.current && data) chart.current.setData(withGaps(data));
  }, [data]);

  if (!plot || !input || !data) return null;
  const finite = data.y.filter(Number.isFinite);
  const summary = `Plot of ${definition.output.label.toLowerCase()} against ${input.label.toLowerCase()} from ${formatWithUnit(plot.from, input.unit)} to ${formatWithUnit(plot.to, input.unit)}${
    finite.length
      ? `; the output ranges from ${formatWithUnit(Math.min(...finite), definition.output.unit)} to ${formatWithUnit(Math.max(...finite), definition.output.unit)}`
      : ''
  }; the marker is at ${formatWithUnit(markerAt ?? plot.from, input.unit)}.`;
  return (
    <figure className="flex flex-col gap-1">
      <div ref={holder} className="w-full" aria-hidden="true" />
      <figcaption className="text-sm text-ink-muted">{summary}</figcaption>
    </figure>
  );
}
