// The run page's charts. This module pulls in uPlot and is loaded lazily (React.lazy).
import { useId, useLayoutEffect, useMemo, useRef, useState } from 'react';
import type { RunSummary, Series } from '@photon-ledger/shared';
import { ErrorState } from '../../../../components/ui/error-state';
import { cx } from '../../../../lib/cx';
import { pointsForWidth, useRunSeries } from '../../api/get-run-series';
import { alignColumns, chooseDisplayUnit, maxAbsOf, unwrapDegrees, type AlignedColumns, type DisplayUnit } from '../../lib/chart-data';
import type { EclipsePassage } from '../../lib/eclipses';
import { formatUtc } from '../../lib/format-time';
import { formatQuantity } from '../../lib/format-number';
import { CHART_HEIGHT, ChartFrame, ChartSkeleton, SMALL_CHART_HEIGHT, TALL_LEGEND_ROOM } from './chart-frame';
import { UPlotChart, type ChartBand, type ChartLine } from './uplot-chart';

/** Props of RunCharts. */
export interface RunChartsProps {
  missionId: string;
  runId: string;
  summary: RunSummary;
  /** Eclipse passages, shaded behind every chart. */
  eclipses?: readonly EclipsePassage[];
  /** True when the scenario set a wheel capacity (momentum chart with its dump level). */
  withMomentum: boolean;
}

const colors = {
  x: '#d9661f',
  y: '#2f7a80',
  z: '#7b5ea7',
  magnitude: '#10282c',
  limit: '#a3261b',
  single: '#b8531a',
};

const DAY_S = 86_400;

/** SRP acceleration, illumination, wheel momentum and orbital elements over the run, on one shared time axis. */
export default function RunCharts({ missionId, runId, summary, eclipses = [], withMomentum }: RunChartsProps) {
  const hostRef = useRef<HTMLDivElement>(null);
  const [width, setWidth] = useState<number | null>(null);
  useLayoutEffect(() => {
    const host = hostRef.current;
    if (host) setWidth(host.clientWidth);
  }, []);

  const epochMs = Date.parse(summary.epochUtc);
  const context: ChartContext = {
    missionId,
    runId,
    summary,
    epochMs,
    maxPoints: width === null ? null : pointsForWidth(width),
    xLabel: `Days from epoch ${formatUtc(summary.epochUtc, { seconds: false })}`,
    syncKey: `run-${runId}`,
    bands: useMemo(() => eclipseBands(eclipses), [eclipses]),
  };

  return (
    <div ref={hostRef} className="flex flex-col gap-4">
      <SrpAccelerationChart context={context} />
      <IlluminationChart context={context} />
      {withMomentum && <MomentumChart context={context} />}
      <ElementCharts context={context} />
      {eclipses.length > 0 && (
        <p className="text-xs text-ink-soft">
          Shaded bands: penumbra (light) and umbra (dark). Drag across a chart to zoom in on a time span; double-click to zoom out.
        </p>
      )}
    </div>
  );
}

interface ChartContext {
  missionId: string;
  runId: string;
  summary: RunSummary;
  epochMs: number;
  /** Null until the container's width is known. */
  maxPoints: number | null;
  xLabel: string;
  syncKey: string;
  bands: ChartBand[];
}

function eclipseBands(passages: readonly EclipsePassage[]): ChartBand[] {
  return passages.map((p) => ({
    from: (p.entry?.tSeconds ?? 0) / DAY_S,
    to: ((p.entry?.tSeconds ?? 0) + p.durationS) / DAY_S,
    color: p.phase === 'penumbra' ? 'rgba(16, 40, 44, 0.07)' : 'rgba(16, 40, 44, 0.14)',
  }));
}

/** Fetches some columns for a chart; those the run does not have are left out. */
function useChartSeries(context: ChartContext, wanted: readonly string[]) {
  const available = new Set(context.summary.columns);
  const derived = new Set(['r_m', 'v_m_s', 'srp_a_mag_m_s2', 'srp_t_mag_n_m', 'a_m', 'e', 'i_deg', 'raan_deg', 'h_x_body_n_m_s', 'h_y_body_n_m_s', 'h_z_body_n_m_s', 'h_mag_n_m_s']);
  const columns = wanted.filter((c) => available.has(c) || derived.has(c));
  return useRunSeries(
    context.missionId,
    context.runId,
    { columns, maxPoints: context.maxPoints ?? 0 },
    { enabled: context.maxPoints !== null && columns.length > 0 },
  );
}

