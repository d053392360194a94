import {
  materialPresetKeys,
  meshSamplesPerFacet,
  meshTableStepsDeg,
  sailOpticsPresetKeys,
  vehicleKinds,
  type VehicleSpec,
} from '@photon-ledger/shared';

/*
 * The editor's working copy of a vehicle: every number kept as the text the user typed (so that
 * "1e-", "-" or an empty cell survive while typing), and the data of every kind kept side by side
 * so that switching kind and back loses nothing. `draftToSpec` turns it into a candidate for the
 * shared vehicleSpecSchema (text that is not a number becomes NaN, which the schema names).
 */

/** A vehicle kind. */
export type VehicleKind = (typeof vehicleKinds)[number];
/** A material preset name. */
export type MaterialPresetKey = (typeof materialPresetKeys)[number];
/** A sail coefficient-set name. */
export type SailOpticsPresetKey = (typeof sailOpticsPresetKeys)[number];

/** [x, y, z] as typed. */
export type Vec3Draft = [string, string, string];

/** How a plate face is described: not at all (one-sided plate, back only), by a preset, or by fractions. */
export type FaceMode = 'none' | 'preset' | 'custom';

/** One face of a plate; the preset and the fractions are both kept whichever `mode` says. */
export interface FaceDraft {
  mode: FaceMode;
  preset: MaterialPresetKey;
  absorbed: string;
  specular: string;
  diffuse: string;
  /** Optional together with emissivityBack (thermal re-emission). */
  emissivityFront: string;
  emissivityBack: string;
}

/** One plate as typed. */
export interface PlateDraft {
  /** Stable key for React and for the editor (not part of the spec). */
  id: string;
  name: string;
  areaM2: string;
  normal: Vec3Draft;
  centroidM: Vec3Draft;
  front: FaceDraft;
  back: FaceDraft;
  /** Whether the plate turns to the Sun about `trackingAxis`. */
  tracking: boolean;
  trackingAxis: Vec3Draft;
  /** Whether the drive has limits. */
  trackingLimits: boolean;
  trackingMinDeg: string;
  trackingMaxDeg: string;
}

/** The optics of a sail as typed. */
export interface SailOpticsDraft {
  mode: 'ideal' | SailOpticsPresetKey | 'custom';
  r: string;
  s: string;
  emissivityFront: string;
  emissivityBack: string;
  nonLambertianFront: string;
  nonLambertianBack: string;
}

/** The optics of one group of mesh facets as typed: the front always, the back for a thin sheet (mode 'none': no back). */
export interface MeshGroupOpticsDraft {
  front: FaceDraft;
  back: FaceDraft;
}

/** A mesh vehicle as chosen: the mesh, its optics (default and per group) and the table settings. */
export interface MeshDraft {
  /** Id of an imported mesh of the mission; '' until one is chosen. */
  meshId: string;
  /** Optics of every group not listed in `groups`. */
  defaultOptics: MeshGroupOpticsDraft;
  /** Groups with optics of their own, by group name. */
  groups: Readonly<Record<string, MeshGroupOpticsDraft>>;
  /** Table grid step (°), one of meshTableStepsDeg. */
  stepDeg: number;
  /** Shadow samples per facet, one of meshSamplesPerFacet. */
  samplesPerFacet: number;
  specularBounce: boolean;
}

/** The whole vehicle as typed. */
export interface VehicleDraft {
  kind: VehicleKind;
  name: string;
  description: string;
  massKg: string;
  centreOfMassM: Vec3Draft;
  plates: PlateDraft[];
  cannonball: { areaM2: string; cr: string };
  sail: { areaM2: string; normal: Vec3Draft; centroidM: Vec3Draft; optics: SailOpticsDraft };
  mesh: MeshDraft;
}

/** Default table settings of a new mesh vehicle (the schema's defaults). */
export const DEFAULT_MESH_STEP_DEG: (typeof meshTableStepsDeg)[number] = 5;
export const DEFAULT_MESH_SAMPLES: (typeof meshSamplesPerFacet)[number] = 4;

