import "server-only";
import { getDb } from "@/models";
import { AppError } from "@/lib/errors";
import type { Role } from "@/lib/auth/roles";
import { LINK_REFUSALS, openWhere, stateOf } from "./invitations";
import { inTransaction } from "./transaction";

// Invitations waiting for a signed-in account's own address. Accounts are made only from a link mailed to
// their address (a sign-up link or an invitation link), so the account holder has shown they read that
// mailbox and may join what it was invited to without the invitation's own link.

export type PendingInvitation = {
  id: number;
  productionId: number;
  productionName: string;
  role: Role;
  invitedBy: string | null;
  expiresAt: Date;
};

/** Open invitations to the address, oldest first, with the production's and the inviter's names. */
export async function getInvitationsForAddress({ email }: { email: string }): Promise<PendingInvitation[]> {
  const { Invitation, Production, User } = getDb();
  const rows = await Invitation.findAll({ where: openWhere(null, email.trim().toLowerCase()), order: [["id", "ASC"]] });
  if (rows.length === 0) return [];
  const productions = await Production.findAll({
    where: { id: rows.map((r) => r.productionId) },
    attributes: ["id", "name"],
  });
  const inviters = await User.findAll({
    where: { id: rows.map((r) => r.invitedByUserId).filter((id): id is number => id !== null) },
    attributes: ["id", "name"],
  });
  const productionName = new Map(productions.map((p) => [p.id, p.name]));
  const inviterName = new Map(inviters.map((u) => [u.id, u.name]));
  return rows.map((r) => ({
    id: r.id,
    productionId: r.productionId,
    productionName: productionName.get(r.productionId) ?? "",
    role: r.role,
    invitedBy: r.invitedByUserId ? (inviterName.get(r.invitedByUserId) ?? null) : null,
    expiresAt: r.expiresAt,
  }));
}

/**
 * Joins the production of an open invitation addressed to the user's own e-mail, with its role, and
 * marks the invitation used, in one transaction with the invitation locked (two clicks make one member).
 * Another address's invitation is 404, as if it did not exist.
 */
export async function joinInvitedProduction(a: {
  invitationId: number;
  userId: number;
}): Promise<{ productionId: number; role: Role }> {
  const { Invitation, Membership, User } = getDb();
  return inTransaction(async (transaction) => {
    const user = await User.findByPk(a.userId, { attributes: ["id", "email"], transaction });
    const row = await Invitation.findOne({
      where: { id: a.invitationId, email: user?.email ?? "" },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    const state = stateOf(row);
    if (!user || !row || state === "invalid") throw new AppError("not_found", "That invitation was not found.");
    if (state !== "open") throw new AppError("conflict", LINK_REFUSALS[state]);
    if (await Membership.findOne({ where: { userId: user.id, productionId: row.productionId }, transaction }))
      throw new AppError("conflict", "You are already on this production's team; the invitation was not needed.");
    await Membership.create(
      { userId: user.id, productionId: row.productionId, role: row.role, isOwner: false },
      { transaction },
    );
    row.set({ usedAt: new Date(), usedByUserId: user.id, version: row.version + 1 });
    await row.save({ transaction });
    return { productionId: row.productionId, role: row.role };
  });
}
