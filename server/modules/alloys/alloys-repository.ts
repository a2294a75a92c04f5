import { QueryTypes } from 'sequelize';
import { alloySchema, type Alloy } from '../../../shared/domain/index.ts';
import { sequelize } from '../../db/sequelize.ts';
import { WorkshopAlloyModel } from './workshop-alloy-model.ts';

/** A stored workshop alloy, its data parsed again so a drifted row fails loudly here. */
export type WorkshopAlloyRecord = {
  id: string;
  alloy: Alloy;
  designationKey: string;
  createdBy: string | null;
  createdByName: string | null;
  createdAt: string;
  updatedAt: string;
};

type Row = {
  id: string;
  data: unknown;
  designationKey: string;
  createdBy: string | null;
  createdByName: string | null;
  createdAt: Date;
  updatedAt: Date;
};

const iso = (d: Date | string) => new Date(d).toISOString();

function toRecord(r: Row): WorkshopAlloyRecord {
  return {
    id: r.id,
    alloy: alloySchema.parse(r.data),
    designationKey: r.designationKey,
    createdBy: r.createdBy,
    createdByName: r.createdByName,
    createdAt: iso(r.createdAt),
    updatedAt: iso(r.updatedAt),
  };
}

export async function listWorkshopAlloys(workshopId: string, alloyId?: string): Promise<WorkshopAlloyRecord[]> {
  const rows = await sequelize.query<Row>(
    `SELECT a.id, a.data, a.designation_key AS "designationKey", a.created_by AS "createdBy",
            u.display_name AS "createdByName", a.created_at AS "createdAt", a.updated_at AS "updatedAt"
       FROM workshop_alloys a
       LEFT JOIN users u ON u.id = a.created_by
      WHERE a.workshop_id = :workshopId ${alloyId ? 'AND a.id = :alloyId' : ''}
      ORDER BY lower(a.designation), a.id`,
    { replacements: { workshopId, alloyId: alloyId ?? null }, type: QueryTypes.SELECT },
  );
  return rows.map(toRecord);
}

export async function findWorkshopAlloy(workshopId: string, alloyId: string): Promise<WorkshopAlloyRecord | null> {
  return (await listWorkshopAlloys(workshopId, alloyId))[0] ?? null;
}

export async function createWorkshopAlloy(values: {
  workshopId: string;
  alloy: Alloy;
  designationKey: string;
  createdBy: string;
}): Promise<string> {
  const row = await WorkshopAlloyModel.create({
    workshopId: values.workshopId,
    designation: values.alloy.designation,
    designationKey: values.designationKey,
    data: values.alloy,
    sourceNote: values.alloy.source ?? '',
    createdBy: values.createdBy,
  });
  return row.id;
}

export async function updateWorkshopAlloy(
  workshopId: string,
  alloyId: string,
  values: { alloy: Alloy; designationKey: string },
): Promise<void> {
  await WorkshopAlloyModel.update(
    {
      designation: values.alloy.designation,
      designationKey: values.designationKey,
      data: values.alloy,
      sourceNote: values.alloy.source ?? '',
    },
    { where: { workshopId, id: alloyId } },
  );
}

export async function deleteWorkshopAlloy(workshopId: string, alloyId: string): Promise<void> {
  await WorkshopAlloyModel.destroy({ where: { workshopId, id: alloyId } });
}
