import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Shop } from './shop';
import type { User } from './user';

/** A shop's own head-to-head margins and on-target odds defaults (one row per shop). */
export class ShopMargins extends Model<InferAttributes<ShopMargins>, InferCreationAttributes<ShopMargins>> {
  declare shopId: ForeignKey<Shop['id']>;
  /** JSON text: canonical margin per field the owner set (validated by server/schemas/shop-margins.ts). */
  declare margins: string;
  declare fairwayWidthM: number | null;
  declare greenRadiusM: number | null;
  declare updatedBy: ForeignKey<User['id']> | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    ShopMargins.init(
      {
        shopId: { type: DataTypes.UUID, primaryKey: true },
        margins: { type: DataTypes.TEXT, allowNull: false },
        fairwayWidthM: { type: DataTypes.DOUBLE, allowNull: true },
        greenRadiusM: { type: DataTypes.DOUBLE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'shop_margins' },
    );
  }
}
