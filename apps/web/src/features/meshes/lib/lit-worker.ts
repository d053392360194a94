/// <reference lib="webworker" />
import { createLitCalculator, type LitCalculator, type LitMeshInput } from './lit-fractions';

/*
 * The Web Worker that computes lit fractions off the main thread (started by lit-client.ts with
 * Vite's `new Worker(new URL(...), { type: 'module' })`). Messages in: `init` with the mesh, then
 * `illuminate` requests; out: `result` (lit fractions and timings) or `error`.
 */

/** A message to the worker. */
export type LitWorkerRequest =
  | { type: 'init'; mesh: LitMeshInput }
  | { type: 'illuminate'; id: number; sunDirBody: [number, number, number]; samplesPerFacet: number };

/** A message from the worker. */
export type LitWorkerResponse =
  | { type: 'result'; id: number; result: import('./lit-fractions').LitResult }
  | { type: 'error'; id: number; message: string };

let calculator: LitCalculator | null = null;
let initError: string | null = null;

self.onmessage = (event: MessageEvent<LitWorkerRequest>) => {
  const message = event.data;
  if (message.type === 'init') {
    try {
      calculator = createLitCalculator(message.mesh);
      initError = null;
    } catch (error) {
      calculator = null;
      initError = error instanceof Error ? error.message : String(error);
    }
    return;
  }
  const reply = (response: LitWorkerResponse, transfer: Transferable[] = []) => (self as unknown as Worker).postMessage(response, transfer);
  if (!calculator) {
    reply({ type: 'error', id: message.id, message: initError ?? 'the mesh was not loaded into the worker' });
    return;
  }
  try {
    const result = calculator.illuminate(message.sunDirBody, message.samplesPerFacet);
    reply({ type: 'result', id: message.id, result }, [result.litFraction.buffer]);
  } catch (error) {
    reply({ type: 'error', id: message.id, message: error instanceof Error ? error.message : String(error) });
  }
};
