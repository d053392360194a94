import {
  attitudeLawSchema,
  fieldErrors,
  initialOrbitSchema,
  sailLocallyOptimalLawSchema,
  scenarioBodySchema,
  type CentralBody,
  type MissionRegime,
  type Scenario,
  type ScenarioBody,
  type SecondaryReference,
} from '@photon-ledger/shared';

/*
 * The scenario form's state as typed (numbers kept as text, so "1e-10" and a half-typed "-" stay as
 * the user wrote them), and the two ways between it and the API's body: `draftFromSpec` to edit a
 * stored scenario, `buildScenarioBody` to check a draft with the shared schema before it is sent.
 * Field errors are keyed by the body's dot path (`spec.orbit.eccentricity`), as the API keys them.
 */

/** Three components as typed. */
export type Vec3Text = [string, string, string];
/** Four components as typed. */
export type Vec4Text = [string, string, string, string];

/** How the initial orbit is given. */
export type OrbitKind = 'keplerian' | 'cartesian';
/** The attitude laws a scenario may use, as the form offers them. */
export const scenarioAttitudeLaws = [
  'sun-pointing',
  'inertial',
  'lvlh',
  'sail-cone-clock',
  'sail-locally-optimal',
  'tabulated',
] as const;
/** One of `scenarioAttitudeLaws`. */
export type ScenarioAttitudeLaw = (typeof scenarioAttitudeLaws)[number];
/** Shadow models. */
export type ShadowModel = 'none' | 'cylindrical' | 'conical';

/** The scenario form's state. */
export interface ScenarioDraft {
  name: string;
  description: string;
  /** The chosen vehicle ('' until chosen). */
  vehicleId: string;
  /** The chosen revision of that vehicle: the spec's `vehicle.ref` ('' until chosen). */
  vehicleRevisionId: string;
  orbitKind: OrbitKind;
  /** Fixed by the mission's regime. */
  centralBody: CentralBody;
  /** ISO 8601 UTC with Z. */
  epochUtc: string;
  semiMajorAxisKm: string;
  eccentricity: string;
  inclinationDeg: string;
  raanDeg: string;
  argPeriapsisDeg: string;
  trueAnomalyDeg: string;
  positionKm: Vec3Text;
  velocityKmS: Vec3Text;
  spanDays: string;
  outputStepS: string;
  /** '0' or '2' to '6'. */
  zonalDegree: string;
  sun: boolean;
  moon: boolean;
  planets: string[];
  srp: boolean;
  drag: boolean;
  dragCd: string;
  dragAreaM2: string;
  shadowModel: ShadowModel;
  shadowEarth: boolean;
  shadowMoon: boolean;
  attitudeLaw: ScenarioAttitudeLaw;
  /** Inertial law [w, x, y, z]. */
  quaternion: Vec4Text;
  sunAxisBody: Vec3Text;
  /** Secondary axis of the sun-pointing law, or (optional) of the sail cone/clock law. */
  secondaryAxisBody: Vec3Text;
  secondaryReference: SecondaryReference;
  lvlhOffset: boolean;
  offsetQuaternion: Vec4Text;
  coneDeg: string;
  clockDeg: string;
  normalAxisBody: Vec3Text;
  sailSecondary: boolean;
  direction: 'raise' | 'lower';
  profileId: string;
  outside: 'refuse' | 'clamp';
  /** Solar constant override (W/m²); '' for the default 1361. */
  s0WM2: string;
  relTol: string;
  absTol: string;
  /** '' for no limit. */
  maxStepS: string;
  momentum: boolean;
  wheelCapacityNms: string;
  dumpThresholdFraction: string;
  eventNodes: boolean;
  /** Radii separated by commas or spaces (km). */
  eventRadiiKm: string;
  sailTarget: boolean;
  sailTargetRadiusAu: string;
}

/** The central body a mission's regime implies. */
export function centralBodyOf(regime: MissionRegime): CentralBody {
  return regime === 'heliocentric' ? 'sun' : 'earth';
}

/** Today at 00:00:00 UTC, ISO with Z (the default epoch). */
export function todayUtcMidnight(now = new Date()): string {
  return `${now.toISOString().slice(0, 10)}T00:00:00Z`;
}

/**
 * A new scenario's draft. Earth orbit: GEO (42164 km, e 0.0002, i 0.05°), J2–J6, Sun, Moon, SRP,
 * conical shadow of Earth and Moon, Sun-pointing +z with +y to the orbit normal. Heliocentric: 1 AU,
 * SRP only, no shadow, sail steered at the locally optimal attitude. One day sampled every 600 s.
 */
