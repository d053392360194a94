import type { QueryInterface } from 'sequelize';
import * as m0001 from './0001-users-and-missions';
import * as m0002 from './0002-vehicles-scenarios-runs';

/** Every migration in order. A new migration is a new file here; applied ones are never edited. */
export const migrations: { name: string; up: (qi: QueryInterface) => Promise<void>; down: (qi: QueryInterface) => Promise<void> }[] = [
  { name: '0001-users-and-missions', ...m0001 },
  { name: '0002-vehicles-scenarios-runs', ...m0002 },
];
