import type { Role } from "@/lib/auth/roles";

export type UserDto = { id: number; email: string; name: string };
export type MembershipDto = { userId: number; productionId: number; role: Role; isOwner: boolean };
export type TeamMemberDto = MembershipDto & { name: string; email: string };
