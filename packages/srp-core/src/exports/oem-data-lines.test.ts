import { describe, expect, it } from 'vitest';
import type { SampleHistory } from '../propagation/sample-layout';
import { parseUtcEpoch } from '../time/epoch';
import { leoHistory } from './export-test-helpers';
import { oemDataLines, oemHeader, oemText, parseOem } from './oem';

const options = {
  epoch: parseUtcEpoch('2016-12-31T23:50:00Z'),
  centralBody: 'earth',
  objectName: 'PL-DEMO-1',
  objectId: 'local-7',
  originator: 'PHOTON LEDGER',
  creationDateUtc: '2026-03-21T08:30:00Z',
  messageId: 'run-1',
} as const;

function slice(h: SampleHistory, from: number, to: number): SampleHistory {
  return { layout: h.layout, samples: h.samples.subarray(from * h.layout.stride, to * h.layout.stride), sampleCount: to - from };
}

describe('OEM header and data lines for streaming', () => {
  it('the header for the first and last times, then the data lines of consecutive pieces, is byte for byte oemText', () => {
    // 2300 samples 0.6 s apart from 23:50: the span crosses the 2016-12-31 leap second (IERS Bulletin C 52).
    const h = leoHistory(2300, 0.6);
    const last = h.samples[(h.sampleCount - 1) * h.layout.stride] as number;
    let text = oemHeader({ ...options, useableSeconds: [6, 600] }, 0, last);
    for (const [from, to] of [[0, 1024], [1024, 2048], [2048, 2300]] as const) {
      for (const chunk of oemDataLines(slice(h, from, to), { epoch: options.epoch, rowsPerChunk: 500, firstRowIndex: from })) text += chunk;
    }
    expect(text === oemText(h, { ...options, useableSeconds: [6, 600] })).toBe(true);
    expect(parseOem(text).segments[0]?.epochs).toContain('2016-12-31T23:59:60.000');
  });

  it('the header checks its options as oemChunks does, naming the option', () => {
    expect(() => oemHeader({ ...options, objectName: ' ' }, 0, 60)).toThrow(/objectName/);
    expect(() => oemHeader({ ...options, useableSeconds: [0, 120] }, 0, 60)).toThrow(/useableSeconds/);
  });

  it('names a bad sample by its index in the whole run', () => {
    const h = leoHistory(4, 60);
    h.samples[2 * h.layout.stride + h.layout.v + 1] = Number.NaN;
    expect(() => [...oemDataLines(h, { epoch: options.epoch, firstRowIndex: 100 })]).toThrow(/samples\.102\.v\.1/);
  });
});
