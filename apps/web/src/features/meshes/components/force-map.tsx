import { useEffect, useId, useMemo, useRef, useState, type KeyboardEvent, type MouseEvent } from 'react';
import type { CoefficientTableData } from '@photon-ledger/shared';
import { forceMagnitudes, nearestNode, nodeAt, paintForceMap, scaleGradient, type TableNode } from '../lib/force-map';
import { formatNumber, formatVector } from '../../../lib/format-number';
import type { MeshSunAngles } from '../lib/sun-angles';

/** Accessible name of the map canvas. */
export const FORCE_MAP_LABEL = 'Map of SRP force magnitude over Sun directions';

/** Pixels of the painted image: 1° per pixel. */
const IMAGE_WIDTH = 360;
const IMAGE_HEIGHT = 180;

/** Props of ForceMap. */
export interface ForceMapProps {
  data: CoefficientTableData;
  /** Radiation pressure at 1 au (Pa), to show forces in newtons too. */
  pressurePa: number;
  /** The Sun direction shown in the 3D view, marked on the map. */
  sun?: MeshSunAngles | undefined;
  /** Picks a node's direction for the 3D view (click or Enter). */
  onPick?: ((node: TableNode) => void) | undefined;
}

/**
 * The coefficient table as an equirectangular heat map of |F| per unit pressure: azimuth 0–360°
 * across (from +x towards +y), polar angle 0–180° down from body +z. Hover (or the arrow keys on
 * the focused map) reads out |F|, F and τ at the nearest node; click or Enter sends that direction
 * to the 3D view.
 */
