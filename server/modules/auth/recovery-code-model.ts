import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
} from 'sequelize';
import { sequelize } from '../../db/sequelize.ts';

export class RecoveryCodeModel extends Model<InferAttributes<RecoveryCodeModel>, InferCreationAttributes<RecoveryCodeModel>> {
  declare id: CreationOptional<string>;
  declare userId: string;
  declare codeHash: string;
  declare usedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

RecoveryCodeModel.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    userId: { type: DataTypes.UUID, allowNull: false },
    codeHash: { type: DataTypes.STRING(64), allowNull: false },
    usedAt: { type: DataTypes.DATE, allowNull: true },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, modelName: 'RecoveryCode', tableName: 'recovery_codes' },
);