/** Mesh optics as a new vehicle starts them: MLI on the front, no back. */
export function emptyMeshGroupOptics(): MeshGroupOpticsDraft {
  return { front: emptyFace('preset', 'mli-kapton'), back: emptyFace('none', 'mli-kapton') };
}

let plateCounter = 0;
/** A fresh plate key. */
export function newPlateId(): string {
  plateCounter += 1;
  return `plate-${plateCounter}`;
}

const text = (n: number | undefined): string => (n === undefined ? '' : String(n));
const vecText = (v: readonly [number, number, number] | undefined, fallback: Vec3Draft = ['', '', '']): Vec3Draft =>
  v ? [String(v[0]), String(v[1]), String(v[2])] : [...fallback];

/** A face with nothing typed yet. */
export function emptyFace(mode: FaceMode, preset: MaterialPresetKey = 'mli-kapton'): FaceDraft {
  return { mode, preset, absorbed: '', specular: '', diffuse: '', emissivityFront: '', emissivityBack: '' };
}

const defaultSailOptics: SailOpticsDraft = {
  mode: 'ideal',
  r: '',
  s: '',
  emissivityFront: '',
  emissivityBack: '',
  nonLambertianFront: '',
  nonLambertianBack: '',
};

/** The draft of a new vehicle: a plate model with no plates yet, everything else empty. */
export function emptyDraft(): VehicleDraft {
  return {
    kind: 'plates',
    name: '',
    description: '',
    massKg: '',
    centreOfMassM: ['0', '0', '0'],
    plates: [],
    cannonball: { areaM2: '', cr: '1.3' },
    sail: { areaM2: '', normal: ['0', '0', '1'], centroidM: ['0', '0', '0'], optics: { ...defaultSailOptics } },
    mesh: {
      meshId: '',
      defaultOptics: emptyMeshGroupOptics(),
      groups: {},
      stepDeg: DEFAULT_MESH_STEP_DEG,
      samplesPerFacet: DEFAULT_MESH_SAMPLES,
      specularBounce: false,
    },
  };
}

/** Outward directions a new plate takes in turn, so that adding plates builds up a box. */
const boxNormals: readonly Vec3Draft[] = [
  ['1', '0', '0'],
  ['-1', '0', '0'],
  ['0', '1', '0'],
  ['0', '-1', '0'],
  ['0', '0', '1'],
  ['0', '0', '-1'],
];

/** A name not used by any of `plates`: `base`, or `base 2`, `base 3`... */
export function uniquePlateName(plates: readonly PlateDraft[], base: string): string {
  const used = new Set(plates.map((p) => p.name.trim()));
  if (!used.has(base)) return base;
  for (let n = 2; ; n += 1) {
    const candidate = `${base} ${n}`;
    if (!used.has(candidate)) return candidate;
  }
}

/**
 * The plate "Add plate" appends: 1 m² of MLI, its normal the next face of a 1 m box
 * (+x, -x, +y, -y, +z, -z) and its centroid on that face, so a few clicks give a visible body.
 */
export function newPlate(existing: readonly PlateDraft[]): PlateDraft {
  const normal = boxNormals[existing.length % boxNormals.length]!;
  return {
    id: newPlateId(),
    name: uniquePlateName(existing, `plate ${existing.length + 1}`),
    areaM2: '1',
    normal: [...normal],
    centroidM: [String(Number(normal[0]) * 0.5), String(Number(normal[1]) * 0.5), String(Number(normal[2]) * 0.5)].map(
      (c) => (c === '-0' ? '0' : c),
    ) as Vec3Draft,
    front: emptyFace('preset', 'mli-kapton'),
    back: emptyFace('none', 'mli-kapton'),
    tracking: false,
    trackingAxis: ['0', '1', '0'],
    trackingLimits: false,
    trackingMinDeg: '-180',
    trackingMaxDeg: '180',
  };
}

