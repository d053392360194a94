/** A uPlot scatter of the cases (loaded lazily: uPlot stays out of the first bundle). */
import { useEffect, useRef } from 'react';
import uPlot from 'uplot';
import 'uplot/dist/uPlot.min.css';
import { formatValue } from '../lib/study-format';

export interface ScatterPoint {
  index: number;
  x: number;
  y: number;
  pareto: boolean;
  best: boolean;
}

const axisStroke = '#4a5f61';
const gridStroke = 'rgba(16, 40, 44, 0.08)';
const tickFont = '11px "JetBrains Mono Variable", "JetBrains Mono", ui-monospace, monospace';
const labelFont = '500 12px "IBM Plex Sans Variable", "IBM Plex Sans", ui-sans-serif, sans-serif';

/** Cases as points (x ascending), Pareto cases as larger marks, the best case ringed. */
export default function StudyScatter({
  points,
  xLabel,
  yLabel,
  ariaLabel,
  staticLegend = false,
}: {
  points: readonly ScatterPoint[];
  xLabel: string;
  yLabel: string;
  ariaLabel: string;
  /** A legend of names only (no read-out under the cursor): for printed reports. */
  staticLegend?: boolean;
}) {
  const hostRef = useRef<HTMLDivElement>(null);
  useEffect(() => {
    const host = hostRef.current;
    if (!host) return;
    const sorted = [...points].sort((a, b) => a.x - b.x);
    const data: uPlot.AlignedData = [
      sorted.map((p) => p.x),
      sorted.map((p) => p.y),
      sorted.map((p) => (p.pareto ? p.y : null)),
      sorted.map((p) => (p.best ? p.y : null)),
    ];
    const noPath = () => null;
    const plot = new uPlot(
      {
        width: Math.max(240, host.clientWidth),
        height: 300,
        scales: {
          // Padded, so that cases sharing the last (or first) x value are all drawn.
          x: {
            time: false,
            range: (_u, min, max) => {
              const pad = (max - min) * 0.04 || Math.abs(max) * 0.04 || 1;
              return [min - pad, max + pad];
            },
          },
        },
        cursor: { drag: { x: false, y: false } },
        legend: { live: !staticLegend },
        axes: [
          { label: xLabel, stroke: axisStroke, font: tickFont, labelFont, labelSize: 22, grid: { stroke: gridStroke }, values: (_u, s) => s.map((v) => formatValue(v)) },
          { label: yLabel, stroke: axisStroke, font: tickFont, labelFont, labelSize: 22, size: 70, grid: { stroke: gridStroke }, values: (_u, s) => s.map((v) => formatValue(v)) },
        ],
        series: [
          { label: 'x', value: (_u, v) => formatValue(v) },
          { label: 'Cases', stroke: '#10282c', paths: noPath, points: { show: true, size: 5, fill: '#10282c' }, value: (_u, v) => formatValue(v) },
          { label: 'Pareto', stroke: '#d9822b', paths: noPath, points: { show: true, size: 10, fill: '#d9822b' }, value: (_u, v) => formatValue(v) },
          { label: 'Best', stroke: '#2f6b4f', width: 2, paths: noPath, points: { show: true, size: 16, fill: 'transparent', width: 2 }, value: (_u, v) => formatValue(v) },
        ],
      },
      data,
      host,
    );
    const observer = new ResizeObserver(() => plot.setSize({ width: Math.max(240, host.clientWidth), height: 300 }));
    observer.observe(host);
    return () => {
      observer.disconnect();
      plot.destroy();
    };
  }, [points, xLabel, yLabel, staticLegend]);
  return <div ref={hostRef} role="img" aria-label={ariaLabel} className="min-h-[340px] w-full" />;
}