export function ForceMap({ data, pressurePa, sun, onPick }: ForceMapProps) {
  const id = useId();
  const canvasRef = useRef<HTMLCanvasElement>(null);
  const magnitudes = useMemo(() => forceMagnitudes(data), [data]);
  const [cursor, setCursor] = useState<{ i: number; j: number } | null>(null);

  useEffect(() => {
    const canvas = canvasRef.current;
    const ctx = canvas?.getContext('2d');
    if (!canvas || !ctx) return;
    const pixels = paintForceMap(magnitudes.values, data, magnitudes, IMAGE_WIDTH, IMAGE_HEIGHT);
    const image = ctx.createImageData(IMAGE_WIDTH, IMAGE_HEIGHT);
    image.data.set(pixels);
    ctx.putImageData(image, 0, 0);
  }, [data, magnitudes]);

  const node: TableNode | null = cursor ? nodeAt(data, cursor.i, cursor.j) : null;

  function fromPointer(event: MouseEvent<HTMLCanvasElement>) {
    const rect = event.currentTarget.getBoundingClientRect();
    const azimuth = ((event.clientX - rect.left) / rect.width) * 360;
    const polar = ((event.clientY - rect.top) / rect.height) * 180;
    const n = nearestNode(data, polar, azimuth);
    return { i: n.polarIndex, j: n.azimuthIndex };
  }

  function onKeyDown(event: KeyboardEvent<HTMLCanvasElement>) {
    const current = cursor ?? { i: Math.floor(data.polarCount / 2), j: 0 };
    const moves: Record<string, [number, number]> = { ArrowUp: [-1, 0], ArrowDown: [1, 0], ArrowLeft: [0, -1], ArrowRight: [0, 1] };
    const move = moves[event.key];
    if (move) {
      event.preventDefault();
      setCursor({
        i: Math.min(data.polarCount - 1, Math.max(0, current.i + move[0])),
        j: (current.j + move[1] + data.azimuthCount) % data.azimuthCount,
      });
    } else if (event.key === 'Enter' && cursor && onPick) {
      event.preventDefault();
      onPick(nodeAt(data, cursor.i, cursor.j));
    }
  }

  const sunMarker = sun ? { left: `${(((sun.azimuthDeg % 360) + 360) % 360) / 3.6}%`, top: `${(90 - sun.elevationDeg) / 1.8}%` } : null;
  const cursorMarker = node ? { left: `${node.azimuthDeg / 3.6}%`, top: `${node.polarDeg / 1.8}%` } : null;

  return (
    <figure className="flex flex-col gap-2" aria-labelledby={`${id}-caption`}>
      <figcaption id={`${id}-caption`} className="text-sm font-medium">
        |F| per unit pressure over Sun directions{' '}
        <span className="font-normal text-ink-soft">
          ({data.polarCount} × {data.azimuthCount} nodes at {data.stepDeg}°, body frame)
        </span>
      </figcaption>
      <div className="grid grid-cols-[2.25rem_minmax(0,1fr)] gap-x-1">
        {/* polar axis */}
        <div className="relative" aria-hidden="true">
          {[0, 45, 90, 135, 180].map((t) => (
            <span key={t} className="absolute right-1 -translate-y-1/2 font-mono text-[10px] text-ink-soft" style={{ top: `${t / 1.8}%` }}>
              {t}°
            </span>
          ))}
        </div>
        <div className="relative">
          <canvas
            ref={canvasRef}
            width={IMAGE_WIDTH}
            height={IMAGE_HEIGHT}
            role="img"
            aria-label={FORCE_MAP_LABEL}
            aria-describedby={`${id}-readout`}
            tabIndex={0}
            onPointerMove={(e) => setCursor(fromPointer(e))}
            onPointerLeave={() => setCursor(null)}
            onClick={(e) => {
              const c = fromPointer(e);
              setCursor(c);
              onPick?.(nodeAt(data, c.i, c.j));
            }}
            onKeyDown={onKeyDown}
            className="block aspect-[2/1] w-full cursor-crosshair rounded-sm border border-rule"
          />
          {sunMarker && (
            <span
              aria-hidden="true"
              title="Sun direction of the 3D view"
              className="pointer-events-none absolute size-3 -translate-x-1/2 -translate-y-1/2 rounded-full border-2 border-ink bg-[#e0a40c]"
              style={sunMarker}
            />
          )}
          {cursorMarker && (
            <span
              aria-hidden="true"
              className="pointer-events-none absolute size-2.5 -translate-x-1/2 -translate-y-1/2 rounded-full border-2 border-white outline outline-1 outline-ink"
              style={cursorMarker}
            />
          )}
        </div>
        <div />
        {/* azimuth axis */}
        <div className="relative h-4" aria-hidden="true">
          {[0, 90, 180, 270, 360].map((a) => (
            <span key={a} className="absolute -translate-x-1/2 font-mono text-[10px] text-ink-soft" style={{ left: `${a / 3.6}%` }}>
              {a}°
            </span>
          ))}
        </div>
        <div />
        <p className="text-xs text-ink-soft">
          Across: Sun azimuth φ (°) from +x towards +y. Down: polar angle θ (°) of the Sun from body +z (0° the Sun straight above +z).
        </p>
      </div>

      <div className="grid grid-cols-[2.25rem_minmax(0,1fr)] gap-x-1">
        <div />
        <div className="flex flex-col gap-1">
          <div aria-hidden="true" className="h-3 rounded-sm border border-rule" style={{ background: scaleGradient() }} />
          <div className="flex justify-between font-mono text-[11px] text-ink-soft">
            <span>
              {formatNumber(magnitudes.min, 3)} m² <span className="text-ink-soft/80">({formatNumber(magnitudes.min * pressurePa, 3)} N)</span>
            </span>
            <span>
              {formatNumber(magnitudes.max, 3)} m² <span className="text-ink-soft/80">({formatNumber(magnitudes.max * pressurePa, 3)} N)</span>
            </span>
          </div>
          <p className="text-xs text-ink-soft">
            Colour: |F| per unit pressure in m² (≡ N/Pa); in brackets the force in N at 1 au, P = {formatNumber(pressurePa, 4)} Pa.
          </p>
        </div>
      </div>

      <dl
        id={`${id}-readout`}
        aria-live="polite"
        className="grid min-h-[7.5rem] grid-cols-[auto_1fr] gap-x-4 gap-y-0.5 rounded-lg border border-rule bg-paper-raised px-3 py-2 text-sm"
      >
        {node ? (
          <>
            <dt className="text-ink-soft">Node</dt>
            <dd className="font-mono tabular-nums">
              θ {node.polarDeg}°, φ {node.azimuthDeg}°
            </dd>
            <dt className="text-ink-soft">|F|</dt>
            <dd className="font-mono tabular-nums">
              {formatNumber(node.magnitude, 4)} m² · {formatNumber(node.magnitude * pressurePa, 4)} N at 1 au
            </dd>
            <dt className="text-ink-soft">F</dt>
            <dd className="font-mono text-xs tabular-nums">{formatVector(node.force, 4)} m² (N/Pa)</dd>
            <dt className="text-ink-soft">τ about origin</dt>
            <dd className="font-mono text-xs tabular-nums">
              {formatVector(node.torque, 4)} m³ (N·m/Pa) · {formatNumber(Math.hypot(...node.torque) * pressurePa, 4)} N·m at 1 au
            </dd>
          </>
        ) : (
          <p className="col-span-2 text-ink-soft">
            Point at the map (or focus it and use the arrow keys) to read |F|, F and τ at a node; click or press Enter to light the 3D view from there.
          </p>
        )}
      </dl>
    </figure>
  );
}
