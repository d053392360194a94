import { describe, expect, it } from 'vitest';
import { scenarioSchema, vehicleSpecSchema, type StudyDesign } from '@photon-ledger/shared';
import { AppError } from '../errors/app-error';
import { corvinaScenarioFile, corvinaVehicle } from '../jobs/run-test-support';
import { caseSpecs, checkCases, designCases, sweepValues, type StudyBase } from './study-design';
import { lineStatistics, paretoFront, percentile } from './study-statistics';

function base(): StudyBase {
  const vehicle = corvinaVehicle();
  const scenario = scenarioSchema.parse({ ...corvinaScenarioFile(), requirements: [], spanDays: 730.5, vehicle: { ref: 'r' } });
  return { vehicle, scenario };
}

/** A plate of the demo vehicle whose optics are written out as fractions (not a preset name). */
function fractionPlate(b: StudyBase): number {
  if (b.vehicle.kind !== 'plates') throw new Error('the demo vehicle is a plate model');
  // The demo plates name material presets: write the first one's front optics out as fractions.
  b.vehicle.plates[0]!.front = { absorbed: 0.5, specular: 0.3, diffuse: 0.2 };
  return 0;
}

function refusal(fn: () => unknown): AppError {
  try {
    fn();
  } catch (err) {
    if (err instanceof AppError) return err;
    throw err;
  }
  throw new Error('expected a refusal');
}

describe('designCases: grid', () => {
  it('spaces a range evenly with both ends included, and takes lists as given', () => {
    expect(sweepValues({ path: 'vehicle.massKg', from: 10, to: 20, steps: 5 })).toEqual([10, 12.5, 15, 17.5, 20]);
    expect(sweepValues({ path: 'vehicle.massKg', values: [3, 1, 2] })).toEqual([3, 1, 2]);
  });

  it('makes the cartesian product, last parameter fastest', () => {
    const design: StudyDesign = {
      kind: 'grid',
      parameters: [
        { path: 'vehicle.massKg', values: [1000, 2000] },
        { path: 'vehicle.centreOfMassM.0', from: 0, to: 0.2, steps: 3 },
      ],
    };
    const cases = designCases(base(), design);
    expect(cases).toHaveLength(6);
    expect(cases.map((c) => [c['vehicle.massKg'], c['vehicle.centreOfMassM.0']])).toEqual([
      [1000, 0], [1000, 0.1], [1000, 0.2], [2000, 0], [2000, 0.1], [2000, 0.2],
    ]);
    const specs = caseSpecs(base(), cases[4]!);
    const vehicle = vehicleSpecSchema.parse(specs.vehicle);
    expect(vehicle.massKg).toBe(2000);
    expect(vehicle.centreOfMassM[0]).toBe(0.1);
  });

  it('refuses unknown and non-numeric paths naming the parameter', () => {
    const b = base();
    const unknown = refusal(() => designCases(b, { kind: 'grid', parameters: [{ path: 'vehicle.massKg', values: [1] }, { path: 'vehicle.wingspanM', values: [1] }] }));
    expect(unknown.status).toBe(400);
    expect(Object.keys(unknown.fields ?? {})).toEqual(['design.parameters.1.path']);
    expect(unknown.message).toContain('vehicle.wingspanM');
    const notNumber = refusal(() => designCases(b, { kind: 'grid', parameters: [{ path: 'scenario.name', values: [1] }] }));
    expect(notNumber.message).toContain('not a numeric field');
  });

  it('refuses, at definition time, a case whose spec fails the shared schema, naming case and field', () => {
    const b = base();
    const cases = designCases(b, { kind: 'grid', parameters: [{ path: 'vehicle.massKg', values: [1000, -5] }] });
    const err = refusal(() => checkCases(b, cases));
    expect(err.message).toMatch(/^case 1 \(vehicle\.massKg = -5\)/);
    expect(Object.keys(err.fields ?? {})).toEqual(['vehicle.massKg']);
  });
});

