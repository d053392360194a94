import type { VehicleChange, VehicleRevisionSummary } from '@photon-ledger/shared';
import { Badge, type BadgeTone } from '../../../components/ui/badge';
import { ErrorState } from '../../../components/ui/error-state';
import { LoadingState } from '../../../components/ui/loading-state';
import { formatUtcDate } from '../../../lib/format';
import { useVehicleCompare } from '../api/compare-vehicle-revisions';
import { plateFieldLabel } from '../lib/field-errors';
import { formatNumber } from '../../../lib/format-number';

/** Props of RevisionHistory. */
export interface RevisionHistoryProps {
  /** Newest first. */
  revisions: readonly VehicleRevisionSummary[];
  /** The revisions picked for comparison (null: none). */
  from: number | null;
  to: number | null;
  onPick: (which: 'from' | 'to', revision: number) => void;
}

const kindLabels = { plates: 'Plates', cannonball: 'Cannonball', sail: 'Sail', mesh: 'Mesh' } as const;

/** The revisions of a vehicle, newest first, with a "from" and a "to" choice on each row for comparing. */
export function RevisionHistory({ revisions, from, to, onPick }: RevisionHistoryProps) {
  return (
    <div className="overflow-x-auto rounded-lg border border-rule bg-paper-raised">
      <table className="w-full text-sm">
        <caption className="sr-only">Revisions, newest first; pick one to compare from and one to compare to</caption>
        <thead className="border-b border-rule text-left text-xs text-ink-soft">
          <tr>
            <th scope="col" className="px-3 py-2 font-medium">Revision</th>
            <th scope="col" className="px-3 py-2 font-medium">Note</th>
            <th scope="col" className="px-3 py-2 font-medium">Author</th>
            <th scope="col" className="px-3 py-2 font-medium">Saved</th>
            <th scope="col" className="px-3 py-2 font-medium">Kind</th>
            <th scope="col" className="px-3 py-2 text-right font-medium">Surfaces</th>
            <th scope="col" className="px-3 py-2 text-right font-medium">Area (m²)</th>
            <th scope="col" className="px-3 py-2 text-right font-medium">Mass (kg)</th>
            <th scope="col" className="px-3 py-2 text-center font-medium">From</th>
            <th scope="col" className="px-3 py-2 text-center font-medium">To</th>
          </tr>
        </thead>
        <tbody>
          {revisions.map((r) => (
            <tr key={r.id} className="border-b border-rule align-top last:border-b-0">
              <th scope="row" className="px-3 py-2 text-left font-mono font-medium">
                r{r.revision}
              </th>
              <td className="max-w-[22rem] px-3 py-2">
                {r.note || <span className="text-ink-soft">No note.</span>}
                {r.sourceUploadId && (
                  <span className="ml-2">
                    <Badge tone="sage">from CSV</Badge>
                  </span>
                )}
              </td>
              <td className="px-3 py-2">{r.author?.displayName ?? <span className="text-ink-soft">deleted user</span>}</td>
              <td className="px-3 py-2 font-mono text-xs whitespace-nowrap">
                <time dateTime={r.createdAt}>{formatUtcDate(r.createdAt)}</time>{' '}
                <span className="text-ink-soft">{r.createdAt.slice(11, 16)} UTC</span>
              </td>
              <td className="px-3 py-2">{kindLabels[r.kind]}</td>
              <td className="px-3 py-2 text-right font-mono">{r.surfaceCount}</td>
              <td className="px-3 py-2 text-right font-mono">{formatNumber(r.totalAreaM2, 4)}</td>
              <td className="px-3 py-2 text-right font-mono">{formatNumber(r.massKg, 4)}</td>
              <td className="px-3 py-2 text-center">
                <input
                  type="radio"
                  name="compare-from"
                  aria-label={`Compare from revision ${r.revision}`}
                  checked={from === r.revision}
                  onChange={() => onPick('from', r.revision)}
                  className="size-4 accent-sodium-strong"
                />
              </td>
              <td className="px-3 py-2 text-center">
                <input
                  type="radio"
                  name="compare-to"
                  aria-label={`Compare to revision ${r.revision}`}
                  checked={to === r.revision}
                  onChange={() => onPick('to', r.revision)}
                  className="size-4 accent-sodium-strong"
                />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

/** Props of RevisionCompare. */
export interface RevisionCompareProps {
  missionId: string;
  vehicleId: string;
  from: number | null;
  to: number | null;
}

const changeTones: Record<VehicleChange['change'], BadgeTone> = { added: 'sage', removed: 'sodium', changed: 'ink' };

const topLabels: Record<string, string> = {
  kind: 'Kind',
  name: 'Name',
  description: 'Description',
  massKg: 'Mass (kg)',
  centreOfMassM: 'Centre of mass (m)',
  areaM2: 'Area (m²)',
  cr: 'Cr',
  normal: 'Normal',
  centroidM: 'Centroid (m)',
  optics: 'Optics',
};

/** The plate name of a `plates["north wing"]` path, or null for a top-level path. */
export function plateNameOf(path: string): string | null {
  const match = /^plates\[(.*)\]$/.exec(path);
  if (!match) return null;
  try {
    const name: unknown = JSON.parse(match[1]!);
    return typeof name === 'string' ? name : match[1]!;
  } catch {
    return match[1]!;
  }
}

/** A spec value for reading: numbers to 6 significant figures, vectors in brackets, optics as key = value. */
export function formatSpecValue(value: unknown): string {
  if (value === undefined) return '—';
  if (typeof value === 'number') return formatNumber(value, 6);
  if (typeof value === 'string') return value;
  if (Array.isArray(value)) return `[${value.map(formatSpecValue).join(', ')}]`;
  if (value && typeof value === 'object') {
    return Object.entries(value as Record<string, unknown>)
      .map(([k, v]) => (v && typeof v === 'object' && !Array.isArray(v) ? `${k} {${formatSpecValue(v)}}` : `${k} ${formatSpecValue(v)}`))
      .join(', ');
  }
  return String(value);
}

const field = (value: unknown, key: string): unknown =>
  value && typeof value === 'object' ? (value as Record<string, unknown>)[key] : undefined;

/** What changed from one revision to another, per plate and field. */
export function RevisionCompare({ missionId, vehicleId, from, to }: RevisionCompareProps) {
  const compare = useVehicleCompare(missionId, vehicleId, from, to);
  if (from === null || to === null) {
    return <p className="text-sm text-ink-soft">Pick a revision to compare from and one to compare to.</p>;
  }
  if (from === to) {
    return <p className="text-sm text-ink-soft">Pick two different revisions to see what changed.</p>;
  }
  if (compare.isPending) return <LoadingState label={`Comparing r${from} with r${to}…`} />;
  if (compare.isError) {
    return <ErrorState title="Could not compare the revisions" error={compare.error} onRetry={() => void compare.refetch()} retrying={compare.isFetching} />;
  }
  const { changes } = compare.data;
  if (changes.length === 0) {
    return <p className="text-sm text-ink-soft">No differences between r{from} and r{to}.</p>;
  }
  return (
    <div className="overflow-x-auto rounded-lg border border-rule bg-paper-raised">
      <table className="w-full text-sm">
        <caption className="sr-only">
          Changes from revision {from} to revision {to}
        </caption>
        <thead className="border-b border-rule text-left text-xs text-ink-soft">
          <tr>
            <th scope="col" className="px-3 py-2 font-medium">What</th>
            <th scope="col" className="px-3 py-2 font-medium">Change</th>
            <th scope="col" className="px-3 py-2 font-medium">Field</th>
            <th scope="col" className="px-3 py-2 font-medium">r{from}</th>
            <th scope="col" className="px-3 py-2 font-medium">r{to}</th>
          </tr>
        </thead>
        {changes.map((c) => {
          const plate = plateNameOf(c.path);
          const what = plate !== null ? `Plate “${plate}”` : (topLabels[c.path] ?? c.path);
          // A plate gets a row per field (the changed ones, or all of an added or removed plate);
          // a top-level field one row with its value.
          const plateKeys =
            c.change === 'changed'
              ? (c.fields ?? [])
              : Object.keys(((c.change === 'added' ? c.to : c.from) as Record<string, unknown> | undefined) ?? {}).filter((k) => k !== 'name');
          const rows =
            plate !== null
              ? plateKeys.map((f) => ({ label: plateFieldLabel(f), from: field(c.from, f), to: field(c.to, f) }))
              : [{ label: '', from: c.from, to: c.to }];
          return (
            <tbody key={c.path} className="border-b border-rule align-top last:border-b-0">
              {rows.map((row, i) => (
                <tr key={i}>
                  {i === 0 && (
                    <>
                      <th scope="rowgroup" rowSpan={rows.length} className="w-48 px-3 py-2 text-left font-medium">
                        {what}
                      </th>
                      <td rowSpan={rows.length} className="px-3 py-2">
                        <Badge tone={changeTones[c.change]}>{c.change}</Badge>
                      </td>
                    </>
                  )}
                  <td className="px-3 py-2 whitespace-nowrap text-ink-soft">{row.label}</td>
                  <td className="px-3 py-2 font-mono text-xs break-words">{formatSpecValue(row.from)}</td>
                  <td className="px-3 py-2 font-mono text-xs break-words">{formatSpecValue(row.to)}</td>
                </tr>
              ))}
            </tbody>
          );
        })}
      </table>
    </div>
  );
}
