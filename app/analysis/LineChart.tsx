import { useEffect, useRef } from 'react';
import uPlot from 'uplot';
import 'uplot/dist/uPlot.min.css';
import { formatSI } from '../format/siFormat';
import { useElementSize } from '../hooks/useElementSize';
import { axisFactor } from './axisFactor';

export interface ChartSeries {
  label: string;
  values: ArrayLike<number>;
  colour: string;
}

/** A vertical line with a label, at x in the x axis's unit. */
export interface ChartMark {
  x: number;
  label: string;
}

interface LineChartProps {
  /** Read by screen readers: what the chart shows, with units. */
  label: string;
  x: ArrayLike<number>;
  series: readonly ChartSeries[];
  xUnit: string;
  yUnit: string;
  logX?: boolean;
  logY?: boolean;
  marks?: readonly ChartMark[];
  height?: number;
  testId?: string;
}

const AXIS = {
  stroke: '#98a1ad',
  grid: { stroke: '#2a303a', width: 1 },
  ticks: { stroke: '#2a303a' },
};

/**
 * Values along an axis with SI prefixes and the unit, e.g. "20 ps", "1.5 µV/m", for data
 * divided by `factor`; on a log axis only the decades are labelled, as the splits between them
 * would crowd the axis.
 */
function siValues(unit: string, factor: number, log = false) {
  return (_: uPlot, splits: number[]) =>
    splits.map((value) => {
      if (!log) return formatSI(value * factor, unit, 3);
      const decade = Math.log10(value);
      return Math.abs(decade - Math.round(decade)) < 1e-9 ? formatSI(value * factor, unit, 1) : '';
    });
}

/**
 * The y range of a linear axis: uPlot's, except for a series that varies by under 1e-4 of its
 * size (the power of a steady orbit, whose only ripple is the path's interpolation error),
 * which gets a band of ±10 % around it rather than that ripple blown up to the full height.
 */
function linearRange(_: uPlot, min: number, max: number): uPlot.Range.MinMax {
  const size = Math.max(Math.abs(min), Math.abs(max));
  if (max - min > 1e-4 * size) return uPlot.rangeNum(min, max, 0.1, true);
  if (size === 0) return [-1, 1];
  return [min - 0.1 * size, max + 0.1 * size];
}

/** A line chart (uPlot) whose axes carry SI units; resizes with its box. */
export function LineChart(props: LineChartProps) {
  const box = useRef<HTMLDivElement>(null);
  const [width] = useElementSize(box);
  const plot = useRef<uPlot | null>(null);
  const { x, series, xUnit, yUnit, logX, logY, marks, height = 220 } = props;

  useEffect(() => {
    const element = box.current;
    if (element === null || width === 0) return;
    const xFactor = axisFactor([x]);
    const yFactor = axisFactor(series.map((entry) => entry.values));
    const data: uPlot.AlignedData = [
      Array.from(x, (v) => v / xFactor),
      ...series.map((entry) =>
        Array.from(entry.values, (v) => (logY && !(v > 0) ? null : v / yFactor)),
      ),
    ];
    const options: uPlot.Options = {
      width,
      height,
      legend: { show: true },
      cursor: { drag: { x: true, y: false } },
      scales: {
        x: { time: false, distr: logX ? 3 : 1 },
        y: {
          distr: logY ? 3 : 1,
          range: logY ? undefined : linearRange,
        },
      },
      axes: [
        { ...AXIS, values: siValues(xUnit, xFactor, logX), size: 36 },
        // Wide enough for "1e-32 J/(m²·Hz)", beyond the SI prefixes.
        { ...AXIS, values: siValues(yUnit, yFactor, logY), size: 124 },
      ],
      series: [
        {
          label: xUnit === 's' ? 't' : 'f',
          value: (_, v) => (v == null ? '–' : formatSI(v * xFactor, xUnit, 5)),
        },
        ...series.map((entry) => ({
          label: entry.label,
          stroke: entry.colour,
          width: 1.4,
          points: { show: false },
          value: (_: uPlot, v: number | null) =>
            v == null ? '–' : formatSI(v * yFactor, yUnit, 4),
        })),
      ],
      hooks: {
        draw: [
          (u) => {
            if (!marks?.length) return;
            const { ctx } = u;
            ctx.save();
            ctx.strokeStyle = '#ffd166';
            ctx.fillStyle = '#ffd166';
            ctx.setLineDash([5, 4]);
            ctx.font = `${12 * devicePixelRatio}px system-ui, sans-serif`;
            for (const mark of marks) {
              const px = u.valToPos(mark.x / xFactor, 'x', true);
              if (!(px >= u.bbox.left && px <= u.bbox.left + u.bbox.width)) continue;
              ctx.beginPath();
              ctx.moveTo(px, u.bbox.top);
              ctx.lineTo(px, u.bbox.top + u.bbox.height);
              ctx.stroke();
              ctx.fillText(
                mark.label,
                px + 4 * devicePixelRatio,
                u.bbox.top + 14 * devicePixelRatio,
              );
            }
            ctx.restore();
          },
        ],
      },
    };
    plot.current?.destroy();
    plot.current = new uPlot(options, data, element);
    return () => {
      plot.current?.destroy();
      plot.current = null;
    };
  }, [x, series, xUnit, yUnit, logX, logY, marks, height, width]);

  return (
    <figure className="line-chart" data-testid={props.testId} aria-label={props.label}>
      <div ref={box} className="line-chart-body" />
    </figure>
  );
}