/** A copy of `plate` with a new key and a free name ("north wing copy"). */
export function copyPlate(plate: PlateDraft, existing: readonly PlateDraft[]): PlateDraft {
  return {
    ...plate,
    id: newPlateId(),
    name: uniquePlateName(existing, `${plate.name.trim() || 'plate'} copy`),
    normal: [...plate.normal],
    centroidM: [...plate.centroidM],
    trackingAxis: [...plate.trackingAxis],
    front: { ...plate.front },
    back: { ...plate.back },
  };
}

type FaceSpec = string | { absorbed: number; specular: number; diffuse: number; emissivityFront?: number; emissivityBack?: number };

function faceFromSpec(face: FaceSpec | undefined, mode: 'front' | 'back'): FaceDraft {
  if (face === undefined) return emptyFace(mode === 'front' ? 'preset' : 'none');
  if (typeof face === 'string') return emptyFace('preset', face as MaterialPresetKey);
  return {
    mode: 'custom',
    preset: 'mli-kapton',
    absorbed: text(face.absorbed),
    specular: text(face.specular),
    diffuse: text(face.diffuse),
    emissivityFront: text(face.emissivityFront),
    emissivityBack: text(face.emissivityBack),
  };
}

/** The draft of a saved spec (an existing vehicle's latest revision). */
export function draftFromSpec(spec: VehicleSpec): VehicleDraft {
  const draft = emptyDraft();
  draft.kind = spec.kind;
  draft.name = spec.name;
  draft.description = spec.description ?? '';
  draft.massKg = text(spec.massKg);
  draft.centreOfMassM = vecText(spec.centreOfMassM);
  if (spec.kind === 'cannonball') {
    draft.cannonball = { areaM2: text(spec.areaM2), cr: text(spec.cr) };
  } else if (spec.kind === 'sail') {
    const optics = spec.optics;
    draft.sail = {
      areaM2: text(spec.areaM2),
      normal: vecText(spec.normal),
      centroidM: vecText(spec.centroidM),
      optics:
        typeof optics === 'string'
          ? { ...defaultSailOptics, mode: optics }
          : {
              mode: 'custom',
              r: text(optics.r),
              s: text(optics.s),
              emissivityFront: text(optics.emissivityFront),
              emissivityBack: text(optics.emissivityBack),
              nonLambertianFront: text(optics.nonLambertianFront),
              nonLambertianBack: text(optics.nonLambertianBack),
            },
    };
  } else if (spec.kind === 'mesh') {
    const groupOptics = (g: { front: FaceSpec; back?: FaceSpec | undefined }): MeshGroupOpticsDraft => ({
      front: faceFromSpec(g.front, 'front'),
      back: faceFromSpec(g.back, 'back'),
    });
    draft.mesh = {
      meshId: spec.meshId,
      defaultOptics: groupOptics(spec.optics.default),
      groups: Object.fromEntries(Object.entries(spec.optics.groups ?? {}).map(([name, g]) => [name, groupOptics(g)])),
      stepDeg: spec.table.stepDeg,
      samplesPerFacet: spec.table.samplesPerFacet,
      specularBounce: spec.table.specularBounce,
    };
  } else {
    draft.plates = spec.plates.map((p) => ({
      id: newPlateId(),
      name: p.name,
      areaM2: text(p.areaM2),
      normal: vecText(p.normal),
      centroidM: vecText(p.centroidM),
      front: faceFromSpec(p.front, 'front'),
      back: faceFromSpec(p.back, 'back'),
      tracking: p.trackingAxis !== undefined,
      trackingAxis: vecText(p.trackingAxis, ['0', '1', '0']),
      trackingLimits: p.trackingLimitsDeg !== undefined,
      trackingMinDeg: p.trackingLimitsDeg ? text(p.trackingLimitsDeg[0]) : '-180',
      trackingMaxDeg: p.trackingLimitsDeg ? text(p.trackingLimitsDeg[1]) : '180',
    }));
  }
  return draft;
}

const DECIMAL = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

/** The number a cell holds; NaN for empty or malformed text (the schema then names the field). */
export function parseNumber(value: string): number {
  const trimmed = value.trim();
  return DECIMAL.test(trimmed) ? Number(trimmed) : Number.NaN;
}

