import type { FieldErrors } from './field-errors';

/**
 * The messages to show now: all of them once the user tried to save (or for a saved vehicle),
 * otherwise only those of fields the user has visited, so a new form is not red from the start.
 * A visited field shows its own message and its group's (`plates.0.normal` for `plates.0.normal.1`,
 * `plates.0.front` for `plates.0.front.absorbed`), and a group's visit shows its members'.
 */
export function visibleErrors(errors: FieldErrors, visited: ReadonlySet<string>, showAll: boolean): Record<string, string> {
  if (showAll) return { ...errors };
  const out: Record<string, string> = {};
  for (const [path, message] of Object.entries(errors)) {
    for (const v of visited) {
      if (path === v || v.startsWith(`${path}.`) || path.startsWith(`${v}.`)) {
        // A plate-level message (`plates.3`, duplicate names are at `plates.3.name`) would light up
        // on any of its fields; only exact or group matches count below the plate.
        if (/^plates\.\d+$/.test(path) && path !== v) continue;
        out[path] = message;
        break;
      }
    }
  }
  return out;
}
