import { describe, expect, it } from 'vitest';
import { createSampleLayout } from '../propagation/sample-layout';
import { parseUtcEpoch, secondsBetween } from '../time/epoch';
import { EXPORT_CAUTION } from './caution';
import { EPHEMERIS_CSV_COLUMNS, ephemerisCsv, ephemerisCsvChunks, parseEphemerisCsv } from './csv-ephemeris';
import { leoHistory } from './export-test-helpers';

const epoch = parseUtcEpoch('2026-03-20T12:00:00Z');

/** Half a unit in the last printed place of each column (the writer's precision), plus rounding. */
function printedTolerance(column: string, value: number): number {
  if (column === 't_s') return 0.5e-6;
  if (/^[xyz]_m$/.test(column)) return 0.5e-3 + 1e-9;
  if (/^v[xyz]_m_s$/.test(column)) return 0.5e-6 + 1e-12;
  if (column === 'illuminated_fraction') return 0.5e-6;
  if (column === 'sun_distance_m') return 0.05 + 1e-4;
  return 0.5e-9 * Math.abs(value) + 1e-300; // 10 significant digits
}

describe('CSV ephemeris', () => {
  it('round-trips: the header lines are present and every number comes back to the printed precision', () => {
    const h = leoHistory(500, 60);
    const text = ephemerisCsv(h, { epoch, centralBody: 'earth' });
    const parsed = parseEphemerisCsv(text);
    expect(parsed.meta.product).toBe('Photon Ledger SRP ephemeris');
    expect(parsed.meta.caution).toBe(EXPORT_CAUTION);
    expect(text).toContain(`# caution: ${EXPORT_CAUTION}\n`);
    expect(parsed.meta.frame).toMatch(/^EQJ \(J2000 equatorial\)/);
    expect(parsed.meta.central_body).toBe('earth');
    expect(parsed.meta.time_scale).toMatch(/^UTC/);
    expect(parsed.meta.epoch).toBe('2026-03-20T12:00:00.000Z');
    for (const c of EPHEMERIS_CSV_COLUMNS) expect(parsed.meta.units).toContain(c);
    expect(parsed.columns).toEqual([...EPHEMERIS_CSV_COLUMNS]);
    expect(parsed.timeUtc[1]).toBe('2026-03-20T12:01:00.000Z');

    const l = h.layout;
    const sourceOffset: Record<string, number> = {
      t_s: l.t, x_m: l.r, y_m: l.r + 1, z_m: l.r + 2, vx_m_s: l.v, vy_m_s: l.v + 1, vz_m_s: l.v + 2,
      srp_ax_eqj_m_s2: l.srpAccelInertial, srp_ay_eqj_m_s2: l.srpAccelInertial + 1, srp_az_eqj_m_s2: l.srpAccelInertial + 2,
      srp_ax_body_m_s2: l.srpAccelBody, srp_ay_body_m_s2: l.srpAccelBody + 1, srp_az_body_m_s2: l.srpAccelBody + 2,
      srp_tx_body_n_m: l.srpTorqueBody, srp_ty_body_n_m: l.srpTorqueBody + 1, srp_tz_body_n_m: l.srpTorqueBody + 2,
      illuminated_fraction: l.illuminatedFraction, sun_distance_m: l.sunDistanceM,
    };
    for (const [column, offset] of Object.entries(sourceOffset)) {
      const got = parsed.data[column] as Float64Array;
      expect(got).toHaveLength(500);
      for (let k = 0; k < 500; k += 1) {
        const want = h.samples[k * l.stride + offset] as number;
        expect(Math.abs((got[k] as number) - want), `${column} row ${k}`).toBeLessThanOrEqual(printedTolerance(column, want));
      }
    }
  });

  it('labels the samples across the 2016-12-31 leap second 23:59:59, 23:59:60, then 00:00:00, and the labels give back t_s', () => {
    // Source: IERS Bulletin C 52 (a positive leap second at the end of 2016-12-31).
    const leapEpoch = parseUtcEpoch('2016-12-31T23:59:59Z');
    const h = leoHistory(5, 0.5);
    const parsed = parseEphemerisCsv(ephemerisCsv(h, { epoch: leapEpoch, centralBody: 'earth' }));
    expect(parsed.timeUtc).toEqual([
      '2016-12-31T23:59:59.000Z',
      '2016-12-31T23:59:59.500Z',
      '2016-12-31T23:59:60.000Z',
      '2016-12-31T23:59:60.500Z',
      '2017-01-01T00:00:00.000Z',
    ]);
    parsed.timeUtc.forEach((iso, k) => expect(secondsBetween(leapEpoch, parseUtcEpoch(iso))).toBeCloseTo(parsed.data.t_s?.[k] as number, 9));
  });

  it('refuses a sample that is not finite, naming the row and column', () => {
    const h = leoHistory(3, 60);
    h.samples[h.layout.stride + h.layout.illuminatedFraction] = Number.NaN;
    expect(() => ephemerisCsv(h, { epoch, centralBody: 'earth' })).toThrow(/samples\.1\.illuminated_fraction/);
  });

  it('streams 1 000 000 rows in chunks, none longer than its rows, without one string of the whole file', () => {
    // A light history (no forces): the test holds 144 MB of samples, never the 260 MB of text.
    const rows = 1_000_000;
    const layout = createSampleLayout([]);
    const samples = new Float64Array(rows * layout.stride);
    for (let k = 0; k < rows; k += 1) {
      const o = k * layout.stride;
      samples[o] = k * 10;
      samples[o + layout.r] = 7e6 * Math.cos(k * 1e-3);
      samples[o + layout.r + 1] = 7e6 * Math.sin(k * 1e-3);
      samples[o + layout.v + 2] = 7546.0532;
      samples[o + layout.srpAccelInertial] = 4.5e-8;
      samples[o + layout.illuminatedFraction] = 1;
      samples[o + layout.sunDistanceM] = 1.496e11;
    }
    let bytes = 0;
    let lines = 0;
    let chunks = 0;
    let longest = 0;
    const started = performance.now();
    for (const chunk of ephemerisCsvChunks({ layout, samples, sampleCount: rows }, { epoch, centralBody: 'earth', rowsPerChunk: 4096 })) {
      bytes += chunk.length; // ASCII: one byte per character
      longest = Math.max(longest, chunk.length);
      for (let i = chunk.indexOf('\n'); i >= 0; i = chunk.indexOf('\n', i + 1)) lines += 1;
      chunks += 1;
    }
    const seconds = (performance.now() - started) / 1000;
    // Measured, not asserted (printed): 260 MB at 27-33 MB/s on a loaded 2-core machine, 2025.
    console.info(`CSV stream: ${rows} rows, ${(bytes / 1e6).toFixed(1)} MB in ${seconds.toFixed(2)} s = ${(bytes / 1e6 / seconds).toFixed(1)} MB/s`);
    expect(lines).toBe(rows + 8); // 7 comment lines, the column line, the rows
    expect(chunks).toBe(1 + Math.ceil(rows / 4096));
    expect(longest).toBeLessThan(4096 * 400);
    // 10-20 s under a full parallel test run on 2 cores: more room than the project's 30 s.
  }, 120_000);
});
