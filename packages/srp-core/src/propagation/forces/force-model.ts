/**
 * The one force signature of the propagator: state and time in, acceleration out, SI only.
 * Every force model (gravity, third bodies, drag, SRP) implements it so that forces add up
 * (`createDynamics`). Frame: EQJ axes, centred on the central body of the run (the Earth or the Sun).
 */
import type { Vec3 } from '../../math/vec3';
import type { Derivative } from '../integrator/dop853';

/** A force model, compiled once and then evaluated allocation-free. */
export interface ForceModel {
  /** 'central-body' | 'zonal' | 'sun' | 'moon' | 'srp' | 'drag' | planet names. */
  readonly name: string;
  /**
   * This force's acceleration (m/s², inertial EQJ) at t (s from the scenario epoch) for the state
   * y = [x, y, z, vx, vy, vz] (m, m/s) relative to the central body; allocates nothing.
   * @returns out
   */
  acceleration(out: Vec3, t: number, y: Float64Array): Vec3;
}

/** dy/dt = f(t, y), written into dydt without allocating: the integrator's `Derivative`. */
export type ForceDerivative = Derivative;
