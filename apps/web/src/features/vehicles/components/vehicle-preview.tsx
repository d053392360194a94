import { Component, lazy, Suspense, useId, type ReactNode } from 'react';
import { formatNumber, formatVector } from '../../../lib/format-number';
import { arrowColours, opticsSwatches, type OpticsSwatchKey } from '../lib/optics-palette';
import { PRESSURE_AT_1AU_PA, PREVIEW_SOLAR_CONSTANT, type SrpPreview, type SunAngles } from '../lib/srp-preview';

const VehicleScene = lazy(() => import('./vehicle-scene'));

/** The canvas's accessible name. */
export const PREVIEW_LABEL = '3D preview of the vehicle';

/** Props of VehiclePreview. */
export interface VehiclePreviewProps {
  preview: SrpPreview | null;
  sun: SunAngles;
  onSunChange: (sun: SunAngles) => void;
  /** Why nothing is drawn, when `preview` is null. */
  emptyMessage: string;
  onHoverPlate?: (index: number | null) => void;
  highlighted?: number | null;
}

const magnitude = (v: readonly number[]) => Math.hypot(v[0]!, v[1]!, v[2]!);

/**
 * The live preview: the 3D view (loaded lazily), the Sun direction in the body frame, a legend,
 * and the same result as numbers (so it reads without WebGL).
 */
export function VehiclePreview({ preview, sun, onSunChange, emptyMessage, onHoverPlate, highlighted }: VehiclePreviewProps) {
  const swatches = preview ? legendSwatches(preview) : [];
  return (
    <div className="flex flex-col gap-3">
      <div className="relative h-[22rem] overflow-hidden rounded-lg border border-rule bg-[radial-gradient(circle_at_30%_20%,#fbf9f4,#e4e0d3)]">
        <SceneBoundary>
          <Suspense fallback={<p className="p-4 text-sm text-ink-soft">Loading the 3D view…</p>}>
            <VehicleScene preview={preview} label={PREVIEW_LABEL} onHoverPlate={onHoverPlate} highlighted={highlighted} />
          </Suspense>
        </SceneBoundary>
        {!preview && (
          <p className="pointer-events-none absolute inset-x-0 bottom-3 mx-auto w-fit rounded-md bg-paper-raised/90 px-3 py-1.5 text-sm text-ink-soft shadow-sm">
            {emptyMessage}
          </p>
        )}
        {preview && (preview.platesLeftOut > 0 || preview.usedStandIns) && (
          <p className="pointer-events-none absolute inset-x-0 bottom-3 mx-auto w-fit max-w-[90%] rounded-md bg-paper-raised/90 px-3 py-1.5 text-xs text-ink-soft shadow-sm">
            {preview.platesLeftOut > 0 && `${preview.platesLeftOut} plate${preview.platesLeftOut === 1 ? '' : 's'} with errors left out. `}
            {preview.usedStandIns && 'Mass or centre of mass not valid yet: 1 kg at the origin stands in.'}
          </p>
        )}
      </div>

      <SunControls sun={sun} onSunChange={onSunChange} />

      <ul aria-label="Legend" className="flex flex-wrap gap-x-4 gap-y-1 text-xs text-ink-soft">
        {swatches.map((key) => (
          <li key={key} className="flex items-center gap-1.5">
            <span aria-hidden="true" className="size-3 rounded-sm border border-ink/30" style={{ backgroundColor: opticsSwatches[key].colour }} />
            {opticsSwatches[key].label}
          </li>
        ))}
        {preview?.kind !== 'cannonball' && <LegendArrow colour={arrowColours.normal} label="Normal" />}
        {preview?.kind !== 'cannonball' && preview?.kind !== 'sail' && <LegendArrow colour={arrowColours.plateForce} label="Plate force" />}
        <LegendArrow colour={arrowColours.totalForce} label="Total force" />
        {preview?.kind !== 'cannonball' && <LegendArrow colour={arrowColours.torque} label="Torque about CoM" />}
        <LegendArrow colour={arrowColours.sun} label="Sunlight" />
      </ul>
      <p className="text-xs text-ink-soft">Arrow lengths are scaled to fit the view; the values are below. Drag to turn the view.</p>

      <SrpNumbers preview={preview} />
    </div>
  );
}

function legendSwatches(preview: SrpPreview): OpticsSwatchKey[] {
  const keys = new Set<OpticsSwatchKey>();
  for (const s of preview.surfaces) {
    keys.add(s.front);
    if (preview.kind !== 'cannonball') keys.add(s.back);
  }
  return [...keys];
}

function LegendArrow({ colour, label }: { colour: string; label: string }) {
  return (
    <li className="flex items-center gap-1.5">
      <svg viewBox="0 0 18 8" aria-hidden="true" className="h-2 w-[18px]">
        <path d="M0 4h12" stroke={colour} strokeWidth="2" />
        <path d="M11 0.5 17.5 4 11 7.5z" fill={colour} />
      </svg>
      {label}
    </li>
  );
}

