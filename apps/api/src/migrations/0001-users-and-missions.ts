import { DataTypes, type QueryInterface } from 'sequelize';

/** Users, missions and mission membership. */
export async function up(qi: QueryInterface): Promise<void> {
  await qi.sequelize.transaction(async (transaction) => {
    await qi.createTable(
      'users',
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: qi.sequelize.literal('gen_random_uuid()') },
        email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
        display_name: { type: DataTypes.STRING(120), allowNull: false },
        role: { type: DataTypes.STRING(16), allowNull: false },
        password_hash: { type: DataTypes.STRING(100), allowNull: false },
        created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: qi.sequelize.literal('now()') },
        updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: qi.sequelize.literal('now()') },
      },
      { transaction },
    );
    await qi.sequelize.query(
      `ALTER TABLE users ADD CONSTRAINT users_role_check CHECK (role IN ('admin','engineer','lead','reviewer'));
       ALTER TABLE users ADD CONSTRAINT users_email_lower CHECK (email = lower(email));`,
      { transaction },
    );
    await qi.createTable(
      'missions',
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: qi.sequelize.literal('gen_random_uuid()') },
        slug: { type: DataTypes.STRING(60), allowNull: false, unique: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        regime: { type: DataTypes.STRING(16), allowNull: false },
        summary: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        created_by: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
        created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: qi.sequelize.literal('now()') },
        updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: qi.sequelize.literal('now()') },
      },
      { transaction },
    );
    await qi.sequelize.query(
      `ALTER TABLE missions ADD CONSTRAINT missions_regime_check CHECK (regime IN ('earth-orbit','heliocentric'));`,
      { transaction },
    );
    await qi.createTable(
      'mission_members',
      {
        mission_id: { type: DataTypes.UUID, primaryKey: true, references: { model: 'missions', key: 'id' }, onDelete: 'CASCADE' },
        user_id: { type: DataTypes.UUID, primaryKey: true, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
        created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: qi.sequelize.literal('now()') },
      },
      { transaction },
    );
    await qi.addIndex('mission_members', ['user_id'], { transaction });
  });
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.dropTable('mission_members');
  await qi.dropTable('missions');
  await qi.dropTable('users');
}
