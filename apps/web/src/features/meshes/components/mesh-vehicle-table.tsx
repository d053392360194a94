import { useEffect, useState } from 'react';
import type { CoefficientTableRequest, CoefficientTableSummary } from '@photon-ledger/shared';
import type { MeshOpticsInput } from '@photon-ledger/srp-core';
import { cautionText } from '../../../components/ui/caution-footer';
import { ErrorState } from '../../../components/ui/error-state';
import { LoadingState } from '../../../components/ui/loading-state';
import { cx } from '../../../lib/cx';
import { isTableActive, useCoefficientTable } from '../api/get-coefficient-table';
import { useCoefficientTableData } from '../api/get-coefficient-table-data';
import { useRequestCoefficientTable } from '../api/request-coefficient-table';
import { useCancelCoefficientTable } from '../api/cancel-coefficient-table';
import { Button } from '../../../components/ui/button';
import { formatNumber, shortSha } from '../../../lib/format-number';
import { PRESSURE_AT_1AU_PA } from '../lib/pressure';
import { anglesFromPolar, DEFAULT_MESH_SUN, type MeshSunAngles } from '../lib/sun-angles';
import { ForceMap } from './force-map';
import MeshView from './mesh-view';

/** Props of MeshVehicleTable. */
export interface MeshVehicleTableProps {
  missionId: string;
  meshId: string;
  /** The vehicle's table as the vehicle answer carries it, when it does. */
  table?: CoefficientTableSummary | null | undefined;
  /** Asks the API for the (cached) table of these optics and settings when the vehicle answer does not carry it (editors only). */
  request?: CoefficientTableRequest | undefined;
  /** Editors: the request that computes the table again after a failure or a cancel, and lets them cancel one being computed. */
  editable?: CoefficientTableRequest | undefined;
  /** The vehicle's optics, for the lit view. */
  optics?: MeshOpticsInput | undefined;
  samplesPerFacet?: number | undefined;
}

const statusLabels: Record<CoefficientTableSummary['status'], string> = {
  queued: 'Queued',
  running: 'Computing',
  succeeded: 'Ready',
  failed: 'Failed',
  cancelled: 'Cancelled',
};

/**
 * A mesh vehicle's coefficient table: its status with progress (polled every second while queued
 * or running), its cost once done, then the map of |F| over Sun directions beside the 3D view of
 * the lit mesh (a click on the map lights the view from that direction).
 */
export default function MeshVehicleTable({ missionId, meshId, table, request, editable, optics, samplesPerFacet }: MeshVehicleTableProps) {
  const requester = useRequestCoefficientTable(missionId, meshId);
  const requestKey = request ? JSON.stringify(request) : null;
  useEffect(() => {
    if (table || !requestKey) return;
    requester.mutate(JSON.parse(requestKey) as CoefficientTableRequest);
    // Once per request body; requester's identity changes with its state.
  }, [table, requestKey]);
  // A table asked for here (again) replaces the one the vehicle answer carried.
  const known = requester.data ?? table ?? null;
  const [sun, setSun] = useState<MeshSunAngles>(DEFAULT_MESH_SUN);

  return (
    <section aria-labelledby="coefficient-table-heading" className="flex flex-col gap-4">
      <h2 id="coefficient-table-heading" className="text-lg font-semibold">
        Coefficient table
      </h2>
      {known ? (
        <TableBody
          key={known.id}
          missionId={missionId}
          initial={known}
          onComputeAgain={editable ? () => requester.mutate(editable) : undefined}
          computing={requester.isPending}
          canCancel={editable !== undefined}
        />
      ) : null}
      {known && requester.isError && (
        <p role="alert" className="text-sm text-alarm">
          Could not ask for the table again: {requester.error.message}
        </p>
      )}
      {known ? null : requester.isError ? (
        <ErrorState title="Could not get the coefficient table" error={requester.error} onRetry={() => requestKey && requester.mutate(JSON.parse(requestKey) as CoefficientTableRequest)} retrying={requester.isPending} />
      ) : request ? (
        <LoadingState label="Finding the coefficient table…" className="min-h-24" />
      ) : (
        <p className="rounded-lg border border-dashed border-rule-strong px-4 py-6 text-sm text-ink-soft">
          The API did not say which coefficient table belongs to this vehicle.
        </p>
      )}
      <div className="grid items-start gap-6 lg:grid-cols-2">
        <MapSlot missionId={missionId} table={known} sun={sun} onSun={setSun} />
        <div className="flex flex-col gap-2">
          <h3 className="text-sm font-semibold">Lit and shadowed facets</h3>
          <MeshView missionId={missionId} meshId={meshId} optics={optics} samplesPerFacet={samplesPerFacet} sun={sun} onSunChange={setSun} heightClass="h-[20rem]" />
        </div>
      </div>
      <p className="border-t border-rule pt-2 text-xs text-ink-soft">{cautionText}</p>
    </section>
  );
}

