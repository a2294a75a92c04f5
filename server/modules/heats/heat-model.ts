import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
} from 'sequelize';
import type { ChargeKind } from '../../../shared/domain/index.ts';
import type { CrucibleShock } from '../../../shared/heats/equipment-schemas.ts';
import type { DegassingMethod, HeatFluxKind, QuenchMedium } from '../../../shared/heats/heat-schemas.ts';
import { sequelize } from '../../db/sequelize.ts';

export class HeatModel extends Model<InferAttributes<HeatModel>, InferCreationAttributes<HeatModel>> {
  declare id: CreationOptional<string>;
  declare workshopId: string;
  declare casterId: string;
  declare meltStartedAt: Date | null;
  declare pouredAt: Date;
  declare alloy: string;
  declare workshopAlloyId: string | null;
  declare furnaceId: string | null;
  declare crucibleId: string | null;
  declare setpointC: number | null;
  declare peakTempC: number | null;
  declare pourTempC: number | null;
  declare fluxKind: HeatFluxKind;
  declare fluxAmountG: number | null;
  declare degassing: DegassingMethod;
  declare skimmed: boolean | null;
  declare toolsPreheated: boolean | null;
  declare ambientTempC: number | null;
  declare relativeHumidityPct: number | null;
  declare crucibleRemainderG: number | null;
  declare notes: string | null;
  declare safetyDryTools: boolean;
  declare safetyPpe: boolean;
  declare safetyClearFloor: boolean;
  declare crucibleShock: CrucibleShock;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

HeatModel.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    workshopId: { type: DataTypes.UUID, allowNull: false },
    casterId: { type: DataTypes.UUID, allowNull: false },
    meltStartedAt: { type: DataTypes.DATE, allowNull: true },
    pouredAt: { type: DataTypes.DATE, allowNull: false },
    alloy: { type: DataTypes.STRING(60), allowNull: false },
    workshopAlloyId: { type: DataTypes.UUID, allowNull: true },
    furnaceId: { type: DataTypes.UUID, allowNull: true },
    crucibleId: { type: DataTypes.UUID, allowNull: true },
    setpointC: { type: DataTypes.DECIMAL, allowNull: true },
    peakTempC: { type: DataTypes.DECIMAL, allowNull: true },
    pourTempC: { type: DataTypes.DECIMAL, allowNull: true },
    fluxKind: { type: DataTypes.STRING(12), allowNull: false },
    fluxAmountG: { type: DataTypes.DECIMAL, allowNull: true },
    degassing: { type: DataTypes.STRING(16), allowNull: false },
    skimmed: { type: DataTypes.BOOLEAN, allowNull: true },
    toolsPreheated: { type: DataTypes.BOOLEAN, allowNull: true },
    ambientTempC: { type: DataTypes.DECIMAL, allowNull: true },
    relativeHumidityPct: { type: DataTypes.DECIMAL, allowNull: true },
    crucibleRemainderG: { type: DataTypes.DECIMAL, allowNull: true },
    notes: { type: DataTypes.TEXT, allowNull: true },
    safetyDryTools: { type: DataTypes.BOOLEAN, allowNull: false },
    safetyPpe: { type: DataTypes.BOOLEAN, allowNull: false },
    safetyClearFloor: { type: DataTypes.BOOLEAN, allowNull: false },
    crucibleShock: { type: DataTypes.STRING(14), allowNull: false },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, modelName: 'Heat', tableName: 'heats' },
);

export class HeatChargeLineModel extends Model<
  InferAttributes<HeatChargeLineModel>,
  InferCreationAttributes<HeatChargeLineModel>
> {
  declare id: CreationOptional<string>;
  declare heatId: string;
  declare position: number;
  declare kind: ChargeKind;
  declare description: string | null;
  declare massG: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

HeatChargeLineModel.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    heatId: { type: DataTypes.UUID, allowNull: false },
    position: { type: DataTypes.INTEGER, allowNull: false },
    kind: { type: DataTypes.STRING(12), allowNull: false },
    description: { type: DataTypes.STRING(200), allowNull: true },
    massG: { type: DataTypes.DECIMAL, allowNull: false },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, modelName: 'HeatChargeLine', tableName: 'heat_charge_lines' },
);

export class CastingModel extends Model<InferAttributes<CastingModel>, InferCreationAttributes<CastingModel>> {
  declare id: CreationOptional<string>;
  declare workshopId: string;
  declare heatId: string;
  declare position: number;
  declare mouldId: string | null;
  declare mouldPreheatC: number | null;
  declare coated: boolean | null;
  declare vented: boolean | null;
  declare pourHeightCm: number | null;
  declare sectionThicknessMm: number | null;
  declare massG: number | null;
  declare airCoolMin: number | null;
  declare quenchMedium: QuenchMedium;
  declare notes: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

CastingModel.init(
  {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
    workshopId: { type: DataTypes.UUID, allowNull: false },
    heatId: { type: DataTypes.UUID, allowNull: false },
    position: { type: DataTypes.INTEGER, allowNull: false },
    mouldId: { type: DataTypes.UUID, allowNull: true },
    mouldPreheatC: { type: DataTypes.DECIMAL, allowNull: true },
    coated: { type: DataTypes.BOOLEAN, allowNull: true },
    vented: { type: DataTypes.BOOLEAN, allowNull: true },
    pourHeightCm: { type: DataTypes.DECIMAL, allowNull: true },
    sectionThicknessMm: { type: DataTypes.DECIMAL, allowNull: true },
    massG: { type: DataTypes.DECIMAL, allowNull: true },
    airCoolMin: { type: DataTypes.DECIMAL, allowNull: true },
    quenchMedium: { type: DataTypes.STRING(8), allowNull: false },
    notes: { type: DataTypes.TEXT, allowNull: true },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  },
  { sequelize, modelName: 'Casting', tableName: 'castings' },
);
