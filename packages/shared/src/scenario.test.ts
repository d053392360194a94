import { readFileSync, readdirSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { fieldErrors } from './errors';
import { scenarioSchema } from './scenario';

const dir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../../fixtures/scenarios');
const read = (name: string) => JSON.parse(readFileSync(path.join(dir, name), 'utf8'));

describe('scenario files', () => {
  it('every demo scenario parses', () => {
    const files = readdirSync(dir).filter((f) => f.endsWith('.scenario.json'));
    expect(files.length).toBeGreaterThanOrEqual(2);
    for (const f of files) expect(scenarioSchema.safeParse(read(f)).success, f).toBe(true);
  });

  it('bad fields are named: output step, span, zonal degree, a requirement line', () => {
    const base = read('corvina-2-geo-30d.scenario.json');
    const result = scenarioSchema.safeParse({
      ...base,
      outputStepS: 0,
      spanDays: -1,
      forces: { ...base.forces, zonalDegree: 1 },
      requirements: [{ line: 'srp.accel.nope', comparator: '<=', value: 1 }],
    });
    expect(result.success).toBe(false);
    const fields = Object.keys(fieldErrors(result.error!));
    expect(fields).toEqual(expect.arrayContaining(['outputStepS', 'spanDays', 'forces.zonalDegree', 'requirements.0.line']));
  });

  it('a heliocentric scenario refuses Earth-only forces', () => {
    const base = read('halyard-1-spiral.scenario.json');
    const result = scenarioSchema.safeParse({ ...base, forces: { ...base.forces, zonalDegree: 2 } });
    expect(result.success).toBe(false);
    expect(Object.keys(fieldErrors(result.error!))).toContain('forces');
  });
});
