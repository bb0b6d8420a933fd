import "server-only";
import type { Transaction } from "sequelize";
import { getDb } from "@/models";
import type { Membership } from "@/models/membership";
import { AppError } from "@/lib/errors";
import type { Role } from "@/lib/auth/roles";
import { plain } from "./plain";

// A production's team as the owner manages it. A member is addressed by their user id within the
// production; memberships are versioned, so two owners editing the same person never lose a write.
const KEYS = ["userId", "productionId", "role", "isOwner", "version"] as const;
export type TeamRowDto = ReturnType<typeof toDto> & { name: string; email: string };
const toDto = (m: Membership) => plain(m, KEYS);

export const LAST_OWNER =
  "The production's last owner cannot be removed: a production always keeps someone who can manage its team.";

async function withPerson(m: Membership, transaction?: Transaction): Promise<TeamRowDto> {
  const u = await getDb().User.findByPk(m.userId, { attributes: ["name", "email"], transaction });
  return { ...toDto(m), name: u?.name ?? "", email: u?.email ?? "" };
}

export async function getTeam({ productionId }: { productionId: number }): Promise<TeamRowDto[]> {
  const { Membership, User } = getDb();
  const rows = await Membership.findAll({
    where: { productionId },
    include: [{ model: User, as: "user", attributes: ["name", "email"] }],
    order: [["id", "ASC"]],
  });
  return rows.map((m) => {
    const u = (m as unknown as { user: { name: string; email: string } }).user;
    return { ...toDto(m), name: u.name, email: u.email };
  });
}

/** Locks the member's row (and reads the production's owners in the same lock order) or 404s. */
async function lockedMember(productionId: number, userId: number, transaction: Transaction): Promise<Membership> {
  const row = await getDb().Membership.findOne({
    where: { productionId, userId },
    transaction,
    lock: transaction.LOCK.UPDATE,
  });
  if (!row) throw new AppError("not_found", "That person is not on this production's team.");
  return row;
}

/** A new role for a member; a stale version answers 409 with the member as they are now. */
export async function changeMemberRole(a: {
  productionId: number;
  memberId: number;
  patch: { role: Role; version: number };
}): Promise<TeamRowDto> {
  return getDb().sequelize.transaction(async (transaction) => {
    const row = await lockedMember(a.productionId, a.memberId, transaction);
    if (row.version !== a.patch.version)
      throw new AppError("conflict", "Someone else changed this member first. Here is the current version.", {
        current: await withPerson(row, transaction),
      });
    row.set({ role: a.patch.role, version: row.version + 1 });
    await row.save({ transaction });
    return withPerson(row, transaction);
  });
}

/** Takes a member off the team; the last owner stays (409). */
export async function removeMember(a: { productionId: number; memberId: number }): Promise<void> {
  const { sequelize, Membership } = getDb();
  await sequelize.transaction(async (transaction) => {
    // Every owner row is locked first, so two owners removing each other at once cannot leave none.
    const owners = await Membership.findAll({
      where: { productionId: a.productionId, isOwner: true },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    const row = await lockedMember(a.productionId, a.memberId, transaction);
    if (row.isOwner && owners.length <= 1) throw new AppError("conflict", LAST_OWNER);
    await row.destroy({ transaction });
  });
}