describe('designCases: Monte Carlo', () => {
  it('keeps absorbed + specular + diffuse = 1 with the companion taking the rest, and applies drift at mid-mission', () => {
    const b = base();
    const k = fractionPlate(b);
    const path = `vehicle.plates.${k}.front.specular`;
    const cases = designCases(b, {
      kind: 'monte-carlo',
      samples: 200,
      seed: 'optics',
      parameters: [{ path, distribution: { kind: 'uniform', min: 0.1, max: 0.3 }, companion: 'absorbed', driftPerYear: -0.02 }],
    });
    const companion = `vehicle.plates.${k}.front.absorbed`;
    for (const c of cases) {
      const vehicle = vehicleSpecSchema.parse(caseSpecs(b, c).vehicle);
      if (vehicle.kind !== 'plates') throw new Error('plates');
      const front = vehicle.plates[k]!.front;
      if (typeof front !== 'object') throw new Error('fractions');
      expect(front.absorbed + front.specular + front.diffuse).toBeCloseTo(1, 12);
      expect(c[companion]).toBe(front.absorbed);
      // Drawn in [0.1, 0.3], then the drift over half of a 730.5-day (2-year) mission: −0.02 × 1.
      expect(front.specular).toBeGreaterThanOrEqual(0.08 - 1e-12);
      expect(front.specular).toBeLessThanOrEqual(0.28 + 1e-12);
    }
    expect(checkCases(b, cases)).toHaveLength(200);
  });

  it('asks for a companion when an optical fraction is dispersed alone', () => {
    const b = base();
    const k = fractionPlate(b);
    const err = refusal(() =>
      designCases(b, { kind: 'monte-carlo', samples: 2, seed: 's', parameters: [{ path: `vehicle.plates.${k}.front.diffuse`, distribution: { kind: 'normal', mean: 0.1, sd: 0.01 } }] }),
    );
    expect(Object.keys(err.fields ?? {})).toEqual(['design.parameters.0.companion']);
  });

  it('draws the same cases from the same seed and different ones from another', () => {
    const design = (seed: string): StudyDesign => ({
      kind: 'monte-carlo',
      samples: 50,
      seed,
      parameters: [
        { path: 'vehicle.massKg', distribution: { kind: 'normal', mean: 1500, sd: 20 } },
        { path: 'vehicle.centreOfMassM.2', distribution: { kind: 'uniform', min: -0.01, max: 0.01 } },
      ],
    });
    const first = designCases(base(), design('alpha'));
    expect(designCases(base(), design('alpha'))).toEqual(first);
    const other = designCases(base(), design('beta'));
    expect(other).not.toEqual(first);
    expect(new Set(first.map((c) => c['vehicle.massKg'])).size).toBe(50);
  });
});

describe('statistics', () => {
  it('interpolates percentiles between closest ranks (type 7: [1..10] at 0.95 is 9.55)', () => {
    const xs = [1, 2, 3, 4, 5, 6, 7, 8, 9, 10];
    expect(percentile(xs, 0.95)).toBeCloseTo(9.55, 12);
    expect(percentile(xs, 0.99)).toBeCloseTo(9.91, 12);
    expect(percentile([4], 0.99)).toBe(4);
  });

  it('gives the mean and the sample standard deviation (n − 1)', () => {
    const s = lineStatistics('srp.accel.max', [2, 4, 4, 4, 5, 5, 7, 9, null]);
    expect(s.count).toBe(8);
    expect(s.mean).toBe(5);
    expect(s.sd).toBeCloseTo(Math.sqrt(32 / 7), 12);
    expect(s.standardError).toBeCloseTo(Math.sqrt(32 / 7) / Math.sqrt(8), 12);
  });

  it('keeps exactly the non-dominated points for each pair of directions', () => {
    const pts = [
      { id: 'a', x: 1, y: 5 },
      { id: 'b', x: 2, y: 3 },
      { id: 'c', x: 3, y: 4 }, // dominated by b when minimising both
      { id: 'd', x: 4, y: 1 },
      { id: 'e', x: 5, y: 5 },
    ];
    const ids = (xDir: 'min' | 'max', yDir: 'min' | 'max') => paretoFront(pts, (p) => p.x, xDir, (p) => p.y, yDir).map((p) => p.id).sort();
    expect(ids('min', 'min')).toEqual(['a', 'b', 'd']);
    expect(ids('max', 'max')).toEqual(['e']);
    // a (1, 5) is at least as good as e (5, 5) on both and better on x.
    expect(ids('min', 'max')).toEqual(['a']);
  });
});
