import { Sequelize } from 'sequelize';
import { initModels } from './models';

/** Opens a Sequelize connection pool and registers the models on it. */
export function createDatabase(databaseUrl: string): Sequelize {
  const sequelize = new Sequelize(databaseUrl, {
    dialect: 'postgres',
    logging: false,
    pool: { max: 10, idle: 10_000 },
    define: { underscored: true },
  });
  initModels(sequelize);
  return sequelize;
}
