import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { vehicleSpecSchema } from '@photon-ledger/shared';
import { MAX_REPORTED_PROBLEMS, parsePlateSetCsv, plateSetProblemKey, type PlateSetParse } from './plate-set-csv';

const header = 'name,area_m2,normal_x,normal_y,normal_z,centroid_x_m,centroid_y_m,centroid_z_m,front_preset,front_absorbed,front_specular,front_diffuse,back_preset';

function problemsOf(result: PlateSetParse): Record<string, string> {
  if (result.ok) throw new Error('expected the file to be refused');
  return Object.fromEntries(result.problems.map((p) => [plateSetProblemKey(p), p.message]));
}

describe('parsePlateSetCsv', () => {
  it('reads the Corvina-2 example into plates the shared vehicle schema accepts, value for value', () => {
    const text = readFileSync(new URL('../../../../fixtures/uploads/corvina-2.plates.csv', import.meta.url), 'utf8');
    const result = parsePlateSetCsv(text);
    if (!result.ok) throw new Error(JSON.stringify(result.problems));
    expect(result.plates).toHaveLength(10);
    const wing = result.plates.find((p) => p.name === 'north wing')!;
    expect(wing).toEqual({
      name: 'north wing',
      areaM2: 36,
      normal: [1, 0, 0],
      centroidM: [0, 9.3, 0],
      front: 'solar-cell',
      back: 'solar-array-back',
      trackingAxis: [0, 1, 0],
      trackingLimitsDeg: [-180, 180],
    });
    const reflector = result.plates.find((p) => p.name === 'reflector 2.6 m')!;
    expect(reflector.front).toEqual({ absorbed: 0.25, specular: 0.05, diffuse: 0.7, emissivityFront: 0.88, emissivityBack: 0.65 });
    expect(reflector.back).toBe('mli-kapton');
    // One-sided bus faces have no back optics and no tracking.
    const east = result.plates.find((p) => p.name === 'bus +x (east)')!;
    expect(east).not.toHaveProperty('back');
    expect(east).not.toHaveProperty('trackingAxis');
    expect(vehicleSpecSchema.safeParse({ kind: 'plates', name: 'x', massKg: 1, centreOfMassM: [0, 0, 0], plates: result.plates }).success).toBe(true);
  });

  it('counts comment and blank lines so that the row is the line a text editor shows', () => {
    const text = ['# a comment', header, '', 'a,1,0,0,1,0,0,0,mli-kapton,,,,', '# another', 'b,abc,0,0,1,0,0,0,mli-kapton,,,,'].join('\r\n');
    expect(problemsOf(parsePlateSetCsv(text))).toEqual({ 'row 6, column area_m2': 'area_m2 must be a number (m²); got "abc"' });
  });

  it('names each missing required column on the header line', () => {
    const text = ['name,normal_x,normal_y,normal_z,centroid_x_m,centroid_y_m,front_preset', 'a,0,0,1,0,0,mli-kapton'].join('\n');
    expect(problemsOf(parsePlateSetCsv(text))).toEqual({
      'row 1, column area_m2': expect.stringContaining('column area_m2 is missing'),
      'row 1, column centroid_z_m': expect.stringContaining('column centroid_z_m is missing'),
    });
  });

  it('refuses fractions that do not add up to 1 on the three fraction columns', () => {
    const text = [header, 'a,1,0,0,1,0,0,0,,0.5,0.3,0.3,'].join('\n');
    const problems = problemsOf(parsePlateSetCsv(text));
    expect(problems['row 2, column front_absorbed+front_specular+front_diffuse']).toMatch(/must equal 1/);
  });

  it('maps schema refusals onto their columns and says the column name', () => {
    const text = [header, 'a,-2,0,0,0,0,0,0,shiny-foil,,,,', 'b,1,0,0,1,0,0,0,,0.5,1.5,0,'].join('\n');
    expect(problemsOf(parsePlateSetCsv(text))).toEqual({
      'row 2, column area_m2': 'area_m2 must be greater than 0 (m²)',
      'row 2, column normal_x/normal_y/normal_z': 'normal_x/normal_y/normal_z must not be the zero vector',
      'row 2, column front_preset': expect.stringContaining('front_preset must be a material preset'),
      'row 3, column front_specular': 'front_specular must be at most 1',
      'row 3, column front_absorbed+front_specular+front_diffuse': expect.stringContaining('must equal 1'),
    });
  });

  it('refuses a preset and fractions on the same face, and a row without front optics', () => {
    const text = [header, 'a,1,0,0,1,0,0,0,mli-kapton,0.5,0.5,0,', 'b,1,0,0,1,0,0,0,,,,,'].join('\n');
    const problems = problemsOf(parsePlateSetCsv(text));
    expect(problems['row 2, column front_absorbed']).toMatch(/not both/);
    expect(problems['row 3, column front_preset']).toMatch(/front optics are required/);
  });

  it('refuses duplicate plate names and says the line of the first one', () => {
    const text = [header, 'a,1,0,0,1,0,0,0,mli-kapton,,,,', 'a,2,0,0,1,0,0,0,mli-kapton,,,,'].join('\n');
    expect(problemsOf(parsePlateSetCsv(text))).toEqual({ 'row 3, column name': expect.stringMatching(/already used by line 2/) });
  });

  it('refuses an empty file, a header without rows, unknown columns and rows of the wrong width', () => {
    expect(Object.keys(problemsOf(parsePlateSetCsv('')))).toEqual(['file']);
    expect(Object.keys(problemsOf(parsePlateSetCsv('# only a comment\n\n')))).toEqual(['file']);
    expect(problemsOf(parsePlateSetCsv(header))).toEqual({ file: 'the file has a header but no plate rows' });
    expect(Object.keys(problemsOf(parsePlateSetCsv(`${header},colour\na,1,0,0,1,0,0,0,mli-kapton,,,,,red`)))).toEqual(['row 1, column colour']);
    expect(problemsOf(parsePlateSetCsv(`${header}\na,1,0,0,1`))).toEqual({ 'row 2': expect.stringContaining('has 5 values, expected 13') });
  });

  it('reports at most ten problems', () => {
    const rows = Array.from({ length: 15 }, (_, i) => `p${i},x,0,0,1,0,0,0,mli-kapton,,,,`);
    const result = parsePlateSetCsv([header, ...rows].join('\n'));
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.problems).toHaveLength(MAX_REPORTED_PROBLEMS);
      expect(result.problems[0]).toEqual({ row: 2, column: 'area_m2', message: expect.any(String) });
    }
  });

  it('accepts quoted names with commas and a byte-order mark', () => {
    const result = parsePlateSetCsv(`\ufeff${header}\n"panel, left",1.5,0,0,1,0,0,0,black-paint,,,,`);
    expect(result.ok && result.plates.map((p) => [p.name, p.areaM2])).toEqual([['panel, left', 1.5]]);
  });
});
