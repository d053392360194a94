import { Link } from 'react-router-dom';
import type { MeshFormat, MeshSummary } from '@photon-ledger/shared';
import { formatUtcDate } from '../../../lib/format';
import { meshPagePath } from '../api/mesh-paths';
import { formatNumber, shortSha } from '../../../lib/format-number';

/** Readable names of the mesh file formats. */
export const meshFormatLabels: Record<MeshFormat, string> = { obj: 'OBJ', 'stl-ascii': 'STL (ASCII)', 'stl-binary': 'STL (binary)' };

/** The size of a mesh's bounds as "x × y × z m". */
export function boundsText(bounds: MeshSummary['boundsM']): string {
  const size = [0, 1, 2].map((k) => bounds.max[k]! - bounds.min[k]!);
  return `${size.map((s) => formatNumber(s, 3)).join(' × ')} m`;
}

/** The mission's meshes as a table, each name a link to its page; an empty state without any. */
export function MeshList({ missionId, meshes, canImport }: { missionId: string; meshes: readonly MeshSummary[]; canImport: boolean }) {
  if (meshes.length === 0) {
    return (
      <p className="rounded-lg border border-dashed border-rule-strong px-4 py-6 text-sm text-ink-soft">
        No meshes imported yet.{canImport ? ' Import an OBJ or STL file below.' : ''}
      </p>
    );
  }
  return (
    <div className="overflow-x-auto rounded-lg border border-rule bg-paper-raised">
      <table className="w-full text-sm">
        <caption className="sr-only">Imported meshes of the mission, newest first</caption>
        <thead className="border-b border-rule text-left text-xs text-ink-soft">
          <tr>
            <th scope="col" className="px-3 py-2 font-medium">Name</th>
            <th scope="col" className="px-3 py-2 font-medium">Format</th>
            <th scope="col" className="px-3 py-2 text-right font-medium">Triangles</th>
            <th scope="col" className="px-3 py-2 text-right font-medium">Degenerate dropped</th>
            <th scope="col" className="px-3 py-2 text-right font-medium">Groups</th>
            <th scope="col" className="px-3 py-2 text-right font-medium">Area (m²)</th>
            <th scope="col" className="px-3 py-2 text-right font-medium">Bounds (m)</th>
            <th scope="col" className="px-3 py-2 font-medium">SHA-256</th>
            <th scope="col" className="px-3 py-2 font-medium">Imported</th>
          </tr>
        </thead>
        <tbody>
          {meshes.map((m) => (
            <tr key={m.id} className="border-t border-rule">
              <th scope="row" className="px-3 py-2 text-left font-medium">
                <Link to={meshPagePath(missionId, m.id)} className="text-ink underline decoration-rule-strong underline-offset-2 hover:decoration-sodium">
                  {m.name}
                </Link>
                <span className="block text-xs font-normal text-ink-soft">{m.fileName}</span>
              </th>
              <td className="px-3 py-2">
                {meshFormatLabels[m.format]} <span className="text-xs text-ink-soft">({m.units})</span>
              </td>
              <td className="px-3 py-2 text-right font-mono tabular-nums">{m.triangleCount.toLocaleString('en-GB')}</td>
              <td className="px-3 py-2 text-right font-mono tabular-nums">{m.droppedDegenerate.toLocaleString('en-GB')}</td>
              <td className="px-3 py-2 text-right font-mono tabular-nums">{m.groups.length}</td>
              <td className="px-3 py-2 text-right font-mono tabular-nums">{formatNumber(m.totalAreaM2, 4)}</td>
              <td className="px-3 py-2 text-right font-mono text-xs whitespace-nowrap tabular-nums">{boundsText(m.boundsM)}</td>
              <td className="px-3 py-2 font-mono text-xs" title={m.geometrySha256}>
                {shortSha(m.geometrySha256)}
              </td>
              <td className="px-3 py-2 text-xs whitespace-nowrap">
                <time dateTime={m.createdAt}>{formatUtcDate(m.createdAt)}</time>
                {m.createdBy && <span className="block text-ink-soft">{m.createdBy.displayName}</span>}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
