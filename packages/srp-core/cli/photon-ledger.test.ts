import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const here = path.dirname(fileURLToPath(import.meta.url));
const bin = path.join(here, 'photon-ledger.mjs');
const fixtures = path.resolve(here, '../../../fixtures');
const corvina = path.join(fixtures, 'vehicles/corvina-2.vehicle.json');
const tmp = mkdtempSync(path.join(os.tmpdir(), 'photon-ledger-cli-'));

function run(args: string[]) {
  const r = spawnSync(process.execPath, [bin, ...args], { encoding: 'utf8', timeout: 60_000 });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}
function file(name: string, content: unknown): string {
  const p = path.join(tmp, name);
  writeFileSync(p, typeof content === 'string' ? content : JSON.stringify(content));
  return p;
}
const geo = {
  kind: 'keplerian', epochUtc: '2026-03-20T00:00:00Z', centralBody: 'earth', frame: 'EQJ',
  semiMajorAxisKm: 42164.17, eccentricity: 0.0002, inclinationDeg: 0.05, raanDeg: 0, argPeriapsisDeg: 0, trueAnomalyDeg: 0,
};

describe('photon-ledger command line', () => {
  it('force on an absorbing cannonball at 1 AU prints S0·A/c along the light as JSON', () => {
    // source: IAU 2015 Resolution B3 (S0 = 1361 W/m²); Cr = 1 absorbs all light, A = 2 m².
    const vehicle = file('ball.json', { kind: 'cannonball', name: 'ball', massKg: 100, centreOfMassM: [0, 0, 0], areaM2: 2, cr: 1 });
    const r = run(['force', '--vehicle', vehicle, '--sun-dir-body', '0,0,1']);
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.total.forceBodyN[2]).toBeCloseTo(-(1361 * 2) / 299_792_458, 15);
    expect(out.caution).toMatch(/independent analysis/);
  });

  it('force lists every plate of the demo box-wing with per-surface torques that add up to the total', () => {
    const r = run(['force', '--vehicle', corvina, '--sun-dir-body', '1,0.3,0.2', '--per-surface']);
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout);
    const sum = [0, 1, 2].map((k) => out.surfaces.reduce((s: number, p: { torqueBodyNm: number[] }) => s + p.torqueBodyNm[k]!, 0));
    // Rounded to 10 significant digits per surface: the sum agrees to that precision.
    sum.forEach((v, k) => expect(v).toBeCloseTo(out.total.torqueBodyNm[k], 10));
  });

  it('force from an orbit and an attitude law finds a GEO satellite in umbra near an equinox midnight (local)', () => {
    const orbit = file('geo.json', geo);
    const law = file('sun.json', { law: 'sun-pointing', sunAxisBody: [0, 0, 1], secondaryAxisBody: [0, 1, 0], secondaryReference: 'orbit-normal' });
    const r = run(['force', '--vehicle', corvina, '--orbit', orbit, '--attitude', law, '--at', '2026-03-20T12:00:00Z']);
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.inputs.illuminatedFraction).toBe(0);
    expect(out.total.forceMagnitudeN).toBe(0);
    // Sun-pointing law: the Sun is along body +z.
    expect(out.inputs.sunDirBody[2]).toBeCloseTo(1, 9);
  });

  it('eclipses prints CSV with the caution and four events per GEO equinox eclipse', () => {
    const r = run(['eclipses', '--orbit', file('geo2.json', geo), '--span-days', '1', '--bodies', 'earth', '--format', 'csv']);
    expect(r.code).toBe(0);
    const lines = r.stdout.trim().split('\n');
    expect(lines[1]).toMatch(/independent analysis/);
    expect(lines[2]).toBe('time_utc,t_s,kind,body');
    expect(lines.slice(3).map((l) => l.split(',')[2])).toEqual(['penumbra-entry', 'umbra-entry', 'umbra-exit', 'penumbra-exit']);
  });

  it('a vehicle file with bad optics exits 2 naming the file and the field', () => {
    const bad = file('bad.json', {
      kind: 'plates', name: 'bad', massKg: 10, centreOfMassM: [0, 0, 0],
      plates: [{ name: 'p', areaM2: 1, normal: [1, 0, 0], centroidM: [0, 0, 0], front: { absorbed: 0.5, specular: 0.3, diffuse: 0.3 } }],
    });
    const r = run(['force', '--vehicle', bad, '--sun-dir-body', '1,0,0']);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('bad.json');
    expect(r.stderr).toContain('plates.0.front');
  });

  it('a file that is not JSON, a missing file and a bad option each exit 2 with a message', () => {
    const notJson = run(['force', '--vehicle', file('x.json', '{ nope'), '--sun-dir-body', '1,0,0']);
    expect(notJson.code).toBe(2);
    expect(notJson.stderr).toMatch(/not valid JSON/);
    const missing = run(['force', '--vehicle', path.join(tmp, 'absent.json'), '--sun-dir-body', '1,0,0']);
    expect(missing.code).toBe(2);
    expect(missing.stderr).toMatch(/--vehicle: cannot read/);
    const badOpt = run(['eclipses', '--orbit', file('geo3.json', geo), '--span-days', '-1']);
    expect(badOpt.code).toBe(2);
    expect(badOpt.stderr).toMatch(/span-days/);
    const both = run(['force', '--vehicle', corvina]);
    expect(both.code).toBe(2);
    expect(both.stderr).toMatch(/sun-dir-body/);
  });

  it('an orbit inside the Earth is refused naming semiMajorAxisKm or eccentricity', () => {
    const r = run(['eclipses', '--orbit', file('low.json', { ...geo, semiMajorAxisKm: 5000 }), '--span-days', '1']);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/semiMajorAxisKm|eccentricity/);
  });

  it('runs from the repository root through pnpm', () => {
    const root = path.resolve(here, '../../..');
    const out = execFileSync('pnpm', ['--silent', 'photon-ledger', 'force', '--vehicle', 'fixtures/vehicles/halyard-1.vehicle.json', '--sun-dir-body', '0,0,-1'], {
      cwd: root,
      encoding: 'utf8',
    });
    expect(JSON.parse(out).vehicle.kind).toBe('sail');
    // The README's example: the demo GEO orbit is in penumbra at 13:55 UTC on 2026-03-20.
    const readme = execFileSync(
      'pnpm',
      ['--silent', 'photon-ledger', 'force', '--vehicle', 'fixtures/vehicles/corvina-2.vehicle.json', '--orbit', 'fixtures/orbits/corvina-2.orbit.json',
        '--attitude', 'fixtures/attitude/sun-pointing.attitude.json', '--at', '2026-03-20T13:55:00Z'],
      { cwd: root, encoding: 'utf8' },
    );
    const fraction = JSON.parse(readme).inputs.illuminatedFraction;
    expect(fraction).toBeGreaterThan(0);
    expect(fraction).toBeLessThan(1);
  });
});

