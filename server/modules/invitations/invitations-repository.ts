import { Op } from 'sequelize';
import type { Role } from '../../../shared/auth/roles.ts';
import type { Invitation } from '../../../shared/workshops/workshop-schemas.ts';
import { sequelize, type Tx } from '../../db/sequelize.ts';
import { InvitationModel } from './invitation-model.ts';
import { QueryTypes } from 'sequelize';

export async function create(values: {
  workshopId: string;
  email: string;
  role: Role;
  tokenHash: string;
  invitedBy: string;
  expiresAt: Date;
}): Promise<string> {
  return (await InvitationModel.create(values)).id;
}

export async function list(workshopId: string): Promise<Invitation[]> {
  const rows = await sequelize.query<{
    id: string;
    email: string;
    role: Role;
    expiresAt: Date;
    acceptedAt: Date | null;
    invitedBy: string | null;
  }>(
    `SELECT i.id, i.email, i.role, i.expires_at AS "expiresAt", i.accepted_at AS "acceptedAt",
            u.display_name AS "invitedBy"
       FROM invitations i LEFT JOIN users u ON u.id = i.invited_by
      WHERE i.workshop_id = :workshopId
      ORDER BY i.created_at DESC, i.id`,
    { replacements: { workshopId }, type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({
    ...r,
    invitedBy: r.invitedBy ?? 'a former member',
    expiresAt: r.expiresAt.toISOString(),
    acceptedAt: r.acceptedAt?.toISOString() ?? null,
  }));
}

export async function findUsable(tokenHash: string) {
  return InvitationModel.findOne({
    where: { tokenHash, acceptedAt: null, expiresAt: { [Op.gt]: new Date() } },
    raw: true,
  });
}

/** Marks it accepted if still usable; one UPDATE, so it accepts exactly once. */
export async function consume(tokenHash: string, acceptedBy: string, tx: Tx) {
  const [count, rows] = await InvitationModel.update(
    { acceptedAt: new Date(), acceptedBy },
    {
      where: { tokenHash, acceptedAt: null, expiresAt: { [Op.gt]: new Date() } },
      returning: true,
      transaction: tx,
    },
  );
  return count === 1 ? rows[0].get({ plain: true }) : null;
}
