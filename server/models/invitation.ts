import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Player } from './player';
import type { Shop } from './shop';
import type { User } from './user';

/** A fitter or a player asked by e-mail to set a password: one use, expiring, revocable. */
export class Invitation extends Model<InferAttributes<Invitation>, InferCreationAttributes<Invitation>> {
  declare id: CreationOptional<string>;
  declare shopId: ForeignKey<Shop['id']>;
  declare role: 'fitter' | 'player';
  declare email: string;
  declare name: string;
  declare playerId: ForeignKey<Player['id']> | null;
  declare invitedBy: ForeignKey<User['id']> | null;
  declare tokenHash: string;
  declare expiresAt: Date;
  declare sentAt: Date;
  declare usedAt: Date | null;
  declare revokedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Invitation.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        role: { type: DataTypes.ENUM('fitter', 'player'), allowNull: false },
        email: { type: DataTypes.STRING(200), allowNull: false },
        name: { type: DataTypes.STRING(120), allowNull: false },
        tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
        expiresAt: { type: DataTypes.DATE, allowNull: false },
        sentAt: { type: DataTypes.DATE, allowNull: false },
        usedAt: { type: DataTypes.DATE, allowNull: true },
        revokedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'invitations' },
    );
  }
}
