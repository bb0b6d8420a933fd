import "server-only";
import { getDb } from "@/models";
import type { MembershipDto, TeamMemberDto } from "@/lib/dto/people";
import { plain } from "./plain";

const MEMBERSHIP_KEYS = ["userId", "productionId", "role", "isOwner"] as const;

export async function getMembership({
  userId,
  productionId,
}: {
  userId: number;
  productionId: number;
}): Promise<MembershipDto | null> {
  const row = await getDb().Membership.findOne({ where: { userId, productionId } });
  return row ? plain(row, MEMBERSHIP_KEYS) : null;
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
    return { ...plain(m, MEMBERSHIP_KEYS), name: user.name, email: user.email };
  });
}
