/*
 * Messages keyed by the dot path of the field they belong to, as zod issues and the API's
 * `fields` both say it: `massKg`, `centreOfMassM.1`, `plates.3.areaM2`, `plates.3.front`.
 * The editor gives every input the same path, so a message lands at its field.
 */

/** Field path -> message. */
export type FieldErrors = Readonly<Record<string, string>>;

/** A zod issue, as much of it as is needed here. */
export interface PathIssue {
  readonly path: ReadonlyArray<PropertyKey>;
  readonly message: string;
}

/** The first message for each path of `issues` (the root is keyed ''). */
export function issuesToFieldErrors(issues: readonly PathIssue[]): Record<string, string> {
  const out: Record<string, string> = {};
  for (const issue of issues) {
    const key = issue.path.map(String).join('.');
    if (!(key in out)) out[key] = issue.message;
  }
  return out;
}

/**
 * The API's field messages on the editor's paths: the vehicle file sits under `spec.` in the
 * request bodies (`spec.plates.3.areaM2` -> `plates.3.areaM2`); `name`, `note` and
 * `basedOnRevision` are the body's own and keep their keys.
 */
export function apiFieldErrors(fields: Readonly<Record<string, string>> | undefined): Record<string, string> {
  const out: Record<string, string> = {};
  if (!fields) return out;
  for (const [key, message] of Object.entries(fields)) {
    const path = key === 'spec' || key === '(root)' ? '' : key.startsWith('spec.') ? key.slice('spec.'.length) : key;
    if (!(path in out)) out[path] = message;
  }
  return out;
}

/** The message for the field at `path`, or else for the first of `groups` that has one (its vector or face). */
export function errorFor(errors: FieldErrors, path: string, ...groups: string[]): string | undefined {
  if (errors[path] !== undefined) return errors[path];
  for (const group of groups) {
    if (errors[group] !== undefined) return errors[group];
  }
  return undefined;
}

/** The messages at `prefix` itself and below it (`plates.3` gives `plates.3`, `plates.3.areaM2`...), in path order. */
export function errorsUnder(errors: FieldErrors, prefix: string): { path: string; message: string }[] {
  return Object.entries(errors)
    .filter(([path]) => path === prefix || path.startsWith(`${prefix}.`))
    .map(([path, message]) => ({ path, message }));
}

/** The messages whose paths none of `known` covers (shown in a general list so none is lost). */
export function errorsOutside(errors: FieldErrors, known: (path: string) => boolean): { path: string; message: string }[] {
  return Object.entries(errors)
    .filter(([path]) => !known(path))
    .map(([path, message]) => ({ path, message }));
}

const axisNames = ['x', 'y', 'z'];

const plateKeyLabels: Record<string, string> = {
  name: 'name',
  areaM2: 'area (m²)',
  normal: 'normal',
  centroidM: 'centroid (m)',
  front: 'front optics',
  back: 'back optics',
  trackingAxis: 'tracking axis',
  trackingLimitsDeg: 'tracking limits (°)',
};

const opticsKeyLabels: Record<string, string> = {
  absorbed: 'absorbed',
  specular: 'specular',
  diffuse: 'diffuse',
  emissivityFront: 'emissivity front',
  emissivityBack: 'emissivity back',
};

/**
 * A reader's name for a field of a plate from its path below the plate
 * (`areaM2` -> "area (m²)", `normal.1` -> "normal y", `front.absorbed` -> "front optics absorbed").
 */
export function plateFieldLabel(subpath: string): string {
  if (subpath === '') return 'plate';
  const [key = '', rest] = splitFirst(subpath);
  const label = plateKeyLabels[key] ?? key;
  if (rest === undefined) return label;
  if (key === 'normal' || key === 'centroidM' || key === 'trackingAxis') {
    const axis = axisNames[Number(rest)] ?? rest;
    return key === 'centroidM' ? `centroid ${axis} (m)` : `${label} ${axis}`;
  }
  if (key === 'trackingLimitsDeg') return rest === '0' ? 'tracking min (°)' : 'tracking max (°)';
  return `${label} ${opticsKeyLabels[rest] ?? rest}`;
}

function splitFirst(path: string): [string, string | undefined] {
  const dot = path.indexOf('.');
  return dot === -1 ? [path, undefined] : [path.slice(0, dot), path.slice(dot + 1)];
}
