import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Vehicles with immutable revisions, uploaded files, scenarios, runs and their results (summary,
 * events, budget, and the ephemeris samples in chunks), mission requirements and the audit log.
 */
export async function up(qi: QueryInterface): Promise<void> {
  const now = qi.sequelize.literal('now()');
  const uuidPk = { type: DataTypes.UUID, primaryKey: true, defaultValue: qi.sequelize.literal('gen_random_uuid()') };
  const missionFk = { type: DataTypes.UUID, allowNull: false, references: { model: 'missions', key: 'id' }, onDelete: 'CASCADE' };
  const userFk = { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' };
  const timestamps = {
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: now },
    updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: now },
  };
  await qi.sequelize.transaction(async (transaction) => {
    await qi.createTable(
      'uploads',
      {
        id: uuidPk,
        mission_id: missionFk,
        kind: { type: DataTypes.STRING(24), allowNull: false },
        file_name: { type: DataTypes.STRING(255), allowNull: false },
        content_type: { type: DataTypes.STRING(120), allowNull: false },
        size_bytes: { type: DataTypes.INTEGER, allowNull: false },
        sha256: { type: DataTypes.CHAR(64), allowNull: false },
        /** What the parser found (row count, time range...), for listings. */
        summary: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        data: { type: DataTypes.BLOB, allowNull: false },
        created_by: userFk,
        created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: now },
      },
      { transaction },
    );
    await qi.sequelize.query(
      `ALTER TABLE uploads ADD CONSTRAINT uploads_kind_check CHECK (kind IN ('plate-set','attitude-profile'));
       ALTER TABLE uploads ADD CONSTRAINT uploads_size_check CHECK (size_bytes >= 0 AND size_bytes = octet_length(data));`,
      { transaction },
    );
    await qi.addIndex('uploads', ['mission_id', 'kind'], { transaction });

    await qi.createTable(
      'vehicles',
      {
        id: uuidPk,
        mission_id: missionFk,
        name: { type: DataTypes.STRING(120), allowNull: false },
        kind: { type: DataTypes.STRING(16), allowNull: false },
        latest_revision: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        created_by: userFk,
        ...timestamps,
      },
      { transaction },
    );
    await qi.addIndex('vehicles', ['mission_id', 'name'], { unique: true, transaction });
    await qi.createTable(
      'vehicle_revisions',
      {
        id: uuidPk,
        vehicle_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'vehicles', key: 'id' }, onDelete: 'CASCADE' },
        revision: { type: DataTypes.INTEGER, allowNull: false },
        /** The vehicle as the shared vehicleSpecSchema describes it; never updated. */
        spec: { type: DataTypes.JSONB, allowNull: false },
        kind: { type: DataTypes.STRING(16), allowNull: false },
        mass_kg: { type: DataTypes.DOUBLE, allowNull: false },
        surface_count: { type: DataTypes.INTEGER, allowNull: false },
        total_area_m2: { type: DataTypes.DOUBLE, allowNull: false },
        note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        source_upload_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'uploads', key: 'id' }, onDelete: 'SET NULL' },
        created_by: userFk,
        created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: now },
      },
      { transaction },
    );
    await qi.addIndex('vehicle_revisions', ['vehicle_id', 'revision'], { unique: true, transaction });

    await qi.createTable(
      'scenarios',
      {
        id: uuidPk,
        mission_id: missionFk,
        name: { type: DataTypes.STRING(120), allowNull: false },
        vehicle_revision_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'vehicle_revisions', key: 'id' }, onDelete: 'RESTRICT' },
        /** The scenario as the shared schema describes it, vehicle given as { ref: vehicle revision id }. */
        spec: { type: DataTypes.JSONB, allowNull: false },
        created_by: userFk,
        ...timestamps,
      },
      { transaction },
    );
    await qi.addIndex('scenarios', ['mission_id', 'name'], { unique: true, transaction });

    await qi.createTable(
      'runs',
      {
        id: uuidPk,
        mission_id: missionFk,
        scenario_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'scenarios', key: 'id' }, onDelete: 'CASCADE' },
        vehicle_revision_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'vehicle_revisions', key: 'id' }, onDelete: 'RESTRICT' },
        /** The scenario as it was when the run was made: a run is reproducible after edits. */
        scenario_spec: { type: DataTypes.JSONB, allowNull: false },
        status: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'queued' },
        progress: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
        cancel_requested: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        error_message: { type: DataTypes.TEXT, allowNull: true },
        /** Which worker holds (or last held) the run: host:pid:n. */
        worker_id: { type: DataTypes.STRING(120), allowNull: true },
        attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        rerun_of: { type: DataTypes.UUID, allowNull: true, references: { model: 'runs', key: 'id' }, onDelete: 'SET NULL' },
        queued_at: { type: DataTypes.DATE, allowNull: false, defaultValue: now },
        started_at: { type: DataTypes.DATE, allowNull: true },
        heartbeat_at: { type: DataTypes.DATE, allowNull: true },
        finished_at: { type: DataTypes.DATE, allowNull: true },
        created_by: userFk,
        ...timestamps,
      },
      { transaction },
    );
    await qi.sequelize.query(
      `ALTER TABLE runs ADD CONSTRAINT runs_status_check CHECK (status IN ('queued','running','succeeded','failed','cancelled'));
       ALTER TABLE runs ADD CONSTRAINT runs_progress_check CHECK (progress >= 0 AND progress <= 1);`,
      { transaction },
    );
    await qi.addIndex('runs', ['mission_id', 'created_at'], { transaction });
    await qi.addIndex('runs', ['scenario_id', 'created_at'], { transaction });
    await qi.addIndex('runs', ['status', 'heartbeat_at'], { transaction });

    await qi.createTable(
      'run_results',
      {
        run_id: { type: DataTypes.UUID, primaryKey: true, references: { model: 'runs', key: 'id' }, onDelete: 'CASCADE' },
        /** Counts, timings, span, end state: what the run page shows first. */
        summary: { type: DataTypes.JSONB, allowNull: false },
        /** Located events, time order: [{ name, tSeconds, utc }]. */
        events: { type: DataTypes.JSONB, allowNull: false },
        /** srp-core's budget computed without requirements (they are applied when read). */
        budget: { type: DataTypes.JSONB, allowNull: false },
        /** Sample layout: { stride, forceNames }. */
        layout: { type: DataTypes.JSONB, allowNull: false },
        sample_count: { type: DataTypes.INTEGER, allowNull: false },
        created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: now },
      },
      { transaction },
    );
    await qi.createTable(
      'run_sample_chunks',
      {
        run_id: { type: DataTypes.UUID, primaryKey: true, references: { model: 'runs', key: 'id' }, onDelete: 'CASCADE' },
        chunk_index: { type: DataTypes.INTEGER, primaryKey: true },
        t_start: { type: DataTypes.DOUBLE, allowNull: false },
        t_end: { type: DataTypes.DOUBLE, allowNull: false },
        row_count: { type: DataTypes.INTEGER, allowNull: false },
        /** row_count packed rows of layout.stride little-endian float64 numbers. */
        data: { type: DataTypes.BLOB, allowNull: false },
      },
      { transaction },
    );
    await qi.addIndex('run_sample_chunks', ['run_id', 't_start'], { transaction });

    await qi.createTable(
      'requirements',
      {
        id: uuidPk,
        mission_id: missionFk,
        line: { type: DataTypes.STRING(48), allowNull: false },
        comparator: { type: DataTypes.STRING(2), allowNull: false },
        value: { type: DataTypes.DOUBLE, allowNull: false },
        min_margin_percent: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
        note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        set_by: userFk,
        ...timestamps,
      },
      { transaction },
    );
    await qi.addIndex('requirements', ['mission_id', 'line'], { unique: true, transaction });
    await qi.sequelize.query(`ALTER TABLE requirements ADD CONSTRAINT requirements_comparator_check CHECK (comparator IN ('<=','>='));`, {
      transaction,
    });

    await qi.createTable(
      'audit_log',
      {
        id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
        at: { type: DataTypes.DATE, allowNull: false, defaultValue: now },
        user_id: userFk,
        mission_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'missions', key: 'id' }, onDelete: 'CASCADE' },
        action: { type: DataTypes.STRING(48), allowNull: false },
        entity_type: { type: DataTypes.STRING(32), allowNull: false },
        entity_id: { type: DataTypes.STRING(64), allowNull: false },
        detail: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
      },
      { transaction },
    );
    await qi.addIndex('audit_log', ['mission_id', 'at'], { transaction });
    await qi.addIndex('audit_log', ['entity_type', 'entity_id'], { transaction });
  });
}

export async function down(qi: QueryInterface): Promise<void> {
  for (const table of ['audit_log', 'requirements', 'run_sample_chunks', 'run_results', 'runs', 'scenarios', 'vehicle_revisions', 'vehicles', 'uploads']) {
    await qi.dropTable(table);
  }
}
