import type { ReactNode } from 'react';
import type { MeshSummary } from '@photon-ledger/shared';
import { formatUtcDate } from '../../../lib/format';
import { formatNumber, formatVector, shortSha } from '../../../lib/format-number';
import { boundsText, meshFormatLabels } from './mesh-list';

/** A mesh's facts: file, format, units, transform, counts, area, bounds and checksum. */
export function MeshFacts({ mesh }: { mesh: MeshSummary }) {
  const facts: [string, ReactNode][] = [
    ['File', <span className="font-mono text-xs">{mesh.fileName}</span>],
    ['Format', `${meshFormatLabels[mesh.format]}, in ${mesh.units === 'm' ? 'metres' : 'millimetres'}`],
    ['Triangles', <span className="font-mono">{mesh.triangleCount.toLocaleString('en-GB')}</span>],
    ['Degenerate dropped', <span className="font-mono">{mesh.droppedDegenerate.toLocaleString('en-GB')}</span>],
    ['Total area', <span className="font-mono">{formatNumber(mesh.totalAreaM2, 5)} m²</span>],
    ['Bounds size', <span className="font-mono">{boundsText(mesh.boundsM)}</span>],
    ['Bounds min / max', <span className="font-mono text-xs">{formatVector(mesh.boundsM.min, 4)} / {formatVector(mesh.boundsM.max, 4)} m</span>],
    ['Rotation (x, y, z)', <span className="font-mono text-xs">{formatVector(mesh.rotationDeg, 6)}°</span>],
    ['Translation', <span className="font-mono text-xs">{formatVector(mesh.translationM, 6)} m</span>],
    ['Geometry SHA-256', <span className="font-mono text-xs" title={mesh.geometrySha256}>{shortSha(mesh.geometrySha256)}…</span>],
    ['Imported', <span>{formatUtcDate(mesh.createdAt)}{mesh.createdBy ? ` by ${mesh.createdBy.displayName}` : ''}</span>],
  ];
  return (
    <dl aria-label="Mesh summary" className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1.5 rounded-lg border border-rule bg-paper-raised px-3 py-2 text-sm">
      {facts.map(([label, value]) => (
        <div key={label} className="contents">
          <dt className="text-ink-soft">{label}</dt>
          <dd>{value}</dd>
        </div>
      ))}
    </dl>
  );
}

/** The mesh's facet groups with their triangle counts and areas. */
export function MeshGroupsTable({ mesh }: { mesh: MeshSummary }) {
  return (
    <div className="overflow-x-auto rounded-lg border border-rule bg-paper-raised">
      <table className="w-full text-sm">
        <caption className="sr-only">Facet groups of the mesh</caption>
        <thead className="border-b border-rule text-left text-xs text-ink-soft">
          <tr>
            <th scope="col" className="px-3 py-2 font-medium">Group</th>
            <th scope="col" className="px-3 py-2 text-right font-medium">Triangles</th>
            <th scope="col" className="px-3 py-2 text-right font-medium">Area (m²)</th>
            <th scope="col" className="px-3 py-2 text-right font-medium">Share of area</th>
          </tr>
        </thead>
        <tbody>
          {mesh.groups.map((g) => (
            <tr key={g.name} className="border-t border-rule">
              <th scope="row" className="px-3 py-1.5 text-left font-medium">{g.name}</th>
              <td className="px-3 py-1.5 text-right font-mono tabular-nums">{g.triangleCount.toLocaleString('en-GB')}</td>
              <td className="px-3 py-1.5 text-right font-mono tabular-nums">{formatNumber(g.areaM2, 4)}</td>
              <td className="px-3 py-1.5 text-right font-mono tabular-nums">
                {mesh.totalAreaM2 > 0 ? `${formatNumber((100 * g.areaM2) / mesh.totalAreaM2, 3)} %` : '—'}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
