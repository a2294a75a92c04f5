import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
} from 'sequelize';
import type { Role } from '../../../shared/auth/roles.ts';
import type { WORKSHOP_KINDS } from '../../../shared/workshops/workshop-schemas.ts';
import { sequelize } from '../../db/sequelize.ts';

export class WorkshopModel extends Model<InferAttributes<WorkshopModel>, InferCreationAttributes<WorkshopModel>> {
  declare id: CreationOptional<string>;
  declare name: string;
  declare kind: (typeof WORKSHOP_KINDS)[number];
  declare createdBy: string | null;
  declare requireMfaForStaff: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

WorkshopModel.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    name: { type: DataTypes.STRING(120), allowNull: false },
    kind: { type: DataTypes.STRING(20), allowNull: false },
    createdBy: { type: DataTypes.UUID, allowNull: true },
    requireMfaForStaff: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, modelName: 'Workshop', tableName: 'workshops' },
);

export class MembershipModel extends Model<InferAttributes<MembershipModel>, InferCreationAttributes<MembershipModel>> {
  declare id: CreationOptional<string>;
  declare workshopId: string;
  declare userId: string;
  declare role: Role;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

MembershipModel.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    workshopId: { type: DataTypes.UUID, allowNull: false },
    userId: { type: DataTypes.UUID, allowNull: false },
    role: { type: DataTypes.STRING(10), allowNull: false },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, modelName: 'Membership', tableName: 'memberships' },
);

export class MentorAssignmentModel extends Model<
  InferAttributes<MentorAssignmentModel>,
  InferCreationAttributes<MentorAssignmentModel>
> {
  declare id: CreationOptional<string>;
  declare workshopId: string;
  declare mentorId: string;
  declare studentId: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

MentorAssignmentModel.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    workshopId: { type: DataTypes.UUID, allowNull: false },
    mentorId: { type: DataTypes.UUID, allowNull: false },
    studentId: { type: DataTypes.UUID, allowNull: false },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, modelName: 'MentorAssignment', tableName: 'mentor_assignments' },
);
