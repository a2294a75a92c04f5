import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
} from 'sequelize';
import { sequelize } from '../../db/sequelize.ts';

export class UserModel extends Model<InferAttributes<UserModel>, InferCreationAttributes<UserModel>> {
  declare id: CreationOptional<string>;
  declare email: string;
  declare passwordHash: string;
  declare displayName: string;
  declare temperatureUnit: CreationOptional<'C' | 'F'>;
  declare massUnit: CreationOptional<'g' | 'oz'>;
  declare theme: CreationOptional<'system' | 'light' | 'dark'>;
  declare passwordChangedAt: CreationOptional<Date>;
  /** Sealed by server/lib/secret-box.ts; pending until totpEnabledAt is set. */
  declare totpSecret: CreationOptional<string | null>;
  declare totpEnabledAt: CreationOptional<Date | null>;
  declare totpLastStep: CreationOptional<number | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

UserModel.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    passwordHash: { type: DataTypes.STRING(100), allowNull: false },
    displayName: { type: DataTypes.STRING(80), allowNull: false },
    temperatureUnit: { type: DataTypes.STRING(1), allowNull: false, defaultValue: 'C' },
    massUnit: { type: DataTypes.STRING(2), allowNull: false, defaultValue: 'g' },
    theme: { type: DataTypes.STRING(6), allowNull: false, defaultValue: 'system' },
    passwordChangedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
    totpSecret: { type: DataTypes.STRING(200), allowNull: true },
    totpEnabledAt: { type: DataTypes.DATE, allowNull: true },
    totpLastStep: { type: DataTypes.INTEGER, allowNull: true },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, modelName: 'User', tableName: 'users' },
);
