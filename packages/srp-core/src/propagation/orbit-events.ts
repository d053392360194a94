import { SrpError } from '../errors';
import type { StepEvent } from './integrator/event-locator';

/**
 * Node crossings of the inertial (EQJ) equator: g = z, so an ascending node is z rising through
 * zero and a descending node z falling through zero. Located on the dense output like every
 * event; no restart (nothing is discontinuous there).
 */
export function createNodeCrossingEvents(): StepEvent[] {
  const z = (_t: number, y: Float64Array) => y[2]!;
  return [
    { name: 'ascending-node', g: z, direction: 1 },
    { name: 'descending-node', g: z, direction: -1 },
  ];
}

/**
 * Crossings of a sphere of the given radius about the central body (a user-given altitude or
 * radius): g = |r| − R, reported as `<name>-up` when the radius grows through R and `<name>-down`
 * when it falls through R.
 * @param radiusM radius (m), > 0
 * @param name label of the events, e.g. `radius-42164km`
 * @throws SrpError `out_of_range` (field `radiusM`) for a non-positive or non-finite radius
 */
export function createRadiusCrossingEvents(radiusM: number, name: string): StepEvent[] {
  if (!(radiusM > 0) || !Number.isFinite(radiusM)) {
    throw new SrpError('out_of_range', `radiusM must be a finite number (m) > 0; got ${radiusM}`, {
      field: 'radiusM',
      value: radiusM,
      limit: '> 0',
    });
  }
  const g = (_t: number, y: Float64Array) => Math.sqrt(y[0]! * y[0]! + y[1]! * y[1]! + y[2]! * y[2]!) - radiusM;
  return [
    { name: `${name}-up`, g, direction: 1 },
    { name: `${name}-down`, g, direction: -1 },
  ];
}