function TableBody({
  missionId,
  initial,
  onComputeAgain,
  computing,
  canCancel,
}: {
  missionId: string;
  initial: CoefficientTableSummary;
  onComputeAgain: (() => void) | undefined;
  computing: boolean;
  canCancel: boolean;
}) {
  const query = useCoefficientTable(missionId, initial.id, { initialData: initial });
  const cancel = useCancelCoefficientTable(missionId, initial.id);
  const t = query.data ?? initial;
  const active = isTableActive(t);
  const percent = Math.round(t.progress * 1000) / 10;
  return (
    <div className="flex flex-col gap-2 rounded-lg border border-rule bg-paper-raised px-3 py-2">
      <div className="flex flex-wrap items-center gap-x-4 gap-y-1 text-sm">
        <span
          className={cx(
            'inline-flex items-center rounded px-1.5 py-0.5 text-xs font-medium',
            t.status === 'succeeded' ? 'bg-sage-wash text-sage-deep' : t.status === 'failed' ? 'bg-alarm-wash text-alarm' : 'bg-sodium-wash text-sodium-deep',
          )}
        >
          {statusLabels[t.status]}
        </span>
        <span className="text-ink-soft">
          grid <span className="font-mono text-ink">{t.settings.stepDeg}°</span>, <span className="font-mono text-ink">{t.settings.samplesPerFacet}</span> samples per facet,
          specular bounce <span className="text-ink">{t.settings.specularBounce ? 'on' : 'off'}</span>
        </span>
        <span className="font-mono text-xs text-ink-soft" title={`cache key ${t.cacheKey}`}>
          key {shortSha(t.cacheKey)}
        </span>
      </div>
      <div className="flex items-center gap-3">
        <div
          role="progressbar"
          aria-label="Coefficient table progress"
          aria-valuemin={0}
          aria-valuemax={100}
          aria-valuenow={percent}
          aria-valuetext={`${percent} %, ${t.chunksDone} of ${t.chunkCount} chunks`}
          className="h-2 flex-1 overflow-hidden rounded-full bg-paper-sunk"
        >
          <div className={cx('h-full rounded-full transition-[width]', t.status === 'failed' ? 'bg-alarm' : 'bg-sodium')} style={{ width: `${percent}%` }} />
        </div>
        <span className="w-40 text-right font-mono text-xs tabular-nums text-ink-soft">
          {percent.toFixed(1)} % · {t.chunksDone}/{t.chunkCount} chunks
        </span>
      </div>
      {active && <p className="text-xs text-ink-soft" aria-live="polite">Computed by the workers in chunks of polar rows; this page follows it every second.</p>}
      {t.error && (
        <p role="alert" className="text-sm text-alarm">
          {t.error}
        </p>
      )}
      {(active && canCancel) || ((t.status === 'failed' || t.status === 'cancelled') && onComputeAgain) ? (
        <div className="flex items-center gap-3">
          {active && canCancel && (
            <Button size="sm" onClick={() => cancel.mutate()} disabled={cancel.isPending}>
              {cancel.isPending ? 'Cancelling…' : 'Cancel the table'}
            </Button>
          )}
          {(t.status === 'failed' || t.status === 'cancelled') && onComputeAgain && (
            <Button size="sm" variant="primary" onClick={onComputeAgain} disabled={computing}>
              {computing ? 'Asking…' : 'Compute the table again'}
            </Button>
          )}
          {cancel.isError && <p role="alert" className="text-sm text-alarm">Could not cancel: {cancel.error.message}</p>}
        </div>
      ) : null}
      {t.stats && (
        <p className="text-xs text-ink-soft">
          <span className="font-mono text-ink">{t.stats.rays.toLocaleString('en-GB')}</span> shadow rays,{' '}
          <span className="font-mono text-ink">{formatNumber(t.stats.raysPerSecond, 3)}</span> rays/s, compute{' '}
          <span className="font-mono text-ink">{formatNumber(t.stats.computeMs / 1000, 3)} s</span> summed over chunks
          {t.finishedAt ? `; finished ${t.finishedAt.slice(0, 16).replace('T', ' ')} UTC` : ''}.
        </p>
      )}
    </div>
  );
}

function MapSlot({ missionId, table, sun, onSun }: { missionId: string; table: CoefficientTableSummary | null; sun: MeshSunAngles; onSun: (s: MeshSunAngles) => void }) {
  // Follow the table's status here too (the same query as TableBody: one request per second).
  const query = useCoefficientTable(missionId, table?.id ?? '', { initialData: table ?? undefined, enabled: table !== null });
  const status = table ? (query.data ?? table).status : null;
  const data = useCoefficientTableData(missionId, table?.id ?? '', status === 'succeeded');
  return (
    <div className="flex min-h-[22rem] flex-col gap-2">
      <h3 className="text-sm font-semibold">Force over Sun directions</h3>
      {status !== 'succeeded' ? (
        <div className="flex flex-1 items-center justify-center rounded-lg border border-dashed border-rule-strong px-4 py-6 text-sm text-ink-soft">
          {status === 'failed' || status === 'cancelled' ? 'No map: the table was not computed.' : 'The map appears when the table is ready.'}
        </div>
      ) : data.isPending ? (
        <LoadingState label="Loading the table values…" className="flex-1" />
      ) : data.isError ? (
        <ErrorState title="Could not load the table values" error={data.error} onRetry={() => void data.refetch()} retrying={data.isFetching} />
      ) : (
        <ForceMap data={data.data} pressurePa={PRESSURE_AT_1AU_PA} sun={sun} onPick={(node) => onSun(anglesFromPolar(node.polarDeg, node.azimuthDeg))} />
      )}
    </div>
  );
}
