import { Link } from 'react-router-dom';
import type { VehicleListItem } from '@photon-ledger/shared';
import { formatUtcDate } from '../../../lib/format';
import { formatNumber } from '../../../lib/format-number';

/** Props of VehicleList. */
export interface VehicleListProps {
  missionId: string;
  vehicles: readonly VehicleListItem[];
}

const kindLabels: Record<VehicleListItem['kind'], string> = {
  cannonball: 'Cannonball',
  plates: 'Plates',
  sail: 'Sail',
  mesh: 'Mesh',
};

/** The mission's vehicles as a compact table, each name a link to its editor; an empty state without any. */
export function VehicleList({ missionId, vehicles }: VehicleListProps) {
  if (vehicles.length === 0) {
    return (
      <p className="rounded-lg border border-dashed border-rule-strong px-4 py-6 text-sm text-ink-soft">
        No vehicles yet.
      </p>
    );
  }
  return (
    <div className="overflow-x-auto rounded-lg border border-rule bg-paper-raised">
      <table className="w-full text-sm">
        <thead className="border-b border-rule text-left text-xs text-ink-soft">
          <tr>
            <th scope="col" className="px-3 py-2 font-medium">Name</th>
            <th scope="col" className="px-3 py-2 font-medium">Kind</th>
            <th scope="col" className="px-3 py-2 text-right font-medium">Revision</th>
            <th scope="col" className="px-3 py-2 text-right font-medium">Surfaces</th>
            <th scope="col" className="px-3 py-2 text-right font-medium">Total area (m²)</th>
            <th scope="col" className="px-3 py-2 text-right font-medium">Mass (kg)</th>
            <th scope="col" className="px-3 py-2 font-medium">Updated</th>
          </tr>
        </thead>
        <tbody>
          {vehicles.map((v) => (
            <tr key={v.id} className="border-b border-rule last:border-b-0 hover:bg-paper-sunk/50">
              <th scope="row" className="px-3 py-2 text-left font-medium">
                <Link
                  to={`/missions/${missionId}/vehicles/${v.id}`}
                  className="rounded-sm underline-offset-2 hover:text-sodium-deep hover:underline"
                >
                  {v.name}
                </Link>
              </th>
              <td className="px-3 py-2">{kindLabels[v.kind]}</td>
              <td className="px-3 py-2 text-right font-mono">r{v.revision}</td>
              <td className="px-3 py-2 text-right font-mono">{v.surfaceCount}</td>
              <td className="px-3 py-2 text-right font-mono">{formatNumber(v.totalAreaM2, 4)}</td>
              <td className="px-3 py-2 text-right font-mono">{formatNumber(v.massKg, 4)}</td>
              <td className="px-3 py-2 font-mono text-xs text-ink-soft">
                <time dateTime={v.updatedAt}>{formatUtcDate(v.updatedAt)}</time>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
