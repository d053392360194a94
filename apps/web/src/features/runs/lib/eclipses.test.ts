import { describe, expect, it } from 'vitest';
import { pairEclipses } from './eclipses';

const at = (name: string, tSeconds: number) => ({ name, tSeconds, utc: new Date(Date.UTC(2026, 8, 8) + tSeconds * 1000).toISOString() });

describe('pairEclipses', () => {
  it('pairs entries with exits per body and phase, penumbra before the umbra inside it', () => {
    const passages = pairEclipses(
      [at('earth-penumbra-entry', 100), at('earth-umbra-entry', 200), at('ascending-node', 250), at('earth-umbra-exit', 300), at('earth-penumbra-exit', 400)],
      1000,
    );
    expect(passages.map((p) => [p.body, p.phase, p.durationS, p.clipped])).toEqual([
      ['earth', 'penumbra', 300, false],
      ['earth', 'umbra', 100, false],
    ]);
  });

  it('clips a passage already under way at the start or unfinished at the end of the run', () => {
    const passages = pairEclipses([at('moon-shadow-exit', 50), at('moon-shadow-entry', 900)], 1000);
    expect(passages.map((p) => [p.entry?.tSeconds ?? null, p.exit?.tSeconds ?? null, p.durationS, p.clipped])).toEqual([
      [null, 50, 50, true],
      [900, null, 100, true],
    ]);
  });
});
