import type { RunEvent } from '@photon-ledger/shared';

/** The shadow phases the event names carry (`shadow` is the cylindrical model's one phase). */
export type ShadowPhase = 'penumbra' | 'umbra' | 'antumbra' | 'shadow';

/** One passage through a shadow: entry and exit, either missing when the run starts or ends inside. */
export interface EclipsePassage {
  /** Shadowing body, e.g. `earth`, `moon`. */
  body: string;
  phase: ShadowPhase;
  /** Null: already inside at the start of the run. */
  entry: RunEvent | null;
  /** Null: still inside at the end of the run. */
  exit: RunEvent | null;
  /** Seconds inside (clipped to the run when an edge is missing). */
  durationS: number;
  /** True when an edge lies outside the run (the duration is a lower bound). */
  clipped: boolean;
}

const eclipseName = /^([a-z0-9]+)-(penumbra|umbra|antumbra|shadow)-(entry|exit)$/;

/** True for an eclipse edge event (`<body>-<phase>-<entry|exit>`). */
export function isEclipseEvent(name: string): boolean {
  return eclipseName.test(name);
}

/**
 * Pairs eclipse edges into passages, per body and phase, in order of time. An exit without an
 * entry began before the run (`entry` null, from t = 0); an entry without an exit runs to `spanS`.
 */
export function pairEclipses(events: readonly RunEvent[], spanS: number): EclipsePassage[] {
  const open = new Map<string, RunEvent>();
  const passages: EclipsePassage[] = [];
  const sorted = [...events].sort((a, b) => a.tSeconds - b.tSeconds);
  for (const event of sorted) {
    const match = eclipseName.exec(event.name);
    if (!match) continue;
    const [, body = '', phase = 'shadow', edge] = match;
    const key = `${body}-${phase}`;
    if (edge === 'entry') {
      const pending = open.get(key);
      // Two entries in a row: close the first at the second (should not happen, but never drop one).
      if (pending) passages.push(passage(body, phase as ShadowPhase, pending, null, event.tSeconds));
      open.set(key, event);
    } else {
      const entry = open.get(key) ?? null;
      open.delete(key);
      passages.push(passage(body, phase as ShadowPhase, entry, event, event.tSeconds));
    }
  }
  for (const [key, entry] of open) {
    const [body = '', phase = 'shadow'] = key.split('-');
    passages.push(passage(body, phase as ShadowPhase, entry, null, spanS));
  }
  return passages.sort((a, b) => startOf(a) - startOf(b) || phaseRank(a.phase) - phaseRank(b.phase));
}

function passage(body: string, phase: ShadowPhase, entry: RunEvent | null, exit: RunEvent | null, endS: number): EclipsePassage {
  const start = entry ? entry.tSeconds : 0;
  const end = exit ? exit.tSeconds : endS;
  return { body, phase, entry, exit, durationS: Math.max(0, end - start), clipped: !entry || !exit };
}

function startOf(p: EclipsePassage): number {
  return p.entry ? p.entry.tSeconds : 0;
}

function phaseRank(phase: ShadowPhase): number {
  return phase === 'penumbra' ? 0 : phase === 'shadow' ? 1 : 2;
}

/** `Penumbra`, `Umbra`, `Antumbra`, `Shadow (cylindrical)`. */
export function phaseLabel(phase: ShadowPhase): string {
  switch (phase) {
    case 'penumbra':
      return 'Penumbra';
    case 'umbra':
      return 'Umbra';
    case 'antumbra':
      return 'Antumbra';
    case 'shadow':
      return 'Shadow (cylindrical)';
  }
}

/** `earth` → `Earth`. */
export function bodyLabel(body: string): string {
  return body.charAt(0).toUpperCase() + body.slice(1);
}

/** Readable name of a non-eclipse event: `ascending-node` → `Ascending node`. */
export function eventLabel(name: string): string {
  const text = name.replace(/-/g, ' ');
  return text.charAt(0).toUpperCase() + text.slice(1);
}
