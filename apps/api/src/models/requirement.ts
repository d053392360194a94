import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A mission's requirement on one budget line (set by a lead), applied to every run's budget when read. */
export class RequirementModel extends Model<InferAttributes<RequirementModel>, InferCreationAttributes<RequirementModel>> {
  declare id: CreationOptional<string>;
  declare missionId: string;
  declare line: string;
  declare comparator: '<=' | '>=';
  declare value: number;
  declare minMarginPercent: number;
  declare note: CreationOptional<string>;
  declare setBy: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    RequirementModel.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        missionId: { type: DataTypes.UUID, allowNull: false },
        line: { type: DataTypes.STRING(48), allowNull: false },
        comparator: { type: DataTypes.STRING(2), allowNull: false },
        value: { type: DataTypes.DOUBLE, allowNull: false },
        minMarginPercent: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
        note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        setBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'requirements', modelName: 'Requirement' },
    );
  }
}