export function defaultDraft(regime: MissionRegime, now = new Date()): ScenarioDraft {
  const helio = regime === 'heliocentric';
  return {
    name: '',
    description: '',
    vehicleId: '',
    vehicleRevisionId: '',
    orbitKind: 'keplerian',
    centralBody: centralBodyOf(regime),
    epochUtc: todayUtcMidnight(now),
    // 1 AU = 149 597 870.7 km (IAU 2012 Resolution B2).
    semiMajorAxisKm: helio ? '149597870.7' : '42164',
    eccentricity: helio ? '0.0167' : '0.0002',
    inclinationDeg: helio ? '23.44' : '0.05',
    raanDeg: '0',
    argPeriapsisDeg: '0',
    trueAnomalyDeg: '0',
    positionKm: ['', '', ''],
    velocityKmS: ['', '', ''],
    spanDays: '1',
    outputStepS: '600',
    zonalDegree: helio ? '0' : '6',
    sun: !helio,
    moon: !helio,
    planets: [],
    srp: true,
    drag: false,
    dragCd: '2.2',
    dragAreaM2: '',
    shadowModel: helio ? 'none' : 'conical',
    shadowEarth: true,
    shadowMoon: true,
    attitudeLaw: helio ? 'sail-locally-optimal' : 'sun-pointing',
    quaternion: ['1', '0', '0', '0'],
    sunAxisBody: ['0', '0', '1'],
    secondaryAxisBody: ['0', '1', '0'],
    secondaryReference: 'orbit-normal',
    lvlhOffset: false,
    offsetQuaternion: ['1', '0', '0', '0'],
    coneDeg: '35.26',
    clockDeg: '90',
    normalAxisBody: ['0', '0', '1'],
    sailSecondary: false,
    direction: 'raise',
    profileId: '',
    outside: 'refuse',
    s0WM2: '',
    relTol: '1e-10',
    absTol: '1e-9',
    maxStepS: '',
    momentum: false,
    wheelCapacityNms: '',
    dumpThresholdFraction: '0.8',
    eventNodes: false,
    eventRadiiKm: '',
    sailTarget: false,
    sailTargetRadiusAu: '',
  };
}

const text = (n: number | undefined): string => (n === undefined ? '' : String(n));
const vec3 = (v: readonly number[] | undefined, fallback: Vec3Text): Vec3Text =>
  v ? [text(v[0]), text(v[1]), text(v[2])] : fallback;
const vec4 = (v: readonly number[] | undefined, fallback: Vec4Text): Vec4Text =>
  v ? [text(v[0]), text(v[1]), text(v[2]), text(v[3])] : fallback;

