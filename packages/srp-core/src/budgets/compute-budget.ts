/**
 * The SRP budget of a propagated run: every figure from the sample history, as budget lines held
 * against the caller's requirements, plus the tables behind them.
 */
import { SrpError, requirePositive } from '../errors';
import type { Epoch } from '../time/epoch';
import type { BudgetLine, BudgetLineKey, BudgetRequirement } from './budget-line';
import { applyRequirements, budgetLine, budgetLineKeys } from './budget-line';
import type { MomentumBudget, MomentumOptions, TorqueStatistics } from './momentum';
import { momentumBudget, torqueStatistics } from './momentum';
import type { SailBudget, SailContext } from './sail-budget';
import { sailBudget } from './sail-budget';
import type { SampleHistory, TimeStatistics } from './sample-history';
import { checkHistory, historySpanSeconds } from './sample-history';
import type { SecularDrift } from './secular-drift';
import { secularDrift } from './secular-drift';
import type { PerturbationRow } from './srp-acceleration';
import { perturbationTable, srpAccelerationStatistics } from './srp-acceleration';
import type { SrpDeltaV } from './srp-delta-v';
import { srpDeltaV } from './srp-delta-v';

/** What the budgets need besides the samples. */
export interface BudgetContext {
  /** Scenario epoch (the samples' t = 0). */
  epoch: Epoch;
  /** Gravitational parameter of the central body (m³/s²), for the osculating elements. */
  mu: number;
  /** Centre of the inertial frame. */
  centralBody: 'earth' | 'sun';
  /** Vehicle mass (kg). */
  massKg: number;
  /** Wheel capacity and dump policy; omit to leave the momentum lines out. */
  momentum?: MomentumOptions;
  /** Sail figures; omit for a vehicle that is not a sail. */
  sail?: SailContext;
}

/** Everything the budget computes. */
export interface SrpBudget {
  /** Epoch of t = 0, ISO 8601 UTC. */
  epochUtc: string;
  /** Span of the samples (s). */
  spanSeconds: number;
  sampleCount: number;
  /** The budget lines, requirements applied, in `budgetLineKeys` order. */
  lines: BudgetLine[];
  /** Of |a_srp| (m/s²). */
  srpAcceleration: TimeStatistics;
  /** Every force column with SRP's ratio to it. */
  perturbations: PerturbationRow[];
  deltaV: SrpDeltaV;
  drift: SecularDrift;
  torque: TorqueStatistics;
  /** Null without `context.momentum`. */
  momentum: MomentumBudget | null;
  /** Null without `context.sail`. */
  sail: SailBudget | null;
}

/** Why a line a requirement names was not computed. */
function missingLineNote(key: BudgetLineKey, context: BudgetContext): string {
  if (key.startsWith('momentum.')) return 'not computed: the run gave no wheel capacity and dump threshold';
  if (!context.sail) return 'not computed: the vehicle is not a sail, or the run gave no sail figures';
  if (key === 'sail.loading') return 'not computed: the run gave no sail area';
  if (key === 'sail.timeToTarget') return 'not computed: the run gave no target heliocentric radius';
  return 'not computed for this run';
}

/**
 * Computes the budget of a run and holds its lines against `requirements` (one per line; a
 * requirement on a line the run cannot compute gets that line with a null value and status 'no-value').
 * @param history a PropagationResult's layout, samples and sampleCount
 * @throws SrpError naming the offending field (`sampleCount`, `samples.k.t`, `mu`, `massKg`, `wheelCapacityNms`, ...)
 */
