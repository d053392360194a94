import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { computeBudget, createSampleLayout, type BudgetRequirement } from '@photon-ledger/srp-core';
import { buildScenarioRun, vehicleFromFile } from '@photon-ledger/srp-core/io';
import { scenarioSchema } from '@photon-ledger/shared';
import { demoVehicle } from '../../test/stored-run';
import { computeRunOutcome } from './run-outcome';
import { applyMissionRequirements } from './result-service';

describe('applyMissionRequirements', () => {
  it('holds a stored budget against requirements exactly as computeBudget does when given them', () => {
    const raw = JSON.parse(readFileSync(new URL('../../../../fixtures/scenarios/corvina-2-geo-30d.scenario.json', import.meta.url), 'utf8')) as object;
    const vehicle = demoVehicle();
    const scenario = scenarioSchema.parse({ ...raw, vehicle: { ref: 'test' }, spanDays: 0.25, outputStepS: 600 });
    const outcome = computeRunOutcome({ scenario, vehicle, vehicleRevisionId: '00000000-0000-4000-8000-000000000000' })!;
    const history = { layout: createSampleLayout(outcome.layout.forceNames), samples: outcome.samples, sampleCount: outcome.sampleCount };
    const { budgetContext } = buildScenarioRun(scenario, vehicleFromFile(vehicle));
    const max = outcome.budget.srpAcceleration.max;
    const requirements: BudgetRequirement[] = [
      { line: 'srp.accel.max', comparator: '<=', value: 1.5 * max, minMarginPercent: 10 },
      { line: 'srp.accel.mean', comparator: '<=', value: 0.5 * max },
      { line: 'torque.max', comparator: '>=', value: -1, minMarginPercent: 0 },
      { line: 'sail.lightnessNumber', comparator: '>=', value: 0.02 },
    ];
    const direct = computeBudget(history, budgetContext, requirements).lines;
    // The stored budget went through JSON (storeRunOutcome): hold that copy against the requirements.
    const stored = JSON.parse(JSON.stringify(outcome.budget)) as typeof outcome.budget;
    const applied = applyMissionRequirements(stored.lines, requirements);
    const essentials = (lines: typeof direct) => lines.map(({ key, value, requirement, marginPercent, pass, status }) => ({ key, value, requirement, marginPercent, pass, status }));
    expect(essentials(applied)).toEqual(essentials(direct));
    expect(applied.map((l) => l.status)).toEqual(expect.arrayContaining(['pass', 'fail', 'no-value', 'no-requirement']));
  });
});
