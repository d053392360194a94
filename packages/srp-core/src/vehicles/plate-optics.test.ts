import { describe, expect, it } from 'vitest';
import { materialPresets } from './material-presets';
import { resolvePlateOptics } from './plate-optics';
import { srpErrorFor } from './vehicle-test-helpers';

describe('resolvePlateOptics', () => {
  it('a preset on each side turns thermal re-emission on, each side seeing its own face as front', () => {
    const o = resolvePlateOptics('solar-cell', 'black-paint', 'plates.6');
    const cell = materialPresets['solar-cell'].emissivity;
    const paint = materialPresets['black-paint'].emissivity;
    expect(o.front).toMatchObject({ emissivityFront: cell, emissivityBack: paint });
    expect(o.back).toMatchObject({ emissivityFront: paint, emissivityBack: cell });
  });

  it('a one-sided plate given only a preset has no thermal term (its hidden face is unknown)', () => {
    const o = resolvePlateOptics('mli-kapton', undefined, 'plates.0');
    expect(o.front.emissivityFront).toBeUndefined();
    expect(o.back).toBeNull();
  });

  it('emissivities given on the front only are swapped for the back', () => {
    const o = resolvePlateOptics(
      { absorbed: 0.9, specular: 0, diffuse: 0.1, emissivityFront: 0.8, emissivityBack: 0.3 },
      { absorbed: 0.5, specular: 0.5, diffuse: 0 },
      'p',
    );
    expect(o.back).toEqual({ absorbed: 0.5, specular: 0.5, diffuse: 0, emissivityFront: 0.3, emissivityBack: 0.8 });
  });

  it('a back preset whose emissivity contradicts the front’s emissivityBack is refused, naming the back', () => {
    const front = { absorbed: 0.9, specular: 0, diffuse: 0.1, emissivityFront: 0.8, emissivityBack: 0.3 };
    expect(() => resolvePlateOptics(front, 'white-paint', 'plates.2')).toThrow(srpErrorFor('invalid_input', 'plates.2.back'));
  });

  it('optics that are neither an object nor a preset name are refused, naming the side', () => {
    expect(() => resolvePlateOptics(null as never, undefined, 'plates.1')).toThrow(srpErrorFor('invalid_input', 'plates.1.front'));
  });
});
