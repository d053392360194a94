import { describe, expect, it } from 'vitest';
import * as srpCore from '@photon-ledger/srp-core';
import { scenarioSchema } from '@photon-ledger/shared';
import {
  buildScenarioBody,
  defaultDraft,
  draftFromSpec,
  fieldKeyFor,
  parseNumber,
  placeErrors,
  switchOrbitKind,
  type ScenarioDraft,
} from './scenario-draft';

const revisionId = '4b0f3c7e-2f9c-4e1a-9d55-2c1b8d7e6f10';
const vehicleId = '9a8b7c6d-5e4f-4a3b-8c2d-1e0f9a8b7c6d';
const now = new Date('2026-09-08T13:45:00Z');

/** A new Earth-orbit draft where the user entered only a name, a vehicle, a span and a step. */
function minimalGeo(patch: Partial<ScenarioDraft> = {}): ScenarioDraft {
  return {
    ...defaultDraft('earth-orbit', now),
    name: 'GEO day one',
    vehicleId,
    vehicleRevisionId: revisionId,
    spanDays: '1',
    outputStepS: '600',
    ...patch,
  };
}

describe('buildScenarioBody', () => {
  it('accepts a new Earth-orbit scenario with only a name, a vehicle, a span and a step entered', () => {
    const check = buildScenarioBody(minimalGeo());

    expect(check.ok).toBe(true);
    if (!check.ok) return;
    const { spec } = check.body;
    expect(check.body.name).toBe('GEO day one');
    expect(spec.vehicle).toEqual({ ref: revisionId });
    expect(spec.orbit).toMatchObject({ kind: 'keplerian', centralBody: 'earth', frame: 'EQJ', semiMajorAxisKm: 42164, epochUtc: '2026-09-08T00:00:00Z' });
    expect(spec.forces).toMatchObject({ zonalDegree: 6, sun: true, moon: true, srp: true, planets: [] });
    expect(spec.shadow).toEqual({ model: 'conical', bodies: ['earth', 'moon'] });
    expect(spec.attitude.law).toBe('sun-pointing');
    expect(spec.tolerances).toEqual({ relTol: 1e-10, absTol: 1e-9 });
    expect(spec.requirements).toEqual([]);
  });

  it('accepts a new heliocentric scenario centred on the Sun with SRP as the only perturbation', () => {
    const check = buildScenarioBody({ ...defaultDraft('heliocentric', now), name: 'Spiral', vehicleId, vehicleRevisionId: revisionId });

    expect(check.ok).toBe(true);
    if (!check.ok) return;
    expect(check.body.spec.orbit.centralBody).toBe('sun');
    expect(check.body.spec.forces).toMatchObject({ zonalDegree: 0, sun: false, moon: false, srp: true });
    expect(check.body.spec.attitude.law).toBe('sail-locally-optimal');
  });

  it('names the eccentricity field for a negative eccentricity', () => {
    const check = buildScenarioBody(minimalGeo({ eccentricity: '-0.1' }));

    expect(check.ok).toBe(false);
    if (check.ok) return;
    expect(check.errors['spec.orbit.eccentricity']).toBe('eccentricity must be 0 or more');
  });

  it('names the span, the step and the epoch when they are blank, not numbers, or without Z', () => {
    const check = buildScenarioBody(minimalGeo({ spanDays: '', outputStepS: 'ten', epochUtc: '2026-09-08 00:00' }));

    expect(check.ok).toBe(false);
    if (check.ok) return;
    expect(check.errors['spec.spanDays']).toMatch(/spanDays must be a number/);
    expect(check.errors['spec.outputStepS']).toMatch(/outputStepS must be a number/);
    expect(check.errors['spec.orbit.epochUtc']).toMatch(/ending in Z/);
  });

  it('asks for a vehicle at the vehicle field when none is chosen', () => {
    const check = buildScenarioBody(minimalGeo({ vehicleId: '', vehicleRevisionId: '' }));

    expect(check.ok).toBe(false);
    if (check.ok) return;
    expect(check.errors['spec.vehicle.ref']).toBe('Choose the vehicle this scenario flies.');
  });

  it('puts a bad sail parameter on that parameter, not on the attitude law as a whole', () => {
    const check = buildScenarioBody(minimalGeo({ attitudeLaw: 'sail-locally-optimal', normalAxisBody: ['0', '0', '0'] }));

    expect(check.ok).toBe(false);
    if (check.ok) return;
    expect(check.errors['spec.attitude']).toBeUndefined();
    expect(check.errors['spec.attitude.normalAxisBody']).toMatch(/zero vector/);
  });

  it('refuses a periapsis inside the Earth at the semi-major axis, as the API does', () => {
    const check = buildScenarioBody(minimalGeo({ semiMajorAxisKm: '700' }));

    expect(check.ok).toBe(false);
    if (check.ok) return;
    expect(check.errors['spec.orbit.semiMajorAxisKm']).toMatch(/inside the earth/);
  });
});

