import path from 'node:path';
import { scenarioSchema, vehicleSpecSchema, type Scenario } from '@photon-ledger/shared';
import type { AttitudeProfile, VehicleSpec } from '../src/index';
import { vehicleFromFile } from '../io/index';
import { CliError } from './cli-error';
import { readJson, userCwd } from './read-input';

/** A scenario file with its vehicle resolved (a `ref` is a path relative to the scenario file). */
export function readScenario(file: string): { scenario: Scenario; vehicle: VehicleSpec; profile?: AttitudeProfile } {
  const scenario = readJson(scenarioSchema, file, 'scenario');
  const dir = path.dirname(path.resolve(userCwd(), file));
  const vehicleFile = 'ref' in scenario.vehicle
    ? readJson(vehicleSpecSchema, path.resolve(dir, scenario.vehicle.ref), 'vehicle.ref')
    : scenario.vehicle;
  if (scenario.attitude.law === 'tabulated' && scenario.attitude.profileId) {
    throw new CliError('scenario: attitude.profileId names an upload in the web product; on the command line give the rows inline');
  }
  return { scenario, vehicle: vehicleFromFile(vehicleFile) };
}