/** The draft of a stored scenario, for editing; `vehicleId` is the vehicle its revision belongs to. */
export function draftFromSpec(
  name: string,
  spec: Scenario,
  vehicleId: string,
  regime: MissionRegime,
): ScenarioDraft {
  const base = defaultDraft(regime);
  const { orbit, forces, shadow, attitude, tolerances } = spec;
  const draft: ScenarioDraft = {
    ...base,
    name,
    description: spec.description ?? '',
    vehicleId,
    vehicleRevisionId: 'ref' in spec.vehicle ? spec.vehicle.ref : '',
    orbitKind: orbit.kind,
    centralBody: orbit.centralBody,
    epochUtc: orbit.epochUtc,
    spanDays: text(spec.spanDays),
    outputStepS: text(spec.outputStepS),
    zonalDegree: String(forces.zonalDegree),
    sun: forces.sun,
    moon: forces.moon,
    planets: [...forces.planets],
    srp: forces.srp,
    drag: forces.drag !== undefined,
    dragCd: forces.drag ? text(forces.drag.cd) : base.dragCd,
    dragAreaM2: forces.drag ? text(forces.drag.areaM2) : base.dragAreaM2,
    shadowModel: shadow.model,
    shadowEarth: shadow.bodies.includes('earth'),
    shadowMoon: shadow.bodies.includes('moon'),
    attitudeLaw: attitude.law,
    s0WM2: text(spec.s0WM2),
    relTol: text(tolerances.relTol),
    absTol: text(tolerances.absTol),
    maxStepS: text(tolerances.maxStepS),
    momentum: spec.momentum !== undefined,
    wheelCapacityNms: spec.momentum ? text(spec.momentum.wheelCapacityNms) : base.wheelCapacityNms,
    dumpThresholdFraction: spec.momentum ? text(spec.momentum.dumpThresholdFraction) : base.dumpThresholdFraction,
    eventNodes: spec.events.nodes,
    eventRadiiKm: spec.events.radiiKm.join(', '),
    sailTarget: spec.sail !== undefined,
    sailTargetRadiusAu: spec.sail ? text(spec.sail.targetRadiusAu) : base.sailTargetRadiusAu,
  };
  if (orbit.kind === 'keplerian') {
    Object.assign(draft, {
      semiMajorAxisKm: text(orbit.semiMajorAxisKm),
      eccentricity: text(orbit.eccentricity),
      inclinationDeg: text(orbit.inclinationDeg),
      raanDeg: text(orbit.raanDeg),
      argPeriapsisDeg: text(orbit.argPeriapsisDeg),
      trueAnomalyDeg: text(orbit.trueAnomalyDeg),
    });
  } else {
    draft.positionKm = vec3(orbit.positionKm, base.positionKm);
    draft.velocityKmS = vec3(orbit.velocityKmS, base.velocityKmS);
  }
  switch (attitude.law) {
    case 'inertial':
      draft.quaternion = vec4(attitude.quaternion, base.quaternion);
      break;
    case 'sun-pointing':
      draft.sunAxisBody = vec3(attitude.sunAxisBody, base.sunAxisBody);
      draft.secondaryAxisBody = vec3(attitude.secondaryAxisBody, base.secondaryAxisBody);
      draft.secondaryReference = attitude.secondaryReference;
      break;
    case 'lvlh':
      draft.lvlhOffset = attitude.offsetQuaternion !== undefined;
      draft.offsetQuaternion = vec4(attitude.offsetQuaternion, base.offsetQuaternion);
      break;
    case 'sail-cone-clock':
      draft.coneDeg = text(attitude.coneDeg);
      draft.clockDeg = text(attitude.clockDeg);
      draft.normalAxisBody = vec3(attitude.normalAxisBody, base.normalAxisBody);
      draft.sailSecondary = attitude.secondaryAxisBody !== undefined;
      draft.secondaryAxisBody = vec3(attitude.secondaryAxisBody, base.secondaryAxisBody);
      break;
    case 'sail-locally-optimal':
      draft.direction = attitude.direction;
      draft.normalAxisBody = vec3(attitude.normalAxisBody, base.normalAxisBody);
      break;
    case 'tabulated':
      draft.profileId = attitude.profileId ?? '';
      draft.outside = attitude.outside ?? 'refuse';
      break;
  }
  return draft;
}

/**
 * A typed number: undefined when blank (the schema then says the field is required), NaN when it is
 * not a number (the schema says it must be a finite number).
 */
export function parseNumber(value: string): number | undefined {
  const trimmed = value.trim();
  if (trimmed === '') return undefined;
  // Number('0x10') and Number('1_0') are not what a person means by a number of km.
  if (!/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(trimmed)) return Number.NaN;
  return Number(trimmed);
}

function numbers(values: readonly string[]): Array<number | undefined> {
  return values.map(parseNumber);
}

/** The spec's attitude law from the draft (unchecked). */
function attitudeOf(d: ScenarioDraft): Record<string, unknown> {
  switch (d.attitudeLaw) {
    case 'inertial':
      return { law: 'inertial', quaternion: numbers(d.quaternion) };
    case 'sun-pointing':
      return {
        law: 'sun-pointing',
        sunAxisBody: numbers(d.sunAxisBody),
        secondaryAxisBody: numbers(d.secondaryAxisBody),
        secondaryReference: d.secondaryReference,
      };
    case 'lvlh':
      return d.lvlhOffset ? { law: 'lvlh', offsetQuaternion: numbers(d.offsetQuaternion) } : { law: 'lvlh' };
    case 'sail-cone-clock':
      return {
        law: 'sail-cone-clock',
        coneDeg: parseNumber(d.coneDeg),
        clockDeg: parseNumber(d.clockDeg),
        normalAxisBody: numbers(d.normalAxisBody),
        ...(d.sailSecondary ? { secondaryAxisBody: numbers(d.secondaryAxisBody) } : {}),
      };
    case 'sail-locally-optimal':
      return { law: 'sail-locally-optimal', direction: d.direction, normalAxisBody: numbers(d.normalAxisBody) };
    case 'tabulated':
      return { law: 'tabulated', ...(d.profileId ? { profileId: d.profileId } : {}), outside: d.outside };
  }
}

/** Radii typed as "42164, 50000" (km). */
function radii(value: string): Array<number | undefined> {
  return value
    .split(/[\s,;]+/)
    .filter((part) => part !== '')
    .map(parseNumber);
}

