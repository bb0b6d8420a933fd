import "server-only";
import { getDb } from "@/models";
import type { Role } from "@/lib/auth/roles";

export type MembershipDto = { userId: number; productionId: number; role: Role; isOwner: boolean };
export type TeamMemberDto = MembershipDto & { name: string; email: string };

export async function getMembership({ userId, productionId }: { userId: number; productionId: number }): Promise<MembershipDto | null> {
  const row = await getDb().Membership.findOne({ where: { userId, productionId } });
  return row ? { userId: row.userId, productionId: row.productionId, role: row.role, isOwner: row.isOwner } : null;
}

export async function getTeamByProduction({ productionId }: { productionId: number }): Promise<TeamMemberDto[]> {
  const { Membership, User } = getDb();
  const rows = await Membership.findAll({
    where: { productionId },
    include: [{ model: User, as: "user", attributes: ["name", "email"] }],
    order: [["id", "ASC"]],
  });
  return rows.map((m) => {
    const user = (m as unknown as { user: { name: string; email: string } }).user;
    return { userId: m.userId, productionId: m.productionId, role: m.role, isOwner: m.isOwner, name: user.name, email: user.email };
  });
}
