import type { ReactNode } from 'react';
import { cx } from '../../../../lib/cx';

/** Plot heights (CSS px, axes included) and the room kept for the legend under them. */
export const CHART_HEIGHT = 240;
export const SMALL_CHART_HEIGHT = 190;
export const LEGEND_ROOM = 40;
/** Legend room of a chart with many series (two rows of entries on a narrow card). */
export const TALL_LEGEND_ROOM = 64;

/** Props of ChartFrame. */
export interface ChartFrameProps {
  title: string;
  /** One line under the title: what is drawn and in which frame. */
  description?: ReactNode;
  /** Controls at the right of the title (frame switch...). */
  controls?: ReactNode;
  /** Plot height; the frame keeps this plus the legend's room whatever its content. */
  plotHeight: number;
  /** Room under the plot for the legend (default LEGEND_ROOM). */
  legendRoom?: number;
  children: ReactNode;
  className?: string;
}

/** A chart card of fixed height, so nothing below moves when its data arrives. */
export function ChartFrame({ title, description, controls, plotHeight, legendRoom = LEGEND_ROOM, children, className }: ChartFrameProps) {
  return (
    <figure className={cx('flex min-w-0 flex-col gap-2 rounded-lg border border-rule bg-paper-raised p-3 sm:p-4', className)}>
      <div className="flex min-h-9 flex-wrap items-start justify-between gap-2">
        <figcaption>
          <span className="block text-sm font-semibold">{title}</span>
          {description && <span className="block text-xs text-ink-soft">{description}</span>}
        </figcaption>
        {controls}
      </div>
      <div className="relative overflow-hidden" style={{ height: plotHeight + legendRoom }}>
        {children}
      </div>
    </figure>
  );
}

/** The placeholder a chart shows while its module or data loads: same size as the chart. */
export function ChartSkeleton({ label = 'Loading chart…' }: { label?: string }) {
  return (
    <div role="status" className="absolute inset-0 flex flex-col gap-2">
      <div className="grow animate-pulse rounded-md bg-paper-sunk/70 motion-reduce:animate-none" />
      <div className="h-5 w-2/3 animate-pulse rounded bg-paper-sunk/70 motion-reduce:animate-none" />
      <span className="sr-only">{label}</span>
    </div>
  );
}

/** The run page's chart area while the chart module itself loads: one frame per chart to come. */
export function ChartsPlaceholder({ withMomentum }: { withMomentum: boolean }) {
  const titles = ['SRP acceleration', 'Illuminated fraction', ...(withMomentum ? ['Wheel momentum'] : [])];
  return (
    <div className="flex flex-col gap-4">
      {titles.map((title) => (
        <ChartFrame key={title} title={title} description=" " plotHeight={CHART_HEIGHT} legendRoom={title === 'Wheel momentum' ? TALL_LEGEND_ROOM : LEGEND_ROOM}>
          <ChartSkeleton label={`Loading the ${title.toLowerCase()} chart…`} />
        </ChartFrame>
      ))}
      <div className="grid gap-4 md:grid-cols-2">
        {['Semi-major axis', 'Eccentricity', 'Inclination', 'Right ascension of the ascending node'].map((title) => (
          <ChartFrame key={title} title={title} description=" " plotHeight={SMALL_CHART_HEIGHT}>
            <ChartSkeleton label={`Loading the ${title.toLowerCase()} chart…`} />
          </ChartFrame>
        ))}
      </div>
    </div>
  );
}
