import { describe, expect, it } from 'vitest';
import { parseUtcEpoch } from '../time/epoch';
import { EXPORT_CAUTION } from './caution';
import { leoHistory } from './export-test-helpers';
import { OEM_MANDATORY_HEADER_KEYWORDS, OEM_MANDATORY_METADATA_KEYWORDS, oemChunks, oemText, parseOem } from './oem';

const epoch = parseUtcEpoch('2026-03-20T12:00:00Z');
const options = {
  epoch,
  centralBody: 'earth',
  objectName: 'PL-DEMO-1',
  objectId: '2026-999A',
  originator: 'PHOTON LEDGER',
  creationDateUtc: '2026-03-21T08:30:00Z',
} as const;

describe('CCSDS OEM (KVN, 502.0-B-3)', () => {
  it('round-trips: every obligatory keyword is there and the states come back in km to the printed precision', () => {
    const h = leoHistory(200, 60);
    const text = oemText(h, options);
    expect(text.startsWith('CCSDS_OEM_VERS = 3.0\n')).toBe(true);
    const oem = parseOem(text);
    // Source: CCSDS 502.0-B-3 (2023), OEM header and metadata tables, obligatory rows (from memory).
    for (const key of OEM_MANDATORY_HEADER_KEYWORDS) expect(oem.header[key], key).toBeTruthy();
    const [segment] = oem.segments;
    for (const key of OEM_MANDATORY_METADATA_KEYWORDS) expect(segment?.metadata[key], key).toBeTruthy();
    expect(oem.header).toMatchObject({ CCSDS_OEM_VERS: '3.0', CREATION_DATE: '2026-03-21T08:30:00.000', ORIGINATOR: 'PHOTON LEDGER' });
    expect(segment?.metadata).toMatchObject({
      OBJECT_NAME: 'PL-DEMO-1',
      OBJECT_ID: '2026-999A',
      CENTER_NAME: 'EARTH',
      REF_FRAME: 'EME2000',
      TIME_SYSTEM: 'UTC',
      START_TIME: '2026-03-20T12:00:00.000',
      STOP_TIME: '2026-03-20T15:19:00.000',
    });
    expect(oem.comments).toContain(EXPORT_CAUTION);
    expect(segment?.epochs).toHaveLength(200);
    const l = h.layout;
    for (let k = 0; k < 200; k += 1) {
      expect(segment?.tSeconds[k]).toBeCloseTo(60 * k, 9);
      for (let j = 0; j < 6; j += 1) {
        const want = (h.samples[k * l.stride + (j < 3 ? l.r + j : l.v + j - 3)] as number) / 1000;
        // Half a unit in the last place: 1e-6 km positions, 1e-9 km/s velocities.
        const tol = j < 3 ? 0.5e-6 + 1e-12 : 0.5e-9 + 1e-15;
        expect(Math.abs((segment?.statesKm[k * 6 + j] as number) - want)).toBeLessThanOrEqual(tol);
      }
    }
  });

  it('names a Sun-centred run SUN and writes USEABLE_ times inside the span', () => {
    const oem = parseOem(oemText(leoHistory(10, 60), { ...options, centralBody: 'sun', useableSeconds: [60, 480] }));
    expect(oem.segments[0]?.metadata).toMatchObject({
      CENTER_NAME: 'SUN',
      USEABLE_START_TIME: '2026-03-20T12:01:00.000',
      USEABLE_STOP_TIME: '2026-03-20T12:08:00.000',
    });
  });

  it('streams data lines in chunks after one header chunk', () => {
    const chunks = [...oemChunks(leoHistory(2500, 60), { ...options, rowsPerChunk: 1000 })];
    expect(chunks).toHaveLength(4);
    expect(chunks[0]).toMatch(/META_STOP/);
    expect(chunks[3]?.split('\n').filter(Boolean)).toHaveLength(500);
  });

  it('refuses a message without OBJECT_ID, naming the keyword', () => {
    const text = oemText(leoHistory(3, 60), options).replace(/^OBJECT_ID = .*\n/m, '');
    expect(() => parseOem(text)).toThrow(/obligatory keyword OBJECT_ID/);
  });

  it('refuses a multi-line object name, naming objectName', () => {
    expect(() => oemText(leoHistory(3, 60), { ...options, objectName: 'A\nB' })).toThrow(/objectName/);
  });
});
