import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Fitting } from './fitting';
import type { User } from './user';

export class BayFile extends Model<InferAttributes<BayFile>, InferCreationAttributes<BayFile>> {
  declare id: CreationOptional<string>;
  declare fittingId: ForeignKey<Fitting['id']>;
  declare uploadedBy: ForeignKey<User['id']> | null;
  declare fileName: string;
  declare contentHash: string;
  declare rawText: string;
  /** The recipe applied, as JSON text. */
  declare recipe: string;
  /** The import report (counts, rejected rows, warnings), as JSON text. */
  declare report: string;
  declare rowCount: number;
  declare shotCount: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    BayFile.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        fileName: { type: DataTypes.STRING(255), allowNull: false },
        contentHash: { type: DataTypes.CHAR(64), allowNull: false },
        rawText: { type: DataTypes.TEXT('long'), allowNull: false },
        recipe: { type: DataTypes.TEXT('medium'), allowNull: false },
        report: { type: DataTypes.TEXT('long'), allowNull: false },
        rowCount: { type: DataTypes.INTEGER, allowNull: false },
        shotCount: { type: DataTypes.INTEGER, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'bay_files' },
    );
  }
}
