import type { QueryInterface } from 'sequelize';
import * as m0001 from './0001-users-and-missions';
import * as m0002 from './0002-vehicles-scenarios-runs';
import * as m0003 from './0003-trade-studies';
import * as m0004 from './0004-reviews-comments-mail';
import * as m0005 from './0005-meshes-and-tables';

/** Every migration in order. A new migration is a new file here; applied ones are never edited. */
export const migrations: { name: string; up: (qi: QueryInterface) => Promise<void>; down: (qi: QueryInterface) => Promise<void> }[] = [
  { name: '0001-users-and-missions', ...m0001 },
  { name: '0002-vehicles-scenarios-runs', ...m0002 },
  { name: '0003-trade-studies', ...m0003 },
  { name: '0004-reviews-comments-mail', ...m0004 },
  { name: '0005-meshes-and-tables', ...m0005 },
];
