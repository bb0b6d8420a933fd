import "server-only";
// Who gets the revision e-mail: each member may opt out (memberships.revision_mail), and the owner names
// the rental shop's address (productions.shop_email) that receives the add / return list.
import { QueryTypes } from "sequelize";
import { getDb } from "@/models";
import { notFound } from "@/lib/errors";
import type { Role } from "@/models/roles";

export type RevisionRecipient = { userId: number; name: string; email: string; role: Role };

/** Members who have not opted out, in the team's order. */
export async function getRevisionRecipients({ productionId }: { productionId: number }): Promise<RevisionRecipient[]> {
  return getDb().sequelize.query<RevisionRecipient>(
    `SELECT m.user_id AS userId, u.name, u.email, m.role FROM memberships m JOIN users u ON u.id = m.user_id
      WHERE m.production_id = ? AND m.revision_mail = 1 ORDER BY m.id`,
    { replacements: [productionId], type: QueryTypes.SELECT },
  );
}

/** Each member's choice, by user id (for the team page). */
export async function getRevisionMailChoices({
  productionId,
}: {
  productionId: number;
}): Promise<Record<number, boolean>> {
  const rows = await getDb().sequelize.query<{ userId: number; on: number }>(
    "SELECT user_id AS userId, revision_mail AS `on` FROM memberships WHERE production_id = ?",
    { replacements: [productionId], type: QueryTypes.SELECT },
  );
  return Object.fromEntries(rows.map((r) => [r.userId, Boolean(r.on)]));
}

/** A member's own choice; only their own membership is touched. */
export async function setRevisionMail({
  productionId,
  userId,
  receive,
}: {
  productionId: number;
  userId: number;
  receive: boolean;
}): Promise<{ receive: boolean }> {
  const [, affected] = await getDb().sequelize.query(
    "UPDATE memberships SET revision_mail = ? WHERE production_id = ? AND user_id = ?",
    { replacements: [receive ? 1 : 0, productionId, userId], type: QueryTypes.UPDATE },
  );
  if (!affected) throw notFound("That membership");
  return { receive };
}

export async function getShopEmail({ productionId }: { productionId: number }): Promise<string | null> {
  const [row] = await getDb().sequelize.query<{ shopEmail: string | null }>(
    "SELECT shop_email AS shopEmail FROM productions WHERE id = ?",
    { replacements: [productionId], type: QueryTypes.SELECT },
  );
  return row?.shopEmail ?? null;
}

export async function setShopEmail({
  productionId,
  shopEmail,
}: {
  productionId: number;
  shopEmail: string | null;
}): Promise<{ shopEmail: string | null }> {
  await getDb().sequelize.query("UPDATE productions SET shop_email = ? WHERE id = ?", {
    replacements: [shopEmail, productionId],
    type: QueryTypes.UPDATE,
  });
  return { shopEmail };
}
