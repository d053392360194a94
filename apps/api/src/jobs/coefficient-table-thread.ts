/**
 * A worker thread computing bands of coefficient-table rows one at a time (driven by
 * coefficient-table-job.ts): ray casting is CPU-bound for seconds, so it runs here and the
 * worker's event loop stays free for heartbeats and other jobs. The last mesh scene (its ray-casting
 * hierarchy) is kept between bands of the same table, so a worker taking several bands of one
 * table builds it once. Started by run-thread-boot.mjs, which registers tsx in the thread.
 */
import { parentPort, workerData } from 'node:worker_threads';
import { computeCoefficientTableRows, createMeshScene, SrpError, type MeshScene } from '@photon-ledger/srp-core';
import type { TableThreadMessage, TableThreadRequest, TableThreadStart } from './coefficient-table-thread-protocol';

const port = parentPort;
if (!port) throw new Error('coefficient-table-thread.ts runs as a worker thread only');
const { cancelFlag } = workerData as TableThreadStart;
const cancel = new Int32Array(cancelFlag);

let cached: { key: string; scene: MeshScene } | null = null;

function compute(request: TableThreadRequest): void {
  const { token } = request;
  const post = (message: TableThreadMessage, transfer: ArrayBuffer[] = []) => port!.postMessage(message, transfer);
  try {
    const started = performance.now();
    if (cached?.key !== request.sceneKey) {
      cached = null;
      const scene = createMeshScene(
        { positions: request.positions, groupOfTriangle: request.groupOfTriangle, groupNames: request.groupNames },
        request.optics,
      );
      cached = { key: request.sceneKey, scene };
    }
    const rows = computeCoefficientTableRows(cached.scene, request.settings, request.firstPolarRow, request.endPolarRow, {
      onProgress: (rowsDone) => post({ token, kind: 'progress', rowsDone }),
      isCancelled: () => Atomics.load(cancel, 0) === 1,
    });
    if (rows.cancelled) {
      post({ token, kind: 'cancelled' });
      return;
    }
    const computeMs = performance.now() - started;
    post({ token, kind: 'succeeded', values: rows.values, rays: rows.rays, computeMs }, [rows.values.buffer as ArrayBuffer]);
  } catch (err) {
    const message = err instanceof Error ? err.message : String(err);
    post({ token, kind: 'failed', message, ...(err instanceof SrpError && err.details.field ? { field: err.details.field } : {}) });
  }
}

port.on('message', compute);
