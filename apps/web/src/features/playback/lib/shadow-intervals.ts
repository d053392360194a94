import type { RunEvent } from '@photon-ledger/shared';

/** A stretch of the run spent in a shadow, from the located eclipse events. */
export interface ShadowInterval {
  /** Occulting body named by the events ("earth", "moon"). */
  body: string;
  /** Penumbra (partial) or umbra/antumbra (full or annular). */
  depth: 'penumbra' | 'umbra';
  /** From and to (s from the epoch). */
  fromT: number;
  toT: number;
}

const EVENT = /^(.+)-(penumbra|umbra|antumbra)-(entry|exit)$/;

/**
 * Shadow intervals from a run's events (`earth-penumbra-entry` … `earth-penumbra-exit`): an exit
 * without an entry starts at tStart (the run began in shadow), an entry without an exit ends at tEnd.
 * Antumbra counts as umbra-deep. Events of other kinds are ignored.
 */
export function shadowIntervals(events: readonly RunEvent[], tStart: number, tEnd: number): ShadowInterval[] {
  const open = new Map<string, number>();
  const out: ShadowInterval[] = [];
  const sorted = [...events].sort((a, b) => a.tSeconds - b.tSeconds);
  for (const event of sorted) {
    const match = EVENT.exec(event.name);
    if (!match) continue;
    const body = match[1]!;
    const depth = match[2] === 'penumbra' ? 'penumbra' : 'umbra';
    const key = `${body}:${depth}`;
    if (match[3] === 'entry') {
      open.set(key, event.tSeconds);
    } else {
      out.push({ body, depth, fromT: open.get(key) ?? tStart, toT: event.tSeconds });
      open.delete(key);
    }
  }
  for (const [key, fromT] of open) {
    const [body, depth] = key.split(':') as [string, 'penumbra' | 'umbra'];
    out.push({ body, depth, fromT, toT: tEnd });
  }
  return out.sort((a, b) => a.fromT - b.fromT);
}