export function computeBudget(
  history: SampleHistory,
  context: BudgetContext,
  requirements: readonly BudgetRequirement[] = [],
): SrpBudget {
  checkHistory(history);
  requirePositive(context.massKg, 'massKg', 'kg');
  requirePositive(context.mu, 'mu', 'm^3/s^2');
  if (context.centralBody !== 'earth' && context.centralBody !== 'sun') {
    throw new SrpError('invalid_input', `centralBody must be 'earth' or 'sun'; got '${String(context.centralBody)}'`, {
      field: 'centralBody',
      value: context.centralBody,
    });
  }
  const srpAcceleration = srpAccelerationStatistics(history);
  const perturbations = perturbationTable(history, srpAcceleration);
  const deltaV = srpDeltaV(history);
  const drift = secularDrift(history, context.mu);
  const torque = torqueStatistics(history);
  const momentum = context.momentum ? momentumBudget(history, context.momentum) : null;
  const sail = context.sail ? sailBudget(history, context.centralBody, context.massKg, context.sail) : null;

  const tooShort = 'fewer than two distinct sample times';
  const lines: BudgetLine[] = [
    budgetLine('srp.accel.mean', srpAcceleration.mean),
    budgetLine('srp.accel.max', srpAcceleration.max),
    budgetLine('srp.accel.rms', srpAcceleration.rms),
    budgetLine('srp.deltaV.total', deltaV.total),
    budgetLine('srp.deltaV.alongTrack', deltaV.alongTrack),
    budgetLine('srp.deltaV.alongTrackAbs', deltaV.alongTrackAbs),
    budgetLine('drift.a', drift.semiMajorAxisMPerDay, drift.semiMajorAxisMPerDay === null ? tooShort : undefined),
    budgetLine('drift.e', drift.eccentricityPerDay, drift.eccentricityPerDay === null ? tooShort : undefined),
    budgetLine('drift.i', drift.inclinationDegPerDay, drift.inclinationDegPerDay === null ? tooShort : undefined),
    budgetLine(
      'drift.raan',
      drift.raanDegPerDay,
      drift.equatorial ? 'equatorial orbit: the ascending node is undefined' : drift.raanDegPerDay === null ? tooShort : undefined,
    ),
    budgetLine('torque.mean', torque.magnitude.mean),
    budgetLine('torque.max', torque.magnitude.max),
    budgetLine('torque.rms', torque.magnitude.rms),
  ];
  if (momentum) {
    const criterion =
      momentum.dumpCriterion === 'norm' ? 'dump when |H| reaches' : 'dump when any body-axis |H| reaches';
    const policy = `${criterion} ${momentum.dumpLevelNms} N*m*s`;
    lines.push(
      budgetLine('momentum.peak', momentum.peakMomentumNms, policy),
      budgetLine('momentum.dumpsPerDay', momentum.dumpsPerDay, policy),
      budgetLine(
        'momentum.timeBetweenDumps',
        momentum.meanTimeBetweenDumpsSeconds,
        momentum.meanTimeBetweenDumpsSeconds === null ? `no dump within the span (${policy})` : policy,
      ),
    );
  }
  if (sail) {
    lines.push(
      budgetLine('sail.characteristicAccel', sail.characteristicAccelMps2),
      budgetLine('sail.lightnessNumber', sail.lightnessNumber),
    );
    if (sail.sailLoadingKgM2 !== null) lines.push(budgetLine('sail.loading', sail.sailLoadingKgM2));
    if (sail.targetHeliocentricRadiusM !== null) {
      lines.push(
        budgetLine(
          'sail.timeToTarget',
          sail.timeToTargetSeconds,
          sail.timeToTargetSeconds === null
            ? `not reached: the heliocentric radius does not reach ${sail.targetHeliocentricRadiusM} m within the span`
            : `first crossing of ${sail.targetHeliocentricRadiusM} m, interpolated`,
        ),
      );
    }
  }
  const present = new Set<BudgetLineKey>(lines.map((l) => l.key));
  for (const r of requirements) {
    if (!present.has(r.line)) {
      lines.push(budgetLine(r.line, null, missingLineNote(r.line, context)));
      present.add(r.line);
    }
  }
  lines.sort((x, y) => budgetLineKeys.indexOf(x.key) - budgetLineKeys.indexOf(y.key));
  return {
    epochUtc: context.epoch.utcIso,
    spanSeconds: historySpanSeconds(history),
    sampleCount: history.sampleCount,
    lines: applyRequirements(lines, requirements),
    srpAcceleration,
    perturbations,
    deltaV,
    drift,
    torque,
    momentum,
    sail,
  };
}