function columnOf(series: Series | undefined, name: string) {
  return series?.series.find((s) => s.column === name);
}

/** Shows the skeleton, the error or the chart of a series query. */
function SeriesState({ query, children, what }: { query: ReturnType<typeof useRunSeries>; children: () => React.ReactNode; what: string }) {
  if (query.isError) {
    return (
      <ErrorState
        title={`Could not load the ${what}`}
        error={query.error}
        onRetry={() => void query.refetch()}
        retrying={query.isFetching}
        className="absolute inset-x-0 top-0"
      />
    );
  }
  if (!query.data) return <ChartSkeleton label={`Loading the ${what}…`} />;
  return <>{children()}</>;
}

function describeRange(series: Series): string {
  return `${series.rowsInRange.toLocaleString('en-US')} samples, drawn as ${series.bucketCount.toLocaleString('en-US')} min/max buckets`;
}

function SrpAccelerationChart({ context }: { context: ChartContext }) {
  const [frame, setFrame] = useState<'body' | 'eqj'>('body');
  const hasBody = context.summary.columns.includes('srp_ax_body_m_s2');
  const shownFrame = hasBody ? frame : 'eqj';
  const query = useChartSeries(context, [
    'srp_ax_body_m_s2',
    'srp_ay_body_m_s2',
    'srp_az_body_m_s2',
    'srp_ax_eqj_m_s2',
    'srp_ay_eqj_m_s2',
    'srp_az_eqj_m_s2',
    'srp_a_mag_m_s2',
  ]);
  const axes = ['x', 'y', 'z'] as const;
  const prepared = useMemo(() => {
    const series = query.data;
    if (!series) return null;
    const parts = [...axes.map((a) => columnOf(series, `srp_a${a}_${shownFrame}_m_s2`)), columnOf(series, 'srp_a_mag_m_s2')];
    const present = parts.filter((p): p is NonNullable<typeof p> => p !== undefined);
    const unit = chooseDisplayUnit('m/s^2', maxAbsOf(present));
    return { series, unit, data: alignColumns(present, { scale: unit.factor, xScale: 1 / DAY_S }), present };
  }, [query.data, shownFrame]); // eslint-disable-line react-hooks/exhaustive-deps -- axes is constant.

  const frameName = shownFrame === 'body' ? 'body axes' : 'inertial EQJ axes';
  const lines: ChartLine[] = prepared
    ? prepared.present.map((p) => {
        const axis = /^srp_a([xyz])_/.exec(p.column)?.[1] as 'x' | 'y' | 'z' | undefined;
        return axis
          ? { label: `a${axis} (${shownFrame === 'body' ? 'body' : 'EQJ'})`, color: colors[axis], unit: prepared.unit.label }
          : { label: '|a|', color: colors.magnitude, width: 2, unit: prepared.unit.label };
      })
    : [];
  return (
    <ChartFrame
      title="SRP acceleration"
      description={prepared ? `Components in ${frameName} and magnitude · ${describeRange(prepared.series)}` : `Components in ${frameName} and magnitude`}
      plotHeight={CHART_HEIGHT}
      controls={hasBody ? <FrameSwitch value={frame} onChange={setFrame} /> : null}
    >
      <SeriesState query={query} what="SRP acceleration chart">
        {() =>
          prepared && (
            <UPlotChart
              data={prepared.data}
              lines={lines}
              epochMs={context.epochMs}
              xLabel={context.xLabel}
              yLabel={axisLabel('Acceleration', prepared.unit)}
              height={CHART_HEIGHT}
              syncKey={context.syncKey}
              bands={context.bands}
              ariaLabel={`SRP acceleration components in ${frameName} and magnitude over the run, in ${prepared.unit.label}; mean ${formatQuantity(context.summary.srpAcceleration.mean, 'm/s^2')}, maximum ${formatQuantity(context.summary.srpAcceleration.max, 'm/s^2')}.`}
            />
          )
        }
      </SeriesState>
    </ChartFrame>
  );
}

