import { describe, expect, it } from 'vitest';
import { materialPresetNames, materialPresets } from './material-presets';
import { OPTICS_SUM_TOLERANCE, checkSurfaceOptics } from './surface-optics';

describe('material presets', () => {
  it('lists exactly the presets it defines', () => {
    expect(Object.keys(materialPresets).sort()).toEqual([...materialPresetNames].sort());
  });

  for (const name of materialPresetNames) {
    it(`${name} is valid optics with an emissivity in (0, 1] and a stated source`, () => {
      const p = materialPresets[name];
      expect(() => checkSurfaceOptics({ ...p, emissivityFront: p.emissivity, emissivityBack: p.emissivity }, name)).not.toThrow();
      expect(Math.abs(p.absorbed + p.specular + p.diffuse - 1)).toBeLessThanOrEqual(OPTICS_SUM_TOLERANCE);
      expect(p.emissivity).toBeGreaterThan(0);
      expect(p.emissivity).toBeLessThanOrEqual(1);
      expect(p.source.length).toBeGreaterThan(20);
    });
  }

  it('solar-cell reproduces the GPS Block II panel: reflectivity 0.23, 85 % of it specular', () => {
    // source: Fliegel, Gallini & Swift, J. Geophys. Res. 97(B1), 1992, as tabulated in PROPBOXW
    const p = materialPresets['solar-cell'];
    expect(p.specular + p.diffuse).toBeCloseTo(0.23, 12); // sums of 4-decimal inputs: 1e-12
    expect(p.specular / (p.specular + p.diffuse)).toBeCloseTo(0.85, 12);
  });

  it('mli-kapton reproduces Ziebart’s bus assumption: reflectivity 0.56, 20 % of it specular', () => {
    // source: Ziebart, PhD thesis (2001), as tabulated in PROPBOXW
    const p = materialPresets['mli-kapton'];
    expect(p.specular + p.diffuse).toBeCloseTo(0.56, 12);
    expect(p.specular / (p.specular + p.diffuse)).toBeCloseTo(0.2, 12);
  });

  it('aluminised-sail-film matches the square-sail front: r = 0.88, s = 0.94, εf = 0.05', () => {
    // source: McInnes, Solar Sailing (1999), §2.6 (from memory)
    const p = materialPresets['aluminised-sail-film'];
    expect(p.specular + p.diffuse).toBeCloseTo(0.88, 12);
    expect(p.specular / (p.specular + p.diffuse)).toBeCloseTo(0.94, 12);
    expect(p.emissivity).toBe(0.05);
  });
});
