import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
} from 'sequelize';
import type { MoldMaterial } from '../../../shared/domain/index.ts';
import { sequelize } from '../../db/sequelize.ts';

export class MouldModel extends Model<InferAttributes<MouldModel>, InferCreationAttributes<MouldModel>> {
  declare id: CreationOptional<string>;
  declare workshopId: string;
  declare name: string;
  declare material: MoldMaterial;
  declare capacityG: number | null;
  declare capacityAlloy: string | null;
  declare hasRiser: CreationOptional<boolean>;
  declare coating: string | null;
  declare notes: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

MouldModel.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    workshopId: { type: DataTypes.UUID, allowNull: false },
    name: { type: DataTypes.STRING(80), allowNull: false },
    material: { type: DataTypes.STRING(20), allowNull: false },
    capacityG: { type: DataTypes.DECIMAL, allowNull: true },
    capacityAlloy: { type: DataTypes.STRING(60), allowNull: true },
    hasRiser: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    coating: { type: DataTypes.STRING(200), allowNull: true },
    notes: { type: DataTypes.TEXT, allowNull: true },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, modelName: 'Mould', tableName: 'moulds' },
);