function FrameSwitch({ value, onChange }: { value: 'body' | 'eqj'; onChange: (v: 'body' | 'eqj') => void }) {
  const name = useId();
  const options = [
    { value: 'body', label: 'Body axes' },
    { value: 'eqj', label: 'Inertial (EQJ)' },
  ] as const;
  return (
    <fieldset className="flex items-center gap-0 rounded-md border border-rule-strong bg-paper p-0.5 text-xs">
      <legend className="sr-only">Frame of the components</legend>
      {options.map((option) => (
        <label
          key={option.value}
          className={cx(
            'cursor-pointer rounded px-2 py-1 has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-sodium',
            value === option.value ? 'bg-ink text-paper' : 'text-ink-soft hover:text-ink',
          )}
        >
          <input
            type="radio"
            name={name}
            value={option.value}
            checked={value === option.value}
            onChange={() => onChange(option.value)}
            className="sr-only"
          />
          {option.label}
        </label>
      ))}
    </fieldset>
  );
}

function IlluminationChart({ context }: { context: ChartContext }) {
  const query = useChartSeries(context, ['illuminated_fraction']);
  const data = useMemo(() => {
    const column = columnOf(query.data, 'illuminated_fraction');
    return column ? alignColumns([column], { xScale: 1 / DAY_S }) : null;
  }, [query.data]);
  return (
    <ChartFrame
      title="Illuminated fraction"
      description="Share of the solar disc seen from the spacecraft: 1 in sunlight, 0 in umbra"
      plotHeight={CHART_HEIGHT}
    >
      <SeriesState query={query} what="illumination chart">
        {() =>
          data ? (
            <UPlotChart
              data={data}
              lines={[{ label: 'Illuminated fraction', color: colors.single }]}
              epochMs={context.epochMs}
              xLabel={context.xLabel}
              yLabel="Illuminated fraction (–)"
              height={CHART_HEIGHT}
              yRange={[-0.05, 1.05]}
              syncKey={context.syncKey}
              bands={context.bands}
              ariaLabel="Illuminated fraction over the run, from 0 (umbra) to 1 (full sunlight)."
            />
          ) : (
            <NoData what="illuminated fraction" />
          )
        }
      </SeriesState>
    </ChartFrame>
  );
}

function MomentumChart({ context }: { context: ChartContext }) {
  const query = useChartSeries(context, ['h_x_body_n_m_s', 'h_y_body_n_m_s', 'h_z_body_n_m_s', 'h_mag_n_m_s']);
  const prepared = useMemo(() => {
    const series = query.data;
    if (!series) return null;
    const present = (['x', 'y', 'z', 'mag'] as const)
      .map((axis) => ({ axis, column: columnOf(series, `h_${axis === 'mag' ? 'mag' : `${axis}_body`}_n_m_s`) }))
      .filter((p): p is { axis: 'x' | 'y' | 'z' | 'mag'; column: NonNullable<typeof p.column> } => p.column !== undefined);
    const level = series.momentum?.dumpLevelNms ?? null;
    const criterion = series.momentum?.dumpCriterion ?? 'norm';
    const unit = chooseDisplayUnit('N*m*s', Math.max(maxAbsOf(present.map((p) => p.column)), level ?? 0));
    const aligned = alignColumns(
      present.map((p) => p.column),
      { scale: unit.factor, xScale: 1 / DAY_S },
    );
    const lines: ChartLine[] = present.map((p) =>
      p.axis === 'mag'
        ? { label: '|H|', color: colors.magnitude, width: 2, unit: unit.label }
        : { label: `H${p.axis} (body)`, color: colors[p.axis], unit: unit.label },
    );
    let data: AlignedColumns = aligned;
    if (level !== null) {
      const [xs, ...ys] = aligned;
      const limit = xs.map(() => level * unit.factor);
      const extra: Array<Array<number | null>> = criterion === 'axis' ? [limit, limit.map((v) => -v)] : [limit];
      data = [xs, ...ys, ...extra];
      lines.push({ label: criterion === 'axis' ? 'Dump level (+, per axis)' : 'Dump level |H|', color: colors.limit, dash: [6, 4], width: 1.5, unit: unit.label });
      if (criterion === 'axis') lines.push({ label: 'Dump level (−, per axis)', color: colors.limit, dash: [6, 4], width: 1.5, unit: unit.label });
    }
    return { series, unit, data, lines, level, criterion };
  }, [query.data]);

  const description = prepared
    ? `Stored wheel momentum H = ∫τ dt in body axes${
        prepared.level !== null
          ? `, reset at each dump (dump when ${prepared.criterion === 'axis' ? 'any axis' : '|H|'} reaches ${formatQuantity(prepared.level, 'N*m*s')}; ${prepared.series.momentum?.dumpsInRange ?? 0} dumps)`
          : ''
      }`
    : 'Stored wheel momentum H = ∫τ dt in body axes';
  return (
    <ChartFrame title="Wheel momentum" description={description} plotHeight={CHART_HEIGHT} legendRoom={TALL_LEGEND_ROOM}>
      <SeriesState query={query} what="momentum chart">
        {() =>
          prepared && (
            <UPlotChart
              data={prepared.data}
              lines={prepared.lines}
              epochMs={context.epochMs}
              xLabel={context.xLabel}
              yLabel={axisLabel('Momentum', prepared.unit)}
              height={CHART_HEIGHT}
              syncKey={context.syncKey}
              bands={context.bands}
              ariaLabel={`Wheel momentum per body axis and magnitude over the run, in ${prepared.unit.label}${prepared.level !== null ? `, with the dump level at ${formatQuantity(prepared.level, 'N*m*s')}` : ''}.`}
            />
          )
        }
      </SeriesState>
    </ChartFrame>
  );
}

