import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
} from 'sequelize';
import type { CrucibleMaterial } from '../../../shared/heats/crucible-life.ts';
import { sequelize } from '../../db/sequelize.ts';

export class CrucibleModel extends Model<InferAttributes<CrucibleModel>, InferCreationAttributes<CrucibleModel>> {
  declare id: CreationOptional<string>;
  declare workshopId: string;
  declare name: string;
  declare material: CrucibleMaterial;
  declare capacityG: number | null;
  declare inServiceSince: string | null;
  declare retired: CreationOptional<boolean>;
  declare retiredOn: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

CrucibleModel.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    workshopId: { type: DataTypes.UUID, allowNull: false },
    name: { type: DataTypes.STRING(80), allowNull: false },
    material: { type: DataTypes.STRING(20), allowNull: false },
    capacityG: { type: DataTypes.DECIMAL, allowNull: true },
    inServiceSince: { type: DataTypes.DATEONLY, allowNull: true },
    retired: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    retiredOn: { type: DataTypes.DATEONLY, allowNull: true },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, modelName: 'Crucible', tableName: 'crucibles' },
);

export class CrucibleNoteModel extends Model<InferAttributes<CrucibleNoteModel>, InferCreationAttributes<CrucibleNoteModel>> {
  declare id: CreationOptional<string>;
  declare crucibleId: string;
  declare notedOn: string;
  declare note: string;
  declare authorId: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

CrucibleNoteModel.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    crucibleId: { type: DataTypes.UUID, allowNull: false },
    notedOn: { type: DataTypes.DATEONLY, allowNull: false },
    note: { type: DataTypes.TEXT, allowNull: false },
    authorId: { type: DataTypes.UUID, allowNull: true },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, modelName: 'CrucibleNote', tableName: 'crucible_notes' },
);

export class CrucibleCycleLimitModel extends Model<
  InferAttributes<CrucibleCycleLimitModel>,
  InferCreationAttributes<CrucibleCycleLimitModel>
> {
  declare id: CreationOptional<string>;
  declare workshopId: string;
  declare material: CrucibleMaterial;
  declare warnAt: number;
  declare limitAt: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

CrucibleCycleLimitModel.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    workshopId: { type: DataTypes.UUID, allowNull: false },
    material: { type: DataTypes.STRING(20), allowNull: false },
    warnAt: { type: DataTypes.INTEGER, allowNull: false },
    limitAt: { type: DataTypes.INTEGER, allowNull: false },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, modelName: 'CrucibleCycleLimit', tableName: 'crucible_cycle_limits' },
);
