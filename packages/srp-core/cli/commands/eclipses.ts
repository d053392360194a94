import { eclipsesCommandSchema, initialOrbitSchema } from '@photon-ledger/shared';
import {
  createGeocentricEphemeris,
  findEclipseEvents,
  formatUtc,
  propagateKepler,
  summarizeEclipses,
  INERTIAL_FRAME_LABEL,
  type OccultingBody,
  type Vec3,
} from '../../src/index';
import { orbitFromFile } from '../../io/index';
import { CliError, parseWith } from '../cli-error';
import { readJson } from '../read-input';
import { CAUTION } from '../caution';

const DAY = 86_400;

/** `photon-ledger eclipses`: umbra and penumbra entries and exits of an Earth orbit over a span. */
export function eclipsesCommand(raw: Record<string, unknown>): string {
  const o = parseWith(eclipsesCommandSchema, raw, 'options');
  const orbit = orbitFromFile(readJson(initialOrbitSchema, o.orbit, '--orbit'));
  if (orbit.centralBody !== 'earth') {
    throw new CliError('--orbit: eclipses are computed for Earth orbits (centralBody: earth)');
  }
  const end = o['span-days'] * DAY;
  const ephemeris = createGeocentricEphemeris(orbit.epoch, 0, end);
  // Two-body motion from the orbit's epoch: the eclipse geometry of an unperturbed orbit.
  const scratch = new Float64Array(6);
  const satPositionEci = (out: Vec3, t: number): Vec3 => {
    propagateKepler(scratch, orbit.state, t, orbit.mu);
    out[0] = scratch[0]!;
    out[1] = scratch[1]!;
    out[2] = scratch[2]!;
    return out;
  };
  const bodies = o.bodies.split(',') as OccultingBody[];
  const result = findEclipseEvents(satPositionEci, ephemeris, 0, end, { bodies, stepSeconds: o['step-s'] });
  const summary = summarizeEclipses(result);
  const utc = (t: number) => formatUtc(orbit.epoch, t);
  const events = result.events.map((e) => ({ timeUtc: utc(e.tSeconds), tSeconds: Number(e.tSeconds.toFixed(3)), kind: e.kind, body: e.body }));

  if (o.format === 'csv') {
    const lines = [
      `# Photon Ledger eclipse events; epoch ${orbit.epoch.utcIso}; span ${o['span-days']} d; two-body orbit; conical shadow; frame ${INERTIAL_FRAME_LABEL}; time scale UTC`,
      `# ${CAUTION}`,
      'time_utc,t_s,kind,body',
      ...events.map((e) => `${e.timeUtc},${e.tSeconds.toFixed(3)},${e.kind},${e.body}`),
    ];
    return lines.join('\n');
  }
  return JSON.stringify(
    {
      caution: CAUTION,
      epochUtc: orbit.epoch.utcIso,
      spanDays: o['span-days'],
      model: 'two-body orbit from the file; conical shadow (umbra and penumbra) of the chosen bodies',
      bodies,
      initialPhase: result.initialPhase,
      events,
      passes: summary.passes.map((p) => ({
        body: p.body,
        startUtc: utc(p.startSeconds),
        endUtc: utc(p.endSeconds),
        durationMin: Number((p.durationSeconds / 60).toFixed(3)),
        umbraMin: Number((p.umbraSeconds / 60).toFixed(3)),
        antumbraMin: Number((p.antumbraSeconds / 60).toFixed(3)),
      })),
      totalShadowMin: Number((summary.totalShadowSeconds / 60).toFixed(3)),
      longestMin: Number((summary.longestSeconds / 60).toFixed(3)),
    },
    null,
    2,
  );
}
