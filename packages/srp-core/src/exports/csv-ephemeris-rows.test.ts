import { describe, expect, it } from 'vitest';
import type { SampleHistory } from '../propagation/sample-layout';
import { formatUtc, parseUtcEpoch } from '../time/epoch';
import { createSampleLayout } from '../propagation/sample-layout';
import { createUtcLabeller, ephemerisCsv, ephemerisCsvHeader, ephemerisCsvRowBytes, ephemerisCsvRows } from './csv-ephemeris';
import { leoHistory } from './export-test-helpers';

/** Rows [from, to) of a history as a history of their own (what a stored chunk is). */
function slice(h: SampleHistory, from: number, to: number): SampleHistory {
  return { layout: h.layout, samples: h.samples.subarray(from * h.layout.stride, to * h.layout.stride), sampleCount: to - from };
}

describe('CSV ephemeris rows for streaming', () => {
  it('the header, then the rows of consecutive pieces, is byte for byte the whole file', () => {
    const h = leoHistory(2500, 7.3);
    const epoch = parseUtcEpoch('2026-03-20T12:00:00.25Z');
    let text = ephemerisCsvHeader({ epoch, centralBody: 'earth' });
    for (const [from, to] of [[0, 1024], [1024, 2048], [2048, 2500]] as const) {
      for (const chunk of ephemerisCsvRows(slice(h, from, to), { epoch, rowsPerChunk: 300, firstRowIndex: from })) text += chunk;
    }
    expect(text === ephemerisCsv(h, { epoch, centralBody: 'earth' })).toBe(true);
  });

  it('yields only rows, in chunks of rowsPerChunk lines', () => {
    const chunks = [...ephemerisCsvRows(leoHistory(25, 60), { epoch: parseUtcEpoch('2026-03-20T12:00:00Z'), rowsPerChunk: 10 })];
    expect(chunks.map((c) => c.split('\n').filter(Boolean).length)).toEqual([10, 10, 5]);
    expect(chunks[0]?.startsWith('2026-03-20T12:00:00.000Z,0.000000,')).toBe(true);
  });

  it('names a bad sample by its index in the whole run', () => {
    const h = leoHistory(10, 60);
    h.samples[3 * h.layout.stride + h.layout.srpTorqueBody] = Number.POSITIVE_INFINITY;
    const rows = () => [...ephemerisCsvRows(h, { epoch: parseUtcEpoch('2026-03-20T12:00:00Z'), firstRowIndex: 5000 })];
    expect(rows).toThrow(/samples\.5003\.srp_tx_body_n_m/);
  });

  it('refuses a rowsPerChunk that is not a whole number of rows, naming it', () => {
    expect(() => [...ephemerisCsvRows(leoHistory(3, 60), { epoch: parseUtcEpoch('2026-03-20T12:00:00Z'), rowsPerChunk: 0 })]).toThrow(/rowsPerChunk/);
  });
});

/** The bytes as text (they are ASCII). */
const ascii = (bytes: Uint8Array): string => {
  let text = '';
  for (let i = 0; i < bytes.length; i += 8192) text += String.fromCharCode(...bytes.subarray(i, i + 8192));
  return text;
};

describe('CSV ephemeris rows as bytes', () => {
  it('are the text of ephemerisCsvRows, on a realistic history and across the 2016-12-31 leap second', () => {
    const h = leoHistory(3000, 0.77);
    for (const iso of ['2016-12-31T23:59:00.0004Z', '2026-03-20T12:00:00Z']) {
      const epoch = parseUtcEpoch(iso);
      const text = [...ephemerisCsvRows(h, { epoch })].join('');
      expect(ascii(ephemerisCsvRowBytes(h, { epoch })) === text, iso).toBe(true);
    }
  });

  it('print every number as formatFixed / toExponential(9) do, over 40 decades, near rounding ties and at the edges', () => {
    // A deterministic generator: the same values on every run.
    let seed = 20260908;
    const random = () => {
      seed = (seed * 1103515245 + 12345) % 2147483648;
      return seed / 2147483648;
    };
    const rows = 20_000;
    const layout = createSampleLayout(['central-body', 'srp']);
    const samples = new Float64Array(rows * layout.stride);
    const special = [0, -0, 5e-324, -1.7976931348623157e308, 1e21, 9.5e15, 0.0005, 1.2345678905e-7, -9.9999999995e-3, 1e-7, 99999999995, 2.5e-10];
    for (let k = 0; k < rows; k += 1) {
      const o = k * layout.stride;
      samples[o] = k * 0.37;
      for (let j = 1; j < layout.stride; j += 1) {
        samples[o + j] = k % 7 === 0 ? (special[(k + j) % special.length] as number) : (random() - 0.5) * 10 ** (Math.floor(random() * 40) - 20);
      }
    }
    const h = { layout, samples, sampleCount: rows };
    const epoch = parseUtcEpoch('2026-09-08T00:00:00Z');
    const fromBytes = ascii(ephemerisCsvRowBytes(h, { epoch }));
    expect(fromBytes === [...ephemerisCsvRows(h, { epoch })].join('')).toBe(true);
    // And the exponent columns are toExponential's text, field for field.
    const lines = fromBytes.split('\n');
    for (const k of [0, 7, 1234, rows - 1]) {
      const fields = lines[k]!.split(',');
      for (let j = 7; j < 16; j += 1) expect(fields[j + 1]).toBe((samples[k * layout.stride + j] as number).toExponential(9));
    }
  });

  it('grow their buffer for rows longer than usual (toFixed of 9.9e20 is 21 digits and the decimals)', () => {
    const h = leoHistory(50, 60);
    for (let k = 0; k < 50; k += 1) {
      for (const j of [1, 2, 3, 4, 5, 6, 16, 17]) h.samples[k * h.layout.stride + j] = (k % 2 ? -1 : 1) * 9.87654321e20;
    }
    const epoch = parseUtcEpoch('2026-03-20T12:00:00Z');
    const text = [...ephemerisCsvRows(h, { epoch })].join('');
    expect(text.length).toBeGreaterThan(50 * 300); // more than the writer's first 300 bytes a row
    expect(ascii(ephemerisCsvRowBytes(h, { epoch })) === text).toBe(true);
  });

  it('name a bad sample by its index in the whole run', () => {
    const h = leoHistory(5, 60);
    h.samples[4 * h.layout.stride + h.layout.sunDistanceM] = Number.NaN;
    expect(() => ephemerisCsvRowBytes(h, { epoch: parseUtcEpoch('2026-03-20T12:00:00Z'), firstRowIndex: 10 })).toThrow(/samples\.14\.sun_distance_m/);
  });
});

describe('createUtcLabeller', () => {
  it('labels like formatUtc, across the 2016-12-31 leap second, at odd steps, backwards and in jumps', () => {
    // Source for the leap second: IERS Bulletin C 52 (23:59:60 inserted at the end of 2016-12-31).
    for (const iso of ['2016-12-31T23:58:30.0004Z', '2026-09-08T00:00:00Z', '2015-06-30T23:59:00.9995Z']) {
      const epoch = parseUtcEpoch(iso);
      const label = createUtcLabeller(epoch);
      const times: number[] = [];
      for (let k = 0; k < 3000; k += 1) times.push(k * 0.0617);
      for (let k = 0; k < 400; k += 1) times.push(200 - k * 0.49, k * 1e4 + 0.0005, -k * 3.3);
      for (const t of times) expect(label(t), `${iso} + ${t}`).toBe(formatUtc(epoch, t));
    }
  });
});
