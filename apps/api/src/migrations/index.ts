import type { QueryInterface } from 'sequelize';
import * as m0001 from './0001-users-and-missions';

/** Every migration in order. A new migration is a new file here; applied ones are never edited. */
export const migrations: { name: string; up: (qi: QueryInterface) => Promise<void>; down: (qi: QueryInterface) => Promise<void> }[] = [
  { name: '0001-users-and-missions', ...m0001 },
];
