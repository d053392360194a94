import { createWriteStream } from 'node:fs';
import path from 'node:path';
import { once } from 'node:events';
import { z } from 'zod';
import { computeBudget } from '../../src/budgets/compute-budget';
import { ephemerisCsvChunks } from '../../src/exports/csv-ephemeris';
import { oemChunks } from '../../src/exports/oem';
import {
  propagate,
  formatUtc,
  INERTIAL_FRAME_LABEL,
  type PropagationResult,
  type Epoch,
} from '../../src/index';
import { buildScenarioRun } from '../../io/index';
import { parseWith } from '../cli-error';
import { userCwd } from '../read-input';
import { readScenario } from '../scenario-input';
import { CAUTION } from '../caution';

const optionsSchema = z.object({
  scenario: z.string({ error: 'give the scenario file: photon-ledger propagate SCENARIO' }).min(1),
  csv: z.string().min(1, '--csv needs a file name').optional(),
  oem: z.string().min(1, '--oem needs a file name').optional(),
  format: z.enum(['text', 'json'], { error: '--format must be text or json' }).default('text'),
});

async function writeChunks(file: string, chunks: Iterable<string>): Promise<void> {
  const out = createWriteStream(path.resolve(userCwd(), file));
  for (const chunk of chunks) {
    if (!out.write(chunk)) await once(out, 'drain');
  }
  out.end();
  await once(out, 'finish');
}

function run(raw: Record<string, unknown>) {
  const o = parseWith(optionsSchema, raw, 'options');
  const { scenario, vehicle, profile } = readScenario(o.scenario);
  const scenarioRun = buildScenarioRun(scenario, vehicle, profile);
  let lastPrinted = 0;
  const result = propagate({
    ...scenarioRun.request,
    onProgress: (f) => {
      // Progress on stderr, so stdout stays machine-readable.
      if (process.stderr.isTTY && f - lastPrinted >= 0.1) {
        lastPrinted = f;
        process.stderr.write(`  ${(f * 100).toFixed(0)} %\r`);
      }
    },
  });
  return { o, scenario, scenarioRun, result };
}

function summary(scenarioName: string, r: PropagationResult, epoch: Epoch) {
  return {
    scenario: scenarioName,
    caution: CAUTION,
    epochUtc: epoch.utcIso,
    frame: INERTIAL_FRAME_LABEL,
    samples: r.sampleCount,
    events: r.events.map((e) => ({ name: e.name, timeUtc: formatUtc(epoch, e.tSeconds), tSeconds: Number(e.tSeconds.toFixed(3)) })),
    integrator: r.stats,
  };
}

/** `photon-ledger propagate SCENARIO [--csv FILE] [--oem FILE]`: summary JSON on stdout. */
export async function propagateCommand(raw: Record<string, unknown>): Promise<string> {
  const { o, scenario, scenarioRun, result } = run(raw);
  const { request, vehicle } = scenarioRun;
  const history = { layout: result.layout, samples: result.samples, sampleCount: result.sampleCount };
  if (o.csv) await writeChunks(o.csv, ephemerisCsvChunks(history, { epoch: request.epoch, centralBody: request.centralBody }));
  if (o.oem) {
    await writeChunks(
      o.oem,
      oemChunks(history, {
        epoch: request.epoch,
        centralBody: request.centralBody,
        objectName: vehicle.name,
        objectId: vehicle.name.toUpperCase().replace(/[^A-Z0-9]+/g, '-'),
        originator: 'PHOTON LEDGER',
      }),
    );
  }
  const budget = computeBudget(history, scenarioRun.budgetContext, scenario.requirements);
  return JSON.stringify({ ...summary(scenario.name, result, request.epoch), budget: budget.lines }, null, 2);
}

/** `photon-ledger budget SCENARIO [--format text|json]`: the budget table. */
export async function budgetCommand(raw: Record<string, unknown>): Promise<string> {
  const { o, scenario, scenarioRun, result } = run(raw);
  const history = { layout: result.layout, samples: result.samples, sampleCount: result.sampleCount };
  const budget = computeBudget(history, scenarioRun.budgetContext, scenario.requirements);
  if (o.format === 'json') return JSON.stringify({ scenario: scenario.name, caution: CAUTION, ...budget }, null, 2);
  const rows = budget.lines.map((l) => [
    l.label,
    l.value === null ? '—' : l.value.toPrecision(4),
    l.unit,
    l.requirement ? `${l.requirement.comparator} ${l.requirement.value}` : '',
    l.marginPercent === undefined ? '' : `${l.marginPercent.toFixed(1)} %`,
    l.status,
  ]);
  const header = ['line', 'value', 'unit', 'requirement', 'margin', 'status'];
  const widths = header.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i]!.length)));
  const fmt = (r: string[]) => r.map((c, i) => c.padEnd(widths[i]!)).join('  ');
  const perturbations = budget.perturbations.map((p) => `  ${p.force.padEnd(14)} mean ${p.meanAccel.toPrecision(3)}  max ${p.maxAccel.toPrecision(3)} m/s^2`);
  return [
    `${scenario.name}`,
    `epoch ${budget.epochUtc}, span ${(budget.spanSeconds / 86_400).toFixed(2)} d, ${budget.sampleCount} samples`,
    '',
    fmt(header),
    fmt(widths.map((w) => '-'.repeat(w))),
    ...rows.map(fmt),
    '',
    'accelerations by force:',
    ...perturbations,
    '',
    CAUTION,
  ].join('\n');
}
