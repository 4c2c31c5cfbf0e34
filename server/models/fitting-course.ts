import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { CourseStep } from '../schemas';

const STEPS = ['requested', 'intake-done', 'in-progress', 'recommendation-sent', 'accepted', 'built', 'delivered'];

/** One dated change of a fitting's course (migration 0010). */
export class FittingCourseStep extends Model<InferAttributes<FittingCourseStep>, InferCreationAttributes<FittingCourseStep>> {
  declare id: CreationOptional<number>;
  declare fittingId: string;
  declare shopId: string;
  declare step: CourseStep;
  declare direction: 'forward' | 'back';
  declare reason: string | null;
  declare at: Date;
  declare byUserId: string | null;

  static initModel(sequelize: Sequelize) {
    FittingCourseStep.init(
      {
        id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true, get() { return Number(this.getDataValue('id')); } },
        fittingId: { type: DataTypes.UUID, allowNull: false },
        shopId: { type: DataTypes.UUID, allowNull: false },
        step: { type: DataTypes.ENUM(...STEPS), allowNull: false },
        direction: { type: DataTypes.ENUM('forward', 'back'), allowNull: false },
        reason: { type: DataTypes.STRING(500), allowNull: true },
        at: { type: DataTypes.DATE(3), allowNull: false },
        byUserId: { type: DataTypes.UUID, allowNull: true },
      },
      { sequelize, tableName: 'fitting_course_steps', timestamps: false },
    );
  }
}

/** The player's intake answers of a remote fitting. */
export class FittingIntake extends Model<InferAttributes<FittingIntake>, InferCreationAttributes<FittingIntake>> {
  declare fittingId: string;
  declare shopId: string;
  declare playerId: string;
  declare handedness: 'right' | 'left';
  declare heightCm: number;
  declare wristToFloorCm: number;
  declare handicap: number | null;
  declare usualMiss: string | null;
  declare ballFlightNow: string | null;
  declare ballFlightWanted: string | null;
  declare wishes: string | null;
  declare submittedAt: Date;
  declare submittedBy: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    FittingIntake.init(
      {
        fittingId: { type: DataTypes.UUID, primaryKey: true },
        shopId: { type: DataTypes.UUID, allowNull: false },
        playerId: { type: DataTypes.UUID, allowNull: false },
        handedness: { type: DataTypes.ENUM('right', 'left'), allowNull: false },
        heightCm: { type: DataTypes.DOUBLE, allowNull: false },
        wristToFloorCm: { type: DataTypes.DOUBLE, allowNull: false },
        handicap: { type: DataTypes.DOUBLE, allowNull: true },
        usualMiss: { type: DataTypes.STRING(200), allowNull: true },
        ballFlightNow: { type: DataTypes.STRING(300), allowNull: true },
        ballFlightWanted: { type: DataTypes.STRING(300), allowNull: true },
        wishes: { type: DataTypes.TEXT, allowNull: true },
        submittedAt: { type: DataTypes.DATE, allowNull: false },
        submittedBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'fitting_intakes' },
    );
  }
}

/** A plain-text message on a fitting. */
export class FittingMessageRecord extends Model<InferAttributes<FittingMessageRecord>, InferCreationAttributes<FittingMessageRecord>> {
  declare id: CreationOptional<number>;
  declare fittingId: string;
  declare shopId: string;
  declare authorId: string | null;
  declare authorName: string;
  declare fromPlayer: boolean;
  declare body: string;
  declare at: Date;

  static initModel(sequelize: Sequelize) {
    FittingMessageRecord.init(
      {
        id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true, get() { return Number(this.getDataValue('id')); } },
        fittingId: { type: DataTypes.UUID, allowNull: false },
        shopId: { type: DataTypes.UUID, allowNull: false },
        authorId: { type: DataTypes.UUID, allowNull: true },
        authorName: { type: DataTypes.STRING(120), allowNull: false },
        fromPlayer: { type: DataTypes.BOOLEAN, allowNull: false },
        body: { type: DataTypes.TEXT, allowNull: false },
        at: { type: DataTypes.DATE(3), allowNull: false },
      },
      { sequelize, tableName: 'fitting_messages', timestamps: false },
    );
  }
}

/** The last message a person has read on a fitting. */
export class FittingMessageRead extends Model<InferAttributes<FittingMessageRead>, InferCreationAttributes<FittingMessageRead>> {
  declare fittingId: string;
  declare userId: string;
  declare lastReadId: number;

  static initModel(sequelize: Sequelize) {
    FittingMessageRead.init(
      {
        fittingId: { type: DataTypes.UUID, primaryKey: true },
        userId: { type: DataTypes.UUID, primaryKey: true },
        lastReadId: { type: DataTypes.BIGINT, allowNull: false, get() { return Number(this.getDataValue('lastReadId')); } },
      },
      { sequelize, tableName: 'fitting_message_reads', timestamps: false },
    );
  }
}

/** A shop's public request link (/request/<slug>). */
export class ShopRequestLink extends Model<InferAttributes<ShopRequestLink>, InferCreationAttributes<ShopRequestLink>> {
  declare shopId: string;
  declare slug: string;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    ShopRequestLink.init(
      {
        shopId: { type: DataTypes.UUID, primaryKey: true },
        slug: { type: DataTypes.STRING(80), allowNull: false, unique: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'shop_request_links', updatedAt: false },
    );
  }
}

/** Registers the remote-fitting models (migration 0010). */
export function initRemoteFittingModels(sequelize: Sequelize): void {
  FittingCourseStep.initModel(sequelize);
  FittingIntake.initModel(sequelize);
  FittingMessageRecord.initModel(sequelize);
  FittingMessageRead.initModel(sequelize);
  ShopRequestLink.initModel(sequelize);
}
