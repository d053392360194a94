import { Component, lazy, Suspense, useEffect, useId, useMemo, useState, type ReactNode } from 'react';
import { meshSamplesPerFacet } from '@photon-ledger/shared';
import type { MeshOpticsInput } from '@photon-ledger/srp-core';
import { useMesh } from '../api/get-mesh';
import { useMeshGeometry } from '../api/get-mesh-geometry';
import { createLitClient, SupersededError, type LitClient } from '../lib/lit-client';
import type { LitResult } from '../lib/lit-fractions';
import { facetAreas, facetColours, facetPalette, litSummary, sceneArrowColours } from '../lib/facet-colours';
import { facetNormals } from '../lib/mesh-geometry';
import { formatNumber, formatVector } from '../../../lib/format-number';
import { PRESSURE_AT_1AU_PA } from '../lib/pressure';
import { DEFAULT_MESH_SUN, sunVector, type MeshSunAngles } from '../lib/sun-angles';

const MeshScene = lazy(() => import('./mesh-scene'));

/** Accessible name of the mesh canvas. */
export const MESH_VIEW_LABEL = '3D view of the mesh, lit for the chosen Sun direction';

/** Meshes above this many triangles are drawn without feature edges. */
const EDGE_LIMIT = 20_000;

/** Props of MeshView. */
export interface MeshViewProps {
  missionId: string;
  meshId: string;
  /** Optics for the lit fractions (a vehicle's); default every facet one-sided MLI. */
  optics?: MeshOpticsInput | undefined;
  /** Shadow samples per facet (n²); 4 unless given. */
  samplesPerFacet?: number | undefined;
  /** The Sun direction, when the page holds it (e.g. shared with a map); the view keeps its own otherwise. */
  sun?: MeshSunAngles | undefined;
  onSunChange?: ((sun: MeshSunAngles) => void) | undefined;
  /** Height of the canvas box (classes); default h-[24rem]. */
  heightClass?: string;
}

type LitState = { sunDir: [number, number, number]; result: LitResult } | null;

/**
 * The mesh in 3D with its facets coloured by lit fraction for a Sun direction, the Sun's azimuth
 * and elevation (sliders and number fields), a legend and a read-out: lit and shadowed area,
 * force per unit pressure and at 1 au, and how long srp-core's ray casting took in the browser.
 */
