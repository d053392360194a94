/**
 * `photon-ledger`: srp-core from the command line.
 *
 *   photon-ledger force --vehicle FILE --sun-dir-body x,y,z [--distance-au R] [--s0 W/m²] [--per-surface]
 *   photon-ledger force --vehicle FILE --orbit FILE --attitude FILE [--at UTC] [--shadow MODEL] [--per-surface]
 *   photon-ledger eclipses --orbit FILE --span-days N [--bodies earth,moon] [--step-s S] [--format json|csv]
 *   photon-ledger propagate SCENARIO [--csv FILE] [--oem FILE]     (summary and budget JSON on stdout)
 *   photon-ledger budget SCENARIO [--format text|json]
 *
 * Results go to stdout; mistakes to stderr with exit code 2; failures with exit code 1.
 */
import { parseArgs } from 'node:util';
import { SrpError } from '../src/index';
import { CliError } from './cli-error';
import { eclipsesCommand } from './commands/eclipses';
import { forceCommand } from './commands/force';
import { budgetCommand, propagateCommand } from './commands/propagate';

const USAGE = `usage:
  photon-ledger force --vehicle FILE --sun-dir-body x,y,z [--distance-au R] [--s0 W/m2] [--per-surface]
  photon-ledger force --vehicle FILE --orbit FILE --attitude FILE [--at UTC] [--shadow none|cylindrical|conical] [--s0 W/m2] [--per-surface]
  photon-ledger eclipses --orbit FILE --span-days N [--bodies earth|moon|earth,moon] [--step-s S] [--format json|csv]
  photon-ledger propagate SCENARIO [--csv FILE] [--oem FILE]
  photon-ledger budget SCENARIO [--format text|json]

Files: vehicle, orbit and attitude-law JSON as described in README.md (see fixtures/ for examples).`;

const options = {
  vehicle: { type: 'string' },
  'sun-dir-body': { type: 'string' },
  'distance-au': { type: 'string' },
  orbit: { type: 'string' },
  attitude: { type: 'string' },
  at: { type: 'string' },
  s0: { type: 'string' },
  shadow: { type: 'string' },
  'per-surface': { type: 'boolean' },
  'span-days': { type: 'string' },
  bodies: { type: 'string' },
  'step-s': { type: 'string' },
  format: { type: 'string' },
  csv: { type: 'string' },
  oem: { type: 'string' },
  help: { type: 'boolean', short: 'h' },
} as const;

const commands: Record<string, (o: Record<string, unknown>) => string | Promise<string>> = {
  force: forceCommand,
  eclipses: eclipsesCommand,
  propagate: propagateCommand,
  budget: budgetCommand,
};

/** Commands that take one positional argument: the scenario file. */
const scenarioCommands = new Set(['propagate', 'budget']);

async function main(argv: string[]): Promise<number> {
  let parsed;
  try {
    parsed = parseArgs({ args: argv, options, allowPositionals: true, strict: true });
  } catch (err) {
    process.stderr.write(`photon-ledger: ${(err as Error).message}\n${USAGE}\n`);
    return 2;
  }
  const [name, ...extra] = parsed.positionals;
  if (parsed.values.help || !name) {
    process.stdout.write(`${USAGE}\n`);
    return name || parsed.values.help ? 0 : 2;
  }
  const command = commands[name];
  const takesScenario = scenarioCommands.has(name);
  if (!command || extra.length > (takesScenario ? 1 : 0)) {
    process.stderr.write(`photon-ledger: unknown command ${[name, ...extra].join(' ')}\n${USAGE}\n`);
    return 2;
  }
  try {
    const input: Record<string, unknown> = takesScenario ? { ...parsed.values, scenario: extra[0] } : parsed.values;
    process.stdout.write(`${await command(input)}\n`);
    return 0;
  } catch (err) {
    if (err instanceof CliError) {
      process.stderr.write(`photon-ledger ${name}: ${err.message}\n`);
      return 2;
    }
    if (err instanceof SrpError) {
      process.stderr.write(`photon-ledger ${name}: ${err.details.field}: ${err.message}\n`);
      return 2;
    }
    process.stderr.write(`photon-ledger ${name}: ${err instanceof Error ? err.message : String(err)}\n`);
    return 1;
  }
}

process.exitCode = await main(process.argv.slice(2));
