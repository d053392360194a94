/**
 * Named surface materials, so that a vehicle file can say `"front": "solar-cell"`.
 *
 * Each preset gives the split of sunlight (absorbed / specular / diffuse) and the infrared
 * emissivity of the face. The values are representative beginning-of-life figures for demo and
 * early-phase work, not a programme's measured data: real coatings vary by batch and degrade in
 * orbit (absorptance rises). Thermo-optical property tables (absorptance α and emissivity ε) are
 * in Gilmore (ed.), Spacecraft Thermal Control Handbook, Vol. 1 (Aerospace Press, 2002),
 * Appendix A; the split of the reflected part into specular and diffuse is rarely tabulated and
 * is an engineering assumption where `source` says so.
 */

/** The names of the material presets. The zod schema in packages/shared repeats this list. */
export const materialPresetNames = [
  'solar-cell',
  'solar-array-back',
  'osr-radiator',
  'mli-kapton',
  'white-paint',
  'black-paint',
  'aluminised-sail-film',
  'bare-aluminium',
] as const;

/** A material preset name. */
export type MaterialPresetName = (typeof materialPresetNames)[number];

/** One material: optics of its face and where the numbers come from. */
export interface MaterialPreset {
  /** Fraction of sunlight absorbed (solar absorptance α). */
  readonly absorbed: number;
  /** Fraction reflected specularly. */
  readonly specular: number;
  /** Fraction reflected diffusely (Lambertian). */
  readonly diffuse: number;
  /** Hemispherical infrared emissivity of the face. */
  readonly emissivity: number;
  /** Where the values come from. */
  readonly source: string;
}

/** The material presets, by name. */
export const materialPresets: Readonly<Record<MaterialPresetName, MaterialPreset>> = {
  'solar-cell': {
    // reflectivity 0.23 of which 0.85 specular: ρs = 0.1955, ρd = 0.0345
    absorbed: 0.77,
    specular: 0.1955,
    diffuse: 0.0345,
    emissivity: 0.85,
    source:
      'Fliegel, Gallini & Swift, J. Geophys. Res. 97(B1), 1992: GPS Block II solar panels, ' +
      'reflectivity 0.23 with specular fraction 0.85 (as tabulated in the PROPBOXW box-wing ' +
      'routine of Rodriguez-Solano); emissivity 0.85 of cells with cover glass from memory (Gilmore 2002)',
  },
  'solar-array-back': {
    absorbed: 0.9,
    specular: 0,
    diffuse: 0.1,
    emissivity: 0.85,
    source:
      'from memory: carbon-fibre face sheet or black-coated back of a rigid array, ' +
      'α ≈ 0.9, ε ≈ 0.85 (Gilmore 2002, App. A); reflection assumed diffuse',
  },
  'osr-radiator': {
    absorbed: 0.08,
    specular: 0.86,
    diffuse: 0.06,
    emissivity: 0.8,
    source:
      'from memory: silvered-quartz optical solar reflector, α ≈ 0.05-0.08 at beginning of ' +
      'life, ε ≈ 0.80 (Gilmore 2002, App. A); mostly specular (second-surface mirror), split assumed',
  },
  'mli-kapton': {
    // reflectivity 0.56 of which 0.20 specular: ρs = 0.112, ρd = 0.448
    absorbed: 0.44,
    specular: 0.112,
    diffuse: 0.448,
    emissivity: 0.65,
    source:
      'Ziebart, PhD thesis, University of East London, 2001: bus-surface assumption reflectivity ' +
      '0.56 with specular fraction 0.20 (as tabulated in PROPBOXW for GPS IIF and GLONASS); ' +
      'Kapton outer-layer emissivity 0.65 from memory (Gilmore 2002)',
  },
  'white-paint': {
    absorbed: 0.2,
    specular: 0,
    diffuse: 0.8,
    emissivity: 0.9,
    source: 'from memory: white thermal-control paint (S13G-LO, AZ-93 class), α ≈ 0.15-0.20, ε ≈ 0.9 (Gilmore 2002, App. A); diffuse',
  },
  'black-paint': {
    absorbed: 0.95,
    specular: 0,
    diffuse: 0.05,
    emissivity: 0.88,
    source: 'from memory: black thermal-control paint (Aeroglaze Z306 class), α ≈ 0.95, ε ≈ 0.88 (Gilmore 2002, App. A); diffuse',
  },
  'aluminised-sail-film': {
    // r = 0.88 of which s = 0.94 specular: ρs = 0.8272, ρd = 0.0528
    absorbed: 0.12,
    specular: 0.8272,
    diffuse: 0.0528,
    emissivity: 0.05,
    source:
      'McInnes, Solar Sailing (1999), §2.6, JPL square-sail coefficients r = 0.88, s = 0.94, ' +
      'εf = 0.05 (from memory)',
  },
  'bare-aluminium': {
    absorbed: 0.15,
    specular: 0.7,
    diffuse: 0.15,
    emissivity: 0.05,
    source:
      'from memory: polished aluminium alloy, α ≈ 0.1-0.2, ε ≈ 0.03-0.05 (Gilmore 2002, App. A); ' +
      'specular/diffuse split assumed',
  },
};

/** Whether `name` is one of `materialPresetNames`. */
export function isMaterialPresetName(name: unknown): name is MaterialPresetName {
  return typeof name === 'string' && (materialPresetNames as readonly string[]).includes(name);
}