describe('photon-ledger propagate and budget', () => {
  const scenarios = path.join(fixtures, 'scenarios');
  const shortGeo = () => {
    const s = JSON.parse(readFileSync(path.join(scenarios, 'corvina-2-geo-30d.scenario.json'), 'utf8'));
    return file('short.scenario.json', {
      ...s,
      vehicle: { ref: corvina },
      spanDays: 2,
      outputStepS: 300,
    });
  };

  it('propagate writes a CSV and a CCSDS OEM that parse back with the same final position', () => {
    const csv = path.join(tmp, 'eph.csv');
    const oem = path.join(tmp, 'eph.oem');
    const r = run(['propagate', shortGeo(), '--csv', csv, '--oem', oem]);
    expect(r.code).toBe(0);
    const summary = JSON.parse(r.stdout);
    expect(summary.samples).toBe(2 * 288 + 1);
    expect(summary.caution).toMatch(/independent analysis/);
    // Two days in eclipse season: each day one Earth eclipse, four edges each (penumbra/umbra in and out).
    expect(summary.events.filter((e: { name: string }) => e.name.startsWith('earth')).length).toBe(8);
    const csvText = readFileSync(csv, 'utf8');
    const oemText = readFileSync(oem, 'utf8');
    expect(csvText).toMatch(/EQJ/);
    expect(csvText).toMatch(/independent analysis/);
    expect(oemText).toMatch(/^CCSDS_OEM_VERS\s*=\s*3\.0/m);
    expect(oemText).toMatch(/REF_FRAME\s*=\s*EME2000/);
    const lastCsv = csvText.trim().split('\n').at(-1)!.split(',');
    const lastOem = oemText.trim().split('\n').filter((l) => /^\d{4}-/.test(l)).at(-1)!.trim().split(/\s+/);
    // CSV in metres, OEM in kilometres: the same final x to the OEM's printed precision.
    expect(Number(lastOem[1]) * 1000).toBeCloseTo(Number(lastCsv[2]), 0);
  });

  it('budget prints the table with requirement, margin and status, and JSON on request', () => {
    const text = run(['budget', shortGeo()]);
    expect(text.code).toBe(0);
    expect(text.stdout).toMatch(/SRP acceleration, maximum \|a\|.*<= 2e-7.*pass/);
    expect(text.stdout).toMatch(/independent analysis/);
    const json = run(['budget', shortGeo(), '--format', 'json']);
    const lines = JSON.parse(json.stdout).lines as { key: string; status: string }[];
    expect(lines.find((l) => l.key === 'srp.accel.max')?.status).toBe('pass');
  });

  it('a scenario with a bad field exits 2 naming it', () => {
    const s = JSON.parse(readFileSync(path.join(scenarios, 'corvina-2-geo-30d.scenario.json'), 'utf8'));
    const bad = file('bad.scenario.json', { ...s, vehicle: { ref: corvina }, outputStepS: -5 });
    const r = run(['budget', bad]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/outputStepS/);
  });
});
