import { ASTRONOMICAL_UNIT } from '@photon-ledger/srp-core';
import type { PlaybackState, Vec3 } from '../lib/series-track';
import { formatElapsed, formatQuantity, formatSig, utcLabel } from '../lib/format-quantity';

/** Props of PlaybackReadouts. */
export interface PlaybackReadoutsProps {
  epochUtc: string;
  centralBody: 'earth' | 'sun';
  state: PlaybackState;
  massKg: number;
  /** Unit vector Earth → Sun (EQJ) for Earth-centred runs. */
  sunDirectionEci: Vec3 | null;
}

const norm = (v: Vec3) => Math.hypot(v[0], v[1], v[2]);

/** Words for the illuminated fraction. */
function lightWords(f: number): string {
  if (f >= 1) return 'full Sun';
  if (f <= 0) return 'umbra';
  return 'partial shadow';
}

/** The numbers at the scrubbed time, as text (readable without WebGL). */
export function PlaybackReadouts({ epochUtc, centralBody, state, massKg, sunDirectionEci }: PlaybackReadoutsProps) {
  const r = norm(state.positionM);
  const rows: [string, string][] = [
    ['Time (UTC)', utcLabel(epochUtc, state.tSeconds)],
    ['Since epoch', formatElapsed(state.tSeconds)],
    [
      centralBody === 'earth' ? '|r| from the Earth’s centre' : '|r| from the Sun’s centre',
      centralBody === 'earth' ? formatQuantity(r / 1000, 'km', 6) : `${formatSig(r / ASTRONOMICAL_UNIT, 5)} AU (${formatQuantity(r / 1000, 'km', 4)})`,
    ],
    ['Illuminated fraction', `${state.illuminatedFraction.toFixed(3)} (${lightWords(state.illuminatedFraction)})`],
    ['|a_srp|', formatQuantity(norm(state.srpAccelInertialMps2), 'm/s²')],
    ['|F_srp| = m·|a_srp|', formatQuantity(massKg * norm(state.srpAccelBodyMps2), 'N')],
    ['|τ_srp|', formatQuantity(norm(state.srpTorqueBodyNm), 'N·m')],
  ];
  if (sunDirectionEci) {
    rows.push(['Sun direction (EQJ, unit)', sunDirectionEci.map((c) => c.toFixed(3).replace('-', '−')).join(', ')]);
  }
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 text-[13px]">
      {rows.map(([term, value]) => (
        <div key={term} className="contents">
          <dt className="text-ink-soft">{term}</dt>
          <dd className="text-right font-mono whitespace-nowrap tabular-nums text-ink">{value}</dd>
        </div>
      ))}
    </dl>
  );
}