/** The request body as the draft says it, before any check. */
export function bodyFromDraft(d: ScenarioDraft): { name: string; spec: Record<string, unknown> } {
  const helio = d.centralBody === 'sun';
  const common = { epochUtc: d.epochUtc.trim(), centralBody: d.centralBody, frame: 'EQJ' };
  const orbit =
    d.orbitKind === 'keplerian'
      ? {
          kind: 'keplerian',
          ...common,
          semiMajorAxisKm: parseNumber(d.semiMajorAxisKm),
          eccentricity: parseNumber(d.eccentricity),
          inclinationDeg: parseNumber(d.inclinationDeg),
          raanDeg: parseNumber(d.raanDeg),
          argPeriapsisDeg: parseNumber(d.argPeriapsisDeg),
          trueAnomalyDeg: parseNumber(d.trueAnomalyDeg),
        }
      : { kind: 'cartesian', ...common, positionKm: numbers(d.positionKm), velocityKmS: numbers(d.velocityKmS) };
  const shadowBodies = [...(d.shadowEarth ? ['earth'] : []), ...(d.shadowMoon ? ['moon'] : [])];
  const spec: Record<string, unknown> = {
    name: d.name,
    ...(d.description.trim() ? { description: d.description } : {}),
    vehicle: { ref: d.vehicleRevisionId },
    orbit,
    spanDays: parseNumber(d.spanDays),
    outputStepS: parseNumber(d.outputStepS),
    forces: helio
      ? { zonalDegree: 0, sun: false, moon: false, planets: d.planets, srp: d.srp }
      : {
          zonalDegree: Number(d.zonalDegree),
          sun: d.sun,
          moon: d.moon,
          planets: [],
          srp: d.srp,
          ...(d.drag ? { drag: { cd: parseNumber(d.dragCd), areaM2: parseNumber(d.dragAreaM2) } } : {}),
        },
    // Bodies matter only to a shadow model on an Earth orbit; elsewhere the schema's default stands.
    shadow: {
      model: d.shadowModel,
      bodies: helio || (d.shadowModel === 'none' && shadowBodies.length === 0) ? ['earth', 'moon'] : shadowBodies,
    },
    attitude: attitudeOf(d),
    ...(d.s0WM2.trim() ? { s0WM2: parseNumber(d.s0WM2) } : {}),
    tolerances: {
      relTol: parseNumber(d.relTol),
      absTol: parseNumber(d.absTol),
      ...(d.maxStepS.trim() ? { maxStepS: parseNumber(d.maxStepS) } : {}),
    },
    ...(d.momentum
      ? {
          momentum: {
            wheelCapacityNms: parseNumber(d.wheelCapacityNms),
            dumpThresholdFraction: parseNumber(d.dumpThresholdFraction),
          },
        }
      : {}),
    events: { nodes: d.eventNodes, radiiKm: radii(d.eventRadiiKm) },
    ...(d.sailTarget ? { sail: { targetRadiusAu: parseNumber(d.sailTargetRadiusAu) } } : {}),
    requirements: [],
  };
  return { name: d.name, spec };
}

/** Field errors keyed by dot path, e.g. `spec.orbit.eccentricity`. */
export type FieldErrors = Readonly<Record<string, string>>;

/** The outcome of checking a draft: the body to send, or the errors to show. */
export type DraftCheck = { ok: true; body: ScenarioBody } | { ok: false; errors: FieldErrors };

/**
 * Checks a draft with the shared `scenarioBodySchema`, as the API will. A union that fails as a
 * whole (an attitude law with a bad parameter) is checked again with the chosen law's own schema,
 * so that the message lands on the parameter rather than on the law.
 */
export function buildScenarioBody(draft: ScenarioDraft): DraftCheck {
  const body = bodyFromDraft(draft);
  const parsed = scenarioBodySchema.safeParse(body);
  if (parsed.success) return { ok: true, body: parsed.data };
  const errors: Record<string, string> = { ...fieldErrors(parsed.error) };
  if (errors['spec.attitude'] !== undefined) {
    const lawSchema = draft.attitudeLaw === 'sail-locally-optimal' ? sailLocallyOptimalLawSchema : attitudeLawSchema;
    const law = lawSchema.safeParse(body.spec.attitude);
    if (!law.success) {
      delete errors['spec.attitude'];
      for (const [path, message] of Object.entries(fieldErrors(law.error))) {
        const key = path === '(root)' ? 'spec.attitude' : `spec.attitude.${path}`;
        if (!(key in errors)) errors[key] = message;
      }
    }
  }
  if (errors['spec.vehicle'] !== undefined || errors['spec.vehicle.ref'] !== undefined) {
    delete errors['spec.vehicle'];
    errors['spec.vehicle.ref'] = draft.vehicleId
      ? 'Choose a revision of the vehicle.'
      : 'Choose the vehicle this scenario flies.';
  }
  // The spec repeats the scenario's name; its message belongs to the one name field.
  if (errors['spec.name'] !== undefined) {
    errors.name ??= errors['spec.name'];
    delete errors['spec.name'];
  }
  return { ok: false, errors };
}

