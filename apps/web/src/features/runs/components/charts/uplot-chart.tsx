import { useEffect, useRef } from 'react';
import uPlot from 'uplot';
import 'uplot/dist/uPlot.min.css';
import './run-charts.css';
import type { AlignedColumns } from '../../lib/chart-data';
import { formatNumber } from '../../lib/format-number';
import { formatUtc } from '../../lib/format-time';

/** One line of a chart. */
export interface ChartLine {
  label: string;
  color: string;
  width?: number;
  dash?: number[];
  /** Unit text after the legend value. */
  unit?: string;
}

/** A shaded time band (eclipse) in the chart's x units (days from epoch). */
export interface ChartBand {
  from: number;
  to: number;
  color: string;
}

/** Props of UPlotChart. */
export interface UPlotChartProps {
  /** `[x, ...y]` with x in days from the epoch. */
  data: AlignedColumns;
  lines: readonly ChartLine[];
  /** Epoch of x = 0 (ms), for the UTC read-out. */
  epochMs: number;
  xLabel: string;
  yLabel: string;
  /** Plot height in CSS pixels (axes included, legend not). */
  height: number;
  /** Fixed y range; auto otherwise. */
  yRange?: readonly [number, number];
  /** Cursor sync group (charts of one run share it). */
  syncKey?: string;
  bands?: readonly ChartBand[];
  /** Accessible description of the chart (a canvas is opaque to screen readers). */
  ariaLabel: string;
}

const axisStroke = '#4a5f61';
const gridStroke = 'rgba(16, 40, 44, 0.08)';
const tickFont = '11px "JetBrains Mono Variable", "JetBrains Mono", ui-monospace, monospace';
const labelFont = '500 12px "IBM Plex Sans Variable", "IBM Plex Sans", ui-sans-serif, sans-serif';

/** A uPlot line chart that fills its container's width and follows it on resize. */
export function UPlotChart({ data, lines, epochMs, xLabel, yLabel, height, yRange, syncKey, bands, ariaLabel }: UPlotChartProps) {
  const hostRef = useRef<HTMLDivElement>(null);
  const plotRef = useRef<uPlot | null>(null);
  const dataRef = useRef(data);
  dataRef.current = data;
  const bandsRef = useRef(bands);
  bandsRef.current = bands;

  // (Re)create when the shape of the chart changes; new data alone goes through setData below.
  const shape = JSON.stringify({ lines, xLabel, yLabel, height, yRange, syncKey, epochMs });
  useEffect(() => {
    const host = hostRef.current;
    if (!host) return;
    const options: uPlot.Options = {
      width: Math.max(200, host.clientWidth),
      height,
      cursor: { ...(syncKey ? { sync: { key: syncKey } } : {}), drag: { x: true, y: false } },
      scales: {
        x: { time: false },
        y: yRange ? { range: [yRange[0], yRange[1]] } : {},
      },
      legend: { live: true },
      axes: [
        {
          label: xLabel,
          stroke: axisStroke,
          font: tickFont,
          labelFont,
          labelSize: 22,
          grid: { stroke: gridStroke },
          ticks: { stroke: gridStroke },
        },
        {
          label: yLabel,
          stroke: axisStroke,
          font: tickFont,
          labelFont,
          labelSize: 22,
          size: 62,
          grid: { stroke: gridStroke },
          ticks: { stroke: gridStroke },
          values: (_u, splits) => splits.map((v) => formatTick(v)),
        },
      ],
      series: [
        { label: 'UTC', value: (_u, v) => (v === null || v === undefined ? '—' : formatUtc(epochMs + v * 86_400_000)) },
        ...lines.map((line) => ({
          label: line.label,
          stroke: line.color,
          width: line.width ?? 1.5,
          ...(line.dash ? { dash: line.dash } : {}),
          spanGaps: true,
          points: { show: false },
          value: (_u: uPlot, v: number | null) =>
            v === null || v === undefined ? '—' : `${formatNumber(v, { digits: 4, small: 1e-4 })}${line.unit ? ` ${line.unit}` : ''}`,
        })),
      ],
      hooks: {
        drawClear: [
          (u) => {
            const list = bandsRef.current;
            if (!list || list.length === 0) return;
            const { ctx } = u;
            const { top, height: h } = u.bbox;
            ctx.save();
            for (const band of list) {
              const x0 = u.valToPos(band.from, 'x', true);
              const x1 = u.valToPos(band.to, 'x', true);
              ctx.fillStyle = band.color;
              ctx.fillRect(x0, top, Math.max(1, x1 - x0), h);
            }
            ctx.restore();
          },
        ],
      },
    };
    const plot = new uPlot(options, dataRef.current as uPlot.AlignedData, host);
    plotRef.current = plot;
    const observer = new ResizeObserver(() => {
      const width = Math.max(200, host.clientWidth);
      if (width !== plot.width) plot.setSize({ width, height });
    });
    observer.observe(host);
    return () => {
      observer.disconnect();
      plot.destroy();
      plotRef.current = null;
    };
  }, [shape]); // eslint-disable-line react-hooks/exhaustive-deps -- `shape` stands for every option.

  useEffect(() => {
    const plot = plotRef.current;
    if (plot && plot.data !== (data as uPlot.AlignedData)) plot.setData(data as uPlot.AlignedData);
  }, [data]);

  return <div ref={hostRef} role="img" aria-label={ariaLabel} className="pl-chart w-full" />;
}

/** Tick text: plain with just enough decimals in the usual range, powers of ten outside it. */
function formatTick(v: number): string {
  if (v === 0) return '0';
  const abs = Math.abs(v);
  if (abs >= 1e-3 && abs < 1e6) return Number(v.toPrecision(6)).toString().replace('-', '−');
  return formatNumber(v, { digits: 3 });
}