const vecNumbers = (v: Vec3Draft): [number, number, number] => [parseNumber(v[0]), parseNumber(v[1]), parseNumber(v[2])];

function faceToSpec(face: FaceDraft): unknown {
  if (face.mode === 'none') return undefined;
  if (face.mode === 'preset') return face.preset;
  const out: Record<string, number> = {
    absorbed: parseNumber(face.absorbed),
    specular: parseNumber(face.specular),
    diffuse: parseNumber(face.diffuse),
  };
  // Emissivities are optional: an empty cell leaves the key out.
  if (face.emissivityFront.trim() !== '') out.emissivityFront = parseNumber(face.emissivityFront);
  if (face.emissivityBack.trim() !== '') out.emissivityBack = parseNumber(face.emissivityBack);
  return out;
}

/** The plate as the vehicle file holds it (a candidate: the schema still checks it). */
export function plateToSpec(plate: PlateDraft): Record<string, unknown> {
  const out: Record<string, unknown> = {
    name: plate.name,
    areaM2: parseNumber(plate.areaM2),
    normal: vecNumbers(plate.normal),
    centroidM: vecNumbers(plate.centroidM),
    front: faceToSpec(plate.front),
  };
  const back = faceToSpec(plate.back);
  if (back !== undefined) out.back = back;
  if (plate.tracking) {
    out.trackingAxis = vecNumbers(plate.trackingAxis);
    if (plate.trackingLimits) out.trackingLimitsDeg = [parseNumber(plate.trackingMinDeg), parseNumber(plate.trackingMaxDeg)];
  }
  return out;
}

/** The draft as a candidate vehicle file, for `vehicleSpecSchema.safeParse`. */
export function draftToSpec(draft: VehicleDraft): Record<string, unknown> {
  const base: Record<string, unknown> = {
    kind: draft.kind,
    name: draft.name,
    massKg: parseNumber(draft.massKg),
    centreOfMassM: vecNumbers(draft.centreOfMassM),
  };
  if (draft.description.trim() !== '') base.description = draft.description;
  if (draft.kind === 'cannonball') {
    return { ...base, areaM2: parseNumber(draft.cannonball.areaM2), cr: parseNumber(draft.cannonball.cr) };
  }
  if (draft.kind === 'sail') {
    const o = draft.sail.optics;
    const optics =
      o.mode === 'custom'
        ? {
            r: parseNumber(o.r),
            s: parseNumber(o.s),
            emissivityFront: parseNumber(o.emissivityFront),
            emissivityBack: parseNumber(o.emissivityBack),
            nonLambertianFront: parseNumber(o.nonLambertianFront),
            nonLambertianBack: parseNumber(o.nonLambertianBack),
          }
        : o.mode;
    return {
      ...base,
      areaM2: parseNumber(draft.sail.areaM2),
      normal: vecNumbers(draft.sail.normal),
      centroidM: vecNumbers(draft.sail.centroidM),
      optics,
    };
  }
  if (draft.kind === 'mesh') return { ...base, ...meshToSpec(draft.mesh) };
  return { ...base, plates: draft.plates.map(plateToSpec) };
}

function meshGroupToSpec(g: MeshGroupOpticsDraft): Record<string, unknown> {
  // The front always has optics: a 'none' front (never offered) is sent as its preset.
  const front = g.front.mode === 'none' ? g.front.preset : faceToSpec(g.front);
  const back = faceToSpec(g.back);
  return back === undefined ? { front } : { front, back };
}

/** The mesh-kind fields of a candidate vehicle file. */
export function meshToSpec(mesh: MeshDraft): Record<string, unknown> {
  const groups = Object.entries(mesh.groups);
  return {
    meshId: mesh.meshId,
    optics: {
      default: meshGroupToSpec(mesh.defaultOptics),
      ...(groups.length > 0 ? { groups: Object.fromEntries(groups.map(([name, g]) => [name, meshGroupToSpec(g)])) } : {}),
    },
    table: { stepDeg: mesh.stepDeg, samplesPerFacet: mesh.samplesPerFacet, specularBounce: mesh.specularBounce },
  };
}