/**
 * The field an error path belongs to: the longest of `fieldKeys` equal to it or a prefix of it
 * (`spec.orbit.positionKm.1` belongs to `spec.orbit.positionKm`); undefined when none fits.
 */
export function fieldKeyFor(path: string, fieldKeys: readonly string[]): string | undefined {
  let best: string | undefined;
  for (const key of fieldKeys) {
    if ((path === key || path.startsWith(`${key}.`)) && (best === undefined || key.length > best.length)) best = key;
  }
  return best;
}

/**
 * Sorts errors onto the form's fields: `byField` for the fields on screen (the first message each
 * keeps), `unplaced` for paths no field fits (shown at the top of the form).
 */
export function placeErrors(
  errors: FieldErrors,
  fieldKeys: readonly string[],
): { byField: Record<string, string>; unplaced: Array<[string, string]> } {
  const byField: Record<string, string> = {};
  const unplaced: Array<[string, string]> = [];
  for (const [path, message] of Object.entries(errors)) {
    const key = fieldKeyFor(path, fieldKeys);
    if (key === undefined) unplaced.push([path, message]);
    else byField[key] ??= message;
  }
  return { byField, unplaced };
}

/** What the orbit conversion needs from srp-core (loaded lazily by the form). */
export interface KeplerTools {
  keplerianToCartesian: typeof import('@photon-ledger/srp-core').keplerianToCartesian;
  cartesianToKeplerian: typeof import('@photon-ledger/srp-core').cartesianToKeplerian;
  createKeplerianElements: typeof import('@photon-ledger/srp-core').createKeplerianElements;
  EARTH_GM: number;
  SUN_GM: number;
}

const DEG = Math.PI / 180;

function round(value: number, digits: number): string {
  return String(Number(value.toPrecision(digits)));
}

/**
 * The draft with its orbit given the other way. When the current orbit is complete and valid the
 * same state is carried over (elements ↔ position and velocity, two-body, the central body's GM);
 * otherwise only the kind changes and the other fields keep what they had.
 */
export function switchOrbitKind(draft: ScenarioDraft, kind: OrbitKind, tools: KeplerTools): ScenarioDraft {
  if (draft.orbitKind === kind) return draft;
  const next: ScenarioDraft = { ...draft, orbitKind: kind };
  const mu = draft.centralBody === 'sun' ? tools.SUN_GM : tools.EARTH_GM;
  const orbit = initialOrbitSchema.safeParse(bodyFromDraft(draft).spec.orbit);
  if (!orbit.success) return next;
  try {
    if (orbit.data.kind === 'keplerian') {
      const o = orbit.data;
      const state = tools.keplerianToCartesian(
        new Float64Array(6),
        {
          semiMajorAxisM: o.semiMajorAxisKm * 1000,
          eccentricity: o.eccentricity,
          inclinationRad: o.inclinationDeg * DEG,
          raanRad: o.raanDeg * DEG,
          argPeriapsisRad: o.argPeriapsisDeg * DEG,
          trueAnomalyRad: o.trueAnomalyDeg * DEG,
        },
        mu,
      );
      // 13 significant figures (micrometres at GEO): enough for the elements to come back as typed.
      const km = (i: number) => round((state[i] ?? 0) / 1000, 13);
      next.positionKm = [km(0), km(1), km(2)];
      next.velocityKmS = [km(3), km(4), km(5)];
    } else {
      const o = orbit.data;
      const state = [...o.positionKm, ...o.velocityKmS].map((v) => v * 1000);
      const el = tools.cartesianToKeplerian(tools.createKeplerianElements(), state, mu);
      next.semiMajorAxisKm = round(el.semiMajorAxisM / 1000, 10);
      // Eccentricity to 1e-12 absolute: a near-circular orbit must not come back as 0.0002000000001.
      next.eccentricity = String(Number(el.eccentricity.toFixed(12)));
      next.inclinationDeg = round(el.inclinationRad / DEG, 10);
      next.raanDeg = round(el.raanRad / DEG, 10);
      next.argPeriapsisDeg = round(el.argPeriapsisRad / DEG, 10);
      next.trueAnomalyDeg = round(el.trueAnomalyRad / DEG, 10);
    }
  } catch {
    // srp-core refuses the state (parabolic, rectilinear): leave the other fields as they were.
  }
  return next;
}
