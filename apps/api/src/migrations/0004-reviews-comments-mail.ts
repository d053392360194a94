import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Reviews and approvals, threaded comments with mentions, and the outgoing e-mail log. Subjects
 * are referenced generically (type + id, no foreign key), so a study can be reviewed or commented
 * on whatever table holds it.
 */
export async function up(qi: QueryInterface): Promise<void> {
  const now = qi.sequelize.literal('now()');
  const uuidPk = { type: DataTypes.UUID, primaryKey: true, defaultValue: qi.sequelize.literal('gen_random_uuid()') };
  const missionFk = { type: DataTypes.UUID, allowNull: false, references: { model: 'missions', key: 'id' }, onDelete: 'CASCADE' };
  const userFk = { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' };
  await qi.sequelize.transaction(async (transaction) => {
    await qi.createTable(
      'reviews',
      {
        id: uuidPk,
        mission_id: missionFk,
        subject_type: { type: DataTypes.STRING(16), allowNull: false },
        subject_id: { type: DataTypes.UUID, allowNull: false },
        state: { type: DataTypes.STRING(20), allowNull: false },
        submitted_by: userFk,
        submitted_at: { type: DataTypes.DATE, allowNull: true },
        decided_by: userFk,
        decided_at: { type: DataTypes.DATE, allowNull: true },
        reason: { type: DataTypes.TEXT, allowNull: true },
        note: { type: DataTypes.TEXT, allowNull: true },
        /** What an approval froze: ids covered and the content they held. */
        frozen_ids: { type: DataTypes.JSONB, allowNull: true },
        content_hash: { type: DataTypes.CHAR(64), allowNull: true },
        frozen_at: { type: DataTypes.DATE, allowNull: true },
        created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: now },
        updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: now },
      },
      { transaction },
    );
    await qi.sequelize.query(
      `ALTER TABLE reviews ADD CONSTRAINT reviews_subject_type_check CHECK (subject_type IN ('study','budget'));
       ALTER TABLE reviews ADD CONSTRAINT reviews_state_check CHECK (state IN ('draft','in-review','approved','changes-requested'));
       ALTER TABLE reviews ADD CONSTRAINT reviews_frozen_check CHECK (state <> 'approved' OR content_hash IS NOT NULL);`,
      { transaction },
    );
    await qi.addIndex('reviews', ['subject_type', 'subject_id'], { unique: true, transaction });
    await qi.addIndex('reviews', ['mission_id', 'state'], { transaction });

    await qi.createTable(
      'comments',
      {
        id: uuidPk,
        mission_id: missionFk,
        subject_type: { type: DataTypes.STRING(16), allowNull: false },
        subject_id: { type: DataTypes.UUID, allowNull: false },
        line_key: { type: DataTypes.STRING(64), allowNull: true },
        parent_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'comments', key: 'id' }, onDelete: 'CASCADE' },
        author_id: userFk,
        body: { type: DataTypes.TEXT, allowNull: false },
        mention_user_ids: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        resolved: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        resolved_by: userFk,
        resolved_at: { type: DataTypes.DATE, allowNull: true },
        created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: now },
        updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: now },
      },
      { transaction },
    );
    await qi.sequelize.query(`ALTER TABLE comments ADD CONSTRAINT comments_subject_type_check CHECK (subject_type IN ('study','case','budget'));`, { transaction });
    await qi.addIndex('comments', ['mission_id', 'subject_type', 'subject_id', 'created_at'], { transaction });

    await qi.createTable(
      'mail_messages',
      {
        id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
        to_addresses: { type: DataTypes.JSONB, allowNull: false },
        from_address: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        subject: { type: DataTypes.TEXT, allowNull: false },
        text: { type: DataTypes.TEXT, allowNull: false },
        received_at: { type: DataTypes.DATE, allowNull: false, defaultValue: now },
      },
      { transaction },
    );
    await qi.addIndex('mail_messages', ['received_at'], { transaction });
  });
}

export async function down(qi: QueryInterface): Promise<void> {
  for (const table of ['mail_messages', 'comments', 'reviews']) await qi.dropTable(table);
}