export default function MeshView({ missionId, meshId, optics, samplesPerFacet: samplesProp = 4, sun: sunProp, onSunChange, heightClass }: MeshViewProps) {
  // The view's own sampling starts from the caller's (a vehicle's table setting) and follows it when that changes.
  const [samplesState, setSamplesState] = useState({ from: samplesProp, value: samplesProp });
  const samplesPerFacet = samplesState.from === samplesProp ? samplesState.value : samplesProp;
  const samplesId = useId();
  const summary = useMesh(missionId, meshId);
  const geometry = useMeshGeometry(missionId, meshId);
  const [ownSun, setOwnSun] = useState<MeshSunAngles>(DEFAULT_MESH_SUN);
  const sun = sunProp ?? ownSun;
  const setSun = (next: MeshSunAngles) => {
    setOwnSun(next);
    onSunChange?.(next);
  };
  const sunDir = useMemo(() => sunVector(sun), [sun]);
  const [lit, setLit] = useState<LitState>(null);
  const [litError, setLitError] = useState<string | null>(null);
  const [client, setClient] = useState<LitClient | null>(null);
  const [firstMs, setFirstMs] = useState<number | null>(null);

  const groupNames = summary.data?.groups.map((g) => g.name);
  const groupKey = groupNames?.join('\u0000');
  // Optics typed in the editor settle for a moment before the scene is rebuilt.
  const opticsKey = useSettled(JSON.stringify(optics ?? null), 300);
  const geo = geometry.data;

  const normals = useMemo(() => (geo ? facetNormals(geo.positions, geo.triangleCount) : null), [geo]);
  const areas = useMemo(() => (geo ? facetAreas(geo.positions, geo.triangleCount) : null), [geo]);
  // Facets whose group gives back optics take light on both sides.
  const twoSided = useMemo(() => {
    if (!geo || !groupNames) return null;
    const parsed = JSON.parse(opticsKey) as MeshOpticsInput | null;
    if (!parsed) return null;
    const byGroup = groupNames.map((name) => ((parsed.groups?.[name] ?? parsed.default).back !== undefined ? 1 : 0));
    const out = new Uint8Array(geo.triangleCount);
    for (let t = 0; t < geo.triangleCount; t += 1) out[t] = byGroup[geo.groupOfTriangle[t]!] ?? 0;
    return out;
    // groupKey stands for groupNames.
  }, [geo, groupKey, opticsKey]);

  // One worker per mesh and optics.
  useEffect(() => {
    if (!geo || !groupNames) return;
    const parsed = JSON.parse(opticsKey) as MeshOpticsInput | null;
    const next = createLitClient({ positions: geo.positions, groupOfTriangle: geo.groupOfTriangle, groupNames, optics: parsed ?? undefined });
    setClient(next);
    setLit(null);
    setFirstMs(null);
    return () => next.dispose();
  }, [geo, groupKey, opticsKey]);

  useEffect(() => {
    if (!client) return;
    let live = true;
    const requested: [number, number, number] = [sunDir[0], sunDir[1], sunDir[2]];
    const started = performance.now();
    client.illuminate(requested, samplesPerFacet).then(
      (result) => {
        if (!live) return;
        setLit({ sunDir: requested, result });
        setLitError(null);
        setFirstMs((ms) => ms ?? performance.now() - started);
      },
      (error: unknown) => {
        if (!live || error instanceof SupersededError) return;
        setLitError(error instanceof Error ? error.message : String(error));
      },
    );
    return () => {
      live = false;
    };
  }, [client, sunDir, samplesPerFacet]);

  const colours = useMemo(() => {
    if (!normals) return null;
    return facetColours(normals, lit?.result.litFraction ?? null, lit?.sunDir ?? sunDir, twoSided);
  }, [normals, lit, sunDir, twoSided]);
  const stats = useMemo(
    () => (lit && normals && areas ? litSummary(normals, areas, lit.result.litFraction, lit.sunDir, twoSided) : null),
    [lit, normals, areas, twoSided],
  );

  const failed = geometry.isError ? geometry.error : summary.isError ? summary.error : null;
  const force = lit?.result.forcePerPressure;
  const forceMag = force ? Math.hypot(force[0], force[1], force[2]) : Number.NaN;

  return (
    <div className="flex flex-col gap-3">
      <div
        className={`relative overflow-hidden rounded-lg border border-rule bg-[radial-gradient(circle_at_30%_20%,#fbf9f4,#e4e0d3)] ${heightClass ?? 'h-[24rem]'}`}
      >
        {failed ? (
          <p role="alert" className="p-4 text-sm text-alarm">
            Could not load the mesh: {failed instanceof Error ? failed.message : 'the request failed'}
          </p>
        ) : geo && colours ? (
          <SceneBoundary>
            <Suspense fallback={<p className="p-4 text-sm text-ink-soft">Loading the 3D view…</p>}>
              <MeshScene positions={geo.positions} colours={colours} sunDir={sunDir} label={MESH_VIEW_LABEL} edges={geo.triangleCount <= EDGE_LIMIT} />
            </Suspense>
          </SceneBoundary>
        ) : (
          <p role="status" className="p-4 text-sm text-ink-soft">
            Loading the mesh geometry…
          </p>
        )}
        {geo && !lit && !litError && (
          <p className="pointer-events-none absolute inset-x-0 bottom-3 mx-auto w-fit rounded-md bg-paper-raised/90 px-3 py-1.5 text-xs text-ink-soft shadow-sm">
            Casting shadow rays…
          </p>
        )}
        {litError && (
          <p role="alert" className="absolute inset-x-0 bottom-3 mx-auto w-fit max-w-[90%] rounded-md bg-alarm-wash px-3 py-1.5 text-xs text-alarm shadow-sm">
            Lit fractions failed: {litError}
          </p>
        )}
      </div>

      <MeshSunControls sun={sun} onSunChange={setSun} />
      <div className="flex flex-wrap items-center gap-2 text-xs text-ink-soft">
        <label htmlFor={samplesId}>Shadow samples per facet (view)</label>
        <select
          id={samplesId}
          data-view-control
          value={samplesPerFacet}
          onChange={(e) => setSamplesState({ from: samplesProp, value: Number(e.target.value) })}
          className="h-7 rounded-md border border-rule-strong bg-paper-raised px-1.5 font-mono text-xs text-ink"
        >
          {meshSamplesPerFacet.map((n) => (
            <option key={n} value={n}>
              {n}
            </option>
          ))}
        </select>
        <span>more samples resolve partial shade more finely</span>
      </div>

      <ul aria-label="Legend of the mesh view" className="flex flex-wrap gap-x-4 gap-y-1 text-xs text-ink-soft">
        <Swatch colour={facetPalette.lit} label="Lit (tone scales with lit fraction)" />
        <Swatch colour={facetPalette.shadow} label="Shadowed" />
        <Swatch colour={facetPalette.away} label="Turned away / takes no light" />
        <li className="flex items-center gap-1.5">
          <span aria-hidden="true" className="h-0.5 w-4" style={{ backgroundColor: sceneArrowColours.sun }} />
          Sunlight
        </li>
        <li className="flex items-center gap-1.5">
          <span aria-hidden="true" className="font-mono">
            <span style={{ color: sceneArrowColours.x }}>x</span> <span style={{ color: sceneArrowColours.y }}>y</span>{' '}
            <span style={{ color: sceneArrowColours.z }}>z</span>
          </span>
          Body axes
        </li>
      </ul>

      <dl aria-label="Lit fractions read-out" className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 rounded-lg border border-rule bg-paper-raised px-3 py-2 text-sm">
        <dt className="text-ink-soft">Lit area</dt>
        <dd className="font-mono tabular-nums">{stats ? `${formatNumber(stats.litAreaM2, 4)} m²` : '—'}</dd>
        <dt className="text-ink-soft">Shadowed (facing Sun)</dt>
        <dd className="font-mono tabular-nums">{stats ? `${formatNumber(stats.shadowedAreaM2, 4)} m²` : '—'}</dd>
        <dt className="text-ink-soft">Facets lit / partial / dark / away</dt>
        <dd className="font-mono tabular-nums">
          {stats ? `${stats.counts.lit} / ${stats.counts.partial} / ${stats.counts.shadowed} / ${stats.counts.away}` : '—'}
        </dd>
        <dt className="text-ink-soft">|F| per unit pressure</dt>
        <dd className="font-mono tabular-nums">{force ? `${formatNumber(forceMag, 4)} m²` : '—'}</dd>
        <dt className="text-ink-soft">|F| at 1 au</dt>
        <dd className="font-mono tabular-nums">{force ? `${formatNumber(forceMag * PRESSURE_AT_1AU_PA, 4)} N` : '—'}</dd>
        <dt className="text-ink-soft">F per unit pressure</dt>
        <dd className="font-mono text-xs tabular-nums">{force ? `${formatVector(force, 4)} m², body frame` : '—'}</dd>
      </dl>
      <p className="text-xs text-ink-soft" aria-live="polite">
        {lit
          ? `Ray cast in the browser by srp-core (${client?.mode ?? 'worker'}): ${formatNumber(lit.result.illuminateMs, 3)} ms for ${lit.result.rays.toLocaleString('en-GB')} rays at ${samplesPerFacet} samples per facet${
              lit.result.sceneMs > 0 ? `, after ${formatNumber(lit.result.sceneMs, 3)} ms building the scene` : ''
            }${firstMs !== null ? `; first answer ${formatNumber(firstMs, 3)} ms` : ''}.`
          : `Lit fractions by srp-core's ray caster, in the browser. Optics: ${optics ? "the vehicle's" : 'MLI on every front face (view only)'}.`}{' '}
        Drag to turn the view.
      </p>
    </div>
  );
}

