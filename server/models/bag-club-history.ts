import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { BagClub } from './bag-club';
import type { User } from './user';

/** One recorded change of a bag club: who, when, what (the club's whole state after it). */
export class BagClubHistory extends Model<InferAttributes<BagClubHistory>, InferCreationAttributes<BagClubHistory>> {
  declare id: CreationOptional<number>;
  declare bagClubId: ForeignKey<BagClub['id']>;
  declare shopId: string;
  declare playerId: string;
  declare action: 'add' | 'update' | 'replace' | 'out' | 'wear';
  declare changedAt: Date;
  declare changedBy: string | null;
  declare fittingId: string | null;
  declare snapshot: string;

  declare changer?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize) {
    BagClubHistory.init(
      {
        id: { type: DataTypes.BIGINT, autoIncrement: true, primaryKey: true },
        shopId: { type: DataTypes.UUID, allowNull: false },
        playerId: { type: DataTypes.UUID, allowNull: false },
        action: { type: DataTypes.ENUM('add', 'update', 'replace', 'out', 'wear'), allowNull: false },
        changedAt: { type: DataTypes.DATE(3), allowNull: false },
        changedBy: { type: DataTypes.UUID, allowNull: true },
        fittingId: { type: DataTypes.UUID, allowNull: true },
        snapshot: { type: DataTypes.TEXT, allowNull: false },
      },
      { sequelize, tableName: 'bag_club_history', timestamps: false },
    );
  }
}