function SunControls({ sun, onSunChange }: { sun: SunAngles; onSunChange: (sun: SunAngles) => void }) {
  const id = useId();
  return (
    <fieldset className="grid grid-cols-1 gap-x-4 gap-y-2 rounded-lg border border-rule bg-paper-raised px-3 py-2 sm:grid-cols-2">
      <legend className="px-1 text-sm font-medium">Sun direction, body frame</legend>
      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-az`} className="flex justify-between text-xs text-ink-soft">
          <span>Sun azimuth (°)</span>
          <span className="font-mono text-ink">{sun.azimuthDeg}°</span>
        </label>
        <input
          id={`${id}-az`}
          type="range"
          min={-180}
          max={180}
          step={1}
          value={sun.azimuthDeg}
          aria-valuetext={`${sun.azimuthDeg}° from +x towards +y`}
          onChange={(e) => onSunChange({ ...sun, azimuthDeg: Number(e.target.value) })}
          className="accent-sodium-strong"
        />
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-el`} className="flex justify-between text-xs text-ink-soft">
          <span>Sun elevation (°)</span>
          <span className="font-mono text-ink">{sun.elevationDeg}°</span>
        </label>
        <input
          id={`${id}-el`}
          type="range"
          min={-90}
          max={90}
          step={1}
          value={sun.elevationDeg}
          aria-valuetext={`${sun.elevationDeg}° above the x-y plane`}
          onChange={(e) => onSunChange({ ...sun, elevationDeg: Number(e.target.value) })}
          className="accent-sodium-strong"
        />
      </div>
    </fieldset>
  );
}

/** The preview's result as numbers: total force, torque, acceleration, and per surface. */
export function SrpNumbers({ preview }: { preview: SrpPreview | null }) {
  const f = preview?.forceN ?? [Number.NaN, Number.NaN, Number.NaN];
  const t = preview?.torqueNm ?? [Number.NaN, Number.NaN, Number.NaN];
  const acceleration = preview ? magnitude(f) / preview.massKg : Number.NaN;
  return (
    <section aria-label="SRP at 1 au" className="rounded-lg border border-rule bg-paper-raised px-3 py-2">
      <h3 className="text-sm font-semibold">
        SRP at 1 au{' '}
        <span className="font-sans text-xs font-normal text-ink-soft">
          full Sun, S₀ = {PREVIEW_SOLAR_CONSTANT} W/m², P = {formatNumber(preview?.pressurePa ?? PRESSURE_AT_1AU_PA, 4)} Pa
        </span>
      </h3>
      <dl className="mt-1.5 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
        <dt className="text-ink-soft">Total force</dt>
        <dd className="font-mono tabular-nums">
          {formatNumber(magnitude(f), 4)} N <span className="text-xs text-ink-soft">{formatVector(f, 4)}</span>
        </dd>
        <dt className="text-ink-soft">Torque about CoM</dt>
        <dd className="font-mono tabular-nums">
          {formatNumber(magnitude(t), 4)} N·m <span className="text-xs text-ink-soft">{formatVector(t, 4)}</span>
        </dd>
        <dt className="text-ink-soft">Acceleration</dt>
        <dd className="font-mono tabular-nums">{formatNumber(acceleration, 4)} m/s²</dd>
      </dl>
      {preview && magnitude(f) === 0 && (
        <p className="mt-1.5 text-xs text-ink-soft">
          Nothing is lit from this Sun direction{preview.kind === 'sail' ? ' (the Sun is behind the sail or edge-on)' : ''}.
        </p>
      )}
      {preview && preview.kind !== 'cannonball' && preview.surfaces.length > 0 && (
        <details className="mt-2 text-sm">
          <summary className="cursor-pointer text-xs font-medium text-ink-soft hover:text-ink">Per-surface force and torque</summary>
          <div className="mt-1 max-h-48 overflow-y-auto">
            <table className="w-full text-xs">
              <thead className="text-left text-ink-soft">
                <tr>
                  <th scope="col" className="py-1 pr-2 font-medium">Surface</th>
                  <th scope="col" className="py-1 pr-2 text-right font-medium">|F| (N)</th>
                  <th scope="col" className="py-1 text-right font-medium">|τ| (N·m)</th>
                </tr>
              </thead>
              <tbody className="font-mono tabular-nums">
                {preview.surfaces.map((s, i) => (
                  <tr key={`${s.name}-${i}`} className="border-t border-rule">
                    <th scope="row" className="py-1 pr-2 text-left font-sans font-normal">{s.name}</th>
                    <td className="py-1 pr-2 text-right">{formatNumber(magnitude(s.forceN), 4)}</td>
                    <td className="py-1 text-right">{formatNumber(magnitude(s.torqueNm), 4)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        </details>
      )}
    </section>
  );
}

/** Shows a note instead of the canvas when WebGL cannot start (the numbers stay). */
class SceneBoundary extends Component<{ children: ReactNode }, { failed: boolean }> {
  override state = { failed: false };
  static getDerivedStateFromError(): { failed: boolean } {
    return { failed: true };
  }
  override render() {
    if (this.state.failed) {
      return (
        <p role="note" className="p-4 text-sm text-ink-soft">
          The 3D view could not start (WebGL is not available in this browser). The numbers below are computed the same way.
        </p>
      );
    }
    return this.props.children;
  }
}
