import type { LitMeshInput, LitResult } from './lit-fractions';
import type { LitWorkerRequest, LitWorkerResponse } from './lit-worker';

/*
 * The page's side of the lit-fraction computation: a Web Worker per mesh view, so that a large
 * mesh never blocks the page; where Worker does not exist (jsdom) it computes on the main thread.
 * Only the latest request's answer is delivered (a slider dragged fast skips stale directions).
 */

/** Lit fractions for Sun directions of one mesh. */
export interface LitClient {
  /** Asks for the lit fractions at a Sun direction; resolves with the latest request's answer only (older ones reject with 'superseded'). */
  illuminate(sunDirBody: [number, number, number], samplesPerFacet: number): Promise<LitResult>;
  /** Where the work runs. */
  readonly mode: 'worker' | 'main thread';
  dispose(): void;
}

/** Raised for a request that a newer one replaced. */
export class SupersededError extends Error {
  constructor() {
    super('superseded');
  }
}

/** Starts the computation for `mesh` (in a worker when the browser has them). */
export function createLitClient(mesh: LitMeshInput): LitClient {
  if (typeof Worker === 'undefined') return mainThreadClient(mesh);
  const worker = new Worker(new URL('./lit-worker.ts', import.meta.url), { type: 'module', name: 'mesh-lit-fractions' });
  let latest = 0;
  const pending = new Map<number, { resolve: (r: LitResult) => void; reject: (e: Error) => void }>();
  worker.onmessage = (event: MessageEvent<LitWorkerResponse>) => {
    const message = event.data;
    const waiter = pending.get(message.id);
    if (!waiter) return;
    pending.delete(message.id);
    if (message.id !== latest) return waiter.reject(new SupersededError());
    if (message.type === 'result') waiter.resolve(message.result);
    else waiter.reject(new Error(message.message));
  };
  worker.onerror = (event) => {
    const error = new Error(event.message || 'the lit-fraction worker failed');
    for (const waiter of pending.values()) waiter.reject(error);
    pending.clear();
  };
  // The positions are copied (not transferred): the 3D view keeps drawing them.
  const init: LitWorkerRequest = { type: 'init', mesh };
  worker.postMessage(init);
  return {
    mode: 'worker',
    illuminate(sunDirBody, samplesPerFacet) {
      latest += 1;
      const id = latest;
      for (const [otherId, waiter] of pending) {
        // Requests still queued in the worker are answered later and dropped then; tell the callers now.
        if (otherId !== id) waiter.reject(new SupersededError());
      }
      pending.clear();
      return new Promise<LitResult>((resolve, reject) => {
        pending.set(id, { resolve, reject });
        const request: LitWorkerRequest = { type: 'illuminate', id, sunDirBody, samplesPerFacet };
        worker.postMessage(request);
      });
    },
    dispose() {
      worker.terminate();
      pending.clear();
    },
  };
}

function mainThreadClient(mesh: LitMeshInput): LitClient {
  let calculator: ReturnType<typeof import('./lit-fractions').createLitCalculator> | null = null;
  return {
    mode: 'main thread',
    async illuminate(sunDirBody, samplesPerFacet) {
      const { createLitCalculator } = await import('./lit-fractions');
      calculator ??= createLitCalculator(mesh);
      return calculator.illuminate(sunDirBody, samplesPerFacet);
    },
    dispose() {
      calculator = null;
    },
  };
}
