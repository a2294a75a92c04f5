import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
} from 'sequelize';
import { sequelize } from '../../db/sequelize.ts';

export class WorkshopAlloyModel extends Model<InferAttributes<WorkshopAlloyModel>, InferCreationAttributes<WorkshopAlloyModel>> {
  declare id: CreationOptional<string>;
  declare workshopId: string;
  declare designation: string;
  declare designationKey: string;
  /** The alloy as alloySchema parses it; the repository parses it again on the way out. */
  declare data: unknown;
  declare sourceNote: string;
  declare createdBy: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

WorkshopAlloyModel.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    workshopId: { type: DataTypes.UUID, allowNull: false },
    designation: { type: DataTypes.STRING(60), allowNull: false },
    designationKey: { type: DataTypes.STRING(60), allowNull: false },
    data: { type: DataTypes.JSONB, allowNull: false },
    sourceNote: { type: DataTypes.STRING(400), allowNull: false },
    createdBy: { type: DataTypes.UUID, allowNull: true },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, modelName: 'WorkshopAlloy', tableName: 'workshop_alloys' },
);