/** `value`, once it has stayed the same for `ms` (the first value at once). */
function useSettled<T>(value: T, ms: number): T {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    if (Object.is(value, settled)) return;
    const timer = setTimeout(() => setSettled(value), ms);
    return () => clearTimeout(timer);
  }, [value, settled, ms]);
  return settled;
}

function Swatch({ colour, label }: { colour: string; label: string }) {
  return (
    <li className="flex items-center gap-1.5">
      <span aria-hidden="true" className="size-3 rounded-sm border border-ink/30" style={{ backgroundColor: colour }} />
      {label}
    </li>
  );
}

/** Azimuth and elevation of the Sun in the body frame, each as a slider and a number field (°). */
export function MeshSunControls({ sun, onSunChange }: { sun: MeshSunAngles; onSunChange: (sun: MeshSunAngles) => void }) {
  return (
    <fieldset className="grid grid-cols-1 gap-x-4 gap-y-2 rounded-lg border border-rule bg-paper-raised px-3 py-2 sm:grid-cols-2">
      <legend className="px-1 text-sm font-medium">Sun direction, body frame</legend>
      <AngleControl
        label="Sun azimuth"
        hint="from +x towards +y"
        min={0}
        max={360}
        value={sun.azimuthDeg}
        onChange={(azimuthDeg) => onSunChange({ ...sun, azimuthDeg })}
      />
      <AngleControl
        label="Sun elevation"
        hint="above the x-y plane towards +z"
        min={-90}
        max={90}
        value={sun.elevationDeg}
        onChange={(elevationDeg) => onSunChange({ ...sun, elevationDeg })}
      />
    </fieldset>
  );
}