describe('parseNumber', () => {
  it('reads decimals and exponents, leaves blanks undefined and refuses hex or words', () => {
    expect(parseNumber(' 1e-10 ')).toBe(1e-10);
    expect(parseNumber('-.5')).toBe(-0.5);
    expect(parseNumber('')).toBeUndefined();
    expect(parseNumber('0x10')).toBeNaN();
    expect(parseNumber('12 km')).toBeNaN();
  });
});

describe('placeErrors', () => {
  const keys = ['name', 'spec.orbit.positionKm', 'spec.forces', 'spec.forces.drag.cd'];

  it('puts a component error on its vector field and the longest matching field wins', () => {
    expect(fieldKeyFor('spec.orbit.positionKm.1', keys)).toBe('spec.orbit.positionKm');
    expect(fieldKeyFor('spec.forces.drag.cd', keys)).toBe('spec.forces.drag.cd');
    expect(fieldKeyFor('spec.forces.drag', keys)).toBe('spec.forces');
    expect(fieldKeyFor('spec.orbitX', keys)).toBeUndefined();
  });

  it('keeps API errors no field shows for the form-level message', () => {
    const { byField, unplaced } = placeErrors(
      { name: 'already used by another scenario of this mission: choose another name', 'spec.requirements': 'must be empty' },
      keys,
    );

    expect(byField).toEqual({ name: 'already used by another scenario of this mission: choose another name' });
    expect(unplaced).toEqual([['spec.requirements', 'must be empty']]);
  });
});

describe('switchOrbitKind', () => {
  it('turns GEO elements at periapsis into the state a(1 − e) from the centre along x, and back', () => {
    const cartesian = switchOrbitKind(minimalGeo(), 'cartesian', srpCore);

    expect(cartesian.orbitKind).toBe('cartesian');
    // At ν = 0 with Ω = ω = 0 the position is a(1 − e) on +x: 42164 × 0.9998 km (exact arithmetic).
    expect(Number(cartesian.positionKm[0])).toBeCloseTo(42155.5672, 6);
    expect(Number(cartesian.positionKm[2])).toBe(0);
    // Circular speed sqrt(GM/a) ≈ 3.0747 km/s (GM 398600.4418 km³/s²); tolerance covers e = 0.0002.
    expect(Number(cartesian.velocityKmS[1])).toBeCloseTo(3.0753, 3);

    const back = switchOrbitKind(cartesian, 'keplerian', srpCore);
    expect(back.semiMajorAxisKm).toBe('42164');
    expect(back.eccentricity).toBe('0.0002');
    expect(back.inclinationDeg).toBe('0.05');
    expect(buildScenarioBody(back).ok).toBe(true);
  });

  it('only changes the kind while the orbit is incomplete', () => {
    const draft = minimalGeo({ semiMajorAxisKm: '' });

    const cartesian = switchOrbitKind(draft, 'cartesian', srpCore);

    expect(cartesian.orbitKind).toBe('cartesian');
    expect(cartesian.positionKm).toEqual(['', '', '']);
  });
});

describe('draftFromSpec', () => {
  it('gives back a stored scenario unchanged through the form', () => {
    const spec = scenarioSchema.parse({
      name: 'Corvina-2 yaw follow',
      vehicle: { ref: revisionId },
      orbit: {
        kind: 'cartesian',
        epochUtc: '2026-09-08T00:00:00Z',
        centralBody: 'earth',
        frame: 'EQJ',
        positionKm: [42164, 0, 0],
        velocityKmS: [0, 3.0747, 0.001],
      },
      spanDays: 2,
      outputStepS: 300,
      forces: { zonalDegree: 2, sun: true, moon: false, srp: true, drag: { cd: 2.2, areaM2: 30 } },
      shadow: { model: 'cylindrical', bodies: ['earth'] },
      attitude: { law: 'sail-cone-clock', coneDeg: 35, clockDeg: -90, normalAxisBody: [0, 0, 1] },
      tolerances: { relTol: 1e-11, absTol: 1e-9, maxStepS: 120 },
      momentum: { wheelCapacityNms: 20, dumpThresholdFraction: 0.8 },
      events: { nodes: true, radiiKm: [42100, 42230] },
    });

    const check = buildScenarioBody(draftFromSpec('Corvina-2 yaw follow', spec, vehicleId, 'earth-orbit'));

    expect(check.ok).toBe(true);
    if (!check.ok) return;
    expect(check.body.spec).toEqual(spec);
  });
});
