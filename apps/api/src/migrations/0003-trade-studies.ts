import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Trade studies: a definition (base scenario and vehicle revision snapshotted, parameters varied,
 * lines compared) and its cases, one queued job each. A case stores the parameter values it was
 * made with, its status, the budget line values and the error when it failed.
 */
export async function up(qi: QueryInterface): Promise<void> {
  const now = qi.sequelize.literal('now()');
  const uuidPk = { type: DataTypes.UUID, primaryKey: true, defaultValue: qi.sequelize.literal('gen_random_uuid()') };
  const timestamps = {
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: now },
    updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: now },
  };
  await qi.sequelize.transaction(async (transaction) => {
    await qi.createTable(
      'trade_studies',
      {
        id: uuidPk,
        mission_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'missions', key: 'id' }, onDelete: 'CASCADE' },
        name: { type: DataTypes.STRING(200), allowNull: false },
        scenario_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'scenarios', key: 'id' }, onDelete: 'SET NULL' },
        vehicle_revision_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'vehicle_revisions', key: 'id' } },
        /** Snapshots: later edits of the scenario do not change what the study computes. */
        base_scenario: { type: DataTypes.JSONB, allowNull: false },
        base_vehicle: { type: DataTypes.JSONB, allowNull: false },
        /** The definition as posted (design, lines). */
        definition: { type: DataTypes.JSONB, allowNull: false },
        case_count: { type: DataTypes.INTEGER, allowNull: false },
        cancel_requested: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        created_by: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
        ...timestamps,
      },
      { transaction },
    );
    await qi.addIndex('trade_studies', ['mission_id', 'created_at'], { transaction });
    await qi.createTable(
      'study_cases',
      {
        id: uuidPk,
        study_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'trade_studies', key: 'id' }, onDelete: 'CASCADE' },
        case_index: { type: DataTypes.INTEGER, allowNull: false },
        /** Every field the case sets, by path (`vehicle.massKg`), including companions of optical fractions. */
        parameters: { type: DataTypes.JSONB, allowNull: false },
        status: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'queued' },
        /** Budget line values by key (null where the budget has no value). */
        lines: { type: DataTypes.JSONB, allowNull: true },
        error_message: { type: DataTypes.TEXT, allowNull: true },
        worker_id: { type: DataTypes.STRING(120), allowNull: true },
        attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        started_at: { type: DataTypes.DATE, allowNull: true },
        heartbeat_at: { type: DataTypes.DATE, allowNull: true },
        finished_at: { type: DataTypes.DATE, allowNull: true },
        ...timestamps,
      },
      { transaction },
    );
    await qi.sequelize.query(
      `ALTER TABLE study_cases ADD CONSTRAINT study_cases_status_check CHECK (status IN ('queued','running','succeeded','failed','cancelled'));
       ALTER TABLE study_cases ADD CONSTRAINT study_cases_index_unique UNIQUE (study_id, case_index);`,
      { transaction },
    );
    await qi.addIndex('study_cases', ['study_id', 'status'], { transaction });
  });
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.sequelize.transaction(async (transaction) => {
    await qi.dropTable('study_cases', { transaction });
    await qi.dropTable('trade_studies', { transaction });
  });
}