function AngleControl({ label, hint, min, max, value, onChange }: { label: string; hint: string; min: number; max: number; value: number; onChange: (v: number) => void }) {
  const id = useId();
  const [text, setText] = useState(String(value));
  const [editing, setEditing] = useState(false);
  const shown = editing ? text : String(value);
  const parsed = Number(text);
  const bad = editing && (text.trim() === '' || !Number.isFinite(parsed) || parsed < min || parsed > max);
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={`${id}-number`} className="text-xs text-ink-soft">
        {label} (°) <span className="sr-only">{hint}</span>
      </label>
      <div className="flex items-center gap-2">
        <input
          type="range"
          aria-label={`${label} slider (°)`}
          min={min}
          max={max}
          step={1}
          value={value}
          aria-valuetext={`${value}° ${hint}`}
          onChange={(e) => onChange(Number(e.target.value))}
          className="min-w-0 flex-1 accent-sodium-strong"
        />
        <input
          id={`${id}-number`}
          type="text"
          inputMode="decimal"
          value={shown}
          aria-invalid={bad ? true : undefined}
          aria-describedby={bad ? `${id}-message` : undefined}
          onFocus={() => {
            setText(String(value));
            setEditing(true);
          }}
          onChange={(e) => {
            setText(e.target.value);
            const v = Number(e.target.value);
            if (e.target.value.trim() !== '' && Number.isFinite(v) && v >= min && v <= max) onChange(v);
          }}
          onBlur={() => setEditing(false)}
          className={`h-8 w-16 rounded-md border bg-paper-raised px-2 text-right font-mono text-sm ${bad ? 'border-alarm' : 'border-rule-strong'}`}
        />
        <span aria-hidden="true" className="font-mono text-xs text-ink-soft">
          °
        </span>
      </div>
      {bad && (
        <p id={`${id}-message`} className="text-xs text-alarm">
          {label} must be a number from {min} to {max}°.
        </p>
      )}
    </div>
  );
}

/** Shows a note instead of the canvas when WebGL cannot start (the read-out stays). */
class SceneBoundary extends Component<{ children: ReactNode }, { failed: boolean }> {
  override state = { failed: false };
  static getDerivedStateFromError(): { failed: boolean } {
    return { failed: true };
  }
  override render() {
    if (this.state.failed) {
      return (
        <p role="note" className="p-4 text-sm text-ink-soft">
          The 3D view could not start (WebGL is not available in this browser). The read-out below is computed the same way.
        </p>
      );
    }
    return this.props.children;
  }
}
