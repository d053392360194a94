/**
 * Trade-study cases from a definition, pure (no database): parameter paths checked against the
 * base specs, grid (cartesian product of lists and ranges) or seeded Monte Carlo sampling, and the
 * modified vehicle and scenario of a case. Every case's specs are checked with the shared schemas
 * when the study is defined, so a case that could never run is refused then, naming case and field.
 */
import seedrandom from 'seedrandom';
import {
  fieldErrors,
  MAX_STUDY_CASES,
  opticalFractionKeys,
  scenarioSchema,
  vehicleSpecSchema,
  type DispersedParameter,
  type Distribution,
  type Scenario,
  type StudyDesign,
  type SweepParameter,
  type VehicleSpec,
} from '@photon-ledger/shared';
import { AppError } from '../errors/app-error';

/** The two specs a path can point into. */
export interface StudyBase {
  vehicle: VehicleSpec;
  scenario: Scenario;
}

/** One case: the value of every field it sets, by path. */
export type CaseParameters = Record<string, number>;

const DAYS_PER_YEAR = 365.25;

function refuse(field: string, message: string): never {
  throw new AppError('validation_failed', `${field}: ${message}`, { fields: { [field]: message } });
}

function splitPath(path: string): { root: 'vehicle' | 'scenario'; keys: string[] } {
  const [root, ...keys] = path.split('.');
  return { root: root as 'vehicle' | 'scenario', keys };
}

/** The value at `keys` inside `value`, or undefined when the path does not exist. */
function valueAt(value: unknown, keys: readonly string[]): unknown {
  let here: unknown = value;
  for (const key of keys) {
    if (Array.isArray(here)) {
      if (!/^\d+$/.test(key)) return undefined;
      here = here[Number(key)];
    } else if (here !== null && typeof here === 'object' && Object.hasOwn(here, key)) {
      here = (here as Record<string, unknown>)[key];
    } else return undefined;
  }
  return here;
}

function setAt(value: unknown, keys: readonly string[], next: number): void {
  let here = value as Record<string, unknown>;
  for (const key of keys.slice(0, -1)) here = here[key] as Record<string, unknown>;
  here[keys[keys.length - 1]!] = next;
}

/** The base value of a path; 400 naming `field` when it does not exist or is not a number. */
export function baseValue(base: StudyBase, path: string, field: string): number {
  const { root, keys } = splitPath(path);
  if (root === 'scenario' && keys[0] === 'vehicle') refuse(field, `${path}: vary the vehicle through 'vehicle.' paths, not scenario.vehicle`);
  const found = valueAt(base[root], keys);
  if (found === undefined) {
    refuse(field, `${path} does not exist in the base ${root}${root === 'vehicle' ? ` (a ${base.vehicle.kind} vehicle)` : ''}; an optical fraction exists only where the surface gives absorbed/specular/diffuse rather than a preset name`);
  }
  if (typeof found !== 'number') refuse(field, `${path} is not a numeric field (it holds ${Array.isArray(found) ? 'a list' : typeof found})`);
  return found;
}

/** The values a swept parameter takes: its list, or `steps` evenly spaced values from..to. */
export function sweepValues(parameter: SweepParameter): number[] {
  if ('values' in parameter) return [...parameter.values];
  const { from, to, steps } = parameter;
  if (steps === 1) return [from];
  return Array.from({ length: steps }, (_, k) => (k === steps - 1 ? to : from + ((to - from) * k) / (steps - 1)));
}

/** The sibling path of an optical fraction (`...front.specular` → `...front.diffuse`). */
function siblingPath(path: string, key: string): string {
  return `${path.slice(0, path.lastIndexOf('.'))}.${key}`;
}

interface PreparedDispersion {
  parameter: DispersedParameter;
  /** Set for optical fractions: the companion's path and the third fraction's (fixed) value. */
  optical?: { companionPath: string; third: number };
}

/** A draw from a distribution; normal by Box–Muller (two uniforms per draw, so the stream stays simple). */
function draw(rng: () => number, distribution: Distribution): number {
  if (distribution.kind === 'uniform') return distribution.min + rng() * (distribution.max - distribution.min);
  const u1 = 1 - rng(); // (0, 1]: the logarithm stays finite
  const u2 = rng();
  return distribution.mean + distribution.sd * Math.sqrt(-2 * Math.log(u1)) * Math.cos(2 * Math.PI * u2);
}

/**
 * The cases of a design: grid rows in row-major order (the last parameter varies fastest), or
 * `samples` Monte Carlo draws from a seedrandom stream of the seed (parameters drawn in the order
 * given, case after case), so the same seed always gives the same cases.
 * @throws AppError 400 naming `design.parameters.k...` for unknown or non-numeric paths, a repeated
 *   path, an optical fraction without a companion, or too many cases
 */
