import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Meshes and their SRP coefficient tables. A mesh is imported from an uploaded OBJ/STL file into
 * the body frame (metres) and kept as float64 triangles; a coefficient table (force and torque per
 * unit pressure over a grid of Sun directions) is computed by one queued job per band of polar
 * rows (`coefficient_table_chunks`) and assembled by the last band to finish. Tables are shared by
 * cache key (geometry, resolved optics, settings): one live table per key and mission.
 */
export async function up(qi: QueryInterface): Promise<void> {
  const now = qi.sequelize.literal('now()');
  const uuidPk = { type: DataTypes.UUID, primaryKey: true, defaultValue: qi.sequelize.literal('gen_random_uuid()') };
  const vec3 = { type: DataTypes.JSONB, allowNull: false };
  await qi.sequelize.transaction(async (transaction) => {
    // Mesh files are uploads too (kept whole with their checksum).
    await qi.sequelize.query(
      `ALTER TABLE uploads DROP CONSTRAINT uploads_kind_check;
       ALTER TABLE uploads ADD CONSTRAINT uploads_kind_check CHECK (kind IN ('plate-set','attitude-profile','mesh'));`,
      { transaction },
    );
    await qi.createTable(
      'meshes',
      {
        id: uuidPk,
        mission_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'missions', key: 'id' }, onDelete: 'CASCADE' },
        upload_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'uploads', key: 'id' } },
        name: { type: DataTypes.STRING(120), allowNull: false },
        file_name: { type: DataTypes.STRING(255), allowNull: false },
        format: { type: DataTypes.STRING(16), allowNull: false },
        units: { type: DataTypes.STRING(4), allowNull: false },
        rotation_deg: vec3,
        translation_m: vec3,
        triangle_count: { type: DataTypes.INTEGER, allowNull: false },
        dropped_degenerate: { type: DataTypes.INTEGER, allowNull: false },
        /** [{ name, triangleCount, areaM2 }] in group-index order. */
        groups: { type: DataTypes.JSONB, allowNull: false },
        total_area_m2: { type: DataTypes.DOUBLE, allowNull: false },
        bounds_m: { type: DataTypes.JSONB, allowNull: false },
        /** Little-endian: 9 float64 per triangle (body frame, m), then one uint32 group index per triangle. */
        geometry: { type: DataTypes.BLOB, allowNull: false },
        geometry_sha256: { type: DataTypes.CHAR(64), allowNull: false },
        created_by: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
        created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: now },
      },
      { transaction },
    );
    await qi.sequelize.query(
      `ALTER TABLE meshes ADD CONSTRAINT meshes_name_unique UNIQUE (mission_id, name);
       ALTER TABLE meshes ADD CONSTRAINT meshes_format_check CHECK (format IN ('obj','stl-ascii','stl-binary'));
       ALTER TABLE meshes ADD CONSTRAINT meshes_units_check CHECK (units IN ('m','mm'));
       ALTER TABLE meshes ADD CONSTRAINT meshes_geometry_size_check CHECK (octet_length(geometry) = triangle_count * 76);`,
      { transaction },
    );
    await qi.addIndex('meshes', ['mission_id', 'created_at'], { transaction });

    await qi.createTable(
      'coefficient_tables',
      {
        id: uuidPk,
        mission_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'missions', key: 'id' }, onDelete: 'CASCADE' },
        mesh_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'meshes', key: 'id' }, onDelete: 'CASCADE' },
        cache_key: { type: DataTypes.CHAR(64), allowNull: false },
        /** { stepDeg, samplesPerFacet, specularBounce } */
        settings: { type: DataTypes.JSONB, allowNull: false },
        /** { default, groups: { <every mesh group>: { front, back? } } }, presets resolved to fractions. */
        resolved_optics: { type: DataTypes.JSONB, allowNull: false },
        status: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'queued' },
        progress: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
        polar_count: { type: DataTypes.INTEGER, allowNull: false },
        azimuth_count: { type: DataTypes.INTEGER, allowNull: false },
        chunk_count: { type: DataTypes.INTEGER, allowNull: false },
        chunks_done: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        error: { type: DataTypes.TEXT, allowNull: true },
        /** { rays, raysPerSecond, computeMs } once succeeded. */
        stats: { type: DataTypes.JSONB, allowNull: true },
        /** Little-endian float64, 6 per node in row-major (polar, azimuth) order; null until succeeded. */
        data: { type: DataTypes.BLOB, allowNull: true },
        created_by: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
        created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: now },
        updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: now },
        finished_at: { type: DataTypes.DATE, allowNull: true },
      },
      { transaction },
    );
    await qi.sequelize.query(
      `ALTER TABLE coefficient_tables ADD CONSTRAINT coefficient_tables_status_check CHECK (status IN ('queued','running','succeeded','failed','cancelled'));
       ALTER TABLE coefficient_tables ADD CONSTRAINT coefficient_tables_progress_check CHECK (progress >= 0 AND progress <= 1);
       ALTER TABLE coefficient_tables ADD CONSTRAINT coefficient_tables_data_check CHECK ((status = 'succeeded') = (data IS NOT NULL));
       -- One live table per key: a failed or cancelled one may be followed by a new attempt.
       CREATE UNIQUE INDEX coefficient_tables_live_key ON coefficient_tables (mission_id, cache_key) WHERE status NOT IN ('failed','cancelled');`,
      { transaction },
    );
    await qi.addIndex('coefficient_tables', ['mesh_id'], { transaction });

    await qi.createTable(
      'coefficient_table_chunks',
      {
        id: uuidPk,
        table_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'coefficient_tables', key: 'id' }, onDelete: 'CASCADE' },
        chunk_index: { type: DataTypes.INTEGER, allowNull: false },
        first_polar_row: { type: DataTypes.INTEGER, allowNull: false },
        end_polar_row: { type: DataTypes.INTEGER, allowNull: false },
        status: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'queued' },
        /** Polar rows of this band computed so far (progress). */
        rows_done: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        /** Little-endian float64 rows of the band (6 per node), once succeeded. */
        data: { type: DataTypes.BLOB, allowNull: true },
        rays: { type: DataTypes.DOUBLE, allowNull: true },
        compute_ms: { type: DataTypes.DOUBLE, allowNull: true },
        worker_id: { type: DataTypes.STRING(120), allowNull: true },
        attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        error: { type: DataTypes.TEXT, allowNull: true },
        started_at: { type: DataTypes.DATE, allowNull: true },
        heartbeat_at: { type: DataTypes.DATE, allowNull: true },
        finished_at: { type: DataTypes.DATE, allowNull: true },
        created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: now },
        updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: now },
      },
      { transaction },
    );
    await qi.sequelize.query(
      `ALTER TABLE coefficient_table_chunks ADD CONSTRAINT coefficient_table_chunks_status_check CHECK (status IN ('queued','running','succeeded','failed','cancelled'));
       ALTER TABLE coefficient_table_chunks ADD CONSTRAINT coefficient_table_chunks_index_unique UNIQUE (table_id, chunk_index);
       ALTER TABLE coefficient_table_chunks ADD CONSTRAINT coefficient_table_chunks_rows_check CHECK (first_polar_row >= 0 AND end_polar_row > first_polar_row);`,
      { transaction },
    );
    await qi.addIndex('coefficient_table_chunks', ['status', 'heartbeat_at'], { transaction });
  });
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.sequelize.transaction(async (transaction) => {
    await qi.dropTable('coefficient_table_chunks', { transaction });
    await qi.dropTable('coefficient_tables', { transaction });
    await qi.dropTable('meshes', { transaction });
    await qi.sequelize.query(
      `DELETE FROM uploads WHERE kind = 'mesh';
       ALTER TABLE uploads DROP CONSTRAINT uploads_kind_check;
       ALTER TABLE uploads ADD CONSTRAINT uploads_kind_check CHECK (kind IN ('plate-set','attitude-profile'));`,
      { transaction },
    );
  });
}
