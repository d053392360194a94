/**
 * A worker thread computing bands of coefficient-table rows one at a time (driven by
 * coefficient-table-job.ts through compute-thread.ts): ray casting is CPU-bound for seconds, so it
 * runs here and the worker's event loop stays free for heartbeats and other jobs. The last mesh
 * scene (its ray-casting hierarchy) is kept between bands of the same table, so a worker taking
 * several bands of one table builds it once.
 */
import { computeCoefficientTableRows, createMeshScene, type MeshScene } from '@photon-ledger/srp-core';
import type { TableBandInput, TableBandResult } from './coefficient-table-thread-protocol';
import { serveComputations } from './thread-host';

let cached: { key: string; scene: MeshScene } | null = null;

serveComputations<TableBandInput, TableBandResult>((input, control) => {
  const started = performance.now();
  if (cached?.key !== input.sceneKey) {
    cached = null;
    const scene = createMeshScene({ positions: input.positions, groupOfTriangle: input.groupOfTriangle, groupNames: input.groupNames }, input.optics);
    cached = { key: input.sceneKey, scene };
  }
  const rows = computeCoefficientTableRows(cached.scene, input.settings, input.firstPolarRow, input.endPolarRow, control);
  if (rows.cancelled) return null;
  const result: TableBandResult = { values: rows.values, rays: rows.rays, computeMs: performance.now() - started };
  return { result, transfer: [rows.values.buffer as ArrayBuffer] };
});