export function designCases(base: StudyBase, design: StudyDesign): CaseParameters[] {
  const seen = new Set<string>();
  design.parameters.forEach((p, k) => {
    const field = `design.parameters.${k}.path`;
    if (seen.has(p.path)) refuse(field, `${p.path} is named twice`);
    seen.add(p.path);
    baseValue(base, p.path, field);
  });

  if (design.kind === 'grid') {
    const lists = design.parameters.map(sweepValues);
    const count = lists.reduce((n, l) => n * l.length, 1);
    if (count > MAX_STUDY_CASES) refuse('design.parameters', `the grid has ${count} cases; at most ${MAX_STUDY_CASES}`);
    const cases: CaseParameters[] = [];
    for (let i = 0; i < count; i++) {
      const values: CaseParameters = {};
      let rest = i;
      for (let k = lists.length - 1; k >= 0; k--) {
        const list = lists[k]!;
        values[design.parameters[k]!.path] = list[rest % list.length]!;
        rest = Math.floor(rest / list.length);
      }
      // Keep the definition's order in the object (the table's column order).
      cases.push(Object.fromEntries(design.parameters.map((p) => [p.path, values[p.path]!])));
    }
    return cases;
  }

  const prepared: PreparedDispersion[] = design.parameters.map((parameter, k) => {
    const last = parameter.path.slice(parameter.path.lastIndexOf('.') + 1);
    const isFraction = (opticalFractionKeys as readonly string[]).includes(last);
    if (!isFraction) {
      if (parameter.companion) refuse(`design.parameters.${k}.companion`, `a companion is only for optical fractions (absorbed, specular, diffuse); ${parameter.path} is not one`);
      return { parameter };
    }
    const companion = parameter.companion;
    if (!companion) refuse(`design.parameters.${k}.companion`, `${parameter.path} is an optical fraction: name the companion fraction that takes the rest so the three still sum to 1`);
    if (companion === last) refuse(`design.parameters.${k}.companion`, 'the companion must be another fraction than the one dispersed');
    const companionPath = siblingPath(parameter.path, companion);
    if (seen.has(companionPath)) refuse(`design.parameters.${k}.companion`, `${companionPath} is dispersed itself; it cannot also be a companion`);
    baseValue(base, companionPath, `design.parameters.${k}.companion`);
    const thirdKey = opticalFractionKeys.find((key) => key !== last && key !== companion)!;
    const thirdPath = siblingPath(parameter.path, thirdKey);
    if (seen.has(thirdPath)) refuse(`design.parameters.${k}.path`, `${parameter.path} and ${thirdPath} are both dispersed: disperse one fraction per surface`);
    return { parameter, optical: { companionPath, third: baseValue(base, thirdPath, `design.parameters.${k}.path`) } };
  });

  const rng = seedrandom(design.seed);
  const halfMissionYears = base.scenario.spanDays / DAYS_PER_YEAR / 2;
  const cases: CaseParameters[] = [];
  for (let i = 0; i < design.samples; i++) {
    const values: CaseParameters = {};
    for (const { parameter, optical } of prepared) {
      // Degradation: the value at mid-mission.
      let value = draw(rng, parameter.distribution) + (parameter.driftPerYear ?? 0) * halfMissionYears;
      if (optical) {
        value = Math.min(Math.max(value, 0), 1 - optical.third);
        values[parameter.path] = value;
        values[optical.companionPath] = Math.max(0, 1 - value - optical.third);
      } else values[parameter.path] = value;
    }
    cases.push(values);
  }
  return cases;
}

/** The vehicle and scenario of a case: the base with the case's values set. */
export function caseSpecs(base: StudyBase, parameters: CaseParameters): { vehicle: unknown; scenario: unknown } {
  const specs = { vehicle: structuredClone(base.vehicle) as unknown, scenario: structuredClone(base.scenario) as unknown };
  for (const [path, value] of Object.entries(parameters)) {
    const { root, keys } = splitPath(path);
    setAt(specs[root], keys, value);
  }
  return specs;
}

/**
 * Checks every case's modified specs with the shared schemas.
 * @throws AppError 400 naming the first failing case, its values and the field
 */
export function checkCases(base: StudyBase, cases: readonly CaseParameters[]): StudyBase[] {
  return cases.map((parameters, index) => {
    const specs = caseSpecs(base, parameters);
    const vehicle = vehicleSpecSchema.safeParse(specs.vehicle);
    const scenario = scenarioSchema.safeParse(specs.scenario);
    for (const [root, parsed] of [['vehicle', vehicle], ['scenario', scenario]] as const) {
      if (parsed.success) continue;
      const [field, message] = Object.entries(fieldErrors(parsed.error))[0] ?? ['(root)', 'invalid'];
      const values = Object.entries(parameters).map(([p, v]) => `${p} = ${v}`).join(', ');
      const fullField = `${root}.${field}`;
      throw new AppError('validation_failed', `case ${index} (${values}) is not a valid ${root}: ${fullField}: ${message}`, {
        fields: { [fullField]: `case ${index}: ${message}` },
      });
    }
    return { vehicle: vehicle.data!, scenario: scenario.data! };
  });
}
