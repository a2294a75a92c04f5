import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
} from 'sequelize';
import type { FurnaceKind } from '../../../shared/heats/equipment-schemas.ts';
import { sequelize } from '../../db/sequelize.ts';

export class FurnaceModel extends Model<InferAttributes<FurnaceModel>, InferCreationAttributes<FurnaceModel>> {
  declare id: CreationOptional<string>;
  declare workshopId: string;
  declare name: string;
  declare kind: FurnaceKind;
  declare notes: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

FurnaceModel.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    workshopId: { type: DataTypes.UUID, allowNull: false },
    name: { type: DataTypes.STRING(80), allowNull: false },
    kind: { type: DataTypes.STRING(12), allowNull: false },
    notes: { type: DataTypes.TEXT, allowNull: true },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, modelName: 'Furnace', tableName: 'furnaces' },
);