const elementCharts = [
  { column: 'a_m', title: 'Semi-major axis', quantity: 'a', unit: 'm' },
  { column: 'e', title: 'Eccentricity', quantity: 'e', unit: '-' },
  { column: 'i_deg', title: 'Inclination', quantity: 'i', unit: 'deg' },
  { column: 'raan_deg', title: 'Right ascension of the ascending node', quantity: 'RAAN', unit: 'deg' },
] as const;

function ElementCharts({ context }: { context: ChartContext }) {
  const query = useChartSeries(
    context,
    elementCharts.map((c) => c.column),
  );
  const central = context.summary.centralBody === 'earth' ? 'Earth' : 'Sun';
  return (
    <div className="grid gap-4 md:grid-cols-2">
      {elementCharts.map((chart) => (
        <ChartFrame
          key={chart.column}
          title={chart.title}
          description={chart.column === 'raan_deg' ? `Osculating, about the ${central}; unwrapped across 0°/360°` : `Osculating, about the ${central}; ${context.summary.frame}`}
          plotHeight={SMALL_CHART_HEIGHT}
        >
          <SeriesState query={query} what={`${chart.title.toLowerCase()} chart`}>
            {() => <ElementChart context={context} series={query.data} chart={chart} />}
          </SeriesState>
        </ChartFrame>
      ))}
    </div>
  );
}

function ElementChart({ context, series, chart }: { context: ChartContext; series: Series | undefined; chart: (typeof elementCharts)[number] }) {
  const column = columnOf(series, chart.column);
  const prepared = useMemo(() => {
    if (!column) return null;
    const values = chart.column === 'raan_deg' ? unwrapDegrees(column.values) : column.values;
    const unit = elementUnit(chart.unit, values);
    return { unit, data: alignColumns([{ t: column.t, values }], { scale: unit.factor, xScale: 1 / DAY_S }) };
  }, [column, chart.unit]);
  if (!prepared) return <NoData what={chart.title.toLowerCase()} />;
  return (
    <UPlotChart
      data={prepared.data}
      lines={[{ label: chart.quantity, color: colors.single, unit: prepared.unit.label }]}
      epochMs={context.epochMs}
      xLabel="Days from epoch"
      yLabel={axisLabel(chart.quantity, prepared.unit)}
      height={SMALL_CHART_HEIGHT}
      syncKey={context.syncKey}
      bands={context.bands}
      ariaLabel={`${chart.title} over the run${prepared.unit.label ? `, in ${prepared.unit.label}` : ''}.`}
    />
  );
}

/** km for Earth orbits, AU for heliocentric ones; a power of ten for small eccentricities. */
function elementUnit(unit: 'm' | '-' | 'deg', values: readonly number[]): DisplayUnit {
  if (unit === 'm') {
    const max = maxAbsOf([{ values: [...values] }]);
    return max > 1e10 ? { factor: 1 / 149_597_870_700, label: 'AU' } : { factor: 1e-3, label: 'km' };
  }
  return chooseDisplayUnit(unit, maxAbsOf([{ values: [...values] }]));
}

function axisLabel(quantity: string, unit: DisplayUnit): string {
  return unit.label ? `${quantity} (${unit.label})` : quantity;
}

function NoData({ what }: { what: string }) {
  return (
    <p className="absolute inset-0 flex items-center justify-center rounded-md border border-dashed border-rule-strong text-sm text-ink-soft">
      This run stored no {what}.
    </p>
  );
}
